using System;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using System.Threading;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// The latches, registers and latch-to-latch data paths of a netlist, found on its primitives. Shared by the
/// clock-phase (PW1xxx) and timing (PW4xxx) rules and by <see cref="TimingFigures"/>; built once per netlist.
/// </summary>
/// <remarks>
/// <para><b>Latches.</b> A storage node is a net that is not a primary input and whose drivers are all pass devices or
/// weak (keeper) stages. Each clock-phase-controlled pass gate driving a storage node is either a <i>feedback gate</i>
/// — the canonical static-latch loop: its input comes from an inverter fed by an inverter that reads the storage
/// node, and it conducts in a window other than the latch's entry window — or an <i>entry gate</i>. The entry window
/// is the window of the first (in order of creation) clocked driver that is not such a loop, else of the first
/// clocked driver. Entry gates of one window make one latch; a storage node with entry gates in two windows holds
/// two latches. Pass gates controlled by data nets never make a latch.</para>
/// <para><b>Paths.</b> From every latch's storage node one forward search follows restoring stages (strong ones:
/// keepers only hold), data-controlled pass gates (through their data input or their control net) and stops at
/// clocked pass gates: an entry gate of latch B ends a path A→B, any other clocked gate ends the search. It also
/// stops at another latch's storage node (data entering a storage node other than through its entry gate is not
/// followed). The cost of a search is the size of the latch's fan-out cone up to the next latches; the shortest
/// delays come from Dijkstra's algorithm, the longest from the cone taken as acyclic (loops are not followed round).</para>
/// </remarks>
public sealed class LatchModel
{
    private static readonly ConditionalWeakTable<Netlist, LatchModel> Cache = new();

    private readonly Latch?[] entryLatchOfDevice;
    private readonly bool[] isLatchStorage;
    private readonly Register?[] registerOfLatch;

    private LatchModel(Netlist netlist, List<Latch> latches, Latch?[] entryLatchOfDevice, bool[] isLatchStorage)
    {
        Netlist = netlist;
        Latches = latches;
        this.entryLatchOfDevice = entryLatchOfDevice;
        this.isLatchStorage = isLatchStorage;
        registerOfLatch = new Register?[latches.Count];
        Registers = FindRegisters();
        Paths = FindPaths();
    }

    public Netlist Netlist { get; }

    public IReadOnlyList<Latch> Latches { get; }

    public IReadOnlyList<Register> Registers { get; }

    /// <summary>Every latch-to-latch path, grouped by source latch (in latch order), then by entry gate.</summary>
    public IReadOnlyList<LatchPath> Paths { get; }

    /// <summary>The model of a netlist (computed once and cached for the netlist's lifetime).</summary>
    public static LatchModel Of(Netlist netlist)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        return Cache.GetValue(netlist, Build);
    }

    /// <summary>The register a latch is the master or slave of, or null.</summary>
    public Register? RegisterOf(Latch latch) => registerOfLatch[latch.Index];

    /// <summary>The latch whose entry gate this device is, or null.</summary>
    public Latch? LatchEnteredBy(Device device) => entryLatchOfDevice[device.Id];

    /// <summary>First-order delay of one stage (0.69·R·C, see <see cref="FirstOrderDelay"/>).</summary>
    public Time StageDelay(Device device) => FirstOrderDelay.Of(Netlist, device);

    /// <summary>Delay of the latch's entry: its (slowest) entry gate charging the storage node.</summary>
    public Time EntryDelay(Latch latch)
    {
        var worst = Time.Zero;
        var gates = latch.EntryGates;
        for (var i = 0; i < gates.Count; i++)
            worst = Time.Max(worst, StageDelay(gates[i]));
        return worst;
    }

    /// <summary>Delay of the latch's output stage (zero when it has none).</summary>
    public Time OutputDelay(Latch latch) => latch.OutputStage is { } stage ? StageDelay(stage) : Time.Zero;

    /// <summary>Two phases open in the same window: the same root clock and the same polarity (gated and buffered copies count).</summary>
    public static bool SameWindow(Phase a, Phase b)
        => ReferenceEquals(a.Clock.Root, b.Clock.Root) && a.Polarity == b.Polarity;

    /// <summary>Two phases of one root clock with opposite polarity.</summary>
    public static bool Complementary(Phase a, Phase b)
        => ReferenceEquals(a.Clock.Root, b.Clock.Root) && a.Polarity != b.Polarity;

    private static LatchModel Build(Netlist netlist)
    {
        var latches = new List<Latch>();
        var entryLatch = new Latch?[netlist.Devices.Count];
        var isStorage = new bool[netlist.Nets.Count];
        var clocked = new List<Device>(4);
        var loopStages = new List<Device?>(4);
        var entries = new List<Device>(4);
        var feedback = new List<Device>(2);
        var windowFirsts = new List<Device>(1);

        foreach (var net in netlist.Nets)
        {
            if (!IsStorageNode(netlist, net, out var hasKeeper))
                continue;
            clocked.Clear();
            foreach (var driver in netlist.DriverList(net))
                if (driver.IsPassDevice && driver.ClockControl is not null)
                    clocked.Add(driver);
            if (clocked.Count == 0)
                continue;
            clocked.Sort((a, b) => a.Id.CompareTo(b.Id));

            loopStages.Clear();
            Phase? entryPhase = null;
            foreach (var gate in clocked)
            {
                var stage = FeedbackStageOf(netlist, gate, net);
                loopStages.Add(stage);
                if (stage is null)
                    entryPhase ??= gate.ClockControl;
            }

            entryPhase ??= clocked[0].ClockControl!;

            entries.Clear();
            feedback.Clear();
            Device? feedbackStage = null;
            for (var i = 0; i < clocked.Count; i++)
            {
                var gate = clocked[i];
                var stage = loopStages[i];
                if (stage is not null && !SameWindow(gate.ClockControl!, entryPhase))
                {
                    feedback.Add(gate);
                    feedbackStage ??= stage;
                }
                else
                {
                    entries.Add(gate);
                }
            }

            isStorage[net.Id] = true;
            var outputStage = OutputStageOf(netlist, net, entries[0]);
            // One latch per entry window (almost always exactly one), each window named by its first entry gate.
            windowFirsts.Clear();
            foreach (var gate in entries)
                if (WindowFirstOf(windowFirsts, gate) is null)
                    windowFirsts.Add(gate);

            foreach (var first in windowFirsts)
            {
                var group = EntriesInWindowOf(entries, first);
                var cell = first.Macro is { Kind: MacroKind.DynamicLatch or MacroKind.StaticLatch } macro ? macro : null;
                var name = cell?.Name ?? net.Name;
                if (windowFirsts.Count > 1)
                    name += "@" + first.ClockControl!.Name;
                var latch = new Latch(latches.Count, name, net, first.ClockControl!, group, feedback.ToArray(),
                    outputStage, feedbackStage, hasKeeper, cell);
                latches.Add(latch);
                foreach (var gate in group)
                    entryLatch[gate.Id] = latch;
            }
        }

        return new LatchModel(netlist, latches, entryLatch, isStorage);
    }

    // The first gate of the window the gate opens in, among the windows found so far, or null.
    private static Device? WindowFirstOf(List<Device> windowFirsts, Device gate)
    {
        foreach (var first in windowFirsts)
            if (SameWindow(first.ClockControl!, gate.ClockControl!))
                return first;
        return null;
    }

    // The entry gates that open in the window of 'first', in order.
    private static Device[] EntriesInWindowOf(List<Device> entries, Device first)
    {
        var count = 0;
        foreach (var gate in entries)
            if (SameWindow(first.ClockControl!, gate.ClockControl!))
                count++;
        var group = new Device[count];
        count = 0;
        foreach (var gate in entries)
            if (SameWindow(first.ClockControl!, gate.ClockControl!))
                group[count++] = gate;
        return group;
    }

    private static bool IsStorageNode(Netlist netlist, Net net, out bool hasKeeper)
    {
        hasKeeper = false;
        var drivers = netlist.DriverList(net);
        if (drivers.Length == 0 || netlist.IsInput(net))
            return false;
        var passDrivers = 0;
        foreach (var driver in drivers)
        {
            if (driver.IsPassDevice) passDrivers++;
            else if (driver.IsWeak) hasKeeper = true;
            else return false;
        }

        return passDrivers > 0;
    }

    // The static-latch loop: storage → inverter → inverter → this gate. Returns the second inverter, or null.
    private static Device? FeedbackStageOf(Netlist netlist, Device gate, Net storage)
    {
        foreach (var second in netlist.DriverList(gate.Inputs[0]))
        {
            if (second.Kind != DeviceKind.Inverter || second.IsWeak)
                continue;
            foreach (var first in netlist.DriverList(second.Inputs[0]))
                if (first.Kind == DeviceKind.Inverter && !first.IsWeak && ReferenceEquals(first.Inputs[0], storage))
                    return second;
        }

        return null;
    }

    // The restoring stage that reads the storage node: the cell's "inverter" if any, else the first strong restoring load.
    private static Device? OutputStageOf(Netlist netlist, Net storage, Device entry)
    {
        Device? first = null;
        foreach (var load in netlist.DataLoadList(storage))
        {
            if (!load.IsRestoring || load.IsWeak)
                continue;
            if (entry.Macro is not null && ReferenceEquals(load.Macro, entry.Macro) && load.Role == "inverter")
                return load;
            if (first is null || load.Id < first.Id)
                first = load;
        }

        return first;
    }

    private IReadOnlyList<Register> FindRegisters()
    {
        var registers = new List<Register>();
        // Register cells: their two latches are parts named "<reg>.master" and "<reg>.slave".
        foreach (var macro in Netlist.Macros)
        {
            if (macro.Kind is not (MacroKind.DynamicRegister or MacroKind.StaticRegister))
                continue;
            Latch? master = null, slave = null;
            foreach (var latch in Latches)
            {
                if (latch.Cell is null || !ReferenceEquals(latch.Cell.Parent, macro)) continue;
                if (latch.Cell.Name == macro.Name + ".master") master = latch;
                else if (latch.Cell.Name == macro.Name + ".slave") slave = latch;
            }

            if (master is not null && slave is not null)
                Add(new Register(macro.Name, master, slave, macro));
        }

        // Hand-built master–slave pairs: the master's output stage feeds only the slave's entry gate (and the
        // master's own feedback stage), and the slave runs on the other phase of the same clock.
        foreach (var master in Latches)
        {
            if (registerOfLatch[master.Index] is not null || master.OutputStage is not { } stage)
                continue;
            Latch? slave = null;
            var dedicated = true;
            foreach (var load in Netlist.DataLoadList(stage.Output))
            {
                if (master.FeedbackStage is { } fb && ReferenceEquals(load, fb))
                    continue;
                var entered = LatchEnteredBy(load);
                if (entered is null || entered == master || (slave is not null && entered != slave))
                {
                    dedicated = false;
                    break;
                }

                slave = entered;
            }

            if (!dedicated || slave is null || registerOfLatch[slave.Index] is not null
                || !ReferenceEquals(slave.Phase.Clock, master.Phase.Clock) || slave.Phase.Polarity == master.Phase.Polarity
                || slave.EntryGates.Count != 1 || Netlist.ControlLoadsOf(stage.Output).Count > 0)
                continue;
            Add(new Register(slave.Output.Name, master, slave, null));
        }

        return registers;

        void Add(Register register)
        {
            registers.Add(register);
            registerOfLatch[register.Master.Index] = register;
            registerOfLatch[register.Slave.Index] = register;
        }
    }

    private IReadOnlyList<LatchPath> FindPaths()
    {
        var paths = new List<LatchPath>();
        var netCount = Netlist.Nets.Count;
        var stamp = new int[netCount];
        var minDist = new double[netCount];
        var maxDist = new double[netCount];
        var dfsState = new byte[netCount]; // 0 new, 1 on the stack, 2 finished (valid while stamp matches)
        var postIndex = new int[netCount];
        var heap = new MinHeap();
        var order = new List<Net>();
        var gateMin = new Dictionary<Device, double>();
        var gateMax = new Dictionary<Device, double>();
        var gateOrder = new List<Device>();
        var stack = new Stack<(Net Net, int Next)>();
        var run = 0;

        foreach (var source in Latches)
        {
            run++;
            gateMin.Clear();
            gateMax.Clear();
            gateOrder.Clear();
            order.Clear();

            // Shortest delays: Dijkstra over the latch's cone.
            stamp[source.Storage.Id] = run;
            minDist[source.Storage.Id] = 0;
            dfsState[source.Storage.Id] = 0;
            heap.Push(source.Storage, 0);
            while (heap.TryPop(out var net, out var d))
            {
                if (d > minDist[net.Id]) continue;
                var count = EdgeCount(net);
                for (var i = 0; i < count; i++)
                {
                    if (!TryEdge(net, i, out var device, out var next))
                        continue;
                    if (next is null)
                    {
                        if (!gateMin.TryGetValue(device, out var best))
                        {
                            gateOrder.Add(device);
                            gateMin[device] = d;
                        }
                        else if (d < best)
                        {
                            gateMin[device] = d;
                        }

                        continue;
                    }

                    var nd = d + StageDelay(device).Seconds;
                    if (stamp[next.Id] != run)
                    {
                        stamp[next.Id] = run;
                        dfsState[next.Id] = 0;
                        minDist[next.Id] = nd;
                        heap.Push(next, nd);
                    }
                    else if (nd < minDist[next.Id])
                    {
                        minDist[next.Id] = nd;
                        heap.Push(next, nd);
                    }
                }
            }

            if (gateOrder.Count == 0)
                continue;

            // Longest delays: relax in reverse post-order of a depth-first search, dropping the edges that go back
            // to a net still on the search stack (they close combinational loops).
            stack.Push((source.Storage, 0));
            dfsState[source.Storage.Id] = 1;
            while (stack.Count > 0)
            {
                var (net, next) = stack.Pop();
                var count = EdgeCount(net);
                var descended = false;
                for (var i = next; i < count; i++)
                {
                    if (!TryEdge(net, i, out _, out var target) || target is null || dfsState[target.Id] != 0)
                        continue;
                    stack.Push((net, i + 1));
                    dfsState[target.Id] = 1;
                    stack.Push((target, 0));
                    descended = true;
                    break;
                }

                if (!descended)
                {
                    dfsState[net.Id] = 2;
                    postIndex[net.Id] = order.Count;
                    order.Add(net);
                }
            }

            foreach (var net in order) maxDist[net.Id] = double.NegativeInfinity;
            maxDist[source.Storage.Id] = 0;
            for (var k = order.Count - 1; k >= 0; k--)
            {
                var net = order[k];
                var d = maxDist[net.Id];
                if (double.IsNegativeInfinity(d)) continue;
                var count = EdgeCount(net);
                for (var i = 0; i < count; i++)
                {
                    if (!TryEdge(net, i, out var device, out var next))
                        continue;
                    if (next is null)
                    {
                        gateMax[device] = gateMax.TryGetValue(device, out var best) ? Math.Max(best, d) : d;
                        continue;
                    }

                    if (postIndex[next.Id] >= postIndex[net.Id])
                        continue; // back edge: a combinational loop is not followed round
                    var nd = d + StageDelay(device).Seconds;
                    if (nd > maxDist[next.Id])
                        maxDist[next.Id] = nd;
                }
            }

            foreach (var gate in gateOrder)
            {
                var min = gateMin[gate];
                var max = gateMax.TryGetValue(gate, out var m) ? Math.Max(m, min) : min;
                paths.Add(new LatchPath(source, entryLatchOfDevice[gate.Id]!, gate, new Time(min), new Time(max)));
            }
        }

        return paths;
    }

    private int EdgeCount(Net net) => Netlist.DataLoadList(net).Length + Netlist.ControlLoadList(net).Length;

    // Edge i out of a net: a stage to its output net, or (next = null) an entry gate where another latch begins.
    // False when the device carries no data onwards (keepers, clocked gates that enter no latch, side doors into storage).
    private bool TryEdge(Net net, int i, out Device device, out Net? next)
    {
        var data = Netlist.DataLoadList(net);
        device = i < data.Length ? data[i] : Netlist.ControlLoadList(net)[i - data.Length];
        next = null;
        if (device.IsWeak)
            return false;
        if (device.IsPassDevice && device.ClockControl is not null)
            return entryLatchOfDevice[device.Id] is not null && i < data.Length;
        if (isLatchStorage[device.Output.Id])
            return false;
        next = device.Output;
        return true;
    }

    private sealed class MinHeap
    {
        private readonly List<(Net Net, double Key)> items = new();

        public void Push(Net net, double key)
        {
            items.Add((net, key));
            var i = items.Count - 1;
            while (i > 0)
            {
                var parent = (i - 1) / 2;
                if (items[parent].Key <= key) break;
                items[i] = items[parent];
                i = parent;
            }

            items[i] = (net, key);
        }

        public bool TryPop(out Net net, out double key)
        {
            if (items.Count == 0)
            {
                net = null!;
                key = 0;
                return false;
            }

            (net, key) = items[0];
            var last = items[items.Count - 1];
            items.RemoveAt(items.Count - 1);
            if (items.Count > 0)
            {
                var i = 0;
                while (true)
                {
                    var child = 2 * i + 1;
                    if (child >= items.Count) break;
                    if (child + 1 < items.Count && items[child + 1].Key < items[child].Key) child++;
                    if (items[child].Key >= last.Key) break;
                    items[i] = items[child];
                    i = child;
                }

                items[i] = last;
            }

            return true;
        }
    }
}
