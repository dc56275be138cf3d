using System;
using System.Collections.Generic;
using System.Globalization;
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

/// <summary>
/// The severity of each rule in the report: the rule's default, then <c>dotnet_diagnostic.PWxxxx.severity</c> from the
/// .editorconfig files above the input (error, warning, suggestion or silent = info, none = left out), then the
/// command line (<c>--error</c>, <c>--warning</c>, <c>--info</c>, <c>--none</c>), last one winning.
/// </summary>
internal sealed class SeverityPolicy
{
    private readonly Dictionary<string, (ReportSeverity Severity, string Source)> overrides = new(StringComparer.OrdinalIgnoreCase);

    public ReportSeverity SeverityOf(RuleDescriptor rule)
        => overrides.TryGetValue(rule.Id, out var o) ? o.Severity : FromDefault(rule.DefaultSeverity);

    /// <summary>Where the severity of a rule came from ("default", an .editorconfig path, "command line").</summary>
    public string SourceOf(RuleDescriptor rule) => overrides.TryGetValue(rule.Id, out var o) ? o.Source : "default";

    public void Set(string ruleId, ReportSeverity severity, string source)
    {
        if (RuleCatalog.Find(ruleId.ToUpperInvariant()) is null)
            throw new InputException($"unknown rule ID '{ruleId}' in {source} (known: {string.Join(", ", Ids())})");
        overrides[ruleId.ToUpperInvariant()] = (severity, source);
    }

    /// <summary>Applies the <c>dotnet_diagnostic.PWxxxx.severity</c> keys of an .editorconfig (other rules' keys are ignored).</summary>
    public void Apply(IReadOnlyDictionary<string, string> keys, string source)
    {
        foreach (var (key, value) in keys)
        {
            const string Prefix = "dotnet_diagnostic.";
            const string Suffix = ".severity";
            if (!key.StartsWith(Prefix, StringComparison.OrdinalIgnoreCase) || !key.EndsWith(Suffix, StringComparison.OrdinalIgnoreCase))
                continue;
            var id = key.Substring(Prefix.Length, key.Length - Prefix.Length - Suffix.Length).ToUpperInvariant();
            if (!id.StartsWith("PW", StringComparison.Ordinal) || RuleCatalog.Find(id) is null)
                continue;
            overrides[id] = (Parse(value, $"'{key}' in {source}"), source);
        }
    }

    public static ReportSeverity Parse(string value, string where) => value.Trim().ToLowerInvariant() switch
    {
        "error" => ReportSeverity.Error,
        "warning" => ReportSeverity.Warning,
        "suggestion" or "info" or "silent" or "hidden" => ReportSeverity.Info,
        "none" => ReportSeverity.None,
        _ => throw new InputException($"the severity '{value}' of {where} is not valid: expected error, warning, suggestion, silent or none"),
    };

    public static ReportSeverity FromDefault(Severity severity) => severity switch
    {
        Severity.Error => ReportSeverity.Error,
        Severity.Warning => ReportSeverity.Warning,
        _ => ReportSeverity.Info,
    };

    public static string Name(ReportSeverity severity) => severity.ToString().ToLower(CultureInfo.InvariantCulture);

    private static IEnumerable<string> Ids()
    {
        foreach (var rule in RuleCatalog.All) yield return rule.Id;
    }
}
