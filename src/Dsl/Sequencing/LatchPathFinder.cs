using System;
using System.Collections.Generic;
using System.Threading;

namespace Phaseward.Sequencing;

/// <summary>
/// Every latch-to-latch path of a netlist: one shortest and one longest search per latch over its fan-out cone up
/// to the next latches (<see cref="LatchCone"/>), so the cost is the size of the cones, never a search per pair.
/// </summary>
internal static class LatchPathFinder
{
    public static IReadOnlyList<LatchPath> Find(LatchCone cone, IReadOnlyList<Latch> latches, CancellationToken cancellationToken = default)
    {
        var paths = new List<LatchPath>();
        var shortest = new ShortestPathSearch(cone);
        var longest = new LongestPathSearch(cone);
        foreach (var source in latches)
        {
            cancellationToken.ThrowIfCancellationRequested();
            shortest.Run(source.Storage);
            if (shortest.Gates.Count == 0)
                continue;
            longest.Run(source.Storage);
            foreach (var gate in shortest.Gates)
            {
                var min = shortest.GateDelay[gate];
                var max = longest.GateDelay.TryGetValue(gate, out var m) ? Math.Max(m, min) : min;
                paths.Add(new LatchPath(source, cone.EnteredBy(gate), gate, new Time(min), new Time(max)));
            }
        }

        return paths;
    }
}
