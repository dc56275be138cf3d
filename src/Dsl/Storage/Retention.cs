using System;
using Phaseward.Internal;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>
/// How long a floating storage node keeps a readable level: t_ret = C·ΔV / I_leak.
/// </summary>
/// <remarks>
/// A linear, first-order estimate: the leakage is taken as a constant current I_leak drawn from the node's
/// capacitance C until the level has moved by the tolerated droop ΔV (the capacitor equation I = C·dV/dt with I
/// constant). Real leakage (subthreshold and junction currents) changes with the node voltage and, strongly, with
/// temperature; where it falls as the node discharges (a resistive leak), the true time is longer than this
/// estimate, so the estimate errs on the safe side for such leaks. It does not replace transistor-level
/// simulation at the process corners, the foundry's rules or sign-off.
/// </remarks>
public readonly struct Retention
{
    private Retention(Capacitance capacitance, Voltage toleratedDroop, Current leakage)
    {
        Capacitance = capacitance;
        ToleratedDroop = toleratedDroop;
        Leakage = leakage;
        Time = capacitance * toleratedDroop / leakage;
    }

    /// <summary>The node's total capacitance C.</summary>
    public Capacitance Capacitance { get; }

    /// <summary>The droop ΔV leakage may cause and the node still be read correctly (for a storage node, what its droop
    /// budget leaves after charge sharing, see <see cref="DroopBudget"/>).</summary>
    public Voltage ToleratedDroop { get; }

    /// <summary>The leakage current I_leak that drains the node.</summary>
    public Current Leakage { get; }

    /// <summary>t_ret = C·ΔV / I_leak.</summary>
    public Time Time { get; }

    /// <summary>The retention time of a node with capacitance <paramref name="capacitance"/>, tolerated droop
    /// <paramref name="toleratedDroop"/> and constant leakage <paramref name="leakage"/>.</summary>
    public static Retention Of(Capacitance capacitance, Voltage toleratedDroop, Current leakage)
    {
        Guard.NonNegative(capacitance.Farads, nameof(capacitance), "F");
        Guard.Positive(toleratedDroop.Volts, nameof(toleratedDroop), "V");
        Guard.Positive(leakage.Amperes, nameof(leakage), "A");
        return new Retention(capacitance, toleratedDroop, leakage);
    }

    /// <summary>The retention time of a net: its capacitance, the droop its budget leaves for leakage (the process's
    /// tolerated droop less the worst charge sharing on a storage node, see <see cref="DroopBudget"/>) and the net's
    /// leakage (the value set with <see cref="Circuit.SetLeakage"/>, else the process's hot-corner figure).</summary>
    public static Retention Of(Netlist netlist, Net net)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        if (StorageNodes.Find(netlist, net) is { } node)
            return node.Retention;
        return Of(netlist.CapacitanceOf(net), netlist.Process.ToleratedDroop, netlist.LeakageOf(net));
    }

    // The budget's share for leakage may be zero (charge sharing took it all): a retention time of zero.
    internal static Retention WithDroopLeft(Capacitance capacitance, Voltage left, Current leakage)
        => new(capacitance, Voltage.Max(Voltage.Zero, left), leakage);

    /// <inheritdoc/>
    public override string ToString() => $"t_ret = {Time} (C = {Capacitance}, ΔV = {ToleratedDroop}, I_leak = {Leakage})";
}
