using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Reproducers;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW4001 and PW4002 decks. Reference: the deck run in ngspice (ngspice-39, batch mode). The constraints checked are
/// T_c ≥ t_pcq + t_pd + t_setup and t_cd ≥ t_hold + t_skew (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10,
/// from memory); the deck simulates the same path, so its slack has the estimate's sign. Its arrival time is checked
/// within a factor of 2 only: the estimate adds 0.69·R·C per stage, each stage on its own, while the deck charges the
/// stages as one coupled RC path (slower).
/// </summary>
public class RegisterPathDeckTests
{
    private static (Netlist Netlist, Finding Finding) Pipeline(double periodPs, int inverters, double captureDelayPs, string ruleId)
    {
        var c = Phaseward.Tests.Rules.ClockPhases.Figures.NewCircuit("RegisterTest");
        var clk = c.Clock("clk", periodPs.Picoseconds(), 0.5, 30.Picoseconds());
        var capture = captureDelayPs > 0 ? c.BufferedClock(clk, captureDelayPs.Picoseconds(), "late") : clk;
        var net = c.DynamicRegister(c.Input("d"), clk, "R1");
        for (var i = 0; i < inverters; i++) net = c.Inverter(net);
        c.DynamicRegister(net, capture, "R2");
        var report = Checker.Check(c.ToNetlist());
        return (report.Netlist, report.Findings.Single(f => f.RuleId == ruleId));
    }

    [Fact]
    public void APw4001DeckMissesItsSetupTimeAsEstimated()
    {
        var (netlist, finding) = Pipeline(240, 6, 0, "PW4001");
        var deck = Reproducer.Deck(finding, netlist);
        var measured = Ngspice.Run(deck);

        var estimate = deck.Estimates.Single(e => e.Name == "slack").Value;
        Assert.Equal(double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], CultureInfo.InvariantCulture), estimate);
        var arrival = deck.Estimates.Single(e => e.Name == "t_arrival").Value;
        var simulated = measured.Value("t_arrival", deck);
        Assert.True(estimate < 0 && measured.Value("slack", deck) < 0, $"slack: estimate {estimate}, simulated {measured.Value("slack", deck)}");
        Assert.InRange(simulated, arrival * 0.5, arrival * 2);
    }

    [Fact]
    public void APw4002DeckLosesItsHoldMarginAsEstimated()
    {
        var (netlist, finding) = Pipeline(1000, 1, 250, "PW4002");
        var deck = Reproducer.Deck(finding, netlist);
        var measured = Ngspice.Run(deck);

        var estimate = deck.Estimates.Single(e => e.Name == "slack").Value;
        var arrival = deck.Estimates.Single(e => e.Name == "t_arrival").Value;
        var simulated = measured.Value("t_arrival", deck);
        Assert.True(estimate < 0 && measured.Value("slack", deck) < 0, $"slack: estimate {estimate}, simulated {measured.Value("slack", deck)}");
        Assert.InRange(simulated, arrival * 0.5, arrival * 2);
    }
}
