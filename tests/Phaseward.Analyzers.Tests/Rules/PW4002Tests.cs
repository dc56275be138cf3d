using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW4002 through the analyzer. Constraint from Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10 (section from
/// memory): t_ccq + t_cd ≥ t_hold + t_skew. Test process (<see cref="RuleSources"/>): t_ccq = t_TG + t_inv = 62.1 ps, one
/// inverter 27.6 ps: 89.7 ps; hold = the 1-1 overlap less the capturing master's pass gate (the race model PW1002
/// shares) = 30 − 34.5 = −4.5 ps; the capture clock is a buffered copy, late by the skew.
/// </summary>
public class PW4002Tests
{
    private static string Pipeline(string name, int skewPs) => Design(name, $$"""
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
        var late = c.BufferedClock(clk, {{skewPs}}.Picoseconds(), "late");
        var q1 = {|#1:c.DynamicRegister(c.Input("d"), clk, "R1")|};
        c.Output("q", {|#0:c.StaticRegister(c.Inverter(q1), late, "R2")|});
        """);

    private static DiagnosticResult Pw4002(string skew, string slack)
        => new DiagnosticResult(RuleCatalog.RegisterHold.Id, DiagnosticSeverity.Warning)
            .WithMessage("Register 'R2' can lose its data on the path from register 'R1': minimum clock-to-output 62.1 ps + shortest path 27.6 ps = " +
                         $"89.7 ps is less than its hold time -4.5 ps plus clock skew {skew} (slack {slack}; fast corner, delays ×1)")
            .WithLocation(0).WithLocation(1);

    [Fact]
    public Task WorkedExample_ALateBufferedCaptureClockBreaksHold()
        // 89.7 − (−4.5 + 110) = −15.8 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Late", 110), Pw4002("110 ps", "-15.8 ps")).RunAsync();

    [Fact]
    public Task ASmallerSkewHolds()
        // 89.7 − (−4.5 + 90) = +4.2 ps; the page's former −10.3 ps case (skew 70 ps) is +24.2 ps under the one race model.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Holds", 90).Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")).RunAsync();

    [Fact]
    public Task MinTimingSlackOptionReportsASmallPositiveSlack()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Required", 90), Pw4002("90 ps", "4.2 ps"))
            .WithEditorConfig("phaseward.min_timing_slack = 10ps")
            .RunAsync();

    [Fact]
    public Task SeverityNoneSilencesTheRule()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Silenced", 110).Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", ""))
            .WithEditorConfig("dotnet_diagnostic.PW4002.severity = none")
            .RunAsync();

    [Fact]
    public Task GatedCaptureClockOnABufferedCopy()
        // Gating adds no delay: the skew is still the buffer's 110 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Design("Gated", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
            var gated = c.ClockGate(c.BufferedClock(clk, 110.Picoseconds(), "late"), c.Input("en"), name: "gated");
            var q1 = {|#1:c.DynamicRegister(c.Input("d"), clk, "R1")|};
            c.Output("q", {|#0:c.StaticRegister(c.Inverter(q1), gated, "R2")|});
            """), Pw4002("110 ps", "-15.8 ps")).RunAsync();
}
