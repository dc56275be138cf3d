using System;
using System.Collections.Generic;
using Phaseward.Storage;

namespace Phaseward.Clocking;

/// <summary>
/// When a pass gate on a phase conducts, within one period of its root clock (time 0 = the root clock's rising edge).
/// </summary>
/// <remarks>
/// Model (first order, nominal edges): a clock of period T, duty D, delay d from its root, and a complement that
/// arrives s later than the true clock (its complement skew). A transmission gate on the High phase has its nMOS on
/// the clock and its pMOS on the complement, so it conducts while either is on: from the clock's rise at d until the
/// complement's rise at d + D·T + s. Likewise the Low phase conducts from d + D·T until d + T + s. The two windows
/// therefore overlap twice per period, for s each: the 0-0 overlap after the falling edge (clock already low,
/// complement still low) and the 1-1 overlap after the rising edge (clock already high, complement still high).
/// </remarks>
public sealed class PhaseWindow
{
    private PhaseWindow(Phase phase, Time period, Time opens, Time length)
    {
        Phase = phase;
        Period = period;
        Opens = opens;
        Length = length;
    }

    public Phase Phase { get; }

    /// <summary>The root clock's period: the circle these windows live on.</summary>
    public Time Period { get; }

    /// <summary>When the phase starts to conduct, in [0, Period).</summary>
    public Time Opens { get; }

    /// <summary>How long it conducts per period (less than the period).</summary>
    public Time Length { get; }

    /// <summary>When it stops conducting; may lie beyond <see cref="Period"/> (the window wraps).</summary>
    public Time Closes => Opens + Length;

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
        var opens = phase.Polarity == ClockPolarity.High ? clock.DelayFromRoot : clock.DelayFromRoot + highTime;
        var length = (phase.Polarity == ClockPolarity.High ? highTime : period - highTime) + skew;
        return new Arc(Wrap(opens, period), length);
    }

    /// <summary>True if both phases come from the same root clock, so their windows can be compared.</summary>
    public bool SharesRootWith(PhaseWindow other) => ReferenceEquals(Phase.Clock.Root, other.Phase.Clock.Root);

    /// <summary>The intervals (within one period) during which both phases conduct. Empty for unrelated clocks.</summary>
    public IReadOnlyList<TimeInterval> OverlapWith(PhaseWindow other)
    {
        if (other is null) throw new ArgumentNullException(nameof(other));
        var overlaps = new List<TimeInterval>(2);
        if (!SharesRootWith(other))
            return overlaps;

        // Compare against the other window shifted by -T, 0 and +T: windows are shorter than T, so that covers every wrap.
        for (var shift = -1; shift <= 1; shift++)
        {
            var start = Time.Max(Opens, other.Opens + Period * shift);
            var end = Time.Min(Closes, other.Closes + Period * shift);
            if (end > start)
                overlaps.Add(new TimeInterval(Wrap(start, Period), Wrap(start, Period) + (end - start)));
        }

        overlaps.Sort((a, b) => a.Start.CompareTo(b.Start));
        return overlaps;
    }

    /// <summary>Total time per period during which both phases conduct.</summary>
    public Time TotalOverlapWith(PhaseWindow other)
    {
        var total = Time.Zero;
        foreach (var interval in OverlapWith(other))
            total += interval.Length;
        return total;
    }

    public override string ToString() => $"{Phase.Name}: [{Opens}, {Closes}) of {Period}";

    private static Time Wrap(Time t, Time period)
    {
        var wrapped = t.Seconds % period.Seconds;
        return new Time(wrapped < 0 ? wrapped + period.Seconds : wrapped);
    }
}
