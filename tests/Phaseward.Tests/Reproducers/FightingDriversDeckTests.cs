using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW3004 decks. Reference: the deck run in ngspice (batch mode); the estimates it is compared with are the divider
/// V·R2/(R1+R2) and the current V/(R1+R2) of two resistances in series across the supply (Ohm's law). Illustrative
/// process: V = 1.2 V, drivers (and primary inputs) 4 kΩ, pass gates 5 kΩ.
/// </summary>
public class FightingDriversDeckTests
{
    private static (SpiceDeck Deck, MeasuredValues Measured) Run(System.Action<Circuit> describe)
    {
        var c = new Circuit("FightTest");
        describe(c);
        var report = Checker.Check(c.ToNetlist());
        var deck = Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.FightingDrivers.Id), report.Netlist);
        return (deck, Ngspice.Run(deck));
    }

    [Fact]
    public void TwoRequestLinesSettleAtTheDividerLevelWithTheStatedCurrent()
    {
        // 9 kΩ each side: 600 mV and 1.2 V / 18 kΩ = 66.7 µA.
        var (deck, measured) = Run(c =>
        {
            var bus = c.Node("bus");
            c.TransmissionGate(c.Input("a"), c.Input("ra"), bus);
            c.TransmissionGate(c.Input("b"), c.Input("rb"), bus);
            c.Inverter(bus, "q");
        });

        Assert.Equal(0.6, deck.Estimates.Single(e => e.Name == "v_fight").Value, 9);
        Assert.InRange(measured.Value("v_fight", deck), 0.6 * 0.98, 0.6 * 1.02);
        Assert.InRange(System.Math.Abs(measured.Value("i_fight", deck)), 1.2 / 18e3 * 0.98, 1.2 / 18e3 * 1.02);
    }

    [Fact]
    public void AnInverterAgainstAPassGateIsAnUnequalDivider()
    {
        // The inverter's 4 kΩ pulls up against 4 + 5 = 9 kΩ: 1.2 × 9 / 13 = 831 mV, 92.3 µA.
        var (deck, measured) = Run(c =>
        {
            var n = c.Inverter(c.Input("x"), "n");
            c.TransmissionGate(c.Input("y"), c.Input("sel"), n);
            c.Inverter(n, "q");
        });

        var stated = 1.2 * 9 / 13;
        Assert.Equal(stated, deck.Estimates.Single(e => e.Name == "v_fight").Value, 9);
        Assert.Contains("* estimate v_fight = ", deck.Text);
        Assert.InRange(measured.Value("v_fight", deck), stated * 0.98, stated * 1.02);
        Assert.InRange(System.Math.Abs(measured.Value("i_fight", deck)), 1.2 / 13e3 * 0.98, 1.2 / 13e3 * 1.02);
    }
}
