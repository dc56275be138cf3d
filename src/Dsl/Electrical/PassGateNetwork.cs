using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Electrical;

/// <summary>
/// A netlist seen as RC trees of pass gates, and the one pass-gate delay model every rule and report uses. A pass gate
/// is a branch resistance from its input net to its output net; a net with a (non-weak) restoring driver, or a primary
/// input, restores the signal and roots a tree through its driver's resistance. Built in O(devices + nets):
/// <list type="bullet">
/// <item>the series edges (gate → its output net → the pass gates that net feeds), walked depth-first from the
/// restoring nets; an edge that closes a loop of pass gates (a back edge of the walk) is dropped, so what remains is
/// acyclic and every later sweep terminates;</item>
/// <item>the load of every net: its own capacitance (from <see cref="Netlist.CapacitanceOf"/>, fan-out gate loads
/// included) plus the side branches that may conduct with it, each a capacitive load of what its gate charges while
/// it conducts. Of branches that cannot conduct together (<see cref="ConductionDecisions"/>, as for the series runs:
/// exclusive data controls, <see cref="Netlist.AreExclusive"/>, stated with <see cref="Circuit.Exclusive"/> or a net
/// and its inverse; or clock phases whose windows never overlap beyond the complement skew) at most one conducts, so
/// only the heaviest such set counts; a branch that cannot conduct with the gate that charges the net is off, and so
/// is everything below a branch that cannot conduct with that branch's own gate. Branches on data nets not known to
/// be exclusive are counted as conducting together (the worst case), and the model says so
/// (<see cref="AssumesUnknownBranchesConduct(Net)"/>).</item>
/// </list>
/// </summary>
/// <remarks>
/// <para>The delay of a conducting path is its Elmore delay (W. C. Elmore, "The Transient Response of Damped Linear
/// Networks with Particular Regard to Wideband Amplifiers", J. Appl. Phys. 19(1), 1948): Σ over the path's
/// resistances R_k of R_k · C_down(k). For a node on the path, a side branch adds its whole capacitance to C_down at
/// the point where it leaves the path and nothing beyond (the resistance it shares with the path ends there), so
/// side branches are exactly capacitive loads (J. Rubinstein, P. Penfield, M. A. Horowitz, "Signal Delay in RC Tree
/// Networks", IEEE Trans. CAD 2(3), 1983, the shared-resistance form T_i = Σ_k R_ki C_k).</para>
/// <para>Choosing the heaviest set of mutually non-exclusive branches is done greedily (heaviest first); it is exact
/// when exclusive pairs form disjoint groups (one-hot groups, complementary pairs), the usual case. Nets feeding more
/// than <see cref="MaxBranchesCompared"/> pass gates count them all; their figure is an assumption unless one stated
/// exclusive group holds all their data controls (checked in one pass, not pair by pair). A net reached twice from the
/// same net along different pass paths (a diamond) is counted on each path, which keeps the delay pessimistic.</para>
/// </remarks>
internal sealed class PassGateNetwork
{
    private const byte White = 0, Grey = 1, Black = 2;

    // One network per netlist: PW2001, the latch paths' worst-case delays and the reports all read the same figures,
    // and building it is a few sweeps over the whole netlist (read-only once built, so it is safe to share).
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<Netlist, PassGateNetwork> Cache = new();

    private readonly bool[] restored;

    // The pass gates numbered densely in device order (their pass index), so that everything kept per gate here and in
    // the rules is as long as the pass gates, not the whole device list: at a million devices, arrays indexed by
    // device id were the rules' main large-object allocations, which start the runtime's full collections.
    private readonly int[] passGates;
    private readonly int[] passIndexOfDevice;
    private readonly bool[] inputEdgeKept;
    private readonly bool[] outputEdgeKept;
    private readonly double[] downstreamFarads;
    private readonly bool[] downstreamAssumes;
    private readonly double[] chargedFarads;
    private readonly bool[] chargedAssumes;
    private readonly double[] rootFarads;
    private readonly bool[] rootAssumes;

    // Which branches can conduct while another does: used while the network is built (single-threaded), never after.
    private readonly ConductionDecisions conduction;
    private readonly List<(double Farads, Device Gate)> branchScratch = new();
    private readonly List<Device> countedScratch = new();
    private readonly List<Net> controlScratch = new();
    private readonly HashSet<Net> controlSeen = new();
    private readonly int[] postorder;
    private readonly int[] passLoadStart;
    private readonly int[] passLoads;

    /// <summary>The network of a netlist, built on first use and kept for the netlist's lifetime (a build cancelled
    /// by <paramref name="cancellationToken"/> keeps nothing).</summary>
    public static PassGateNetwork Of(Netlist netlist, CancellationToken cancellationToken = default)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        if (Cache.TryGetValue(netlist, out var network))
            return network;
        network = new PassGateNetwork(netlist, cancellationToken);
        // Two threads may build it at once (the analyzers of two rule families run concurrently): both results are
        // equal, and every caller then reads the one kept.
        return Cache.GetValue(netlist, _ => network);
    }

    private PassGateNetwork(Netlist netlist, CancellationToken cancellationToken)
    {
        Netlist = netlist ?? throw new ArgumentNullException(nameof(netlist));
        var devices = netlist.Devices;
        var nets = netlist.Nets;
        restored = new bool[nets.Count];
        foreach (var net in nets)
            restored[net.Id] = IsRestoredNet(netlist, net);

        passIndexOfDevice = new int[devices.Count];
        var count = 0;
        foreach (var device in devices)
            passIndexOfDevice[device.Id] = device.IsPassDevice ? count++ : -1;
        passGates = new int[count];
        inputEdgeKept = new bool[count];
        outputEdgeKept = new bool[count];
        foreach (var device in devices)
        {
            if (!device.IsPassDevice) continue;
            var index = passIndexOfDevice[device.Id];
            passGates[index] = device.Id;
            inputEdgeKept[index] = true;
            outputEdgeKept[index] = !restored[device.Output.Id];
        }

        // The pass gates each net feeds, as one flat array (net i's are passLoads[passLoadStart[i] .. passLoadStart[i+1]]).
        passLoadStart = new int[nets.Count + 1];
        foreach (var device in devices)
            if (device.IsPassDevice)
                passLoadStart[device.Inputs[0].Id + 1]++;
        for (var i = 0; i < nets.Count; i++)
            passLoadStart[i + 1] += passLoadStart[i];
        passLoads = new int[passLoadStart[nets.Count]];
        var fill = (int[])passLoadStart.Clone();
        foreach (var device in devices)
            if (device.IsPassDevice)
                passLoads[fill[device.Inputs[0].Id]++] = passIndexOfDevice[device.Id];

        postorder = Walk(cancellationToken);
        conduction = new ConductionDecisions(netlist, SkewOverlapCounts.No);
        downstreamFarads = new double[nets.Count];
        downstreamAssumes = new bool[nets.Count];
        chargedFarads = new double[count];
        chargedAssumes = new bool[count];
        SumDownstream(cancellationToken);
        rootFarads = new double[count];
        rootAssumes = new bool[count];
        ComputeRootLoads(cancellationToken);
    }

    /// <summary>Nets feeding more pass gates than this count them all, without comparing their controls.</summary>
    public const int MaxBranchesCompared = 64;

    public Netlist Netlist { get; }

    /// <summary>The number of pass gates: their pass indexes run from 0 to this count, in device order.</summary>
    public int PassGateCount => passGates.Length;

    /// <summary>The pass gate with this pass index.</summary>
    public Device GateAt(int passIndex) => Netlist.Devices[passGates[passIndex]];

    /// <summary>The pass index of a pass gate of this network's netlist (dense, in device order).</summary>
    public int IndexOf(Device gate)
    {
        if (gate is null) throw new ArgumentNullException(nameof(gate));
        if ((uint)gate.Id >= (uint)passIndexOfDevice.Length || passIndexOfDevice[gate.Id] < 0 || !ReferenceEquals(Netlist.Devices[gate.Id], gate))
            throw new ArgumentException($"'{nameof(gate)}' must be a pass device of design '{Netlist.DesignName}' (was {gate}).", nameof(gate));
        return passIndexOfDevice[gate.Id];
    }

    /// <summary>Graph nodes in depth-first postorder: pass indexes for gates, and nets encoded as
    /// <see cref="PassGateCount"/> + net id. For every kept edge u → v, v comes before u.</summary>
    public IReadOnlyList<int> Postorder => postorder;

    public bool IsNetNode(int node) => node >= passGates.Length;

    public int NetIdOf(int node) => node - passGates.Length;

    /// <summary>True when the net is a primary input or has a restoring driver that is not a weak keeper.</summary>
    public bool IsRestored(Net net) => restored[net.Id];

    /// <summary>The pass gate with this pass index is fed by its input net through a series edge that was kept (not
    /// one closing a loop). By index: the sweeps that ask hold the index, not the device.</summary>
    public bool IsInputEdgeKept(int passIndex) => inputEdgeKept[passIndex];

    /// <summary>The pass gate with this pass index continues into its output net (the net is not restored and the edge
    /// closes no loop).</summary>
    public bool IsOutputEdgeKept(int passIndex) => outputEdgeKept[passIndex];

    /// <summary>Where the pass gates this net feeds (as their data input) begin among <see cref="PassLoadAt"/>; they
    /// run, in netlist order, up to <see cref="PassLoadEnd"/> (an index range rather than an enumerable, which would
    /// allocate on every net).</summary>
    public int PassLoadStart(Net net) => passLoadStart[net.Id];

    /// <summary>Where the pass gates this net feeds end among <see cref="PassLoadAt"/> (exclusive).</summary>
    public int PassLoadEnd(Net net) => passLoadStart[net.Id + 1];

    /// <summary>The pass gate at a position of the flat pass-load index.</summary>
    public Device PassLoadAt(int position) => GateAt(passLoads[position]);

    /// <summary>The pass index of the gate at a position of the flat pass-load index.</summary>
    public int PassLoadIndexAt(int position) => passLoads[position];

    /// <summary>The net's load when it is driven with nothing known about which of its pass gates conduct: its own
    /// capacitance plus the heaviest set of branches that may conduct together (F).</summary>
    public Capacitance DownstreamCapacitanceOf(Net net) => new(downstreamFarads[net.Id]);

    /// <summary>True when <see cref="DownstreamCapacitanceOf"/> counts, somewhere downstream, two or more branches on
    /// different data nets not known to be exclusive as conducting together.</summary>
    public bool AssumesUnknownBranchesConduct(Net net) => downstreamAssumes[net.Id];

    /// <summary>
    /// The capacitance a pass gate charges through its on-resistance: its output net and the branches beyond that may
    /// conduct while it does (those that cannot conduct with it are off); only the net's own capacitance when the chain
    /// cannot continue there (a restored net, a loop).
    /// </summary>
    public Capacitance ChargedThrough(Device gate) => new(chargedFarads[IndexOf(gate)]);

    /// <summary>True when <see cref="ChargedThrough"/> makes the assumption of <see cref="AssumesUnknownBranchesConduct(Net)"/>.</summary>
    public bool AssumesUnknownBranchesConduct(Device gate) => chargedAssumes[IndexOf(gate)];

    /// <summary>
    /// The load the driver of <paramref name="gate"/>'s input net sees while the gate conducts: the net, the gate's
    /// branch, and the other branches that may conduct with it (those that cannot conduct with the gate are off).
    /// </summary>
    public Capacitance RootLoad(Device gate) => new(rootFarads[IndexOf(gate)]);

    /// <summary>True when <see cref="RootLoad"/> makes the assumption of <see cref="AssumesUnknownBranchesConduct(Net)"/>.</summary>
    public bool RootLoadAssumes(Device gate) => rootAssumes[IndexOf(gate)];

    /// <summary>
    /// The Elmore term of one restoring stage or pass gate on a conducting path, in the worst case: its resistance
    /// times everything it charges (a restoring stage: its output net and the pass-gate branches that may conduct from
    /// it; a pass gate: <see cref="ChargedThrough"/>). Summed along a path, the terms make the path's Elmore delay with
    /// its side loads; a 50 % estimate multiplies it by 0.69 ≈ ln 2 (<see cref="FiftyPercentDelay"/>).
    /// </summary>
    public Time ElmoreTerm(Device device)
    {
        if (device is null) throw new ArgumentNullException(nameof(device));
        var load = device.IsPassDevice ? ChargedThrough(device) : DownstreamCapacitanceOf(device.Output);
        return Netlist.ResistanceOf(device) * load;
    }

    // Every gate's root load, once every charged load is final, so that the network is read-only (and safe to share)
    // afterwards.
    private void ComputeRootLoads(CancellationToken cancellationToken)
    {
        for (var index = 0; index < passGates.Length; index++)
        {
            if ((index & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
            var gate = GateAt(index);
            rootFarads[index] = LoadOf(gate.Inputs[0], gate, gate, out rootAssumes[index]);
        }
    }

    // One sweep in postorder, so that everything below a node is final when it is reached: a gate's charged load
    // (its output net, with the branches that may conduct while it does) and a net's downstream load (with the
    // heaviest set of branches that may conduct together). A branch weighs what its gate charges while it conducts, so
    // what cannot conduct with the gate is left out all the way down, not only beside it.
    private void SumDownstream(CancellationToken cancellationToken)
    {
        var nets = Netlist.Nets;
        for (var i = 0; i < postorder.Length; i++)
        {
            if ((i & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
            var node = postorder[i];
            if (node < passGates.Length)
            {
                var gate = GateAt(node);
                chargedFarads[node] = outputEdgeKept[node]
                    ? LoadOf(gate.Output, gate, null, out chargedAssumes[node])
                    : Netlist.CapacitanceOf(gate.Output).Farads;
                continue;
            }

            var net = nets[node - passGates.Length];
            downstreamFarads[net.Id] = PassLoadStart(net) == PassLoadEnd(net)
                ? Netlist.CapacitanceOf(net).Farads
                : LoadOf(net, null, null, out downstreamAssumes[net.Id]);
        }
    }

    // The net's capacitance plus the heaviest set of its branches that conduct together, none of them unable to
    // conduct with 'conducting' (the gate charging the net, or the gate a path leaves it by), 'required' always
    // included; each branch weighs its gate's charged load (final for it when the sweep reaches this net). A net
    // with more branches than are compared counts them all, whichever gate conducts: its downstream load.
    private double LoadOf(Net net, Device? conducting, Device? required, out bool assumes)
    {
        var compare = PassLoadEnd(net) - PassLoadStart(net) <= MaxBranchesCompared;
        if (!compare && conducting is not null)
        {
            assumes = downstreamAssumes[net.Id];
            return downstreamFarads[net.Id];
        }

        var branches = branchScratch;
        branches.Clear();
        var anyExclusive = false;
        assumes = false;
        for (var position = passLoadStart[net.Id]; position < passLoadStart[net.Id + 1]; position++)
        {
            var loadIndex = passLoads[position];
            if (!inputEdgeKept[loadIndex]) continue;
            var load = GateAt(loadIndex);
            if (compare && conducting is not null && !ReferenceEquals(load, required) && CannotConductTogether(load, conducting)) continue;
            var kept = outputEdgeKept[loadIndex];
            assumes |= kept && chargedAssumes[loadIndex];
            anyExclusive |= compare && conduction.CanExclude(load);
            branches.Add((kept ? chargedFarads[loadIndex] : 0.0, load));
        }

        return Netlist.CapacitanceOf(net).Farads + SelectConducting(branches, required, anyExclusive, ref assumes);
    }

    // Greedy, heaviest first (the required branch before all): a branch is counted unless its control is exclusive
    // with one already counted. Two counted branches on different data nets not known to be exclusive are an assumption.
    private double SelectConducting(List<(double Farads, Device Gate)> branches, Device? required, bool compare, ref bool assumes)
    {
        if (branches.Count == 0) return 0;
        if (compare && branches.Count > 1)
            branches.Sort(HeaviestFirst);
        if (required is not null)
        {
            for (var at = 1; at < branches.Count; at++)
            {
                if (!ReferenceEquals(branches[at].Gate, required)) continue;
                var item = branches[at];
                branches.RemoveAt(at);
                branches.Insert(0, item);
                break;
            }
        }

        var counted = countedScratch;
        counted.Clear();
        var controls = controlScratch;
        controls.Clear();
        controlSeen.Clear();
        var total = 0.0;
        foreach (var (farads, gate) in branches)
        {
            var keep = true;
            if (compare)
                foreach (var other in counted)
                    if (CannotConductTogether(gate, other)) { keep = false; break; }
            if (!keep) continue;
            counted.Add(gate);
            total += farads;
            if (!assumes && gate.DataControl is { } control && controlSeen.Add(control))
                controls.Add(control); // once the figure is an assumption, the controls need not be collected
        }

        if (!assumes)
            assumes = HasUnknownPair(controls);
        return total;
    }

    // Whether two of the distinct data controls of the branches counted together are not known to be exclusive: then
    // the figure is an assumption. Compared pair by pair up to MaxBranchesCompared controls; past that (a wide one-hot
    // mux) only one stated group holding them all proves them exclusive, so that the cost stays linear.
    private bool HasUnknownPair(List<Net> controls)
    {
        if (controls.Count < 2)
            return false;
        if (controls.Count > MaxBranchesCompared)
            return !Netlist.OneExclusiveGroupHolds(controls);
        for (var j = 1; j < controls.Count; j++)
            for (var i = 0; i < j; i++)
                if (!Netlist.AreExclusive(controls[i], controls[j]))
                    return true;
        return false;
    }

    private static readonly Comparison<(double Farads, Device Gate)> HeaviestFirst
        = static (a, b) => b.Farads != a.Farads ? b.Farads.CompareTo(a.Farads) : a.Gate.Id.CompareTo(b.Gate.Id);

    // Exclusive data controls, or clock phases whose windows never overlap beyond the complement skew: the decision
    // that breaks a series run (so a run and its side loads agree on what conducts).
    private bool CannotConductTogether(Device a, Device b) => !conduction.MayConductTogether(a, b);

    /// <summary>
    /// The resistance that drives a tree rooted at this net: its strongest restoring driver's; the process's driver
    /// resistance for a primary input or a net with no restoring driver (then assumed driven like an input).
    /// </summary>
    public Resistance RootResistanceOf(Net net)
    {
        Resistance? strongest = null;
        foreach (var driver in Netlist.DriverList(net))
        {
            if (!driver.IsRestoring || driver.IsWeak) continue;
            var r = Netlist.ResistanceOf(driver);
            if (strongest is null || r < strongest.Value) strongest = r;
        }

        return strongest ?? Netlist.Process.DriverResistance;
    }

    private static bool IsRestoredNet(Netlist netlist, Net net)
    {
        if (netlist.IsInput(net)) return true;
        foreach (var driver in netlist.DriverList(net))
            if (driver.IsRestoring && !driver.IsWeak)
                return true;
        return false;
    }

    // Iterative depth-first walk of the bipartite graph gate → output net → pass loads. Roots: first the nets no kept
    // pass gate drives (restored nets, undriven nets), then anything left (loops of pass gates with no way in).
    private int[] Walk(CancellationToken cancellationToken)
    {
        var nets = Netlist.Nets;
        var gateCount = passGates.Length;
        var nodeCount = gateCount + nets.Count;
        var colour = new byte[nodeCount];
        // Every node is reached (each gate from its input net, every net as a root at the latest): the order fills
        // the array exactly, with no copy of it at the end.
        var order = new int[nodeCount];
        var placed = 0;
        var stack = new Stack<(int Node, int Next)>();
        var steps = 0;

        var hasPassDriver = new bool[nets.Count];
        for (var index = 0; index < gateCount; index++)
            if (outputEdgeKept[index])
                hasPassDriver[GateAt(index).Output.Id] = true;

        for (var round = 0; round < 2; round++)
        {
            foreach (var net in nets)
            {
                var node = gateCount + net.Id;
                if (colour[node] != White || (round == 0 && hasPassDriver[net.Id])) continue;
                colour[node] = Grey;
                stack.Push((node, 0));
                while (stack.Count > 0)
                {
                    var (current, next) = stack.Pop();
                    if ((++steps & 0xFFF) == 0) cancellationToken.ThrowIfCancellationRequested();
                    var child = ChildOf(current, next, out var gateOfEdge, out var isOutputEdge);
                    if (child < 0)
                    {
                        colour[current] = Black;
                        order[placed++] = current;
                        continue;
                    }

                    stack.Push((current, next + 1));
                    if (colour[child] == Grey)
                    {
                        // A back edge: it closes a loop of pass gates. Dropping it leaves the graph acyclic.
                        if (isOutputEdge) outputEdgeKept[gateOfEdge] = false;
                        else inputEdgeKept[gateOfEdge] = false;
                    }
                    else if (colour[child] == White)
                    {
                        colour[child] = Grey;
                        stack.Push((child, 0));
                    }
                }
            }
        }

        if (placed != nodeCount)
            Array.Resize(ref order, placed);
        return order;
    }

    // The index-th successor of a node, or -1. A gate's only successor is its output net (when not restored); a net's
    // successors are the pass gates it feeds.
    private int ChildOf(int node, int index, out int gate, out bool isOutputEdge)
    {
        var gateCount = passGates.Length;
        if (node < gateCount)
        {
            gate = node;
            isOutputEdge = true;
            return index == 0 && outputEdgeKept[node] ? gateCount + GateAt(node).Output.Id : -1;
        }

        isOutputEdge = false;
        var net = node - gateCount;
        var position = passLoadStart[net] + index;
        gate = position < passLoadStart[net + 1] ? passLoads[position] : -1;
        return gate;
    }
}
