using System;

namespace Phaseward.Benchmarks;

/// <summary>
/// Garbage collections by generation and the total time the runtime was paused for them: subtract two readings to
/// see how much of a phase went to collecting rather than computing.
/// </summary>
internal readonly struct GcCounts
{
    private GcCounts(int gen0, int gen1, int gen2, TimeSpan paused)
    {
        Gen0 = gen0;
        Gen1 = gen1;
        Gen2 = gen2;
        Paused = paused;
    }

    public int Gen0 { get; }

    public int Gen1 { get; }

    public int Gen2 { get; }

    public TimeSpan Paused { get; }

    /// <summary>
    /// Collects everything collectable, outside any measured time: a measurement that starts after this pays for
    /// its own garbage, not for the previous measurement's.
    /// </summary>
    public static void Settle()
    {
        GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
        GC.WaitForPendingFinalizers();
        GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
    }

    public static GcCounts Now()
        => new(GC.CollectionCount(0), GC.CollectionCount(1), GC.CollectionCount(2), GC.GetTotalPauseDuration());

    public static GcCounts operator -(GcCounts after, GcCounts before)
        => new(after.Gen0 - before.Gen0, after.Gen1 - before.Gen1, after.Gen2 - before.Gen2, after.Paused - before.Paused);

    /// <summary>Counts include the collections of older generations (a gen-2 collection also collects 0 and 1).</summary>
    public override string ToString()
        => $"GC paused {Paused.TotalMilliseconds:N0} ms (collections gen0 {Gen0}, gen1 {Gen1}, gen2 {Gen2})";
}
