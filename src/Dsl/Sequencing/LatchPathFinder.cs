using System;
using System.Collections.Generic;
using System.Threading;

namespace Phaseward.Sequencing;

/// <summary>
/// Every latch-to-latch path of a netlist: one shortest and one longest search per latch over its fan-out cone up
/// to the next latches (<see cref="LatchCone"/>), so the cost is the size of the cones, never a search per pair.
/// </summary>
/// <remarks>
/// The cones can still add up to the square of the design: in a ripple chain every latch reaches every later one.
/// A budget of search steps (each net a search reaches, each path listed) bounds that. The sources are searched in
/// latch order and each source's search is finished before the budget is looked at, so a stopped search lists every
/// path of a prefix of the latches and none of the rest (<see cref="LatchPathSearch.LatchesSearched"/>).
/// </remarks>
internal static class LatchPathFinder
{
    public static LatchPathSearch Find(LatchCone cone, IReadOnlyList<Latch> latches, long budget, CancellationToken cancellationToken = default)
    {
        var paths = new List<LatchPath>();
        var shortest = new ShortestPathSearch(cone);
        var longest = new LongestPathSearch(cone);
        long steps = 0;
        for (var index = 0; index < latches.Count; index++)
        {
            if (steps >= budget)
                return new LatchPathSearch(paths, index, steps, budget);
            cancellationToken.ThrowIfCancellationRequested();
            var source = latches[index];
            shortest.Run(source.Storage);
            steps += shortest.NetsReached;
            if (shortest.Gates.Count == 0)
                continue;
            longest.Run(source.Storage);
            steps += longest.NetsReached + shortest.Gates.Count;
            foreach (var gate in shortest.Gates)
            {
                var min = shortest.GateDelay[gate];
                var max = longest.GateDelay.TryGetValue(gate, out var m) ? Math.Max(m, min) : min;
                paths.Add(new LatchPath(source, cone.EnteredBy(gate), gate, new Time(min), new Time(max)));
            }
        }

        return new LatchPathSearch(paths, latches.Count, steps, budget);
    }
}

/// <summary>The paths listed, and how far the search got within its budget.</summary>
internal sealed class LatchPathSearch
{
    public LatchPathSearch(IReadOnlyList<LatchPath> paths, int latchesSearched, long steps, long budget)
    {
        Paths = paths;
        LatchesSearched = latchesSearched;
        Steps = steps;
        Budget = budget;
    }

    /// <summary>Every path from the first <see cref="LatchesSearched"/> latches.</summary>
    public IReadOnlyList<LatchPath> Paths { get; }

    /// <summary>How many latches, in latch order, had their paths listed.</summary>
    public int LatchesSearched { get; }

    /// <summary>The steps spent: nets reached by the searches, plus paths listed.</summary>
    public long Steps { get; }

    /// <summary>The budget the search was given.</summary>
    public long Budget { get; }
}
