using System.Threading;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>
/// Which diagnostics the build has switched off for a document, so that a rule none of whose diagnostics could be
/// reported there is not run at all (a team that sets a rule to <c>none</c> should not pay for it on every keystroke).
/// </summary>
/// <remarks>
/// An ID counts as off only when every setting that names it says "suppress" and at least one names it: the document's
/// <c>.editorconfig</c> entry (<c>dotnet_diagnostic.ID.severity = none</c>), the compilation's own options (<c>NoWarn</c>,
/// a rule set) and a global analyzer config. Which of these wins when they disagree is the compiler's business; asking that
/// all agree keeps the answer right whatever the order. Settings by category or for every analyzer
/// (<c>dotnet_analyzer_diagnostic.*</c>) are not read, so they never switch a rule off here (the compiler still filters
/// what they hide), and a <c>#pragma</c> or <c>[SuppressMessage]</c> covers only part of a document, so the rule still runs.
/// </remarks>
internal static class SwitchedOffDiagnostics
{
    public static bool IsOff(string id, SyntaxTree tree, CompilationOptions options, CancellationToken cancellationToken)
    {
        var named = false;
        var treeOptions = options.SyntaxTreeOptionsProvider;
        if (treeOptions is not null && treeOptions.TryGetDiagnosticValue(tree, id, cancellationToken, out var inDocument))
        {
            if (inDocument != ReportDiagnostic.Suppress) return false;
            named = true;
        }

        // Default in the compilation's options names no severity: it is what /warnaserror- leaves, and what a host adds
        // to enable every diagnostic an analyzer supports; the document's setting still applies over it.
        if (options.SpecificDiagnosticOptions.TryGetValue(id, out var inCompilation) && inCompilation != ReportDiagnostic.Default)
        {
            if (inCompilation != ReportDiagnostic.Suppress) return false;
            named = true;
        }

        if (treeOptions is not null && treeOptions.TryGetGlobalDiagnosticValue(id, cancellationToken, out var inGlobalConfig))
        {
            if (inGlobalConfig != ReportDiagnostic.Suppress) return false;
            named = true;
        }

        return named;
    }
}
