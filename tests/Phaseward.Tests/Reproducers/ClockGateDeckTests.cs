using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW1004 decks. Reference: the deck run in ngspice (batch mode); the estimates it is compared with are Phaseward's
/// first-order delays (0.69·R·C per stage: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design
/// Perspective", 2nd ed., ch. 5, from memory) and the clock's nominal edges. That an enable moving while the gate
/// passes the clock clips the gated pulse is common practice. Flat test process: t_TG = 34.5 ps, t_inv = 27.6 ps; a
/// 10 ns clock is high over [0, 5 ns).
/// </summary>
public class ClockGateDeckTests
{
    private static SpiceDeck DeckOf(System.Action<Circuit> describe, RulePolicy? policy = null)
    {
        var c = Figures.NewCircuit("GateTest");
        describe(c);
        var report = Checker.Check(c.ToNetlist(), Checker.Rules, policy);
        return Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.ClockGateEnable.Id), report.Netlist);
    }

    [Fact]
    public void AnEnableFromARegisterMovesAfterTheRisingEdgeAndClipsTheFirstPulse()
    {
        // The slave opens at the rising edge (10 ns in the deck's second period): entry 34.5 ps + output 27.6 ps.
        var deck = DeckOf(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.StaticRegister(c.Input("want"), clk, "en_reg"), name: "gclk");
        });
        var measured = Ngspice.Run(deck);

        Assert.Equal(62.1e-12, deck.Estimates.Single(e => e.Name == "t_enable").Value, 15);
        Assert.Contains("* estimate w_pulse = ", deck.Text);
        Assert.InRange(measured.Value("t_enable", deck), 62.1e-12 * 0.9, 62.1e-12 * 1.15);
        Assert.InRange(measured.Value("w_pulse", deck), 5e-9 - 62.1e-12 * 1.3, 5e-9 - 62.1e-12 * 0.7);
        Assert.Equal(1, measured.Value("clipped", deck));
    }

    [Fact]
    public void AGateThatStopsHighIsClippedByALatchOpeningAsTheClockFalls()
    {
        // It passes the clock while it is low, [5 ns, 10 ns); the latch on clk.Low opens at 5 ns: entry 34.5 ps, its
        // output stage and an inverter 2 × 27.6 ps = 89.7 ps.
        var deck = DeckOf(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.Inverter(c.StaticLatch(c.Input("a"), clk.Low, "wrong")), ClockStopLevel.High, name: "g");
        });
        var measured = Ngspice.Run(deck);

        Assert.Equal(89.7e-12, deck.Estimates.Single(e => e.Name == "t_enable").Value, 15);
        Assert.InRange(measured.Value("t_enable", deck), 89.7e-12 * 0.9, 89.7e-12 * 1.15);
        Assert.InRange(measured.Value("w_pulse", deck), 5e-9 - 89.7e-12 * 1.3, 5e-9 - 89.7e-12 * 0.7);
        Assert.Equal(1, measured.Value("clipped", deck));
    }

    [Fact]
    public void AnInputTakenAsChangingAtAnyTimeIsDrivenInTheMiddleOfTheWindow()
    {
        var deck = DeckOf(c => c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("enable"), name: "gclk"),
            new RulePolicy { EnablesFromInputsMayChange = true });
        var measured = Ngspice.Run(deck);

        Assert.DoesNotContain("t_enable", deck.Text);
        Assert.InRange(measured.Value("w_pulse", deck), 2.5e-9 * 0.98, 2.5e-9 * 1.02);
        Assert.Equal(1, measured.Value("clipped", deck));
    }
}
