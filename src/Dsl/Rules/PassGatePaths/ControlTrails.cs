using System.Collections.Generic;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Rules.PassGatePaths;

/// <summary>
/// For every pass gate (by its pass index, <see cref="PassGateNetwork.IndexOf"/>), the controls met so far along the run through it: one entry per distinct phase or data
/// control that can keep a gate from conducting with it (<see cref="ConductionDecisions.CanExclude"/>), holding the
/// gate where that control was met last and the gate that follows it on the run. A gate joins a run only if it can
/// conduct with every entry; the last entry it cannot conduct with is where the run must be broken, and the gate that
/// follows it is where the conducting sub-run begins.
/// </summary>
/// <remarks>
/// The trails are persistent lists, newest entry first, sharing their tails: a gate's trail is its predecessor's with
/// at most a few entries rewritten, so a run costs O(entries) per gate rather than a comparison with every gate before
/// it. A run keeps at most <see cref="MaxTracked"/> controls; beyond that the oldest is forgotten, which can only keep
/// a run whole that should be broken: the longer, worst case (the same trade as
/// <see cref="Electrical.PassGateNetwork.MaxBranchesCompared"/>). The same lists serve the runs read backwards (the
/// continuation from a gate), where "last met" means nearest the gate and the follower is the gate before.
/// </remarks>
internal sealed class ControlTrails
{
    /// <summary>The most distinct controls a run remembers.</summary>
    public const int MaxTracked = 16;

    private readonly PassGateNetwork network;
    private readonly ConductionDecisions decisions;
    private readonly int[] head;
    private readonly List<Node> nodes = new();
    private readonly List<(int Gate, int Beyond)> scratch = new();

    public ControlTrails(PassGateNetwork network, ConductionDecisions decisions)
    {
        this.network = network;
        this.decisions = decisions;
        head = new int[network.PassGateCount];
    }

    /// <summary>The newest entry on the trail of gate <paramref name="last"/> that <paramref name="gate"/> cannot conduct
    /// with (a node index), or -1 when it can conduct with all of them.</summary>
    public int FirstConflict(int last, Device gate)
    {
        if (last < 0 || !decisions.CanExclude(gate)) return -1;
        for (var node = head[last]; node >= 0; node = nodes[node].Next)
            if (!decisions.MayConductTogether(network.GateAt(nodes[node].Gate), gate))
                return node;
        return -1;
    }

    /// <summary>The newest entry of trail <paramref name="of"/> that cannot conduct with some entry of trail
    /// <paramref name="with"/>, skipping the entry of gate <paramref name="skip"/>; -1 when there is none.</summary>
    public int FirstConflictWith(int of, ControlTrails with, int withOf, int skip)
    {
        for (var node = head[of]; node >= 0; node = nodes[node].Next)
        {
            var gate = network.GateAt(nodes[node].Gate);
            if (nodes[node].Gate == skip || !decisions.CanExclude(gate)) continue;
            if (with.FirstConflict(withOf, gate) >= 0) return node;
        }

        return -1;
    }

    /// <summary>The gate where the entry's control was met last.</summary>
    public int GateOf(int node) => nodes[node].Gate;

    /// <summary>The gate that follows that one on the run (-1 if none yet).</summary>
    public int BeyondOf(int node) => nodes[node].Beyond;

    /// <summary>
    /// Makes the trail of gate <paramref name="gateIndex"/>, which follows gate <paramref name="last"/> on its run (-1:
    /// the gate begins a run): <paramref name="last"/>'s trail without the entry <paramref name="cut"/> and everything
    /// older (-1: nothing cut), with the gate as the follower of <paramref name="last"/>'s own entry and its own
    /// control as the newest entry.
    /// </summary>
    public void Extend(int last, int cut, int gateIndex)
    {
        var gate = network.GateAt(gateIndex);
        var keyed = decisions.CanExclude(gate);
        var key = keyed ? ConductionDecisions.KeyOf(gate) : null;
        var source = last >= 0 ? head[last] : -1;

        // Where the entries that change lie: the last gate's own (the newest, gets a follower), this gate's control (is
        // moved to the front), and the cut (everything kept before it is rewritten, to end there).
        int index = 0, keyIndex = -1, cutIndex = -1, count = 0;
        for (var node = source; node >= 0; node = nodes[node].Next, index++)
        {
            if (node == cut) { cutIndex = index; break; }
            if (keyed && ReferenceEquals(ConductionDecisions.KeyOf(network.GateAt(nodes[node].Gate)), key)) keyIndex = index;
            count++;
        }

        var copyTo = source >= 0 && count > 0 && nodes[source].Gate == last ? 0 : -1;
        if (keyIndex > copyTo) copyTo = keyIndex;
        if (cutIndex >= 0) copyTo = count - 1;
        var kept = count - (keyIndex >= 0 ? 1 : 0) + (keyed ? 1 : 0);
        if (kept > MaxTracked) copyTo = count - 1;

        scratch.Clear();
        var tail = -1;
        index = 0;
        for (var node = source; node >= 0 && index < count; node = nodes[node].Next, index++)
        {
            if (index > copyTo) { tail = node; break; }
            if (index == keyIndex) continue;
            var entry = nodes[node];
            scratch.Add((entry.Gate, entry.Gate == last ? gateIndex : entry.Beyond));
        }

        var room = MaxTracked - (keyed ? 1 : 0);
        if (scratch.Count > room) scratch.RemoveRange(room, scratch.Count - room);
        var top = tail;
        for (var i = scratch.Count - 1; i >= 0; i--)
            top = Add(scratch[i].Gate, scratch[i].Beyond, top);
        if (keyed) top = Add(gateIndex, -1, top);
        head[gateIndex] = top;
    }

    private int Add(int gate, int beyond, int next)
    {
        nodes.Add(new Node(gate, beyond, next));
        return nodes.Count - 1;
    }

    private readonly struct Node
    {
        public Node(int gate, int beyond, int next)
        {
            Gate = gate;
            Beyond = beyond;
            Next = next;
        }

        public int Gate { get; }

        public int Beyond { get; }

        public int Next { get; }
    }
}
