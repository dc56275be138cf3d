using System;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Xml.Linq;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Sequencing;
using Phaseward.Storage;
using Quorvane;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>
/// The report of the Quorvane samples: its text tables and its HTML page (read as XML), checked against the figures
/// Phaseward computes for the same designs (Design.Check, TimingFigures, StorageNodes), not against a stored snapshot.
/// </summary>
public sealed class SampleReportTests : IDisposable
{
    private readonly string directory = NewTempDirectory();

    public void Dispose() => Directory.Delete(directory, recursive: true);

    [Fact]
    public void TextReportListsEveryFindingWithItsIdMessageAndLine()
    {
        var run = Of(QuorvaneDll);

        Assert.Equal(ReportCommand.Clean, run.ExitCode); // the samples' findings are warnings by default
        var checkedFindings = 0;
        foreach (var design in SampleDesigns())
        {
            var report = design.Check();
            checkedFindings += report.Findings.Count;
            Assert.Contains($"== Design '{design.Name}'", run.Out);
            foreach (var finding in report.Findings)
            {
                var line = run.Out.Split('\n').SingleOrDefault(l => l.Contains(finding.Message, StringComparison.Ordinal));
                Assert.True(line is not null, $"{design.Name}: '{finding.Message}' missing from\n{run.Out}");
                Assert.Contains(finding.RuleId, line);
                Assert.Contains($"{finding.Location.Path}:{finding.Location.Line}", line);
                Assert.Contains(finding.Rule.DefaultSeverity.ToString().ToLowerInvariant(), line);
            }
        }

        Assert.DoesNotContain("Skipped design", run.Out, StringComparison.Ordinal); // every Quorvane design has a public parameterless constructor
        // The loop above checked something: the samples show a rule each, so their findings cannot all be missing.
        Assert.True(checkedFindings >= 10, $"only {checkedFindings} findings in the samples");
    }

    [Fact]
    public void TextTablesCarryTheLatchAndRegisterFiguresAligned()
    {
        var run = Of(QuorvaneDll, "--design", nameof(PressureSampler));
        var netlist = new PressureSampler().Elaborate();
        var figures = TimingFigures.For(netlist, Corner.Slow); // the report draws and tabulates the slow corner the setup checks use
        var lines = run.Out.Split('\n');

        Assert.NotEmpty(figures.Latches);
        foreach (var latch in figures.Latches)
        {
            var row = lines.Single(l => l.TrimStart().StartsWith(latch.Name + " ", StringComparison.Ordinal) && l.Contains(latch.Phase.Name));
            foreach (var figure in new[] { latch.Setup, latch.DataToOutput, latch.Hold })
                Assert.Contains(figure.ToString(), row);
            Assert.Contains($"PressureSampler.cs:{latch.Latch.Span.Line}", row);
        }

        var register = Assert.Single(figures.Registers);
        var registerRow = lines.Single(l => l.TrimStart().StartsWith(register.Name + " ", StringComparison.Ordinal) && l.Contains("rising"));
        Assert.Contains(register.ClockToOutput.ToString(), registerRow);
        Assert.Contains("Registers (setup, clk-q: slow corner, delays ×1.3; clk-q min, hold: fast corner, delays ×0.75)", run.Out);
        Assert.Contains(TimingFigures.For(netlist, Corner.Fast).Registers.Single().Hold.ToString(), registerRow);

        // Aligned: every row of the latch table puts its columns at the header's offsets.
        var header = Array.FindIndex(lines, l => l.TrimStart().StartsWith("latch ", StringComparison.Ordinal));
        var phaseColumn = lines[header].IndexOf("phase", StringComparison.Ordinal);
        for (var i = header + 2; i < header + 2 + figures.Latches.Count; i++)
            Assert.Equal(figures.Latches[i - header - 2].Phase.Name, lines[i].Substring(phaseColumn).Split(' ')[0]);
    }

    [Fact]
    public void PassGateChainsAndStorageNodesCarryTheRulesFigures()
    {
        var run = Of(QuorvaneDll, "--design", nameof(ChannelSelect), "--design", nameof(Housekeeping));

        var channel = new ChannelSelect().Check();
        var pw2001 = Assert.Single(channel.Findings, f => f.RuleId == RuleCatalog.SeriesPassGates.Id);
        var elmore = new Time(double.Parse(pw2001.Properties[FindingPropertyKeys.ElmoreDelaySeconds], CultureInfo.InvariantCulture));
        var chainRow = run.Out.Split('\n').Single(l => l.Contains("TOO LONG", StringComparison.Ordinal));
        Assert.Contains(elmore.ToString(), chainRow);          // the Elmore delay in PW2001's message
        Assert.Contains(pw2001.Arguments[2], chainRow);
        // Single-pole 50 % point: t50 = 0.69 · τ, 0.69 ≈ ln 2 (common practice for an RC step response).
        Assert.Contains(new Time(0.69 * elmore.Seconds).ToString(), chainRow);

        var housekeeping = new Housekeeping().Elaborate();
        var nodes = StorageNodes.Of(housekeeping).ToList();
        Assert.NotEmpty(nodes); // Housekeeping holds dynamic storage nodes; the loop must have rows to check
        foreach (var node in nodes)
        {
            var row = run.Out.Split('\n').Single(l => l.TrimStart().StartsWith(node.Net.Name + " ", StringComparison.Ordinal));
            Assert.Contains(node.Retention.Time.ToString(), row);
            Assert.Contains(node.Retention.Capacitance.ToString(), row);
        }
    }

    [Fact]
    public void HtmlPageHasOneBarGroupPerLatchWithTitlesCarryingTheFigures()
    {
        var html = Path.Combine(directory, "quorvane.html");
        var run = Of(QuorvaneDll, "--html", html);
        Assert.Equal(ReportCommand.Clean, run.ExitCode);

        var page = ReadPage(html);
        var latchesChecked = 0;
        foreach (var design in SampleDesigns())
        {
            var netlist = design.Elaborate();
            var section = page.Descendants().Single(e => (string?)e.Attribute("data-design") == design.Name);
            var diagrams = section.Descendants(Svg + "svg").Where(s => HasClass(s, "timing-diagram")).ToList();
            Assert.Equal(Output.TimingDiagram.TimeBaseGroups(netlist.Clocks.Where(c => c.Kind == ClockKind.Root)).Count, diagrams.Count);

            var figures = TimingFigures.For(netlist, Corner.Slow); // the report draws and tabulates the slow corner the setup checks use
            var groups = section.Descendants(Svg + "g").Where(g => HasClass(g, "latch")).ToList();
            Assert.Equal(figures.Latches.Count, groups.Count);
            latchesChecked += figures.Latches.Count;
            foreach (var latch in figures.Latches)
            {
                var g = Assert.Single(groups, x => (string?)x.Attribute("data-latch") == latch.Name);
                var title = (string)g.Element(Svg + "title")!;
                Assert.Contains(latch.Name, title);
                Assert.Contains($"{latch.Latch.Span.Path}:{latch.Latch.Span.Line}", title);
                Assert.Contains($"setup {latch.Setup}", title);
                Assert.Contains($"clk-q {latch.ClockToOutput}", title);
                Assert.Contains($"hold {latch.Hold}", title);
                Assert.Equal(latch.Latch.IsStatic, HasClass(g, "static"));

                // One bar per transparency window inside the two periods drawn (a wrapping window gives a sliver at 0).
                var period = latch.Phase.Clock.Root.Period.Seconds;
                var roots = netlist.Clocks.Where(c => c.Kind == ClockKind.Root && TimeBase.Related(c, latch.Phase.Clock.Root));
                var cycle = roots.Aggregate(period, (t, c) => TimeBase.CommonMultiple(new Time(t), c.Period)?.Seconds ?? t);
                var expected = Output.TimingDiagram.Segments(latch.Window.Opens.Seconds, latch.Window.Length.Seconds, period, 2 * cycle).Count();
                Assert.Equal(expected, g.Elements(Svg + "rect").Count());
                Assert.InRange(expected, 2 * (int)Math.Round(cycle / period), 2 * (int)Math.Round(cycle / period) + 1);
            }
        }

        Assert.True(latchesChecked >= 10, $"only {latchesChecked} latches in the samples' pages");
    }

    [Fact]
    public void DiagramShadesEachClocksOverlapsAndHasALegend()
    {
        var html = Path.Combine(directory, "burst.html");
        Assert.Equal(0, Of(QuorvaneDll, "--design", nameof(BurstCapture), "--html", html).ExitCode);
        var svg = ReadPage(html).Descendants(Svg + "svg").Single(s => HasClass(s, "timing-diagram"));
        var netlist = new BurstCapture().Elaborate();

        // The root clock and the gated copy: both phases drawn as a waveform row, each clock's 1-1 and 0-0 shaded.
        var phases = svg.Descendants(Svg + "g").Where(g => HasClass(g, "phase")).Select(g => (string)g.Attribute("data-phase")!).ToList();
        Assert.Equal(netlist.Clocks.SelectMany(c => new[] { c.High.Name, c.Low.Name }), phases);
        Assert.Contains(svg.Descendants(Svg + "polyline"), p => HasClass(p, "stoppable")); // the gated clock can stop
        foreach (var clock in netlist.Clocks)
            foreach (var kind in new[] { "1-1", "0-0" })
            {
                var rects = svg.Descendants(Svg + "rect").Where(r => HasClass(r, "overlap") && (string?)r.Attribute("data-clock") == clock.Name
                    && (string?)r.Attribute("data-kind") == kind).ToList();
                Assert.InRange(rects.Count, 2, 3); // once per period drawn (and a sliver where it wraps)
                var overlaps = ClockOverlaps.Of(clock);
                Assert.Contains((kind == "1-1" ? overlaps.OneOne : overlaps.ZeroZero).Length.ToString(), (string)rects[0].Element(Svg + "title")!);
            }

        // PW3001 names wave_hold's node: its bars are outlined and its title carries the finding's message.
        var finding = Assert.Single(new BurstCapture().Check().Findings);
        var flagged = svg.Descendants(Svg + "g").Where(g => HasClass(g, "latch") && HasClass(g, "flagged")).ToList();
        var hold = Assert.Single(flagged);
        Assert.Equal("wave_hold", (string?)hold.Attribute("data-latch"));
        Assert.Contains(finding.Message, (string)hold.Element(Svg + "title")!);

        var legend = svg.Descendants(Svg + "g").Single(g => HasClass(g, "legend"));
        var legendTexts = legend.Elements(Svg + "text").Select(t => t.Value).ToList();
        Assert.Equal(new[] { "static latch", "dynamic latch", "in a finding", "phase conducts", "can stop", "1-1 overlap", "0-0 overlap" }, legendTexts);
    }

    [Fact]
    public void HtmlPageIsSelfContainedAndListsTheSameFindings()
    {
        var html = Path.Combine(directory, "tide.html");
        Assert.Equal(0, Of(QuorvaneDll, "--design", nameof(TideAverager), "--html", html).ExitCode);
        var text = File.ReadAllText(html);
        var page = ReadPage(html);

        Assert.DoesNotContain(page.Descendants(), e => e.Name.LocalName is "script" or "link" or "img" or "iframe" or "object");
        Assert.DoesNotContain(page.Descendants().Attributes(), a => a.Name.LocalName is "src" or "href" && !((string)a).StartsWith('#'));
        Assert.DoesNotContain("@import", text);
        Assert.DoesNotContain("url(http", text);

        var finding = Assert.Single(new TideAverager().Check().Findings);
        var row = Assert.Single(page.Descendants("table").Single(t => HasClass(t, "findings")).Element("tbody")!.Elements("tr"));
        var cells = row.Elements("td").Select(td => td.Value).ToList();
        Assert.Equal(new[] { "warning", finding.RuleId, $"{finding.Location.Path}:{finding.Location.Line}", finding.Message }, cells);

        var flagged = page.Descendants(Svg + "g").Where(g => HasClass(g, "flagged")).Select(g => (string?)g.Attribute("data-latch")).OrderBy(n => n);
        Assert.Equal(new[] { "tide_stage1", "tide_stage2" }, flagged); // PW1001: the latch reported and the one feeding it
    }

    [Fact]
    public void PolicyOptionsChangeWhatIsReported()
    {
        var strict = Of(QuorvaneDll, "--design", nameof(ChannelSelect), "--max-series-pass-gates", "10");
        Assert.Equal(0, strict.ExitCode);
        Assert.DoesNotContain(RuleCatalog.SeriesPassGates.Id + "  ", strict.Out);
        Assert.Contains("Findings: none", strict.Out);

        var bad = Of(QuorvaneDll, "--min-race-margin", "5");
        Assert.Equal(ReportCommand.BadInput, bad.ExitCode);
        Assert.Contains("'5'", bad.Err);
        Assert.Contains("--min-race-margin", bad.Err);
    }

    private static Design[] SampleDesigns() => new Design[]
    {
        new PressureSampler(), new BurstCapture(), new BurstCaptureStatic(), new ChannelSelect(), new ChannelSelectBuffered(),
        new TideAverager(), new TideAveragerTwoPhase(), new Housekeeping(), new HousekeepingStatic(), new StrainLanes(),
        new WakeLogic(), new WakeLogicRegistered(), new MooringHold(), new MooringHoldWeakKeeper(),
        new TelemetryBus(), new TelemetryBusSelected(), new BurstGate(), new BurstGateLatched(),
        new TwoPhaseTally(), new RadioHandoff(), new RadioHandoffSynchronized(), new WaveLog(), new WaveLogDecoded(),
        new SpectrumBins(), new SpectrumBinsTwoPhase(),
    };

    [Fact]
    public void TheSpectrumSampleWrittenWithBlocksKeepsEveryBinAtRunTimeAndItsFixIsClean()
    {
        // Six bins placed from LINQ, each a same-phase latch pair: six findings at run time, one per bin, named by the
        // bin's place in the hierarchy (the analyzers group them into one diagnostic: SpectrumBinsSampleTests).
        var findings = new SpectrumBins().Check().Findings;
        Assert.Equal(6, findings.Count);
        Assert.All(findings, f => Assert.Equal(RuleCatalog.SameWindowLatches.Id, f.RuleId));
        foreach (var bin in new[] { "swell", "groundswell", "sea", "chop", "ripple", "spray" })
            Assert.Single(findings, f => f.Message.StartsWith($"Latch '{bin}.count' takes its data from latch '{bin}.held'", StringComparison.Ordinal));
        Assert.Empty(new SpectrumBinsTwoPhase().Check().Findings);
    }

    [Fact]
    public void TheNonOverlappingTwoPhaseSampleIsCleanAndTheCrossingSampleShowsPw1003AndItsFix()
    {
        // Two root clocks of 2 ns, 40 % high, the second offset by 1 ns: phases 200 ps apart (> the 30 ps skew).
        Assert.Empty(new TwoPhaseTally().Check().Findings);
        var crossing = Assert.Single(new RadioHandoff().Check().Findings);
        Assert.Equal(RuleCatalog.ClockCrossing.Id, crossing.RuleId);
        Assert.Contains("'tx' on clock 'radio' takes data from latch 'sample.slave' on clock 'sensor'", crossing.Message);
        Assert.Empty(new RadioHandoffSynchronized().Check().Findings);
    }

    [Fact]
    public void TheWaveLogSampleSharesChargeUntilItsDecodedSelectsAreStatedExclusive()
    {
        // Four invented 40 fF cells on a bit line of wire 1 + four terminals 4 × 1.5 + the sense inverter's gate 2 = 9 fF.
        // Requests not known exclusive: C2 = 9 + 3 × 40 = 129 fF, droop 1.2 V × 129 / 169 = 916 mV (conservation of charge,
        // common practice). Decoded and stated exclusive: droop 1.2 V × 9 / 49 = 220 mV, under the tolerated 300 mV.
        var findings = new WaveLog().Check().Findings;
        Assert.Equal(4, findings.Count(f => f.RuleId == RuleCatalog.ChargeSharing.Id));
        Assert.Contains("(C2 = 129 fF, counting 3 more floating nodes", findings.First(f => f.RuleId == RuleCatalog.ChargeSharing.Id).Message);
        Assert.Contains("a droop of 916 mV", findings.First(f => f.RuleId == RuleCatalog.ChargeSharing.Id).Message);
        Assert.Single(findings, f => f.RuleId == RuleCatalog.FightingDrivers.Id);
        Assert.Empty(new WaveLogDecoded().Check().Findings);
    }

    [Fact]
    public void TheBurstGateSampleShowsPw1004AndTheLatchedEnableFixesIt()
    {
        // The arming register's slave opens on the rising edge, while the gate passes the 10 ns sample clock (high over [0, 5 ns)).
        var gate = Assert.Single(new BurstGate().Check().Findings);
        Assert.Equal(RuleCatalog.ClockGateEnable.Id, gate.RuleId);
        Assert.Contains("Clock gate 'burst' passes clock 'sample' during [0 s, 5 ns) (while it is high), but its enable 'burst_armed' can change during [0 s, ", gate.Message);
        Assert.Contains("(from latch 'burst_armed.slave', transparent in sample.High", gate.Message);
        Assert.Empty(new BurstGateLatched().Check().Findings);
    }

    [Fact]
    public void RelatedRootClocksShareOneDiagramAndAnIndependentClockIsDrawnApart()
    {
        var tally = Assert.Single(Diagrams(nameof(TwoPhaseTally)));
        Assert.Equal("phi1 phi2", (string?)tally.Attribute("data-root-clock"));
        var phases = tally.Descendants(Svg + "g").Where(g => HasClass(g, "phase")).Select(g => (string?)g.Attribute("data-phase")).ToList();
        Assert.Equal(new[] { "phi1.High", "phi1.Low", "phi2.High", "phi2.Low" }, phases);

        var handoff = Diagrams(nameof(RadioHandoff));
        Assert.Equal(new[] { "sensor", "radio" }, handoff.Select(d => (string?)d.Attribute("data-root-clock")).ToArray());
    }

    private System.Collections.Generic.List<XElement> Diagrams(string design)
    {
        var html = Path.Combine(directory, design + ".html");
        Assert.Equal(0, Of(QuorvaneDll, "--design", design, "--html", html).ExitCode);
        return ReadPage(html).Descendants(Svg + "svg").Where(s => HasClass(s, "timing-diagram")).ToList();
    }
}
