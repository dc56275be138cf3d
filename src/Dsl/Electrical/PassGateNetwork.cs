using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Netlists;

namespace Phaseward.Electrical;

/// <summary>
/// A netlist seen as RC trees of pass gates. A pass gate is a branch resistance from its input net to its output net;
/// a net with a (non-weak) restoring driver, or a primary input, restores the signal and roots a tree through its
/// driver's resistance. Built in O(devices + nets):
/// <list type="bullet">
/// <item>the series edges (gate → its output net → the pass gates that net feeds), walked depth-first from the
/// restoring nets; an edge that closes a loop of pass gates (a back edge of the walk) is dropped, so what remains is
/// acyclic and every later sweep terminates;</item>
/// <item>the downstream capacitance of every net: its own capacitance (from <see cref="Netlist.CapacitanceOf"/>, fan-out
/// loads included) plus that of everything its pass gates feed, assuming every pass gate downstream conducts (the
/// worst case). It depends only on the net, not on where the signal came from, so a path's Elmore delay is the sum of
/// R · C_down along it, whichever input of a pass-gate mux drives it.</item>
/// </list>
/// </summary>
/// <remarks>
/// A net reached twice from the same net along different pass paths (gates in parallel, a diamond) is counted on
/// each path: the downstream capacitance is then an overestimate, which keeps the delay pessimistic.
/// </remarks>
internal sealed class PassGateNetwork
{
    private const byte White = 0, Grey = 1, Black = 2;

    private readonly bool[] restored;
    private readonly bool[] inputEdgeKept;
    private readonly bool[] outputEdgeKept;
    private readonly double[] downstreamFarads;
    private readonly int[] postorder;
    private readonly int[] passLoadStart;
    private readonly int[] passLoads;

    public PassGateNetwork(Netlist netlist, CancellationToken cancellationToken = default)
    {
        Netlist = netlist ?? throw new ArgumentNullException(nameof(netlist));
        var devices = netlist.Devices;
        var nets = netlist.Nets;
        DeviceCount = devices.Count;

        restored = new bool[nets.Count];
        foreach (var net in nets)
            restored[net.Id] = IsRestoredNet(netlist, net);

        inputEdgeKept = new bool[devices.Count];
        outputEdgeKept = new bool[devices.Count];
        foreach (var device in devices)
        {
            if (!device.IsPassDevice) continue;
            inputEdgeKept[device.Id] = true;
            outputEdgeKept[device.Id] = !restored[device.Output.Id];
        }

        // The pass gates each net feeds, as one flat array (net i's are passLoads[passLoadStart[i] .. passLoadStart[i+1]]).
        passLoadStart = new int[nets.Count + 1];
        foreach (var device in devices)
            if (device.IsPassDevice)
                passLoadStart[device.Inputs[0].Id + 1]++;
        for (var i = 0; i < nets.Count; i++)
            passLoadStart[i + 1] += passLoadStart[i];
        passLoads = new int[passLoadStart[nets.Count]];
        var fill = (int[])passLoadStart.Clone();
        foreach (var device in devices)
            if (device.IsPassDevice)
                passLoads[fill[device.Inputs[0].Id]++] = device.Id;

        postorder = Walk(cancellationToken);
        downstreamFarads = SumDownstream(cancellationToken);
    }

    public Netlist Netlist { get; }

    public int DeviceCount { get; }

    /// <summary>Graph nodes in depth-first postorder: device ids, and nets encoded as <see cref="DeviceCount"/> + net id.
    /// For every kept edge u → v, v comes before u.</summary>
    public IReadOnlyList<int> Postorder => postorder;

    public bool IsNetNode(int node) => node >= DeviceCount;

    public int NetIdOf(int node) => node - DeviceCount;

    /// <summary>True when the net is a primary input or has a restoring driver that is not a weak keeper.</summary>
    public bool IsRestored(Net net) => restored[net.Id];

    /// <summary>The pass gate's input net feeds it through a series edge that was kept (not one closing a loop).</summary>
    public bool IsInputEdgeKept(Device gate) => inputEdgeKept[gate.Id];

    /// <summary>The pass gate continues into its output net (the net is not restored and the edge closes no loop).</summary>
    public bool IsOutputEdgeKept(Device gate) => outputEdgeKept[gate.Id];

    /// <summary>Where the pass gates this net feeds (as their data input) begin among <see cref="PassLoadAt"/>; they
    /// run, in netlist order, up to <see cref="PassLoadEnd"/> (an index range rather than an enumerable, which would
    /// allocate on every net).</summary>
    public int PassLoadStart(Net net) => passLoadStart[net.Id];

    /// <summary>Where the pass gates this net feeds end among <see cref="PassLoadAt"/> (exclusive).</summary>
    public int PassLoadEnd(Net net) => passLoadStart[net.Id + 1];

    /// <summary>The pass gate at a position of the flat pass-load index.</summary>
    public Device PassLoadAt(int position) => Netlist.Devices[passLoads[position]];

    /// <summary>The net's capacitance plus all capacitance its pass gates feed (F).</summary>
    public Capacitance DownstreamCapacitanceOf(Net net) => new(downstreamFarads[net.Id]);

    /// <summary>
    /// The capacitance a pass gate charges through its on-resistance: the downstream capacitance of its output net, or
    /// only that net's own capacitance when the chain cannot continue there (a restored net, a loop).
    /// </summary>
    public Capacitance ChargedThrough(Device gate)
        => outputEdgeKept[gate.Id] ? new Capacitance(downstreamFarads[gate.Output.Id]) : Netlist.CapacitanceOf(gate.Output);

    /// <summary>
    /// The resistance that drives a tree rooted at this net: its strongest restoring driver's; the process's driver
    /// resistance for a primary input or a net with no restoring driver (then assumed driven like an input).
    /// </summary>
    public Resistance RootResistanceOf(Net net)
    {
        Resistance? strongest = null;
        foreach (var driver in Netlist.DriverList(net))
        {
            if (!driver.IsRestoring || driver.IsWeak) continue;
            var r = Netlist.ResistanceOf(driver);
            if (strongest is null || r < strongest.Value) strongest = r;
        }

        return strongest ?? Netlist.Process.DriverResistance;
    }

    private static bool IsRestoredNet(Netlist netlist, Net net)
    {
        if (netlist.IsInput(net)) return true;
        foreach (var driver in netlist.DriverList(net))
            if (driver.IsRestoring && !driver.IsWeak)
                return true;
        return false;
    }

    // Iterative depth-first walk of the bipartite graph gate → output net → pass loads. Roots: first the nets no kept
    // pass gate drives (restored nets, undriven nets), then anything left (loops of pass gates with no way in).
    private int[] Walk(CancellationToken cancellationToken)
    {
        var nets = Netlist.Nets;
        var nodeCount = DeviceCount + nets.Count;
        var colour = new byte[nodeCount];
        var order = new List<int>(nodeCount);
        var stack = new Stack<(int Node, int Next)>();
        var steps = 0;

        var hasPassDriver = new bool[nets.Count];
        foreach (var device in Netlist.Devices)
            if (device.IsPassDevice && outputEdgeKept[device.Id])
                hasPassDriver[device.Output.Id] = true;

        for (var round = 0; round < 2; round++)
        {
            foreach (var net in nets)
            {
                var node = DeviceCount + net.Id;
                if (colour[node] != White || (round == 0 && hasPassDriver[net.Id])) continue;
                colour[node] = Grey;
                stack.Push((node, 0));
                while (stack.Count > 0)
                {
                    var (current, next) = stack.Pop();
                    if ((++steps & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
                    var child = ChildOf(current, next, out var gateOfEdge, out var isOutputEdge);
                    if (child < 0)
                    {
                        colour[current] = Black;
                        order.Add(current);
                        continue;
                    }

                    stack.Push((current, next + 1));
                    if (colour[child] == Grey)
                    {
                        // A back edge: it closes a loop of pass gates. Dropping it leaves the graph acyclic.
                        if (isOutputEdge) outputEdgeKept[gateOfEdge] = false;
                        else inputEdgeKept[gateOfEdge] = false;
                    }
                    else if (colour[child] == White)
                    {
                        colour[child] = Grey;
                        stack.Push((child, 0));
                    }
                }
            }
        }

        return order.ToArray();
    }

    // The index-th successor of a node, or -1. A gate's only successor is its output net (when not restored); a net's
    // successors are the pass gates it feeds.
    private int ChildOf(int node, int index, out int gate, out bool isOutputEdge)
    {
        if (node < DeviceCount)
        {
            gate = node;
            isOutputEdge = true;
            var device = Netlist.Devices[node];
            return index == 0 && outputEdgeKept[node] ? DeviceCount + device.Output.Id : -1;
        }

        isOutputEdge = false;
        var net = node - DeviceCount;
        var position = passLoadStart[net] + index;
        gate = position < passLoadStart[net + 1] ? passLoads[position] : -1;
        return gate;
    }

    private double[] SumDownstream(CancellationToken cancellationToken)
    {
        var nets = Netlist.Nets;
        var sums = new double[nets.Count];
        for (var i = 0; i < postorder.Length; i++)
        {
            if ((i & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
            var node = postorder[i];
            if (node < DeviceCount) continue;
            var net = nets[node - DeviceCount];
            var total = Netlist.CapacitanceOf(net).Farads;
            for (var position = passLoadStart[net.Id]; position < passLoadStart[net.Id + 1]; position++)
            {
                var load = passLoads[position];
                if (inputEdgeKept[load] && outputEdgeKept[load])
                    total += sums[Netlist.Devices[load].Output.Id];
            }
            sums[net.Id] = total;
        }

        return sums;
    }
}
