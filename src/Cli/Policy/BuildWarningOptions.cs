using System;
using System.Collections.Generic;

namespace Phaseward.Cli.Policy;

/// <summary>
/// The project's own warning switches (MSBuild <c>NoWarn</c>, <c>WarningsAsErrors</c>, <c>TreatWarningsAsErrors</c>,
/// <c>WarningsNotAsErrors</c>), which the compiler applies on top of the analyzer config: a rule in NoWarn is left out,
/// and a warning becomes an error when listed in WarningsAsErrors, or under TreatWarningsAsErrors unless listed in
/// WarningsNotAsErrors.
/// </summary>
internal sealed class BuildWarningOptions
{
    private readonly HashSet<string> noWarn;
    private readonly HashSet<string> warningsAsErrors;
    private readonly HashSet<string> warningsNotAsErrors;

    public BuildWarningOptions(bool treatWarningsAsErrors, string? noWarn, string? warningsAsErrors, string? warningsNotAsErrors)
    {
        TreatWarningsAsErrors = treatWarningsAsErrors;
        this.noWarn = Ids(noWarn);
        this.warningsAsErrors = Ids(warningsAsErrors);
        this.warningsNotAsErrors = Ids(warningsNotAsErrors);
    }

    /// <summary>No switches (a design assembly given directly).</summary>
    public static BuildWarningOptions None { get; } = new(false, null, null, null);

    public bool TreatWarningsAsErrors { get; }

    public ReportSeverity Apply(string ruleId, ReportSeverity configured)
    {
        if (noWarn.Contains(ruleId))
            return ReportSeverity.None;
        if (configured != ReportSeverity.Warning)
            return configured;
        return warningsAsErrors.Contains(ruleId) || (TreatWarningsAsErrors && !warningsNotAsErrors.Contains(ruleId))
            ? ReportSeverity.Error
            : configured;
    }

    private static HashSet<string> Ids(string? list)
        => new((list ?? string.Empty).Split(new[] { ';', ',' }, StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries),
            StringComparer.OrdinalIgnoreCase);
}
