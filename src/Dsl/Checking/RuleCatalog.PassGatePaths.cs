namespace Phaseward.Checking;

// PW2xxx: pass-gate paths — chains of pass gates with no restoring stage.
public static partial class RuleCatalog
{
    /// <summary>Pass gates in series without a restoring stage.</summary>
    public static RuleDescriptor SeriesPassGates { get; } = new(
        "PW2001", RuleFamily.PassGatePaths, Severity.Warning,
        title: "Pass gates in series without a restoring stage",
        messageFormat: "{0} pass gates in series without a restoring stage (limit {1}): Elmore delay {2} (50% estimate {3}); a "
            + "restoring stage every {4} gates would give about {5}{6}",
        description: "A chain of pass gates with no restoring stage is an RC ladder: its delay grows with the square of its "
            + "length and its edges slow down. "
            + "The rule reports a chain longer than phaseward.max_series_pass_gates (default: the optimum "
            + "restoring-stage spacing of the design's process, at least 2) "
            + "at its first gate beyond the limit. Figures are first-order estimates.");
}
