using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Rules.Timing;

/// <summary>
/// PW4003: two-phase latch paths with time borrowing. Each latch L has a window of length W_L (its phase's window,
/// the complement's lateness included) and a setup time. Times are taken from the opening of each latch's window:
/// data reaches L's storage node at t_entry(L) + b_L, where b_L ≥ 0 is the time L borrowed (its input arrived b_L
/// after it opened). Over a path A→B to a latch on the complementary phase of the same root clock, with B opening
/// g later than A, data arrives at B at a = t_entry(A) + b_A + t_path,max − g (from B's opening; t_path includes A's
/// output stage); B then borrows b_B = max(0, a). The path fails when a &gt; W_B − t_setup(B), i.e. when the slack
/// W_B − t_setup(B) − a is below <see cref="RulePolicy.MinimumTimingSlack"/>.
/// </summary>
/// <remarks>
/// Borrowing is carried forward along latch chains in a topological order of the latch graph, in two passes (so a
/// loop of latches is followed round once); latches fed only from primary inputs borrow nothing (their inputs are
/// taken to be ready when they open). Register-internal paths and register-to-register paths are propagated but not
/// reported here (PW1002 and PW4001/PW4002 cover them).
/// </remarks>
public sealed class LatchBorrowingRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.LatchBorrowing };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var figures = TimingFigures.For(context.Netlist);
        var result = LatchBorrowing.Compute(figures);
        foreach (var arrival in result)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            if (arrival.Slack >= context.Policy.MinimumTimingSlack)
                continue;
            var a = arrival.Path.From;
            var b = arrival.Path.To;
            var timingB = figures.Of(b);
            yield return new Finding(RuleCatalog.LatchBorrowing, arrival.Path.EntryGate.Span,
                new object[]
                {
                    b.Name, a.Name, arrival.Arrival, timingB.Window.Length, timingB.Setup, timingB.Window.Length - timingB.Setup,
                    arrival.Slack, arrival.SourceBorrow,
                },
                new[] { a.Span },
                new Dictionary<string, string>
                {
                    [FindingProperties.TargetLatch] = b.Name,
                    [FindingProperties.SourceLatch] = a.Name,
                    [FindingProperties.Phase] = b.Phase.Name,
                    [FindingProperties.MarginSeconds] = arrival.Slack.Seconds.ToString("R", CultureInfo.InvariantCulture),
                });
        }
    }
}

/// <summary>The latest arrival at a latch over its reportable two-phase paths (see <see cref="LatchBorrowingRule"/>).</summary>
public sealed class LatchArrival
{
    internal LatchArrival(LatchPath path, Time arrival, Time slack, Time sourceBorrow, Time borrow)
    {
        Path = path;
        Arrival = arrival;
        Slack = slack;
        SourceBorrow = sourceBorrow;
        Borrow = borrow;
    }

    /// <summary>The path that brings the latest data.</summary>
    public LatchPath Path { get; }

    /// <summary>When the data arrives, after the capturing latch opens (negative: before it opens).</summary>
    public Time Arrival { get; }

    /// <summary>Window length − setup − arrival.</summary>
    public Time Slack { get; }

    /// <summary>What the launching latch had borrowed.</summary>
    public Time SourceBorrow { get; }

    /// <summary>What the capturing latch borrows (max(0, arrival), capped at its window less its setup).</summary>
    public Time Borrow { get; }
}

/// <summary>The borrowing propagation behind PW4003.</summary>
public static class LatchBorrowing
{
    /// <summary>For every latch reached by a reportable two-phase path, its latest arrival (in latch order).</summary>
    public static IReadOnlyList<LatchArrival> Compute(TimingFigures figures)
    {
        var model = figures.Model;
        var latches = model.Latches;
        var outgoing = new List<LatchPath>?[latches.Count];
        var indegree = new int[latches.Count];
        foreach (var path in model.Paths)
        {
            if (!LatchModel.Complementary(path.From.Phase, path.EntryGate.ClockControl!))
                continue;
            (outgoing[path.From.Index] ??= new List<LatchPath>()).Add(path);
            if (path.From != path.To) indegree[path.To.Index]++;
        }

        // Kahn's order; latches left on loops follow in index order.
        var order = new List<Latch>(latches.Count);
        var placed = new bool[latches.Count];
        var queue = new Queue<Latch>();
        foreach (var latch in latches)
            if (indegree[latch.Index] == 0) queue.Enqueue(latch);
        while (true)
        {
            while (queue.Count > 0)
            {
                var latch = queue.Dequeue();
                if (placed[latch.Index]) continue;
                placed[latch.Index] = true;
                order.Add(latch);
                if (outgoing[latch.Index] is not { } paths)
                    continue;
                foreach (var path in paths)
                    if (path.From != path.To && --indegree[path.To.Index] == 0)
                        queue.Enqueue(path.To);
            }

            var next = latches.Count == order.Count ? null : FirstUnplaced(latches, placed);
            if (next is null) break;
            queue.Enqueue(next);
        }

        var borrow = new Time[latches.Count];
        var worst = new LatchArrival?[latches.Count];
        for (var pass = 0; pass < 2; pass++)
        {
            foreach (var a in order)
            {
                if (outgoing[a.Index] is not { } paths)
                    continue;
                foreach (var path in paths)
                {
                    var b = path.To;
                    var timingA = figures.Of(a);
                    var timingB = figures.Of(b);
                    var gap = Gap(timingA.Window, timingB.Window);
                    var arrival = timingA.EntryDelay + borrow[a.Index] + path.MaxDelay - gap;
                    var cap = timingB.Window.Length - timingB.Setup;
                    var newBorrow = Time.Min(cap, Time.Max(Time.Zero, arrival));
                    if (newBorrow > borrow[b.Index]) borrow[b.Index] = newBorrow;
                    if (IsReportable(model, a, b) && (worst[b.Index] is null || arrival > worst[b.Index]!.Arrival))
                        worst[b.Index] = new LatchArrival(path, arrival, cap - arrival, borrow[a.Index], newBorrow);
                }
            }
        }

        var result = new List<LatchArrival>();
        foreach (var arrival in worst)
            if (arrival is not null) result.Add(arrival);
        return result;
    }

    private static bool IsReportable(LatchModel model, Latch a, Latch b)
        => !OverlapRaceRule.IsRegisterToRegister(model, a, b)
           && !(model.RegisterOf(a) is { } register && ReferenceEquals(register, model.RegisterOf(b)));

    // How much later B's next window opens than A's (a full period if they open together).
    private static Time Gap(PhaseWindow a, PhaseWindow b)
    {
        var t = a.Period.Seconds;
        var gap = (b.Opens.Seconds - a.Opens.Seconds) % t;
        if (gap < 0) gap += t;
        return new Time(gap <= 0 ? t : gap);
    }

    private static Latch? FirstUnplaced(IReadOnlyList<Latch> latches, bool[] placed)
    {
        foreach (var latch in latches)
            if (!placed[latch.Index]) return latch;
        return null;
    }
}
