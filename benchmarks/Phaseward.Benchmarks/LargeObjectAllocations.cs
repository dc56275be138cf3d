using System;
using System.Collections.Generic;
using System.Diagnostics.Tracing;
using System.Threading;

namespace Phaseward.Benchmarks;

/// <summary>
/// Bytes allocated on the large-object heap (arrays of 85,000 bytes and more) from the runtime's sampled allocation
/// events, each credited to the phase that was running when it was made. Large allocations are what start the
/// runtime's full collections, so this says which phase's arrays to shrink or reuse.
/// </summary>
/// <remarks>
/// The runtime raises one event per about 100 KB allocated of a kind, and delivers it to this listener later, on
/// another thread: an event is credited by its time stamp, not by when it arrives. Sampling makes each figure exact
/// to about 100 KB per event.
/// </remarks>
internal sealed class LargeObjectAllocations : EventListener
{
    private const string RuntimeSource = "Microsoft-Windows-DotNETRuntime";
    private const EventKeywords GcKeyword = (EventKeywords)0x1;
    private const int AllocationTickEvent = 10;
    private const uint LargeObjectKind = 1;

    private readonly object gate = new();
    private readonly List<(DateTime At, long Bytes, string Type)> samples = new();

    protected override void OnEventSourceCreated(EventSource source)
    {
        if (source.Name == RuntimeSource)
            EnableEvents(source, EventLevel.Verbose, GcKeyword);
    }

    protected override void OnEventWritten(EventWrittenEventArgs e)
    {
        if (e.EventId != AllocationTickEvent || e.Payload is null || e.PayloadNames is null) return;
        var kind = e.PayloadNames.IndexOf("AllocationKind");
        var amount = e.PayloadNames.IndexOf("AllocationAmount64");
        var type = e.PayloadNames.IndexOf("TypeName");
        if (kind < 0 || amount < 0 || Convert.ToUInt32(e.Payload[kind]) != LargeObjectKind) return;
        lock (gate)
            samples.Add((e.TimeStamp.ToUniversalTime(), Convert.ToInt64(e.Payload[amount]), type < 0 ? "?" : Convert.ToString(e.Payload[type]) ?? "?"));
    }

    /// <summary>Gives events still on their way time to arrive (call once, before reading a finished phase).</summary>
    public static void AwaitLateEvents() => Thread.Sleep(TimeSpan.FromSeconds(1));

    /// <summary>Large-object bytes sampled between two instants (UTC).</summary>
    public double MegabytesBetween(DateTime from, DateTime to)
    {
        long bytes = 0;
        lock (gate)
        {
            foreach (var (at, amount, _) in samples)
                if (at >= from && at < to)
                    bytes += amount;
        }

        return bytes / 1e6;
    }

    /// <summary>The types that took most of the large-object bytes between two instants, largest first.</summary>
    public string TopTypesBetween(DateTime from, DateTime to, int count)
    {
        var byType = new Dictionary<string, long>(StringComparer.Ordinal);
        lock (gate)
        {
            foreach (var (at, amount, type) in samples)
                if (at >= from && at < to)
                    byType[type] = (byType.TryGetValue(type, out var sum) ? sum : 0) + amount;
        }

        var top = new List<KeyValuePair<string, long>>(byType);
        top.Sort((a, b) => b.Value.CompareTo(a.Value));
        var text = new System.Text.StringBuilder();
        for (var i = 0; i < top.Count && i < count; i++)
            text.Append(i == 0 ? "" : ", ").Append(top[i].Key).Append(' ').Append((top[i].Value / 1e6).ToString("N1", System.Globalization.CultureInfo.InvariantCulture));
        return text.ToString();
    }
}
