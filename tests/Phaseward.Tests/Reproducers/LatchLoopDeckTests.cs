using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW4005 decks. Reference: the deck run in ngspice (batch mode); the estimate it is compared with is the loop's delay
/// Σ (entry + path) with 0.69·R·C per stage, against the steady-state latch-loop constraint (Sakallah, Mudge &amp;
/// Olukotun 1990, from memory): round a loop the delays may not exceed the time the phases give it. Flat test process,
/// a 1 ns clock at 50 % with no skew.
/// </summary>
public class LatchLoopDeckTests
{
    [Fact]
    public void TheDataComesBackRoundLaterThanThePeriodAllows()
    {
        // P(High) → 31 inverters → Q(Low) → Q's inverter and one more → P: 207 + 31 · 27.6 = 1062.6 ps round against
        // 1 ns: 62.6 ps more borrowed every time round. The data reaches Q 34.5 + 33 · 27.6 = 945.3 ps after P opens,
        // inside Q's window (P opens at 0, Q is open over [500, 1000) ps), and comes back after P has opened again.
        var c = Figures.NewCircuit("LoopTest");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var start = c.Node("start");
        var net = c.DynamicLatch(start, clk.High, "P");
        for (var i = 0; i < 31; i++) net = c.Inverter(net);
        var q = c.DynamicLatch(net, clk.Low, "Q");
        c.Inverter(q, start);
        var report = Checker.Check(c.ToNetlist());
        var deck = Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.LatchLoop.Id), report.Netlist);
        var measured = Ngspice.Run(deck);

        Assert.Equal(1062.6e-12, deck.Estimates.Single(e => e.Name == "t_round").Value, 14);
        Assert.Equal(62.6e-12, deck.Estimates.Single(e => e.Name == "growth").Value, 14);
        var round = measured.Value("t_round", deck);
        Assert.InRange(round, 1062.6e-12 * 0.97, 1062.6e-12 * 1.03);
        Assert.InRange(measured.Value("growth", deck), 62.6e-12 - 1062.6e-12 * 0.03, 62.6e-12 + 1062.6e-12 * 0.03); // > 0: it gains
    }
}
