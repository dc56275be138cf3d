using System;
using System.Collections.Generic;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>Where a clock gate's enable comes from: a latch (with the slowest path from its storage) or a primary input.</summary>
internal sealed class EnableOrigin
{
    public EnableOrigin(Latch latch, Time delay)
    {
        Latch = latch;
        Delay = delay;
    }

    public EnableOrigin(Net input, SourceSpan span)
    {
        Input = input;
        InputSpan = span;
    }

    public Latch? Latch { get; }

    /// <summary>The slowest path from the latch's storage node to the enable (its output stage included).</summary>
    public Time Delay { get; }

    public Net? Input { get; }

    public SourceSpan? InputSpan { get; }
}

/// <summary>
/// The storage and inputs each enable comes from, through restoring stages and data-controlled pass gates: for every
/// phase whose latches reach the enable, the latch whose data changes the enable latest (its latest data
/// <c>late</c>, plus its entry gate and the slowest path to the enable, both at the slow corner), and the first
/// primary input (lowest net number) that reaches it.
/// </summary>
/// <remarks>
/// One latch per phase is enough: a phase opens at one instant, so the change interval of every latch of the phase
/// starts there, and the latest-ending one meets the gate's passing interval whenever any of them does.
/// The origins of each net are found once and kept for every enable that shares its logic (a stall signal ANDed into
/// every gate's enable), so the cost is the enables' fan-in logic once, times the phases that reach it, not once per
/// gate. The fan-in is walked depth-first with an explicit stack (no recursion: a long chain cannot overflow it); a
/// combinational loop in an enable's logic (itself PW1005's finding) is cut where the walk comes back to a net on
/// its own path, so the slowest path is the slowest one without going round the loop.
/// </remarks>
internal sealed class EnableOrigins
{
    private readonly Netlist netlist;
    private readonly LatchModel model;
    private readonly Func<Latch, Time> latestData;
    private readonly double slow;
    private readonly Dictionary<int, NetOrigins> originsByNet = new();
    private readonly HashSet<int> onPath = new();
    // Scratch for merging the origins of a net's fan-in: the worst latch so far per phase.
    private readonly Dictionary<Phase, LatchOrigin> worstByPhase = new();

    // latestData: the latest arrival of a latch's data after it opens (time borrowing), asked once per latch that
    // reaches an enable.
    public EnableOrigins(Netlist netlist, LatchModel model, Func<Latch, Time> latestData)
    {
        this.netlist = netlist;
        this.model = model;
        this.latestData = latestData;
        slow = netlist.Process.SlowDelayFactor;
    }

    /// <summary>The enable's origins: one latch per phase in latch order, then the first primary input, if any.</summary>
    public List<EnableOrigin> Of(Net enable)
    {
        var found = OriginsOf(enable);
        var origins = new List<EnableOrigin>(found.Latches.Length + 1);
        foreach (var latch in found.Latches)
            origins.Add(new EnableOrigin(latch.Latch, new Time(latch.DelaySeconds)));
        origins.Sort((a, b) => a.Latch!.Index.CompareTo(b.Latch!.Index));
        if (found.Input is { } input)
            origins.Add(new EnableOrigin(input, netlist.InputPortOf(input)?.Span ?? SourceSpan.Unknown));
        return origins;
    }

    private NetOrigins OriginsOf(Net target)
    {
        if (originsByNet.TryGetValue(target.Id, out var known))
            return known;

        var frames = new Stack<Frame>();
        Enter(target);
        while (frames.Count > 0)
        {
            var frame = frames.Peek();
            if (frame.Next < frame.FanIn.Count)
            {
                var input = frame.FanIn[frame.Next++].Net;
                if (!originsByNet.ContainsKey(input.Id) && !onPath.Contains(input.Id))
                    Enter(input);
                continue;
            }

            frames.Pop();
            onPath.Remove(frame.Net.Id);
            originsByNet[frame.Net.Id] = Merge(frame);
        }

        return originsByNet[target.Id];

        void Enter(Net net)
        {
            onPath.Add(net.Id);
            frames.Push(new Frame(net, FanInOf(net)));
        }
    }

    // The nets a net's value is made from, each with the stage that makes it (primary inputs and storage end the walk).
    private List<(Net Net, double StageSeconds)> FanInOf(Net net)
    {
        var fanIn = new List<(Net, double)>();
        if (netlist.IsInput(net))
            return fanIn;
        foreach (var driver in netlist.DriverList(net))
        {
            if (driver.IsWeak || (driver.IsPassDevice && driver.ClockControl is not null))
                continue;
            var stage = FirstOrderDelay.Of(netlist, driver).Seconds;
            foreach (var input in driver.Inputs)
                fanIn.Add((input, stage));
            if (driver.DataControl is { } control)
                fanIn.Add((control, stage));
        }

        return fanIn;
    }

    private NetOrigins Merge(Frame frame)
    {
        var net = frame.Net;
        if (netlist.IsInput(net))
            return new NetOrigins(Array.Empty<LatchOrigin>(), net);

        worstByPhase.Clear();
        Net? input = null;
        // A latch's storage node: the latch's data reaches it through the entry gate.
        foreach (var driver in netlist.DriverList(net))
        {
            if (driver.IsWeak || !driver.IsPassDevice || driver.ClockControl is null || model.LatchEnteredBy(driver) is not { } latch)
                continue;
            var until = latestData(latch).Seconds + model.EntryDelay(latch).Seconds * slow;
            Keep(new LatchOrigin(latch, 0, until));
        }

        foreach (var (source, stage) in frame.FanIn)
        {
            // A net still on the walk's path closes a loop: that edge is cut (see the remarks).
            if (!originsByNet.TryGetValue(source.Id, out var from))
                continue;
            foreach (var latch in from.Latches)
                Keep(new LatchOrigin(latch.Latch, latch.DelaySeconds + stage, latch.UntilSeconds + stage * slow));
            if (from.Input is { } reached && (input is null || reached.Id < input.Id))
                input = reached;
        }

        var latches = worstByPhase.Count == 0 ? Array.Empty<LatchOrigin>() : new LatchOrigin[worstByPhase.Count];
        worstByPhase.Values.CopyTo(latches, 0);
        return new NetOrigins(latches, input);
    }

    private void Keep(LatchOrigin candidate)
    {
        var phase = candidate.Latch.Phase;
        if (!worstByPhase.TryGetValue(phase, out var kept)
            || candidate.UntilSeconds > kept.UntilSeconds
            || (candidate.UntilSeconds == kept.UntilSeconds && candidate.Latch.Index < kept.Latch.Index))
            worstByPhase[phase] = candidate;
    }

    private sealed class Frame
    {
        public Frame(Net net, List<(Net Net, double StageSeconds)> fanIn)
        {
            Net = net;
            FanIn = fanIn;
        }

        public Net Net { get; }

        public List<(Net Net, double StageSeconds)> FanIn { get; }

        public int Next { get; set; }
    }

    // UntilSeconds: how long after the latch opens the enable can still change (slow corner); DelaySeconds: the path
    // from the latch's storage node, at nominal resistances (the message scales it).
    private readonly record struct LatchOrigin(Latch Latch, double DelaySeconds, double UntilSeconds);

    private sealed class NetOrigins
    {
        public NetOrigins(LatchOrigin[] latches, Net? input)
        {
            Latches = latches;
            Input = input;
        }

        public LatchOrigin[] Latches { get; }

        public Net? Input { get; }
    }
}
