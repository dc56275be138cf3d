namespace Phaseward
{
    /// <summary>
    /// Titles and message formats as constants, so that the analyzers' descriptors are built from compile-time constants
    /// (the release-tracking analyzer reads them) and both front ends print the same words.
    /// </summary>
    public static class RuleTexts
    {
        public const string DesignFoundTitle = "Phaseward checked a design";
        public const string DesignFoundMessage = "Phaseward checked design '{0}'";
        public const string DesignFoundDescription = "Reported once per design class to show that the Phaseward analyzers are loaded into the build.";

        public const string SeriesPassGatesTitle = "Pass gates in series without a restoring stage";
        public const string SeriesPassGatesMessage =
            "{0} pass gates in series without a restoring stage (limit {1}): Elmore delay {2} (50% estimate {3}); a restoring stage every {4} gates would give about {5}";
        public const string SeriesPassGatesDescription =
            "A chain of pass gates with no restoring stage is an RC ladder: its delay grows with the square of its length and its edges slow down. "
            + "The rule reports a chain longer than phaseward.max_series_pass_gates (default: the optimum restoring-stage spacing of the design's process, at least 2) "
            + "at its first gate beyond the limit. Figures are first-order estimates.";
    }
}
