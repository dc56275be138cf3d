using System;
using System.Collections.Generic;
using System.Globalization;
using System.Threading;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// PW1002: latch A feeds latch B and B is still transparent when A opens (a short overlap of their windows on the
/// design's time base: the 1-1 or 0-0 overlap of one clock and its late complement, or a partial overlap of shifted
/// or different clocks). The fastest data entering A when A opens must not reach B's storage node before B closes
/// (<see cref="RaceModel"/>, the model PW4002 shares): margin = t(A's entry gate) + t_min(path, A's output stage
/// included) + t(B's entry gate) − overlap, the overlap being how long B still conducts after A opens. Reported at B
/// when the margin is below <see cref="RulePolicy.MinimumRaceMargin"/>. Delays at the fast corner. For a register's master and slave this is the
/// condition t(TG1) + t(I1) + t(TG2) &gt; 0-0 overlap (rising-edge register). A path from one register's slave to a
/// register's master is the capturing register's hold check (PW4002) and is left to it; windows transparent together
/// for longer than the overlap allowance are PW1001's.
/// </summary>
public sealed class OverlapRaceRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.OverlapRace };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var model = context.LatchModel;
        foreach (var race in OverlapRaces.For(model, context.CancellationToken))
        {
            var (path, fastest, overlap, margin) = (race.Path, race.Fastest, race.Overlap, race.Margin);
            var required = context.Policy.MinimumRaceMargin;
            if (margin >= required)
                continue;
            var a = path.From;
            var b = path.To;
            var register = model.RegisterOf(b);
            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.TargetLatch] = b.Name,
                [FindingPropertyKeys.SourceLatch] = a.Name,
                [FindingPropertyKeys.Phase] = path.EntryGate.ClockControl!.Name,
                [FindingPropertyKeys.IsRegisterStage] = register is null ? "false" : "true",
                [FindingPropertyKeys.MarginSeconds] = margin.Seconds.ToString("R", CultureInfo.InvariantCulture),
            };
            if (register is not null)
                properties[FindingPropertyKeys.Register] = register.Name;
            yield return new Finding(RuleCatalog.OverlapRace, path.EntryGate.Span,
                new object[] { b.Name, a.Name, race.OverlapName, race.ClocksText, fastest, overlap, margin, required, CornerText.Of(context.Netlist.Process, Corner.Fast) },
                new[] { a.Span }, properties);
        }
    }
}

/// <summary>The race check of one latch pair across a clock overlap (see <see cref="OverlapRaceRule"/>).</summary>
public sealed class OverlapRace
{
    internal OverlapRace(LatchPath path, Time fastest, Time overlap)
    {
        Path = path;
        Fastest = fastest;
        Overlap = overlap;
    }

    /// <summary>The fastest path from the launching latch to the catching one.</summary>
    public LatchPath Path { get; }

    /// <summary>Launching entry gate + shortest path + catching entry gate, at the fast corner.</summary>
    public Time Fastest { get; }

    /// <summary>How long the catching latch still conducts after the launching one opens.</summary>
    public Time Overlap { get; }

    /// <summary>Fastest − overlap: negative when data can run through both.</summary>
    public Time Margin => Fastest - Overlap;

    /// <summary>
    /// "1-1" when the launching latch opens on the rising edge of a clock whose other phase the catching latch is on,
    /// "0-0" on the falling edge, "partial" for any other overlap (shifted copies of a phase, different clocks).
    /// </summary>
    public string OverlapName
    {
        get
        {
            var a = Path.From.Phase;
            var b = Path.EntryGate.ClockControl!;
            if (!ReferenceEquals(a.Clock.Root, b.Clock.Root) || a.Polarity == b.Polarity)
                return "partial";
            return a.Polarity == ClockPolarity.High ? "1-1" : "0-0";
        }
    }

    /// <summary>"clock 'clk'" when both latches run on one root clock, else "clocks 'a' and 'b'".</summary>
    public string ClocksText
    {
        get
        {
            var a = Path.From.Phase.Clock.Root;
            var b = Path.EntryGate.ClockControl!.Clock.Root;
            return ReferenceEquals(a, b) ? $"clock '{a.Name}'" : $"clocks '{Path.From.Phase.Clock.Name}' and '{Path.EntryGate.ClockControl!.Clock.Name}'";
        }
    }
}

/// <summary>
/// Every latch pair whose windows overlap briefly, so that an overlap can race through it, with its margin: the
/// figures behind PW1002, passing pairs included, in the order the rule reports them (for reports).
/// </summary>
public static class OverlapRaces
{
    public static IReadOnlyList<OverlapRace> For(LatchModel model, CancellationToken cancellationToken = default)
    {
        if (model is null) throw new ArgumentNullException(nameof(model));
        var worst = new Dictionary<(int, int), OverlapRace>();
        var order = new List<(int, int)>();
        foreach (var path in model.Paths)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var a = path.From;
            var b = path.To;
            var phaseB = path.EntryGate.ClockControl!;
            if (model.Relation(a.Phase, phaseB) != WindowRelation.ShortOverlap || model.IsRegisterToRegister(a, b))
                continue;

            var overlap = RaceModel.Overlap(model, a.Phase, phaseB);
            if (overlap <= Time.Zero)
                continue;
            var fastest = RaceModel.Fastest(model, path);
            var key = (a.Index, b.Index);
            if (!worst.TryGetValue(key, out var seen))
                order.Add(key);
            else if (fastest - overlap >= seen.Margin)
                continue;
            worst[key] = new OverlapRace(path, fastest, overlap);
        }

        var races = new List<OverlapRace>(order.Count);
        foreach (var key in order)
            races.Add(worst[key]);
        return races;
    }
}
