using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Linq;
using System.Threading;

namespace Phaseward.Benchmarks;

/// <summary>The peak of the managed heap while an operation runs, sampled every millisecond, above a collected baseline.</summary>
internal sealed class PeakMemory : IDisposable
{
    private readonly long baseline;
    private readonly Thread sampler;
    private volatile bool stop;
    private long peak;

    private PeakMemory()
    {
        GcCounts.Settle();
        baseline = GC.GetTotalMemory(forceFullCollection: true);
        peak = baseline;
        sampler = new Thread(Sample) { IsBackground = true, Name = "peak-memory", Priority = ThreadPriority.AboveNormal };
        sampler.Start();
    }

    /// <summary>Bytes above the baseline at the peak (valid after Dispose).</summary>
    public long PeakBytes { get; private set; }

    public static PeakMemory Start() => new();

    public void Dispose()
    {
        stop = true;
        sampler.Join();
        Observe();
        PeakBytes = Math.Max(0, peak - baseline);
    }

    private void Sample()
    {
        while (!stop)
        {
            Observe();
            Thread.Sleep(1);
        }
    }

    private void Observe()
    {
        var now = GC.GetTotalMemory(forceFullCollection: false);
        if (now > Interlocked.Read(ref peak))
            Interlocked.Exchange(ref peak, now);
    }
}

/// <summary>Samples of one figure over the runs of a case.</summary>
internal sealed class Samples
{
    private readonly List<double> values = new();

    public void Add(double value) => values.Add(value);

    public int Count => values.Count;

    public double Median
    {
        get
        {
            if (values.Count == 0)
                return double.NaN;
            var sorted = values.OrderBy(v => v).ToList();
            var mid = sorted.Count / 2;
            return sorted.Count % 2 == 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
        }
    }

    public double Min => values.Count == 0 ? double.NaN : values.Min();

    public double Max => values.Count == 0 ? double.NaN : values.Max();

    /// <summary>(max - min) / median: how noisy the runs were.</summary>
    public double Spread => values.Count < 2 ? 0 : (Max - Min) / Median;

    /// <summary>
    /// True: times are the process's CPU time (user + system, all threads); false: wall-clock time. CPU time is the
    /// default because the benchmark machine is shared: wall time also counts the time spent waiting for a core. The
    /// measured work runs on one thread (analysis is not concurrent); the memory sampler adds a little.
    /// </summary>
    public static bool CpuTime { get; set; } = true;

    public static double Now()
        => CpuTime ? System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime.TotalMilliseconds : Stopwatch.GetTimestamp() * 1000.0 / Stopwatch.Frequency;

    public static double Time(Action action)
    {
        var start = Now();
        action();
        return Now() - start;
    }
}
