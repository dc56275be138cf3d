namespace Phaseward.Analyzers.Options
{
    /// <summary>
    /// Reads the <see cref="RulePolicy"/> (the rules' thresholds) from .editorconfig. Adding a threshold is one line here,
    /// beside its key in <see cref="OptionKeys"/> and a row in docs/configuration.md, for example:
    /// <code>MaxSeriesPassGates = reader.Integer(OptionKeys.MaxSeriesPassGates, RulePolicy.Default.MaxSeriesPassGates, 1, 1000),</code>
    /// </summary>
    internal static class RulePolicyReader
    {
        public static RulePolicy Read(OptionReader reader)
        {
            _ = reader;
            return new RulePolicy
            {
                // One line per RulePolicy property (see the example above).
            };
        }
    }
}
