using System;
using System.Collections.Generic;
using Phaseward.Clocking;

namespace Phaseward.Storage;

/// <summary>
/// A stretch of time on the circle of one clock period: it starts at <see cref="Opens"/> and lasts
/// <see cref="Length"/>, wrapping past the period's end if need be. Used to combine the conduction windows of a
/// node's drivers.
/// </summary>
public readonly struct Arc
{
    /// <summary>An arc that opens at <paramref name="opens"/> and lasts <paramref name="length"/>.</summary>
    public Arc(Time opens, Time length)
    {
        Opens = opens;
        Length = length;
    }

    /// <summary>Where the arc starts in the period.</summary>
    public Time Opens { get; }

    /// <summary>How long the arc lasts.</summary>
    public Time Length { get; }

    /// <summary>The arc of a transparency window.</summary>
    public static Arc Of(PhaseWindow window) => new(window.Opens, window.Length);

    /// <inheritdoc/>
    public override string ToString() => $"[{Opens}, +{Length})";

    // Gaps shorter than this fraction of the period are rounding noise (two windows that touch exactly).
    private const double Tolerance = 1e-9;

    /// <summary>
    /// The union of <paramref name="arcs"/> on a circle of length <paramref name="period"/>, as disjoint, sorted
    /// intervals inside [0, period).
    /// </summary>
    public static List<TimeInterval> Union(IEnumerable<Arc> arcs, Time period)
    {
        CheckPeriod(period);
        var pieces = new List<(double Start, double End)>();
        foreach (var arc in arcs)
            AddPieces(arc, period.Seconds, pieces);
        var merged = new List<TimeInterval>(pieces.Count);
        Merge(pieces, period.Seconds, merged);
        return merged;
    }

    /// <summary>
    /// The longest stretch of the period that none of <paramref name="arcs"/> covers (the whole period if there
    /// are none, zero if they cover it all).
    /// </summary>
    public static Time LongestGap(IEnumerable<Arc> arcs, Time period) => LongestGapIn(Union(arcs, period), period);

    /// <summary><see cref="LongestGap(IEnumerable{Arc}, Time)"/> working in <paramref name="buffers"/>, which it overwrites
    /// (for callers that combine the arcs of many nodes).</summary>
    internal static Time LongestGap(List<Arc> arcs, Time period, ArcBuffers buffers)
    {
        CheckPeriod(period);
        var pieces = buffers.Pieces;
        pieces.Clear();
        foreach (var arc in arcs)
            AddPieces(arc, period.Seconds, pieces);
        var merged = buffers.Union;
        Merge(pieces, period.Seconds, merged);
        return LongestGapIn(merged, period);
    }

    /// <summary>True if every instant of <paramref name="arc"/> lies inside one of <paramref name="cover"/>.</summary>
    public static bool IsCovered(Arc arc, IEnumerable<Arc> cover, Time period)
    {
        var union = Union(cover, period);
        var t = period.Seconds;
        var eps = t * Tolerance;
        foreach (var piece in Union(new[] { arc }, period))
        {
            var inside = false;
            foreach (var interval in union)
                if (interval.Start.Seconds <= piece.Start.Seconds + eps && interval.End.Seconds >= piece.End.Seconds - eps)
                {
                    inside = true;
                    break;
                }

            if (!inside) return false;
        }

        return true;
    }

    private static void CheckPeriod(Time period)
    {
        if (!(period.Seconds > 0)) throw new ArgumentException($"'{nameof(period)}' must be positive (was {period}).", nameof(period));
    }

    // The arc as one or two pieces inside [0, t) (two when it wraps), or none when it is empty.
    private static void AddPieces(Arc arc, double t, List<(double Start, double End)> pieces)
    {
        var eps = t * Tolerance;
        if (arc.Length.Seconds <= 0) return;
        if (arc.Length.Seconds >= t - eps)
        {
            pieces.Add((0, t));
            return;
        }

        var start = arc.Opens.Seconds % t;
        if (start < 0) start += t;
        var end = start + arc.Length.Seconds;
        if (end <= t)
        {
            pieces.Add((start, end));
        }
        else
        {
            pieces.Add((start, t));
            pieces.Add((0, end - t));
        }
    }

    // Sorts the pieces and merges those that overlap or touch into 'merged' (cleared first).
    private static void Merge(List<(double Start, double End)> pieces, double t, List<TimeInterval> merged)
    {
        var eps = t * Tolerance;
        pieces.Sort((a, b) => a.Start.CompareTo(b.Start));
        merged.Clear();
        double curStart = 0, curEnd = 0;
        var open = false;
        foreach (var (start, end) in pieces)
        {
            if (open && start <= curEnd + eps)
            {
                curEnd = Math.Max(curEnd, end);
                continue;
            }

            if (open) merged.Add(new TimeInterval(new Time(curStart), new Time(curEnd)));
            curStart = start;
            curEnd = end;
            open = true;
        }

        if (open) merged.Add(new TimeInterval(new Time(curStart), new Time(Math.Min(curEnd, t))));
    }

    private static Time LongestGapIn(List<TimeInterval> union, Time period)
    {
        var t = period.Seconds;
        if (union.Count == 0) return period;
        var eps = t * Tolerance;
        var longest = 0.0;
        for (var i = 1; i < union.Count; i++)
            longest = Math.Max(longest, union[i].Start.Seconds - union[i - 1].End.Seconds);
        // The gap that wraps from the last interval's end round to the first one's start.
        longest = Math.Max(longest, union[0].Start.Seconds + t - union[union.Count - 1].End.Seconds);
        return longest <= eps ? Time.Zero : new Time(longest);
    }
}
