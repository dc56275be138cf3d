using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using Phaseward.Checking;
using Phaseward.EndToEnd.Tests.Packaging;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// phaseward-report against real builds of a fresh design project: for several layouts of .editorconfig and
/// .globalconfig files the report and the build agree on every finding's severity and on the options (limits, invalid
/// values); and a project whose build fails on Phaseward's own findings (the CI policy) still gets its report.
/// </summary>
[Collection(PackagedPhasewardCollection.Name)]
public sealed class ReportConfigurationTests
{
    // "error     PW1001  /path/File.cs:12  message"
    private static readonly Regex ReportFinding = new(@"^[ \t]*(?<severity>error|warning|info)\s+(?<id>PW\d{4})\s+(?<file>\S+):(?<line>\d+)\s", RegexOptions.Multiline);

    private readonly PackagedPhaseward package;

    public ReportConfigurationTests(PackagedPhaseward package) => this.package = package;

    public static IEnumerable<object[]> Layouts() => new[]
    {
        // Sections with globs; a nested folder's own file with root = true (the parent's PW2001 = error stops above it);
        // an invalid value for one file only.
        new object[]
        {
            "nested",
            new Dictionary<string, string>
            {
                [".editorconfig"] = "root = true\n\n[*.cs]\ndotnet_diagnostic.PW1001.severity = none\ndotnet_diagnostic.PW3001.severity = error\n"
                    + "dotnet_diagnostic.PW2001.severity = error\nphaseward.max_series_pass_gates = 10\n\n[HeaterHold.cs]\nphaseward.min_timing_slack = soon\n",
                ["Routes/.editorconfig"] = "root = true\n\n[*.cs]\nphaseward.max_series_pass_gates = 1_000\n\n[Cellar*.cs]\nphaseward.max_series_pass_gates = 5\n"
                    + "dotnet_diagnostic.PW2001.severity = suggestion\n\n[{Barn,Mill}Route.cs]\nphaseward.max_series_pass_gates = 4\n",
            },
        },
        // A global config (the CI policy's form) under .editorconfig sections that win for their files; a category key
        // that loses to the global config's key for the rule.
        new object[]
        {
            "global",
            new Dictionary<string, string>
            {
                [".globalconfig"] = "is_global = true\ndotnet_diagnostic.PW1001.severity = error\ndotnet_diagnostic.PW2001.severity = error\n"
                    + "phaseward.max_series_pass_gates = 3\n",
                [".editorconfig"] = "root = true\n\n[Routes/Cellar*.cs]\ndotnet_diagnostic.PW2001.severity = warning\n",
                ["Routes/.editorconfig"] = "[Barn*.cs]\ndotnet_analyzer_diagnostic.category-Phaseward.PassGatePaths.severity = none\n",
            },
        },
        // The project's warning switches on top of the config: NoWarn drops a rule, TreatWarningsAsErrors makes the other
        // warnings errors except those in WarningsNotAsErrors; a suggestion stays a suggestion.
        new object[]
        {
            "switches",
            new Dictionary<string, string>
            {
                ["Directory.Build.props"] = "<Project>\n  <PropertyGroup>\n    <TreatWarningsAsErrors>true</TreatWarningsAsErrors>\n"
                    + "    <WarningsNotAsErrors>$(WarningsNotAsErrors);PW3001</WarningsNotAsErrors>\n    <NoWarn>$(NoWarn);PW1001</NoWarn>\n"
                    + "  </PropertyGroup>\n</Project>\n",
                [".editorconfig"] = "root = true\n\n[Routes/*.cs]\ndotnet_diagnostic.PW2001.severity = suggestion\n",
            },
        },
    };

    [Theory]
    [MemberData(nameof(Layouts))]
    public void ReportAndBuildAgreeOnSeveritiesAndOptions(string name, Dictionary<string, string> configFiles)
    {
        var project = package.CreateDesignProject("layout-" + name);
        // Two more six-gate routes in a nested folder: the limit and the severities differ per file there.
        Directory.CreateDirectory(Path.Combine(project, "Routes"));
        foreach (var route in new[] { "CellarRoute", "BarnRoute" })
            File.WriteAllText(Path.Combine(project, "Routes", route + ".cs"),
                FrostlineDesigns.SprinklerRoute.Source.Replace("SprinklerRoute", route, StringComparison.Ordinal));
        foreach (var (path, text) in configFiles)
            File.WriteAllText(Path.Combine(project, path), text);

        var build = package.Build(project, "layout-" + name);
        var (_, results, _) = SarifLog.Read(build.SarifPath);
        var built = results.Where(r => r.IsPhaseward && !r.Suppressed && !IsCompileTimeOnly(r.RuleId))
            .Select(r => $"{Severity(r.Level)} {r.RuleId} {r.FileName}:{r.StartLine}")
            .Order(StringComparer.Ordinal).ToList();

        var (exitCode, output) = package.Report(project);
        var reported = ReportFinding.Matches(output)
            .Select(m => $"{m.Groups["severity"].Value} {m.Groups["id"].Value} {Path.GetFileName(m.Groups["file"].Value)}:{m.Groups["line"].Value}")
            .Order(StringComparer.Ordinal).ToList();

        Assert.NotEmpty(built);
        Assert.True(reported.Count > 0, output);
        Assert.Equal(built, reported);
        if (name == "switches")
        {
            // Not agreement by accident: the switches did change the build's severities.
            Assert.Contains(built, b => b.StartsWith("error PW2001 SprinklerRoute.cs:", StringComparison.Ordinal));
            Assert.Contains(built, b => b.StartsWith("warning PW3001 HeaterHold.cs:", StringComparison.Ordinal));
            Assert.Contains(built, b => b.StartsWith("info PW2001 CellarRoute.cs:", StringComparison.Ordinal));
            Assert.DoesNotContain(built, b => b.Contains(" PW1001 ", StringComparison.Ordinal));
        }

        Assert.Equal(built.Any(b => b.StartsWith("error ", StringComparison.Ordinal)) ? 1 : 0, exitCode);
    }

    [Fact]
    public void BuildFailingOnTheCiPolicyStillGetsItsReport()
    {
        var project = package.CreateDesignProject("ci-policy-report");
        File.Copy(Path.Combine(DotnetCli.RepositoryRoot, "samples", "ci-policy.globalconfig"), Path.Combine(project, ".globalconfig"));

        // The build fails on PW1001, as the policy wants.
        var build = package.Build(project, "ci-policy-report");
        Assert.True(build.ExitCode != 0, build.Output);
        Assert.Contains(build.PhasewardMessages, m => m.Id == RuleCatalog.SameWindowLatches.Id && m.Severity == "error");

        // The report builds it anyway, says so, shows PW1001 as the error the build made of it, and exits 1.
        var (exitCode, output) = package.Report(project);
        Assert.Equal(1, exitCode);
        Assert.Contains("were kept from failing this build", output, StringComparison.Ordinal);
        var line = FrostlineDesigns.FrostCounter.ExpectedPosition.Line;
        Assert.Matches($@"(?m)^[ \t]*error\s+{RuleCatalog.SameWindowLatches.Id}\s+\S*{FrostlineDesigns.FrostCounter.FileName}:{line}\s", output);

        // The designer's own compile error still stops it, with the compiler's message and exit code 2.
        File.WriteAllText(Path.Combine(project, "Typo.cs"), "namespace Frostline { public class Typo { int x = ; } }\n");
        (exitCode, output) = package.Report(project);
        Assert.Equal(2, exitCode);
        Assert.Contains("failed to build", output, StringComparison.Ordinal);
        Assert.Matches(@"Typo\.cs\(1,\d+\): error CS\d{4}", output);
        Assert.DoesNotContain("error PW", output, StringComparison.Ordinal);
    }

    // PW9001-PW9003 are about compile-time elaboration, which the report (running the design) does not do.
    private static bool IsCompileTimeOnly(string id) => RuleCatalog.Find(id)?.Family == RuleFamily.Elaboration && id != RuleCatalog.InvalidOption.Id;

    private static string Severity(string sarifLevel) => sarifLevel switch
    {
        "note" => "info",
        _ => sarifLevel,
    };
}
