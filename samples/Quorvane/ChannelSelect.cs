using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (pass gates in series). The telemetry front end picks one of eight sensor channels with a pass-gate mux
/// tree and routes it through a row of routing switches (pass gates on one route enable) to the packer, with
/// no restoring stage anywhere: an RC ladder whose delay grows with the square of its length. Figures are invented.
/// </summary>
public sealed class ChannelSelect : Design
{
    private const int SelectBits = 3;
    private const int RouteStages = 4;

    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var level = new Net[1 << SelectBits];
        for (var i = 0; i < level.Length; i++)
            level[i] = c.Input($"channel{i}");

        var selected = MuxTree(c, level);
        var routeEnable = c.Input("route_enable");
        for (var stage = 0; stage < RouteStages; stage++)
            selected = c.TransmissionGate(selected, routeEnable, $"routed{stage}");

        c.Output("packer_in", c.Inverter(selected));
    }

    /// <summary>A binary tree of data-controlled pass gates: each level halves the candidates.</summary>
    internal static Net MuxTree(Circuit c, Net[] inputs)
    {
        var level = inputs;
        for (var bit = 0; level.Length > 1; bit++)
        {
            var select = c.Input($"sel{bit}");
            var selectBar = c.Inverter(select, $"sel{bit}_b");
            var next = new Net[level.Length / 2];
            for (var i = 0; i < next.Length; i++)
            {
                next[i] = c.Node($"mux{bit}_{i}");
                c.TransmissionGate(level[2 * i], selectBar, next[i]);
                c.TransmissionGate(level[2 * i + 1], select, next[i]);
            }

            level = next;
        }

        return level[0];
    }
}

/// <summary>The fix: restoring buffers after the mux tree and halfway along the routing row split the RC ladder.</summary>
public sealed class ChannelSelectBuffered : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var channels = new Net[8];
        for (var i = 0; i < channels.Length; i++)
            channels[i] = c.Input($"channel{i}");

        var selected = c.Buffer(ChannelSelect.MuxTree(c, channels), "mux_out");
        var routeEnable = c.Input("route_enable");
        for (var stage = 0; stage < 4; stage++)
        {
            selected = c.TransmissionGate(selected, routeEnable, $"routed{stage}");
            if (stage == 1)
                selected = c.Buffer(selected, "route_restore");
        }

        c.Output("packer_in", c.Inverter(selected));
    }
}
