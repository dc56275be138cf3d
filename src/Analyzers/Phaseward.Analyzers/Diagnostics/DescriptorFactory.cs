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

    /// <summary>
    /// The descriptor for one cause found in several instances (a block placed in a loop, a helper called many times):
    /// the rule's message with one more hole at its end, filled with the instance count and the first few instances.
    /// </summary>
    public static DiagnosticDescriptor CreateForInstances(RuleDescriptor rule)
    {
#pragma warning disable RS0030, RS1017
        return new DiagnosticDescriptor(rule.Id, rule.Title, rule.MessageFormat + "{" + HoleCount(rule.MessageFormat) + "}", rule.Category,
            ToDiagnosticSeverity(rule.DefaultSeverity), isEnabledByDefault: true, rule.Description, rule.HelpUri);
#pragma warning restore RS0030, RS1017
    }

    /// <summary>The number of arguments a composite format reads: one more than its highest hole index.</summary>
    internal static int HoleCount(string format)
    {
        var count = 0;
        for (var i = 0; i < format.Length; i++)
        {
            if (format[i] != '{')
                continue;
            if (i + 1 < format.Length && format[i + 1] == '{')
            {
                i++;
                continue;
            }

            var index = 0;
            var j = i + 1;
            for (; j < format.Length && char.IsDigit(format[j]); j++)
                index = index * 10 + (format[j] - '0');
            if (j > i + 1)
                count = System.Math.Max(count, index + 1);
        }

        return count;
    }

    private static DiagnosticSeverity ToDiagnosticSeverity(Severity severity) => severity switch
    {
        Severity.Error => DiagnosticSeverity.Error,
        Severity.Warning => DiagnosticSeverity.Warning,
        _ => DiagnosticSeverity.Info,
    };
}
