using System.Globalization;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;

namespace Phaseward.Cli.Policy;

/// <summary>How serious a finding is in this report; <see cref="None"/> leaves it out.</summary>
internal enum ReportSeverity
{
    None,
    Info,
    Warning,
    Error,
}

/// <summary>Conversions between the report's severities, the rules' defaults and the compiler's.</summary>
internal static class SeverityPolicy
{
    public static ReportSeverity FromDefault(Severity severity) => severity switch
    {
        Severity.Error => ReportSeverity.Error,
        Severity.Warning => ReportSeverity.Warning,
        _ => ReportSeverity.Info,
    };

    /// <summary>A configured severity; suggestion and silent both show as info, none leaves the finding out.</summary>
    public static ReportSeverity FromCompiler(ReportDiagnostic severity, Severity ruleDefault) => severity switch
    {
        ReportDiagnostic.Error => ReportSeverity.Error,
        ReportDiagnostic.Warn => ReportSeverity.Warning,
        ReportDiagnostic.Info or ReportDiagnostic.Hidden => ReportSeverity.Info,
        ReportDiagnostic.Suppress => ReportSeverity.None,
        _ => FromDefault(ruleDefault),
    };

    public static string Name(ReportSeverity severity) => severity.ToString().ToLower(CultureInfo.InvariantCulture);
}
