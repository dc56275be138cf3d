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
}
