using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1002. Reference: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed.,
/// ch. 7, dynamic transmission-gate edge-triggered register and clock overlap (section 7.4.1 from memory): during the
/// 0-0 overlap both pass gates conduct and the register is race-free only while t_overlap0-0 &lt; t_T1 + t_I1 + t_T2;
/// the 1-1 overlap becomes a hold-time requirement. Stage delays t = 0.69·R·C (same book, ch. 5, from memory).
/// Test figures (see <see cref="Figures.Flat"/>): t_TG = 34.5 ps, t_inv = 27.6 ps, so t_T1 + t_I1 + t_T2 = 96.6 ps.
/// </summary>
public class OverlapRaceRuleTests
{
    private static readonly OverlapRaceRule Rule = new();

    [Fact]
    public void WorkedExample_RegisterRacesWhenTheZeroZeroOverlapExceedsTg1PlusI1PlusTg2()
    {
        // Skew 120 ps: the 0-0 overlap is 120 ps > 96.6 ps, margin = 96.6 − 120 = −23.4 ps.
        var c = Figures.NewCircuit("race");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 120.Picoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");

        var finding = Assert.Single(Figures.Run(Rule, c));

        Assert.Equal("PW1002", finding.RuleId);
        Assert.Equal("Latch 'R.slave' races latch 'R.master' through the 0-0 overlap of clock 'clk': " +
                     "the fastest path takes 96.6 ps while both pass gates conduct together for 120 ps, a margin of -23.4 ps, below the required 0 s (fast corner, delays ×1)", finding.Message);
        Assert.Equal(-23.4e-12, double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], System.Globalization.CultureInfo.InvariantCulture), 1e-18);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.IsRegisterStage]);
        Assert.Equal(96.6, Figures.Ps(TimingFigures.For(c.ToNetlist(), Corner.Nominal).Registers.Single().MasterSlaveRace), 9);
    }

    [Fact]
    public void RegisterWithAnOverlapBelowTheRaceDelayIsClean()
    {
        var c = Figures.NewCircuit("norace");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 80.Picoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");

        Assert.Empty(Figures.Run(Rule, c));
    }

    [Theory]
    [InlineData(60, false)]   // 1-1 overlap 60 ps, fastest 96.6 ps: margin +36.6 ps
    [InlineData(100, true)]   // margin −3.4 ps
    public void LatchPairOnComplementaryPhasesUsesTheOneOneOverlapWhenTheFirstOpensOnTheRisingEdge(int skewPs, bool reported)
    {
        var c = Figures.NewCircuit("pair");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, skewPs.Picoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        c.DynamicLatch(a, clk.Low, "B");

        var findings = Figures.Run(Rule, c);

        // Exactly one finding when reported, none otherwise: a second (duplicate or stray) finding fails either case.
        Assert.Equal(reported ? 1 : 0, findings.Length);
        if (reported)
            Assert.Contains("1-1 overlap of clock 'clk'", findings[0].Message);
    }

    [Theory]
    [InlineData(50, false)]  // overlap 30 + 50 = 80 ps < 96.6 ps
    [InlineData(80, true)]   // overlap 110 ps: margin −13.4 ps
    public void ABufferedCopyOfTheSecondLatchsClockWidensTheOverlap(int bufferPs, bool reported)
    {
        var c = Figures.NewCircuit("buffered");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
        var late = c.BufferedClock(clk, bufferPs.Picoseconds(), "late");
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        c.DynamicLatch(a, late.Low, "B");

        var findings = Figures.Run(Rule, c);

        Assert.Equal(reported ? 1 : 0, findings.Length);
        if (reported)
            Assert.Contains("a margin of -13.4 ps", findings[0].Message);
    }

    [Fact]
    public void RegisterToRegisterPathsAreLeftToTheHoldCheck()
    {
        var c = Figures.NewCircuit("regs");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 140.Picoseconds());
        var r1 = c.DynamicRegister(c.Input("d"), clk, "R1");
        c.DynamicRegister(r1, clk, "R2");

        var targets = Figures.Run(Rule, c).Select(f => f.Properties[FindingPropertyKeys.SourceLatch] + ">" + f.Properties[FindingPropertyKeys.TargetLatch]).ToArray();

        Assert.Equal(new[] { "R1.master>R1.slave", "R2.master>R2.slave" }, targets);
    }

    [Fact]
    public void PolicyMarginRaisesTheBarAndRejectsNegativeValues()
    {
        var c = Figures.NewCircuit("policy");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 80.Picoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");

        // Margin 96.6 − 80 = 16.6 ps: clean by default, reported when 20 ps of margin are required.
        Assert.Single(Figures.Run(Rule, c, new RulePolicy { MinimumRaceMargin = 20.Picoseconds() }));
        var error = Assert.Throws<ArgumentException>(() => new RulePolicy { MinimumRaceMargin = (-1).Picoseconds() });
        Assert.Contains("MinimumRaceMargin", error.Message);
        Assert.Contains("-1 ps", error.Message);
    }
}
