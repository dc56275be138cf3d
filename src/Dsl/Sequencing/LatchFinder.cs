using System.Collections.Generic;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// Finds the latches of a netlist on its storage nodes (see <see cref="StorageNodeShape"/> for what a storage node,
/// a feedback gate and an output stage are).
/// </summary>
/// <remarks>
/// Each clock-phase-controlled pass gate driving a storage node is either a <i>feedback gate</i> (it closes the
/// static-latch loop and conducts in a window other than the latch's entry window) or an <i>entry gate</i>. The entry
/// window is the window of the first (in order of creation) clocked driver that is not such a loop, else of the first
/// clocked driver. Entry gates of one window make one latch; a storage node with entry gates in two windows holds two
/// latches. Pass gates controlled by data nets never make a latch.
/// </remarks>
internal static class LatchFinder
{
    /// <summary>The latches, the latch each entry gate enters (by device ID) and which nets are latch storage nodes.</summary>
    internal readonly struct Result
    {
        public Result(List<Latch> latches, Latch?[] entryLatchOfDevice, bool[] isLatchStorage)
        {
            Latches = latches;
            EntryLatchOfDevice = entryLatchOfDevice;
            IsLatchStorage = isLatchStorage;
        }

        public List<Latch> Latches { get; }

        public Latch?[] EntryLatchOfDevice { get; }

        public bool[] IsLatchStorage { get; }
    }

    public static Result Find(Netlist netlist)
    {
        var latches = new List<Latch>();
        var entryLatch = new Latch?[netlist.Devices.Count];
        var isStorage = new bool[netlist.Nets.Count];
        var clocked = new List<Device>(4);
        var loopStages = new List<Device?>(4);
        var entries = new List<Device>(4);
        var feedback = new List<Device>(2);
        var windowFirsts = new List<Device>(1);
        var sameWindow = new SameWindowPairs();

        foreach (var net in netlist.Nets)
        {
            if (!StorageNodeShape.IsStorageNode(netlist, net, out var hasKeeper))
                continue;
            clocked.Clear();
            foreach (var driver in netlist.DriverList(net))
                if (driver.IsPassDevice && driver.ClockControl is not null)
                    clocked.Add(driver);
            if (clocked.Count == 0)
                continue;
            clocked.Sort((a, b) => a.Id.CompareTo(b.Id));

            var feedbackStage = SplitEntryAndFeedback(netlist, net, clocked, loopStages, entries, feedback, sameWindow);
            isStorage[net.Id] = true;
            var outputStage = StorageNodeShape.OutputStageOf(netlist, net, entries[0]);

            // One latch per entry window (almost always exactly one), each window named by its first entry gate.
            windowFirsts.Clear();
            foreach (var gate in entries)
                if (WindowFirstOf(windowFirsts, gate, sameWindow) is null)
                    windowFirsts.Add(gate);

            foreach (var first in windowFirsts)
            {
                var group = EntriesInWindowOf(entries, first, sameWindow);
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

        return new Result(latches, entryLatch, isStorage);
    }

    // Sorts the clocked drivers of a storage node into entry and feedback gates; returns the first feedback stage.
    private static Device? SplitEntryAndFeedback(Netlist netlist, Net storage, List<Device> clocked, List<Device?> loopStages,
        List<Device> entries, List<Device> feedback, SameWindowPairs sameWindow)
    {
        loopStages.Clear();
        Phase? entryPhase = null;
        foreach (var gate in clocked)
        {
            var stage = StorageNodeShape.FeedbackStageOf(netlist, gate, storage);
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
            if (stage is not null && !sameWindow.Of(gate.ClockControl!, entryPhase))
            {
                feedback.Add(gate);
                feedbackStage ??= stage;
            }
            else
            {
                entries.Add(gate);
            }
        }

        return feedbackStage;
    }

    // Two phases open in the same window: transparent together for longer than the overlap allowance (a gated or
    // slightly delayed copy of a phase counts). Decided once per pair of phases: a design has few phases and many
    // latches, and each decision builds both windows.
    private sealed class SameWindowPairs
    {
        private readonly Dictionary<(Phase, Phase), bool> decided = new();

        public bool Of(Phase a, Phase b)
        {
            if (ReferenceEquals(a, b)) return true;
            if (!decided.TryGetValue((a, b), out var same))
                decided[(a, b)] = same = WindowRelations.Of(a, b) == WindowRelation.TransparentTogether;
            return same;
        }
    }

    // The first gate of the window the gate opens in, among the windows found so far, or null.
    private static Device? WindowFirstOf(List<Device> windowFirsts, Device gate, SameWindowPairs sameWindow)
    {
        foreach (var first in windowFirsts)
            if (sameWindow.Of(first.ClockControl!, gate.ClockControl!))
                return first;
        return null;
    }

    // The entry gates that open in the window of 'first', in order.
    private static Device[] EntriesInWindowOf(List<Device> entries, Device first, SameWindowPairs sameWindow)
    {
        var count = 0;
        foreach (var gate in entries)
            if (sameWindow.Of(first.ClockControl!, gate.ClockControl!))
                count++;
        var group = new Device[count];
        count = 0;
        foreach (var gate in entries)
            if (sameWindow.Of(first.ClockControl!, gate.ClockControl!))
                group[count++] = gate;
        return group;
    }
}
