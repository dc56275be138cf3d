using System.Collections.Generic;
using Phaseward.Electrical;

namespace Phaseward.Tests.Reference;

/// <summary>
/// The two branched RC trees of tests/reference/ngspice (netlists/rc_tree_a.cir and rc_tree_b.cir; values there are
/// illustrative, chosen for the reference). The first section's resistor is the tree's driver resistance.
/// </summary>
internal static class ReferenceTrees
{
    /// <summary>in -2k- t1(5f) -3k- t2(8f) -4k- t3(6f); t3 -10k- a1(4f) -15k- a2(12f); t3 -6k- b1(3f) -8k- b2(5f) -7k- b3(4f) -12k- b4(20f).</summary>
    public static (RcTree Tree, Dictionary<string, int> Nodes) TreeA()
    {
        var tree = new RcTree(2.Kiloohms(), 5.Femtofarads());
        var nodes = new Dictionary<string, int> { ["t1"] = RcTree.Root };
        nodes["t2"] = tree.AddBranch(nodes["t1"], 3.Kiloohms(), 8.Femtofarads());
        nodes["t3"] = tree.AddBranch(nodes["t2"], 4.Kiloohms(), 6.Femtofarads());
        nodes["a1"] = tree.AddBranch(nodes["t3"], 10.Kiloohms(), 4.Femtofarads());
        nodes["a2"] = tree.AddBranch(nodes["a1"], 15.Kiloohms(), 12.Femtofarads());
        nodes["b1"] = tree.AddBranch(nodes["t3"], 6.Kiloohms(), 3.Femtofarads());
        nodes["b2"] = tree.AddBranch(nodes["b1"], 8.Kiloohms(), 5.Femtofarads());
        nodes["b3"] = tree.AddBranch(nodes["b2"], 7.Kiloohms(), 4.Femtofarads());
        nodes["b4"] = tree.AddBranch(nodes["b3"], 12.Kiloohms(), 20.Femtofarads());
        return (tree, nodes);
    }

    /// <summary>in -1k- s(2f); s -20k- c1(10f); s -5k- d1(5f); d1 -8k- e1(6f) -8k- e2(6f); d1 -30k- f1(2f); s -3k- g1(3f) -3k- g2(3f) -3k- g3(3f).</summary>
    public static (RcTree Tree, Dictionary<string, int> Nodes) TreeB()
    {
        var tree = new RcTree(1.Kiloohms(), 2.Femtofarads());
        var nodes = new Dictionary<string, int> { ["s"] = RcTree.Root };
        nodes["c1"] = tree.AddBranch(nodes["s"], 20.Kiloohms(), 10.Femtofarads());
        nodes["d1"] = tree.AddBranch(nodes["s"], 5.Kiloohms(), 5.Femtofarads());
        nodes["e1"] = tree.AddBranch(nodes["d1"], 8.Kiloohms(), 6.Femtofarads());
        nodes["e2"] = tree.AddBranch(nodes["e1"], 8.Kiloohms(), 6.Femtofarads());
        nodes["f1"] = tree.AddBranch(nodes["d1"], 30.Kiloohms(), 2.Femtofarads());
        nodes["g1"] = tree.AddBranch(nodes["s"], 3.Kiloohms(), 3.Femtofarads());
        nodes["g2"] = tree.AddBranch(nodes["g1"], 3.Kiloohms(), 3.Femtofarads());
        nodes["g3"] = tree.AddBranch(nodes["g2"], 3.Kiloohms(), 3.Femtofarads());
        return (tree, nodes);
    }

    public static RcTree UniformLadder(int sections, Resistance r, Capacitance c)
    {
        var tree = new RcTree(r, c);
        var last = RcTree.Root;
        for (var i = 1; i < sections; i++)
            last = tree.AddBranch(last, r, c);
        return tree;
    }
}
