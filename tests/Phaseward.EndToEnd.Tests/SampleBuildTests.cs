using System;
using System.IO;
using System.Linq;
using System.Text.Json;

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
            var project = Path.Combine(DotnetCli.RepositoryRoot, "samples", "Tidewater", "Tidewater.csproj");
            var (exitCode, output) = DotnetCli.Run(
                $"build \"{project}\" --artifacts-path \"{artifacts}\" -p:ErrorLog=\"{sarif}%2Cversion=2.1\"",
                DotnetCli.RepositoryRoot, TimeSpan.FromMinutes(5));

            Assert.True(exitCode == 0, output);
            Assert.DoesNotContain("AD0001", output);
            Assert.DoesNotContain("CS9057", output);

            using var log = JsonDocument.Parse(File.ReadAllText(sarif));
            Assert.Equal("2.1.0", log.RootElement.GetProperty("version").GetString());
            var results = log.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray().ToList();
            var found = results
                .Where(r => r.GetProperty("ruleId").GetString() == RuleIds.DesignFound)
                .Select(r => r.GetProperty("locations")[0].GetProperty("physicalLocation"))
                .Where(l => l.GetProperty("artifactLocation").GetProperty("uri").GetString()!.EndsWith("PressureSampler.cs", StringComparison.Ordinal))
                .ToList();
            var location = Assert.Single(found);
            Assert.True(location.GetProperty("region").GetProperty("startLine").GetInt32() > 0);
        }
        finally
        {
            Directory.Delete(artifacts, recursive: true);
        }
    }
}
