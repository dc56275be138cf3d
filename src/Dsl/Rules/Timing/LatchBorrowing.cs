using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Clocking;
using Phaseward.Sequencing;

namespace Phaseward.Rules.Timing;

/// <summary>The steady state of time borrowing behind PW4003 and PW4005 (see <see cref="LatchBorrowingRule"/>).</summary>
public sealed class BorrowingSolution
{
    internal BorrowingSolution(IReadOnlyList<LatchArrival> arrivals, IReadOnlyList<LatchLoop> divergentLoops)
    {
        Arrivals = arrivals;
        DivergentLoops = divergentLoops;
    }

    /// <summary>For every latch reached by a reportable path, its latest arrival in the steady state (in latch order).</summary>
    public IReadOnlyList<LatchArrival> Arrivals { get; }

    /// <summary>Latch loops whose delays exceed the time their phases give them: borrowing grows every cycle.</summary>
    public IReadOnlyList<LatchLoop> DivergentLoops { get; }
}

/// <summary>A loop of latch paths (each path's target is the next one's source).</summary>
public sealed class LatchLoop
{
    internal LatchLoop(IReadOnlyList<LatchPath> paths, Time totalDelay, Time timeAllowed)
    {
        Paths = paths;
        TotalDelay = totalDelay;
        TimeAllowed = timeAllowed;
    }

    /// <summary>The paths round the loop, starting at the path into its first latch (in latch order).</summary>
    public IReadOnlyList<LatchPath> Paths { get; }

    /// <summary>Σ (entry gate + slowest path) round the loop.</summary>
    public Time TotalDelay { get; }

    /// <summary>Σ of the times from each latch's opening to the next latch's opening round the loop.</summary>
    public Time TimeAllowed { get; }

    /// <summary>How much more every latch of the loop borrows each time round: TotalDelay − TimeAllowed.</summary>
    public Time Growth => TotalDelay - TimeAllowed;

    /// <summary>"A → B → A".</summary>
    public string Describe()
    {
        var names = new List<string>(Paths.Count + 1);
        foreach (var path in Paths)
            names.Add(path.From.Name);
        names.Add(Paths[0].From.Name);
        return string.Join(" → ", names);
    }
}

/// <summary>
/// Carries borrowing along the latch graph to its fixed point: the latest arrival at each latch is relaxed over every
/// path until nothing changes (at most one pass per latch when no loop gains time, as in a longest-path search), and a
/// loop that still gains after that many passes is a divergent loop, found by walking the latest arrivals back.
/// </summary>
public static class LatchBorrowing
{
    /// <summary>The steady state of borrowing over the design's latch paths, at the corner of <paramref name="figures"/> (the rules use the slow corner).</summary>
    public static BorrowingSolution Solve(TimingFigures figures, CancellationToken cancellationToken = default)
    {
        if (figures is null) throw new ArgumentNullException(nameof(figures));
        var model = figures.Model;
        var edges = Edges(model);
        var count = model.Latches.Count;
        var borrow = new double[count];
        var arrivalBy = new LatchPath?[count];
        // First without the limits: a loop that gains time round it still gains after one pass per latch.
        var changed = Relax(figures, edges, borrow, arrivalBy, count + 1, capped: false, cancellationToken);
        var loops = changed.Count == 0 ? new List<LatchLoop>() : DivergentLoops(model, figures, edges, changed, arrivalBy);

        // Then the steady state within the limits; a gaining loop borrows up to every latch's limit.
        Array.Clear(borrow, 0, count);
        foreach (var loop in loops)
            foreach (var path in loop.Paths)
                borrow[path.To.Index] = Math.Max(0, figures.Of(path.To).BorrowLimit.Seconds);
        Relax(figures, edges, borrow, arrivalBy, count + 1, capped: true, cancellationToken);

        return new BorrowingSolution(Arrivals(model, figures, edges, borrow), loops);
    }

    /// <summary>For every latch reached by a reportable path, its latest arrival (in latch order).</summary>
    public static IReadOnlyList<LatchArrival> Compute(TimingFigures figures) => Solve(figures).Arrivals;

    // Relaxes every path in turn until nothing changes or the passes run out; returns the latches changed in the last pass.
    private static List<int> Relax(TimingFigures figures, List<Edge> edges, double[] borrow, LatchPath?[] arrivalBy, int maxPasses,
        bool capped, CancellationToken cancellationToken)
    {
        var changed = new List<int>();
        for (var pass = 0; pass < maxPasses; pass++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            changed.Clear();
            foreach (var edge in edges)
            {
                var from = edge.Path.From;
                var to = edge.Path.To;
                var arrival = figures.Of(from).EntryDelay.Seconds + borrow[from.Index] + figures.AtCorner(edge.Path.MaxDelay).Seconds - edge.Gap.Seconds;
                var next = Math.Max(0, arrival);
                if (capped)
                    next = Math.Min(Math.Max(0, figures.Of(to).BorrowLimit.Seconds), next);
                if (next > borrow[to.Index] + Epsilon)
                {
                    borrow[to.Index] = next;
                    arrivalBy[to.Index] = edge.Path;
                    changed.Add(to.Index);
                }
            }

            if (changed.Count == 0)
                break;
        }

        return changed;
    }

    // Borrow increments below a femtosecond are rounding noise.
    private const double Epsilon = 1e-15;

    private readonly struct Edge
    {
        public Edge(LatchPath path, Time gap)
        {
            Path = path;
            Gap = gap;
        }

        public LatchPath Path { get; }

        public Time Gap { get; }
    }

    // The paths borrowing flows along: between latches of related clocks whose windows are not transparent together.
    private static List<Edge> Edges(LatchModel model)
    {
        var edges = new List<Edge>();
        foreach (var path in model.Paths)
        {
            var from = path.From.Phase;
            var to = path.EntryGate.ClockControl!;
            var relation = model.Relation(from, to);
            if (relation is WindowRelation.Unrelated or WindowRelation.TransparentTogether)
                continue;
            edges.Add(new Edge(path, model.WindowOf(from).TimeToNextOpeningOf(model.WindowOf(to))!.Value));
        }

        return edges;
    }

    private static List<LatchArrival> Arrivals(LatchModel model, TimingFigures figures, List<Edge> edges, double[] borrow)
    {
        var worst = new LatchArrival?[model.Latches.Count];
        foreach (var edge in edges)
        {
            var a = edge.Path.From;
            var b = edge.Path.To;
            if (!IsReportable(model, a, b))
                continue;
            var arrival = figures.Of(a).EntryDelay + new Time(borrow[a.Index]) + figures.AtCorner(edge.Path.MaxDelay) - edge.Gap;
            var limit = figures.Of(b).BorrowLimit;
            if (worst[b.Index] is null || arrival > worst[b.Index]!.Arrival)
                worst[b.Index] = new LatchArrival(edge.Path, arrival, limit - arrival, new Time(borrow[a.Index]), new Time(borrow[b.Index]));
        }

        var result = new List<LatchArrival>();
        foreach (var arrival in worst)
            if (arrival is not null) result.Add(arrival);
        return result;
    }

    // Each latch still gaining borrow after |latches| passes lies downstream of a loop that gains time: walking the
    // latest arrivals back |latches| steps lands on that loop.
    private static List<LatchLoop> DivergentLoops(LatchModel model, TimingFigures figures, List<Edge> edges, List<int> changed,
        LatchPath?[] arrivalBy)
    {
        var gapOf = new Dictionary<LatchPath, Time>();
        foreach (var edge in edges)
            gapOf[edge.Path] = edge.Gap;
        var loops = new List<LatchLoop>();
        var onReportedLoop = new bool[model.Latches.Count];
        foreach (var start in changed)
        {
            var latch = start;
            for (var i = 0; i < model.Latches.Count && arrivalBy[latch] is { } back; i++)
                latch = back.From.Index;
            if (onReportedLoop[latch] || arrivalBy[latch] is null)
                continue;

            var paths = new List<LatchPath>();
            var cursor = latch;
            do
            {
                var path = arrivalBy[cursor]!;
                paths.Add(path);
                cursor = path.From.Index;
            }
            while (cursor != latch && paths.Count <= model.Latches.Count);
            if (cursor != latch)
                continue;
            paths.Reverse();
            var first = 0;
            for (var i = 1; i < paths.Count; i++)
                if (paths[i].From.Index < paths[first].From.Index) first = i;
            var ordered = new List<LatchPath>(paths.Count);
            var delay = Time.Zero;
            var allowed = Time.Zero;
            for (var i = 0; i < paths.Count; i++)
            {
                var path = paths[(first + i) % paths.Count];
                ordered.Add(path);
                onReportedLoop[path.To.Index] = true;
                delay += figures.Of(path.From).EntryDelay + figures.AtCorner(path.MaxDelay);
                allowed += gapOf[path];
            }

            if (delay > allowed)
                loops.Add(new LatchLoop(ordered, delay, allowed));
        }

        return loops;
    }

    private static bool IsReportable(LatchModel model, Latch a, Latch b)
        => !model.IsRegisterToRegister(a, b)
           && !(model.RegisterOf(a) is { } register && ReferenceEquals(register, model.RegisterOf(b)));
}
