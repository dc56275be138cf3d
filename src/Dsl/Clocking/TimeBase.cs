using System;

namespace Phaseward.Clocking;

/// <summary>
/// Which clocks share the design's time line, and over which common cycle they repeat together.
/// </summary>
/// <remarks>
/// Every clock lives on one time line: a root clock rises at its offset, a derived clock at its root's offset plus
/// its delay from the root. Two clocks are related when they come from the same root, or when neither is declared
/// independent and their periods are in the ratio of two small integers (at most <see cref="MaxRatioTerm"/>); their
/// windows then repeat together every common cycle (the least common multiple of the periods). Clocks that are not
/// related have no fixed time relation: data crossing between them is PW1003's business, and the clock-phase and
/// timing rules do not compare their windows.
/// </remarks>
public static class TimeBase
{
    /// <summary>The largest integer accepted in the ratio of two periods (p/q with p, q ≤ this).</summary>
    public const int MaxRatioTerm = 64;

    // Relative tolerance when matching a period ratio to p/q (periods are entered as decimal figures).
    private const double RatioTolerance = 1e-9;

    /// <summary>True when the two clocks have a fixed time relation (see the remarks).</summary>
    public static bool Related(Clock a, Clock b) => CommonCycle(a, b) is not null;

    /// <summary>The time after which both clocks repeat together, or null when they are not related.</summary>
    public static Time? CommonCycle(Clock a, Clock b)
    {
        if (a is null) throw new ArgumentNullException(nameof(a));
        if (b is null) throw new ArgumentNullException(nameof(b));
        if (ReferenceEquals(a.Root, b.Root))
            return a.Period;
        if (a.IsIndependent || b.IsIndependent)
            return null;
        return CommonMultiple(a.Period, b.Period);
    }

    /// <summary>The least common multiple of two periods whose ratio is p/q with p, q ≤ <see cref="MaxRatioTerm"/>, else null.</summary>
    public static Time? CommonMultiple(Time a, Time b)
    {
        var ratio = a.Seconds / b.Seconds; // a/b = p/q  ⇒  q·a = p·b
        for (var q = 1; q <= MaxRatioTerm; q++)
        {
            var p = Math.Round(ratio * q);
            if (p < 1 || p > MaxRatioTerm)
                continue;
            if (Math.Abs(ratio * q - p) <= RatioTolerance * p)
                return new Time(a.Seconds * q);
        }

        return null;
    }
}
