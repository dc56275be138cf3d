using System;
using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// The longest delay from one latch's storage node to every entry gate of its cone, the cone taken as acyclic:
/// a depth-first search orders the nets, the edges back to a net still on the search stack (they close
/// combinational loops) are dropped, and the delays are relaxed in reverse post-order. Scratch arrays are kept
/// between sources (valid while a net's stamp is the current run's).
/// </summary>
internal sealed class LongestPathSearch
{
    private const byte Unvisited = 0, OnStack = 1, Finished = 2;

    private readonly LatchCone cone;
    private readonly int[] stamp;
    private readonly byte[] state;
    private readonly int[] postIndex;
    private readonly double[] distance;
    private readonly List<Net> postOrder = new();
    private readonly Stack<(Net Net, int Next)> stack = new();
    private int run;

    public LongestPathSearch(LatchCone cone)
    {
        this.cone = cone;
        stamp = new int[cone.NetCount];
        state = new byte[cone.NetCount];
        postIndex = new int[cone.NetCount];
        distance = new double[cone.NetCount];
    }

    /// <summary>The longest delay to each entry gate's input, in seconds.</summary>
    public Dictionary<Device, double> GateDelay { get; } = new();

    /// <summary>How many nets the last search reached (its share of the path search's budget).</summary>
    public int NetsReached => postOrder.Count;

    /// <summary>Searches from <paramref name="source"/>; the results replace the previous search's.</summary>
    public void Run(Net source)
    {
        run++;
        GateDelay.Clear();
        OrderCone(source);
        foreach (var net in postOrder) distance[net.Id] = double.NegativeInfinity;
        distance[source.Id] = 0;
        for (var k = postOrder.Count - 1; k >= 0; k--)
        {
            var net = postOrder[k];
            var d = distance[net.Id];
            if (double.IsNegativeInfinity(d)) continue;
            var count = cone.EdgeCount(net);
            for (var i = 0; i < count; i++)
            {
                if (!cone.TryEdge(net, i, out var device, out var next))
                    continue;
                if (next is null)
                {
                    GateDelay[device] = GateDelay.TryGetValue(device, out var best) ? Math.Max(best, d) : d;
                    continue;
                }

                if (postIndex[next.Id] >= postIndex[net.Id])
                    continue; // back edge: a combinational loop is not followed round
                var nd = d + cone.MaxDelaySeconds(device);
                if (nd > distance[next.Id])
                    distance[next.Id] = nd;
            }
        }
    }

    // Depth-first post-order of the nets reachable from the source.
    private void OrderCone(Net source)
    {
        postOrder.Clear();
        Visit(source);
        stack.Push((source, 0));
        while (stack.Count > 0)
        {
            var (net, next) = stack.Pop();
            var count = cone.EdgeCount(net);
            var descended = false;
            for (var i = next; i < count; i++)
            {
                if (!cone.TryEdge(net, i, out _, out var target) || target is null || StateOf(target) != Unvisited)
                    continue;
                stack.Push((net, i + 1));
                Visit(target);
                stack.Push((target, 0));
                descended = true;
                break;
            }

            if (!descended)
            {
                state[net.Id] = Finished;
                postIndex[net.Id] = postOrder.Count;
                postOrder.Add(net);
            }
        }
    }

    private byte StateOf(Net net) => stamp[net.Id] == run ? state[net.Id] : Unvisited;

    private void Visit(Net net)
    {
        stamp[net.Id] = run;
        state[net.Id] = OnStack;
    }
}
