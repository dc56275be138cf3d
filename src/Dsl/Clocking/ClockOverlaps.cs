namespace Phaseward.Clocking;

/// <summary>The two overlap windows of a clock and its late complement (see <see cref="PhaseWindow"/>).</summary>
public sealed class ClockOverlaps
{
    private ClockOverlaps(Clock clock, TimeInterval oneOne, TimeInterval zeroZero)
    {
        Clock = clock;
        OneOne = oneOne;
        ZeroZero = zeroZero;
    }

    /// <summary>The clock whose true and complement overlap.</summary>
    public Clock Clock { get; }

    /// <summary>Clock and complement both high, after the rising edge: both phases' pass gates conduct.</summary>
    public TimeInterval OneOne { get; }

    /// <summary>Clock and complement both low, after the falling edge: both phases' pass gates conduct.</summary>
    public TimeInterval ZeroZero { get; }

    /// <summary>The 1-1 and 0-0 overlaps of <paramref name="clock"/>, from its complement skew.</summary>
    public static ClockOverlaps Of(Clock clock)
    {
        var high = PhaseWindow.Of(clock.High);
        var low = PhaseWindow.Of(clock.Low);
        var skew = clock.ComplementSkew;
        // The Low window opens at the falling edge: the 0-0 overlap starts there; the 1-1 overlap starts where High opens.
        return new ClockOverlaps(clock, new TimeInterval(high.Opens, high.Opens + skew), new TimeInterval(low.Opens, low.Opens + skew));
    }
}
