using System;
using System.IO;
using Phaseward.Checking;
using Quorvane;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>
/// Exit codes and where severities and options come from: the rule's default, the analyzer config files read by the
/// compiler's own reader (per source file: sections, globs, nested folders, <c>root = true</c>, global configs), the
/// command line. Each test writes its own layout around the shared project, so they run one after another.
/// </summary>
[Collection(nameof(LayeredDesignsCollection))]
public sealed class SeverityTests : IDisposable
{
    private readonly LayeredDesignsFixture project;

    public SeverityTests(LayeredDesignsFixture project) => this.project = project;

    public void Dispose()
    {
        foreach (var file in new[] { ".editorconfig", ".globalconfig", "Designs/.editorconfig", "Designs/Routes/.editorconfig" })
            project.Write(file, null);
    }

    [Fact]
    public void ErrorOptionMakesTheExitCodeOne()
    {
        var run = Of(QuorvaneDll, "--design", nameof(BurstCapture), "--error", RuleCatalog.DynamicNodeOnGatedClock.Id);
        Assert.Equal(ReportCommand.ErrorFindings, run.ExitCode);
        Assert.Contains("error     PW3001", run.Out);
        Assert.Contains("1 at error severity", run.Out);

        // The clean twin has nothing to raise.
        Assert.Equal(ReportCommand.Clean, Of(QuorvaneDll, "--design", nameof(BurstCaptureStatic), "--error", "*").ExitCode);
    }

    [Fact]
    public void NestedEditorConfigsApplyPerSourceFile()
    {
        project.Write(".editorconfig", "root = true\n\n[*.cs]\ndotnet_diagnostic.PW1001.severity = error\ndotnet_diagnostic.PW2001.severity = error\n");
        // Nearer files win, for the files below them only; the key is read as the analyzers read it (1_000).
        project.Write("Designs/Routes/.editorconfig", "[*.cs]\nphaseward.max_series_pass_gates = 1_000\n");

        var counter = Of(project.Assembly, "--design", "SwellCounter");
        Assert.Equal(ReportCommand.ErrorFindings, counter.ExitCode);
        Assert.Contains("error     PW1001", counter.Out);

        var route = Of(project.Assembly, "--design", "MastRoute");
        Assert.Equal(ReportCommand.Clean, route.ExitCode);
        Assert.Contains("Findings: none", route.Out);

        // A glob section for the routes folder, in the root file, turns PW2001 back on with a tighter limit.
        project.Write(".editorconfig", "root = true\n\n[*.cs]\ndotnet_diagnostic.PW2001.severity = error\n\n[Designs/Routes/**.cs]\nphaseward.max_series_pass_gates = 1_000\n");
        project.Write("Designs/Routes/.editorconfig", "[Mast*.cs]\nphaseward.max_series_pass_gates = 3\n");
        var tight = Of(project.Assembly, "--design", "MastRoute");
        Assert.Equal(ReportCommand.ErrorFindings, tight.ExitCode);
        Assert.Contains("(limit 3)", tight.Out);

        // The command line wins over the files; --no-editorconfig ignores them.
        Assert.Equal(ReportCommand.Clean, Of(project.Assembly, "--design", "MastRoute", "--warning", "PW2001").ExitCode);
        Assert.Equal(ReportCommand.Clean, Of(project.Assembly, "--design", "SwellCounter", "--no-editorconfig").ExitCode);
    }

    [Fact]
    public void RootTrueStopsTheSearchAndEditorConfigWinsOverGlobalConfig()
    {
        // Above root = true: not read.
        project.Write(".editorconfig", "[*.cs]\ndotnet_diagnostic.PW1001.severity = error\n");
        project.Write("Designs/.editorconfig", "root = true\n");
        Assert.Equal(ReportCommand.Clean, Of(project.Assembly, "--design", "SwellCounter").ExitCode);

        // A global config applies everywhere; a section of an .editorconfig wins over it for its files.
        project.Write(".globalconfig", "is_global = true\ndotnet_diagnostic.PW1001.severity = error\ndotnet_diagnostic.PW2001.severity = error\n");
        project.Write("Designs/.editorconfig", "root = true\n\n[Routes/*.cs]\ndotnet_diagnostic.PW2001.severity = none\n");
        var counter = Of(project.Assembly, "--design", "SwellCounter");
        Assert.Equal(ReportCommand.ErrorFindings, counter.ExitCode);
        Assert.Contains("error     PW1001", counter.Out);
        var route = Of(project.Assembly, "--design", "MastRoute");
        Assert.Equal(ReportCommand.Clean, route.ExitCode);
        Assert.Contains("left out: severity none", route.Out);
    }

    [Fact]
    public void AnUnusableOptionIsReportedOncePerFileAsInTheBuild()
    {
        project.Write(".editorconfig", "root = true\n\n[*.cs]\nphaseward.min_race_margin = soon\n");
        var run = Of(project.Assembly, "--design", "BowBeacon", "--design", "SternBeacon");
        // Beacons.cs holds both designs: one PW9004, with the first of them, as the analyzers report it once per file.
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(run.Out, "PW9004"));
        Assert.Contains("'soon'", run.Out);
    }

    [Fact]
    public void BulkSeverityKeysApplyBelowTheRuleKey()
    {
        project.Write(".editorconfig", "root = true\n\n[*.cs]\ndotnet_analyzer_diagnostic.severity = error\ndotnet_diagnostic.PW1001.severity = suggestion\n");
        var counter = Of(project.Assembly, "--design", "SwellCounter");
        Assert.Equal(ReportCommand.Clean, counter.ExitCode);
        Assert.Contains("info      PW1001", counter.Out);
        Assert.Equal(ReportCommand.ErrorFindings, Of(project.Assembly, "--design", "MastRoute").ExitCode);
    }

    [Fact]
    public void BadValuesInConfigFilesAreReportedAsTheCompilerDoes()
    {
        project.Write(".editorconfig", "root = true\n\n[*.cs]\ndotnet_diagnostic.PW1001.severity = loud\nphaseward.min_race_margin = soon\n");
        var run = Of(project.Assembly, "--design", "SwellCounter");
        // An unknown severity: the compiler's warning, naming the file and the value; the rule keeps its default.
        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        Assert.Contains("'loud'", run.Err);
        Assert.Contains(Path.Combine(project.Directory, ".editorconfig"), run.Err);
        Assert.Contains("warning   PW1001", run.Out);
        // An unusable option value: PW9004 at the design's Describe, the default applies.
        Assert.Contains("warning   PW9004", run.Out);
        Assert.Contains("The value 'soon' of option 'phaseward.min_race_margin' is not valid", run.Out);
        Assert.Contains("SwellCounter.cs:", run.Out);

        var unknown = Of(QuorvaneDll, "--error", "PW0000");
        Assert.Equal(ReportCommand.BadInput, unknown.ExitCode);
        Assert.Contains("'PW0000'", unknown.Err);
    }
}

[CollectionDefinition(nameof(LayeredDesignsCollection))]
public sealed class LayeredDesignsCollection : ICollectionFixture<LayeredDesignsFixture>
{
}
