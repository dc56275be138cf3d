using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Rules.PassGatePaths;

/// <summary>
/// The series runs of pass gates in a netlist: for every pass gate, the longest run of pass gates that ends at it
/// and can conduct end to end (and the Elmore delay at its output along that run), and the longest run that continues
/// from it. Two sweeps over the <see cref="PassGateNetwork"/>'s acyclic order (the second on first use), each gate
/// checked against the few controls its run has met (<see cref="ControlTrails"/>), so O(devices + nets) in all,
/// however long or wide the chains.
/// </summary>
/// <remarks>
/// <para>The Elmore delay along a run is the second pass of the RC-tree algorithm (<see cref="ElmoreDelay"/>) in the
/// one pass-gate delay model (<see cref="PassGateNetwork"/>): the driver's resistance times its load while the run's
/// first gate conducts (<see cref="PassGateNetwork.RootLoad"/>), plus, for every gate on the run, its on-resistance
/// times the downstream capacitance it charges. Where several runs end at a gate, the longer one is kept (then the
/// slower one, then the lower device id), so every gate has one predecessor.</para>
/// <para>A run carries data through all its gates only while all of them conduct, so it never holds two gates that
/// cannot conduct together (<see cref="ConductionDecisions"/>: gates on phases that are never on together beyond the
/// skew-long overlap, which is PW1002's race, or on provably exclusive data controls), however far apart they are on
/// it. A gate that cannot conduct with an earlier gate of the run it would extend breaks the run there: its run
/// begins at the gate that follows the last such gate (the conducting sub-run), driven from the node the run was
/// broken at. clk.High → a data-controlled gate → clk.Low is therefore the run data gate → clk.Low (and clk.High →
/// data gate), never one run of three. A continuation is likewise cut before the first gate that cannot conduct with
/// the gates before it.</para>
/// </remarks>
internal sealed class SeriesChains
{
    // Everything here is indexed by the gates' pass indexes (PassGateNetwork.IndexOf), links included: only pass gates
    // are on runs, and arrays as long as the device list were, at a million devices, large-object allocations enough
    // to start a full collection of the whole heap.
    private readonly int[] depthIn;
    private readonly int[] previous;
    private readonly int[] start;
    private readonly double[] elmoreIn;

    // Along the tree of predecessors (a run broken part-way still has its predecessor there): each gate's own Elmore
    // step, and sums from the tree's root, so that a sub-run's figures are two differences. The run ending at a gate is
    // the sub-run from its start, so its totals are read from these when a chain is reported, not kept per gate.
    private readonly double[] step;
    private readonly int[] treeIndex;
    private readonly double[] stepSum;
    private readonly double[] ohmsSum;
    private readonly double[] faradsSum;
    private readonly int[] assumesSum;
    private readonly ConductionDecisions decisions;
    private readonly ControlTrails trails;
    private readonly CancellationToken cancellationToken;

    // The runs continuing from each gate: the second sweep, made on first use. A rule that only needs the runs ending
    // at each gate (a design with no over-long chain) never pays for it.
    private int[]? depthOut;
    private int[]? next;
    private int[]? end;
    private int[]? suffixIndex;
    private double[]? suffixStep;
    private double[]? suffixOhms;
    private double[]? suffixFarads;
    private int[]? suffixAssumes;
    private ControlTrails? continuationTrails;

    public SeriesChains(PassGateNetwork network, CancellationToken cancellationToken = default)
    {
        Network = network ?? throw new ArgumentNullException(nameof(network));
        var netlist = network.Netlist;
        var n = network.PassGateCount;
        depthIn = new int[n];
        previous = new int[n];
        start = new int[n];
        elmoreIn = new double[n];
        step = new double[n];
        treeIndex = new int[n];
        stepSum = new double[n];
        ohmsSum = new double[n];
        faradsSum = new double[n];
        assumesSum = new int[n];
        decisions = new ConductionDecisions(netlist, SkewOverlapCounts.No);
        trails = new ControlTrails(network, decisions);
        this.cancellationToken = cancellationToken;

        // The best run ending at each gate's input net, written to the gates that net feeds when the net is reached
        // (before them in this order): kept per gate, not per net, for the same reason as above.
        var bestDriverOfInput = new int[n];
        var order = network.Postorder;

        // Forward in topological order (reverse postorder): the longest run ending at each gate.
        for (var i = order.Count - 1; i >= 0; i--)
        {
            if ((i & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
            var node = order[i];
            if (network.IsNetNode(node))
            {
                var net = netlist.Nets[network.NetIdOf(node)];
                var best = -1;
                foreach (var driver in netlist.DriverList(net))
                {
                    if (!driver.IsPassDevice) continue;
                    var d = network.IndexOf(driver);
                    if (!network.IsOutputEdgeKept(d)) continue;
                    if (best < 0 || depthIn[d] > depthIn[best] || (depthIn[d] == depthIn[best] && elmoreIn[d] > elmoreIn[best]))
                        best = d;
                }

                for (var position = network.PassLoadStart(net); position < network.PassLoadEnd(net); position++)
                    bestDriverOfInput[network.PassLoadIndexAt(position)] = best;
                continue;
            }

            var g = node;
            var gate = network.GateAt(g);
            var ohms = netlist.ResistanceOf(gate).Ohms;
            var farads = netlist.CapacitanceOf(gate.Output).Farads;
            var own = network.AssumesUnknownBranchesConduct(gate);
            step[g] = ohms * network.ChargedThrough(gate).Farads;
            var join = network.IsInputEdgeKept(g) ? BestJoin(gate, bestDriverOfInput[g]) : Join.None;
            var before = join.Previous;
            previous[g] = before;
            treeIndex[g] = before < 0 ? 0 : treeIndex[before] + 1;
            stepSum[g] = (before < 0 ? 0 : stepSum[before]) + step[g];
            ohmsSum[g] = (before < 0 ? 0 : ohmsSum[before]) + ohms;
            faradsSum[g] = (before < 0 ? 0 : faradsSum[before]) + farads;
            assumesSum[g] = (before < 0 ? 0 : assumesSum[before]) + (own ? 1 : 0);
            trails.Extend(before, join.Cut, g);
            if (before < 0)
            {
                depthIn[g] = 1;
                start[g] = g;
                elmoreIn[g] = RootTerm(gate) + step[g];
            }
            else if (join.Start < 0)
            {
                depthIn[g] = depthIn[before] + 1;
                start[g] = start[before];
                elmoreIn[g] = elmoreIn[before] + step[g];
            }
            else
            {
                // The run is broken before join.Start: the sub-run from there, its first gate driven from the node the
                // run was broken at.
                var f = join.Start;
                depthIn[g] = treeIndex[g] - treeIndex[f] + 1;
                start[g] = f;
                elmoreIn[g] = RootTerm(network.GateAt(f)) + stepSum[g] - stepSum[f] + step[f];
            }
        }
    }

    private double RootTerm(Device first) => Network.RootResistanceOf(first.Inputs[0]).Ohms * Network.RootLoad(first).Farads;

    /// <summary>How a gate joins the run of a driver (pass indexes): the driver (-1: the gate begins a run), the entry
    /// of the driver's trail where the run is broken (-1: not broken) and the first gate of the sub-run that remains
    /// (-1: the driver's run whole).</summary>
    private readonly struct Join
    {
        public static readonly Join None = new(-1, -1, -1, 1, 0);

        public Join(int previous, int cut, int start, int depth, double elmore)
        {
            Previous = previous;
            Cut = cut;
            Start = start;
            Depth = depth;
            Elmore = elmore;
        }

        public int Previous { get; }

        public int Cut { get; }

        public int Start { get; }

        public int Depth { get; }

        public double Elmore { get; }
    }

    // The longest run the gate can extend among its input net's pass drivers. The net's best driver usually takes it
    // whole (its run is the longest, and the gate conducts with all of it); only when it does not are the others tried.
    // Pass indexes follow device order, so the lower index is the lower device id.
    private Join BestJoin(Device gate, int best)
    {
        if (best < 0) return Join.None;
        var join = JoinOf(gate, best);
        if (join.Cut < 0) return join;
        foreach (var driver in Network.Netlist.DriverList(gate.Inputs[0]))
        {
            if (!driver.IsPassDevice) continue;
            var d = Network.IndexOf(driver);
            if (d == best || !Network.IsOutputEdgeKept(d)) continue;
            var other = JoinOf(gate, d);
            if (other.Depth > join.Depth || (other.Depth == join.Depth && other.Elmore > join.Elmore)
                                         || (other.Depth == join.Depth && other.Elmore == join.Elmore && d < join.Previous))
                join = other;
        }

        return join.Depth > 1 ? join : Join.None;
    }

    private Join JoinOf(Device gate, int driver)
    {
        var cut = trails.FirstConflict(driver, gate);
        if (cut < 0)
            return new Join(driver, -1, -1, depthIn[driver] + 1, elmoreIn[driver]);
        var first = trails.BeyondOf(cut);
        if (trails.GateOf(cut) == driver || first < 0)
            return new Join(-1, -1, -1, 1, 0);
        var depth = treeIndex[driver] - treeIndex[first] + 2;
        return new Join(driver, cut, first, depth, RootTerm(Network.GateAt(first)) + stepSum[driver] - stepSum[first] + step[first]);
    }

    // Backward in postorder: the longest run continuing from each gate.
    private void EnsureContinuations()
    {
        if (this.depthOut is not null)
            return;
        var network = Network;
        var netlist = network.Netlist;
        var order = network.Postorder;
        var n = network.PassGateCount;
        var depthOut = new int[n];
        var next = new int[n];
        var end = new int[n];
        var index = new int[n];
        var sufStep = new double[n];
        var sufOhms = new double[n];
        var sufFarads = new double[n];
        var sufAssumes = new int[n];
        var continuation = new ControlTrails(network, decisions);

        // The best run continuing from each gate's output net, written to the gates that drive it when the net is
        // reached (before them in postorder).
        var bestLoadOfOutput = new int[n];
        for (var i = 0; i < order.Count; i++)
        {
            if ((i & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
            var node = order[i];
            if (network.IsNetNode(node))
            {
                var net = netlist.Nets[network.NetIdOf(node)];
                var best = -1;
                var bestDelay = 0.0;
                for (var position = network.PassLoadStart(net); position < network.PassLoadEnd(net); position++)
                {
                    var load = network.PassLoadIndexAt(position);
                    if (!network.IsInputEdgeKept(load)) continue;
                    var delay = step[load] + sufStep[load] - sufStep[end[load]];
                    if (best < 0 || depthOut[load] > depthOut[best] || (depthOut[load] == depthOut[best] && delay > bestDelay))
                    {
                        best = load;
                        bestDelay = delay;
                    }
                }

                foreach (var driver in netlist.DriverList(net))
                    if (driver.IsPassDevice)
                        bestLoadOfOutput[network.IndexOf(driver)] = best;
                continue;
            }

            var g = node;
            var gate = network.GateAt(g);
            var (after, cut, last) = network.IsOutputEdgeKept(g) ? BestContinuation(gate, bestLoadOfOutput[g], continuation, depthOut, end, index, sufStep) : (-1, -1, -1);
            next[g] = after;
            continuation.Extend(after, cut, g);
            if (after < 0)
            {
                depthOut[g] = 1;
                end[g] = g;
                continue;
            }

            var afterGate = network.GateAt(after);
            index[g] = index[after] + 1;
            sufStep[g] = step[after] + sufStep[after];
            sufOhms[g] = netlist.ResistanceOf(afterGate).Ohms + sufOhms[after];
            sufFarads[g] = netlist.CapacitanceOf(afterGate.Output).Farads + sufFarads[after];
            sufAssumes[g] = (network.AssumesUnknownBranchesConduct(afterGate) ? 1 : 0) + sufAssumes[after];
            end[g] = last;
            depthOut[g] = index[g] - index[last] + 1;
        }

        this.next = next;
        this.end = end;
        suffixIndex = index;
        suffixStep = sufStep;
        suffixOhms = sufOhms;
        suffixFarads = sufFarads;
        suffixAssumes = sufAssumes;
        continuationTrails = continuation;
        this.depthOut = depthOut;
    }

    // The load the gate's run continues into, the entry of that load's continuation trail where it must stop (-1: it
    // goes on to the load's own end), and the last gate it reaches (pass indexes).
    private (int After, int Cut, int Last) BestContinuation(Device gate, int best, ControlTrails continuation, int[] depthOut, int[] end, int[] index, double[] sufStep)
    {
        if (best < 0) return (-1, -1, -1);
        var chosen = Candidate(best);
        if (chosen.Cut < 0) return (chosen.After, chosen.Cut, chosen.Last);
        var network = Network;
        var net = gate.Output;
        for (var position = network.PassLoadStart(net); position < network.PassLoadEnd(net); position++)
        {
            var load = network.PassLoadIndexAt(position);
            if (load == best || !network.IsInputEdgeKept(load)) continue;
            var other = Candidate(load);
            if (other.Depth > chosen.Depth || (other.Depth == chosen.Depth && other.Delay > chosen.Delay))
                chosen = other;
        }

        return chosen.Depth > 1 ? (chosen.After, chosen.Cut, chosen.Last) : (-1, -1, -1);

        (int After, int Cut, int Last, int Depth, double Delay) Candidate(int load)
        {
            var cut = continuation.FirstConflict(load, gate);
            if (cut < 0)
                return (load, -1, end[load], depthOut[load] + 1, step[load] + sufStep[load] - sufStep[end[load]]);
            var last = continuation.BeyondOf(cut);
            if (continuation.GateOf(cut) == load || last < 0)
                return (-1, -1, -1, 1, 0);
            return (load, cut, last, index[load] - index[last] + 2, step[load] + sufStep[load] - sufStep[last]);
        }
    }

    public PassGateNetwork Network { get; }

    /// <summary>Pass gates in the longest run that ends at this gate, the gate included (0 for a restoring stage).</summary>
    public int DepthIn(Device gate)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        return gate.IsPassDevice ? depthIn[Network.IndexOf(gate)] : 0;
    }

    /// <summary>The first gate of the longest run that ends at this gate.</summary>
    public Device StartOf(Device gate) => Network.GateAt(start[Network.IndexOf(gate)]);

    /// <summary>
    /// True when the gate is the first of its run beyond <paramref name="limit"/> gates: the run reaches limit + 1
    /// there, or a run broken part-way (see the remarks) begins after the run that reached its predecessor and is
    /// already beyond the limit at this gate. One gate per over-long run.
    /// </summary>
    public bool IsFirstBeyond(Device gate, int limit)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        if (!gate.IsPassDevice) return false;
        var g = Network.IndexOf(gate);
        var depth = depthIn[g];
        if (depth <= limit) return false;
        var before = previous[g];
        return depth == limit + 1 || before < 0 || start[before] != start[g];
    }

    /// <summary>The whole run through this gate: the longest run ending at it, continued by the longest run from it as
    /// far as its gates can conduct with those before.</summary>
    public Chain ChainThrough(Device gate)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        if (!gate.IsPassDevice) throw new ArgumentException($"'{nameof(gate)}' must be a pass device (was {gate}).", nameof(gate));
        EnsureContinuations();
        var network = Network;
        var netlist = network.Netlist;
        var id = network.IndexOf(gate);
        var last = LastOf(id);
        var after = suffixIndex![id] - suffixIndex[last];

        // The run ending at the gate, from its first gate f: the sums along the tree from f on, and f's own terms.
        var f = start[id];
        var first = network.GateAt(f);
        var ohmsIn = ohmsSum[id] - ohmsSum[f] + netlist.ResistanceOf(first).Ohms;
        var faradsIn = faradsSum[id] - faradsSum[f] + netlist.CapacitanceOf(first.Output).Farads;
        var assumesIn = network.RootLoadAssumes(first) || network.AssumesUnknownBranchesConduct(first) || assumesSum[id] - assumesSum[f] > 0;
        return new Chain(
            first,
            network.GateAt(last),
            depthIn[id] + after,
            new Time(elmoreIn[id] + suffixStep![id] - suffixStep[last]),
            new Resistance(ohmsIn + suffixOhms![id] - suffixOhms[last]),
            new Capacitance(faradsIn + suffixFarads![id] - suffixFarads[last]),
            assumesIn || suffixAssumes![id] - suffixAssumes[last] > 0);
    }

    /// <summary>The gates of <see cref="ChainThrough"/> in order from its first, at most <paramref name="limit"/> of them.</summary>
    public List<Device> ChainGates(Device gate, int limit = int.MaxValue)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        var chain = ChainThrough(gate);
        var network = Network;
        var id = network.IndexOf(gate);
        var gates = new List<Device>(Math.Min(chain.Length, limit));
        var first = start[id];
        for (var g = id; ; g = previous[g])
        {
            gates.Add(network.GateAt(g));
            if (g == first) break;
        }

        gates.Reverse();
        if (gates.Count > limit) gates.RemoveRange(limit, gates.Count - limit);
        var last = network.IndexOf(chain.Last);
        for (var g = id; g != last && gates.Count < limit;)
        {
            g = next![g];
            gates.Add(network.GateAt(g));
        }

        return gates;
    }

    // The last gate of the chain through a gate: its continuation's end, or earlier where a gate of the continuation
    // cannot conduct with one of the run that ends at the gate.
    private int LastOf(int id)
    {
        var cut = continuationTrails!.FirstConflictWith(id, trails, id, skip: id);
        return cut < 0 ? end![id] : continuationTrails.BeyondOf(cut);
    }

    /// <summary>A run of pass gates in series: its first and last gates, length, Elmore delay at its far end and its totals.</summary>
    internal readonly struct Chain
    {
        public Chain(Device first, Device last, int length, Time elmore, Resistance totalResistance, Capacitance totalNodeCapacitance, bool assumesUnknownBranchesConduct)
        {
            AssumesUnknownBranchesConduct = assumesUnknownBranchesConduct;
            First = first;
            Last = last;
            Length = length;
            Elmore = elmore;
            TotalResistance = totalResistance;
            TotalNodeCapacitance = totalNodeCapacitance;
        }

        public Device First { get; }

        public Device Last { get; }

        public int Length { get; }

        /// <summary>Elmore delay from the driving stage to the run's last output net.</summary>
        public Time Elmore { get; }

        /// <summary>Sum of the gates' on-resistances.</summary>
        public Resistance TotalResistance { get; }

        /// <summary>The Elmore delay counts side branches on data nets not known to be exclusive as conducting together.</summary>
        public bool AssumesUnknownBranchesConduct { get; }

        /// <summary>Sum of the capacitances of the gates' output nets (each net's own, fan-out loads included).</summary>
        public Capacitance TotalNodeCapacitance { get; }
    }
}
