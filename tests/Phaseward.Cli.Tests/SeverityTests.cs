using System.IO;
using Phaseward.Checking;
using Quorvane;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>Exit codes and where severities come from: the rule's default, .editorconfig above the input, the command line.</summary>
public sealed class SeverityTests : System.IDisposable
{
    private readonly string directory = NewTempDirectory();

    public void Dispose() => Directory.Delete(directory, recursive: true);

    [Fact]
    public void ErrorOptionMakesTheExitCodeOne()
    {
        var run = Of(QuorvaneDll, "--design", nameof(BurstCapture), "--error", RuleIds.DynamicNodeOnGatedClock);
        Assert.Equal(ReportCommand.ErrorFindings, run.ExitCode);
        Assert.Contains("error     PW3001", run.Out);
        Assert.Contains("1 at error severity", run.Out);

        // The clean twin has nothing to raise.
        Assert.Equal(ReportCommand.Clean, Of(QuorvaneDll, "--design", nameof(BurstCaptureStatic), "--error", "*").ExitCode);
    }

    [Fact]
    public void EditorConfigBesideTheInputSetsSeverities()
    {
        var dll = CopyQuorvane();
        File.WriteAllText(Path.Combine(directory, ".editorconfig"), """
            root = true

            [*.cs]
            dotnet_diagnostic.PW1001.severity = error
            dotnet_diagnostic.PW3002.severity = none

            [tests/**.cs]
            dotnet_diagnostic.PW1001.severity = none
            """);

        var averager = Of(dll, "--design", nameof(TideAverager));
        Assert.Equal(ReportCommand.ErrorFindings, averager.ExitCode);
        Assert.Contains("error     PW1001", averager.Out);

        var housekeeping = Of(dll, "--design", nameof(Housekeeping));
        Assert.Equal(ReportCommand.Clean, housekeeping.ExitCode);
        Assert.DoesNotContain("PW3002", housekeeping.Out);
        Assert.Contains("left out: severity none", housekeeping.Out);

        // The command line wins over the file; --no-editorconfig ignores it.
        Assert.Equal(ReportCommand.Clean, Of(dll, "--design", nameof(TideAverager), "--warning", "PW1001").ExitCode);
        Assert.Equal(ReportCommand.Clean, Of(dll, "--design", nameof(TideAverager), "--no-editorconfig").ExitCode);
    }

    [Fact]
    public void BadSeverityValuesNameTheFileKeyAndValue()
    {
        var dll = CopyQuorvane();
        var config = Path.Combine(directory, ".editorconfig");
        File.WriteAllText(config, "root = true\n[*]\ndotnet_diagnostic.PW1001.severity = loud\n");
        var run = Of(dll);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains(config, run.Err);
        Assert.Contains("'loud'", run.Err);

        var unknown = Of(QuorvaneDll, "--error", "PW0000");
        Assert.Equal(ReportCommand.BadInput, unknown.ExitCode);
        Assert.Contains("'PW0000'", unknown.Err);
    }

    [Fact]
    public void GlobsSelectTheSectionsForCSharpFiles()
    {
        Assert.True(Policy.EditorConfig.AppliesToCSharp("*"));
        Assert.True(Policy.EditorConfig.AppliesToCSharp("*.cs"));
        Assert.True(Policy.EditorConfig.AppliesToCSharp("*.{cs,vb}"));
        Assert.True(Policy.EditorConfig.AppliesToCSharp("**/*.cs"));
        Assert.False(Policy.EditorConfig.AppliesToCSharp("*.vb"));
        Assert.False(Policy.EditorConfig.AppliesToCSharp("*.{md,json}"));
        Assert.False(Policy.EditorConfig.AppliesToCSharp("tests/**.cs"));
    }

    private string CopyQuorvane()
    {
        foreach (var name in new[] { "Quorvane.dll", "Phaseward.dll" })
            File.Copy(Path.Combine(System.AppContext.BaseDirectory, name), Path.Combine(directory, name));
        return Path.Combine(directory, "Quorvane.dll");
    }
}
