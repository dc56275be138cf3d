using System;
using System.Collections.Generic;
using System.Linq;
using CsCheck;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Tests.Properties;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Electrical;

/// <summary>
/// The pass-gate delay model on random trees of pass gates on the two phases of one clock, against the Elmore delay of
/// the RC tree that is really connected while a clk.High path conducts: every clk.Low gate open, so its whole subtree
/// gone (the phases do not overlap). Reference: the two-pass RC-tree algorithm (ElmoreDelay), itself checked against the
/// shared-path-resistance sum (Rubinstein, Penfield, Horowitz, IEEE Trans. CAD 2(3), 1983) and ngspice (ElmoreDelayTests).
/// </summary>
public class PhaseSideLoadPropertyTests
{
    private sealed record Branch(int Parent, bool High, double Ohms, double Femtofarads);

    [Fact]
    public void A_high_path_through_a_random_two_phase_tree_has_the_Elmore_delay_of_the_tree_without_its_low_branches()
    {
        ChoiceSequence.Of(120).Sample(choices =>
        {
            var (rootFemtofarads, branches, target) = RandomTree(new ChoiceSequence(choices));
            if (target < 0) return;
            Assert.Equal(Reference(rootFemtofarads, branches, target), Model(rootFemtofarads, branches, target), 1e-9 * Reference(rootFemtofarads, branches, target));
        }, iter: 300, print: choices => Describe(RandomTree(new ChoiceSequence(choices))));
    }

    // Node 0 is the net an inverter drives (4 kΩ on the flat figures); node i > 0 is the output of a pass gate from its
    // parent. The target is a node whose path from the root is all clk.High (-1 when there is none).
    private static (double RootFemtofarads, List<Branch> Branches, int Target) RandomTree(Random random)
    {
        var rootFemtofarads = random.Next(1, 30);
        var branches = new List<Branch> { new(-1, true, 0, rootFemtofarads) };
        var count = random.Next(2, 25);
        for (var i = 1; i < count; i++)
            branches.Add(new Branch(random.Next(0, i), random.Next(3) > 0, random.Next(1, 20) * 1000.0, random.Next(1, 40)));
        var candidates = Enumerable.Range(1, count - 1).Where(i => AllHigh(branches, i)).ToList();
        return (rootFemtofarads, branches, candidates.Count == 0 ? -1 : candidates[random.Next(candidates.Count)]);
    }

    private static bool AllHigh(List<Branch> branches, int node)
    {
        for (var x = node; x > 0; x = branches[x].Parent)
            if (!branches[x].High) return false;
        return true;
    }

    // The connected tree: the nodes reached from the root through clk.High gates only.
    private static double Reference(double rootFemtofarads, List<Branch> branches, int target)
    {
        var tree = new RcTree(4.Kiloohms(), new Capacitance(rootFemtofarads * 1e-15));
        var index = new Dictionary<int, int> { [0] = RcTree.Root };
        for (var i = 1; i < branches.Count; i++)
            if (AllHigh(branches, i))
                index[i] = tree.AddBranch(index[branches[i].Parent], new Resistance(branches[i].Ohms), new Capacitance(branches[i].Femtofarads * 1e-15));
        return ElmoreDelay.Compute(tree)[index[target]].Seconds;
    }

    // The model's terms along the path: the driver's resistance times its root load, then each gate's on-resistance
    // times what it charges (PassGateNetwork.ElmoreTerm).
    private static double Model(double rootFemtofarads, List<Branch> branches, int target)
    {
        var c = Figures.NewCircuit("tree");
        var clk = c.Clock("clk", 2.Nanoseconds(), 0.5, 0.Picoseconds());
        var nets = new Net[branches.Count];
        nets[0] = c.Inverter(c.Input("in"), "n0");
        c.SetCapacitance(nets[0], new Capacitance(rootFemtofarads * 1e-15));
        for (var i = 1; i < branches.Count; i++)
        {
            var b = branches[i];
            nets[i] = c.Node("n" + i);
            c.SetCapacitance(nets[i], new Capacitance(b.Femtofarads * 1e-15));
            c.TransmissionGate(nets[b.Parent], b.High ? clk.High : clk.Low, nets[i], new Resistance(b.Ohms));
        }

        var netlist = c.ToNetlist();
        var network = PassGateNetwork.Of(netlist);
        Device GateOf(int i) => netlist.Devices.Single(d => d.IsPassDevice && d.Output.Name == "n" + i);
        var path = new List<int>();
        for (var x = target; x > 0; x = branches[x].Parent)
            path.Add(x);
        path.Reverse();
        var first = GateOf(path[0]);
        var elmore = network.RootResistanceOf(first.Inputs[0]).Ohms * network.RootLoad(first).Farads;
        foreach (var i in path)
            elmore += network.ElmoreTerm(GateOf(i)).Seconds;
        return elmore;
    }

    private static string Describe((double RootFemtofarads, List<Branch> Branches, int Target) tree)
        => $"root {tree.RootFemtofarads} fF, target n{tree.Target}: "
           + string.Join("; ", tree.Branches.Skip(1).Select((b, i) => $"n{i + 1}<-n{b.Parent} {(b.High ? "High" : "Low")} {b.Ohms} Ω {b.Femtofarads} fF"));
}
