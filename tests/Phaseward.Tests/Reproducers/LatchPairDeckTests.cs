using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW1001 and PW1002 decks. Reference: the deck run in ngspice (ngspice-39, batch mode). PW1001: in the deck as
/// written the data passes both latches inside one phase; with fix_phase = 1 (the second latch on the complementary
/// phase, the two-phase discipline: Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10, from memory) it does not.
/// </summary>
public class LatchPairDeckTests
{
    [Fact]
    public void APw1001DeckShowsDataPassingBothLatchesInOnePhaseAndTheFixedDeckDoesNot()
    {
        var c = new Circuit("SameWindowTest");
        var clk = c.Clock("clk", 4.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        c.Inverter(c.DynamicLatch(c.Inverter(a), clk.High, "B"), "q");
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.Single(f => f.RuleId == "PW1001");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var racing = Ngspice.Run(deck);
        Assert.Equal(1, racing.Value("race_through", deck));
        Assert.Equal(1, deck.Estimates.Single(e => e.Name == "race_through").Value);
        Assert.True(racing.Value("t_through", deck) < 2e-9, "the data reaches B well inside the 2 ns phase");

        var fixedDeck = deck.WithParameter("fix_phase", "1");
        var held = Ngspice.Run(fixedDeck);
        Assert.Equal(0, held.Value("race_through", fixedDeck));
        Assert.True(held.Value("t_through", fixedDeck) > 1.9e-9, "B waits for the complementary phase");
    }

    [Fact]
    public void APw1002DeckShowsTheRaceThroughTheOverlap()
    {
        var c = new Circuit("OverlapTest");
        c.UseProcess(new Process { ComplementSkew = 150.Picoseconds() });
        var clk = c.Clock("clk", 4.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        c.Inverter(c.DynamicLatch(a, clk.Low, "B"), "q");
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.Single(f => f.RuleId == "PW1002");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var measured = Ngspice.Run(deck);
        var estimate = deck.Estimates.Single(e => e.Name == "t_through").Value;
        Assert.Equal(1, deck.Estimates.Single(e => e.Name == "race_through").Value);
        Assert.Equal(1, measured.Value("race_through", deck));
        Assert.True(measured.Value("t_through", deck) < 150e-12, "the data reaches B inside the 150 ps overlap");
        Assert.InRange(measured.Value("t_through", deck), estimate * 0.5, estimate * 2);
    }
}
