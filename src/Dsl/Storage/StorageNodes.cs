using System;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>
/// Finds the storage nodes of a netlist: nets driven only through pass devices (<see cref="Netlist.IsDrivenOnlyThroughPassDevices"/>).
/// A keeper's weak feedback inverter is a restoring driver, so a kept node is not a storage node at all. A node
/// with a pass driver whose input is a non-inverted copy of the node, made from it by restoring stages alone, has
/// clocked feedback (<see cref="StorageKind.ClockedFeedback"/>, a static latch); any other is
/// <see cref="StorageKind.Dynamic"/>.
/// </summary>
/// <remarks>
/// The feedback search walks back from each pass driver's input through at most <see cref="FeedbackDepth"/>
/// restoring stages and <see cref="FeedbackBreadth"/> nets, so the whole analysis stays linear in the netlist's
/// size; a feedback loop longer than that is not recognised (the node is then treated as dynamic, which can only
/// add findings). A net driven by data-controlled pass gates on a control and its inverse (a pass-gate mux) is
/// driven at every instant and is not a storage node. NAND/NOR stages count as inverting stages of a loop whatever their other input is (a latch with
/// a reset gate in its loop is still static). The result is computed once per netlist and shared by the rules.
/// </remarks>
public static class StorageNodes
{
    /// <summary>Restoring stages searched between a node and its feedback gate's input.</summary>
    public const int FeedbackDepth = 4;

    /// <summary>Nets visited at most per pass driver in the feedback search.</summary>
    public const int FeedbackBreadth = 16;

    private static readonly ConditionalWeakTable<Netlist, StorageMap> Cache = new();

    /// <summary>Every storage node of the netlist, in net order.</summary>
    public static IReadOnlyList<StorageNode> Of(Netlist netlist) => MapOf(netlist).Nodes;

    /// <summary>The storage node on <paramref name="net"/>, or null if the net is not one.</summary>
    public static StorageNode? Find(Netlist netlist, Net net)
    {
        var map = MapOf(netlist);
        if (net is null) throw new ArgumentNullException(nameof(net));
        if ((uint)net.Id >= (uint)netlist.Nets.Count || !ReferenceEquals(netlist.Nets[net.Id], net))
            throw new ArgumentException($"Net '{net.Name}' does not belong to the netlist of design '{netlist.DesignName}'.", nameof(net));
        return map.ByNet[net.Id];
    }

    private static StorageMap MapOf(Netlist netlist)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        return Cache.GetValue(netlist, Build);
    }

    private static StorageMap Build(Netlist netlist)
    {
        var byNet = new StorageNode?[netlist.Nets.Count];
        var nodes = new List<StorageNode>();
        var controls = new HashSet<int>();
        var feedbackSearch = new FeedbackSearch(netlist);
        foreach (var net in netlist.Nets)
        {
            if (!netlist.IsDrivenOnlyThroughPassDevices(net))
                continue;
            var drivers = netlist.DriverList(net);
            if (IsComplementaryMux(netlist, drivers, controls))
                continue;
            List<Device>? feedback = null;
            foreach (var driver in drivers)
                if (feedbackSearch.IsRestoredCopy(driver.Inputs[0], net))
                    (feedback ??= new List<Device>(1)).Add(driver);

            var node = new StorageNode(netlist, net, feedback is null ? StorageKind.Dynamic : StorageKind.ClockedFeedback, drivers.AsReadOnlyList(),
                (IReadOnlyList<Device>?)feedback ?? Array.Empty<Device>());
            byNet[net.Id] = node;
            nodes.Add(node);
        }

        return new StorageMap(nodes, byNet);
    }

    // A pass-gate mux whose arms are controlled by a net and its inverse: one arm conducts at every instant, so the
    // node is driven from the selected input, not stored. (Arms on decoded one-hot selects cannot be proven so and
    // stay storage nodes.) 'controls' is scratch space, reused from node to node.
    private static bool IsComplementaryMux(Netlist netlist, DeviceRange drivers, HashSet<int> controls)
    {
        controls.Clear();
        foreach (var driver in drivers)
            if (driver.DataControl is { } control)
                controls.Add(control.Id);
        if (controls.Count < 2)
            return false;

        foreach (var id in controls)
            foreach (var controlDriver in netlist.DriverList(netlist.Nets[id]))
                if (controlDriver.Kind == DeviceKind.Inverter && controls.Contains(controlDriver.Inputs[0].Id))
                    return true;
        return false;
    }

    /// <summary>The feedback search, with its frontiers kept from one search to the next (it runs once per pass driver).</summary>
    private sealed class FeedbackSearch
    {
        private readonly Netlist netlist;
        private List<(Net Net, bool Inverted)> frontier = new();
        private List<(Net Net, bool Inverted)> next = new();

        public FeedbackSearch(Netlist netlist) => this.netlist = netlist;

        // True if 'source' is made from 'node' through restoring stages only, with an even number of inversions.
        public bool IsRestoredCopy(Net source, Net node)
        {
            frontier.Clear();
            frontier.Add((source, false));
            var visited = 1;
            for (var depth = 0; depth < FeedbackDepth && frontier.Count > 0; depth++)
            {
                next.Clear();
                foreach (var (net, inverted) in frontier)
                {
                    foreach (var driver in netlist.DriverList(net))
                    {
                        if (!driver.IsRestoring) continue;
                        var parity = inverted ^ driver.Kind.IsInverting();
                        var inputs = driver.Inputs;
                        for (var i = 0; i < inputs.Count; i++)
                        {
                            if (ReferenceEquals(inputs[i], node))
                            {
                                if (!parity) return true;
                                continue;
                            }

                            if (visited++ >= FeedbackBreadth) return false;
                            next.Add((inputs[i], parity));
                        }
                    }
                }

                (frontier, next) = (next, frontier);
            }

            return false;
        }
    }

    private sealed class StorageMap
    {
        public StorageMap(IReadOnlyList<StorageNode> nodes, StorageNode?[] byNet)
        {
            Nodes = nodes;
            ByNet = byNet;
        }

        public IReadOnlyList<StorageNode> Nodes { get; }

        public StorageNode?[] ByNet { get; }
    }
}
