using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW1005 decks. Reference: the deck run in ngspice (batch mode). Phaseward's estimate is the ring oscillator's
/// period T = 2·Σ t_p (Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed.,
/// ch. 5, from memory) with the step-input stage delay t_p = 0.69·R·C. In a ring the nodes do not reach the rails
/// before they turn, so the deck's ideal-threshold stages run faster: for N equal stages each takes x·R·C with
/// x = ln(2 / (1 + e^(−N·x))) (the RC charging law V(t) = V_end + (V_0 − V_end)·e^(−t/RC), solved for a steady
/// oscillation; derived here), x ≈ 0.48 for N = 3 against ln 2 ≈ 0.69. The tests check the simulated period against
/// that, and the estimate's ratio to it. Flat test process: every stage R·C = 40 ps (t_p = 27.6 ps).
/// </summary>
public class LoopDeckTests
{
    private static SpiceDeck DeckOf(System.Action<Circuit> describe)
    {
        var c = Figures.NewCircuit("LoopTest");
        describe(c);
        var report = Checker.Check(c.ToNetlist());
        return Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.LoopWithoutStorage.Id), report.Netlist);
    }

    [Fact]
    public void ANandFedBackThroughTwoInvertersOscillatesWithTheStatedPeriod()
    {
        // 3 × 27.6 ps round the loop: 165.6 ps.
        var deck = DeckOf(c =>
        {
            var fb = c.Node("fb");
            var n = c.Nand(c.Input("en"), fb, "n");
            c.Inverter(c.Inverter(n, "i1"), fb);
        });
        var measured = Ngspice.Run(deck);

        Assert.Equal(165.6e-12, deck.Estimates.Single(e => e.Name == "t_period").Value, 15);
        var ring = 2 * 3 * SteadyStageDelay(3) * 40e-12; // ≈ 115 ps
        Assert.InRange(measured.Value("t_period", deck), ring * 0.95, ring * 1.05);
        Assert.InRange(165.6e-12 / measured.Value("t_period", deck), 1.2, 1.6); // the estimate is the slower, conservative figure
    }

    // x with x = ln(2 / (1 + e^(−N·x))): a ring stage's delay in units of R·C (see the class summary).
    private static double SteadyStageDelay(int stages)
    {
        var x = System.Math.Log(2);
        for (var i = 0; i < 200; i++)
            x = System.Math.Log(2 / (1 + System.Math.Exp(-stages * x)));
        return x;
    }

    [Fact]
    public void ARingThroughADataControlledGateOscillates()
    {
        // Five inverters and a pass gate held on: 5 × 27.6 + 34.5 = 172.5 ps, period 345 ps. The pass gate does not
        // restore: the inverter before it charges both nodes (Elmore 4 kΩ × 20 fF + 5 kΩ × 10 fF = 130 ps against the
        // 90 ps of R·C the two stage delays count), which offsets the rings' faster turning (simulated: 374 ps).
        var deck = DeckOf(c =>
        {
            var start = c.Node("start");
            var n = start;
            for (var i = 0; i < 5; i++)
                n = c.Inverter(n, $"s{i}");
            c.TransmissionGate(n, c.Input("en"), start);
        });
        var measured = Ngspice.Run(deck);

        Assert.Equal(345e-12, deck.Estimates.Single(e => e.Name == "t_period").Value, 15);
        Assert.InRange(measured.Value("t_period", deck), 345e-12 * 0.8, 345e-12 * 1.25);
    }

    [Fact]
    public void AnEvenLoopLatchesAtARail()
    {
        var deck = DeckOf(c =>
        {
            var fb = c.Node("fb");
            var n = c.Nand(c.Input("en"), fb, "n");
            c.Inverter(c.Inverter(c.Inverter(n, "i1"), "i2"), fb);
        });
        var measured = Ngspice.Run(deck);

        Assert.DoesNotContain("t_period", deck.Text);
        Assert.Equal(1, measured.Value("latched", deck));
    }
}
