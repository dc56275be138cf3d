using System;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Tests.Rules.DynamicStorage;

/// <summary>
/// PW3002. A High-phase dynamic latch floats for (1 − D)·T − s per period (the Low time less the complement skew;
/// common practice), against t_ret = 1.35 µs for the default 4.5 fF node (see <see cref="DynamicNodeOnGatedClockRuleTests"/>).
/// The lowest safe frequency is then (1 − D)/(t_ret + s), rounded up to three significant digits.
/// </summary>
public class ClockTooSlowForDynamicStorageRuleTests
{
    private static readonly Rule Rule = new ClockTooSlowForDynamicStorageRule();

    private static Finding[] Check(Action<Circuit> describe)
    {
        var c = new Circuit("buoy");
        describe(c);
        return Checker.Check(c.ToNetlist(), new[] { Rule }).Findings.ToArray();
    }

    [Fact]
    public void SlowClockIsReportedWithTheLowestSafeFrequency()
    {
        Clock? clk = null;
        var findings = Check(c =>
        {
            clk = c.Clock("tick", 1.Milliseconds());
            c.DynamicLatch(c.Input("d"), clk.High, "l");
        });

        var finding = Assert.Single(findings);
        // Isolation 500 µs − 30 ps; f_min = 0.5 / (1.35 µs + 30 ps) = 370.362 kHz → 371 kHz.
        Assert.Equal(
            "Dynamic node 'l.x' floats for up to 500 µs of every 1 ms period of clock 'tick', longer than its retention time 1.35 µs "
            + "(C·ΔV/I_leak with C = 4.5 fF, ΔV = 300 mV, I_leak = 1 nA at the hot corner); run the clock at 371 kHz or faster",
            finding.Message);
        Assert.Equal(clk!.Span, Assert.Single(finding.RelatedLocations));
        var hertz = double.Parse(finding.Properties[FindingPropertyKeys.MinimumFrequencyHertz], CultureInfo.InvariantCulture);
        Assert.Equal(371_000, hertz, 1e-6);
        Assert.Equal(500e-6 - 30e-12, double.Parse(finding.Properties[FindingPropertyKeys.IsolationSeconds], CultureInfo.InvariantCulture), 1e-15);
        Assert.Equal("tick", finding.Properties[FindingPropertyKeys.RootClock]);
        Assert.Equal("StaticLatch", finding.Properties[FindingPropertyKeys.StaticReplacement]);
    }

    [Theory]
    [InlineData(371_000.0, false)] // the reported frequency is safe
    [InlineData(370_400.0, false)] // just above 370.362 kHz
    [InlineData(370_300.0, true)]  // just below
    [InlineData(100.0, true)]
    [InlineData(10_000_000.0, false)]
    public void TheBoundaryIsWhereIsolationEqualsRetention(double hertz, bool reported)
    {
        var findings = Check(c => c.DynamicLatch(c.Input("d"), c.Clock("tick", new Frequency(hertz).ToPeriod()).High, "l"));
        Assert.Equal(reported ? 1 : 0, findings.Length);
    }

    [Fact]
    public void DutyDecidesWhichLatchFloatsLonger()
    {
        // D = 0.25 at 2 µs: the High latch floats 1.5 µs − 30 ps (> 1.35 µs), the Low latch 500 ns − 30 ps (< 1.35 µs).
        var findings = Check(c =>
        {
            var clk = c.Clock("tick", 2.Microseconds(), 0.25);
            var d = c.Input("d");
            c.DynamicLatch(d, clk.High, "hi");
            c.DynamicLatch(d, clk.Low, "lo");
        });
        var finding = Assert.Single(findings);
        Assert.Equal("hi.x", finding.Properties[FindingPropertyKeys.Node]);
        Assert.Contains("floats for up to 1.5 µs", finding.Message);
        // f_min = 0.75 / (1.35 µs + 30 ps) = 555.543 kHz → 556 kHz.
        Assert.Contains("run the clock at 556 kHz or faster", finding.Message);
    }

    [Fact]
    public void StaticLatchesNeverFloatHoweverSlowTheClock()
    {
        var findings = Check(c =>
        {
            var clk = c.Clock("tick", 1.Seconds());
            var d = c.Input("d");
            c.StaticLatch(d, clk.High, "a");
            c.StaticRegister(d, clk, "r");
        });
        Assert.Empty(findings);
    }

    [Fact]
    public void BothLatchesOfASlowDynamicRegisterAreReported()
    {
        var findings = Check(c => c.DynamicRegister(c.Input("d"), c.Clock("tick", 2.Milliseconds()), "r"));
        Assert.Equal(new[] { "r.master.x", "r.slave.x" }, findings.Select(f => f.Properties[FindingPropertyKeys.Node]).ToArray());
        Assert.All(findings, f => Assert.Equal("StaticRegister", f.Properties[FindingPropertyKeys.StaticReplacement]));
    }

    [Fact]
    public void AGatedClockIsJudgedByItsRootsPeriodWhileItRuns()
    {
        var findings = Check(c =>
        {
            var root = c.Clock("tick", 1.Milliseconds());
            var gated = c.ClockGate(root, c.Input("en"), ClockStopLevel.High, 10.Microseconds(), "g");
            c.DynamicLatch(c.Input("d"), gated.High, "l");
        });
        var finding = Assert.Single(findings);
        Assert.Contains("of clock 'tick'", finding.Message);
    }

    [Fact]
    public void LeakageOverrideMakesAFastClockTooSlow()
    {
        // 4.5 fF × 0.3 V / 2 nA = 675 ns < 5 µs − 30 ps: reported; f_min = 0.5 / (675 ns + 30 ps) = 740.71 kHz → 741 kHz.
        var findings = Check(c =>
        {
            var node = c.Node("x");
            c.TransmissionGate(c.Input("d"), c.Clock("tick", 10.Microseconds()).High, node);
            c.Inverter(node, "q");
            c.SetLeakage(node, 2.Nanoamperes());
        });
        var finding = Assert.Single(findings);
        Assert.Contains("retention time 675 ns", finding.Message);
        Assert.Contains("run the clock at 741 kHz or faster", finding.Message);
        Assert.False(finding.Properties.ContainsKey(FindingPropertyKeys.Cell));
    }
}
