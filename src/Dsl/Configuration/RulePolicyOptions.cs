using System;
using System.Collections.Generic;
using Phaseward.Checking;

namespace Phaseward.Configuration;

/// <summary>
/// The <see cref="RulePolicy"/> (the rules' thresholds) from <c>phaseward.</c> keys, for the analyzers and the report
/// tool alike. Adding a threshold is one line here, beside its definition in <see cref="OptionCatalog"/> and a row in
/// docs/configuration.md.
/// </summary>
internal static class RulePolicyOptions
{
    /// <param name="lookup">The value of a key, or null when the key is not set.</param>
    /// <param name="problems">Receives each value that could not be used (its default applies).</param>
    public static RulePolicy Read(Func<string, string?> lookup, ICollection<OptionProblem> problems) => new()
    {
        MaxSeriesPassGates = OptionCatalog.MaxSeriesPassGates.Read(lookup, problems),
        MinimumRaceMargin = OptionCatalog.MinimumRaceMargin.Read(lookup, problems),
        MinimumTimingSlack = OptionCatalog.MinimumTimingSlack.Read(lookup, problems),
        EnablesFromInputsMayChange = OptionCatalog.ClockGateInputsMayChange.Read(lookup, problems),
        KeeperWriteMargin = OptionCatalog.KeeperWriteMargin.Read(lookup, problems),
        LatchPathSearchBudget = OptionCatalog.LatchPathSearchBudget.Read(lookup, problems),
    };
}
