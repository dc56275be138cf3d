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
}
