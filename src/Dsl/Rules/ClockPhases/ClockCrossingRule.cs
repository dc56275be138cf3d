using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// PW1003: data crosses from a latch on one clock to a latch on a clock with no fixed time relation to it (declared
/// independent, or periods with no small common multiple: see <see cref="TimeBase"/>) without a synchronizer. The
/// receiving stage samples data that can change at any moment of its window, so it can go metastable; a synchronizer
/// gives the metastability a period to resolve. Accepted as a synchronizer: the receiving latch is a register's master,
/// and that register's output feeds, with no logic between, the master of another register on the receiving clock
/// (two storage stages of the receiving clock in series). Reported at the receiving latch's entry gate, the sending
/// latch as related location; one finding per (sending, receiving) pair.
/// </summary>
/// <remarks>
/// A structural check (common practice: two flip-flops in series on the receiving clock, e.g. Weste &amp; Harris,
/// "CMOS VLSI Design", 4th ed., ch. 10, synchronizers; section from memory). It does not estimate the mean time
/// between failures, which needs the flip-flop's resolution time constant from simulation.
/// </remarks>
public sealed class ClockCrossingRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.ClockCrossing };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var model = context.LatchModel;
        var reported = new HashSet<(int, int)>();
        foreach (var path in model.Paths)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            var a = path.From;
            var b = path.To;
            var sending = a.Phase.Clock;
            var receiving = path.EntryGate.ClockControl!.Clock;
            if (TimeBase.Related(sending, receiving) || IsSynchronized(model, b) || !reported.Add((a.Index, b.Index)))
                continue;

            var register = model.RegisterOf(b);
            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.TargetLatch] = b.Name,
                [FindingPropertyKeys.SourceLatch] = a.Name,
                [FindingPropertyKeys.Clock] = receiving.Name,
                [FindingPropertyKeys.SendingClock] = sending.Name,
                [FindingPropertyKeys.IsRegisterStage] = register is null ? "false" : "true",
            };
            if (register is not null)
                properties[FindingPropertyKeys.Register] = register.Name;
            yield return new Finding(RuleCatalog.ClockCrossing, path.EntryGate.Span,
                new object[] { register?.Name ?? b.Name, receiving.Name, a.Name, sending.Name, Reason(sending, receiving) },
                new[] { a.Span }, properties);
        }
    }

    /// <summary>True when <paramref name="receiver"/> is the first of two registers in series on its clock, with no logic between.</summary>
    public static bool IsSynchronized(LatchModel model, Latch receiver)
    {
        if (model.RegisterOf(receiver) is not { } first || !ReferenceEquals(first.Master, receiver))
            return false;
        var output = first.Slave.Output;
        foreach (var load in model.Netlist.DataLoadList(output))
        {
            if (model.LatchEnteredBy(load) is { } next && model.RegisterOf(next) is { } second && ReferenceEquals(second.Master, next)
                && !ReferenceEquals(second, first) && ReferenceEquals(second.Clock.Root, first.Clock.Root))
                return true;
        }

        return false;
    }

    private static string Reason(Clock sending, Clock receiving)
    {
        if (sending.IsIndependent || receiving.IsIndependent)
            return $"'{(sending.IsIndependent ? sending : receiving).Root.Name}' is declared independent";
        return $"periods {sending.Period} and {receiving.Period} have no common cycle";
    }
}
