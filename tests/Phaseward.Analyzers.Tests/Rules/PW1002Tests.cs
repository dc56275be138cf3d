using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW1002 through the analyzer. Reference: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design
/// Perspective", 2nd ed., ch. 7, dynamic transmission-gate register and clock overlap (section from memory): the
/// register is race-free while the 0-0 overlap stays below t_T1 + t_I1 + t_T2. With the test process
/// (<see cref="RuleSources"/>): 34.5 + 27.6 + 34.5 = 96.6 ps. The complement skew of a root clock is its overlap.
/// </summary>
public class PW1002Tests
{
    private static DiagnosticResult Pw1002(string latch, string source, string overlapKind, string clock, string fastest, string overlap, string margin,
        string required = "0 s")
        => new DiagnosticResult(RuleCatalog.OverlapRace.Id, DiagnosticSeverity.Warning)
            .WithMessage($"Latch '{latch}' races latch '{source}' through the {overlapKind} overlap of clock '{clock}': " +
                         $"the fastest path takes {fastest} while both pass gates conduct together for {overlap}, a margin of {margin}, below the required {required} (fast corner, delays ×1)");

    private static Task Verify(string source, params DiagnosticResult[] expected)
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(source, expected).RunAsync();

    [Fact]
    public Task WorkedExample_RegisterWhoseZeroZeroOverlapExceedsTheRaceDelay()
        // Skew 120 ps > 96.6 ps: margin −23.4 ps. Master and slave come from the one call: location and related location.
        => Verify(Design("Race", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 120.Picoseconds());
            c.Output("q", {|#0:c.DynamicRegister(c.Input("d"), clk, "R")|});
            """),
            Pw1002("R.slave", "R.master", "0-0", "clk", "96.6 ps", "120 ps", "-23.4 ps").WithLocation(0).WithLocation(0));

    [Fact]
    public Task RegisterBelowTheRaceDelayIsClean()
        => Verify(Design("NoRace", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 80.Picoseconds());
            c.Output("q", c.StaticRegister(c.DynamicRegister(c.Input("d"), clk, "R1"), clk, "R2"));
            """));

    [Fact]
    public Task PlainLatchPairRacesThroughTheOneOneOverlap()
        // Skew 100 ps, fastest 96.6 ps: margin −3.4 ps.
        => Verify(Design("Pair", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 100.Picoseconds());
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.High, "A")|};
            c.Output("q", {|#0:c.DynamicLatch(a, clk.Low, "B")|});
            """),
            Pw1002("B", "A", "1-1", "clk", "96.6 ps", "100 ps", "-3.4 ps").WithLocation(0).WithLocation(1));

    [Fact]
    public Task BufferedAndGatedCopiesShiftTheOverlap()
        // Skew 30 ps; B's clock is a gated copy of a copy buffered by 80 ps: B still conducts 110 ps after A opens,
        // margin 96.6 − 110 = −13.4 ps. Gating adds no delay.
        => Verify(Design("Derived", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
            var late = c.BufferedClock(clk, 80.Picoseconds(), "late");
            var gated = c.ClockGate(late, c.Input("en"), name: "gated");
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.High, "A")|};
            c.Output("q", {|#0:c.DynamicLatch(a, gated.Low, "B")|});
            """),
            Pw1002("B", "A", "1-1", "clk", "96.6 ps", "110 ps", "-13.4 ps").WithLocation(0).WithLocation(1));

    [Fact]
    public Task RegistersMadeInALoopGiveOneDiagnosticEach()
        => Verify(Design("Loop", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 120.Picoseconds());
            var net = c.Input("d");
            for (var i = 0; i < 2; i++)
                net = {|#0:c.DynamicRegister(net, clk, $"R{i}")|};
            c.Output("q", net);
            """),
            Pw1002("R0.slave", "R0.master", "0-0", "clk", "96.6 ps", "120 ps", "-23.4 ps").WithLocation(0).WithLocation(0)
                .FoundAtThisCall(2, "Loop", "R0.slave, R1.slave"));

    [Fact]
    public Task HelperInAnotherFileIsReportedAtTheCallInDescribe()
    {
        var test = new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Helper", """
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 120.Picoseconds());
            c.Output("q", {|#0:Cells.Register(c, c.Input("d"), clk)|});
            """),
            Pw1002("H.slave", "H.master", "0-0", "clk", "96.6 ps", "120 ps", "-23.4 ps").WithLocation(0).WithLocation(1).WithLocation(1));
        test.TestState.Sources.Add(("/0/Cells.cs", """
            using Phaseward;

            public static class Cells
            {
                public static Net Register(Circuit c, Net d, Clock clk) => {|#1:c.DynamicRegister(d, clk, "H")|};
            }
            """));
        return test.RunAsync();
    }

    private static readonly string Margin166 = Design("Margin", """
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 80.Picoseconds());
        c.Output("q", {|#0:c.DynamicRegister(c.Input("d"), clk, "R")|});
        """);

    [Fact]
    public Task MinRaceMarginOptionRaisesTheBar()
        // Margin 96.6 − 80 = 16.6 ps: clean by default (see RegisterBelowTheRaceDelayIsClean), reported at 20 ps as a
        // positive margin below the required one (not as a latch that can catch data).
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Margin166,
                Pw1002("R.slave", "R.master", "0-0", "clk", "96.6 ps", "80 ps", "16.6 ps", "20 ps").WithLocation(0).WithLocation(0))
            .WithEditorConfig("phaseward.min_race_margin = 20ps")
            .RunAsync();

    [Fact]
    public Task MinRaceMarginBelowTheMarginKeepsItClean()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Margin166.Replace("{|#0:", "").Replace("|}", ""))
            .WithEditorConfig("phaseward.min_race_margin = 0.015ns")
            .RunAsync();

    [Fact]
    public Task SeverityFromEditorConfig()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Margin166,
                new DiagnosticResult(RuleCatalog.OverlapRace.Id, DiagnosticSeverity.Info).WithLocation(0).WithLocation(0)
                    .WithArguments("R.slave", "R.master", "0-0", "clock 'clk'", "96.6 ps", "80 ps", "16.6 ps", "20 ps", "fast corner, delays ×1"))
            .WithEditorConfig("phaseward.min_race_margin = 20ps\ndotnet_diagnostic.PW1002.severity = suggestion")
            .RunAsync();
}
