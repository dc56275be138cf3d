using System;
using System.IO;
using System.Linq;
using Phaseward.Checking;
using Quorvane;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>The command line as System.CommandLine reads it: generated help, checked values, response files, the order of severities.</summary>
public sealed class CommandLineTests : IDisposable
{
    private readonly string directory = NewTempDirectory();

    public void Dispose() => Directory.Delete(directory, recursive: true);

    [Theory]
    [InlineData("--help")]
    [InlineData("-h")]
    [InlineData("-?")]
    public void HelpIsGeneratedAndListsEveryOption(string flag)
    {
        var help = Of(flag);
        Assert.Equal(ReportCommand.Clean, help.ExitCode);
        Assert.Contains("phaseward-report <input> [options]", help.Out);
        foreach (var option in new[]
                 {
                     "--html <path>", "--spice <dir>", "--confirm", "--design <name>", "--error <IDs>", "--warning <IDs>", "--info <IDs>",
                     "--none <IDs>", "--max-series-pass-gates <n>", "--min-race-margin <time>", "--min-timing-slack <time>",
                     "--no-editorconfig", "--artifacts <dir>",
                 })
            Assert.Contains(option, help.Out);
        Assert.Contains("Exit code: 0 no error-severity findings, 1 findings at error severity, 2 bad input", help.Out);
        Assert.Contains("first-order estimates", help.Out);
    }

    [Theory]
    [InlineData("--max-series-pass-gates", "0", "a whole number from 1 to 10000")]
    [InlineData("--max-series-pass-gates", "many", "a whole number from 1 to 10000")]
    [InlineData("--min-race-margin", "5", "a duration of zero or more with its unit")]
    [InlineData("--min-timing-slack", "-1ns", "a duration of zero or more with its unit")]
    [InlineData("--error", "PW0000", "unknown rule ID 'PW0000' in --error")]
    [InlineData("--none", "PW1001,PW12", "unknown rule ID 'PW12' in --none")]
    public void BadValuesAreRefusedBeforeAnythingRunsWithExitCodeTwo(string option, string value, string expected)
    {
        var run = Of(QuorvaneDll, option, value);
        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains(expected, run.Err);
        Assert.Contains($"'{value.Split(',').Last()}'", run.Err);
        Assert.Contains(option, run.Err);
        Assert.Empty(run.Out);
    }

    [Fact]
    public void ThresholdsTakeTheValuesTheConfigFilesTake()
    {
        // 1_000 as in .editorconfig: accepted, and ChannelSelect's seven gates pass.
        var run = Of(QuorvaneDll, "--design", nameof(ChannelSelect), "--max-series-pass-gates", "1_000");
        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        Assert.Contains("Findings: none", run.Out);
    }

    [Fact]
    public void ResponseFilesHoldArguments()
    {
        var rsp = Path.Combine(directory, "burst.rsp");
        File.WriteAllText(rsp, $"--design\n{nameof(BurstCapture)}\n--error\n{RuleCatalog.DynamicNodeOnGatedClock.Id}\n");
        var run = Of(QuorvaneDll, "@" + rsp);
        Assert.Equal(ReportCommand.ErrorFindings, run.ExitCode);
        Assert.Contains("error     PW3001", run.Out);
        Assert.Single(run.Out.Split('\n'), l => l.StartsWith("== Design", StringComparison.Ordinal));

        var missing = Of(QuorvaneDll, "@" + Path.Combine(directory, "none.rsp"));
        Assert.Equal(ReportCommand.BadInput, missing.ExitCode);
        Assert.Contains("none.rsp", missing.Err);
    }

    [Fact]
    public void ALaterSeverityOptionWinsForTheSameRule()
    {
        var id = RuleCatalog.DynamicNodeOnGatedClock.Id;
        Assert.Equal(ReportCommand.Clean, Of(QuorvaneDll, "--design", nameof(BurstCapture), "--error", "*", "--warning", id).ExitCode);
        Assert.Equal(ReportCommand.ErrorFindings, Of(QuorvaneDll, "--design", nameof(BurstCapture), "--warning", id, "--error", "*").ExitCode);
        var none = Of(QuorvaneDll, "--design", nameof(BurstCapture), "--error", id, "--none", $"{RuleCatalog.SameWindowLatches.Id},{id}");
        Assert.Equal(ReportCommand.Clean, none.ExitCode);
        Assert.Contains("left out: severity none", none.Out);
        Assert.DoesNotContain(none.Out.Split('\n'), l => l.Contains(id + "  ", StringComparison.Ordinal));
    }
}
