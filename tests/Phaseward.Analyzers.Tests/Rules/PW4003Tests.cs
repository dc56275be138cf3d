using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW4003 through the analyzer. Time borrowing in two-phase latch paths (Weste &amp; Harris, "CMOS VLSI Design", 4th ed.,
/// ch. 10, time borrowing; section from memory). Clock 1 ns, 50 % duty, no overlap: windows of 500 ps; dynamic latches
/// set up in t_TG = 34.5 ps, so data must arrive within 465.5 ps of the window opening. Test process: <see cref="RuleSources"/>.
/// </summary>
public class PW4003Tests
{
    private static string Chain(string name, int first, int second) => Design(name, $$"""
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var net = c.DynamicLatch(c.Input("d"), clk.High, "L1");
        for (var i = 0; i < {{first}}; i++)
            net = c.Inverter(net);
        net = {|#1:c.DynamicLatch(net, clk.Low, "L2")|};
        for (var i = 0; i < {{second}}; i++)
            net = c.Inverter(net);
        c.Output("q", {|#0:c.DynamicLatch(net, clk.High, "L3")|});
        """);

    private static DiagnosticResult Pw4003(string arrival, string slack, DiagnosticSeverity severity = DiagnosticSeverity.Warning)
        => new DiagnosticResult(RuleCatalog.LatchBorrowing.Id, severity)
            .WithMessage($"Data from latch 'L2' reaches latch 'L3' {arrival} after 'L3' opens, but its phase (500 ps) less its setup time and clock skew (34.5 ps) " +
                         $"allows only 466 ps (slack {slack}; 'L2' had borrowed 142 ps; slow corner, delays ×1)")
            .WithLocation(0).WithLocation(1);

    [Fact]
    public Task WorkedExample_BorrowedTimeIsCarriedToTheNextStage()
        // The last stage before a latch also charges its storage node through the open entry gate (2 · 27.6 ps).
        // L1→L2: 34.5 + 22 · 27.6 − 500 = 141.7 ps borrowed; L2→L3: 34.5 + 141.7 + 29 · 27.6 − 500 = 476.6 ps > 465.5 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Chain("Borrow", 20, 27), Pw4003("477 ps", "-11.1 ps")).RunAsync();

    [Fact]
    public Task OneInverterLessFits()
        // 34.5 + 141.7 + 28 · 27.6 − 500 = 449.0 ps ≤ 465.5 ps: slack +16.5 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Chain("Fits", 20, 26).Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")).RunAsync();

    [Fact]
    public Task MinTimingSlackOptionReportsASmallPositiveSlack()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Chain("Required", 20, 26), Pw4003("449 ps", "16.5 ps"))
            .WithEditorConfig("phaseward.min_timing_slack = 20ps")
            .RunAsync();

    [Fact]
    public Task SeverityFromEditorConfig()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Chain("Mild", 20, 27), Pw4003("477 ps", "-11.1 ps", DiagnosticSeverity.Info))
            .WithEditorConfig("dotnet_diagnostic.PW4003.severity = suggestion")
            .RunAsync();

    [Fact]
    public Task LatchesFromASameFileHelperCalledInALoopAreReportedAtTheHelpersCall()
        // Stage i latches on clk.High for even i, clk.Low for odd i, after 29 inverters (the last one also charging the
        // next latch's storage node, 2 · 27.6 ps): with no borrowing before, 34.5 + 31 · 27.6 − 500 = 390.1 ps ≤ 465.5 ps into the second latch (it borrows 390.1 ps); the third then
        // gets 34.5 + 390.1 + 855.6 − 500 = 780.2 ps: slack 465.5 − 780.2 = −314.7 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Design("Stages", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
            var net = c.Input("d");
            for (var i = 0; i < 3; i++)
                net = Stage(c, net, i % 2 == 0 ? clk.High : clk.Low, $"S{i}");
            c.Output("q", net);
            """, """
            private static Net Stage(Circuit c, Net d, Phase phase, string name)
            {
                var net = {|#0:c.DynamicLatch(d, phase, name)|};
                for (var k = 0; k < 29; k++)
                    net = c.Inverter(net);
                return net;
            }
            """),
            new DiagnosticResult(RuleCatalog.LatchBorrowing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(0)
                .WithArguments("S2", "S1", "780 ps", "500 ps", "34.5 ps", "466 ps", "-315 ps", "390 ps", "slow corner, delays ×1")).RunAsync();
}
