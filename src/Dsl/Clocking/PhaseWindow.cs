using System;
using System.Collections.Generic;
using Phaseward.Storage;

namespace Phaseward.Clocking;

/// <summary>
/// When a pass gate on a phase conducts, on the design's time base (see <see cref="TimeBase"/>): it opens at
/// <see cref="Opens"/> and then every <see cref="Period"/>.
/// </summary>
/// <remarks>
/// Model (first order, nominal edges): a clock of period T, duty D, rising at r on the time base (its root's offset
/// plus its delay from the root), and a complement that arrives s later than the true clock (its complement skew).
/// A transmission gate on the High phase has its nMOS on the clock and its pMOS on the complement, so it conducts
/// while either is on: from the clock's rise at r until the complement's rise at r + D·T + s. Likewise the Low phase
/// conducts from r + D·T until r + T + s. The two windows of one clock therefore overlap twice per period, for s
/// each: the 0-0 overlap after the falling edge (clock already low, complement still low) and the 1-1 overlap after
/// the rising edge (clock already high, complement still high). Windows of two related clocks are compared over their
/// common cycle; windows of unrelated clocks are never compared.
/// </remarks>
public sealed class PhaseWindow
{
    /// <summary>Times closer than this fraction of the common cycle are one instant (edges are entered as decimal
    /// figures, so window arithmetic lands a rounding error either side of an exact touch or tie).</summary>
    internal const double Tolerance = 1e-9;

    private PhaseWindow(Phase phase, Time period, Time opens, Time length)
    {
        Phase = phase;
        Period = period;
        Opens = opens;
        Length = length;
    }

    /// <summary>The phase this window belongs to.</summary>
    public Phase Phase { get; }

    /// <summary>The clock's period: the window opens once per period.</summary>
    public Time Period { get; }

    /// <summary>When the phase starts to conduct, in [0, Period) on the design's time base.</summary>
    public Time Opens { get; }

    /// <summary>How long it conducts per period (less than the period).</summary>
    public Time Length { get; }

    /// <summary>When it stops conducting; may lie beyond <see cref="Period"/> (the window wraps).</summary>
    public Time Closes => Opens + Length;

    /// <summary>The transparency window of <paramref name="phase"/> on its clock's time line.</summary>
    public static PhaseWindow Of(Phase phase)
    {
        if (phase is null) throw new ArgumentNullException(nameof(phase));
        var arc = ArcOf(phase);
        return new PhaseWindow(phase, phase.Clock.Period, arc.Opens, arc.Length);
    }

    /// <summary>The window's opening and length, as <see cref="Of"/> computes them but without allocating a window
    /// (the storage models need one per pass driver).</summary>
    internal static Arc ArcOf(Phase phase)
    {
        var clock = phase.Clock;
        var period = clock.Period;
        var skew = clock.ComplementSkew;
        var highTime = period * clock.Duty;
        var opens = phase.Polarity == ClockPolarity.High ? clock.RisingEdge : clock.RisingEdge + highTime;
        var length = (phase.Polarity == ClockPolarity.High ? highTime : period - highTime) + skew;
        return new Arc(Wrap(opens, period), length);
    }

    /// <summary>How long the phase is nominally active per period, without the complement's lateness.</summary>
    public Time NominalLength => Length - Phase.Clock.ComplementSkew;

    /// <summary>True if both phases come from the same root clock.</summary>
    public bool SharesRootWith(PhaseWindow other) => ReferenceEquals(Phase.Clock.Root, other.Phase.Clock.Root);

    /// <summary>The common cycle of the two windows' clocks, or null when the clocks are not related (see <see cref="TimeBase"/>).</summary>
    public Time? CommonCycleWith(PhaseWindow other)
    {
        if (other is null) throw new ArgumentNullException(nameof(other));
        return TimeBase.CommonCycle(Phase.Clock, other.Phase.Clock);
    }

    /// <summary>The intervals (within the common cycle) during which both phases conduct. Empty for unrelated clocks.</summary>
    public IReadOnlyList<TimeInterval> OverlapWith(PhaseWindow other)
    {
        if (other is null) throw new ArgumentNullException(nameof(other));
        var overlaps = new List<TimeInterval>(2);
        if (CommonCycleWith(other) is not { } cycle)
            return overlaps;

        var c = cycle.Seconds;
        for (var i = 0; i < Repeats(cycle); i++)
        {
            var opens = Opens.Seconds + i * Period.Seconds;
            for (var j = -1; j <= other.Repeats(cycle); j++)
            {
                var otherOpens = other.Opens.Seconds + j * other.Period.Seconds;
                var start = Math.Max(opens, otherOpens);
                var end = Math.Min(opens + Length.Seconds, otherOpens + other.Length.Seconds);
                if (end - start > Tolerance * c)
                {
                    var wrapped = Wrap(new Time(start), cycle);
                    overlaps.Add(new TimeInterval(wrapped, wrapped + new Time(end - start)));
                }
            }
        }

        overlaps.Sort((a, b) => a.Start.CompareTo(b.Start));
        for (var k = overlaps.Count - 1; k > 0; k--)
            if (Math.Abs(overlaps[k].Start.Seconds - overlaps[k - 1].Start.Seconds) <= Tolerance * c)
                overlaps.RemoveAt(k);
        return overlaps;
    }

    /// <summary>Total time per common cycle during which both phases conduct.</summary>
    public Time TotalOverlapWith(PhaseWindow other)
    {
        var total = Time.Zero;
        foreach (var interval in OverlapWith(other))
            total += interval.Length;
        return total;
    }

    /// <summary>The longest stretch during which both phases conduct without a break (zero for unrelated clocks).</summary>
    public Time LongestOverlapWith(PhaseWindow other)
    {
        var longest = Time.Zero;
        foreach (var interval in OverlapWith(other))
            longest = Time.Max(longest, interval.Length);
        return longest;
    }

    /// <summary>
    /// How long <paramref name="late"/> still conducts after this phase opens, the worst over the openings in the
    /// common cycle, at most this window's length (zero when it is shut at every opening, or the clocks are not related).
    /// </summary>
    public Time StillOpenAfterOpening(PhaseWindow late)
    {
        if (late is null) throw new ArgumentNullException(nameof(late));
        if (CommonCycleWith(late) is not { } cycle)
            return Time.Zero;
        var worst = 0.0;
        for (var i = 0; i < Repeats(cycle); i++)
        {
            var since = Modulo(Opens.Seconds + i * Period.Seconds - late.Opens.Seconds, late.Period.Seconds, Tolerance * cycle.Seconds);
            var open = Math.Min(late.Length.Seconds - since, Length.Seconds);
            // A window that closes as this one opens (a rounding error either side) is shut at the opening.
            if (open > Tolerance * cycle.Seconds)
                worst = Math.Max(worst, open);
        }

        return new Time(worst);
    }

    /// <summary>
    /// The shortest time from an opening of this phase to the next opening of <paramref name="next"/> (a full period
    /// of <paramref name="next"/> when they open together), over the openings in the common cycle; null when the
    /// clocks are not related.
    /// </summary>
    public Time? TimeToNextOpeningOf(PhaseWindow next)
    {
        if (next is null) throw new ArgumentNullException(nameof(next));
        if (CommonCycleWith(next) is not { } cycle)
            return null;
        var shortest = double.PositiveInfinity;
        for (var i = 0; i < Repeats(cycle); i++)
        {
            var gap = Modulo(next.Opens.Seconds - (Opens.Seconds + i * Period.Seconds), next.Period.Seconds, Tolerance * cycle.Seconds);
            shortest = Math.Min(shortest, gap == 0 ? next.Period.Seconds : gap);
        }

        return new Time(shortest);
    }

    /// <inheritdoc/>
    public override string ToString() => $"{Phase.Name}: [{Opens}, {Closes}) every {Period}";

    // How many times this window opens in the common cycle.
    private int Repeats(Time cycle) => Math.Max(1, (int)Math.Round(cycle.Seconds / Period.Seconds));

    // x mod m in [0, m), values within eps of 0 or m read as 0.
    private static double Modulo(double x, double m, double eps)
    {
        var r = x % m;
        if (r < 0) r += m;
        return r <= eps || m - r <= eps ? 0 : r;
    }

    private static Time Wrap(Time t, Time period)
    {
        var wrapped = t.Seconds % period.Seconds;
        return new Time(wrapped < 0 ? wrapped + period.Seconds : wrapped);
    }
}
