using System.Linq;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Sequencing;
using Phaseward.Tests.Reference;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Electrical;

/// <summary>
/// The one pass-gate delay model (PassGateNetwork) on a 4-bit log rotator: two 2:1 mux stages (rotate by 1 on s0, by 2
/// on s1), each output bit a pair of pass gates on a select and its inverse, into dynamic latches. The conducting
/// path from a source latch's output inverter to a capturing latch's storage node is three pass gates; the other
/// branch at each mux input is on the inverse select, so it is off.
/// Hand computation on the "flat" test figures (every net 10 fF, restoring stages 4 kΩ, pass gates 5 kΩ), Elmore
/// delay T = Σ_k R_k · C_down(k) (W. C. Elmore, J. Appl. Phys. 19(1), 1948), a side branch being a capacitive load
/// where it leaves the path (J. Rubinstein, P. Penfield, M. A. Horowitz, "Signal Delay in RC Tree Networks", IEEE
/// Trans. CAD 2(3), 1983, T_i = Σ_k R_ki C_k):
///   driver 4 kΩ · (d0 + m1 + m2 + x = 40 fF) = 160 ps; gate 1: 5 kΩ · 30 fF = 150 ps; gate 2: 5 kΩ · 20 fF = 100 ps;
///   entry gate: 5 kΩ · 10 fF = 50 ps; T(x) = 460 ps, T(m2) = 410 ps.
/// With every branch conducting (selects not known to be exclusive) the driver sees 10 + 2 · 50 = 110 fF and gate 1
/// 50 fF: T(x) = 440 + 250 + 100 + 50 = 840 ps.
/// </summary>
public class ConductingPathDelayTests
{
    private static Netlist Rotator(bool invertedSelects, bool stated = false)
    {
        var c = Figures.NewCircuit("rotator");
        var clk = c.Clock("clk", 2.Nanoseconds(), 0.5, 0.Picoseconds());
        var d = Enumerable.Range(0, 4).Select(i => c.DynamicLatch(c.Input("in" + i), clk.Low, "A" + i)).ToArray();
        var s0 = c.Input("s0");
        var s1 = c.Input("s1");
        var ns0 = invertedSelects ? c.Inverter(s0, "ns0") : c.Input("ns0");
        var ns1 = invertedSelects ? c.Inverter(s1, "ns1") : c.Input("ns1");
        if (stated)
        {
            c.Exclusive(s0, ns0);
            c.Exclusive(ns1, s1);
        }

        var m1 = Stage(c, d, 1, s0, ns0, "m1_");
        var m2 = Stage(c, m1, 2, s1, ns1, "m2_");
        for (var i = 0; i < 4; i++)
            c.DynamicLatch(m2[i], clk.High, "L" + i);
        return c.ToNetlist();
    }

    private static Net[] Stage(Circuit c, Net[] input, int shift, Net select, Net inverse, string prefix)
    {
        var outputs = new Net[input.Length];
        for (var i = 0; i < input.Length; i++)
        {
            outputs[i] = c.Node(prefix + i);
            c.TransmissionGate(input[i], inverse, outputs[i]);
            c.TransmissionGate(input[(i - shift + input.Length) % input.Length], select, outputs[i]);
        }

        return outputs;
    }

    private static PassGateRun RunInto(Netlist netlist, string latch)
        => PassGateChains.Of(netlist).Single(r => r.Last.Output.Name == latch + ".x");

    [Fact]
    public void The_conducting_path_counts_inverse_select_branches_as_off()
    {
        var run = RunInto(Rotator(invertedSelects: true), "L0");
        Assert.Equal(3, run.Length);
        Assert.Equal(460.0, Figures.Ps(run.ElmoreDelay), 9);
    }

    [Fact]
    public void Selects_not_known_to_be_exclusive_count_every_branch_and_say_so()
    {
        var netlist = Rotator(invertedSelects: false);
        Assert.Equal(840.0, Figures.Ps(RunInto(netlist, "L0").ElmoreDelay), 9);

        var finding = new PassGateChainRule().Check(new RuleContext(netlist, new RulePolicy { MaxSeriesPassGates = 2 })).First();
        Assert.EndsWith(PassGateChainRule.ExclusivityAssumption, finding.Message);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.AssumesUnknownBranchesConduct]);
    }

    [Fact]
    public void Stating_the_selects_exclusive_gives_the_conducting_path_and_drops_the_assumption()
    {
        var netlist = Rotator(invertedSelects: false, stated: true);
        Assert.Equal(460.0, Figures.Ps(RunInto(netlist, "L0").ElmoreDelay), 9);

        var finding = new PassGateChainRule().Check(new RuleContext(netlist, new RulePolicy { MaxSeriesPassGates = 2 })).First();
        Assert.DoesNotContain("assumes", finding.Message);
        Assert.Equal("false", finding.Properties[FindingPropertyKeys.AssumesUnknownBranchesConduct]);
    }

    [Fact]
    public void An_assumption_made_inside_a_run_is_reported_with_it()
    {
        // in → g1 → n1 → g2 → n2 → g3 → n3, and n3 feeds g4 (on p) and g5 (on q), selects not known to be exclusive:
        // only g3, in the middle of the run, charges branches counted as conducting together. The same Elmore sum on
        // the flat figures: 4 kΩ · 60 fF + 5 kΩ · (50 + 40 + 30 + 10) fF = 240 + 650 = 890 ps at the end of g4.
        var c = Figures.NewCircuit("spur");
        var n1 = c.Node("n1");
        var n2 = c.Node("n2");
        var n3 = c.Node("n3");
        c.TransmissionGate(c.Input("in"), c.Input("e1"), n1);
        c.TransmissionGate(n1, c.Input("e2"), n2);
        c.TransmissionGate(n2, c.Input("e3"), n3);
        foreach (var (select, name) in new[] { (c.Input("p"), "o1"), (c.Input("q"), "o2") })
        {
            var o = c.Node(name);
            c.TransmissionGate(n3, select, o);
            c.Inverter(o, name + "_b");
        }

        var finding = new PassGateChainRule().Check(new RuleContext(c.ToNetlist(), new RulePolicy { MaxSeriesPassGates = 2 })).Single();
        Assert.EndsWith(PassGateChainRule.ExclusivityAssumption, finding.Message);
        Assert.Equal("true", finding.Properties[FindingPropertyKeys.AssumesUnknownBranchesConduct]);
        var runs = PassGateChains.Of(c.ToNetlist()).Where(r => r.Length == 4).ToList();
        Assert.Equal(new[] { "o1", "o2" }, runs.Select(r => r.Last.Output.Name).OrderBy(n => n));
        Assert.All(runs, r => Assert.Equal(890.0, Figures.Ps(r.ElmoreDelay), 9));
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void A_mux_wider_than_the_branches_compared_counts_them_all_and_is_an_assumption_unless_one_group_holds_them(bool stated)
    {
        // in → g1 → n1 → g2 → n2, and n2 feeds 70 branches (more than PassGateNetwork.MaxBranchesCompared), each a gate
        // on its own select into a 10 fF node. All 70 are counted either way; with the selects in one stated group no
        // two of them conduct together as far as anything known goes, so the figure is no assumption. The Elmore sum
        // on the flat figures: 4 kΩ · 730 fF + 5 kΩ · 720 fF + 5 kΩ · 710 fF + 5 kΩ · 10 fF = 10,120 ps at a branch's end.
        const int width = 70;
        Assert.True(width > PassGateNetwork.MaxBranchesCompared);
        var c = Figures.NewCircuit("wide");
        var n1 = c.Node("n1");
        var n2 = c.Node("n2");
        c.TransmissionGate(c.Input("in"), c.Input("e1"), n1);
        c.TransmissionGate(n1, c.Input("e2"), n2);
        var selects = Enumerable.Range(0, width).Select(i => c.Input("s" + i)).ToArray();
        if (stated) c.Exclusive(selects);
        for (var i = 0; i < width; i++)
        {
            var o = c.Node("o" + i);
            c.TransmissionGate(n2, selects[i], o);
            c.Inverter(o, "o" + i + "_b");
        }

        var netlist = c.ToNetlist();
        var runs = PassGateChains.Of(netlist).Where(r => r.Length == 3).ToList();
        Assert.Equal(width, runs.Count);
        Assert.All(runs, r => Assert.Equal(10_120.0, Figures.Ps(r.ElmoreDelay), 6));
        var finding = new PassGateChainRule().Check(new RuleContext(netlist, new RulePolicy { MaxSeriesPassGates = 2 })).First();
        Assert.Equal(stated ? "false" : "true", finding.Properties[FindingPropertyKeys.AssumesUnknownBranchesConduct]);
    }

    // The rotator's conducting path again, in -4k- a -5k- n1 -5k- n2 -5k- n3 (flat figures), its three gates on
    // clk.High, with a 40 fF branch s1 leaving n1 through a gate on the phase given.
    private static double PathWithBranchOn(bool sameClockPhase)
    {
        var c = Figures.NewCircuit("branch");
        var clk = c.Clock("clk", 2.Nanoseconds(), 0.5, 0.Picoseconds());
        var a = c.Inverter(c.Input("in"), "a");
        var n1 = c.Node("n1");
        var n2 = c.Node("n2");
        var n3 = c.Node("n3");
        var s1 = c.Node("s1");
        c.TransmissionGate(a, clk.High, n1);
        c.TransmissionGate(n1, clk.High, n2);
        c.TransmissionGate(n2, clk.High, n3);
        c.TransmissionGate(n1, sameClockPhase ? clk.High : clk.Low, s1);
        c.SetCapacitance(s1, 40.Femtofarads());
        c.Inverter(n3, "out");
        c.Inverter(s1, "side");
        return Figures.Ps(PassGateChains.Of(c.ToNetlist()).Single(r => r.Last.Output.Name == "n3").ElmoreDelay);
    }

    [Fact]
    public void A_branch_on_a_phase_that_cannot_conduct_with_the_path_is_not_its_load()
    {
        // While the path's clk.High gates conduct, the clk.Low gate is off (the two phases of one clock do not overlap
        // beyond its skew), so the path is the ladder of tests/reference/ngspice/netlists/rc_tree_rotator.cir:
        // 4 kΩ · 40 fF + 5 kΩ · (30 + 20 + 10) fF = 460 ps, and ngspice-39's t50 at its far end is bounded by it (Gupta,
        // Tutuianu, Pileggi, IEEE Trans. CAD 16(1), 1997), 0.69 · T within 10 % of it.
        var elmore = PathWithBranchOn(sameClockPhase: false);
        Assert.Equal(460.0, elmore, 9);
        var t50 = NgspiceReference.TreeT50("rc_tree_rotator", "x") * 1e12;
        Assert.True(elmore >= t50, $"Elmore {elmore} ps below simulated t50 {t50} ps");
        Assert.InRange(0.69 * elmore / t50, 0.90, 1.10);

        // On the same phase the branch conducts with the path and loads it where it leaves, at n1:
        // 4 kΩ · 80 fF + 5 kΩ · (70 + 20 + 10) fF = 820 ps (the side-branch form of Rubinstein, Penfield, Horowitz).
        Assert.Equal(820.0, PathWithBranchOn(sameClockPhase: true), 9);
    }

    [Fact]
    public void The_setup_path_and_the_entry_delay_add_up_to_the_same_Elmore_delay()
    {
        // The latch-to-latch path ends at L0's input m2_0: 0.69 · T(m2) = 0.69 · 410 ps; L0's entry (the latch table's
        // entry delay) is 0.69 · 50 ps; together 0.69 · T(x), PW2001's figure with the stage factor of the timing rules.
        var netlist = Rotator(invertedSelects: true);
        var model = LatchModel.Of(netlist);
        var path = model.Paths.Single(p => p.From.Name == "A0" && p.To.Name == "L0");
        Assert.Equal(0.69 * 410, Figures.Ps(path.MaxDelay), 9);
        Assert.Equal(0.69 * 50, Figures.Ps(model.EntryDelay(path.To)), 9);
        Assert.Equal(0.69 * Figures.Ps(RunInto(netlist, "L0").ElmoreDelay), Figures.Ps(path.MaxDelay + model.EntryDelay(path.To)), 9);
        // The shortest delay counts each stage's own net only (no side load): 0.69 · (4 kΩ + 5 kΩ + 5 kΩ) · 10 fF.
        Assert.Equal(0.69 * 140, Figures.Ps(path.MinDelay), 9);
    }

    [Fact]
    public void The_conducting_path_against_the_circuit_simulator()
    {
        // ngspice-39 on the conducting path (tests/reference/ngspice/netlists/rc_tree_rotator.cir and
        // rc_tree_rotator_all.cir, regenerate.sh). The Elmore delay bounds the 50 % delay of an RC tree's step response
        // from above (R. Gupta, B. Tutuianu, L. T. Pileggi, "The Elmore Delay as a Bound for RC Trees with Generalized
        // Input Signals", IEEE Trans. CAD 16(1), 1997); the first-order 0.69 · T is within 10 % of the simulated t50.
        var t50 = NgspiceReference.TreeT50("rc_tree_rotator", "x") * 1e12;
        var elmore = Figures.Ps(RunInto(Rotator(invertedSelects: true), "L0").ElmoreDelay);
        Assert.True(elmore >= t50, $"Elmore {elmore} ps below simulated t50 {t50} ps");
        Assert.InRange(0.69 * elmore / t50, 0.90, 1.10);

        // Counting the inverse-select branches as conducting describes a different, slower circuit: its own t50 is
        // 603 ps, far from the 347 ps the rotator really has.
        var allT50 = NgspiceReference.TreeT50("rc_tree_rotator_all", "xa") * 1e12;
        var allElmore = Figures.Ps(RunInto(Rotator(invertedSelects: false), "L0").ElmoreDelay);
        Assert.True(allElmore >= allT50);
        Assert.InRange(0.69 * allElmore / allT50, 0.90, 1.10);
        Assert.True(allT50 > 1.5 * t50);
    }
}

/// <summary>A decoder-driven one-hot barrel shifter: stating the decoded selects exclusive leaves one branch on each
/// sampled bit.</summary>
public class OneHotShifterLoadTests
{
    private static (Netlist Netlist, Device Gate) Shifter(bool stated)
    {
        var c = Figures.NewCircuit("shifter");
        var a0 = c.Input("a0");
        var a1 = c.Input("a1");
        var na0 = c.Inverter(a0);
        var na1 = c.Inverter(a1);
        var rotate = new[] { c.Nor(a1, a0), c.Nor(a1, na0), c.Nor(na1, a0), c.Nor(na1, na0) };
        if (stated) c.Exclusive(rotate);
        var bits = Enumerable.Range(0, 4).Select(i => c.Inverter(c.Input("d" + i))).ToArray();
        for (var j = 0; j < 4; j++)
        {
            var bit = c.Node("out" + j);
            for (var k = 0; k < 4; k++)
                c.TransmissionGate(bits[(j - k + 4) % 4], rotate[k], bit);
            c.Inverter(bit);
        }

        var netlist = c.ToNetlist();
        return (netlist, netlist.Devices.First(d => d.IsPassDevice));
    }

    [Fact]
    public void Stated_one_hot_selects_leave_one_branch_on_each_bit()
    {
        // Each bit's net (10 fF, flat test figures) feeds four gates, each into an output net of 10 fF read by an
        // inverter. Its driver sees 10 + 10 fF with one select on (the other three branches off), 10 + 4 · 10 fF when
        // the selects are not known to be exclusive (and then says it assumes so).
        var (stated, gate) = Shifter(stated: true);
        var network = PassGateNetwork.Of(stated);
        Assert.Equal(20.0, network.RootLoad(gate).Farads * 1e15, 9);
        Assert.False(network.RootLoadAssumes(gate));

        var (unstated, first) = Shifter(stated: false);
        var all = PassGateNetwork.Of(unstated);
        Assert.Equal(50.0, all.RootLoad(first).Farads * 1e15, 9);
        Assert.True(all.RootLoadAssumes(first));
    }
}
