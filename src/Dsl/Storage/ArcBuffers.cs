using System.Collections.Generic;
using Phaseward.Clocking;

namespace Phaseward.Storage;

/// <summary>
/// Scratch lists for combining the conduction windows of one storage node after another: a rule keeps one set for
/// all the nodes it checks, so that a node costs no allocation. Each use overwrites them.
/// </summary>
internal sealed class ArcBuffers
{
    /// <summary>The root clocks of a node's drivers, in order of first appearance.</summary>
    public List<Clock> Roots { get; } = new(1);

    /// <summary>The arcs of the drivers on one root clock.</summary>
    public List<Arc> Arcs { get; } = new(2);

    /// <summary>The arcs cut into pieces inside one period.</summary>
    public List<(double Start, double End)> Pieces { get; } = new(4);

    /// <summary>The pieces merged.</summary>
    public List<TimeInterval> Union { get; } = new(4);
}
