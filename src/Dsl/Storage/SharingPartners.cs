using System.Collections.Generic;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>A floating storage node joined to the shared node through a pass device that may conduct with the opening one.</summary>
internal readonly struct SharingPartner
{
    internal SharingPartner(StorageNode node, Device through)
    {
        Node = node;
        Through = through;
    }

    /// <summary>The floating node that takes part of the charge.</summary>
    public StorageNode Node { get; }

    /// <summary>The pass device that joins it to the shared node.</summary>
    public Device Through { get; }
}

/// <summary>
/// The other floating nodes that share the charge when a pass device opens onto a floating node: every storage node
/// one pass device away from that node, through a device that may conduct at the same time as the opening one
/// (<see cref="ConductionOverlap"/>), and that may itself float meanwhile. Their capacitance adds to C2.
/// </summary>
/// <remarks>
/// This is where the designer's <see cref="Circuit.Exclusive"/> statement matters: the read gates of a one-hot
/// read mux are never open together, so opening one shares the cell's charge with the bit line alone; with selects
/// not known to be exclusive, the worst case opens every read gate together, and the cell shares with the bit line
/// and every other cell on it. One pass device deep (first order): nodes further away are joined only through two
/// gates in series, both open, and are left out. A node driven by a restoring stage is not a partner: it drives, it
/// does not share (a fight, if any, is PW3004's).
/// </remarks>
internal static class SharingPartners
{
    /// <summary>
    /// The partners of <paramref name="shared"/> while <paramref name="opening"/> conducts from
    /// <paramref name="charged"/> onto it, in the netlist's device order.
    /// </summary>
    public static IReadOnlyList<SharingPartner> Of(Netlist netlist, Device opening, StorageNode charged, StorageNode shared, PhaseWindowCache windows)
    {
        List<SharingPartner>? partners = null;
        foreach (var gate in netlist.DriversOf(shared.Net))
            Consider(gate, gate.Inputs[0]);
        foreach (var gate in netlist.DataLoadsOf(shared.Net))
            Consider(gate, gate.Output);
        return (IReadOnlyList<SharingPartner>?)partners ?? System.Array.Empty<SharingPartner>();

        void Consider(Device gate, Net far)
        {
            if (!gate.IsPassDevice || ReferenceEquals(gate, opening) || gate.IsWeak)
                return;
            if (ReferenceEquals(far, charged.Net) || ReferenceEquals(far, shared.Net))
                return;
            if (StorageNodes.Find(netlist, far) is not { } node)
                return;
            if (!ConductionOverlap.MayConductTogether(netlist, opening, gate, windows, SkewOverlapCounts.No))
                return;
            if (!StorageIsolation.MayFloatWhile(node, opening, except: gate))
                return;
            partners ??= new List<SharingPartner>(2);
            if (!partners.Exists(known => ReferenceEquals(known.Node, node)))
                partners.Add(new SharingPartner(node, gate));
        }
    }
}
