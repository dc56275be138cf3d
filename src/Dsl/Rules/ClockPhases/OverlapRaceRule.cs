using System.Collections.Generic;
using System.Globalization;

namespace Phaseward
{
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
            var worst = new Dictionary<(int, int), (LatchPath Path, Time Fastest, Time Overlap)>();
            var order = new List<(int, int)>();
            foreach (var path in model.Paths)
            {
                context.CancellationToken.ThrowIfCancellationRequested();
                var a = path.From;
                var b = path.To;
                var phaseB = path.EntryGate.ClockControl!;
                if (!LatchModel.Complementary(a.Phase, phaseB) || IsRegisterToRegister(model, a, b))
                    continue;

                var overlap = OpenOverlap(a.Phase, phaseB);
                if (overlap <= Time.Zero)
                    continue;
                var fastest = FastestEntry(model, a) + path.MinDelay + model.StageDelay(path.EntryGate);
                var key = (a.Index, b.Index);
                if (!worst.TryGetValue(key, out var seen))
                    order.Add(key);
                else if (fastest - overlap >= seen.Fastest - seen.Overlap)
                    continue;
                worst[key] = (path, fastest, overlap);
            }

            foreach (var key in order)
            {
                var (path, fastest, overlap) = worst[key];
                var margin = fastest - overlap;
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
                var overlapName = a.Phase.Polarity == ClockPolarity.High ? "1-1" : "0-0";
                yield return new Finding(RuleCatalog.OverlapRace, path.EntryGate.Span,
                    new object[] { b.Name, a.Name, overlapName, a.Phase.Clock.Root.Name, fastest, overlap, margin },
                    new[] { a.Span }, properties);
            }
        }

        /// <summary>How long a gate on <paramref name="late"/> still conducts after one on <paramref name="opening"/> opens (zero if it is shut then).</summary>
        public static Time OpenOverlap(Phase opening, Phase late)
        {
            var a = PhaseWindow.Of(opening);
            var b = PhaseWindow.Of(late);
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

        private static Time FastestEntry(LatchModel model, Latch latch)
        {
            var fastest = model.StageDelay(latch.EntryGates[0]);
            foreach (var gate in latch.EntryGates)
                fastest = Time.Min(fastest, model.StageDelay(gate));
            return fastest;
        }
    }
}
