using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// PW1001: latch A's storage node reaches latch B's entry gate through restoring stages and data-controlled pass
/// gates only (no third latch between), and A and B are transparent together, on the design's time base, for longer
/// than the overlap allowance (<see cref="WindowRelations"/>): the same phase, a gated copy, a copy delayed by less
/// than a quarter of the window, or a phase of another clock that covers it. A = B (a latch feeding itself back in its
/// own phase) counts. A path from one register's slave to another register's master is a register-to-register path
/// (a half-cycle path when the edges differ), checked for setup and hold by PW4001/PW4002, not here. Reported at B's
/// entry gate, with A as the related location.
/// </summary>
/// <remarks>
/// Linear in the netlist: the paths come from one forward search per latch over its fan-out cone, which stops at
/// the next latches (<see cref="LatchModel"/>); no pair of latches is searched for separately. Latches on unrelated
/// clocks are not compared (their windows have no fixed relation; PW1003 checks the crossing).
/// </remarks>
public sealed class SameWindowLatchesRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.SameWindowLatches };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var model = context.LatchModel;
        var reported = new HashSet<(int, int)>();
        foreach (var path in model.Paths)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            var a = path.From;
            var b = path.To;
            var phaseA = a.Phase;
            var phaseB = path.EntryGate.ClockControl!;
            if (model.Relation(phaseA, phaseB) != WindowRelation.TransparentTogether || model.IsRegisterToRegister(a, b)
                || !reported.Add((a.Index, b.Index)))
                continue;

            var shared = ReferenceEquals(phaseA, phaseB)
                ? phaseB.Name
                : SharedWindowText(model.WindowOf(phaseA), model.WindowOf(phaseB));
            var register = model.RegisterOf(b);
            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.TargetLatch] = b.Name,
                [FindingPropertyKeys.SourceLatch] = a.Name,
                [FindingPropertyKeys.Phase] = phaseB.Name,
                [FindingPropertyKeys.ComplementPhase] = phaseB.Complement.Name,
                [FindingPropertyKeys.Clock] = phaseB.Clock.Name,
                [FindingPropertyKeys.Polarity] = phaseB.Polarity.ToString(),
                [FindingPropertyKeys.ComplementPolarity] = phaseB.Complement.Polarity.ToString(),
                [FindingPropertyKeys.IsRegisterStage] = register is null ? "false" : "true",
                [FindingPropertyKeys.PhaseSetByOneCall] = b.Cell is not null || (b.EntryGates.Count == 1 && b.FeedbackGates.Count == 0) ? "true" : "false",
            };
            if (register is not null)
                properties[FindingPropertyKeys.Register] = register.Name;

            yield return new Finding(RuleCatalog.SameWindowLatches, path.EntryGate.Span, new object[] { b.Name, a.Name, shared },
                new[] { a.Span }, properties);
        }
    }

    // "clk.High and late.High (together for 470 ps of every 1 ns)".
    private static string SharedWindowText(PhaseWindow a, PhaseWindow b)
        => $"{a.Phase.Name} and {b.Phase.Name} (together for {a.LongestOverlapWith(b)} of every {a.CommonCycleWith(b)})";
}
