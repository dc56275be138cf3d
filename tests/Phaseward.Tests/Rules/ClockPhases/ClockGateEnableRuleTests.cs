using System;
using System.Linq;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1004. The condition — a gate that stops low passes the clock while it is high, so its enable must change only
/// while the clock is low, which a latch transparent while the clock is low guarantees — is common practice for
/// glitch-free clock gating. Flat test process (<see cref="Figures"/>): t_TG = 34.5 ps, t_inv = 27.6 ps; a 10 ns clock
/// at duty 0.5 is high over [0, 5 ns) and low over [5 ns, 10 ns) (nominal edges).
/// </summary>
public class ClockGateEnableRuleTests
{
    private static readonly ClockGateEnableRule Rule = new();

    private static Finding[] Run(Action<Circuit> describe, RulePolicy? policy = null)
    {
        var c = Figures.NewCircuit("gates");
        describe(c);
        return Figures.Run(Rule, c, policy);
    }

    [Fact]
    public void AnEnableFromARegisterChangesWhileTheGatePassesTheClock()
    {
        var c = Figures.NewCircuit("gates");
        var clk = c.Clock("clk", 10.Nanoseconds());
        var en = c.StaticRegister(c.Input("want"), clk, "en_reg");
        var gated = c.ClockGate(clk, en, name: "gclk");
        c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
        var netlist = c.ToNetlist();

        var finding = Assert.Single(Rule.Check(new RuleContext(netlist, RulePolicy.Default)));

        // The slave opens at 0: its entry gate 34.5 ps, then its output inverter 27.6 ps: the enable moves until 62.1 ps.
        Assert.Equal("PW1004", finding.RuleId);
        Assert.Equal("Clock gate 'gclk' passes clock 'clk' during [0 s, 5 ns) (while it is high), but its enable 'en_reg' can change during "
            + "[0 s, 62.1 ps) (from latch 'en_reg.slave', transparent in clk.High, through a 27.6 ps path): the gated clock can be clipped or get an extra pulse",
            finding.Message);
        Assert.Equal(netlist.Clock("gclk").Span, finding.Location);
        Assert.Equal("clk.Low", finding.Properties[ClockGateProperties.BlockingPhase]);
        Assert.Equal("en_reg.slave", finding.Properties[ClockGateProperties.Storage]);
    }

    [Fact]
    public void TheEnableLatchedOnTheBlockingPhaseIsClean()
        => Assert.Empty(Run(c =>
        {
            // The latch opens at 5 ns; its data is there before (launched at 0); the enable settles by 5.09 ns.
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = c.StaticRegister(c.Input("want"), clk, "en_reg");
            var held = c.Inverter(c.StaticLatch(en, clk.Low, "en_latch"));
            var gated = c.ClockGate(clk, held, name: "gclk");
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
        }));

    [Theory]
    [InlineData(ClockStopLevel.High, ClockPolarity.Low, true)]   // passes while low: a Low latch changes then
    [InlineData(ClockStopLevel.High, ClockPolarity.High, false)]
    [InlineData(ClockStopLevel.Low, ClockPolarity.High, true)]
    [InlineData(ClockStopLevel.Low, ClockPolarity.Low, false)]
    public void TheLatchMustBeTransparentOnlyWhileTheGateBlocks(ClockStopLevel stops, ClockPolarity latchPolarity, bool reported)
    {
        var findings = Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = c.Inverter(c.StaticLatch(c.Input("want"), clk[latchPolarity], "en_latch"));
            c.ClockGate(clk, en, stops, name: "gclk");
        });
        Assert.Equal(reported ? 1 : 0, findings.Length);
    }

    [Fact]
    public void ASlowPathOutOfTheRightLatchStillSpillsIntoThePassingPhase()
    {
        // A 1 ns clock: low over [0.5 ns, 1 ns). 20 inverters after the latch: 34.5 + 20 × 27.6 = 586.5 ps after 0.5 ns.
        var finding = Assert.Single(Run(c =>
        {
            var clk = c.Clock("clk", 1.Nanoseconds());
            var en = c.StaticLatch(c.Input("want"), clk.Low, "en_latch");
            for (var i = 0; i < 19; i++)
                en = c.Inverter(en);
            c.ClockGate(clk, en, name: "gclk");
        }));
        Assert.Contains("can change during [500 ps, 1.09 ns) (from latch 'en_latch', transparent in clk.Low, through a 552 ps path)", finding.Message);
    }

    [Fact]
    public void AnEnableFromAPrimaryInputIsStableUnlessThePolicySaysOtherwise()
    {
        void Gate(Circuit c) => c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("enable"), name: "gclk");
        Assert.Empty(Run(Gate));
        var finding = Assert.Single(Run(Gate, new RulePolicy { EnablesFromInputsMayChange = true }));
        Assert.Contains("can change at any time (from primary input 'enable'", finding.Message);
    }

    [Fact]
    public void StorageOnAnUnrelatedClockCanChangeAtAnyTime()
    {
        var finding = Assert.Single(Run(c =>
        {
            var other = c.Clock("other", 7.Nanoseconds());
            var en = c.Inverter(c.StaticLatch(c.Input("want"), other.Low, "en_latch"));
            c.ClockGate(c.Clock("clk", 10.Nanoseconds()), en, name: "gclk");
        }));
        Assert.Contains("at any time (from latch 'en_latch', transparent in other.Low, whose root clock is not 'clk')", finding.Message);
    }

    [Fact]
    public void GatesBuiltInALoopThroughAHelperAreOneFindingEach()
    {
        static Clock Lane(Circuit c, Clock clk, int i) => c.ClockGate(clk, c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}"), name: $"lane{i}");

        var findings = Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 3; i++)
                Lane(c, clk, i);
        });
        Assert.Equal(new[] { "lane0", "lane1", "lane2" }, findings.Select(f => f.Properties[ClockGateProperties.GatedClock]).ToArray());
    }
}
