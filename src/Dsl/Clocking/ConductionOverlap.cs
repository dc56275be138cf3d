using System;
using Phaseward.Netlists;

namespace Phaseward.Clocking;

/// <summary>
/// Whether two pass devices can conduct at the same instant: the one decision the rules that pair pass gates share
/// (fighting drivers, charge sharing).
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

/// <summary>Whether an overlap of two clocked gates no longer than the clocks' complement skew counts as conducting together.</summary>
internal enum SkewOverlapCounts
{
    Yes,
    No,
}
