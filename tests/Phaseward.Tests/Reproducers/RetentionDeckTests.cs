using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW3001 and PW3002 decks. Reference: the deck run in ngspice (ngspice-39, batch mode); the stated retention is
/// t_ret = C·ΔV/I_leak (the capacitor equation I = C·dV/dt at constant current; common practice).
/// </summary>
public class RetentionDeckTests
{
    [Fact]
    public void APw3001DecksRetentionIsWithinTenPercentOfTheStatedOne()
    {
        var c = new Circuit("GatedTest");
        var clk = c.Clock("clk", 10.Nanoseconds());
        var gated = c.ClockGate(clk, c.Input("en"), name: "gclk");
        c.Inverter(c.DynamicLatch(c.Input("d"), gated.High, "hold"), "q");
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.Single(f => f.RuleId == "PW3001");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var stated = double.Parse(finding.Properties[FindingPropertyKeys.RetentionSeconds], CultureInfo.InvariantCulture);
        Assert.Equal(stated, deck.Estimates.Single(e => e.Name == "t_ret").Value);
        var tRet = Ngspice.Run(deck).Value("t_ret", deck);
        Assert.InRange(tRet, stated * 0.9, stated * 1.1);
    }

    [Fact]
    public void APw3002DecksRetentionIsWithinTenPercentOfTheStatedOne()
    {
        var c = new Circuit("SlowTest");
        var clk = c.Clock("clk", 2.Milliseconds());
        c.Inverter(c.DynamicLatch(c.Input("d"), clk.High, "hold"), "q");
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.Single(f => f.RuleId == "PW3002");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var stated = double.Parse(finding.Properties[FindingPropertyKeys.RetentionSeconds], CultureInfo.InvariantCulture);
        Assert.Equal(stated, deck.Estimates.Single(e => e.Name == "t_ret").Value);
        var measured = Ngspice.Run(deck);
        var tRet = measured.Value("t_ret", deck);
        Assert.InRange(tRet, stated * 0.9, stated * 1.1);
        // The node floats 1 ms per period, longer than its retention: its level falls below vdd - ΔV before the refresh.
        Assert.True(measured.Value("v_min", deck) < 1.2 - 0.3);
    }
}
