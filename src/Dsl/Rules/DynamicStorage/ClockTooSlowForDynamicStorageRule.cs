using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Storage;

namespace Phaseward.Rules.DynamicStorage;

/// <summary>
/// PW3002: with its clocks running, a storage node floats for longer per period than its retention time (see
/// <see cref="StorageIsolation.WhileRunning(StorageNode)"/>); reports the lowest safe clock frequency.
/// </summary>
public sealed class ClockTooSlowForDynamicStorageRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.ClockTooSlowForDynamicStorage };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var buffers = new ArcBuffers();
        foreach (var node in StorageNodes.Of(context.Netlist))
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            if (StorageIsolation.WhileRunning(node, buffers) is not { } running)
                continue;
            // Charge sharing that alone spends the whole allowance is PW3003's finding: one finding per cause.
            if (node.Budget.SpentBySharing)
                continue;
            var retention = node.Retention;
            if (running.LowestSafeFrequency(retention.Time) is not { } minimum)
                continue;

            var root = running.Root;
            var (isolation, retained) = Engineering.FormatApart(running.Longest.Seconds, retention.Time.Seconds, "s");
            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.Node] = node.Net.Name,
                [FindingPropertyKeys.RootClock] = root.Name,
                [FindingPropertyKeys.RetentionSeconds] = FindingPropertyValues.Number(retention.Time.Seconds),
                [FindingPropertyKeys.IsolationSeconds] = FindingPropertyValues.Number(running.Longest.Seconds),
                [FindingPropertyKeys.MinimumFrequencyHertz] = FindingPropertyValues.Number(minimum.Hertz),
            };
            CellProperties.Add(properties, node);

            yield return new Finding(
                RuleCatalog.ClockTooSlowForDynamicStorage,
                node.PrimaryDriver.Span,
                new object[]
                {
                    node.Net.Name, isolation, root.Period, root.Name,
                    retained, retention.Capacitance, node.Budget.DroopText(), retention.Leakage, minimum,
                },
                new[] { root.Span },
                properties);
        }
    }
}
