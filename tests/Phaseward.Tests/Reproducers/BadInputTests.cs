using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

public class ReproducerBadInputTests
{
    [Fact]
    public void AFindingWithNoElectricalFiguresIsRefusedByName()
    {
        var finding = new Finding(RuleCatalog.NotElaborated, new SourceSpan("Design.cs", 12), new object[] { "a call", "reflection", "D" });
        var netlist = new Circuit("Empty").ToNetlist();

        var error = Assert.Throws<ArgumentException>(() => Reproducer.Deck(finding, netlist));
        Assert.Contains("PW9001", error.Message);
        Assert.Contains("Design.cs", error.Message);
        Assert.Contains("no electrical figures", error.Message);
    }

    [Fact]
    public void AFindingOfAnotherDesignIsRefusedNamingTheNet()
    {
        var c = new Circuit("ShareTest");
        var clk = c.Clock("clk", 10.Nanoseconds());
        c.Inverter(c.TransmissionGate(c.TransmissionGate(c.Input("d"), clk.Low, "a"), clk.High, "b"), "q");
        var finding = Checker.Check(c.ToNetlist()).Findings.First(f => f.RuleId == "PW3003");
        var other = new Circuit("Other");
        other.Inverter(other.Input("x"), "y");

        var error = Assert.Throws<ArgumentException>(() => Reproducer.Deck(finding, other.ToNetlist()));
        Assert.Contains("'a'", error.Message);
        Assert.Contains("Other", error.Message);
    }

    [Fact]
    public void ATangleOfLoopsIsRefusedNamingTheFinding()
    {
        var c = new Circuit("Tangle");
        var hub = c.Node("hub");
        c.Nand(c.Inverter(hub, "a"), c.Inverter(hub, "b"), hub);
        var report = Checker.Check(c.ToNetlist());
        var finding = report.Findings.Single(f => f.RuleId == RuleCatalog.LoopWithoutStorage.Id);

        var error = Assert.Throws<ArgumentException>(() => Reproducer.Deck(finding, report.Netlist));
        Assert.Contains("PW1005", error.Message);
        Assert.Contains("tangle of loops", error.Message);
    }

    [Fact]
    public void AFightFindingOfAnotherDesignIsRefusedNamingTheNode()
    {
        var c = new Circuit("Bus");
        var bus = c.Node("bus");
        c.TransmissionGate(c.Input("a"), c.Input("ra"), bus);
        c.TransmissionGate(c.Input("b"), c.Input("rb"), bus);
        var finding = Checker.Check(c.ToNetlist()).Findings.Single(f => f.RuleId == RuleCatalog.FightingDrivers.Id);
        var other = new Circuit("Other");
        other.Inverter(other.Input("x"), "y");

        var error = Assert.Throws<ArgumentException>(() => Reproducer.Deck(finding, other.ToNetlist()));
        Assert.Contains("'bus'", error.Message);
        Assert.Contains("Other", error.Message);
    }
}
