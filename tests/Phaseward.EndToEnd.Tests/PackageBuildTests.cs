using System;
using System.Collections.Generic;
using System.IO;
using System.IO.Compression;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using System.Xml.Linq;
using Phaseward.Checking;
using Phaseward.EndToEnd.Tests.Packaging;
using Phaseward.EndToEnd.Tests.Workspace;
using Xunit.Abstractions;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// The package as a user meets it: a fresh design project with one PackageReference to the packed <c>Phaseward</c>,
/// built by the real SDK. What the compiler prints and what its SARIF log holds are checked against the design files.
/// </summary>
[Collection(PackagedPhasewardCollection.Name)]
public sealed class PackageBuildTests
{
    private readonly PackagedPhaseward package;
    private readonly ITestOutputHelper output;

    public PackageBuildTests(PackagedPhaseward package, ITestOutputHelper output)
    {
        this.package = package;
        this.output = output;
    }

    [Fact]
    public void PackageHoldsTheLibraryTheAnalyzersWithTheirCopyOfTheDslAndItsMetadata()
    {
        output.WriteLine($"dotnet pack: {package.PackDuration.TotalSeconds:F0} s; first restore of the design project: {package.RestoreDuration.TotalSeconds:F0} s");
        Assert.True(File.Exists(package.LibraryPath), package.LibraryPath);
        // Restored from the temporary feed, not from a same-named package of another source.
        var restoredFrom = Path.Combine(package.PackagesFolder, "phaseward", package.PackageVersion.ToLowerInvariant(), ".nupkg.metadata");
        using (var restored = System.Text.Json.JsonDocument.Parse(File.ReadAllText(restoredFrom)))
            Assert.Equal(package.Feed, restored.RootElement.GetProperty("source").GetString()?.TrimEnd(Path.DirectorySeparatorChar));
        var analyzers = Directory.GetFiles(package.AnalyzerDirectory).Select(Path.GetFileName).Order(StringComparer.Ordinal);
        Assert.Equal(new[] { "Phaseward.Analyzers.dll", "Phaseward.CodeFixes.dll", "Phaseward.dll" }, analyzers);

        // The metadata a registry shows: version, description, licence, readme, repository.
        using var nupkg = ZipFile.OpenRead(Directory.GetFiles(package.Feed, "Phaseward.*.nupkg").Single());
        using var nuspecStream = nupkg.Entries.Single(e => e.FullName == "Phaseward.nuspec").Open();
        var metadata = XDocument.Load(nuspecStream).Root!.Elements().Single(e => e.Name.LocalName == "metadata");
        string Field(string name) => metadata.Elements().SingleOrDefault(e => e.Name.LocalName == name)?.Value ?? string.Empty;
        Assert.Equal(("Phaseward", package.PackageVersion), (Field("id"), Field("version")));
        Assert.Matches(@"^\d+\.\d+\.\d+", package.PackageVersion);
        Assert.Equal("MIT", Field("license"));
        Assert.Equal("README.md", Field("readme"));
        Assert.Contains(nupkg.Entries, e => e.FullName == "README.md");
        Assert.False(string.IsNullOrWhiteSpace(Field("description")));
        var repository = metadata.Elements().Single(e => e.Name.LocalName == "repository");
        Assert.Equal("https://github.com/phaseward/phaseward", repository.Attribute("url")?.Value);
    }

    [Fact]
    public void BuildShowsEachHazardWithFileLineAndMessage()
    {
        var build = package.Baseline;
        Assert.True(build.ExitCode == 0, build.Output);
        Assert.DoesNotContain("AD0001", build.Output, StringComparison.Ordinal); // an analyzer that threw
        Assert.DoesNotContain("CS8032", build.Output, StringComparison.Ordinal); // an analyzer that could not be loaded

        var messages = build.PhasewardMessages;
        foreach (var design in FrostlineDesigns.WithHazards)
        {
            var (line, column) = design.ExpectedPosition;
            var found = Assert.Single(messages, m => m.Id == design.RuleId);
            Assert.Equal(Path.Combine(package.DesignProject, design.FileName), found.File);
            Assert.Equal((line, column), (found.Line, found.Column));
            Assert.Equal("warning", found.Severity);
            Assert.Equal($"https://github.com/phaseward/phaseward/blob/main/docs/rules/{design.RuleId}.md", found.HelpLink);
            Assert.DoesNotContain("{0}", found.Message, StringComparison.Ordinal);
        }

        // The messages carry the design's own names and the rule's figures.
        Assert.Equal(
            "Latch 'late' takes its data from latch 'early' and both are transparent in tick.High: data can run through both in one phase",
            Assert.Single(messages, m => m.Id == RuleCatalog.SameWindowLatches.Id).Message);
        var chain = Assert.Single(messages, m => m.Id == RuleCatalog.SeriesPassGates.Id).Message;
        Assert.StartsWith("6 pass gates in series without a restoring stage (limit 2), starting at '", chain, StringComparison.Ordinal);
        Assert.Contains("', in design 'SprinklerRoute': Elmore delay ", chain, StringComparison.Ordinal);
        Assert.StartsWith("Dynamic node 'wet_hold.x' floats while gated clock 'heater_sense' is stopped low",
            Assert.Single(messages, m => m.Id == RuleCatalog.DynamicNodeOnGatedClock.Id).Message, StringComparison.Ordinal);
        Assert.DoesNotContain(messages, m => m.File.EndsWith(FrostlineDesigns.DewSampler.FileName, StringComparison.Ordinal));
        Assert.Equal(3, messages.Count);
    }

    [Fact]
    public void SarifLogHoldsEachResultWithRuleIdAndRegion()
    {
        var build = package.Baseline;
        Assert.True(build.ExitCode == 0, build.Output);
        var (version, results, helpUris) = SarifLog.Read(build.SarifPath);
        Assert.Equal("2.1.0", version);

        var phaseward = results.Where(r => r.IsPhaseward).ToList();
        foreach (var design in FrostlineDesigns.WithHazards)
        {
            var (line, column) = design.ExpectedPosition;
            var result = Assert.Single(phaseward, r => r.RuleId == design.RuleId);
            Assert.Equal(design.FileName, result.FileName);
            Assert.Equal((line, column), (result.StartLine, result.StartColumn));
            Assert.Equal("warning", result.Level);
            Assert.False(result.Suppressed);
            Assert.Equal($"https://github.com/phaseward/phaseward/blob/main/docs/rules/{design.RuleId}.md", helpUris[design.RuleId!]);
        }

        Assert.Equal(3, phaseward.Count);
    }

    [Fact]
    public void WarnAsErrorFailsTheBuild()
    {
        var build = package.Build(package.DesignProject, "warnaserror", "-warnaserror");
        Assert.True(build.ExitCode != 0, build.Output);
        var errors = build.PhasewardMessages.Where(m => m.Severity == "error").Select(m => m.Id).Order(StringComparer.Ordinal);
        Assert.Equal(FrostlineDesigns.WithHazards.Select(d => d.RuleId!).Order(StringComparer.Ordinal), errors);
    }

    [Fact]
    public async Task CiPolicyFailsTheBuildUntilTheCodeFixesAreApplied()
    {
        // CI drops samples/ci-policy.globalconfig next to the project as .globalconfig (the SDK picks that name up).
        var project = package.CreateDesignProject("ci-policy");
        File.Copy(Path.Combine(DotnetCli.RepositoryRoot, "samples", "ci-policy.globalconfig"), Path.Combine(project, ".globalconfig"));

        var build = package.Build(project, "ci-policy");

        Assert.True(build.ExitCode != 0, build.Output);
        foreach (var design in FrostlineDesigns.WithHazards)
        {
            var (line, column) = design.ExpectedPosition;
            var error = Assert.Single(build.PhasewardMessages, m => m.Id == design.RuleId);
            Assert.Equal(("error", design.FileName, line, column), (error.Severity, Path.GetFileName(error.File), error.Line, error.Column));
        }

        var (_, results, _) = SarifLog.Read(build.SarifPath);
        Assert.Equal(3, results.Count(r => r.IsPhaseward));
        Assert.All(results.Where(r => r.IsPhaseward), r => Assert.Equal("error", r.Level));

        // The designer takes the first code fix offered at each diagnostic (through the workspace API, with the fixes from
        // the package) and saves: the same build under the same policy is clean.
        using var cancellation = new CancellationTokenSource(TimeSpan.FromMinutes(2));
        using (var workspace = DesignWorkspace.Open(project, package.Root, package.LibraryPath, package.AnalyzerDirectory))
        {
            var problems = new List<string>();
            foreach (var design in FrostlineDesigns.WithHazards)
            {
                var (applied, problem) = await CodeFixRunner.FixDocumentAsync(workspace, design.FileName, cancellation.Token);
                if (problem is not null) problems.Add(problem);
                else Assert.NotEmpty(applied);
                foreach (var title in applied) output.WriteLine($"{design.FileName}: {title}");
            }

            Assert.True(problems.Count == 0, string.Join("\n", problems));
            await workspace.SaveAsync(cancellation.Token);
        }

        foreach (var design in FrostlineDesigns.WithHazards)
            Assert.NotEqual(design.Source, File.ReadAllText(Path.Combine(project, design.FileName)));
        var fixedBuild = package.Build(project, "ci-policy-fixed");
        Assert.True(fixedBuild.ExitCode == 0, fixedBuild.Output);
        Assert.Empty(fixedBuild.PhasewardMessages);
        (_, results, _) = SarifLog.Read(fixedBuild.SarifPath);
        Assert.DoesNotContain(results, r => r.IsPhaseward && r.Level is "warning" or "error");
    }
}
