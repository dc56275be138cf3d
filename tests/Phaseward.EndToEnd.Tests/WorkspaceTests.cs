using System;
using System.IO;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;
using Phaseward.EndToEnd.Tests.Packaging;
using Phaseward.EndToEnd.Tests.Workspace;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// The editor's path through the Roslyn workspace API: open a project built from its files, ask for one document's
/// diagnostics, list the code actions at a diagnostic, apply one, and see the diagnostic gone. Analyzers and code fixes
/// are loaded from the packed package, as an editor loads them from a restored package.
/// </summary>
[Collection(PackagedPhasewardCollection.Name)]
public sealed class WorkspaceTests
{
    private static readonly TimeSpan Timeout = TimeSpan.FromMinutes(2);
    private readonly PackagedPhaseward package;

    public WorkspaceTests(PackagedPhaseward package) => this.package = package;

    [Fact]
    public async Task SampleDocumentShowsItsDiagnosticAndACodeFixRemovesIt()
    {
        using var cancellation = new CancellationTokenSource(Timeout);
        var sample = Path.Combine(DotnetCli.RepositoryRoot, "samples", "Quorvane");
        using var workspace = DesignWorkspace.Open(sample, DotnetCli.RepositoryRoot, package.LibraryPath, package.AnalyzerDirectory, OutputKind.ConsoleApplication);
        Assert.NotEmpty(workspace.Analyzers);

        // TideAverager.cs holds two designs: TideAverager (PW1001 at its second latch) and its fixed twin.
        var document = workspace.Document("TideAverager.cs");
        Assert.Empty(await workspace.CompilerErrorsAsync(document, cancellation.Token));
        var expectedLine = Array.FindIndex(File.ReadAllLines(document.FilePath!), l => l.Contains("\"tide_stage2\"", StringComparison.Ordinal)
            && l.Contains("average.High", StringComparison.Ordinal));
        Assert.True(expectedLine >= 0);

        var diagnostics = await workspace.DocumentDiagnosticsAsync(document, cancellation.Token);
        var hazard = Assert.Single(diagnostics, d => d.Id.StartsWith("PW", StringComparison.Ordinal));
        Assert.Equal(RuleCatalog.SameWindowLatches.Id, hazard.Id);
        Assert.Equal(expectedLine, hazard.Location.GetLineSpan().StartLinePosition.Line); // 0-based, as editors count
        Assert.Equal(DiagnosticSeverity.Warning, hazard.Severity);

        // The clean sample has nothing to report through the same path.
        var clean = await workspace.DocumentDiagnosticsAsync(workspace.Document("PressureSampler.cs"), cancellation.Token);
        Assert.DoesNotContain(clean, d => d.Id.StartsWith("PW", StringComparison.Ordinal));

        var actions = await workspace.CodeActionsAsync(document, hazard, cancellation.Token);
        Assert.True(!actions.IsEmpty, $"no code action offered for {hazard}; code fix providers loaded: " +
            string.Join(", ", workspace.CodeFixes.Select(f => f.GetType().Name + "[" + string.Join(",", f.FixableDiagnosticIds) + "]")));
        Assert.All(actions, a => Assert.False(string.IsNullOrWhiteSpace(a.Title)));
        Assert.All(actions, a => Assert.StartsWith("Phaseward.", a.EquivalenceKey ?? string.Empty, StringComparison.Ordinal));

        await workspace.ApplyAsync(actions[0], cancellation.Token);

        var fixedDocument = workspace.Document("TideAverager.cs");
        Assert.NotEqual((await document.GetTextAsync(cancellation.Token)).ToString(), (await fixedDocument.GetTextAsync(cancellation.Token)).ToString());
        Assert.Empty(await workspace.CompilerErrorsAsync(fixedDocument, cancellation.Token));
        var after = await workspace.DocumentDiagnosticsAsync(fixedDocument, cancellation.Token);
        Assert.DoesNotContain(after, d => d.Id.StartsWith("PW", StringComparison.Ordinal));
    }
}
