using System;
using System.Linq;
using Phaseward.Clocking;
using Phaseward.Netlists;
using Phaseward.Storage;

namespace Phaseward.Tests.Storage;

/// <summary>
/// How long storage nodes float. Running isolation is checked against closed forms (a node refreshed only by a High
/// transmission gate floats for (1 − D)·T − s: the Low time minus the complement skew that stretches the High window,
/// common practice) and against a brute-force sampling of the clock waveforms.
/// </summary>
public class StorageIsolationTests
{
    [Theory]
    [InlineData(1.0, 0.5, 30)]
    [InlineData(10.0, 0.25, 100)]
    [InlineData(3.0, 0.7, 0)]
    public void NodeOnOnePhaseFloatsForTheOtherPhaseLessTheSkew(double periodUs, double duty, double skewPs)
    {
        var c = new Circuit("one-phase");
        var clk = c.Clock("clk", periodUs.Microseconds(), duty, skewPs.Picoseconds());
        var d = c.Input("d");
        var high = c.TransmissionGate(d, clk.High, "h");
        var low = c.TransmissionGate(d, clk.Low, "l");
        var netlist = c.ToNetlist();

        var t = periodUs * 1e-6;
        var s = skewPs * 1e-12;
        Assert.Equal((1 - duty) * t - s, StorageIsolation.WhileRunning(StorageNodes.Find(netlist, high)!)!.Longest.Seconds, t * 1e-9);
        Assert.Equal(duty * t - s, StorageIsolation.WhileRunning(StorageNodes.Find(netlist, low)!)!.Longest.Seconds, t * 1e-9);
    }

    [Fact]
    public void StaticLatchAndTwoPhaseNodesNeverFloatWhileTheClockRuns()
    {
        var c = new Circuit("covered");
        var clk = c.Clock("clk", 1.Microseconds(), 0.5, 0.Picoseconds()); // windows that just touch
        var d = c.Input("d");
        c.StaticLatch(d, clk.High, "s");
        var both = c.Node("both");
        c.TransmissionGate(d, clk.High, both);
        c.TransmissionGate(c.Inverter(d), clk.Low, both);
        var netlist = c.ToNetlist();

        Assert.Equal(Time.Zero, StorageIsolation.WhileRunning(StorageNodes.Of(netlist).Single(n => n.Net.Name == "s.x"))!.Longest);
        Assert.Equal(Time.Zero, StorageIsolation.WhileRunning(StorageNodes.Find(netlist, both)!)!.Longest);
    }

    [Fact]
    public void DataControlledDriversNeverCountAsRefresh()
    {
        var c = new Circuit("data");
        var clk = c.Clock("clk", 1.Microseconds());
        var d = c.Input("d");
        var sel = c.Input("sel");
        var onlyData = c.TransmissionGate(d, sel, "mux");
        var mixed = c.TransmissionGate(d, clk.High, "mixed");
        c.TransmissionGate(d, sel, mixed);
        var netlist = c.ToNetlist();

        Assert.Null(StorageIsolation.WhileRunning(StorageNodes.Find(netlist, onlyData)!));
        Assert.Null(StorageIsolation.WhileStopped(StorageNodes.Find(netlist, onlyData)!));
        Assert.Equal(0.5e-6 - 30e-12, StorageIsolation.WhileRunning(StorageNodes.Find(netlist, mixed)!)!.Longest.Seconds, 1e-18);
    }

    [Fact]
    public void LongestGapMatchesSampledWaveformsForBufferedClocks()
    {
        var c = new Circuit("sampled");
        var clk = c.Clock("clk", 2.Nanoseconds(), 0.4, 50.Picoseconds());
        var late = c.BufferedClock(clk, 300.Picoseconds());
        var d = c.Input("d");
        var node = c.TransmissionGate(d, clk.High, "n");
        c.TransmissionGate(d, late.High, node);
        var netlist = c.ToNetlist();

        var isolation = StorageIsolation.WhileRunning(StorageNodes.Find(netlist, node)!)!;

        // Brute force: sample both gates' conduction (nMOS on the clock OR pMOS on the late complement: common
        // practice for a complementary pass gate) and measure the longest run with both off, around the circle.
        const int samples = 400_000;
        double period = 2e-9, duty = 0.4, skew = 50e-12, dt = period / samples;
        bool IsHigh(double t) => ((t % period) + period) % period < duty * period;
        // clock high, or its complement (arriving skew later) still low
        bool Conducts(double t, double delay) => IsHigh(t - delay) || IsHigh(t - delay - skew);
        var off = Enumerable.Range(0, samples).Select(i => (i + 0.5) * dt).Select(t => !Conducts(t, 0) && !Conducts(t, 300e-12)).ToArray();
        int longest = 0, run = 0;
        for (var i = 0; i < 2 * samples; i++)
        {
            run = off[i % samples] ? run + 1 : 0;
            longest = Math.Max(longest, Math.Min(run, samples));
        }

        Assert.Equal(longest * dt, isolation.Longest.Seconds, 2 * dt);
        // Closed form: off from the late gate's close (0.3 + 0.8 + 0.05 ns) to the next rising edge (2 ns): 0.85 ns.
        Assert.Equal(0.85e-9, isolation.Longest.Seconds, 1e-18);
    }

    [Fact]
    public void DriversOnSeveralRootsFloatOnlyAsLongAsTheBestRootAllows()
    {
        var c = new Circuit("roots");
        var slow = c.Clock("slow", 10.Microseconds());
        var fast = c.Clock("fast", 1.Microseconds());
        var d = c.Input("d");
        var node = c.TransmissionGate(d, slow.High, "n");
        c.TransmissionGate(d, fast.High, node);
        var netlist = c.ToNetlist();

        var isolation = StorageIsolation.WhileRunning(StorageNodes.Find(netlist, node)!)!;
        Assert.Same(fast, isolation.Root);
        Assert.Equal(0.5e-6 - 30e-12, isolation.Longest.Seconds, 1e-18);
    }

    [Fact]
    public void WindowAtTheActualPeriodIsThePhaseWindow()
    {
        var c = new Circuit("formula");
        var clk = c.Clock("clk", 3.Nanoseconds(), 0.3, 70.Picoseconds());
        var gated = c.ClockGate(clk, c.Input("en"));
        var buffered = c.BufferedClock(gated, 400.Picoseconds());
        foreach (var phase in new[] { clk.High, clk.Low, gated.High, buffered.Low, buffered.High })
        {
            var window = PhaseWindow.Of(phase);
            var arc = StorageIsolation.WindowAtPeriod(phase, clk.Period);
            Assert.Equal(window.Opens.Seconds, arc.Opens.Seconds % clk.Period.Seconds, 1e-21);
            Assert.Equal(window.Length.Seconds, arc.Length.Seconds, 1e-21);
        }
    }

    [Fact]
    public void LowestSafeFrequencyMatchesTheClosedForm()
    {
        // High-phase node: isolation (1 − D)·T − s ≤ t_ret  ⇔  T ≤ (t_ret + s)/(1 − D) (common practice).
        var c = new Circuit("slow");
        var clk = c.Clock("clk", 1.Milliseconds(), 0.5, 30.Picoseconds());
        var node = c.TransmissionGate(c.Input("d"), clk.High, "n");
        c.Inverter(node);
        var storage = StorageNodes.Find(c.ToNetlist(), node)!;
        var retention = storage.Retention.Time; // 4.5 fF × 0.3 V / 1 nA = 1.35 µs
        Assert.Equal(1.35e-6, retention.Seconds, 1e-18);

        var isolation = StorageIsolation.WhileRunning(storage)!;
        var exact = 0.5 / (1.35e-6 + 30e-12); // 370.362 kHz
        var reported = isolation.LowestSafeFrequency(retention)!.Value;
        Assert.Equal(371_000, reported.Hertz, 1e-6); // rounded up to three significant digits
        Assert.True(reported.Hertz >= exact);
        Assert.True(isolation.LongestAtPeriod(reported.ToPeriod()) <= retention);
        Assert.True(isolation.LongestAtPeriod(new Time(1.0 / (exact * 0.999))) > retention);
        Assert.Null(isolation.LowestSafeFrequency(1.Seconds()));
    }

    [Theory]
    [InlineData(ClockStopLevel.Low, ClockPolarity.High, true)]
    [InlineData(ClockStopLevel.Low, ClockPolarity.Low, false)]
    [InlineData(ClockStopLevel.High, ClockPolarity.Low, true)]
    [InlineData(ClockStopLevel.High, ClockPolarity.High, false)]
    public void AStoppedClockHoldsTheOtherPhaseOff(ClockStopLevel level, ClockPolarity polarity, bool heldOff)
    {
        var c = new Circuit("stop");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var gated = c.ClockGate(clk, c.Input("en"), level);
        var buffered = c.BufferedClock(gated);
        Assert.Equal(heldOff ? gated : null, StorageIsolation.GateHoldingOff(gated[polarity]));
        Assert.Equal(heldOff ? gated : null, StorageIsolation.GateHoldingOff(buffered[polarity]));
        Assert.Null(StorageIsolation.GateHoldingOff(clk[polarity]));
    }

    [Fact]
    public void NestedGatesTheOuterOneCanStillHoldAPhaseOff()
    {
        var c = new Circuit("nested");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var outer = c.ClockGate(clk, c.Input("en1"), ClockStopLevel.Low, 2.Milliseconds(), "outer");
        var inner = c.ClockGate(outer, c.Input("en2"), ClockStopLevel.High, 5.Milliseconds(), "inner");
        Assert.Same(outer, StorageIsolation.GateHoldingOff(inner.High));
        Assert.Same(inner, StorageIsolation.GateHoldingOff(inner.Low));
    }

    [Fact]
    public void StoppedIsolationIsBoundedByTheShortestIdleOfTheGatesInvolved()
    {
        var c = new Circuit("two-gates");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var g1 = c.ClockGate(clk, c.Input("en1"), ClockStopLevel.Low, null, "g1");
        var g2 = c.ClockGate(clk, c.Input("en2"), ClockStopLevel.Low, 3.Milliseconds(), "g2");
        var d = c.Input("d");
        var node = c.TransmissionGate(d, g1.High, "n");
        c.TransmissionGate(d, g2.High, node);
        var held = c.TransmissionGate(d, g1.High, "held");
        c.TransmissionGate(d, g2.Low, held); // g2 stopped low keeps this one open
        var running = c.TransmissionGate(d, g1.High, "running");
        c.TransmissionGate(d, clk.High, running); // the free-running clock keeps refreshing it
        var netlist = c.ToNetlist();

        var stopped = StorageIsolation.WhileStopped(StorageNodes.Find(netlist, node)!)!;
        Assert.Equal(new[] { g2, g1 }, stopped.Gates.ToArray());
        Assert.Equal(3e-3, stopped.IdleBound!.Value.Seconds, 1e-15);
        Assert.Null(StorageIsolation.WhileStopped(StorageNodes.Find(netlist, held)!));
        Assert.Null(StorageIsolation.WhileStopped(StorageNodes.Find(netlist, running)!));
    }

    [Fact]
    public void BuffersReusedFromNodeToNodeGiveTheFiguresOfAFreshComputation()
    {
        // Consistency check of the rules' allocation-free path against the public one (whose figures the tests above
        // check against closed forms and sampled waveforms): a node with two root clocks and wrapping windows first,
        // so that anything left over in the buffers would change the nodes after it.
        var c = new Circuit("reuse");
        var fast = c.Clock("fast", 1.Nanoseconds(), 0.3, 40.Picoseconds());
        var late = c.BufferedClock(fast, 800.Picoseconds());
        var slow = c.Clock("slow", 5.Nanoseconds(), 0.6, 100.Picoseconds());
        var d = c.Input("d");
        var sel = c.Input("sel");
        var mixed = c.TransmissionGate(d, late.Low, "mixed");
        c.TransmissionGate(d, slow.High, mixed);
        c.TransmissionGate(d, fast.High, mixed);
        c.TransmissionGate(d, sel, mixed);
        c.TransmissionGate(d, fast.Low, "single");
        c.TransmissionGate(d, sel, "data");
        c.StaticLatch(d, slow.Low, "latch");
        var netlist = c.ToNetlist();

        var buffers = new ArcBuffers();
        var nodes = StorageNodes.Of(netlist);
        Assert.True(nodes.Count >= 4);
        foreach (var node in nodes)
        {
            var fresh = StorageIsolation.WhileRunning(node);
            var reused = StorageIsolation.WhileRunning(node, buffers);
            Assert.Equal(fresh?.Longest, reused?.Longest);
            Assert.Same(fresh?.Root, reused?.Root);
            Assert.Equal(fresh?.Drivers ?? Array.Empty<Device>(), reused?.Drivers ?? Array.Empty<Device>());
        }
    }
}
