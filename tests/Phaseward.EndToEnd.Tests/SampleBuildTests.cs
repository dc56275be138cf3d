using System;
using System.IO;
using System.Linq;
using System.Text.Json;
using Phaseward.Checking;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// Builds a sample with the real SDK and reads the compiler's SARIF log: if the analyzer were skipped by the compiler
/// (wrong Roslyn version, missing dependency), its results would be missing and these tests would fail.
/// </summary>
public class SampleBuildTests
{
    [Fact]
    public void AnalyzersLoadIntoARealBuildOfTheSample()
    {
        var artifacts = DotnetCli.NewTempDirectory();
        try
        {
            var sarif = Path.Combine(artifacts, "build.sarif");
            var project = Path.Combine(DotnetCli.RepositoryRoot, "samples", "Quorvane", "Quorvane.csproj");
            var (exitCode, output) = DotnetCli.Run(
                $"build \"{project}\" --artifacts-path \"{artifacts}\" -p:ErrorLog=\"{sarif}%2Cversion=2.1\"",
                DotnetCli.RepositoryRoot, TimeSpan.FromMinutes(5));

            Assert.True(exitCode == 0, output);
            Assert.DoesNotContain("AD0001", output);
            Assert.DoesNotContain("CS9057", output);

            using var log = JsonDocument.Parse(File.ReadAllText(sarif));
            Assert.Equal("2.1.0", log.RootElement.GetProperty("version").GetString());
            var results = log.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray().ToList();
            // StrainLanes reads the environment, which compile time cannot know: the elaborator, running inside the
            // compiler, reports PW9001 at that line of StrainLanes.cs.
            var found = Assert.Single(results, r => r.GetProperty("ruleId").GetString() == RuleCatalog.NotElaborated.Id);
            var location = found.GetProperty("locations")[0].GetProperty("physicalLocation");
            Assert.EndsWith("StrainLanes.cs", location.GetProperty("artifactLocation").GetProperty("uri").GetString());
            var expectedLine = Array.FindIndex(
                File.ReadAllLines(Path.Combine(DotnetCli.RepositoryRoot, "samples", "Quorvane", "StrainLanes.cs")),
                line => line.Contains("GetEnvironmentVariable", StringComparison.Ordinal)) + 1;
            Assert.Equal(expectedLine, location.GetProperty("region").GetProperty("startLine").GetInt32());
        }
        finally
        {
            Directory.Delete(artifacts, recursive: true);
        }
    }
}
