using Microsoft.CodeAnalysis;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>
/// The one place diagnostic descriptors are constructed (BannedSymbols.txt bans the constructor everywhere else): each
/// is the analyzer-side view of a <see cref="RuleCatalog"/> entry, with the help link to the rule's page.
/// </summary>
internal static class DescriptorFactory
{
    public static DiagnosticDescriptor Create(RuleDescriptor rule)
    {
        // The IDs and texts come from the rule registry, not from constants here: RS1017 (constant IDs) serves the
        // release-tracking analyzer, and DescriptorTests checks the release files against the registry instead.
#pragma warning disable RS0030, RS1017
        return new DiagnosticDescriptor(rule.Id, rule.Title, rule.MessageFormat, rule.Category, ToDiagnosticSeverity(rule.DefaultSeverity),
            isEnabledByDefault: true, rule.Description, rule.HelpUri);
#pragma warning restore RS0030, RS1017
    }

    private static DiagnosticSeverity ToDiagnosticSeverity(Severity severity) => severity switch
    {
        Severity.Error => DiagnosticSeverity.Error,
        Severity.Warning => DiagnosticSeverity.Warning,
        _ => DiagnosticSeverity.Info,
    };
}
