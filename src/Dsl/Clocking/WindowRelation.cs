using System;

namespace Phaseward.Clocking;

/// <summary>How the transparency windows of two phases lie on the design's time base.</summary>
public enum WindowRelation
{
    /// <summary>The clocks have no fixed time relation (independent, or periods not in a small-integer ratio).</summary>
    Unrelated,

    /// <summary>Never transparent together.</summary>
    Apart,

    /// <summary>Transparent together only briefly (1-1 and 0-0 overlaps, partial overlaps of shifted clocks): a race
    /// that a long enough path survives (PW1002).</summary>
    ShortOverlap,

    /// <summary>Transparent together for longer than the overlap allowance: in effect the same phase (PW1001).</summary>
    TransparentTogether,
}

/// <summary>Classifies pairs of windows (see <see cref="WindowRelation"/>).</summary>
public static class WindowRelations
{
    /// <summary>
    /// The overlap allowance as a fraction of the shorter window: two phases transparent together without a break
    /// for longer than this are treated as one phase. A fixed convention of Phaseward (not from a source): it keeps
    /// complement skew and shifted copies (overlaps of a few gate delays) in the race check, and a copy of a phase
    /// delayed by much less than its window with it.
    /// </summary>
    public const double OverlapAllowanceFraction = 0.25;

    /// <summary>The overlap allowance of two windows: <see cref="OverlapAllowanceFraction"/> of the shorter.</summary>
    public static Time OverlapAllowance(PhaseWindow a, PhaseWindow b)
    {
        if (a is null) throw new ArgumentNullException(nameof(a));
        if (b is null) throw new ArgumentNullException(nameof(b));
        return Time.Min(a.Length, b.Length) * OverlapAllowanceFraction;
    }

    /// <summary>How windows <paramref name="a"/> and <paramref name="b"/> lie on the common time line.</summary>
    public static WindowRelation Of(PhaseWindow a, PhaseWindow b)
    {
        if (a is null) throw new ArgumentNullException(nameof(a));
        if (b is null) throw new ArgumentNullException(nameof(b));
        if (a.CommonCycleWith(b) is not { } cycle)
            return WindowRelation.Unrelated;
        var longest = a.LongestOverlapWith(b);
        if (longest <= Time.Zero)
            return WindowRelation.Apart;
        // An overlap exactly as long as the allowance is within it, whatever rounding the window arithmetic left.
        return longest.Seconds > OverlapAllowance(a, b).Seconds + PhaseWindow.Tolerance * cycle.Seconds
            ? WindowRelation.TransparentTogether
            : WindowRelation.ShortOverlap;
    }

    /// <summary>The relation of two phases' windows.</summary>
    public static WindowRelation Of(Phase a, Phase b) => Of(PhaseWindow.Of(a), PhaseWindow.Of(b));
}
