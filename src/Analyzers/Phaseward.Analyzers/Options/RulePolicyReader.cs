using Phaseward.Checking;

namespace Phaseward.Analyzers.Options;

/// <summary>
/// Reads the <see cref="RulePolicy"/> (the rules' thresholds) from .editorconfig. Adding a threshold is one line here,
/// beside its key in <see cref="OptionKeys"/> and a row in docs/configuration.md, for example:
/// <code>MaxSeriesPassGates = reader.OptionalInteger(OptionKeys.MaxSeriesPassGates, 1, 10_000),</code>
/// </summary>
internal static class RulePolicyReader
{
    public static RulePolicy Read(OptionReader reader)
    {
        return new RulePolicy
        {
            MaxSeriesPassGates = reader.OptionalInteger(OptionKeys.MaxSeriesPassGates, 1, 10_000),
            MinimumRaceMargin = reader.Duration(OptionKeys.MinimumRaceMargin, RulePolicy.Default.MinimumRaceMargin),
            MinimumTimingSlack = reader.Duration(OptionKeys.MinimumTimingSlack, RulePolicy.Default.MinimumTimingSlack),
            EnablesFromInputsMayChange = reader.Boolean(OptionKeys.ClockGateInputsMayChange, RulePolicy.Default.EnablesFromInputsMayChange),
            KeeperWriteMargin = reader.Number(OptionKeys.KeeperWriteMargin, RulePolicy.Default.KeeperWriteMargin, 0, 0.5),
        };
    }
}
