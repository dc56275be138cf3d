using System;
using System.Linq;
using Phaseward.Clocking;

namespace Phaseward.Tests.Clocking;

/// <summary>
/// Transparency windows and overlaps, checked against a brute-force evaluation of the clock waveforms: sample the
/// clock and its late complement on a fine grid and ask, at each instant, whether a transmission gate on each phase
/// conducts (nMOS on the phase's true signal OR pMOS on its complement: common practice for a complementary pass gate).
/// </summary>
public class PhaseWindowTests
{
    private const int Samples = 200_000;

    [Theory]
    [InlineData(1.0, 0.5, 30, 0)]
    [InlineData(4.0, 0.3, 100, 0)]
    [InlineData(2.0, 0.6, 50, 700)]
    [InlineData(1.0, 0.5, 0, 250)]
    public void WindowsAndOverlapsMatchTheSampledWaveforms(double periodNs, double duty, double skewPs, double bufferDelayPs)
    {
        var circuit = new Circuit("windows");
        var root = circuit.Clock("clk", periodNs.Nanoseconds(), duty, skewPs.Picoseconds());
        var clock = bufferDelayPs > 0 ? circuit.BufferedClock(root, bufferDelayPs.Picoseconds()) : root;

        var high = PhaseWindow.Of(clock.High);
        var low = PhaseWindow.Of(clock.Low);

        var period = periodNs * 1e-9;
        var dt = period / Samples;
        int highOn = 0, lowOn = 0, both = 0;
        for (var i = 0; i < Samples; i++)
        {
            var t = (i + 0.5) * dt;
            var clk = IsHigh(t - bufferDelayPs * 1e-12, period, duty);
            var clkBar = !IsHigh(t - bufferDelayPs * 1e-12 - skewPs * 1e-12, period, duty); // complement arrives late
            var highConducts = clk || !clkBar;
            var lowConducts = !clk || clkBar;
            if (highConducts) highOn++;
            if (lowConducts) lowOn++;
            if (highConducts && lowConducts) both++;
            Assert.Equal(highConducts, Inside(high, t));
            Assert.Equal(lowConducts, Inside(low, t));
        }

        Assert.Equal(highOn * dt, high.Length.Seconds, 2 * dt);
        Assert.Equal(lowOn * dt, low.Length.Seconds, 2 * dt);
        Assert.Equal(both * dt, high.TotalOverlapWith(low).Seconds, 4 * dt);
        Assert.Equal(2 * skewPs * 1e-12, high.TotalOverlapWith(low).Seconds, 1e-18);
    }

    [Fact]
    public void OneOneOverlapFollowsTheRisingEdgeAndZeroZeroTheFallingEdge()
    {
        var circuit = new Circuit("overlaps");
        var clock = circuit.Clock("clk", 1.Nanoseconds(), 0.5, 40.Picoseconds());

        var overlaps = ClockOverlaps.Of(clock);

        Assert.Equal(0, overlaps.OneOne.Start.Seconds, 1e-18);
        Assert.Equal(40e-12, overlaps.OneOne.Length.Seconds, 1e-18);
        Assert.Equal(0.5e-9, overlaps.ZeroZero.Start.Seconds, 1e-18);
        Assert.Equal(40e-12, overlaps.ZeroZero.Length.Seconds, 1e-18);
        var intervals = PhaseWindow.Of(clock.High).OverlapWith(PhaseWindow.Of(clock.Low));
        Assert.Equal(new[] { 0.0, 0.5e-9 }, intervals.Select(i => Math.Round(i.Start.Seconds, 15)).ToArray());
    }

    [Fact]
    public void GatedClocksKeepTheirSourcesWindowsAndUnrelatedClocksNeverOverlap()
    {
        var circuit = new Circuit("derived");
        var clock = circuit.Clock("clk", 1.Nanoseconds());
        var gated = circuit.ClockGate(clock, circuit.Input("en"));
        var other = circuit.Clock("aux", 1.Nanoseconds(), independent: true);

        Assert.Equal(PhaseWindow.Of(clock.High).Opens, PhaseWindow.Of(gated.High).Opens);
        Assert.Equal(PhaseWindow.Of(clock.High).Length, PhaseWindow.Of(gated.High).Length);
        Assert.Empty(PhaseWindow.Of(clock.High).OverlapWith(PhaseWindow.Of(other.High)));
        Assert.Equal(PhaseWindow.Of(clock.High).Length, PhaseWindow.Of(clock.High).TotalOverlapWith(PhaseWindow.Of(gated.High)));
    }

    private static bool IsHigh(double t, double period, double duty)
    {
        var phase = t % period;
        if (phase < 0) phase += period;
        return phase < duty * period;
    }

    private static bool Inside(PhaseWindow window, double t)
    {
        var opens = window.Opens.Seconds;
        var closes = window.Closes.Seconds;
        var period = window.Period.Seconds;
        return (t >= opens && t < closes) || (t + period >= opens && t + period < closes);
    }

    // Exact ties, entered as decimal figures, found by the clock-window property test (ClockWindowPropertyTests) once
    // its clocks could have no skew: window arithmetic lands a rounding error either side of the tie, and the answer
    // must be the exact one. Waveforms worked by hand (no skew: a gate on High conducts exactly while the clock is high).
    [Fact]
    public void WindowsThatTouchOrOverlapExactlyByTheAllowanceAreReadAtTheTie()
    {
        var c = new Circuit("ties");
        // 'slow' (1 ns, no skew, rising at 400 ps) is high over [400, 900) ps; 'late' (1 ns, 30 ps skew, rising at
        // 400 ps) has its Low window [900, 1430) ps. late.Low opens at 900 ps exactly as slow.High closes: nothing of
        // slow.High is still open at that opening (the race an overlap opens has nothing to run through).
        var slow = c.Clock("slow", 1.Nanoseconds(), 0.5, 0.Picoseconds(), 400.Picoseconds());
        var late = c.Clock("late", 1.Nanoseconds(), 0.5, 30.Picoseconds(), 400.Picoseconds());
        Assert.Equal(Time.Zero, PhaseWindow.Of(late.Low).StillOpenAfterOpening(PhaseWindow.Of(slow.High)));
        Assert.Equal(30e-12, PhaseWindow.Of(slow.High).StillOpenAfterOpening(PhaseWindow.Of(late.Low)).Seconds, 1e-21);

        // 'edge' (2 ns, no skew, rising at 750 ps) is low over [1750, 2750) ps; its copy buffered by 250 ps is high over
        // [1000, 2000) ps: together for exactly 250 ps, a quarter of the 1 ns windows, the allowance itself: not
        // transparent together (PW1001 asks for longer), a short overlap.
        var edge = c.Clock("edge", 2.Nanoseconds(), 0.5, 0.Picoseconds(), 750.Picoseconds());
        var copy = c.BufferedClock(edge, 250.Picoseconds());
        Assert.Equal(250e-12, PhaseWindow.Of(copy.High).LongestOverlapWith(PhaseWindow.Of(edge.Low)).Seconds, 1e-21);
        Assert.Equal(WindowRelation.ShortOverlap, WindowRelations.Of(copy.High, edge.Low));
    }
}
