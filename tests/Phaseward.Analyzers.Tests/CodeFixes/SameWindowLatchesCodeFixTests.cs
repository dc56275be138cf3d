using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.CodeFixes;

/// <summary>
/// The PW1001 code fix. Each fixed design is re-analysed by the framework and must compile and carry no PW1001 (nor any
/// other clock-phase diagnostic): a latch and its source on complementary phases of one clock is the two-phase
/// discipline (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10; from memory).
/// </summary>
public class SameWindowLatchesCodeFixTests
{
    private static DiagnosticResult Pw1001(int location, int related, string latch, string source, string phase)
        => new DiagnosticResult(RuleCatalog.SameWindowLatches.Id, DiagnosticSeverity.Warning).WithLocation(location).WithLocation(related)
            .WithArguments(latch, source, phase);

    private static PhasewardCodeFixTest<ClockPhaseAnalyzer, SameWindowLatchesCodeFix> Test(string source, string fixedSource, params DiagnosticResult[] expected)
        => new(source, fixedSource, expected);

    [Fact]
    public Task SwitchesClockHighToClockLowKeepingComments()
        => Test(Design("Front", """
            var sample = c.Clock("sample", 4.Nanoseconds());
            // capture the comparator while sample is high
            var captured = {|#1:c.DynamicLatch(c.Input("comparator"), sample.High, "capture")|};
            var shaped = {|#0:c.StaticLatch(c.Inverter(captured), /* shaping */ sample.High /* phase */, "shape")|}; // second stage
            c.Output("y", shaped);
            """), Design("Front", """
            var sample = c.Clock("sample", 4.Nanoseconds());
            // capture the comparator while sample is high
            var captured = c.DynamicLatch(c.Input("comparator"), sample.High, "capture");
            var shaped = c.StaticLatch(c.Inverter(captured), /* shaping */ sample.Low /* phase */, "shape"); // second stage
            c.Output("y", shaped);
            """), Pw1001(0, 1, "shape", "capture", "sample.High"))
            .Choosing(EquivalenceKeys.SwitchLatchPhase).RunAsync();

    [Fact]
    public Task SwitchesAGatedClocksPhaseAndANamedArgument()
        => Test(Design("Gated", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var gated = c.ClockGate(clk, c.Input("en"), name: "gated");
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.Low, "A")|};
            c.Output("q", {|#0:c.DynamicLatch(a, name: "B", transparent: gated.Low)|});
            """), Design("Gated", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var gated = c.ClockGate(clk, c.Input("en"), name: "gated");
            var a = c.DynamicLatch(c.Input("d"), clk.Low, "A");
            c.Output("q", c.DynamicLatch(a, name: "B", transparent: gated.High));
            """), Pw1001(0, 1, "B", "A", "clk.Low and gated.Low (together for 2.03 ns of every 4 ns)"))
            .RunAsync();

    [Fact]
    public Task APhaseHeldInALocalBecomesItsComplement()
        => Test(Design("Local", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            Phase open = clk.High;
            var a = {|#1:c.DynamicLatch(c.Input("d"), open, "A")|};
            c.Output("q", {|#0:c.DynamicLatch(a, open, "B")|});
            """), Design("Local", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            Phase open = clk.High;
            var a = c.DynamicLatch(c.Input("d"), open, "A");
            c.Output("q", c.DynamicLatch(a, open.Complement, "B"));
            """), Pw1001(0, 1, "B", "A", "clk.High"))
            .RunAsync();

    [Fact]
    public Task AComplementIsUndone()
        => Test(Design("Undo", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.Low, "A")|};
            c.Output("q", {|#0:c.DynamicLatch(a, clk.High.Complement, "B")|});
            """), Design("Undo", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var a = c.DynamicLatch(c.Input("d"), clk.Low, "A");
            c.Output("q", c.DynamicLatch(a, clk.High, "B"));
            """), Pw1001(0, 1, "B", "A", "clk.Low"))
            .RunAsync();

    [Fact]
    public Task SwitchesAHandBuiltLatchsSingleGate()
        => Test(Design("ByHand", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var store = c.Node("store");
            {|#1:c.TransmissionGate(c.Input("d"), clk.High, store)|};
            var store2 = c.Node("store2");
            {|#0:c.TransmissionGate(c.Inverter(store), clk.High, store2)|};
            c.Output("y", c.Inverter(store2));
            """), Design("ByHand", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var store = c.Node("store");
            c.TransmissionGate(c.Input("d"), clk.High, store);
            var store2 = c.Node("store2");
            c.TransmissionGate(c.Inverter(store), clk.Low, store2);
            c.Output("y", c.Inverter(store2));
            """), Pw1001(0, 1, "store2", "store", "clk.High"))
            .RunAsync();

    [Theory]
    [InlineData("DynamicRegister", "DynamicLatch")]
    [InlineData("StaticRegister", "StaticLatch")]
    public Task InsertsALatchAndAnInverterBeforeARegister(string register, string latch)
        // The early latch (clk.Low) feeds R's master (clk.Low). The new latch on clk.High sits between them: early →
        // new (Low → High) and new → master (High → Low) alternate, and the inverter gives R the data it had before.
        => Test(Design("IntoRegister", $$"""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var early = {|#1:c.DynamicLatch(c.Input("d"), clk.Low, "early")|};
            c.Output("q", {|#0:c.{{register}}(c.Inverter(early) /* data */, clk, "R")|});
            """), Design("IntoRegister", $$"""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var early = c.DynamicLatch(c.Input("d"), clk.Low, "early");
            c.Output("q", c.{{register}}(c.Inverter(c.{{latch}}(c.Inverter(early), clk.High)) /* data */, clk, "R"));
            """), Pw1001(0, 1, "R.master", "early", "clk.Low"))
            .Choosing(EquivalenceKeys.InsertLatchBeforeRegister).RunAsync();

    // No fix where the result would be ambiguous: the fixed source is the source itself (no action offered).
    private static Task NoFix(string body, params DiagnosticResult[] expected)
    {
        var source = Design("Ambiguous", body);
        return Test(source, source, expected).RunAsync();
    }

    [Fact]
    public Task NoFixForALatchCallInALoop()
        // One call makes L0, L1, L2: switching it would move all three (still a chain).
        => NoFix("""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var net = c.Input("d");
            for (var i = 0; i < 3; i++)
                net = {|#0:c.DynamicLatch(net, clk.High, $"L{i}")|};
            c.Output("q", net);
            """, Pw1001(0, 0, "L1", "L0", "clk.High"), Pw1001(0, 0, "L2", "L1", "clk.High"));

    [Fact]
    public Task NoFixForALatchCallInAHelperMethod()
        // The helper's one call makes both latches, whatever phase each use passes.
        => NoFix("""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var first = Stage(c, c.Input("d"), clk.High, "first");
            Stage(c, first, clk.High, "second");
            }

            private static Net Stage(Circuit c, Net d, Phase phase, string name)
            {
                return c.Inverter({|#0:c.DynamicLatch(d, phase, name)|});
            """, Pw1001(0, 0, "second", "first", "clk.High"));

    [Fact]
    public Task NoFixForALatchFedBackToItself()
        => NoFix("""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var back = c.Node("back");
            var q = {|#0:c.DynamicLatch(back, clk.High, "L")|};
            c.Inverter(q, back);
            """, Pw1001(0, 0, "L", "L", "clk.High"));

    [Fact]
    public Task NoFixForAHandBuiltStaticLatchWhoseFeedbackGateIsAnotherCall()
        => NoFix("""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.High, "A")|};
            var store = c.Node("store");
            {|#0:c.TransmissionGate(c.Inverter(a), clk.High, store)|};
            var q = c.Inverter(store, "q");
            c.TransmissionGate(c.Inverter(q), clk.Low, store);
            """, Pw1001(0, 1, "store", "A", "clk.High"));

    [Fact]
    public Task NoInsertionWhenTheRegistersClockIsMadeAtTheCall()
        // Repeating c.BufferedClock(...) for the new latch would make a second clock.
        => NoFix("""
            var clk = c.Clock("clk", 4.Nanoseconds());
            var early = {|#1:c.DynamicLatch(c.Input("d"), clk.Low, "early")|};
            {|#0:c.DynamicRegister(c.Inverter(early), c.BufferedClock(clk, 10.Picoseconds(), "late"), "R")|};
            """, Pw1001(0, 1, "R.master", "early", "clk.Low and late.Low (together for 2.02 ns of every 4 ns)"));

    [Fact]
    public Task FixAllSwitchesAChainUpstreamFirstAndEveryOtherPair()
    {
        // A → B → C all on clk.High (PW1001 at B and at C) and D → E on clk.Low. Switching both B and C would leave B
        // and C in one window; FixAll switches B (which resolves C) and E.
        var source = Design("Pipeline", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var a = {|#1:c.DynamicLatch(c.Input("d"), clk.High, "A")|};
            var b = {|#0:c.DynamicLatch(a, clk.High, "B")|}; // middle
            c.Output("q", {|#2:c.DynamicLatch(b, clk.High, "C")|});
            var d = {|#4:c.DynamicLatch(c.Input("e"), clk.Low, "D")|};
            c.Output("r", {|#3:c.DynamicLatch(d, clk.Low, "E")|});
            """);
        var fixedSource = Design("Pipeline", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
            var b = c.DynamicLatch(a, clk.Low, "B"); // middle
            c.Output("q", c.DynamicLatch(b, clk.High, "C"));
            var d = c.DynamicLatch(c.Input("e"), clk.Low, "D");
            c.Output("r", c.DynamicLatch(d, clk.High, "E"));
            """);
        var test = Test(source, fixedSource,
            Pw1001(0, 1, "B", "A", "clk.High"), Pw1001(2, 0, "C", "B", "clk.High"), Pw1001(3, 4, "E", "D", "clk.Low"));
        // One at a time: B (C's finding goes with it), then E.
        test.NumberOfIncrementalIterations = 2;
        test.NumberOfFixAllIterations = 1;
        return test.Choosing(EquivalenceKeys.SwitchLatchPhase).RunAsync();
    }

    [Fact]
    public Task FixAllInsertsOneLatchPerRegister()
    {
        var source = Design("Registers", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var early = {|#1:c.DynamicLatch(c.Input("d"), clk.Low, "early")|};
            var late = {|#3:c.StaticLatch(c.Input("e"), clk.Low, "late")|};
            var r = {|#0:c.DynamicRegister(c.Nand(early, late), clk, "R")|};
            c.Output("q", {|#2:c.StaticRegister(late, clk, "S")|});
            """);
        var fixedSource = Design("Registers", """
            var clk = c.Clock("clk", 4.Nanoseconds());
            var early = c.DynamicLatch(c.Input("d"), clk.Low, "early");
            var late = c.StaticLatch(c.Input("e"), clk.Low, "late");
            var r = c.DynamicRegister(c.Inverter(c.DynamicLatch(c.Nand(early, late), clk.High)), clk, "R");
            c.Output("q", c.StaticRegister(c.Inverter(c.StaticLatch(late, clk.High)), clk, "S"));
            """);
        var test = Test(source, fixedSource,
            Pw1001(0, 1, "R.master", "early", "clk.Low"), Pw1001(0, 3, "R.master", "late", "clk.Low"), Pw1001(2, 3, "S.master", "late", "clk.Low"));
        test.NumberOfIncrementalIterations = 2;
        test.NumberOfFixAllIterations = 1;
        return test.Choosing(EquivalenceKeys.InsertLatchBeforeRegister).RunAsync();
    }
}
