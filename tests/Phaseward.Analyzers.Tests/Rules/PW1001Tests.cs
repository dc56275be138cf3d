using System.Collections.Immutable;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;
using Microsoft.CodeAnalysis.Text;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW1001 through the analyzer: same-window latches in series are reported at the second latch's call, the first as
/// related location. The condition (same root clock, same polarity) is structural, common practice for two-phase
/// latch design (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10, two-phase latch clocking; from memory).
/// </summary>
public class PW1001Tests
{
    private static DiagnosticResult Pw1001(string latch, string source, string phase)
        => new DiagnosticResult(RuleCatalog.SameWindowLatches.Id, DiagnosticSeverity.Warning)
            .WithMessage($"Latch '{latch}' takes its data from latch '{source}' and both are transparent in {phase}: data can run through both in one phase");

    private static Task Verify(string source, params DiagnosticResult[] expected)
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(source, expected).RunAsync();

    [Fact]
    public Task PlainLatchesOnTheSamePhase()
        => Verify(Design("Front", """
            var sample = c.Clock("sample", 4.Nanoseconds());
            var captured = {|#1:c.DynamicLatch(c.Input("comparator"), sample.High, "capture")|};
            var shaped = {|#0:c.StaticLatch(c.Inverter(captured), sample.High, "shape")|};
            c.Output("y", shaped);
            """),
            Pw1001("shape", "capture", "sample.High").WithLocation(0).WithLocation(1));

    [Fact]
    public Task MasterSlavePairOnComplementaryPhasesAndRegistersAreClean()
        => Verify(Design("Clean", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var master = c.DynamicLatch(c.Input("d"), clk.Low, "master");
            var slave = c.StaticLatch(master, clk.High, "slave");
            var r1 = c.DynamicRegister(slave, clk, "R1");
            c.Output("q", c.StaticRegister(r1, clk, "R2"));
            """));

    [Fact]
    public Task LatchOnTheMastersPhaseFeedingARegisterIsReportedAtTheRegister()
        => Verify(Design("IntoRegister", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var early = {|#1:c.DynamicLatch(c.Input("d"), clk.Low, "early")|};
            c.Output("q", {|#0:c.DynamicRegister(c.Inverter(early), clk, "R")|});
            """),
            Pw1001("R.master", "early", "clk.Low").WithLocation(0).WithLocation(1));

    [Fact]
    public Task HandBuiltLatchesAreLatchesLikeAnyOther()
        => Verify(Design("ByHand", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var store = c.Node("store");
            {|#1:c.TransmissionGate(c.Input("d"), clk.High, store)|};
            var q = c.Inverter(store, "q");
            var store2 = c.Node("store2");
            {|#0:c.TransmissionGate(q, clk.High, store2)|};
            c.Output("y", c.Inverter(store2));
            """),
            Pw1001("store2", "store", "clk.High").WithLocation(0).WithLocation(1));

    [Fact]
    public Task GatedAndBufferedCopiesShareTheirRootsWindows()
        => Verify(Design("Derived", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var gated = c.ClockGate(clk, c.Input("en"), name: "gated");
            var late = c.BufferedClock(clk, 50.Picoseconds(), "late");
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.High, "A")|};
            var b = {|#0:c.DynamicLatch(a, gated.High, "B")|};
            var m = {|#3:c.DynamicLatch(b, late.Low, "M")|};
            c.Output("q", {|#2:c.DynamicLatch(m, gated.Low, "N")|});
            """),
            Pw1001("B", "A", "clk.High and gated.High (together for 2.03 ns of every 4 ns)").WithLocation(0).WithLocation(1),
            Pw1001("N", "M", "late.Low and gated.Low (together for 1.98 ns of every 4 ns)").WithLocation(2).WithLocation(3));

    [Fact]
    public Task LatchesOnIndependentClocksAreNotComparedButTheCrossingIsReported()
        => Verify(Design("TwoRoots", """
            var a = c.Clock("a", 4.Nanoseconds());
            var b = c.Clock("b", 4.Nanoseconds(), independent: true);
            c.Output("q", {|#0:c.DynamicLatch({|#1:c.DynamicLatch(c.Input("d"), a.High, "A")|}, b.High, "B")|});
            """),
            new DiagnosticResult(RuleCatalog.ClockCrossing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                .WithMessage("'B' on clock 'b' takes data from latch 'A' on clock 'a', which has no fixed time relation to it ('b' is declared " +
                             "independent), without a synchronizer: it can sample the data while it changes and go metastable"));

    [Fact]
    public Task ALatchFedBackToItselfInItsOwnPhase()
        => Verify(Design("Loop", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var back = c.Node("back");
            var q = {|#0:c.DynamicLatch(back, clk.High, "L")|};
            c.Inverter(q, back);
            """),
            Pw1001("L", "L", "clk.High").WithLocation(0).WithLocation(0));

    [Fact]
    public Task HelperInTheSameFileIsReportedAtItsOwnCallOncePerPair()
        => Verify(Design("SameFileHelper", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var first = Stage(c, c.Input("d"), clk.High, "first");
            Stage(c, first, clk.High, "second");
            """, """
            private static Net Stage(Circuit c, Net d, Phase phase, string name)
                => c.Inverter({|#0:c.DynamicLatch(d, phase, name)|});
            """),
            // Both latches come from the one call in the helper: location and related location are that call.
            Pw1001("second", "first", "clk.High").WithLocation(0).WithLocation(0));

    [Fact]
    public Task HelperInAnotherFileIsReportedAtTheCallInDescribe()
    {
        var test = new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("OtherFileHelper", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var first = {|#2:Stages.Latch(c, c.Input("d"), clk.High, "first")|};
            {|#0:Stages.Latch(c, first, clk.High, "second")|};
            """),
            // Primary: the call in Describe; additional: the helper's latch call (the device's own line), then the
            // related location, the first latch (also in the helper).
            Pw1001("second", "first", "clk.High").WithLocation(0).WithLocation(1).WithLocation(1));
        test.TestState.Sources.Add(("/0/Stages.cs", """
            using Phaseward;

            public static class Stages
            {
                public static Net Latch(Circuit c, Net d, Phase phase, string name)
                    => c.Inverter({|#1:c.DynamicLatch(d, phase, name)|});
            }
            """));
        return test.RunAsync();
    }

    [Fact]
    public Task LatchChainBuiltInALoopGivesOneDistinctDiagnosticPerPair()
        => Verify(Design("LoopChain", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var net = c.Input("d");
            for (var i = 0; i < 3; i++)
                net = {|#0:c.DynamicLatch(net, clk.High, $"L{i}")|};
            c.Output("q", net);
            """),
            // Same location, same ID, different messages: nothing to de-duplicate.
            Pw1001("L1", "L0", "clk.High").WithLocation(0).WithLocation(0),
            Pw1001("L2", "L1", "clk.High").WithLocation(0).WithLocation(0));

    [Fact]
    public Task AlternatingPhasesInALoopAreClean()
        => Verify(Design("LoopAlternating", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var net = c.Input("d");
            for (var i = 0; i < 4; i++)
                net = c.DynamicLatch(net, i % 2 == 0 ? clk.High : clk.Low, $"L{i}");
            c.Output("q", net);
            """));

    private const string Pair = """
        var clk = c.Clock("clk", 4.Nanoseconds());
        var a = {|#1:c.DynamicLatch(c.Input("d"), clk.High, "A")|};
        c.Output("q", {|#0:c.DynamicLatch(a, clk.High, "B")|});
        """;

    [Fact]
    public async Task SeverityErrorFromEditorConfigInAWorkspace()
    {
        // Through a workspace project with an .editorconfig document, as the IDE and the build see it.
        using var workspace = new AdhocWorkspace();
        var project = workspace.AddProject("Severe", LanguageNames.CSharp)
            .WithCompilationOptions(new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary))
            .AddMetadataReferences(PhasewardTest.References);
        var source = Design("Severe", Pair.Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", ""));
        project = project.AddDocument("Severe.cs", source, filePath: "/src/Severe.cs").Project;
        project = project.AddAnalyzerConfigDocument(".editorconfig", SourceText.From(PhasewardTest.EditorConfig("dotnet_diagnostic.PW1001.severity = error").Content),
            filePath: "/.editorconfig").Project;
        var compilation = (await project.GetCompilationAsync())!;
        var diagnostics = await compilation.WithAnalyzers(ImmutableArray.Create<DiagnosticAnalyzer>(new ClockPhaseAnalyzer()), project.AnalyzerOptions)
            .GetAnalyzerDiagnosticsAsync();

        var diagnostic = Assert.Single(diagnostics);
        Assert.Equal(RuleCatalog.SameWindowLatches.Id, diagnostic.Id);
        Assert.Equal(DiagnosticSeverity.Error, diagnostic.Severity);
    }

    [Fact]
    public Task SeveritySuggestion()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Mild", Pair),
                new DiagnosticResult(RuleCatalog.SameWindowLatches.Id, DiagnosticSeverity.Info).WithLocation(0).WithLocation(1)
                    .WithArguments("B", "A", "clk.High"))
            .WithEditorConfig("dotnet_diagnostic.PW1001.severity = suggestion")
            .RunAsync();

    [Fact]
    public Task SeverityNoneSilencesTheRule()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Silenced", Pair.Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")))
            .WithEditorConfig("dotnet_diagnostic.PW1001.severity = none")
            .RunAsync();
}
