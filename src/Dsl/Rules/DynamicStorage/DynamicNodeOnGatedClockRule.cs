using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Storage;

namespace Phaseward.Rules.DynamicStorage;

/// <summary>
/// PW3001: a storage node that floats while a gated clock is stopped (see <see cref="StorageIsolation.WhileStopped"/>)
/// when the gates declare no maximum idle time, or one that, with the float around the stop and the restart
/// (<see cref="StoppedIsolation.AroundStopAndRestart"/>), is longer than the node's retention time.
/// </summary>
public sealed class DynamicNodeOnGatedClockRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.DynamicNodeOnGatedClock };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        foreach (var node in StorageNodes.Of(context.Netlist))
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            if (StorageIsolation.WhileStopped(node) is not { } stopped)
                continue;
            // Charge sharing that alone spends the whole allowance is PW3003's finding: one finding per cause.
            if (node.Budget.SpentBySharing)
                continue;
            var retention = node.Retention;
            if (stopped.FloatBound is { } floats && floats <= retention.Time)
                continue;

            var gate = stopped.Gate;
            var (idleText, retainedText) = stopped.FloatBound is { } floatShown
                ? Engineering.FormatApart(floatShown.Seconds, retention.Time.Seconds, "s")
                : (FindingPropertyValues.Unbounded, retention.Time.ToString());
            if (stopped.IdleBound is { } idleShown)
                idleText = $"{idleShown}, so it floats up to {idleText} with the clock periods around the stop and the restart";
            var related = new List<SourceSpan>(stopped.Gates.Count);
            foreach (var g in stopped.Gates)
                related.Add(g.Span);

            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.Node] = node.Net.Name,
                [FindingPropertyKeys.GatedClock] = gate.Name,
                [FindingPropertyKeys.RootClock] = gate.Root.Name,
                [FindingPropertyKeys.RetentionSeconds] = FindingPropertyValues.Number(retention.Time.Seconds),
                [FindingPropertyKeys.IdleSeconds] = stopped.IdleBound is { } bound
                    ? FindingPropertyValues.Number(bound.Seconds)
                    : FindingPropertyValues.Unbounded,
            };
            if (UngatedSource(gate) is { } ungated)
                properties[FindingPropertyKeys.UngatedClock] = ungated.Name;
            CellProperties.Add(properties, node);

            yield return new Finding(
                RuleCatalog.DynamicNodeOnGatedClock,
                node.PrimaryDriver.Span,
                new object[]
                {
                    node.Net.Name, gate.Name, gate.StopLevel == ClockStopLevel.High ? "high" : "low", idleText,
                    retainedText, retention.Capacitance, node.Budget.DroopText(), retention.Leakage,
                },
                related,
                properties);
        }
    }

    // The nearest clock upstream of the gate that cannot stop: clocking the node from it removes the hazard.
    private static Clock? UngatedSource(Clock gate)
    {
        for (var clock = gate.Source; clock is not null; clock = clock.Source)
            if (!clock.CanStop)
                return clock;
        return null;
    }
}

internal static class CellProperties
{
    // Records the library cell that made the node, and its static counterpart where a drop-in one exists.
    public static void Add(Dictionary<string, string> properties, StorageNode node)
    {
        if (node.Cell is not { } cell) return;
        properties[FindingPropertyKeys.Cell] = cell.Kind.ToString();
        properties[FindingPropertyKeys.CellName] = cell.Name;
        var replacement = cell.Kind switch
        {
            MacroKind.DynamicLatch => nameof(MacroKind.StaticLatch),
            MacroKind.DynamicRegister => nameof(MacroKind.StaticRegister),
            _ => null,
        };
        if (replacement is not null)
            properties[FindingPropertyKeys.StaticReplacement] = replacement;
    }
}
