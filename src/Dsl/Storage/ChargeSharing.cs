using Phaseward.Internal;

namespace Phaseward.Storage;

/// <summary>
/// Charge sharing between two floating nodes joined by a pass device: a node of capacitance C1 charged to V and
/// one of capacitance C2 at 0 V settle, by conservation of charge (Q = C·V before and after), at
/// V·C1 / (C1 + C2); the charged node's level drops by V·C2 / (C1 + C2).
/// </summary>
/// <remarks>
/// First order: lumped capacitances that do not vary with voltage, no leakage or drive during the transfer, and a
/// pass device that conducts fully (an nMOS-only pass transistor would also lose a threshold). The other node at
/// 0 V is the worst case for a node charged high (and, by symmetry, a node at the supply is the worst case for one
/// held low).
/// </remarks>
public readonly struct ChargeSharing
{
    private ChargeSharing(Capacitance charged, Capacitance other, Voltage level)
    {
        ChargedCapacitance = charged;
        OtherCapacitance = other;
        Level = level;
        var total = charged + other;
        Settled = total.Farads > 0 ? level * (charged / total) : level;
        Droop = level - Settled;
    }

    /// <summary>C1: the capacitance of the node that holds the charge.</summary>
    public Capacitance ChargedCapacitance { get; }

    /// <summary>C2: the capacitance of the node it is joined to (assumed at 0 V).</summary>
    public Capacitance OtherCapacitance { get; }

    /// <summary>V: the charged node's level before the pass device opens.</summary>
    public Voltage Level { get; }

    /// <summary>V·C1 / (C1 + C2): the level both nodes settle at.</summary>
    public Voltage Settled { get; }

    /// <summary>V·C2 / (C1 + C2): how far the charged node's level drops.</summary>
    public Voltage Droop { get; }

    /// <summary>Charge sharing between a node <paramref name="charged"/> to <paramref name="level"/> and a discharged node <paramref name="other"/>.</summary>
    public static ChargeSharing Of(Capacitance charged, Capacitance other, Voltage level)
    {
        Guard.NonNegative(charged.Farads, nameof(charged), "F");
        Guard.NonNegative(other.Farads, nameof(other), "F");
        Guard.NonNegative(level.Volts, nameof(level), "V");
        return new ChargeSharing(charged, other, level);
    }

    /// <inheritdoc/>
    public override string ToString() => $"{Level} on {ChargedCapacitance} shared with {OtherCapacitance}: settles at {Settled}, droop {Droop}";
}
