using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;
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
            + "[0 s, 62.1 ps) (from latch 'en_reg.slave', transparent in clk.High, through a 27.6 ps path; slow corner, delays ×1): the gated clock can be clipped or get an extra pulse",
            finding.Message);
        Assert.Equal(netlist.Clock("gclk").Span, finding.Location);
        Assert.Equal("clk.Low", finding.Properties[FindingPropertyKeys.BlockingPhase]);
        Assert.Equal("en_reg.slave", finding.Properties[FindingPropertyKeys.Storage]);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.OpensWhilePassing]);
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
        Assert.Contains("can change during [500 ps, 1.09 ns) (from latch 'en_latch', transparent in clk.Low, through a 552 ps path; slow corner, delays ×1)", finding.Message);
        Assert.Equal("false", finding.Properties[FindingPropertyKeys.OpensWhilePassing]); // the right latch: only the path is slow
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
    public void StorageOnAClockWithNoFixedTimeRelationCanChangeAtAnyTime()
    {
        var finding = Assert.Single(Run(c =>
        {
            var other = c.Clock("other", 7.Nanoseconds(), independent: true);
            var en = c.Inverter(c.StaticLatch(c.Input("want"), other.Low, "en_latch"));
            c.ClockGate(c.Clock("clk", 10.Nanoseconds()), en, name: "gclk");
        }));
        Assert.Contains("at any time (from latch 'en_latch', transparent in other.Low, whose clock has no fixed time relation to 'clk')", finding.Message);
        Assert.Equal(FindingPropertyValues.EnableFromUnrelatedClock, finding.Properties[FindingPropertyKeys.Origin]);
    }

    [Theory]
    // A second root of 10 ns rising at 5 ns: its High phase opens when clk falls, so it is the right latch despite its name.
    [InlineData(5.0, 10.0, ClockPolarity.High, false)]
    [InlineData(0.0, 10.0, ClockPolarity.High, true)]
    // A root of 5 ns: its Low phase opens at 2.5 ns and 7.5 ns; the first opening falls while clk is high.
    [InlineData(0.0, 5.0, ClockPolarity.Low, true)]
    // A root of 20 ns rising at 5 ns, High over [5, 15): it opens only while clk is low, and its data passes by 5.06 ns.
    [InlineData(5.0, 20.0, ClockPolarity.High, false)]
    public void StorageOnARelatedRootIsComparedOnTheTimeBase(double offsetNs, double periodNs, ClockPolarity polarity, bool reported)
    {
        var findings = Run(c =>
        {
            var other = c.Clock("other", periodNs.Nanoseconds(), offset: offsetNs.Nanoseconds());
            var en = c.Inverter(c.StaticLatch(c.Input("want"), other[polarity], "en_latch"));
            c.ClockGate(c.Clock("clk", 10.Nanoseconds()), en, name: "gclk");
        });
        Assert.Equal(reported ? 1 : 0, findings.Length);
    }

    [Fact]
    public void AGateOnAClockRisingLateIsComparedWhereItRuns()
    {
        // clk rises at 3 ns: high over [3, 8), low over [8, 13). A latch on clk.Low opens at 8 ns: clean. A register
        // on the 10 ns root "base" rising at 0 launches at 0: its slave's output moves over [0, 62.1 ps), which lies in
        // clk's low time of the cycle before ([-2, 3)): clean, although both latches are "High".
        Assert.Empty(Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds(), offset: 3.Nanoseconds());
            var basis = c.Clock("base", 10.Nanoseconds());
            c.ClockGate(clk, c.Inverter(c.StaticLatch(c.Input("a"), clk.Low, "en_a")), name: "ga");
            c.ClockGate(clk, c.StaticRegister(c.Input("b"), basis, "en_b"), name: "gb");
        }));

        // The same register on a root rising at 5 ns launches while clk is high: reported.
        var finding = Assert.Single(Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds(), offset: 3.Nanoseconds());
            var late = c.Clock("late", 10.Nanoseconds(), offset: 5.Nanoseconds());
            c.ClockGate(clk, c.StaticRegister(c.Input("b"), late, "en_b"), name: "gb");
        }));
        Assert.Contains("passes clock 'clk' during [3 ns, 8 ns) (while it is high)", finding.Message);
        Assert.Contains("can change during [5 ns, 5.06 ns) (from latch 'en_b.slave', transparent in late.High", finding.Message);
    }

    /// <summary>A lane written as a block: a register makes the enable, a gate clocks a dynamic latch.</summary>
    private sealed class GatedLane(Clock clock, bool latched) : Block
    {
        protected override void Describe(Circuit c)
        {
            var enable = c.StaticRegister(c.Input("want"), clock, "en_reg");
            if (latched)
                enable = c.Inverter(c.StaticLatch(enable, clock.Low, "en_latch"));
            var gated = c.ClockGate(clock, enable, name: "gclk");
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
        }
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void GatesInsideBlocksPlacedInALoopAreOneFindingPerPlacedGate(bool latched)
    {
        var findings = Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 3; i++)
                c.Place(new GatedLane(clk, latched), $"lane{i}");
        });

        if (latched)
        {
            Assert.Empty(findings);
            return;
        }

        Assert.Equal(new[] { "lane0.gclk", "lane1.gclk", "lane2.gclk" }, findings.Select(f => f.Properties[FindingPropertyKeys.GatedClock]).ToArray());
        Assert.Equal(new[] { "lane0.en_reg.slave", "lane1.en_reg.slave", "lane2.en_reg.slave" },
            findings.Select(f => f.Properties[FindingPropertyKeys.Storage]).ToArray());
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
        Assert.Equal(new[] { "lane0", "lane1", "lane2" }, findings.Select(f => f.Properties[FindingPropertyKeys.GatedClock]).ToArray());
        Assert.All(findings, f => Assert.Equal(FindingPropertyValues.EnableFromLatch, f.Properties[FindingPropertyKeys.Origin]));
    }

    [Fact]
    public void GatesBuiltInALoopThroughAHelperWithLatchedEnablesAreClean()
    {
        static Clock Lane(Circuit c, Clock clk, int i)
            => c.ClockGate(clk, c.Inverter(c.StaticLatch(c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}"), clk.Low, $"hold{i}")), name: $"lane{i}");

        Assert.Empty(Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            foreach (var i in Enumerable.Range(0, 3))
                Lane(c, clk, i);
        }));
    }
}
