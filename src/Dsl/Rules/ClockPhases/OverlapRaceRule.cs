using System;
using System.Collections.Generic;
using System.Globalization;
using System.Threading;

namespace Phaseward;

/// <summary>
/// PW1002: for latch A feeding latch B on the complementary phase of the same root clock, the fastest data entering
/// A when A opens must not reach B's storage node while B is still open:
/// margin = t(A's entry gate) + t_min(path, A's output stage included) + t(B's entry gate) − overlap, where the
/// overlap is how long B still conducts after A opens (the 1-1 overlap when A opens on the rising edge, the 0-0
/// overlap on the falling edge; buffered copies shift it). Reported at B when the margin is below
/// <see cref="RulePolicy.MinimumRaceMargin"/>. For a register's master and slave this is the condition
/// t(TG1) + t(I1) + t(TG2) &gt; 0-0 overlap (rising-edge register). A path from one register's slave to a register's
/// master is the capturing register's hold check (PW4002) and is left to it.
/// </summary>
public sealed class OverlapRaceRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.OverlapRace };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var model = LatchModel.Of(context.Netlist);
        foreach (var race in OverlapRaces.For(model, context.CancellationToken))
        {
            var (path, fastest, overlap, margin) = (race.Path, race.Fastest, race.Overlap, race.Margin);
            if (margin >= context.Policy.MinimumRaceMargin)
                continue;
            var a = path.From;
            var b = path.To;
            var register = model.RegisterOf(b);
            var properties = new Dictionary<string, string>
            {
                [FindingProperties.TargetLatch] = b.Name,
                [FindingProperties.SourceLatch] = a.Name,
                [FindingProperties.Phase] = path.EntryGate.ClockControl!.Name,
                [FindingProperties.IsRegisterStage] = register is null ? "false" : "true",
                [FindingProperties.MarginSeconds] = margin.Seconds.ToString("R", CultureInfo.InvariantCulture),
            };
            if (register is not null)
                properties[FindingProperties.Register] = register.Name;
            yield return new Finding(RuleCatalog.OverlapRace, path.EntryGate.Span,
                new object[] { b.Name, a.Name, race.OverlapName, a.Phase.Clock.Root.Name, fastest, overlap, margin },
                new[] { a.Span }, properties);
        }
    }

    /// <summary>How long a gate on <paramref name="late"/> still conducts after one on <paramref name="opening"/> opens (zero if it is shut then).</summary>
    public static Time OpenOverlap(Phase opening, Phase late) => OpenOverlap(PhaseWindow.Of(opening), PhaseWindow.Of(late));

    internal static Time OpenOverlap(PhaseWindow a, PhaseWindow b)
    {
        if (!a.SharesRootWith(b))
            return Time.Zero;
        var period = a.Period.Seconds;
        var offset = (a.Opens.Seconds - b.Opens.Seconds) % period;
        if (offset < 0) offset += period;
        var remaining = b.Length.Seconds - offset;
        return remaining <= 0 ? Time.Zero : Time.Min(new Time(remaining), a.Length);
    }

    internal static bool IsRegisterToRegister(LatchModel model, Latch a, Latch b)
        => model.RegisterOf(a) is { } from && ReferenceEquals(from.Slave, a)
           && model.RegisterOf(b) is { } to && ReferenceEquals(to.Master, b);
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

    /// <summary>Launching entry gate + shortest path + catching entry gate.</summary>
    public Time Fastest { get; }

    /// <summary>How long the catching latch still conducts after the launching one opens.</summary>
    public Time Overlap { get; }

    /// <summary>Fastest − overlap: negative when data can run through both.</summary>
    public Time Margin => Fastest - Overlap;

    /// <summary>"1-1" when the launching latch opens on the rising edge, else "0-0".</summary>
    public string OverlapName => Path.From.Phase.Polarity == ClockPolarity.High ? "1-1" : "0-0";
}

/// <summary>
/// Every latch pair on complementary phases of one root clock that an overlap can race through, with its margin: the
/// figures behind PW1002, passing pairs included, in the order the rule reports them (for reports).
/// </summary>
public static class OverlapRaces
{
    public static IReadOnlyList<OverlapRace> For(LatchModel model, CancellationToken cancellationToken = default)
    {
        if (model is null) throw new ArgumentNullException(nameof(model));
        var worst = new Dictionary<(int, int), OverlapRace>();
        var order = new List<(int, int)>();
        var windows = new PhaseWindowCache();
        foreach (var path in model.Paths)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var a = path.From;
            var b = path.To;
            var phaseB = path.EntryGate.ClockControl!;
            if (!LatchModel.Complementary(a.Phase, phaseB) || OverlapRaceRule.IsRegisterToRegister(model, a, b))
                continue;

            var overlap = OverlapRaceRule.OpenOverlap(windows.Of(a.Phase), windows.Of(phaseB));
            if (overlap <= Time.Zero)
                continue;
            var fastest = model.FastestEntryDelay(a) + path.MinDelay + model.StageDelay(path.EntryGate);
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
