using System.Collections.Generic;
using Phaseward.Netlists;
using Stage = Phaseward.Reproducers.LatchPairDeck.Stage;

namespace Phaseward.Reproducers;

/// <summary>
/// The shortest chain of restoring stages and data-controlled pass gates from one net to another, the route a deck
/// draws between a latch's storage and the net its data reaches.
/// </summary>
/// <remarks>
/// Searched breadth first from both ends at once, one level at a time on the side whose frontier is smaller: a
/// latch that fans out to thousands of gates (one stall signal into every clock gate's enable) then costs the route,
/// not its whole fan-out, for each of the thousands of decks a report can ask for. The searches stop at the first level
/// that reaches a net the other has reached: the route through it has as many stages as the levels searched, and no
/// shorter one exists, since the searches did not meet a level earlier.
/// </remarks>
internal static class StageRoute
{
    /// <summary>The stages from <paramref name="start"/> to <paramref name="target"/> in order (empty when they are
    /// the same net), or null when no such chain joins them.</summary>
    public static List<Stage>? Between(Netlist netlist, Net start, Net target)
    {
        // From 'start': the stage that reached each net; towards 'target': the stage each net feeds.
        var forward = new Dictionary<int, Stage?> { [start.Id] = null };
        var backward = new Dictionary<int, Stage?> { [target.Id] = null };
        var forwardFrontier = new List<Net> { start };
        var backwardFrontier = new List<Net> { target };
        // Only the nets a level adds can be the first shared ones: each level is checked against the other side.
        var middle = start.Id == target.Id ? start : null;
        while (middle is null)
        {
            if (forwardFrontier.Count == 0 || backwardFrontier.Count == 0)
                return null;
            if (forwardFrontier.Count <= backwardFrontier.Count)
            {
                forwardFrontier = ExpandForward(netlist, forward, forwardFrontier);
                middle = FirstReached(forwardFrontier, backward);
            }
            else
            {
                backwardFrontier = ExpandBackward(netlist, backward, backwardFrontier);
                middle = FirstReached(backwardFrontier, forward);
            }
        }

        var stages = new List<Stage>();
        for (var id = middle.Id; forward[id] is { } stage; id = stage.From.Id)
            stages.Add(stage);
        stages.Reverse();
        for (var id = middle.Id; backward[id] is { } stage; id = stage.Device.Output.Id)
            stages.Add(stage);
        return stages;
    }

    // A stage the route may pass through: restoring stages and data-controlled pass gates, never a keeper's weak
    // driver or a clocked pass gate (the next latch).
    private static bool Passes(Device device) => !device.IsWeak && !(device.IsPassDevice && device.ClockControl is not null);

    private static List<Net> ExpandForward(Netlist netlist, Dictionary<int, Stage?> reached, List<Net> frontier)
    {
        var next = new List<Net>();
        foreach (var net in frontier)
        {
            foreach (var device in netlist.DataLoadList(net))
            {
                if (!Passes(device) || reached.ContainsKey(device.Output.Id)) continue;
                reached[device.Output.Id] = new Stage(device, net);
                next.Add(device.Output);
            }
        }

        return next;
    }

    private static List<Net> ExpandBackward(Netlist netlist, Dictionary<int, Stage?> reached, List<Net> frontier)
    {
        var next = new List<Net>();
        foreach (var net in frontier)
        {
            foreach (var device in netlist.DriverList(net))
            {
                if (!Passes(device)) continue;
                var inputs = device.Inputs;
                for (var i = 0; i < inputs.Count; i++)
                {
                    if (reached.ContainsKey(inputs[i].Id)) continue;
                    reached[inputs[i].Id] = new Stage(device, inputs[i]);
                    next.Add(inputs[i]);
                }
            }
        }

        return next;
    }

    // The first net of a level the other search has reached, or null.
    private static Net? FirstReached(List<Net> level, Dictionary<int, Stage?> other)
    {
        foreach (var net in level)
            if (other.ContainsKey(net.Id))
                return net;
        return null;
    }
}
