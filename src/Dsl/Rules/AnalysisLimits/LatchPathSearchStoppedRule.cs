using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;

namespace Phaseward.Rules.AnalysisLimits;

/// <summary>
/// PW9005: the latch-to-latch path search stopped at <see cref="RulePolicy.LatchPathSearchBudget"/>
/// (<see cref="Sequencing.LatchModel.PathSearchStopped"/>). Reported once per design, at the first latch whose paths
/// were not listed, so that a check that saw only part of the design never passes for a whole one.
/// </summary>
public sealed class LatchPathSearchStoppedRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.LatchPathSearchStopped };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var model = context.LatchModel;
        if (!model.PathSearchStopped)
            yield break;

        var first = model.Latches[model.LatchesSearched];
        var notSearchedAfter = model.Latches.Count - model.LatchesSearched - 1;
        yield return new Finding(RuleCatalog.LatchPathSearchStopped, first.Span,
            new object[]
            {
                context.Netlist.DesignName, first.Name, Count(model.PathSearchSteps), Count(model.PathSearchBudget),
                Count(model.Paths.Count), Count(model.LatchesSearched), Count(model.Latches.Count), Count(notSearchedAfter),
            },
            properties: new Dictionary<string, string>
            {
                [FindingPropertyKeys.FirstLatchNotSearched] = first.Name,
                [FindingPropertyKeys.SearchBudget] = model.PathSearchBudget.ToString(CultureInfo.InvariantCulture),
            });
    }

    // Large counts with thousands separators, the same in every culture.
    private static string Count(long value) => value.ToString("N0", CultureInfo.InvariantCulture);
}
