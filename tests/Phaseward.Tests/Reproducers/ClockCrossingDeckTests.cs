using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW1003 decks. Reference: the deck run in ngspice (batch mode). That a latch sampling data which changes as it closes
/// can be left undecided (metastable) is common practice (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10,
/// synchronizers; from memory); the deck draws the receiving clock at the moment Phaseward's first-order delays
/// (0.69·R·C per stage) put the change at the close. Flat test process: t_TG = 34.5 ps, t_inv = 27.6 ps.
/// </summary>
public class ClockCrossingDeckTests
{
    [Fact]
    public void TheReceivingLatchClosesWhileTheCrossingDataIsHalfWay()
    {
        // sample's entry 34.5 ps, its output inverter and two more (3 × 27.6 ps), tx's entry 34.5 ps: 151.8 ps after
        // sample opens, when the deck closes tx (radio is declared independent).
        var c = Figures.NewCircuit("CrossTest");
        var sensor = c.Clock("sensor", 4.Nanoseconds());
        var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);
        var net = c.DynamicLatch(c.Input("height"), sensor.High, "sample");
        for (var i = 0; i < 2; i++) net = c.Inverter(net);
        c.DynamicLatch(net, radio.Low, "tx");
        var report = Checker.Check(c.ToNetlist());
        var deck = Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.ClockCrossing.Id), report.Netlist);
        var measured = Ngspice.Run(deck);

        Assert.Contains("shifted", deck.Text);
        Assert.InRange(measured.Value("v_at_close", deck), 1.2 * 0.2, 1.2 * 0.8);
        Assert.Equal(1, measured.Value("undecided", deck));
    }
}
