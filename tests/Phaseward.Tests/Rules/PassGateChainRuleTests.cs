using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Tests.Reference;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Rules;

// Scenario (invented): the telemetry front end of a drifting ocean buoy — sensor channels multiplexed through pass
// gates onto a shared sample bus. Process figures are Phaseward's illustrative defaults unless a test sets its own.
public class PassGateChainRuleTests
{
    private static readonly PassGateChainRule Rule = new();

    private static IReadOnlyList<Finding> Check(Circuit c, int? limit = null)
        => Rule.Check(new RuleContext(c.ToNetlist(), limit is { } l ? new RulePolicy { MaxSeriesPassGates = l } : RulePolicy.Default)).ToList();

    // in → TG × n → out (clock-controlled); returns the gates' output nets.
    private static List<Net> Chain(Circuit c, Net from, Phase phase, int gates, string prefix)
    {
        var nets = new List<Net>();
        var net = from;
        for (var i = 1; i <= gates; i++)
        {
            net = c.TransmissionGate(net, phase, prefix + i);
            nets.Add(net);
        }

        return nets;
    }

    [Theory]
    [InlineData(3, 3, 0)]
    [InlineData(2, 3, 0)]
    [InlineData(4, 3, 1)]
    [InlineData(9, 3, 1)]
    [InlineData(2, 1, 1)]
    public void Straight_chain_is_reported_only_beyond_the_limit(int gates, int limit, int expected)
    {
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        Chain(c, c.Input("sensor"), clock.High, gates, "hop");
        var findings = Check(c, limit);
        Assert.Equal(expected, findings.Count);
        if (expected == 0) return;

        var finding = findings[0];
        Assert.Equal("PW2001", finding.RuleId);
        Assert.Equal(gates.ToString(CultureInfo.InvariantCulture), finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal(limit.ToString(CultureInfo.InvariantCulture), finding.Properties[FindingPropertyKeys.Limit]);
        Assert.Equal("hop" + (limit + 1), Name(c, finding.Properties[FindingPropertyKeys.ReportedGateId]));
        Assert.Equal("hop1", finding.Properties[FindingPropertyKeys.FirstGate]);
    }

    // The figures of a straight chain, worked by hand with the illustrative process (wire 1 fF, diffusion 1.5 fF,
    // gate 2 fF, pass gate 5 kΩ, driver 4 kΩ, stage delay 20 ps — invented defaults, see Process):
    //   sensor (input, one TG load):      C = 1 + 1.5         = 2.5 fF
    //   hop1..hop4 (TG in, TG out):        C = 1 + 1.5·2       = 4 fF
    //   hop5 (end, TG driver only):        C = 1 + 1.5         = 2.5 fF
    //   downstream: hop5 2.5, hop4 6.5, hop3 10.5, hop2 14.5, hop1 18.5, sensor 21 fF
    //   Elmore(hop5) = 4k·21f + 5k·(18.5 + 14.5 + 10.5 + 6.5 + 2.5)f = 84 ps + 262.5 ps = 346.5 ps
    // Limit: m_opt = 1.70·sqrt(20 ps/(5 kΩ·4 fF)) = 1.70 → best whole spacing 2 → limit max(2, 2) = 2.
    // Restored, counted as the unrestored figure is (the same 4 kΩ driver, whole segments 2 + 2 + 1, one restoring stage
    // between segments): mean R 5 kΩ, mean node C (4·4 + 2.5)/5 = 3.7 fF, RC = 18.5 ps;
    // t = 0.69·4 kΩ·(2.5 + 2·3.7) fF + 0.69·18.5 ps·(3 + 3 + 1) + 2·20 ps = 27.3 + 89.4 + 40 = 156.7 ps.
    [Fact]
    public void Figures_of_a_five_gate_chain_under_the_process_limit()
    {
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        Chain(c, c.Input("sensor"), clock.High, 5, "hop");

        Assert.Equal(2, PassGateChainRule.LimitFor(c.Process, RulePolicy.Default));
        var finding = Assert.Single(Check(c));
        Assert.Equal("5", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("2", finding.Properties[FindingPropertyKeys.Limit]);
        Assert.Equal("2", finding.Properties[FindingPropertyKeys.OptimalSpacing]);
        var elmore = double.Parse(finding.Properties[FindingPropertyKeys.ElmoreDelaySeconds], CultureInfo.InvariantCulture);
        Assert.Equal(346.5e-12, elmore, 1e-21);
        Assert.Equal(0.69 * 346.5e-12, double.Parse(finding.Properties[FindingPropertyKeys.FiftyPercentDelaySeconds], CultureInfo.InvariantCulture), 1e-21);
        var restored = double.Parse(finding.Properties[FindingPropertyKeys.RestoredDelaySeconds], CultureInfo.InvariantCulture);
        Assert.Equal(0.69 * 4e3 * (2.5e-15 + 2 * 3.7e-15) + 0.69 * 18.5e-12 * 7 + 2 * 20e-12, restored, 1e-21);
        // Split after hop2 and hop4: segments of 2, 2, 1.
        Assert.Equal("2", finding.Properties[FindingPropertyKeys.SplitPointCount]);
        Assert.Equal("hop2\nhop4", finding.Properties[FindingPropertyKeys.SplitAfterDevices]);
        Assert.Equal("false", finding.Properties[FindingPropertyKeys.SplitPointsTruncated]);
        Assert.Equal("5 pass gates in series without a restoring stage (limit 2), starting at 'hop1' and passing the limit at 'hop3', in design 'Buoy': Elmore delay 347 ps (50% estimate 239 ps); "
                     + "a restoring stage every 2 gates would give about 157 ps", finding.Message);
        Assert.Equal(c.ToNetlist().Devices.Single(d => d.Name == "hop1").Span, Assert.Single(finding.RelatedLocations));
        Assert.Equal(c.ToNetlist().Devices.Single(d => d.Name == "hop3").Span, finding.Location);
    }

    [Fact]
    public void Gates_on_opposite_phases_are_two_runs_not_one_conducting_chain()
    {
        // hop1..3 on sample.High, then leg1..3 on sample.Low: never on together (beyond the skew-long overlap, which is
        // PW1002's race), so data never runs through all six in one go: two runs of three, each within a limit of 3.
        // Elmore's RC ladder (Elmore 1948) assumes every section conducts at once; a chain is the gates that do.
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        Chain(c, Chain(c, c.Input("sensor"), clock.High, 3, "hop")[^1], clock.Low, 3, "leg");
        Assert.Empty(Check(c, 3));

        // The same six gates on one phase are one run of six.
        var d = new Circuit("Buoy");
        var clk = d.Clock("sample", 10.Nanoseconds());
        Chain(d, Chain(d, d.Input("sensor"), clk.High, 3, "hop")[^1], clk.High, 3, "leg");
        Assert.Equal("6", Assert.Single(Check(d, 3)).Properties[FindingPropertyKeys.ChainLength]);

        // Data-controlled gates on provably exclusive controls (a select and its inverse) are two runs as well.
        var e = new Circuit("Buoy");
        var select = e.Input("select");
        var first = e.Input("sensor");
        for (var i = 1; i <= 3; i++) first = e.TransmissionGate(first, select, "on" + i);
        var inverse = e.Inverter(select, "select_b");
        for (var i = 1; i <= 3; i++) first = e.TransmissionGate(first, inverse, "off" + i);
        Assert.Empty(Check(e, 3));
    }

    // sample.High gate 'hop' → data gates mux1, mux2 (on 'route', an input: nothing makes it exclusive with anything) →
    // sample.Low gates leg1, leg2. Each gate can conduct with its neighbours, but hop never with leg1 or leg2: data
    // runs through hop, mux1, mux2 while sample is high and route is on, and through mux1, mux2, leg1, leg2 while sample
    // is low, never through all five. The worst conducting sub-run is mux1..leg2, driven from hop's output node (left
    // holding the data when hop turned off; taken as driven through the process's 4 kΩ driver resistance, like every
    // run that starts on a node no restoring stage drives).
    // Nets (illustrative process: wire 1 fF, diffusion 1.5 fF, pass gate 5 kΩ, driver 4 kΩ): sensor 2.5 fF (one
    // terminal), hop's output h, m1, m2, l1 4 fF (two terminals), l2 2.5 fF. Downstream: l2 2.5, l1 6.5, m2 10.5,
    // m1 14.5, h 18.5, sensor 21 fF.
    //   mux1..leg2: Elmore = 4 kΩ·18.5 fF + 5 kΩ·(14.5 + 10.5 + 6.5 + 2.5) fF = 74 + 170 = 244 ps (the RC-tree sum,
    //   W. C. Elmore, J. Appl. Phys. 19(1), 1948; the tree form of J. Rubinstein, P. Penfield, M. A. Horowitz, IEEE
    //   Trans. CAD 2(3), 1983). ngspice-39 on that ladder (tests/reference/ngspice/netlists/rc_tree_phase_break.cir):
    //   the first moment ∫(1 − v) dt = 243.99 ps, t50 = 185.0 ps.
    //   hop..mux2: Elmore = 4 kΩ·21 fF + 5 kΩ·(18.5 + 14.5 + 10.5) fF = 84 + 217.5 = 301.5 ps. mux2's step still counts
    //   leg1's branch as load although leg1 is off while hop conducts: the load model knows exclusive data controls,
    //   not phases (pessimistic, first order).
    // The whole five-gate run the neighbours alone would make: 4 kΩ·21 fF + 5 kΩ·52.5 fF = 346.5 ps, reported at leg1.
    [Fact]
    public void A_run_never_holds_gates_that_cannot_conduct_together_whatever_lies_between_them()
    {
        var c = PhaseBrokenRun.Circuit();

        var finding = Assert.Single(Check(c, 3));
        Assert.Equal("4", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("mux1", finding.Properties[FindingPropertyKeys.FirstGate]);
        Assert.Equal("leg2", Name(c, finding.Properties[FindingPropertyKeys.ReportedGateId]));
        var elmore = double.Parse(finding.Properties[FindingPropertyKeys.ElmoreDelaySeconds], CultureInfo.InvariantCulture);
        Assert.Equal(244e-12, elmore, 1e-21);
        // ngspice: the simulated 50 % delay lies below the Elmore delay (its bound for an RC tree's step response:
        // R. Gupta, B. Tutuianu, L. T. Pileggi, IEEE Trans. CAD 16(1), 1997, from memory) and near 0.69 of it.
        var t50 = NgspiceReference.TreeT50("rc_tree_phase_break", "l2");
        Assert.InRange(t50 / elmore, 0.69, 0.77);

        var runs = PassGateChains.Of(c.ToNetlist(), new RulePolicy { MaxSeriesPassGates = 3 });
        Assert.Equal(new[] { "hop mux1 mux2", "mux1 mux2 leg1 leg2" }, runs.Select(r => string.Join(" ", r.Gates.Select(g => g.Name))).OrderBy(n => n));
        Assert.Equal(301.5e-12, runs.Single(r => r.First.Name == "hop").ElmoreDelay.Seconds, 1e-21);
        Assert.Equal(244e-12, runs.Single(r => r.First.Name == "mux1").ElmoreDelay.Seconds, 1e-21);

        // With one phase throughout, the five gates are one run (the run above is broken by the phases, not by the
        // data gates): Elmore 346.5 ps, reported where it passes the limit.
        var d = PhaseBrokenRun.Circuit(legsOnLowPhase: false);
        var whole = Assert.Single(Check(d, 3));
        Assert.Equal("5", whole.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("leg1", Name(d, whole.Properties[FindingPropertyKeys.ReportedGateId]));
        Assert.Equal(346.5e-12, double.Parse(whole.Properties[FindingPropertyKeys.ElmoreDelaySeconds], CultureInfo.InvariantCulture), 1e-21);
    }

    [Fact]
    public void Exclusive_data_controls_break_a_run_across_a_clocked_gate_between_them()
    {
        // select → a sample.High gate → select's inverse: the first and last never conduct together, so the runs are
        // on1, mid and mid, off1 (two gates each, within a limit of 2), not one of three.
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var select = c.Input("select");
        var on = c.TransmissionGate(c.Input("sensor"), select, "on1");
        var mid = c.TransmissionGate(on, clock.High, "mid");
        c.TransmissionGate(mid, c.Inverter(select, "select_b"), "off1");
        Assert.Empty(Check(c, 2));
        Assert.Equal(new[] { "mid off1", "on1 mid" },
            PassGateChains.Of(c.ToNetlist(), minimumLength: 2).Select(r => string.Join(" ", r.Gates.Select(g => g.Name))).OrderBy(n => n));

        // Not exclusive (two independent inputs): one run of three.
        var d = new Circuit("Buoy");
        var clk = d.Clock("sample", 10.Nanoseconds());
        var x = d.TransmissionGate(d.TransmissionGate(d.Input("sensor"), d.Input("select"), "on1"), clk.High, "mid");
        d.TransmissionGate(x, d.Input("other"), "off1");
        Assert.Equal("3", Assert.Single(Check(d, 2)).Properties[FindingPropertyKeys.ChainLength]);
    }

    // A run remembers at most ControlTrails.MaxTracked (16) distinct controls. hop (sample.High), then k gates on
    // distinct data controls that each have a possible exclusive partner (an inverter of it), then leg (sample.Low):
    // with k = 15 the run still holds hop's phase and is broken there; with k = 16 hop's phase is forgotten and the run
    // stays whole, the longer, worst case (documented on PW2001's page).
    [Theory]
    [InlineData(15, new[] { 16, 16 })]
    [InlineData(16, new[] { 18 })]
    public void A_run_forgets_its_oldest_control_beyond_the_tracked_number_and_then_stays_whole(int dataGates, int[] runLengths)
    {
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var net = c.TransmissionGate(c.Input("sensor"), clock.High, "hop");
        for (var i = 1; i <= dataGates; i++)
        {
            var control = c.Input("sel" + i);
            c.Output("sel" + i + "_b", c.Inverter(control));
            net = c.TransmissionGate(net, control, "d" + i);
        }

        c.TransmissionGate(net, clock.Low, "leg");
        Assert.Equal(runLengths, PassGateChains.Of(c.ToNetlist(), new RulePolicy { MaxSeriesPassGates = 40 }).Select(r => r.Length).ToArray());
    }

    [Fact]
    public void A_larger_stage_delay_raises_the_computed_limit()
    {
        var c = new Circuit("Buoy");
        // Invented figures: t_buf/RC = 200 ps/(5 kΩ·4 fF) = 10 → m_opt = 1.70·sqrt(10) = 5.37 → whole optimum 5.
        c.UseProcess(new Process { StageDelay = 200.Picoseconds() });
        var clock = c.Clock("sample", 10.Nanoseconds());
        Chain(c, c.Input("sensor"), clock.High, 5, "hop");
        Assert.Equal(5, PassGateChainRule.LimitFor(c.Process, RulePolicy.Default));
        Assert.Empty(Check(c));
        Chain(c, c.Input("sensor2"), clock.High, 6, "leg");
        Assert.Equal("leg6", Name(c, Assert.Single(Check(c)).Properties[FindingPropertyKeys.ReportedGateId]));
    }

    [Fact]
    public void Policy_limit_must_be_at_least_one()
    {
        var error = Assert.Throws<ArgumentException>(() => new RulePolicy { MaxSeriesPassGates = 0 });
        Assert.Equal("MaxSeriesPassGates", error.ParamName);
        Assert.Contains("was 0", error.Message);
        Assert.Throws<ArgumentException>(() => new RulePolicy { MaxSeriesPassGates = -3 });
        Assert.Null(new RulePolicy().MaxSeriesPassGates);
    }

    // A 16:1 mux tree of data-controlled gates: 4 levels, every input-to-output path 4 gates long. With limit 2 the
    // first gate beyond the limit is a level-3 gate: 4 of them, one finding each (not one per input: 16 paths).
    [Theory]
    [InlineData(2, 4)]
    [InlineData(3, 2)]
    [InlineData(4, 0)]
    public void Mux_tree_is_reported_once_per_gate_where_paths_cross_the_limit(int limit, int expected)
    {
        var c = new Circuit("BuoyMux");
        var level = Enumerable.Range(0, 16).Select(i => c.Input("ch" + i)).ToList();
        for (var depth = 0; level.Count > 1; depth++)
        {
            var select = c.Input("sel" + depth);
            var selectBar = c.Inverter(select, "sel" + depth + "_n");
            var nextLevel = new List<Net>();
            for (var i = 0; i < level.Count; i += 2)
            {
                var merged = c.Node($"m{depth}_{i / 2}");
                c.TransmissionGate(level[i], selectBar, merged);
                c.TransmissionGate(level[i + 1], select, merged);
                nextLevel.Add(merged);
            }

            level = nextLevel;
        }

        var findings = Check(c, limit);
        Assert.Equal(expected, findings.Count);
        Assert.All(findings, f => Assert.Equal("4", f.Properties[FindingPropertyKeys.ChainLength]));
        Assert.Equal(findings.Count, findings.Select(f => f.Properties[FindingPropertyKeys.ReportedGateId]).Distinct().Count());
    }

    // Branching out: a long shared trunk is reported once, at the trunk (not once per branch), with the longest
    // branch; a short trunk whose branches each cross the limit gives one finding per branch.
    [Fact]
    public void Fan_out_tree_is_reported_at_the_trunk_once_or_per_branch()
    {
        var c = new Circuit("BuoyBroadcast");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var trunk = Chain(c, c.Input("beacon"), clock.High, 5, "trunk");
        for (var b = 0; b < 3; b++)
            Chain(c, trunk[^1], clock.High, 2 + b, "branch" + b + "_");
        var finding = Assert.Single(Check(c, 3));
        Assert.Equal("9", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("trunk4", Name(c, finding.Properties[FindingPropertyKeys.ReportedGateId]));

        var d = new Circuit("BuoyBroadcast2");
        var clock2 = d.Clock("sample", 10.Nanoseconds());
        var stub = Chain(d, d.Input("beacon"), clock2.High, 2, "trunk");
        for (var b = 0; b < 3; b++)
            Chain(d, stub[^1], clock2.High, 3, "branch" + b + "_");
        var findings = Check(d, 3);
        Assert.Equal(new[] { "branch0_2", "branch1_2", "branch2_2" }, findings.Select(f => Name(d, f.Properties[FindingPropertyKeys.ReportedGateId])));
        Assert.All(findings, f => Assert.Equal("5", f.Properties[FindingPropertyKeys.ChainLength]));
        Assert.All(findings, f => Assert.Equal("trunk1", f.Properties[FindingPropertyKeys.FirstGate]));
    }

    // A branched chain built with the DSL to match reference tree A (tests/reference/ngspice/rc_tree_a.cir): the input's
    // driver is the 2 kΩ first section, every pass gate's on-resistance and every net's capacitance set as in the
    // netlist. The rule's Elmore delays must be the hand-worked 876 ps (leaf a2) and 1368 ps (leaf b4) — see
    // ElmoreDelayTests — and bound ngspice's t50 at those leaves.
    [Fact]
    public void Branched_chain_delay_is_the_RC_tree_Elmore_delay()
    {
        var c = new Circuit("BuoyTreeA");
        c.UseProcess(new Process { DriverResistance = 2.Kiloohms() });
        var clock = c.Clock("sample", 10.Nanoseconds());
        var t1 = c.Input("t1");
        Net Gate(Net from, string name, double kiloohms, double femtofarads)
        {
            var net = c.TransmissionGate(from, clock.High, name, kiloohms.Kiloohms());
            c.SetCapacitance(net, femtofarads.Femtofarads());
            return net;
        }

        c.SetCapacitance(t1, 5.Femtofarads());
        var t3 = Gate(Gate(t1, "t2", 3, 8), "t3", 4, 6);
        Gate(Gate(t3, "a1", 10, 4), "a2", 15, 12);
        Gate(Gate(Gate(Gate(t3, "b1", 6, 3), "b2", 8, 5), "b3", 7, 4), "b4", 12, 20);

        var findings = Check(c, 2);
        Assert.Equal(new[] { "a1", "b1" }, findings.Select(f => Name(c, f.Properties[FindingPropertyKeys.ReportedGateId])));
        var a = double.Parse(findings[0].Properties[FindingPropertyKeys.ElmoreDelaySeconds], CultureInfo.InvariantCulture);
        var b = double.Parse(findings[1].Properties[FindingPropertyKeys.ElmoreDelaySeconds], CultureInfo.InvariantCulture);
        Assert.Equal(876e-12, a, 1e-20);
        Assert.Equal(1368e-12, b, 1e-20);
        Assert.Equal("4", findings[0].Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("6", findings[1].Properties[FindingPropertyKeys.ChainLength]);
        Assert.True(a >= NgspiceReference.TreeT50("rc_tree_a", "a2"));
        Assert.True(b >= NgspiceReference.TreeT50("rc_tree_a", "b4"));
    }

    // A dynamic latch's transmission gate is a pass device in series with the gates before it; its inverter restores.
    [Fact]
    public void Chain_runs_into_a_latch_cell_and_stops_at_its_inverter()
    {
        var c = new Circuit("BuoyLatch");
        var clock = c.Clock("sample", 10.Nanoseconds());
        // The latch on the same phase as the gates before it (on the opposite phase they would be two runs).
        var hops = Chain(c, c.Input("sensor"), clock.High, 2, "hop");
        var held = c.DynamicLatch(hops[^1], clock.High, "hold");
        Chain(c, held, clock.High, 2, "after");

        var finding = Assert.Single(Check(c, 2));
        Assert.Equal("hold.pass", Name(c, finding.Properties[FindingPropertyKeys.ReportedGateId]));
        Assert.Equal("3", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Empty(Check(c, 3));
    }

    // Static latches: the feedback gate drives the storage node from the feedback inverter (restored), so it starts a
    // run of its own; registers of static latches in series never form a pass chain, and nothing loops forever.
    [Fact]
    public void Static_latch_feedback_gives_no_finding_and_terminates()
    {
        var c = new Circuit("BuoyStatic");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var net = c.Input("sensor");
        for (var i = 0; i < 50; i++)
            net = c.StaticRegister(net, clock, "r" + i);
        Assert.Empty(Check(c, 1));

        var d = new Circuit("BuoyStatic2");
        var clock2 = d.Clock("sample", 10.Nanoseconds());
        var hop = d.TransmissionGate(d.Input("sensor"), clock2.High, "hop");
        d.StaticLatch(hop, clock2.High, "keep"); // the same phase as 'hop': one run through both
        var finding = Assert.Single(Check(d, 1));
        Assert.Equal("keep.pass", Name(d, finding.Properties[FindingPropertyKeys.ReportedGateId]));
        Assert.Equal("2", finding.Properties[FindingPropertyKeys.ChainLength]);
    }

    // A loop of pass gates (a designer's mistake, or a ring written on purpose) must not hang the rule. The edge that
    // closes the loop is dropped, so sensor → ring.a → ring.b is a run of 3 (entry, then each loop gate once).
    [Fact]
    public void Loops_of_pass_gates_terminate()
    {
        var c = new Circuit("BuoyRing");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var n1 = c.Node("n1");
        var n2 = c.Node("n2");
        c.TransmissionGate(c.Input("sensor"), clock.High, n1);
        c.TransmissionGate(n1, clock.High, n2); // one phase: gates on opposite phases would be separate runs
        c.TransmissionGate(n2, clock.High, n1);
        var finding = Assert.Single(Check(c, 2));
        Assert.Equal("3", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Empty(Check(c, 3));

        // A loop with no way in at all.
        var d = new Circuit("BuoyRing2");
        var clock2 = d.Clock("sample", 10.Nanoseconds());
        var m1 = d.Node("m1");
        var m2 = d.Node("m2");
        var m3 = d.Node("m3");
        d.TransmissionGate(m1, clock2.High, m2);
        d.TransmissionGate(m2, clock2.High, m3);
        d.TransmissionGate(m3, clock2.High, m1);
        Assert.Empty(Check(d, 3));
        Assert.Single(Check(d, 2));
    }

    // A keeper holds a node's level but drives it weakly: it does not restore the edge, so the run goes on.
    [Fact]
    public void A_weak_keeper_does_not_restore_but_a_buffer_does()
    {
        var c = new Circuit("BuoyKeeper");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var hops = Chain(c, c.Input("sensor"), clock.High, 2, "hop");
        c.Keeper(hops[^1]);
        Chain(c, hops[^1], clock.High, 2, "more");
        Assert.Equal("4", Assert.Single(Check(c, 3)).Properties[FindingPropertyKeys.ChainLength]);

        var d = new Circuit("BuoyBuffered");
        var clock2 = d.Clock("sample", 10.Nanoseconds());
        var first = Chain(d, d.Input("sensor"), clock2.High, 3, "hop");
        Chain(d, d.Buffer(first[^1], "restore"), clock2.High, 3, "more");
        Assert.Empty(Check(d, 3));
    }

    // Fan-out to a restoring load does not restore the chain (the inverter hangs off the side of the node).
    [Fact]
    public void Fan_out_to_an_inverter_does_not_break_the_chain()
    {
        var c = new Circuit("BuoyTap");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var hops = Chain(c, c.Input("sensor"), clock.High, 2, "hop");
        c.Inverter(hops[^1], "tap");
        Chain(c, hops[^1], clock.High, 2, "more");
        Assert.Equal("4", Assert.Single(Check(c, 3)).Properties[FindingPropertyKeys.ChainLength]);
    }

    // 200 000 gates in one chain: the rule must finish (no timing asserted; speed lives in the benchmark) and list a
    // bounded number of split points.
    [Fact]
    public void Very_long_chain_completes()
    {
        var c = new Circuit("BuoyLong");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var net = c.Input("sensor");
        for (var i = 0; i < 200_000; i++)
            net = c.TransmissionGate(net, clock.High);
        var finding = Assert.Single(Check(c));
        Assert.Equal("200000", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("99999", finding.Properties[FindingPropertyKeys.SplitPointCount]);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.SplitPointsTruncated]);
        Assert.Equal(PassGateChainRule.MaxListedSplitPoints, finding.Properties[FindingPropertyKeys.SplitAfterDeviceIds].Split(',').Length);
    }

    private sealed class TelemetryMux : Design
    {
        protected override void Describe(Circuit c)
        {
            var clock = c.Clock("frame", 20.Nanoseconds());
            var net = c.Input("salinity");
            for (var i = 0; i < 6; i++)
                net = c.TransmissionGate(net, clock.High, "leg" + i);
            c.Output("bus", c.Inverter(net));
        }
    }

    [Fact]
    public void Design_check_reports_the_finding_at_run_time()
    {
        var report = new TelemetryMux().Check(new RulePolicy { MaxSeriesPassGates = 4 });
        var finding = Assert.Single(report.Findings, f => f.RuleId == RuleCatalog.SeriesPassGates.Id);
        Assert.Equal("6", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.StartsWith("6 pass gates in series without a restoring stage (limit 4), starting at '", finding.Message);
        Assert.Contains("', in design 'TelemetryMux': Elmore delay ", finding.Message);
        Assert.Contains(" ps", finding.Message);
        Assert.True(finding.Location.IsKnown);
        Assert.Contains(RuleCatalog.SeriesPassGates, RuleCatalog.All);
        Assert.Contains(Checker.Rules, r => r is PassGateChainRule);
        Assert.DoesNotContain(new TelemetryMux().Check(new RulePolicy { MaxSeriesPassGates = 6 }).Findings, f => f.RuleId == RuleCatalog.SeriesPassGates.Id);
    }

    // The example and its fix in docs/rules/PW2001.md (keep them in step). By hand: as the five-gate chain above,
    // but hop5 also drives an inverter (+2 fF gate load): hop5 4.5 fF, downstream +2 fF on every net:
    //   Elmore = 4 kΩ·23 fF + 5 kΩ·(20.5 + 16.5 + 12.5 + 8.5 + 4.5) fF = 92 + 312.5 = 404.5 ps; 0.69 × = 279 ps;
    //   restored: mean C (4·4 + 4.5)/5 = 4.1 fF, RC = 20.5 ps, the same driver on the input (2.5 fF) and the first
    //   segment, segments 2 + 2 + 1, two restoring stages: 0.69·4 kΩ·10.7 fF + 0.69·20.5 ps·7 + 40 ps = 169 ps.
    private sealed class TelemetryBus : Design
    {
        private readonly bool restored;

        public TelemetryBus(bool restored) => this.restored = restored;

        protected override void Describe(Circuit c)
        {
            var frame = c.Clock("frame", 20.Nanoseconds());
            var sample = c.Input("salinity");
            var hop1 = c.TransmissionGate(sample, frame.High, "hop1");
            var hop2 = c.TransmissionGate(hop1, frame.High, "hop2");
            var hop3 = c.TransmissionGate(restored ? c.Buffer(hop2, "fresh") : hop2, frame.High, "hop3");
            var hop4 = c.TransmissionGate(hop3, frame.High, "hop4");
            var hop5 = c.TransmissionGate(restored ? c.Buffer(hop4, "again") : hop4, frame.High, "hop5");
            c.Output("bus", c.Inverter(hop5));
        }
    }

    [Fact]
    public void Documented_example_and_its_fix()
    {
        var finding = Assert.Single(new TelemetryBus(restored: false).Check().Findings, f => f.RuleId == RuleCatalog.SeriesPassGates.Id);
        Assert.Equal("5 pass gates in series without a restoring stage (limit 2), starting at 'hop1' and passing the limit at 'hop3', in design 'TelemetryBus': Elmore delay 405 ps (50% estimate 279 ps); "
                     + "a restoring stage every 2 gates would give about 169 ps", finding.Message);
        Assert.Equal("hop2\nhop4", finding.Properties[FindingPropertyKeys.SplitAfterDevices]);
        Assert.DoesNotContain(new TelemetryBus(restored: true).Check().Findings, f => f.RuleId == RuleCatalog.SeriesPassGates.Id);
    }

    // The split sites a code fix needs (splitSites): a straight run of five separate calls, then a loop-like call that
    // makes four gates in a row, then one call through a helper. Spans are set as the compile-time elaborator sets them.
    // Chain positions: hop1..hop5 at calls 100..140, loop0..loop3 at call 200, last at call 300 (via a helper call 50).
    // Limit 2, spacing 2: splits after positions 2, 4, 6, 8 (count (10 - 1) / 2 = 4), next gates at 3, 5, 7, 9.
    [Fact]
    public void Split_sites_name_the_call_after_each_split_and_the_run_made_there()
    {
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        SourceSpan? site = null;
        c.SourceSiteProvider = () => site ?? SourceSpan.Unknown;
        var net = c.Input("sensor");
        for (var i = 1; i <= 5; i++)
        {
            site = new SourceSpan("/src/Buoy.cs", 10 + i, 9, 100 + 10 * (i - 1), 8);
            net = c.TransmissionGate(net, clock.High, "hop" + i);
        }

        site = new SourceSpan("/src/Buoy.cs", 20, 13, 200, 30);
        for (var i = 0; i < 4; i++)
            net = c.TransmissionGate(net, clock.High, "loop" + i);

        site = new SourceSpan("/src/Lib.cs", 3, 9, 300, 12, new[] { new SourceSpan("/src/Buoy.cs", 25, 9, 50, 20) });
        net = c.TransmissionGate(net, clock.High, "last");
        site = new SourceSpan("/src/Buoy.cs", 26, 9, 400, 10);
        c.Output("bus", c.Inverter(net));

        var finding = Assert.Single(Check(c));
        Assert.Equal("10", finding.Properties[FindingPropertyKeys.ChainLength]);
        Assert.Equal("hop2\nhop4\nloop0\nloop2", finding.Properties[FindingPropertyKeys.SplitAfterDevices]);
        var sites = finding.Properties[FindingPropertyKeys.SplitSites].Split('\n');
        Assert.Equal(new[]
        {
            "3|3|1|1|false|120|8|/src/Buoy.cs",   // hop3: its own call
            "5|5|1|1|false|140|8|/src/Buoy.cs",   // hop5
            "7|6|4|4|false|200|30|/src/Buoy.cs",  // loop1 (split after loop0): run of four at call 200 from position 6
            "9|6|4|4|false|200|30|/src/Buoy.cs",  // loop3
        }, sites);

        // Limit 1 (spacing 1): split before every gate from position 2 on; the helper's gate reports its caller.
        var strict = Assert.Single(Check(c, limit: 1));
        var last = strict.Properties[FindingPropertyKeys.SplitSites].Split('\n').Last();
        Assert.Equal("10|10|1|1|true|300|12|/src/Lib.cs", last);
    }

    [Fact]
    public void Split_sites_count_every_gate_a_call_makes_even_off_the_chain()
    {
        // One call makes two gates: one on the chain, one on a side branch. A fix at that call would touch both.
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        SourceSpan? site = null;
        c.SourceSiteProvider = () => site ?? SourceSpan.Unknown;
        var net = c.Input("sensor");
        site = new SourceSpan("/src/Buoy.cs", 1, 1, 10, 5);
        net = c.TransmissionGate(net, clock.High, "a");
        site = new SourceSpan("/src/Buoy.cs", 2, 1, 20, 5);
        net = c.TransmissionGate(net, clock.High, "b");
        site = new SourceSpan("/src/Buoy.cs", 3, 1, 30, 5);
        var side = c.TransmissionGate(c.Input("other"), clock.High, "side");
        net = c.TransmissionGate(net, clock.High, "c");
        c.Output("y", c.Inverter(net));
        c.Output("z", c.Inverter(side));

        var finding = Assert.Single(Check(c));
        Assert.Equal("3|3|1|2|false|30|5|/src/Buoy.cs", finding.Properties[FindingPropertyKeys.SplitSites]);
    }

    [Fact]
    public void Split_sites_at_run_time_have_no_character_span()
    {
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        Chain(c, c.Input("sensor"), clock.High, 3, "hop");
        var line = Assert.Single(Check(c)).Properties[FindingPropertyKeys.SplitSites];
        Assert.StartsWith("3|3|1|1|false|-1|0|", line, StringComparison.Ordinal);
    }

    private static string Name(Circuit c, string id) => c.ToNetlist().Devices[int.Parse(id, CultureInfo.InvariantCulture)].Name;
}
