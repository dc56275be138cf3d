using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW3003 decks. Reference: the deck run in ngspice (ngspice-39, batch mode); the estimate it is compared with is
/// V·C1/(C1+C2) by conservation of charge (common practice).
/// </summary>
public class ChargeSharingDeckTests
{
    [Fact]
    public void TheDeckSettlesWithinFivePercentOfTheStatedLevel()
    {
        var c = new Circuit("ShareTest");
        var clk = c.Clock("clk", 10.Nanoseconds());
        var a = c.TransmissionGate(c.Input("d"), clk.Low, "a");
        var b = c.TransmissionGate(a, clk.High, "b");
        c.Inverter(b, "q");
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.Single(f => f.RuleId == "PW3003");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var measured = Ngspice.Run(deck);

        // The message states 565 mV (1.2 V × 4 fF / 8.5 fF = 564.7 mV).
        Assert.Contains("settles at 565 mV", finding.Message);
        var stated = 1.2 * 4 / 8.5;
        Assert.Equal(stated, deck.Estimates.Single(e => e.Name == "v_settled").Value, 9);
        var settled = measured.Value("v_settled", deck);
        Assert.InRange(settled, stated * 0.95, stated * 1.05);
        Assert.InRange(measured.Value("droop", deck), 1.2 - stated * 1.05, 1.2 - stated * 0.95);
    }

    [Fact]
    public void TheDeckOpensThePartnersGatesAndSettlesWhereTheirCapacitanceSaysItShould()
    {
        // Four 40 fF cells read onto a 9 fF bit line by selects not known exclusive: the worst case opens every read
        // gate together, so cell0's charge spreads over 40 + 9 + 3 × 40 fF: V·C1/(C1+C2) = 1.2 × 40 / 169 = 284.0 mV.
        var c = new Circuit("ReadPortShare");
        var clk = c.Clock("clk", 10.Nanoseconds());
        var bitLine = c.Node("rbl");
        for (var i = 0; i < 4; i++)
        {
            var cell = c.TransmissionGate(c.Input($"d{i}"), clk.High, $"cell{i}");
            c.SetCapacitance(cell, 40.Femtofarads());
            c.TransmissionGate(cell, c.Input($"rsel{i}"), bitLine);
        }

        c.Inverter(bitLine, "sense");
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.First(f => f.RuleId == "PW3003");

        var deck = Reproducer.Deck(finding, report.Netlist);
        var measured = Ngspice.Run(deck);

        var stated = 1.2 * 40 / 169;
        Assert.Equal(stated, deck.Estimates.Single(e => e.Name == "v_settled").Value, 9);
        Assert.InRange(measured.Value("v_settled", deck), stated * 0.95, stated * 1.05);
    }
}
