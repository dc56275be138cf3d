using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Netlists;
using Phaseward.Reproducers;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// The route a deck draws between two nets is searched from both ends at once. Checked against the definition, a plain
/// breadth-first search from the start (the fewest stages; a textbook shortest path on an unweighted graph), on random
/// logic with restoring stages, data-controlled and clocked pass gates, and keepers.
/// </summary>
public class StageRouteTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void TheRouteHasTheFewestStagesAndIsJoinedUp(int seed)
    {
        var random = new Random(seed);
        for (var design = 0; design < 20; design++)
        {
            var (netlist, pool) = RandomLogic(random, $"route{seed}_{design}");
            for (var pair = 0; pair < 30; pair++)
            {
                var start = pool[random.Next(pool.Count)];
                var target = pool[random.Next(pool.Count)];
                var expected = FewestStages(netlist, start, target);
                var route = StageRoute.Between(netlist, start, target);
                var context = $"design {design} of seed {seed}, {start.Name} to {target.Name}";
                if (expected is null)
                {
                    Assert.True(route is null, $"{context}: a route of {route?.Count} stages where none exists");
                    continue;
                }

                Assert.True(route is not null, $"{context}: no route, but one of {expected} stages exists");
                Assert.Equal(expected, route!.Count);
                var at = start;
                foreach (var stage in route)
                {
                    Assert.Same(at, stage.From);
                    Assert.Contains(stage.From, stage.Device.Inputs);
                    Assert.False(stage.Device.IsWeak, context);
                    Assert.False(stage.Device.IsPassDevice && stage.Device.ClockControl is not null, context);
                    at = stage.Device.Output;
                }

                Assert.Same(target, at);
            }
        }
    }

    [Fact]
    public void ALatchFanningOutToThousandsOfGatesRoutesThroughItsOwnChain()
    {
        // One stall signal into 2,000 NANDs: the route to one NAND's output is the chain and that NAND (the search from
        // the far end finds it without visiting the other 1,999).
        var c = Figures.NewCircuit("stall");
        var clk = c.Clock("clk", 10.Nanoseconds());
        var stall = c.StaticLatch(c.Input("stall_request"), clk.High, "stall_latch");
        for (var i = 0; i < 3; i++)
            stall = c.Inverter(stall, "chain" + i);
        var enables = Enumerable.Range(0, 2000).Select(i => c.Nand(c.Input("want" + i), stall, "enable" + i)).ToList();
        var netlist = c.ToNetlist();
        var latch = Phaseward.Sequencing.LatchModel.Of(netlist).Latches.Single(l => l.Name == "stall_latch");

        var route = StageRoute.Between(netlist, latch.Storage, enables[1234]);

        // The latch's output inverter, the three-stage chain, then that NAND.
        Assert.Equal(5, route!.Count);
        Assert.Same(latch.Storage, route[0].From);
        Assert.Equal(new[] { "chain0", "chain1", "chain2", "enable1234" }, route.Skip(1).Select(s => s.Device.Output.Name).ToArray());
    }

    // The definition: breadth first from the start through restoring stages and data-controlled pass gates.
    private static int? FewestStages(Netlist netlist, Net start, Net target)
    {
        var depth = new Dictionary<Net, int> { [start] = 0 };
        var queue = new Queue<Net>();
        queue.Enqueue(start);
        while (queue.Count > 0)
        {
            var net = queue.Dequeue();
            if (net == target) return depth[net];
            foreach (var device in netlist.DataLoadsOf(net))
            {
                if (device.IsWeak || (device.IsPassDevice && device.ClockControl is not null) || depth.ContainsKey(device.Output)) continue;
                depth[device.Output] = depth[net] + 1;
                queue.Enqueue(device.Output);
            }
        }

        return null;
    }

    // Random logic over a pool of nets: each new stage takes nets made before it; a few nets are driven last, from any
    // net (loops and reconvergence); some stages are clocked pass gates (which a route may not cross), some keepers.
    private static (Netlist Netlist, List<Net> Pool) RandomLogic(Random random, string name)
    {
        var c = Figures.NewCircuit(name);
        var clk = c.Clock("clk", 10.Nanoseconds());
        var pool = Enumerable.Range(0, random.Next(2, 5)).Select(i => c.Input("in" + i)).ToList();
        // Nets driven only at the end, from logic made after them: loops and reconvergence.
        var later = Enumerable.Range(0, random.Next(0, 3)).Select(i => c.Node("back" + i)).ToList();
        pool.AddRange(later);
        Figures.AddRandomStages(c, pool, random, random.Next(8, 30), clk);

        foreach (var back in later)
            c.Inverter(pool[random.Next(pool.Count)], back);
        return (c.ToNetlist(), pool);
    }
}
