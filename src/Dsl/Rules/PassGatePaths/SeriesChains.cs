using System;
using System.Threading;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Rules.PassGatePaths;

/// <summary>
/// The series runs of pass gates in a netlist: for every pass gate, the longest run of pass gates that ends at it
/// (and the Elmore delay at its output along that run), and the longest run that continues from it. Two sweeps over
/// the <see cref="PassGateNetwork"/>'s acyclic order (the second on first use), so O(devices + nets) in all, however
/// long or wide the chains.
/// </summary>
/// <remarks>
/// The Elmore delay along a run is the second pass of the RC-tree algorithm (<see cref="ElmoreDelay"/>) in the one
/// pass-gate delay model (<see cref="PassGateNetwork"/>): the driver's resistance times its load while the run's first
/// gate conducts (<see cref="PassGateNetwork.RootLoad"/>), plus, for every gate on the run, its
/// on-resistance times the downstream capacitance it charges. Where several runs end at a gate, the longer one is
/// kept (then the slower one, then the lower device id), so every gate has one predecessor and the runs form a tree.
/// A run continues only through gates that can conduct at the same time (<see cref="ConductionOverlap"/>): a gate on
/// clk.High followed by one on clk.Low is two runs, each ending at a node the other phase stores.
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
    private readonly PhaseWindowCache windows = new();
    private readonly CancellationToken cancellationToken;

    // The runs continuing from each gate: the second sweep, made on first use. A rule that only needs the runs ending
    // at each gate (a design with no over-long chain) never pays for it.
    private int[]? depthOut;
    private int[]? next;
    private double[]? elmoreAfter;
    private double[]? ohmsAfter;
    private double[]? faradsAfter;
    private bool[]? assumesAfter;

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
            var input = gate.Inputs[0];
            var ohms = netlist.ResistanceOf(gate).Ohms;
            var farads = netlist.CapacitanceOf(gate.Output).Farads;
            var step = ohms * network.ChargedThrough(gate).Farads;
            var before = network.IsInputEdgeKept(gate) ? BestDriverConductingWith(gate, netBestDriver[input.Id]) : -1;
            previous[gate.Id] = before;
            if (before < 0)
            {
                depthIn[gate.Id] = 1;
                start[gate.Id] = gate.Id;
                elmoreIn[gate.Id] = network.RootResistanceOf(input).Ohms * network.RootLoad(gate).Farads + step;
                ohmsIn[gate.Id] = ohms;
                faradsIn[gate.Id] = farads;
                assumesIn[gate.Id] = network.RootLoadAssumes(gate) || network.AssumesUnknownBranchesConduct(gate);
            }
            else
            {
                depthIn[gate.Id] = depthIn[before] + 1;
                start[gate.Id] = start[before];
                elmoreIn[gate.Id] = elmoreIn[before] + step;
                ohmsIn[gate.Id] = ohmsIn[before] + ohms;
                faradsIn[gate.Id] = faradsIn[before] + farads;
                assumesIn[gate.Id] = assumesIn[before] || network.AssumesUnknownBranchesConduct(gate);
            }
        }
    }

    // Two gates in series carry data through both only if they can conduct at the same time: gates on opposite phases
    // of a clock (beyond the skew-long overlap, which is PW1002's race) or on provably exclusive data controls are two
    // runs, not one. The net's best driver is usually compatible; only when it is not are the others searched.
    private bool ConductTogether(Device a, Device b)
        => ConductionOverlap.MayConductTogether(Network.Netlist, a, b, windows, SkewOverlapCounts.No);

    private int BestDriverConductingWith(Device gate, int best)
    {
        if (best < 0 || ConductTogether(Network.Netlist.Devices[best], gate))
            return best;
        best = -1;
        foreach (var driver in Network.Netlist.DriverList(gate.Inputs[0]))
        {
            if (!driver.IsPassDevice || !Network.IsOutputEdgeKept(driver) || !ConductTogether(driver, gate)) continue;
            if (best < 0 || depthIn[driver.Id] > depthIn[best]
                || (depthIn[driver.Id] == depthIn[best] && elmoreIn[driver.Id] > elmoreIn[best]))
                best = driver.Id;
        }

        return best;
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
        var elmoreAfter = new double[n];
        var ohmsAfter = new double[n];
        var faradsAfter = new double[n];
        var assumesAfter = new bool[n];
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
                    var delay = netlist.ResistanceOf(load).Ohms * network.ChargedThrough(load).Farads + elmoreAfter[load.Id];
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
            var after = network.IsOutputEdgeKept(gate) ? BestLoadConductingWith(gate, netBestLoad[gate.Output.Id], depthOut, elmoreAfter) : -1;
            next[gate.Id] = after;
            if (after < 0)
            {
                depthOut[gate.Id] = 1;
                continue;
            }

            var afterGate = devices[after];
            depthOut[gate.Id] = depthOut[after] + 1;
            elmoreAfter[gate.Id] = netlist.ResistanceOf(afterGate).Ohms * network.ChargedThrough(afterGate).Farads + elmoreAfter[after];
            ohmsAfter[gate.Id] = netlist.ResistanceOf(afterGate).Ohms + ohmsAfter[after];
            faradsAfter[gate.Id] = netlist.CapacitanceOf(afterGate.Output).Farads + faradsAfter[after];
            assumesAfter[gate.Id] = network.AssumesUnknownBranchesConduct(afterGate) || assumesAfter[after];
        }

        this.next = next;
        this.elmoreAfter = elmoreAfter;
        this.ohmsAfter = ohmsAfter;
        this.faradsAfter = faradsAfter;
        this.assumesAfter = assumesAfter;
        this.depthOut = depthOut;
    }

    private int BestLoadConductingWith(Device gate, int best, int[] depthOut, double[] elmoreAfter)
    {
        if (best < 0 || ConductTogether(gate, Network.Netlist.Devices[best]))
            return best;
        var network = Network;
        var netlist = network.Netlist;
        var net = gate.Output;
        best = -1;
        var bestDelay = 0.0;
        for (var position = network.PassLoadStart(net); position < network.PassLoadEnd(net); position++)
        {
            var load = network.PassLoadAt(position);
            if (!network.IsInputEdgeKept(load) || !ConductTogether(gate, load)) continue;
            var delay = netlist.ResistanceOf(load).Ohms * network.ChargedThrough(load).Farads + elmoreAfter[load.Id];
            if (best < 0 || depthOut[load.Id] > depthOut[best] || (depthOut[load.Id] == depthOut[best] && delay > bestDelay))
            {
                best = load.Id;
                bestDelay = delay;
            }
        }

        return best;
    }

    public PassGateNetwork Network { get; }

    /// <summary>Pass gates in the longest run that ends at this gate, the gate included (0 for a restoring stage).</summary>
    public int DepthIn(Device gate) => depthIn[gate.Id];

    /// <summary>The gate before this one on that run (null at the start of a run).</summary>
    public Device? Previous(Device gate) => previous[gate.Id] is var id and >= 0 && gate.IsPassDevice ? Network.Netlist.Devices[id] : null;

    /// <summary>The next gate on the longest run continuing from this gate (null at its end).</summary>
    public Device? Next(Device gate)
    {
        EnsureContinuations();
        return next![gate.Id] is var id and >= 0 && gate.IsPassDevice ? Network.Netlist.Devices[id] : null;
    }

    /// <summary>The first gate of the longest run that ends at this gate.</summary>
    public Device StartOf(Device gate) => Network.Netlist.Devices[start[gate.Id]];

    /// <summary>The whole run through this gate: the longest run ending at it, continued by the longest run from it.</summary>
    public Chain ChainThrough(Device gate)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        if (!gate.IsPassDevice) throw new ArgumentException($"'{nameof(gate)}' must be a pass device (was {gate}).", nameof(gate));
        EnsureContinuations();
        var id = gate.Id;
        return new Chain(
            StartOf(gate),
            depthIn[id] + depthOut![id] - 1,
            new Time(elmoreIn[id] + elmoreAfter![id]),
            new Resistance(ohmsIn[id] + ohmsAfter![id]),
            new Capacitance(faradsIn[id] + faradsAfter![id]),
            assumesIn[id] || assumesAfter![id]);
    }

    /// <summary>A run of pass gates in series: its first gate, length, Elmore delay at its far end and its totals.</summary>
    internal readonly struct Chain
    {
        public Chain(Device first, int length, Time elmore, Resistance totalResistance, Capacitance totalNodeCapacitance, bool assumesUnknownBranchesConduct)
        {
            AssumesUnknownBranchesConduct = assumesUnknownBranchesConduct;
            First = first;
            Length = length;
            Elmore = elmore;
            TotalResistance = totalResistance;
            TotalNodeCapacitance = totalNodeCapacitance;
        }

        public Device First { get; }

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
