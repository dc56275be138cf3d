using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Rules.PassGatePaths;

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
}
