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
    private readonly int[] depthIn;
    private readonly int[] previous;
    private readonly int[] start;
    private readonly double[] elmoreIn;
    private readonly double[] ohmsIn;
    private readonly double[] faradsIn;
    private readonly bool[] assumesIn;

    // Along the tree of predecessors (a run broken part-way still has its predecessor there): each gate's own Elmore
    // step, and sums from the tree's root, so that a sub-run's figures are two differences.
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
        var devices = netlist.Devices;
        var n = devices.Count;
        depthIn = new int[n];
        previous = new int[n];
        start = new int[n];
        elmoreIn = new double[n];
        ohmsIn = new double[n];
        faradsIn = new double[n];
        assumesIn = new bool[n];
        step = new double[n];
        treeIndex = new int[n];
        stepSum = new double[n];
        ohmsSum = new double[n];
        faradsSum = new double[n];
        assumesSum = new int[n];
        decisions = new ConductionDecisions(netlist, SkewOverlapCounts.No);
        trails = new ControlTrails(devices, decisions);
        this.cancellationToken = cancellationToken;

        var netBestDriver = new int[netlist.Nets.Count];
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
                    if (!driver.IsPassDevice || !network.IsOutputEdgeKept(driver)) continue;
                    if (best < 0 || depthIn[driver.Id] > depthIn[best]
                        || (depthIn[driver.Id] == depthIn[best] && elmoreIn[driver.Id] > elmoreIn[best]))
                        best = driver.Id;
                }

                netBestDriver[net.Id] = best;
                continue;
            }

            var gate = devices[node];
            var ohms = netlist.ResistanceOf(gate).Ohms;
            var farads = netlist.CapacitanceOf(gate.Output).Farads;
            var own = network.AssumesUnknownBranchesConduct(gate);
            step[gate.Id] = ohms * network.ChargedThrough(gate).Farads;
            var join = network.IsInputEdgeKept(gate) ? BestJoin(gate, netBestDriver[gate.Inputs[0].Id]) : Join.None;
            var before = join.Previous;
            previous[gate.Id] = before;
            treeIndex[gate.Id] = before < 0 ? 0 : treeIndex[before] + 1;
            stepSum[gate.Id] = (before < 0 ? 0 : stepSum[before]) + step[gate.Id];
            ohmsSum[gate.Id] = (before < 0 ? 0 : ohmsSum[before]) + ohms;
            faradsSum[gate.Id] = (before < 0 ? 0 : faradsSum[before]) + farads;
            assumesSum[gate.Id] = (before < 0 ? 0 : assumesSum[before]) + (own ? 1 : 0);
            trails.Extend(before, join.Cut, gate);
            if (before < 0)
            {
                depthIn[gate.Id] = 1;
                start[gate.Id] = gate.Id;
                elmoreIn[gate.Id] = RootTerm(gate) + step[gate.Id];
                ohmsIn[gate.Id] = ohms;
                faradsIn[gate.Id] = farads;
                assumesIn[gate.Id] = network.RootLoadAssumes(gate) || own;
            }
            else if (join.Start < 0)
            {
                depthIn[gate.Id] = depthIn[before] + 1;
                start[gate.Id] = start[before];
                elmoreIn[gate.Id] = elmoreIn[before] + step[gate.Id];
                ohmsIn[gate.Id] = ohmsIn[before] + ohms;
                faradsIn[gate.Id] = faradsIn[before] + farads;
                assumesIn[gate.Id] = assumesIn[before] || own;
            }
            else
            {
                // The run is broken before join.Start: the sub-run from there, its first gate driven from the node the
                // run was broken at.
                var first = devices[join.Start];
                depthIn[gate.Id] = treeIndex[gate.Id] - treeIndex[first.Id] + 1;
                start[gate.Id] = first.Id;
                elmoreIn[gate.Id] = RootTerm(first) + stepSum[gate.Id] - stepSum[first.Id] + step[first.Id];
                ohmsIn[gate.Id] = ohmsSum[gate.Id] - ohmsSum[first.Id] + netlist.ResistanceOf(first).Ohms;
                faradsIn[gate.Id] = faradsSum[gate.Id] - faradsSum[first.Id] + netlist.CapacitanceOf(first.Output).Farads;
                assumesIn[gate.Id] = network.RootLoadAssumes(first) || assumesSum[gate.Id] - assumesSum[first.Id] > 0
                                     || network.AssumesUnknownBranchesConduct(first);
            }
        }
    }

    private double RootTerm(Device first) => Network.RootResistanceOf(first.Inputs[0]).Ohms * Network.RootLoad(first).Farads;

    /// <summary>How a gate joins the run of a driver: the driver (-1: the gate begins a run), the entry of the driver's
    /// trail where the run is broken (-1: not broken) and the first gate of the sub-run that remains (-1: the driver's
    /// run whole).</summary>
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
    private Join BestJoin(Device gate, int best)
    {
        if (best < 0) return Join.None;
        var join = JoinOf(gate, best);
        if (join.Cut < 0) return join;
        foreach (var driver in Network.Netlist.DriverList(gate.Inputs[0]))
        {
            if (!driver.IsPassDevice || !Network.IsOutputEdgeKept(driver) || driver.Id == best) continue;
            var other = JoinOf(gate, driver.Id);
            if (other.Depth > join.Depth || (other.Depth == join.Depth && other.Elmore > join.Elmore)
                                         || (other.Depth == join.Depth && other.Elmore == join.Elmore && driver.Id < join.Previous))
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
        return new Join(driver, cut, first, depth, RootTerm(Network.Netlist.Devices[first]) + stepSum[driver] - stepSum[first] + step[first]);
    }

    // Backward in postorder: the longest run continuing from each gate.
    private void EnsureContinuations()
    {
        if (this.depthOut is not null)
            return;
        var network = Network;
        var netlist = network.Netlist;
        var devices = netlist.Devices;
        var order = network.Postorder;
        var n = devices.Count;
        var depthOut = new int[n];
        var next = new int[n];
        var end = new int[n];
        var index = new int[n];
        var sufStep = new double[n];
        var sufOhms = new double[n];
        var sufFarads = new double[n];
        var sufAssumes = new int[n];
        var continuation = new ControlTrails(devices, decisions);
        var netBestLoad = new int[netlist.Nets.Count];
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
                    var load = network.PassLoadAt(position);
                    if (!network.IsInputEdgeKept(load)) continue;
                    var delay = step[load.Id] + sufStep[load.Id] - sufStep[end[load.Id]];
                    if (best < 0 || depthOut[load.Id] > depthOut[best] || (depthOut[load.Id] == depthOut[best] && delay > bestDelay))
                    {
                        best = load.Id;
                        bestDelay = delay;
                    }
                }

                netBestLoad[net.Id] = best;
                continue;
            }

            var gate = devices[node];
            var (after, cut, last) = network.IsOutputEdgeKept(gate) ? BestContinuation(gate, netBestLoad[gate.Output.Id], continuation, depthOut, end, index, sufStep) : (-1, -1, -1);
            next[gate.Id] = after;
            continuation.Extend(after, cut, gate);
            if (after < 0)
            {
                depthOut[gate.Id] = 1;
                end[gate.Id] = gate.Id;
                continue;
            }

            var afterGate = devices[after];
            index[gate.Id] = index[after] + 1;
            sufStep[gate.Id] = step[after] + sufStep[after];
            sufOhms[gate.Id] = netlist.ResistanceOf(afterGate).Ohms + sufOhms[after];
            sufFarads[gate.Id] = netlist.CapacitanceOf(afterGate.Output).Farads + sufFarads[after];
            sufAssumes[gate.Id] = (network.AssumesUnknownBranchesConduct(afterGate) ? 1 : 0) + sufAssumes[after];
            end[gate.Id] = last;
            depthOut[gate.Id] = index[gate.Id] - index[last] + 1;
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
    // goes on to the load's own end), and the last gate it reaches.
    private (int After, int Cut, int Last) BestContinuation(Device gate, int best, ControlTrails continuation, int[] depthOut, int[] end, int[] index, double[] sufStep)
    {
        if (best < 0) return (-1, -1, -1);
        var chosen = Candidate(best);
        if (chosen.Cut < 0) return (chosen.After, chosen.Cut, chosen.Last);
        var network = Network;
        var net = gate.Output;
        for (var position = network.PassLoadStart(net); position < network.PassLoadEnd(net); position++)
        {
            var load = network.PassLoadAt(position);
            if (!network.IsInputEdgeKept(load) || load.Id == best) continue;
            var other = Candidate(load.Id);
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
    public int DepthIn(Device gate) => depthIn[gate.Id];

    /// <summary>The first gate of the longest run that ends at this gate.</summary>
    public Device StartOf(Device gate) => Network.Netlist.Devices[start[gate.Id]];

    /// <summary>
    /// True when the gate is the first of its run beyond <paramref name="limit"/> gates: the run reaches limit + 1
    /// there, or a run broken part-way (see the remarks) begins after the run that reached its predecessor and is
    /// already beyond the limit at this gate. One gate per over-long run.
    /// </summary>
    public bool IsFirstBeyond(Device gate, int limit)
    {
        var depth = depthIn[gate.Id];
        if (!gate.IsPassDevice || depth <= limit) return false;
        var before = previous[gate.Id];
        return depth == limit + 1 || before < 0 || start[before] != start[gate.Id];
    }

    /// <summary>The whole run through this gate: the longest run ending at it, continued by the longest run from it as
    /// far as its gates can conduct with those before.</summary>
    public Chain ChainThrough(Device gate)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        if (!gate.IsPassDevice) throw new ArgumentException($"'{nameof(gate)}' must be a pass device (was {gate}).", nameof(gate));
        EnsureContinuations();
        var id = gate.Id;
        var last = LastOf(id);
        var after = suffixIndex![id] - suffixIndex[last];
        var devices = Network.Netlist.Devices;
        return new Chain(
            StartOf(gate),
            devices[last],
            depthIn[id] + after,
            new Time(elmoreIn[id] + suffixStep![id] - suffixStep[last]),
            new Resistance(ohmsIn[id] + suffixOhms![id] - suffixOhms[last]),
            new Capacitance(faradsIn[id] + suffixFarads![id] - suffixFarads[last]),
            assumesIn[id] || suffixAssumes![id] - suffixAssumes[last] > 0);
    }

    /// <summary>The gates of <see cref="ChainThrough"/> in order from its first, at most <paramref name="limit"/> of them.</summary>
    public List<Device> ChainGates(Device gate, int limit = int.MaxValue)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        var chain = ChainThrough(gate);
        var devices = Network.Netlist.Devices;
        var gates = new List<Device>(Math.Min(chain.Length, limit));
        var first = start[gate.Id];
        for (var g = gate.Id; ; g = previous[g])
        {
            gates.Add(devices[g]);
            if (g == first) break;
        }

        gates.Reverse();
        if (gates.Count > limit) gates.RemoveRange(limit, gates.Count - limit);
        for (var g = gate.Id; g != chain.Last.Id && gates.Count < limit;)
        {
            g = next![g];
            gates.Add(devices[g]);
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
