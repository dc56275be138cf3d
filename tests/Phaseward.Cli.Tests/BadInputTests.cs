using System;
using System.IO;
using System.Linq;
using System.Xml.Linq;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>Each bad input gets exit code 2 and one message naming the file; no HTML page is left behind.</summary>
public sealed class BadInputTests : IClassFixture<DesignProjectFixture>, IDisposable
{
    private readonly DesignProjectFixture fixture;
    private readonly string directory = NewTempDirectory();

    public BadInputTests(DesignProjectFixture fixture) => this.fixture = fixture;

    public void Dispose() => Directory.Delete(directory, recursive: true);

    private string Html => Path.Combine(directory, "report.html");

    private void AssertNoPage()
    {
        Assert.False(File.Exists(Html), "an HTML page was written");
        Assert.Empty(Directory.GetFiles(directory, "*.tmp"));
    }

    [Fact]
    public void MissingPath()
    {
        var missing = Path.Combine(directory, "NoSuchDesign.csproj");
        var run = Of(missing, "--html", Html);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains($"'{missing}' does not exist", run.Err);
        AssertNoPage();
    }

    [Fact]
    public void FileThatIsNeitherProjectNorAssembly()
    {
        var notes = Path.Combine(directory, "buoy-notes.txt");
        File.WriteAllText(notes, "wave heights");
        var run = Of(notes, "--html", Html);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains($"'{notes}' is not a design project (.csproj) or a built design assembly (.dll)", run.Err);
        AssertNoPage();
    }

    [Fact]
    public void DllThatIsNotAnAssembly()
    {
        var fake = Path.Combine(directory, "Fake.dll");
        File.WriteAllText(fake, "not a PE file");
        var run = Of(fake, "--html", Html);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains($"'{fake}' is not a .NET assembly", run.Err);
        AssertNoPage();
    }

    [Fact]
    public void AssemblyWithoutDesigns()
    {
        var xunit = typeof(FactAttribute).Assembly.Location;
        var run = Of(xunit);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains($"'{xunit}' does not reference Phaseward", run.Err);
    }

    [Fact]
    public void ProjectThatFailsToBuild()
    {
        var project = Path.Combine(directory, "Broken.csproj");
        File.WriteAllText(project, """
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup><TargetFramework>net10.0</TargetFramework></PropertyGroup>
            </Project>
            """);
        File.WriteAllText(Path.Combine(directory, "Broken.cs"), "public class Broken { int x = ; }\n");
        var run = Of(project, "--html", Html);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains($"project '{project}' failed to build", run.Err);
        Assert.Contains("Broken.cs(1,", run.Err); // the compiler's error, with file and line
        AssertNoPage();
    }

    [Fact]
    public void DesignThatThrowsWhileElaborating()
    {
        var run = Of(fixture.Assembly, "--html", Html);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains("design 'Fixture.Throws'", run.Err);
        Assert.Contains(fixture.Assembly, run.Err);
        Assert.Contains("InvalidOperationException: " + DesignProjectFixture.ThrowMessage, run.Err);
        Assert.Contains("Designs.cs:10", run.Err); // the throw statement, from the design's symbols
        AssertNoPage();
    }

    [Fact]
    public void PageIsNotReplacedWhenAReportFails()
    {
        File.WriteAllText(Html, "previous report");
        var run = Of(fixture.Assembly, "--html", Html);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Equal("previous report", File.ReadAllText(Html));
    }

    [Fact]
    public void DesignWithoutClocksIsReportedWithItsFindings()
    {
        var run = Of(fixture.Assembly, "--design", "NoClocks", "--html", Html);
        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        Assert.Contains("design 'NoClocks' has no clocks", run.Out);
        Assert.Contains("Findings: none", run.Out);

        var page = ReadPage(Html);
        Assert.Single(page.Descendants("p"), p => HasClass(p, "no-clocks"));
        Assert.DoesNotContain(page.Descendants(Svg + "svg"), s => HasClass(s, "timing-diagram"));
    }

    [Fact]
    public void DesignsWithoutAParameterlessConstructorAreSkippedWithTheReason()
    {
        var run = Of(fixture.Assembly, "--design", "NeedsArgument");
        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        Assert.Contains("Skipped design Fixture.NeedsArgument: its constructor takes parameters (Int32 lanes) and the report tool "
            + "cannot choose their values; the analyzers check it at each 'new NeedsArgument(...)' in the source.", run.Out);
    }

    [Fact]
    public void ProjectIsBuiltAndRelatedRootClocksShareADiagram()
    {
        // The fixture built its project through the report's own build path; the designs load against the tool's Phaseward.
        var run = Of(fixture.Assembly, "--design", "TwoRoots", "--html", Html);
        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        var diagrams = ReadPage(Html).Descendants(Svg + "svg").Where(s => HasClass(s, "timing-diagram")).ToList();
        // 2 ns and 6 ns share the design's time base (common cycle 6 ns): one diagram with both clocks' latches.
        var diagram = Assert.Single(diagrams);
        Assert.Equal("fast slow", (string?)diagram.Attribute("data-root-clock"));
        Assert.Equal(new[] { "fast_capture", "slow_capture" },
            diagram.Descendants(Svg + "g").Where(g => HasClass(g, "latch")).Select(g => (string?)g.Attribute("data-latch")));
    }

    [Fact]
    public void UnknownDesignNameListsTheDesigns()
    {
        var run = Of(fixture.Assembly, "--design", "Nope");
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains("no design named 'Nope'", run.Err);
        Assert.Contains("TwoRoots", run.Err);
    }

    [Fact]
    public void UsageErrorsGetSystemCommandLineMessagesAndExitCodeTwo()
    {
        var none = Of();
        Assert.Equal(ReportCommand.BadInput, none.ExitCode);
        Assert.Contains("Required argument missing", none.Err);

        var unknown = Of(QuorvaneDll, "--colour");
        Assert.Equal(ReportCommand.BadInput, unknown.ExitCode);
        Assert.Contains("'--colour'", unknown.Err);

        var missing = Of(QuorvaneDll, "--html");
        Assert.Equal(ReportCommand.BadInput, missing.ExitCode);
        Assert.Contains("Required argument missing for option: '--html'", missing.Err);
        Assert.Empty(missing.Out);
    }
}
