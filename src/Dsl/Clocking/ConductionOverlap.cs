using System;
using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Clocking;

/// <summary>
/// Whether two pass devices can conduct at the same instant: the one decision the rules that pair pass gates share
/// (fighting drivers, charge sharing, the series runs of pass gates through <see cref="ConductionDecisions"/>).
/// </summary>
/// <remarks>
/// Two clocked gates conduct together when their transparency windows overlap on the clocks' common cycle (with
/// skew), and always when their clocks are unrelated (no common cycle). Two data-controlled gates conduct together
/// unless their controls are provably exclusive (<see cref="Netlist.AreExclusive"/>: a stated
/// <see cref="Circuit.Exclusive"/> group, or a net and its inverse). A clocked gate and a data-controlled gate can
/// always conduct together: nothing says when the data is high. A fight draws current even while one phase's
/// complement is merely late (<see cref="SkewOverlapCounts.Yes"/>); charge is counted as shared between clocked
/// gates only when their windows overlap for longer than that lateness (<see cref="SkewOverlapCounts.No"/>): the
/// skew-long overlap of a phase and its complement is the overlap races' subject, not a sharing of charge.
/// </remarks>
internal static class ConductionOverlap
{
    public static bool MayConductTogether(Netlist netlist, Device a, Device b, PhaseWindowCache windows, SkewOverlapCounts skewOverlap)
    {
        if (!a.IsPassDevice || !b.IsPassDevice)
            throw new ArgumentException($"Both devices must be pass devices ('{a.Name}' is {a.Kind}, '{b.Name}' is {b.Kind}).");
        if (a.ClockControl is { } pa && b.ClockControl is { } pb)
        {
            var wa = windows.Of(pa);
            var wb = windows.Of(pb);
            if (wa.CommonCycleWith(wb) is null)
                return true;
            var lateness = skewOverlap == SkewOverlapCounts.Yes ? Time.Zero : Time.Max(pa.Clock.ComplementSkew, pb.Clock.ComplementSkew);
            // A relative tolerance: the skew-long overlap comes out of window arithmetic a rounding error above the skew.
            return wa.LongestOverlapWith(wb).Seconds > lateness.Seconds + 1e-9 * Math.Max(wa.Period.Seconds, wb.Period.Seconds);
        }

        if (a.DataControl is { } ca && b.DataControl is { } cb)
            return ReferenceEquals(ca, cb) || !netlist.AreExclusive(ca, cb);
        return true;
    }
}

/// <summary>
/// <see cref="ConductionOverlap.MayConductTogether"/> for one netlist and one reading of the skew-long overlap, asked
/// many times: each pair of clock phases is decided once (window arithmetic allocates), and a gate that can never
/// keep another from conducting with it is known without asking (<see cref="CanExclude"/>). The series runs of pass
/// gates ask it for every gate against the controls met earlier on its run.
/// </summary>
internal sealed class ConductionDecisions
{
    private readonly PhaseWindowCache windows = new();
    private readonly Dictionary<(Phase, Phase), bool> phasePairs = new();
    private readonly bool[] mayHavePartner;
    private readonly SkewOverlapCounts skewOverlap;

    public ConductionDecisions(Netlist netlist, SkewOverlapCounts skewOverlap)
    {
        Netlist = netlist ?? throw new ArgumentNullException(nameof(netlist));
        this.skewOverlap = skewOverlap;
        mayHavePartner = ExclusiveControls.MayHavePartner(netlist);
    }

    public Netlist Netlist { get; }

    /// <summary>The decision of <see cref="ConductionOverlap.MayConductTogether"/>.</summary>
    public bool MayConductTogether(Device a, Device b)
    {
        if (a.ClockControl is { } pa && b.ClockControl is { } pb)
        {
            if (!phasePairs.TryGetValue((pa, pb), out var together))
            {
                together = ConductionOverlap.MayConductTogether(Netlist, a, b, windows, skewOverlap);
                phasePairs[(pa, pb)] = together;
                phasePairs[(pb, pa)] = together;
            }

            return together;
        }

        if (!CanExclude(a) || !CanExclude(b))
            return true;
        return ConductionOverlap.MayConductTogether(Netlist, a, b, windows, skewOverlap);
    }

    /// <summary>
    /// False when the gate conducts together with every other pass gate whatever it is: a gate on a data control
    /// that has no possible exclusive partner (<see cref="ExclusiveControls.MayHavePartner"/>). A clocked gate can
    /// exclude gates on other phases; a data-controlled one, gates on an exclusive control.
    /// </summary>
    public bool CanExclude(Device gate)
        => gate.ClockControl is not null || (gate.DataControl is { } control && mayHavePartner[control.Id]);

    /// <summary>What decides whether the gate conducts: its phase or its control net; gates with one key conduct together.</summary>
    public static object KeyOf(Device gate) => (object?)gate.ClockControl ?? gate.DataControl!;
}

/// <summary>Whether an overlap of two clocked gates no longer than the clocks' complement skew counts as conducting together.</summary>
internal enum SkewOverlapCounts
{
    Yes,
    No,
}
