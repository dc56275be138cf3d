using System;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>
/// One droop allowance per storage node, shared by charge sharing and leakage: the process's tolerated droop
/// (<see cref="Process.ToleratedDroop"/>, by default a quarter of the supply) is spent first by the worst charge
/// sharing the node can suffer (a pass device opening onto another floating node, <see cref="ChargeSharing"/>), and
/// what is left is what leakage may take: t_ret = C · (ΔV_allow − ΔV_share) / I_leak.
/// </summary>
/// <remarks>
/// The two losses add on the same stored charge: a node that shares charge and then floats loses both before it is
/// read, whichever comes first, so each may use only what the other leaves (first-order: both losses are taken at
/// their worst in the same hold interval). When charge sharing alone spends more than the allowance, PW3003 reports it
/// and the retention rules leave the node to it (one finding per cause).
/// </remarks>
public sealed class DroopBudget
{
    private DroopBudget(Voltage allowance, ChargeSharing? sharing, Device? sharingDevice, Retention retention)
    {
        Allowance = allowance;
        Sharing = sharing;
        SharingDevice = sharingDevice;
        Retention = retention;
    }

    /// <summary>ΔV_allow: the node's whole droop allowance (the process's tolerated droop).</summary>
    public Voltage Allowance { get; }

    /// <summary>The worst charge sharing the node can suffer, or null when no pass device can share its charge.</summary>
    public ChargeSharing? Sharing { get; }

    /// <summary>The pass device behind <see cref="Sharing"/>.</summary>
    public Device? SharingDevice { get; }

    /// <summary>ΔV_share: what charge sharing spends (zero without it).</summary>
    public Voltage SharingDroop => Sharing?.Droop ?? Voltage.Zero;

    /// <summary>ΔV_allow − ΔV_share, at least zero: what leakage may take.</summary>
    public Voltage LeftForLeakage => Voltage.Max(Voltage.Zero, Allowance - SharingDroop);

    /// <summary>True when charge sharing alone spends more than the allowance (PW3003's finding).</summary>
    public bool SpentBySharing => SharingDroop > Allowance;

    /// <summary>t_ret = C · <see cref="LeftForLeakage"/> / I_leak.</summary>
    public Retention Retention { get; }

    internal static DroopBudget Of(Netlist netlist, StorageNode node)
    {
        var allowance = netlist.Process.ToleratedDroop;
        ChargeSharing? worst = null;
        Device? worstDevice = null;
        var windows = new PhaseWindowCache();
        foreach (var device in netlist.DataLoadList(node.Net))
        {
            if (!ChargeSharingPaths.TryShare(netlist, device, windows, out var charged, out _, out _, out var sharing) || !ReferenceEquals(charged, node))
                continue;
            if (worst is null || sharing.Droop > worst.Value.Droop)
            {
                worst = sharing;
                worstDevice = device;
            }
        }

        var left = Voltage.Max(Voltage.Zero, allowance - (worst?.Droop ?? Voltage.Zero));
        return new DroopBudget(allowance, worst, worstDevice, Retention.WithDroopLeft(netlist.CapacitanceOf(node.Net), left, netlist.LeakageOf(node.Net)));
    }

    /// <summary>"300 mV", or "220 mV (300 mV allowance less 80 mV of charge sharing)": the ΔV a retention message shows.</summary>
    public string DroopText()
        => Sharing is null ? LeftForLeakage.ToString() : $"{LeftForLeakage} ({Allowance} allowance less {SharingDroop} of charge sharing through '{SharingDevice!.Name}')";

    /// <inheritdoc/>
    public override string ToString() => $"allowance {Allowance}, charge sharing {SharingDroop}, left for leakage {LeftForLeakage}";
}
