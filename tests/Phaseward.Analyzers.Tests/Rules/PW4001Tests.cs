using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW4001 through the analyzer. Constraint from Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10 (section from
/// memory): T_c ≥ t_pcq + t_pd + t_setup. Test process (<see cref="RuleSources"/>): t_clk-q = t_TG + 2·t_inv = 89.7 ps,
/// setup = t_TG = 34.5 ps, five inverters 165.6 ps (the last one also charges R2's master storage node through the
/// open entry gate: 4 · 27.6 + 2 · 27.6 ps, a side branch being a capacitive load, Elmore 1948): 289.8 ps.
/// </summary>
public class PW4001Tests
{
    private static string Pipeline(string name, int periodPs) => Design(name, $$"""
        var clk = c.Clock("clk", {{periodPs}}.Picoseconds(), 0.5, 30.Picoseconds());
        var net = {|#1:c.DynamicRegister(c.Input("d"), clk, "R1")|};
        for (var i = 0; i < 5; i++)
            net = c.Inverter(net);
        c.Output("q", {|#0:c.DynamicRegister(net, clk, "R2")|});
        """);

    private static DiagnosticResult Pw4001(string available, string slack, DiagnosticSeverity severity = DiagnosticSeverity.Warning)
        => new DiagnosticResult(RuleCatalog.RegisterSetup.Id, severity)
            .WithMessage("Register 'R2' misses its setup time on the path from register 'R1': clock-to-output 89.7 ps + path 166 ps + " +
                         $"setup 34.5 ps = 290 ps exceeds the {available} available (slack {slack}; slow corner, delays ×1)")
            .WithLocation(0).WithLocation(1);

    [Fact]
    public Task WorkedExample_PathBuiltInALoopMissesA280PsPeriod()
        // 289.8 ps in 280 ps: slack −9.8 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Tight", 280), Pw4001("280 ps", "-9.8 ps")).RunAsync();

    [Fact]
    public Task TheSamePathFitsA300PsPeriod()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Fits", 300).Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")).RunAsync();

    [Fact]
    public Task MinTimingSlackOptionReportsASmallPositiveSlack()
        // Slack +10.2 ps against a required 15 ps.
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Required", 300), Pw4001("300 ps", "10.2 ps"))
            .WithEditorConfig("phaseward.min_timing_slack = 15ps")
            .RunAsync();

    [Fact]
    public Task SeverityFromEditorConfig()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("Mild", 280), Pw4001("280 ps", "-9.8 ps", DiagnosticSeverity.Info))
            .WithEditorConfig("dotnet_diagnostic.PW4001.severity = suggestion")
            .RunAsync();

    [Fact]
    public Task RegistersFromAHelperInAnotherFileAreReportedAtTheCallsInDescribe()
    {
        var test = new PhasewardAnalyzerTest<TimingAnalyzer>(Design("Helper", """
            var clk = c.Clock("clk", 280.Picoseconds(), 0.5, 30.Picoseconds());
            var net = {|#1:Cells.Register(c, c.Input("d"), clk, "R1")|};
            for (var i = 0; i < 5; i++)
                net = c.Inverter(net);
            c.Output("q", {|#0:Cells.Register(c, net, clk, "R2")|});
            """),
            // Primary: R2's call in Describe; additional: the helper's register call (R2's own span), then R1's span
            // (the related location, which is exact and so stays in the helper's file).
            new DiagnosticResult(RuleCatalog.RegisterSetup.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(2).WithLocation(2)
                .WithArguments("R2", "R1", "89.7 ps", "166 ps", "34.5 ps", "290 ps", "280 ps", "-9.8 ps", "slow corner, delays ×1", ""));
        test.TestState.Sources.Add(("/0/Cells.cs", """
            using Phaseward;

            public static class Cells
            {
                public static Net Register(Circuit c, Net d, Clock clk, string name) => {|#2:c.DynamicRegister(d, clk, name)|};
            }
            """));
        return test.RunAsync();
    }
}
