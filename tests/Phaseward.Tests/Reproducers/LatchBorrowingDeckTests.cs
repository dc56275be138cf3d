using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW4003 decks. Reference: the deck run in ngspice (batch mode); the estimate it is compared with is the borrowing
/// arrival (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10, time borrowing; section from memory) with
/// 0.69·R·C per stage. Flat test process, a 1 ns clock at 50 % with no skew: windows of 500 ps, dynamic latches with
/// a setup of 34.5 ps, so the data must arrive within 465.5 ps of the latch opening.
/// </summary>
public class LatchBorrowingDeckTests
{
    [Fact]
    public void TheBorrowedTimeCarriedToTheNextStageMakesTheDataArriveTooLate()
    {
        // L1 → L2 with 20 inverters: L2 borrows 141.7 ps; L2 → L3 with 27: 34.5 + 141.7 + 29 · 27.6 − 500 = 476.6 ps
        // after L3 opens, against 465.5 ps: slack −11.1 ps.
        var c = Figures.NewCircuit("BorrowTest");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var net = c.DynamicLatch(c.Input("d"), clk.High, "L1");
        for (var i = 0; i < 20; i++) net = c.Inverter(net);
        net = c.DynamicLatch(net, clk.Low, "L2");
        for (var i = 0; i < 27; i++) net = c.Inverter(net);
        c.DynamicLatch(net, clk.High, "L3");
        var report = Checker.Check(c.ToNetlist());
        var deck = Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.LatchBorrowing.Id), report.Netlist);
        var measured = Ngspice.Run(deck);

        Assert.Equal(476.6e-12, deck.Estimates.Single(e => e.Name == "t_arrival").Value, 15);
        Assert.Equal(-11.1e-12, deck.Estimates.Single(e => e.Name == "slack").Value, 15);
        var arrival = measured.Value("t_arrival", deck);
        Assert.InRange(arrival, 476.6e-12 * 0.9, 476.6e-12 * 1.1);
        Assert.Equal(465.5e-12 - arrival, measured.Value("slack", deck), 13);
    }
}
