using Microsoft.CodeAnalysis;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>The one place diagnostic descriptors are made: it sets the help link to the rule's page.</summary>
internal static class DescriptorFactory
{
    // Parameter names match DiagnosticDescriptor's constructor so that the release-tracking analyzer follows the
    // constant arguments through this helper.
    public static DiagnosticDescriptor Create(string id, string title, string messageFormat, string category,
        DiagnosticSeverity defaultSeverity, string description)
        => new(id, title, messageFormat, category, defaultSeverity, isEnabledByDefault: true, description,
            helpLinkUri: RuleDescriptor.HelpBaseUri + id + ".md");
}
