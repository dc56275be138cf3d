using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// The shortest delay from one latch's storage node to every entry gate of its cone (Dijkstra's algorithm). Its
/// scratch arrays are kept between sources: a net's entries are valid only while its stamp is the current run's.
/// </summary>
internal sealed class ShortestPathSearch
{
    private readonly LatchCone cone;
    private readonly int[] stamp;
    private readonly double[] distance;
    private readonly NetMinHeap heap = new();
    private int run;

    public ShortestPathSearch(LatchCone cone)
    {
        this.cone = cone;
        stamp = new int[cone.NetCount];
        distance = new double[cone.NetCount];
    }

    /// <summary>The entry gates reached, in the order first reached.</summary>
    public List<Device> Gates { get; } = new();

    /// <summary>The shortest delay to each entry gate's input, in seconds.</summary>
    public Dictionary<Device, double> GateDelay { get; } = new();

    /// <summary>How many nets the last search settled (its share of the path search's budget).</summary>
    public int NetsReached { get; private set; }

    /// <summary>Searches from <paramref name="source"/>; the results replace the previous search's.</summary>
    public void Run(Net source)
    {
        run++;
        NetsReached = 0;
        Gates.Clear();
        GateDelay.Clear();
        stamp[source.Id] = run;
        distance[source.Id] = 0;
        heap.Push(source, 0);
        while (heap.TryPop(out var net, out var d))
        {
            if (d > distance[net.Id]) continue;
            NetsReached++;
            var count = cone.EdgeCount(net);
            for (var i = 0; i < count; i++)
            {
                if (!cone.TryEdge(net, i, out var device, out var next))
                    continue;
                if (next is null)
                {
                    ReachGate(device, d);
                    continue;
                }

                var nd = d + cone.DelaySeconds(device);
                if (stamp[next.Id] != run || nd < distance[next.Id])
                {
                    stamp[next.Id] = run;
                    distance[next.Id] = nd;
                    heap.Push(next, nd);
                }
            }
        }
    }

    private void ReachGate(Device gate, double delay)
    {
        if (!GateDelay.TryGetValue(gate, out var best))
        {
            Gates.Add(gate);
            GateDelay[gate] = delay;
        }
        else if (delay < best)
        {
            GateDelay[gate] = delay;
        }
    }
}
