using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Tests.Reference;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW2001 decks. Reference: the deck run in ngspice (ngspice-39, batch mode). The estimate is ln 2 × the Elmore
/// delay (W. C. Elmore, J. Appl. Phys. 19(1), 1948); for a long uniform RC ladder the true 50 % point is nearer
/// 0.76 × Elmore (common practice; see tests/reference/ngspice/rc_ladder_t50.csv), so the deck is expected within
/// 15 % of it, on the slow side.
/// </summary>
public class PassGateChainDeckTests
{
    [Theory]
    [InlineData(6)]
    [InlineData(12)]
    public void TheDecksT50IsWithinFifteenPercentOfTheFiftyPercentEstimate(int gates)
    {
        var c = new Circuit("ChainTest");
        var select = c.Input("sel");
        var x = c.Inverter(c.Input("d"), "drive");
        for (var i = 0; i < gates; i++)
            x = c.TransmissionGate(x, select, "g" + i.ToString(CultureInfo.InvariantCulture));
        c.Inverter(x, "q");
        var report = Checker.Check(c.ToNetlist(), new RulePolicy { MaxSeriesPassGates = 3 });
        var finding = report.Findings.Single(f => f.RuleId == "PW2001");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var estimate = deck.Estimates.Single(e => e.Name == "t50").Value;
        var stated = double.Parse(finding.Properties[FindingPropertyKeys.FiftyPercentDelaySeconds], CultureInfo.InvariantCulture);
        Assert.Equal(stated, estimate);
        Assert.Contains("* estimate t50 = " + estimate.ToString("R", CultureInfo.InvariantCulture), deck.Text);
        Assert.Equal(gates, deck.Text.Split('\n').Count(l => l.StartsWith("X", System.StringComparison.Ordinal) && l.Contains(" pw_tg ")));

        var t50 = Ngspice.Run(deck).Value("t50", deck);
        Assert.InRange(t50, estimate * 0.85, estimate * 1.15);
    }

    // A run broken by phases (hop on sample.High → mux1, mux2 on 'route' → leg1, leg2 on sample.Low, limit 3): the deck
    // is the conducting sub-run alone, mux1..leg2 driven from hop's output through the 4 kΩ driver resistance, the
    // ladder of tests/reference/ngspice/netlists/rc_tree_phase_break.cir (Elmore 244 ps by hand; ngspice t50 185.0 ps).
    [Fact]
    public void ThePhaseBrokenSubRunsDeckIsTheLadderOfTheSubRun()
    {
        var report = Checker.Check(PhaseBrokenRun.Circuit().ToNetlist(), new RulePolicy { MaxSeriesPassGates = 3 });
        var finding = report.Findings.Single(f => f.RuleId == "PW2001");

        var deck = Reproducer.Deck(finding, report.Netlist);
        Assert.Equal(4, deck.Text.Split('\n').Count(l => l.StartsWith("X", System.StringComparison.Ordinal) && l.Contains(" pw_tg ")));
        Assert.Equal(0.69 * 244e-12, deck.Estimates.Single(e => e.Name == "t50").Value, 1e-21);
        var t50 = Ngspice.Run(deck).Value("t50", deck);
        Assert.Equal(NgspiceReference.TreeT50("rc_tree_phase_break", "l2"), t50, 0.01 * t50);
    }
}
