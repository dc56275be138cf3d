using System.Linq;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1001. The condition — two latches in series must not be transparent in the same phase, so a two-phase pipeline
/// alternates the phases of consecutive latches — is the two-phase latch discipline of Weste &amp; Harris, "CMOS VLSI
/// Design", 4th ed., ch. 10 (sequencing with two-phase latches; section from memory) and of Rabaey, Chandrakasan,
/// Nikolić, 2nd ed., ch. 7 (master–slave registers from latches of opposite phases; from memory).
/// </summary>
public class SameWindowLatchesRuleTests
{
    private static readonly SameWindowLatchesRule Rule = new();

    [Fact]
    public void SamePhaseInSeriesIsReportedAtTheSecondLatchWithTheFirstAsRelated()
    {
        var c = Figures.NewCircuit("series");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        c.DynamicLatch(c.Inverter(a), clk.High, "B");
        var netlist = c.ToNetlist();
        var bSpan = netlist.Devices.Single(d => d.Name == "B.pass").Span;
        var aSpan = netlist.Devices.Single(d => d.Name == "A.pass").Span;

        var finding = Assert.Single(Rule.Check(new RuleContext(netlist, RulePolicy.Default)));

        Assert.Equal("PW1001", finding.RuleId);
        Assert.Equal(bSpan, finding.Location);
        Assert.Equal(new[] { aSpan }, finding.RelatedLocations);
        Assert.Equal("Latch 'B' takes its data from latch 'A' and both are transparent in clk.High: data can run through both in one phase", finding.Message);
        Assert.Equal("clk.High", finding.Properties[FindingPropertyKeys.Phase]);
        Assert.Equal("clk.Low", finding.Properties[FindingPropertyKeys.ComplementPhase]);
        Assert.Equal("Low", finding.Properties[FindingPropertyKeys.ComplementPolarity]);
        Assert.Equal("false", finding.Properties[FindingPropertyKeys.IsRegisterStage]);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.PhaseSetByOneCall]);
    }

    [Fact]
    public void AHandBuiltStaticLatchsPhaseIsNotSetByOneCall()
    {
        // Entry gate and feedback gate are separate calls: switching the entry alone would put both on one phase.
        var c = Figures.NewCircuit("handbuilt");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        var plain = c.Node("plain");
        c.TransmissionGate(a, clk.High, plain);
        var store = c.Node("store");
        c.TransmissionGate(c.Inverter(plain), clk.High, store);
        var q = c.Inverter(store, "q");
        c.TransmissionGate(c.Inverter(q), clk.Low, store);

        var findings = Figures.Run(Rule, c).ToDictionary(f => f.Properties[FindingPropertyKeys.TargetLatch]);

        Assert.Equal("true", findings["plain"].Properties[FindingPropertyKeys.PhaseSetByOneCall]);
        Assert.Equal("false", findings["store"].Properties[FindingPropertyKeys.PhaseSetByOneCall]);
    }

    [Fact]
    public void ComplementaryPhasesAndUnrelatedClocksAreNotReported()
    {
        var c = Figures.NewCircuit("alternating");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var other = c.Clock("other", 1.Nanoseconds(), independent: true);
        var a = c.StaticLatch(c.Input("d"), clk.High, "A");
        var b = c.StaticLatch(a, clk.Low, "B");
        c.DynamicLatch(b, other.Low, "C");

        Assert.Empty(Figures.Run(Rule, c));
    }

    [Theory]
    [InlineData("gated", "530 ps")]
    [InlineData("buffered", "490 ps")]
    [InlineData("gated-buffered", "490 ps")]
    public void DerivedCopiesOfOneRootWithTheSamePolarityShareTheWindow(string derivation, string together)
    {
        var c = Figures.NewCircuit("derived");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var copy = derivation switch
        {
            "gated" => c.ClockGate(clk, c.Input("en"), name: "copy"),
            "buffered" => c.BufferedClock(clk, 40.Picoseconds(), "copy"),
            _ => c.BufferedClock(c.ClockGate(clk, c.Input("en")), 40.Picoseconds(), "copy"),
        };
        var a = c.DynamicLatch(c.Input("d"), clk.Low, "A");
        c.DynamicLatch(a, copy.Low, "B");

        var finding = Assert.Single(Figures.Run(Rule, c));
        // Low windows [500, 1030) ps and, 40 ps later, [540, 1070) ps: together for 490 ps (530 ps for the gated copy).
        Assert.Contains($"clk.Low and copy.Low (together for {together} of every 1 ns)", finding.Message);
        Assert.Equal("copy.Low", finding.Properties[FindingPropertyKeys.Phase]);
        Assert.Equal("copy", finding.Properties[FindingPropertyKeys.Clock]);
    }

    [Fact]
    public void OnlyAdjacentPairsAreReportedAndAThirdLatchBetweenBreaksThePath()
    {
        var c = Figures.NewCircuit("chain");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        var b = c.DynamicLatch(a, clk.High, "B");
        var m = c.DynamicLatch(b, clk.Low, "M");
        c.DynamicLatch(m, clk.High, "C");
        var bb = c.DynamicLatch(c.Input("e"), clk.High, "D");
        c.DynamicLatch(c.DynamicLatch(bb, clk.High, "E"), clk.High, "F");

        var pairs = Figures.Run(Rule, c).Select(f => f.Properties[FindingPropertyKeys.SourceLatch] + ">" + f.Properties[FindingPropertyKeys.TargetLatch]).ToArray();

        Assert.Equal(new[] { "A>B", "D>E", "E>F" }, pairs);
    }

    [Fact]
    public void PathsThroughNandsAndDataControlledPassGatesCount()
    {
        var c = Figures.NewCircuit("logic");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var sel = c.Input("sel");
        var a = c.StaticLatch(c.Input("d"), clk.High, "A");
        var muxed = c.TransmissionGate(c.Nand(a, c.Input("k")), sel, "muxed");
        c.StaticLatch(c.Inverter(muxed), clk.High, "B");
        // A latch output that only steers a mux's select also reaches the mux output.
        var steer = c.DynamicLatch(c.Input("s"), clk.Low, "S");
        var arm = c.TransmissionGate(c.Input("x"), steer, "arm");
        c.DynamicLatch(c.Buffer(arm), clk.Low, "T");

        var pairs = Figures.Run(Rule, c).Select(f => f.Properties[FindingPropertyKeys.SourceLatch] + ">" + f.Properties[FindingPropertyKeys.TargetLatch]).ToArray();

        Assert.Equal(new[] { "A>B", "S>T" }, pairs);
    }

    [Fact]
    public void ALatchFeedingItselfInItsOwnPhaseIsReportedButAStaticLatchsOwnFeedbackIsNot()
    {
        var c = Figures.NewCircuit("loops");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Node("loopIn");
        var q = c.DynamicLatch(d, clk.High, "L");
        c.Nand(c.Input("go"), c.Inverter(q), d);
        c.StaticLatch(c.Input("e"), clk.High, "S");
        // A ring of alternating latches is not reported (and the search terminates).
        var r0 = c.Node("r0");
        var r1 = c.DynamicLatch(r0, clk.High, "R1");
        var r2 = c.DynamicLatch(r1, clk.Low, "R2");
        c.Inverter(r2, r0);

        var finding = Assert.Single(Figures.Run(Rule, c));
        Assert.Equal("L", finding.Properties[FindingPropertyKeys.SourceLatch]);
        Assert.Equal("L", finding.Properties[FindingPropertyKeys.TargetLatch]);
    }

    [Fact]
    public void ARegisterStageOnTheSamePhaseIsFlaggedForTheInsertLatchFix()
    {
        var c = Figures.NewCircuit("register");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.Low, "A");
        c.DynamicRegister(a, clk, "R");

        var finding = Assert.Single(Figures.Run(Rule, c));
        Assert.Equal("R.master", finding.Properties[FindingPropertyKeys.TargetLatch]);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.IsRegisterStage]);
        Assert.Equal("R", finding.Properties[FindingPropertyKeys.Register]);
        Assert.Equal("clk.Low", finding.Properties[FindingPropertyKeys.Phase]);
    }

    [Fact]
    public void HandBuiltLatchesAreCheckedLikeCells()
    {
        var c = Figures.NewCircuit("hand");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var x1 = c.TransmissionGate(c.Input("d"), clk.High, "x1");
        var q1 = c.Inverter(x1);
        var x2 = c.Node("x2");
        c.TransmissionGate(q1, clk.High, x2);
        var q2 = c.Inverter(x2);
        c.TransmissionGate(c.Inverter(q2), clk.Low, x2);
        // Two clocked pass gates of one phase directly in series: the first one's node is a storage node too.
        var y1 = c.TransmissionGate(c.Input("e"), clk.Low, "y1");
        c.Inverter(c.TransmissionGate(y1, clk.Low, "y2"));

        var pairs = Figures.Run(Rule, c).Select(f => f.Properties[FindingPropertyKeys.SourceLatch] + ">" + f.Properties[FindingPropertyKeys.TargetLatch]).ToArray();

        Assert.Equal(new[] { "x1>x2", "y1>y2" }, pairs);
    }
}
