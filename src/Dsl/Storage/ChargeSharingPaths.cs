using System.Collections.Generic;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>
/// Where charge can be shared: a pass device whose input and output are both storage nodes, each possibly floating
/// while the device conducts, with the other floating nodes that take part of the charge at the same time
/// (<see cref="SharingPartners"/>). The one definition PW3003 and the droop budget (<see cref="DroopBudget"/>) share.
/// </summary>
/// <remarks>
/// Counts: a pass device (clock- or data-controlled) from storage node A to storage node B, where A's drivers do not
/// keep it driven throughout the device's conduction window (any instant, for a data-controlled device) and B's other
/// drivers do not either. Not counted: an input or output driven by a restoring stage or keeper, or from a primary
/// input (a driven node is restored, not shared); a storage node kept driven all the while. The direction is the
/// device's: the input node's value flows to the output, so the input node is the charged one. C2 is B's capacitance
/// plus its partners'. Capacitances are read from the netlist, not from the nodes' retention (which depends on this).
/// </remarks>
internal static class ChargeSharingPaths
{
    public static bool TryShare(Netlist netlist, Device device, PhaseWindowCache windows, out StorageNode charged, out StorageNode other,
        out IReadOnlyList<SharingPartner> partners, out ChargeSharing sharing)
    {
        charged = null!;
        other = null!;
        partners = System.Array.Empty<SharingPartner>();
        sharing = default;
        if (!device.IsPassDevice)
            return false;
        if (StorageNodes.Find(netlist, device.Inputs[0]) is not { } a
            || StorageNodes.Find(netlist, device.Output) is not { } b
            || ReferenceEquals(a, b))
            return false;
        if (!StorageIsolation.MayFloatWhile(a, device) || !StorageIsolation.MayFloatWhile(b, device, except: device))
            return false;
        charged = a;
        other = b;
        partners = SharingPartners.Of(netlist, device, a, b, windows);
        var shared = netlist.CapacitanceOf(b.Net);
        foreach (var partner in partners)
            shared += netlist.CapacitanceOf(partner.Node.Net);
        sharing = ChargeSharing.Of(netlist.CapacitanceOf(a.Net), shared, netlist.Process.Supply);
        return true;
    }
}
