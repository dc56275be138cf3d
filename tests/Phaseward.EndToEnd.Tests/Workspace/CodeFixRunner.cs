using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;

namespace Phaseward.EndToEnd.Tests.Workspace;

/// <summary>Applies Phaseward's code fixes to a document the way a user would: the first action offered, until clean.</summary>
internal static class CodeFixRunner
{
    /// <summary>
    /// Applies the first code action offered for the document's first Phaseward diagnostic, again and again, until the
    /// document has none left. Returns the titles applied and, if it got stuck, why (null when the document is clean).
    /// </summary>
    public static async Task<(IReadOnlyList<string> Applied, string? Problem)> FixDocumentAsync(DesignWorkspace workspace, string fileName, CancellationToken cancellationToken)
    {
        const int MaxRounds = 10;
        var applied = new List<string>();
        for (var round = 0; round < MaxRounds; round++)
        {
            var document = workspace.Document(fileName);
            var diagnostic = (await workspace.DocumentDiagnosticsAsync(document, cancellationToken))
                .Where(d => d.Id.StartsWith("PW", StringComparison.Ordinal) && d.Severity >= Microsoft.CodeAnalysis.DiagnosticSeverity.Warning)
                .OrderBy(d => d.Location.SourceSpan.Start)
                .FirstOrDefault();
            if (diagnostic is null)
                return (applied, null);

            var actions = await workspace.CodeActionsAsync(document, diagnostic, cancellationToken);
            if (actions.IsEmpty)
                return (applied, $"{fileName}: no code fix offered for {diagnostic.Id} at {diagnostic.Location.GetLineSpan().StartLinePosition} ({diagnostic.GetMessage(System.Globalization.CultureInfo.InvariantCulture)})");

            await workspace.ApplyAsync(actions[0], cancellationToken);
            applied.Add($"{diagnostic.Id}: {actions[0].Title}");
        }

        return (applied, $"{fileName}: still has Phaseward diagnostics after {MaxRounds} code fixes ({string.Join("; ", applied)})");
    }
}
