using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Rules.Timing;

/// <summary>
/// PW4003 and PW4005: latch paths with time borrowing. Each latch L may borrow up to
/// B_L = T_L − t_skew − t_setup(L) (<see cref="LatchTiming.BorrowLimit"/>, T_L its phase's nominal length). Times are
/// taken from the opening of each latch's window: data reaches L's storage node at t_entry(L) + b_L, where b_L ≥ 0 is
/// the time L borrowed. Over a path A→B between latches whose windows are not transparent together, with B's next
/// window opening g after A's (the shortest over the common cycle), data arrives at B at
/// a = t_entry(A) + b_A + t_path,max − g (t_path includes A's output stage); B then borrows b_B = max(0, a). The path
/// fails (PW4003) when the slack B_B − a is below <see cref="RulePolicy.MinimumTimingSlack"/>. A loop of latches whose
/// delays Σ(t_entry + t_path,max) exceed the time its phases give it, Σ g, gains borrowing every cycle and has no
/// steady state (PW4005), whatever each latch's window (Sakallah, Mudge &amp; Olukotun, 1990, the steady-state
/// latch-loop constraint; from memory). Every delay is taken at the slow corner (<see cref="Process.SlowDelayFactor"/>),
/// the messages say so.
/// </summary>
/// <remarks>
/// Borrowing is carried forward to its fixed point (<see cref="LatchBorrowing"/>). Latches fed only from primary
/// inputs borrow nothing (their inputs are taken to be ready when they open). Register-internal paths and
/// register-to-register paths are propagated but not reported here (PW1002 and PW4001/PW4002 cover them).
/// </remarks>
public sealed class LatchBorrowingRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.LatchBorrowing, RuleCatalog.LatchLoop };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var figures = TimingFigures.For(context.LatchModel, Corner.Slow);
        var result = LatchBorrowing.Solve(figures, context.CancellationToken);
        var onLoop = new HashSet<LatchPath>();
        foreach (var loop in result.DivergentLoops)
        {
            onLoop.UnionWith(loop.Paths);
            var first = loop.Paths[0];
            var related = new List<SourceSpan>();
            for (var i = 1; i < loop.Paths.Count; i++)
                related.Add(loop.Paths[i].EntryGate.Span);
            yield return new Finding(RuleCatalog.LatchLoop, first.EntryGate.Span,
                new object[] { loop.Describe(), loop.Paths.Count, loop.TotalDelay, loop.TimeAllowed, loop.Growth, figures.CornerText },
                related,
                new Dictionary<string, string>
                {
                    [FindingPropertyKeys.TargetLatch] = first.To.Name,
                    [FindingPropertyKeys.SourceLatch] = first.From.Name,
                    [FindingPropertyKeys.MarginSeconds] = (-loop.Growth).Seconds.ToString("R", CultureInfo.InvariantCulture),
                });
        }

        foreach (var arrival in result.Arrivals)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            // A path round a loop that gains time fails because of the loop: one finding per cause (PW4005).
            if (arrival.Slack >= context.Policy.MinimumTimingSlack || onLoop.Contains(arrival.Path))
                continue;
            var a = arrival.Path.From;
            var b = arrival.Path.To;
            var timingB = figures.Of(b);
            yield return new Finding(RuleCatalog.LatchBorrowing, arrival.Path.EntryGate.Span,
                new object[]
                {
                    b.Name, a.Name, arrival.Arrival, timingB.Window.NominalLength, timingB.Setup + timingB.Latch.Phase.Clock.ComplementSkew,
                    timingB.BorrowLimit, arrival.Slack, arrival.SourceBorrow, figures.CornerText,
                },
                new[] { a.Span },
                new Dictionary<string, string>
                {
                    [FindingPropertyKeys.TargetLatch] = b.Name,
                    [FindingPropertyKeys.SourceLatch] = a.Name,
                    [FindingPropertyKeys.Phase] = b.Phase.Name,
                    [FindingPropertyKeys.MarginSeconds] = arrival.Slack.Seconds.ToString("R", CultureInfo.InvariantCulture),
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

    /// <summary>Borrow limit − arrival.</summary>
    public Time Slack { get; }

    /// <summary>What the launching latch had borrowed.</summary>
    public Time SourceBorrow { get; }

    /// <summary>What the capturing latch borrows (max(0, arrival), capped at its borrow limit).</summary>
    public Time Borrow { get; }
}

