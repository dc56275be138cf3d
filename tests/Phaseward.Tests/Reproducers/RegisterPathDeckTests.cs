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

    [Fact]
    public void AtA150PsCaptureDelayTheSimulatorAgreesThatHoldFailsAndTheRuleIsTheConservativeOne()
    {
        // Hold time t_overlap1-1 − t_T1 = 30 − 34.5 = −4.5 ps (Rabaey, Chandrakasan & Nikolić, 2nd ed., ch. 7, clock
        // overlap, from memory); t_ccq + t_cd = 62.1 + 27.6 = 89.7 ps against −4.5 + 150 ps: slack −55.8 ps
        // (t_ccq + t_cd ≥ t_hold + t_skew: Weste & Harris, 4th ed., ch. 10, from memory). ngspice (batch mode, this deck)
        // with the data settled at the slave's input before the edge, the earliest case a hold check is about:
        // t_arrival ≈ 118.5 ps, slack ≈ −27.0 ps. Same sign; the estimate is lower (earlier) because each stage is
        // taken as a step response charging its own net only (the last inverter does not see the capturing master's
        // storage node behind the open gate): a lower bound of every minimum delay, which a hold check must use.
        // (A deck that drove the launching master's output at the edge, the latest case, simulated +19.7 ps.)
        var (netlist, finding) = Pipeline(1000, 1, 150, "PW4002");
        var deck = Reproducer.Deck(finding, netlist);
        var measured = Ngspice.Run(deck);

        var estimate = deck.Estimates.Single(e => e.Name == "slack").Value;
        Assert.Equal(-55.8e-12, estimate, 1e-16);
        var simulated = measured.Value("slack", deck);
        Assert.InRange(simulated, -40e-12, -15e-12);
        Assert.True(estimate < simulated, $"the rule must be the conservative one: estimate {estimate}, simulated {simulated}");
        Assert.InRange(measured.Value("t_arrival", deck), 89.7e-12, 2 * 89.7e-12);
    }
}
