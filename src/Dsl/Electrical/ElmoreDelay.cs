using System;

namespace Phaseward.Electrical;

/// <summary>
/// The Elmore delay of every node of an RC tree: the first moment of its impulse response,
/// T(i) = Σ over the resistances R_k on the path from the source to i of R_k · C_down(k), where C_down(k) is all the
/// capacitance downstream of R_k (equivalently Σ over every node j of C_j times the resistance shared by the paths
/// to i and to j). W. C. Elmore, "The Transient Response of Damped Linear Networks with Particular Regard to Wideband
/// Amplifiers", J. Appl. Phys. 19(1), 1948.
/// </summary>
public static class ElmoreDelay
{
    /// <summary>
    /// Elmore delays of all nodes in O(n): a backward sweep sums the downstream capacitance of each node, a forward
    /// sweep accumulates R · C_down along the paths from the root.
    /// </summary>
    public static Time[] Compute(RcTree tree)
    {
        if (tree is null) throw new ArgumentNullException(nameof(tree));
        var n = tree.Count;
        var downstream = DownstreamCapacitance(tree);
        var delays = new Time[n];
        for (var i = 0; i < n; i++)
        {
            var parent = tree.ParentOf(i);
            var upstream = parent < 0 ? Time.Zero : delays[parent];
            delays[i] = upstream + tree.ResistanceOf(i) * downstream[i];
        }

        return delays;
    }

    /// <summary>For every node, its own capacitance plus that of every node below it.</summary>
    public static Capacitance[] DownstreamCapacitance(RcTree tree)
    {
        if (tree is null) throw new ArgumentNullException(nameof(tree));
        var n = tree.Count;
        var downstream = new Capacitance[n];
        for (var i = 0; i < n; i++)
            downstream[i] = tree.CapacitanceOf(i);
        // Children have larger numbers than their parents: sweeping backwards finishes every child before its parent.
        for (var i = n - 1; i > 0; i--)
            downstream[tree.ParentOf(i)] += downstream[i];
        return downstream;
    }
}
