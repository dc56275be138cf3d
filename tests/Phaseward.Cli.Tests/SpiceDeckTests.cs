using System;
using System.IO;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Cli.Reproduction;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>
/// --spice and --confirm on the Quorvane samples. The simulated figures come from ngspice runs of the written decks
/// (ngspice-39, batch mode; .ci/run installs it); the estimates are the findings' own figures.
/// </summary>
public sealed class SpiceDeckTests : IDisposable
{
    private readonly string directory = NewTempDirectory();

    public void Dispose() => Directory.Delete(directory, recursive: true);

    [Fact]
    public void EachFindingGetsADeckNamedByDesignRuleAndNumber()
    {
        var decks = Path.Combine(directory, "decks");
        var run = Of(QuorvaneDll, "--spice", decks);

        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        var files = Directory.GetFiles(decks, "*.cir", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(decks, f).Replace('\\', '/')).OrderBy(f => f, StringComparer.Ordinal).ToArray();
        Assert.Contains("ChannelSelect/PW2001-1.cir", files);
        Assert.Contains("BurstCapture/PW3001-1.cir", files);
        Assert.Contains("Housekeeping/PW3002-1.cir", files);
        Assert.Contains("TideAverager/PW1001-1.cir", files);
        Assert.Contains("BurstGate/PW1004-1.cir", files);
        Assert.Contains("WakeLogic/PW1005-1.cir", files);
        Assert.Contains("TelemetryBus/PW3004-1.cir", files);
        Assert.Contains("MooringHold/PW3005-1.cir", files);
        Assert.Contains("RadioHandoff/PW1003-1.cir", files);
        Assert.Contains($"{files.Length} SPICE deck(s) written to {Path.GetFullPath(decks)}", run.Out);
        var chain = File.ReadAllText(Path.Combine(decks, "ChannelSelect", "PW2001-1.cir"));
        Assert.StartsWith("* Phaseward reproducer deck: PW2001", chain);
        Assert.Contains("* estimate t50 = ", chain);
        Assert.Contains(".meas tran t50 ", chain);
        Assert.Contains("CAUTION: a first-order reproduction", chain);
        Assert.Contains(".include my-phaseward-models.lib", chain);
        Assert.Empty(Directory.GetFiles(decks, "*.tmp", SearchOption.AllDirectories));
    }

    [Fact]
    public void ConfirmPrintsEstimateSimulatedAndRatioAndThePageLinksTheDecks()
    {
        var decks = Path.Combine(directory, "decks");
        var html = Path.Combine(directory, "report.html");
        var run = Of(QuorvaneDll, "--spice", decks, "--confirm", "--html", html);

        Assert.Equal(ReportCommand.Clean, run.ExitCode);
        var row = run.Out.Split('\n').Single(l => l.Contains("ChannelSelect PW2001-1.cir") && l.Contains("t50"));
        var ratio = double.Parse(row.Split(' ', StringSplitOptions.RemoveEmptyEntries)[^1], System.Globalization.CultureInfo.InvariantCulture);
        Assert.InRange(ratio, 0.85, 1.15);
        Assert.DoesNotContain("failed", run.Out.Split("Decks run in ngspice")[1]);

        var page = ReadPage(html);
        var links = page.Descendants().Where(e => e.Name.LocalName == "a" && HasClass(e, "deck")).ToList();
        Assert.Contains(links, a => (string?)a.Attribute("href") == "decks/ChannelSelect/PW2001-1.cir");
        var simulated = page.Descendants().Where(e => HasClass(e, "simulated")).Select(e => e.Value).ToList();
        Assert.Contains(simulated, s => s.StartsWith("simulated: t50 = ", StringComparison.Ordinal) && s.Contains("(estimate "));
    }

    [Fact]
    public void AnUnwritableFolderIsAClearErrorAndNothingIsWritten()
    {
        var file = Path.Combine(directory, "buoy-log.txt");
        File.WriteAllText(file, "not a folder");
        var html = Path.Combine(directory, "report.html");
        var run = Of(QuorvaneDll, "--spice", Path.Combine(file, "decks"), "--html", html);

        Assert.Equal(ReportCommand.BadInput, run.ExitCode);
        Assert.Contains("cannot write SPICE decks to", run.Err);
        Assert.Contains("nothing was written", run.Err);
        Assert.False(File.Exists(html), "the page was written although the decks failed");
        Assert.Equal(new[] { file }, Directory.GetFileSystemEntries(directory));
    }

    [Fact]
    public void AMissingSimulatorIsSaidPlainly()
    {
        var decks = Path.Combine(directory, "decks");
        var line = new StringWriter();
        var catalogRun = Of(QuorvaneDll, "--spice", decks, "--design", "ChannelSelect");
        Assert.Equal(ReportCommand.Clean, catalogRun.ExitCode);
        var written = Directory.GetFiles(decks, "*.cir", SearchOption.AllDirectories);
        Assert.NotEmpty(written);

        var exported = DeckExportFor(decks);
        DeckConfirmation.Run(exported, line, ngspice: Path.Combine(directory, "no-such-ngspice"));

        Assert.Contains("ngspice is not on the PATH", line.ToString());
        Assert.Contains("the decks were written but not run", line.ToString());
    }

    // The decks of the ChannelSelect design, exported again in-process (the same code path the command uses).
    private static System.Collections.Generic.IReadOnlyList<ExportedDeck> DeckExportFor(string decks)
    {
        var catalog = Loading.LoadedDesigns.Load(QuorvaneDll, new[] { "ChannelSelect" });
        var reports = catalog.Designs
            .Select(d => Model.DesignRunner.Check(d, Model.DesignRunner.Elaborate(d, QuorvaneDll), Netlists.SourceSpan.Unknown, new Policy.ReportPolicy()))
            .ToList();
        return DeckExport.Write(decks, reports, TextWriter.Null);
    }
}
