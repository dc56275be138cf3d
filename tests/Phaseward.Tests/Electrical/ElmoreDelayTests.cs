using System;
using System.Linq;
using CsCheck;
using Phaseward.Electrical;
using Phaseward.Tests.Properties;
using Phaseward.Tests.Reference;

namespace Phaseward.Tests.Electrical;

public class ElmoreDelayTests
{
    // Closed form for the far end of a uniform N-section ladder: Σ_{k=1..N} R·(N−k+1)·C = N(N+1)/2 · R·C
    // (each section's R carries the capacitance of itself and every section after it). Elmore, J. Appl. Phys. 19(1), 1948,
    // for the delay measure; the sum is elementary.
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(7)]
    [InlineData(16)]
    [InlineData(100)]
    [InlineData(1000)]
    public void Uniform_ladder_far_end_matches_the_closed_form(int sections)
    {
        var r = 5.Kiloohms();
        var c = 4.Femtofarads();
        var delays = ElmoreDelay.Compute(ReferenceTrees.UniformLadder(sections, r, c));

        var expected = sections * (sections + 1) / 2.0 * (r * c).Seconds;
        Assert.Equal(expected, delays[sections - 1].Seconds, expected * 1e-12);
        // Every interior node k (1-based) has Σ_{j=1..k} R·(N−j+1)·C = R·C·(k·N − k(k−1)/2).
        for (var k = 1; k <= sections; k++)
        {
            var interior = (r * c).Seconds * (k * (double)sections - k * (k - 1) / 2.0);
            Assert.Equal(interior, delays[k - 1].Seconds, interior * 1e-12);
        }
    }

    // Hand working, tree A (values from tests/reference/ngspice/README.md). Total C = 5+8+6+4+12+3+5+4+20 = 67 fF.
    // Downstream C: t1 67, t2 62, t3 54, a1 16, a2 12, b1 32, b2 29, b3 24, b4 20 (fF); kΩ·fF = ps.
    //   a2: 2·67 + 3·62 + 4·54 + 10·16 + 15·12 = 134 + 186 + 216 + 160 + 180 = 876 ps
    //   b4: 134 + 186 + 216 + 6·32 + 8·29 + 7·24 + 12·20 = 536 + 192 + 232 + 168 + 240 = 1368 ps
    //   t3: 134 + 186 + 216 = 536 ps
    // Tree B. Total C = 2+10+5+6+6+2+3+3+3 = 40 fF; downstream: s 40, d1 19, e1 12, e2 6, g1 9, g2 6, g3 3.
    //   c1: 1·40 + 20·10 = 240 ps
    //   e2: 40 + 5·19 + 8·12 + 8·6 = 40 + 95 + 96 + 48 = 279 ps
    //   f1: 40 + 95 + 30·2 = 195 ps
    //   g3: 40 + 3·9 + 3·6 + 3·3 = 94 ps
    // (The same figures are in the README's table beside the ngspice t50 values.)
    [Theory]
    [InlineData("a", "a2", 876)]
    [InlineData("a", "b4", 1368)]
    [InlineData("a", "t3", 536)]
    [InlineData("b", "c1", 240)]
    [InlineData("b", "e2", 279)]
    [InlineData("b", "f1", 195)]
    [InlineData("b", "g3", 94)]
    public void Branched_trees_match_the_hand_worked_sums(string tree, string node, double picoseconds)
    {
        var (rc, nodes) = tree == "a" ? ReferenceTrees.TreeA() : ReferenceTrees.TreeB();
        var delays = ElmoreDelay.Compute(rc);
        Assert.Equal(picoseconds * 1e-12, delays[nodes[node]].Seconds, 1e-9 * picoseconds * 1e-12);
    }

    // The definition in its other form (Rubinstein, Penfield & Horowitz, "Signal Delay in RC Tree Networks",
    // IEEE Trans. CAD 2(3), 1983 — from memory): T(i) = Σ_j C_j · R_ij, R_ij the resistance common to the paths from the
    // source to i and to j. Computed here by brute force (O(n²)) on random trees, against the O(n) two-pass algorithm.
    [Fact]
    public void Two_pass_algorithm_equals_the_shared_path_resistance_sum_on_random_trees()
    {
        // Trees drawn by CsCheck from a choice sequence: a failure shrinks to a small tree, printed with its seed.
        ChoiceSequence.Of(200).Sample(choices =>
        {
            var tree = RandomTree(new ChoiceSequence(choices));
            var delays = ElmoreDelay.Compute(tree);
            for (var i = 0; i < tree.Count; i++)
            {
                var sum = 0.0;
                for (var j = 0; j < tree.Count; j++)
                    sum += tree.CapacitanceOf(j).Farads * SharedResistance(tree, i, j);
                Assert.Equal(sum, delays[i].Seconds, Math.Max(1e-24, sum * 1e-12));
            }
        }, iter: 200, print: choices => DescribeTree(RandomTree(new ChoiceSequence(choices))));
    }

    private static RcTree RandomTree(Random random)
    {
        var n = random.Next(1, 60);
        var tree = new RcTree(new Resistance(random.Next(100, 10000)), new Capacitance(random.Next(1, 30) * 1e-15));
        for (var i = 1; i < n; i++)
            tree.AddBranch(random.Next(0, i), new Resistance(random.Next(100, 20000)), new Capacitance(random.Next(0, 30) * 1e-15));
        return tree;
    }

    private static string DescribeTree(RcTree tree)
        => string.Join("; ", Enumerable.Range(0, tree.Count).Select(i => $"{i}<-{tree.ParentOf(i)} {tree.ResistanceOf(i)} {tree.CapacitanceOf(i)}"));

    [Fact]
    public void Bad_input_names_the_argument_and_the_value()
    {
        var tree = new RcTree(1.Kiloohms(), 1.Femtofarads());
        var parent = Assert.Throws<ArgumentOutOfRangeException>(() => tree.AddBranch(3, 1.Kiloohms(), 1.Femtofarads()));
        Assert.Equal("parent", parent.ParamName);
        Assert.Contains("was 3", parent.Message);
        var resistance = Assert.Throws<ArgumentException>(() => tree.AddBranch(0, (-2).Kiloohms(), 1.Femtofarads()));
        Assert.Equal("resistance", resistance.ParamName);
        Assert.Contains("-2 kΩ", resistance.Message);
        Assert.Throws<ArgumentException>(() => new RcTree(Resistance.Zero, 1.Femtofarads()));
        Assert.Throws<ArgumentException>(() => tree.AddBranch(0, 1.Kiloohms(), (-1).Femtofarads()));
        Assert.Equal(1, tree.Count);
    }

    private static double SharedResistance(RcTree tree, int a, int b)
    {
        var onPathToA = new System.Collections.Generic.HashSet<int>();
        for (var x = a; x >= 0; x = tree.ParentOf(x)) onPathToA.Add(x);
        var shared = 0.0;
        for (var x = b; x >= 0; x = tree.ParentOf(x))
            if (onPathToA.Contains(x)) shared += tree.ResistanceOf(x).Ohms;
        return shared;
    }
}
