using System;
using System.IO;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Phaseward.EndToEnd.Tests.Lsp;
using Phaseward.EndToEnd.Tests.Packaging;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// Squiggles while typing, in a real language server: csharp-ls (pinned in .config/dotnet-tools.json) with its analyzers
/// setting on opens the restored design project that references the packed package, reports Phaseward's diagnostics
/// at the right ranges, and drops one when an edit removes the hazard.
/// </summary>
[Collection(PackagedPhasewardCollection.Name)]
public sealed class LanguageServerTests
{
    private static readonly TimeSpan PullTimeout = TimeSpan.FromSeconds(150);
    private readonly PackagedPhaseward package;

    public LanguageServerTests(PackagedPhaseward package) => this.package = package;

    [Fact]
    public async Task DiagnosticsAppearAtTheirRangesAndAnEditRemovesOne()
    {
        EnsureLanguageServerRestored();
        using var cancellation = new CancellationTokenSource(TimeSpan.FromMinutes(5));
        var counter = FrostlineDesigns.FrostCounter;
        var route = FrostlineDesigns.SprinklerRoute;
        var counterPath = Path.Combine(package.DesignProject, counter.FileName);
        var routePath = Path.Combine(package.DesignProject, route.FileName);

        await using var server = await LspClient.StartAsync(package.DesignProject, DotnetCli.RepositoryRoot, cancellation.Token);
        await server.OpenAsync(counterPath, counter.Source);
        await server.OpenAsync(routePath, route.Source);

        var diagnostics = await server.PullDiagnosticsUntilAsync(counterPath, d => d.Any(x => x.Code == counter.RuleId), PullTimeout, cancellation.Token);
        var latches = Assert.Single(diagnostics, d => d.Code == counter.RuleId);
        var (line, column) = counter.ExpectedPosition;
        Assert.Equal((line - 1, column - 1), (latches.Line, latches.Character)); // LSP counts from 0
        Assert.Contains("Latch 'late' takes its data from latch 'early'", latches.Message, StringComparison.Ordinal);

        var routeDiagnostics = await server.PullDiagnosticsUntilAsync(routePath, d => d.Any(x => x.Code == route.RuleId), PullTimeout, cancellation.Token);
        var gates = Assert.Single(routeDiagnostics, d => d.Code == route.RuleId);
        (line, column) = route.ExpectedPosition;
        Assert.Equal((line - 1, column - 1), (gates.Line, gates.Character));

        // The designer moves the second latch to the complementary phase, as an unsaved edit, and in the same edit adds a
        // spare line of six pass gates (PW2001). An empty reply (the server not done, or not analyzing) must not count
        // as "PW1001 gone": the wait is for a reply that carries the edited file's new PW2001 and no PW1001.
        const string spareMarker = "c.TransmissionGate(spare, probe";
        var edited = counter.Source
            .Replace("c.StaticLatch(c.Inverter(early), tick.High", "c.StaticLatch(c.Inverter(early), tick.Low", StringComparison.Ordinal)
            .Replace("c.Output(\"frost_bit\", late);", "c.Output(\"frost_bit\", late);\n" +
                "                var spare = c.Input(\"spare_bit\");\n" +
                "                for (var gate = 0; gate < 6; gate++) spare = " + spareMarker + ", $\"spare{gate}\");\n" +
                "                c.Output(\"spare_out\", c.Inverter(spare));", StringComparison.Ordinal);
        Assert.Contains(spareMarker, edited, StringComparison.Ordinal);
        Assert.DoesNotContain("tick.High, \"late\"", edited, StringComparison.Ordinal);
        await server.ChangeAsync(counterPath, 2, edited);

        var after = await server.PullDiagnosticsUntilAsync(counterPath,
            d => d.Any(x => x.Code == route.RuleId) && d.All(x => x.Code != counter.RuleId), PullTimeout, cancellation.Token);
        Assert.True(after.All(d => d.Code != counter.RuleId), "PW1001 still reported after the edit:\n" + string.Join("\n", after) + "\n" + server.Log);
        var spareGates = Assert.Single(after, d => d.Code == route.RuleId);
        var spareLine = edited.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n').ToList().FindIndex(l => l.Contains(spareMarker, StringComparison.Ordinal));
        Assert.Equal(spareLine, spareGates.Line); // the reply analysed the edited text, not the text on disk
        Assert.DoesNotContain(after, d => d.Code.StartsWith("CS", StringComparison.Ordinal) && d.Message.Contains("error", StringComparison.OrdinalIgnoreCase));

        // Control: the server still analyzes (the untouched document keeps its diagnostic).
        routeDiagnostics = await server.PullDiagnosticsUntilAsync(routePath, d => d.Any(x => x.Code == route.RuleId), PullTimeout, cancellation.Token);
        Assert.Contains(routeDiagnostics, d => d.Code == route.RuleId);
        Assert.Equal(counter.Source, File.ReadAllText(counterPath)); // the edit never touched the disk
    }

    /// <summary>CI runs `dotnet tool restore`; on a fresh clone the test does it itself in the repository root.</summary>
    private static void EnsureLanguageServerRestored()
    {
        var root = DotnetCli.RepositoryRoot;
        if (DotnetCli.Run("tool run csharp-ls -- --version", root, TimeSpan.FromMinutes(1)).ExitCode == 0)
            return;
        var (exitCode, output) = DotnetCli.Run("tool restore", root, TimeSpan.FromMinutes(5));
        Assert.True(exitCode == 0, "dotnet tool restore failed:\n" + output);
    }
}
