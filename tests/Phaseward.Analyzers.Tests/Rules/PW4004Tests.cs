using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW4004 through the analyzer: a pulse latch whose window is too short for its entry gate to charge the storage
/// node. Entry delay 0.69 · R · C (Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective",
/// 2nd ed., ch. 5; from memory): 0.69 · 5 kΩ · 60 fF = 207 ps against a 30 ps pulse.
/// </summary>
public class PW4004Tests
{
    private static string Heavy(string name, int pulsePs, int skewPs = 0) => Design(name, $$"""
        var clk = {|#1:c.Clock("pulse", 1.Nanoseconds(), {{pulsePs}} / 1000.0, {{skewPs}}.Picoseconds())|};
        var x = c.Node("pl.x");
        {|#0:c.TransmissionGate(c.Input("d"), clk.High, x)|};
        c.SetCapacitance(x, 60.Femtofarads());
        c.Output("q", c.Inverter(x, "pl"));
        """);

    private static DiagnosticResult Pw4004(string open, string fullyOn, string skew, string margin, DiagnosticSeverity severity = DiagnosticSeverity.Warning)
        => new DiagnosticResult(RuleCatalog.LatchWriteWindow.Id, severity)
            .WithMessage($"Latch 'pl.x' cannot be written in its window: it is open {open}, {fullyOn} of it with both halves of its entry gate on " +
                         $"(complement skew {skew}), but the entry gate needs 207 ps to charge storage node 'pl.x' (0.69·R·C with R = 5 kΩ, " +
                         $"C = 60 fF; margin {margin}; slow corner, delays ×1)")
            .WithLocation(0).WithLocation(1);

    [Fact]
    public Task A30PsPulseLatchChargingSixtyFemtofaradsIsReported()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Heavy("Pulse", 30), Pw4004("30 ps", "30 ps", "0 s", "-177 ps")).RunAsync();

    [Fact]
    public Task SkewIsTakenOffBothEndsOfTheWindow()
        // High time 230 ps, skew 25 ps: open 255 ps, fully on 205 ps < 207 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Heavy("Skewed", 230, 25), Pw4004("255 ps", "205 ps", "25 ps", "-2 ps")).RunAsync();

    [Fact]
    public Task AWideEnoughPulseWritesTheNode()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Heavy("Wide", 230, 15).Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")).RunAsync();

    [Fact]
    public Task MinTimingSlackOptionReportsASmallPositiveMargin()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Heavy("Required", 220), Pw4004("220 ps", "220 ps", "0 s", "13 ps"))
            .WithEditorConfig("phaseward.min_timing_slack = 20ps")
            .RunAsync();

    [Fact]
    public Task SeverityFromEditorConfig()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Heavy("Mild", 30), Pw4004("30 ps", "30 ps", "0 s", "-177 ps", DiagnosticSeverity.Info))
            .WithEditorConfig("dotnet_diagnostic.PW4004.severity = suggestion")
            .RunAsync();
}
