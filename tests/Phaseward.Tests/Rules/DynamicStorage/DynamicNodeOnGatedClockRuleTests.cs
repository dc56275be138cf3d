using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Storage;

namespace Phaseward.Tests.Rules.DynamicStorage;

/// <summary>
/// PW3001. Default (illustrative) process: a latch's storage node is 1 fF wire + 1.5 fF pass-gate diffusion + 2 fF
/// inverter gate = 4.5 fF; with ΔV = 0.3 V (a quarter of the 1.2 V supply) and the hot-corner leakage 1 nA,
/// t_ret = 4.5 fF × 0.3 V / 1 nA = 1.35 µs (common practice: Q = C·V, t = Q/I).
/// </summary>
public class DynamicNodeOnGatedClockRuleTests
{
    private static readonly Rule Rule = new DynamicNodeOnGatedClockRule();

    private static (Netlist Netlist, Finding[] Findings) Check(Action<Circuit> describe)
    {
        var c = new Circuit("buoy");
        describe(c);
        var netlist = c.ToNetlist();
        return (netlist, Checker.Check(netlist, new[] { Rule }).Findings.ToArray());
    }

    [Fact]
    public void DynamicLatchOnAClockStoppedLowIsReportedWithItsFigures()
    {
        Clock? gate = null;
        var (netlist, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            gate = c.ClockGate(clk, c.Input("burst"), ClockStopLevel.Low, name: "burst_clk");
            c.DynamicLatch(c.Input("sample"), gate.High, "hold");
        });

        var finding = Assert.Single(findings);
        Assert.Equal("PW3001", finding.RuleId);
        Assert.Equal(
            "Dynamic node 'hold.x' floats while gated clock 'burst_clk' is stopped low (declared maximum idle time: unbounded), "
            + "but keeps its level only 1.35 µs (C·ΔV/I_leak with C = 4.5 fF, ΔV = 300 mV, I_leak = 1 nA at the hot corner)",
            finding.Message);
        Assert.Equal(netlist.Devices.Single(d => d.Name == "hold.pass").Span, finding.Location);
        Assert.Equal(gate!.Span, Assert.Single(finding.RelatedLocations));
        Assert.Equal("hold.x", finding.Properties[FindingPropertyKeys.Node]);
        Assert.Equal("DynamicLatch", finding.Properties[FindingPropertyKeys.Cell]);
        Assert.Equal("hold", finding.Properties[FindingPropertyKeys.CellName]);
        Assert.Equal("StaticLatch", finding.Properties[FindingPropertyKeys.StaticReplacement]);
        Assert.Equal("burst_clk", finding.Properties[FindingPropertyKeys.GatedClock]);
        Assert.Equal("clk", finding.Properties[FindingPropertyKeys.UngatedClock]);
        Assert.Equal("clk", finding.Properties[FindingPropertyKeys.RootClock]);
        Assert.Equal("unbounded", finding.Properties[FindingPropertyKeys.IdleSeconds]);
        Assert.Equal(1.35e-6, double.Parse(finding.Properties[FindingPropertyKeys.RetentionSeconds], System.Globalization.CultureInfo.InvariantCulture), 1e-15);
    }

    [Fact]
    public void TheExampleInTheRuleDocumentation()
    {
        // docs/rules/PW3001.md (invented burst-sampling scenario).
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("sample", 100.Nanoseconds());
            var burst = c.ClockGate(clk, c.Input("burst_enable"), ClockStopLevel.Low, maxIdle: 2.Seconds(), name: "burst_clk");
            c.DynamicLatch(c.Input("comparator"), burst.High, "hold");
        });
        Assert.Equal(
            "Dynamic node 'hold.x' floats while gated clock 'burst_clk' is stopped low (declared maximum idle time: 2 s, so it "
            + "floats up to 2 s with the clock periods around the stop and the restart), "
            + "but keeps its level only 1.35 µs (C·ΔV/I_leak with C = 4.5 fF, ΔV = 300 mV, I_leak = 1 nA at the hot corner)",
            Assert.Single(findings).Message);
    }

    [Theory]
    [InlineData(ClockStopLevel.Low, ClockPolarity.High, true)]
    [InlineData(ClockStopLevel.Low, ClockPolarity.Low, false)]
    [InlineData(ClockStopLevel.High, ClockPolarity.Low, true)]
    [InlineData(ClockStopLevel.High, ClockPolarity.High, false)]
    public void OnlyTheStopLevelThatShutsTheLatchIsReported(ClockStopLevel stop, ClockPolarity transparent, bool reported)
    {
        var (_, findings) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), stop);
            c.DynamicLatch(c.Input("d"), gated[transparent], "l");
        });
        Assert.Equal(reported ? 1 : 0, findings.Length);
        if (reported) Assert.Contains($"stopped {stop.ToString().ToLowerInvariant()}", findings[0].Message);
    }

    [Theory]
    [InlineData(1.0, false, null)]       // 1 µs < 1.35 µs
    [InlineData(1.34, false, null)]      // just shorter
    [InlineData(1.36, true, "1.36 µs")]  // just longer: the limit is tested from above too
    [InlineData(1000.0, true, "1 ms")]   // 1 ms > 1.35 µs
    public void DeclaredIdleTimeIsComparedWithRetention(double idleUs, bool reported, string? idleText)
    {
        var (_, findings) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, idleUs.Microseconds());
            c.DynamicLatch(c.Input("d"), gated.High, "l");
        });
        Assert.Equal(reported ? 1 : 0, findings.Length);
        if (reported)
        {
            Assert.Contains($"declared maximum idle time: {idleText}", findings[0].Message);
            Assert.Contains("keeps its level only 1.35 µs", findings[0].Message);
            var idleSeconds = double.Parse(findings[0].Properties[FindingPropertyKeys.IdleSeconds], System.Globalization.CultureInfo.InvariantCulture);
            Assert.Equal(idleUs * 1e-6, idleSeconds, 1e-15);
        }
    }

    [Theory]
    [InlineData(ClockStopLevel.Low)]
    [InlineData(ClockStopLevel.High)]
    public void StaticLatchesAndRegistersKeepTheirBitWhenTheClockStops(ClockStopLevel stop)
    {
        var (_, findings) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), stop);
            var d = c.Input("d");
            c.StaticLatch(d, gated.High, "a");
            c.StaticLatch(d, gated.Low, "b");
            c.StaticRegister(d, gated, "r");
        });
        Assert.Empty(findings);
    }

    [Fact]
    public void DynamicLatchOnAnUngatedClockIsNotThisRulesBusiness()
    {
        var (_, findings) = Check(c => c.DynamicLatch(c.Input("d"), c.Clock("clk", 10.Nanoseconds()).High, "l"));
        Assert.Empty(findings);
    }

    [Theory]
    [InlineData(ClockStopLevel.Low, "r.slave.x")]
    [InlineData(ClockStopLevel.High, "r.master.x")]
    public void DynamicRegisterLosesTheLatchWhosePhaseIsHeldOff(ClockStopLevel stop, string node)
    {
        var (netlist, findings) = Check(c =>
        {
            var gated = c.ClockGate(c.BufferedClock(c.Clock("clk", 10.Nanoseconds()), name: "clk_buf"), c.Input("en"), stop, name: "g");
            c.DynamicRegister(c.Input("d"), gated, "r");
        });
        var finding = Assert.Single(findings);
        Assert.Equal(node, finding.Properties[FindingPropertyKeys.Node]);
        Assert.Equal("DynamicRegister", finding.Properties[FindingPropertyKeys.Cell]);
        Assert.Equal("r", finding.Properties[FindingPropertyKeys.CellName]);
        Assert.Equal("StaticRegister", finding.Properties[FindingPropertyKeys.StaticReplacement]);
        Assert.Equal("clk_buf", finding.Properties[FindingPropertyKeys.UngatedClock]);
        Assert.Equal("clk", finding.Properties[FindingPropertyKeys.RootClock]);
        Assert.Equal(netlist.Macros.Single(m => m.Name == "r").Span, finding.Location);
    }

    [Fact]
    public void PerNodeLeakageAndCapacitanceOverridesChangeTheVerdict()
    {
        // 1 µs idle against 1.35 µs: clean. 10 nA on the node: 4.5 fF × 0.3 V / 10 nA = 135 ns < 1 µs: reported.
        var (_, leaky) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 1.Microseconds());
            c.DynamicLatch(c.Input("d"), gated.High, "l");
            c.SetLeakage(c.Node("other"), 10.Nanoamperes()); // an override on another net changes nothing here
        });
        Assert.Empty(leaky);

        var (_, withLeak) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 1.Microseconds());
            var node = c.Node("x");
            c.TransmissionGate(c.Input("d"), gated.High, node);
            c.Inverter(node, "q");
            c.SetLeakage(node, 10.Nanoamperes());
        });
        var finding = Assert.Single(withLeak);
        Assert.Contains("keeps its level only 135 ns", finding.Message);
        Assert.Contains("I_leak = 10 nA", finding.Message);
        Assert.False(finding.Properties.ContainsKey(FindingPropertyKeys.Cell));

        // A 100 fF storage capacitor: 100 fF × 0.3 V / 10 nA = 3 µs > 1 µs: clean again.
        var (_, withCap) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 1.Microseconds());
            var node = c.Node("x");
            c.TransmissionGate(c.Input("d"), gated.High, node);
            c.Inverter(node, "q");
            c.SetLeakage(node, 10.Nanoamperes());
            c.SetCapacitance(node, 100.Femtofarads());
        });
        Assert.Empty(withCap);
    }

    [Theory]
    // 20 ns clock, 30 ps skew: a High-phase node floats L = 10 ns − 30 ps per period while it runs, and up to that long
    // before the stop (since its last refresh) and after the restart (until its window opens): idle + 2·L = idle + 19.94 ns
    // against t_ret = 1.35 µs (common practice: the node floats from its last refresh to its next one).
    [InlineData(1.33, false)] // 1.34994 µs ≤ 1.35 µs
    [InlineData(1.34, true)]  // 1.35994 µs > 1.35 µs, though the idle time alone is shorter than t_ret
    public void TheFloatAroundTheStopAndTheRestartCounts(double idleUs, bool reported)
    {
        var (netlist, findings) = Check(c =>
        {
            var gated = c.ClockGate(c.Clock("clk", 20.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, idleUs.Microseconds(), "g");
            c.DynamicLatch(c.Input("d"), gated.High, "l");
        });
        var stopped = StorageIsolation.WhileStopped(StorageNodes.Of(netlist).Single())!;
        Assert.Equal(2 * (10e-9 - 30e-12), stopped.AroundStopAndRestart.Seconds, 1e-18);
        Assert.Equal(reported ? 1 : 0, findings.Length);
        if (reported)
            Assert.Contains("(declared maximum idle time: 1.34 µs, so it floats up to 1.36 µs with the clock periods around the stop and the restart)", findings[0].Message);
    }

    [Fact]
    public void TheProcessFiguresFeedTheEstimate()
    {
        var (_, findings) = Check(c =>
        {
            c.UseProcess(new Process { StorageLeakage = 1.Picoamperes(), ToleratedDroop = 0.2.Volts() });
            var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 1.Milliseconds());
            c.DynamicLatch(c.Input("d"), gated.High, "l");
        });
        // 4.5 fF × 0.2 V / 1 pA = 900 µs < 1 ms: reported, with the process's figures.
        var finding = Assert.Single(findings);
        Assert.Contains("keeps its level only 900 µs (C·ΔV/I_leak with C = 4.5 fF, ΔV = 200 mV, I_leak = 1 pA at the hot corner)", finding.Message);
    }

    [Fact]
    public void RunsFromTheRuleSetAndTheCatalog()
    {
        Assert.Contains(Checker.Rules, r => r is DynamicNodeOnGatedClockRule);
        Assert.Same(RuleCatalog.DynamicNodeOnGatedClock, RuleCatalog.Find("PW3001"));
        Assert.Equal(Severity.Warning, RuleCatalog.DynamicNodeOnGatedClock.DefaultSeverity);
        Assert.Equal("Phaseward.DynamicStorage", RuleCatalog.DynamicNodeOnGatedClock.Category);
    }
}
