using System;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Rules;

/// <summary>
/// The public queries behind the design report (PassGateChains, OverlapRaces, RegisterPathChecks): the same figures
/// as the rules' findings, passing checks included, and the hand-worked values of the rules' own tests.
/// </summary>
public class ReportQueryTests
{
    [Fact]
    public void Pass_gate_run_has_the_hand_worked_Elmore_delay_and_the_rules_limit()
    {
        // Same chain as PassGateChainRuleTests.Figures_of_a_five_gate_chain_under_the_process_limit (illustrative process):
        // Elmore(hop5) = 4k·21f + 5k·(18.5 + 14.5 + 10.5 + 6.5 + 2.5)f = 346.5 ps (RC-tree Elmore delay, worked by hand there).
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var net = c.Input("sensor");
        for (var i = 1; i <= 5; i++)
            net = c.TransmissionGate(net, clock.High, "hop" + i);
        var netlist = c.ToNetlist();

        var run = Assert.Single(PassGateChains.Of(netlist));
        Assert.Equal(new[] { "hop1", "hop2", "hop3", "hop4", "hop5" }, run.Gates.Select(g => g.Name));
        Assert.Equal(346.5e-12, run.ElmoreDelay.Seconds, 1e-21);
        Assert.Equal(0.69 * 346.5e-12, run.FiftyPercentDelay.Seconds, 1e-21); // single pole: t50 = 0.69 · τ, 0.69 ≈ ln 2 (common practice)
        Assert.Equal(2, run.Limit);
        Assert.True(run.ExceedsLimit);

        var finding = Assert.Single(Checker.Check(netlist).Findings, f => f.RuleId == RuleCatalog.SeriesPassGates.Id);
        Assert.Equal(run.ElmoreDelay.Seconds.ToString("R", CultureInfo.InvariantCulture), finding.Properties[FindingPropertyKeys.ElmoreDelaySeconds]);

        var relaxed = Assert.Single(PassGateChains.Of(netlist, new RulePolicy { MaxSeriesPassGates = 5 }));
        Assert.False(relaxed.ExceedsLimit);
        Assert.Empty(PassGateChains.Of(netlist, minimumLength: 6));
        Assert.Throws<ArgumentException>(() => PassGateChains.Of(netlist, minimumLength: 0));
    }

    [Fact]
    public void Overlap_race_of_a_register_is_the_textbook_condition()
    {
        // Rabaey et al., 2nd ed., ch. 7 (dynamic transmission-gate register, from memory): the race through master and
        // slave during the 0-0 overlap is avoided while t(T1) + t(I1) + t(T2) exceeds the overlap:
        // 34.5 + 27.6 + 34.5 − 45 = 51.6 ps with the test figures (see TimingFiguresTests).
        var c = Figures.NewCircuit("race");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 45.Picoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");
        var netlist = c.ToNetlist();

        var race = Assert.Single(OverlapRaces.For(LatchModel.Of(netlist)));
        Assert.Equal("R.master", race.Path.From.Name);
        Assert.Equal("R.slave", race.Path.To.Name);
        Assert.Equal("0-0", race.OverlapName);
        Assert.Equal(45, Figures.Ps(race.Overlap), 9);
        Assert.Equal(51.6, Figures.Ps(race.Margin), 9);

        // The rule reports the same pair with the same margin once the policy asks for more than it has.
        var finding = Assert.Single(Checker.Check(netlist, new RulePolicy { MinimumRaceMargin = 60.Picoseconds() }).Findings,
            f => f.RuleId == RuleCatalog.OverlapRace.Id);
        Assert.Equal(race.Margin.Seconds.ToString("R", CultureInfo.InvariantCulture), finding.Properties[FindingPropertyKeys.MarginSeconds]);
    }

    [Fact]
    public void Register_path_checks_carry_the_slacks_the_rule_reports()
    {
        var c = Figures.NewCircuit("pipe");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 45.Picoseconds());
        var first = c.DynamicRegister(c.Input("d"), clk, "A");
        c.DynamicRegister(c.Inverter(first), clk, "B");
        var netlist = c.ToNetlist();

        var result = Assert.Single(RegisterPathChecks.For(netlist));
        Assert.Equal("A", result.Launch.Name);
        Assert.Equal("B", result.Capture.Name);
        Assert.Equal(1000, Figures.Ps(result.Check.Available), 9); // same edge, same clock: one period

        // With a threshold above both slacks every check is reported, each with the slack computed here.
        var findings = Checker.Check(netlist, new RulePolicy { MinimumTimingSlack = 10.Nanoseconds() }).Findings;
        var setup = Assert.Single(findings, f => f.RuleId == RuleCatalog.RegisterSetup.Id);
        var hold = Assert.Single(findings, f => f.RuleId == RuleCatalog.RegisterHold.Id);
        Assert.Equal(result.Check.SetupSlack.Seconds.ToString("R", CultureInfo.InvariantCulture), setup.Properties[FindingPropertyKeys.MarginSeconds]);
        Assert.Equal(result.Check.HoldSlack.Seconds.ToString("R", CultureInfo.InvariantCulture), hold.Properties[FindingPropertyKeys.MarginSeconds]);
    }
}
