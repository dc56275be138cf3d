using System;
using System.Collections.Generic;
using Phaseward.Internal;

namespace Phaseward.Electrical;

/// <summary>
/// An RC tree driven by a step source: the root node hangs from the source through the driver's resistance, every
/// other node hangs from its parent through a branch resistance (a pass gate's on-resistance), and every node has a
/// capacitance to ground (its net's total capacitance, fan-out loads included).
/// </summary>
/// <remarks>Nodes are numbered in order of addition and a parent always precedes its children, so one forward and one
/// backward sweep over the node numbers visit the tree in topological order.</remarks>
public sealed class RcTree
{
    private readonly List<int> parents = new();
    private readonly List<Resistance> resistances = new();
    private readonly List<Capacitance> capacitances = new();

    /// <summary>Starts a tree: node 0 (the root) is driven from the step source through <paramref name="driverResistance"/>.</summary>
    public RcTree(Resistance driverResistance, Capacitance rootCapacitance)
    {
        Add(-1, driverResistance, rootCapacitance, nameof(driverResistance), nameof(rootCapacitance));
    }

    /// <summary>The number of the root node.</summary>
    public const int Root = 0;

    /// <summary>Number of nodes, the root included.</summary>
    public int Count => parents.Count;

    /// <summary>Adds a node hanging from <paramref name="parent"/> through <paramref name="resistance"/>; returns its number.</summary>
    public int AddBranch(int parent, Resistance resistance, Capacitance capacitance)
    {
        if ((uint)parent >= (uint)parents.Count)
            throw new ArgumentOutOfRangeException(nameof(parent), parent, $"'{nameof(parent)}' must be the number of a node already in the tree (0..{parents.Count - 1}); was {parent}.");
        return Add(parent, resistance, capacitance, nameof(resistance), nameof(capacitance));
    }

    /// <summary>The node's parent (-1 for the root).</summary>
    public int ParentOf(int node) => parents[CheckNode(node)];

    /// <summary>The resistance between the node and its parent (the driver's resistance for the root).</summary>
    public Resistance ResistanceOf(int node) => resistances[CheckNode(node)];

    /// <summary>The node's capacitance to ground.</summary>
    public Capacitance CapacitanceOf(int node) => capacitances[CheckNode(node)];

    private int Add(int parent, Resistance resistance, Capacitance capacitance, string resistanceName, string capacitanceName)
    {
        Guard.Positive(resistance.Ohms, resistanceName, "Ω");
        Guard.NonNegative(capacitance.Farads, capacitanceName, "F");
        parents.Add(parent);
        resistances.Add(resistance);
        capacitances.Add(capacitance);
        return parents.Count - 1;
    }

    private int CheckNode(int node)
    {
        if ((uint)node >= (uint)parents.Count)
            throw new ArgumentOutOfRangeException(nameof(node), node, $"'{nameof(node)}' must be a node of the tree (0..{parents.Count - 1}); was {node}.");
        return node;
    }
}
