using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// PW1001: latch A's storage node reaches latch B's entry gate through restoring stages and data-controlled pass
/// gates only (no third latch between), and A and B are transparent in the same window: the same root clock and the
/// same polarity, gated and buffered copies included. A = B (a latch feeding itself back in its own phase) counts.
/// Reported at B's entry gate, with A as the related location.
/// </summary>
/// <remarks>
/// Linear in the netlist: the paths come from one forward search per latch over its fan-out cone, which stops at
/// the next latches (<see cref="LatchModel"/>); no pair of latches is searched for separately. Latches on unrelated
/// root clocks are not compared (their windows have no fixed relation).
/// </remarks>
public sealed class SameWindowLatchesRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.SameWindowLatches };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var model = LatchModel.Of(context.Netlist);
        var reported = new HashSet<(int, int)>();
        foreach (var path in model.Paths)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            var a = path.From;
            var b = path.To;
            var phaseA = a.Phase;
            var phaseB = path.EntryGate.ClockControl!;
            if (!LatchModel.SameWindow(phaseA, phaseB) || !reported.Add((a.Index, b.Index)))
                continue;

            var shared = ReferenceEquals(phaseA, phaseB)
                ? phaseB.Name
                : $"{phaseA.Name} and {phaseB.Name} (both {phaseB.Polarity} of root clock {phaseB.Clock.Root.Name})";
            var register = model.RegisterOf(b);
            var properties = new Dictionary<string, string>
            {
                [FindingProperties.TargetLatch] = b.Name,
                [FindingProperties.SourceLatch] = a.Name,
                [FindingProperties.Phase] = phaseB.Name,
                [FindingProperties.ComplementPhase] = phaseB.Complement.Name,
                [FindingProperties.Clock] = phaseB.Clock.Name,
                [FindingProperties.Polarity] = phaseB.Polarity.ToString(),
                [FindingProperties.ComplementPolarity] = phaseB.Complement.Polarity.ToString(),
                [FindingProperties.IsRegisterStage] = register is null ? "false" : "true",
                [FindingProperties.PhaseSetByOneCall] = b.Cell is not null || (b.EntryGates.Count == 1 && b.FeedbackGates.Count == 0) ? "true" : "false",
            };
            if (register is not null)
                properties[FindingProperties.Register] = register.Name;

            yield return new Finding(RuleCatalog.SameWindowLatches, path.EntryGate.Span, new object[] { b.Name, a.Name, shared },
                new[] { a.Span }, properties);
        }
    }
}
