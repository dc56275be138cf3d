using System.Linq;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;
using Phaseward.Netlists;
using Phaseward.Rules.PassGatePaths;

namespace Phaseward.Analyzers.Tests.CodeFixes;

/// <summary>
/// PW2001's fixes: a restoring buffer (or inverter) at the split points of the optimal spacing. The verifier checks that
/// the fixed source compiles, keeps every comment and no longer has the diagnostic (the analyzer runs again on it). The
/// illustrative process gives a limit and spacing of 2 (see PW2001Tests), so a buffer goes after every second gate.
/// </summary>
public class PW2001CodeFixTests
{
    private static DiagnosticResult PW2001 => new(RuleCatalog.SeriesPassGates.Id, DiagnosticSeverity.Warning);

    private const string Straight = """
        using Phaseward;

        public sealed class Relay : Design
        {
            protected override void Describe(Circuit c)
            {
                var clk = c.Clock("sample", 10.Nanoseconds());
                // the sensor hop
                var n1 = {|#0:c.TransmissionGate(c.Input("a"), clk.High, "n1")|};
                var n2 = c.TransmissionGate(n1, clk.High, "n2"); // second hop
                var n3 = {|#1:c.TransmissionGate(/* carried */ n2, clk.High, "n3")|};
                c.Output("y", c.Inverter(n3));
            }
        }
        """;

    [Fact]
    public Task BufferGoesIntoTheArgumentThatCarriesTheChain()
        => new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>(Straight, """
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    // the sensor hop
                    var n1 = c.TransmissionGate(c.Input("a"), clk.High, "n1");
                    var n2 = c.TransmissionGate(n1, clk.High, "n2"); // second hop
                    var n3 = c.TransmissionGate(/* carried */ c.Buffer(n2), clk.High, "n3");
                    c.Output("y", c.Inverter(n3));
                }
            }
            """, PW2001.WithLocation(1).WithLocation(0))
            .Choosing(EquivalenceKeys.InsertRestoringBuffer)
            .RunAsync();

    [Fact]
    public Task InverterIsTheOtherChoice()
        => new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringInverterFix>(Straight,
                Straight.Replace("{|#0:", "").Replace("{|#1:", "").Replace(")|}", ")").Replace("/* carried */ n2", "/* carried */ c.Inverter(n2)"),
                PW2001.WithLocation(1).WithLocation(0))
            .Choosing(EquivalenceKeys.InsertRestoringInverter)
            .RunAsync();

    [Fact]
    public void TitlesSayWhatHappens()
    {
        Assert.Equal("Insert a restoring buffer", InsertRestoringBufferFix.Title);
        Assert.Equal("Insert a restoring inverter (inverts the data)", InsertRestoringInverterFix.Title);
    }

    // Five gates: splits after 2 and 4, so the buffers go into the third and fifth calls; the receiver keeps its name.
    [Fact]
    public Task EachSplitPointOfALongerChainGetsAStage()
        => new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>("""
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit circuit)
                {
                    var clk = circuit.Clock("sample", 10.Nanoseconds());
                    var n1 = {|#0:circuit.TransmissionGate(circuit.Input("a"), clk.High)|};
                    var n2 = circuit.TransmissionGate(n1, clk.High);
                    var n3 = {|#1:circuit.TransmissionGate(n2, clk.High)|};
                    var n4 = circuit.TransmissionGate(n3, clk.High);
                    var n5 = circuit.TransmissionGate(n4, clk.High);
                    circuit.Output("y", circuit.Inverter(n5));
                }
            }
            """, """
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit circuit)
                {
                    var clk = circuit.Clock("sample", 10.Nanoseconds());
                    var n1 = circuit.TransmissionGate(circuit.Input("a"), clk.High);
                    var n2 = circuit.TransmissionGate(n1, clk.High);
                    var n3 = circuit.TransmissionGate(circuit.Buffer(n2), clk.High);
                    var n4 = circuit.TransmissionGate(n3, clk.High);
                    var n5 = circuit.TransmissionGate(circuit.Buffer(n4), clk.High);
                    circuit.Output("y", circuit.Inverter(n5));
                }
            }
            """, PW2001.WithLocation(1).WithLocation(0))
            .RunAsync();

    // A wired mux tree (c.Node, drive-existing-net overloads) and a route gate: the buffer goes into the route gate.
    [Fact]
    public Task MuxTreeGetsItsStageBeforeTheRouteGate()
        => new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>("""
            using Phaseward;

            public sealed class Select4 : Design
            {
                protected override void Describe(Circuit c)
                {
                    var s0 = c.Input("s0");
                    var s0b = c.Inverter(s0);
                    var s1 = c.Input("s1");
                    var s1b = c.Inverter(s1);
                    var low = c.Node("low");
                    var high = c.Node("high");
                    var pick = c.Node("pick");
                    {|#0:c.TransmissionGate(c.Input("ch0"), s0b, low)|};
                    c.TransmissionGate(c.Input("ch1"), s0, low);
                    c.TransmissionGate(c.Input("ch2"), s0b, high);
                    c.TransmissionGate(c.Input("ch3"), s0, high);
                    c.TransmissionGate(low, s1b, pick);
                    c.TransmissionGate(high, s1, pick);
                    var routed = {|#1:c.TransmissionGate(pick, c.Input("route_enable"), "routed")|};
                    c.Output("y", c.Inverter(routed));
                }
            }
            """, """
            using Phaseward;

            public sealed class Select4 : Design
            {
                protected override void Describe(Circuit c)
                {
                    var s0 = c.Input("s0");
                    var s0b = c.Inverter(s0);
                    var s1 = c.Input("s1");
                    var s1b = c.Inverter(s1);
                    var low = c.Node("low");
                    var high = c.Node("high");
                    var pick = c.Node("pick");
                    c.TransmissionGate(c.Input("ch0"), s0b, low);
                    c.TransmissionGate(c.Input("ch1"), s0, low);
                    c.TransmissionGate(c.Input("ch2"), s0b, high);
                    c.TransmissionGate(c.Input("ch3"), s0, high);
                    c.TransmissionGate(low, s1b, pick);
                    c.TransmissionGate(high, s1, pick);
                    var routed = c.TransmissionGate(c.Buffer(pick), c.Input("route_enable"), "routed");
                    c.Output("y", c.Inverter(routed));
                }
            }
            """, PW2001.WithLocation(1).WithLocation(0))
            .RunAsync();

    // The gate after the split is made in a helper in another file, called once: the helper's call is fixed there.
    [Fact]
    public Task HelperInAnotherFileIsFixedWhereTheGateIsMade()
    {
        var test = new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>("""
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var first = {|#0:c.TransmissionGate(c.Input("a"), clk.High)|};
                    var second = c.TransmissionGate(first, clk.High);
                    c.Output("y", c.Inverter({|#1:Routing.Hop(c, second, clk.High)|}));
                }
            }
            """, """
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var first = c.TransmissionGate(c.Input("a"), clk.High);
                    var second = c.TransmissionGate(first, clk.High);
                    c.Output("y", c.Inverter(Routing.Hop(c, second, clk.High)));
                }
            }
            """, PW2001.WithLocation(1).WithLocation(2).WithLocation(0));
        test.TestState.Sources.Add(("/0/Routing.cs", """
            using Phaseward;

            public static class Routing
            {
                // one routing switch
                public static Net Hop(Circuit circuit, Net x, Phase when)
                    => {|#2:circuit.TransmissionGate(x, when, "hop")|};
            }
            """));
        test.FixedState.Sources.Add(("/0/Routing.cs", """
            using Phaseward;

            public static class Routing
            {
                // one routing switch
                public static Net Hop(Circuit circuit, Net x, Phase when)
                    => circuit.TransmissionGate(circuit.Buffer(x), when, "hop");
            }
            """));
        return test.RunAsync();
    }

    private const string Loop = """
        using Phaseward;

        public sealed class Row : Design
        {
            protected override void Describe(Circuit c)
            {
                var clk = c.Clock("sample", 10.Nanoseconds());
                var x = c.Input("a");
                for (var i = 0; i < 6; i++)
                {
                    // one routing switch per stage
                    x = {|#0:c.TransmissionGate(x, clk.High)|};
                }

                c.Output("y", c.Inverter(x));
            }
        }
        """;

    private const string LoopFixed = """
        using Phaseward;

        public sealed class Row : Design
        {
            protected override void Describe(Circuit c)
            {
                var clk = c.Clock("sample", 10.Nanoseconds());
                var x = c.Input("a");
                for (var i = 0; i < 6; i++)
                {
                    // one routing switch per stage
                    x = c.TransmissionGate(i > 0 && i % 2 == 0 ? c.Buffer(x) : x, clk.High);
                }

                c.Output("y", c.Inverter(x));
            }
        }
        """;

    // Six gates in a loop: splits after gates 2 and 4, i.e. before the gates of iterations 2 and 4.
    [Fact]
    public Task LoopGetsAStageEveryMthIteration()
        => new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>(Loop, LoopFixed, PW2001.WithLocation(0).WithLocation(0))
            .RunAsync();

    // The fixed loop elaborates to the intended netlist: the compile-time elaborator and the compiled design run at run
    // time agree, and the two buffers take the outputs of the second and fourth transmission gates.
    [Fact]
    public void FixedLoopElaboratesToBuffersAfterEverySecondGate()
    {
        var designs = new InMemoryDesigns(("/src/Row.cs", LoopFixed));
        var compileTime = designs.CompileTime("Row").Netlist!;
        var runTime = designs.RunTime("Row");
        Assert.Equal(NetlistText.Write(runTime, includeSpans: false), NetlistText.Write(compileTime, includeSpans: false));

        var gates = compileTime.Devices.Where(d => d.Kind == DeviceKind.TransmissionGate).ToList();
        var buffers = compileTime.Devices.Where(d => d.Kind == DeviceKind.Buffer).ToList();
        Assert.Equal(6, gates.Count);
        Assert.Equal(new[] { gates[1].Output, gates[3].Output }, buffers.Select(b => b.Inputs[0]));
        Assert.Equal(buffers[0].Output, gates[2].Inputs[0]);
        Assert.Equal(buffers[1].Output, gates[4].Inputs[0]);
        Assert.Empty(new PassGateChainRule().Check(new RuleContext(compileTime, RulePolicy.Default)));
    }

    // One gate before the loop and a loop from 1: chain positions 2..6 in iterations 1..5; splits after 2 and 4 are
    // before the gates of iterations 2 and 4.
    [Fact]
    public Task LoopOffsetIsTakenIntoTheCondition()
        => new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringInverterFix>("""
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = {|#0:c.TransmissionGate(c.Input("a"), clk.High)|};
                    for (var i = 1; i <= 5; i++)
                        x = {|#1:c.TransmissionGate(x, clk.High)|};
                    c.Output("y", c.Inverter(x));
                }
            }
            """, """
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = c.TransmissionGate(c.Input("a"), clk.High);
                    for (var i = 1; i <= 5; i++)
                        x = c.TransmissionGate(i % 2 == 0 ? c.Inverter(x) : x, clk.High);
                    c.Output("y", c.Inverter(x));
                }
            }
            """, PW2001.WithLocation(1).WithLocation(0))
            .Choosing(EquivalenceKeys.InsertRestoringInverter)
            .RunAsync();

    // Loops the fix cannot express are left alone: the call runs only in some iterations; the loop sits in a helper
    // called twice (both runs share the call); a mux tree built in nested loops (one call makes gates at every level).
    [Theory]
    [InlineData("""
        for (var i = 0; i < 6; i++)
            if (i != 3)
                x = {|#0:c.TransmissionGate(x, clk.High)|};
        """)]
    [InlineData("""
        var i = 0;
        while (i < 6)
        {
            x = {|#0:c.TransmissionGate(x, clk.High)|};
            i++;
        }
        """)]
    [InlineData("""
        for (var i = 0; i < 6; i++)
        {
            x = {|#0:c.TransmissionGate(x, clk.High)|};
            if (i == 10)
                break;
        }
        """)]
    public Task InexpressibleLoopsGetNoFix(string body)
    {
        var source = $$"""
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = c.Input("a");
            {{Indent(body, 8)}}
                    c.Output("y", c.Inverter(x));
                }
            }
            """;
        return new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>(source, source, PW2001.WithLocation(0).WithLocation(0)).RunAsync();
    }

    [Fact]
    public Task LoopInAHelperCalledTwiceGetsNoFix()
    {
        const string source = """
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = Hops(c, c.Input("a"), clk.High);
                    c.Output("y", c.Inverter(Hops(c, x, clk.High)));
                }

                private static Net Hops(Circuit c, Net x, Phase when)
                {
                    for (var i = 0; i < 2; i++)
                        x = {|#2:c.TransmissionGate(x, when)|};
                    return x;
                }
            }
            """;
        // Reported at the loop's call (same file), first gate the same call.
        return new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>(source, source, PW2001.WithLocation(2).WithLocation(2))
            .RunAsync();
    }

    [Fact]
    public Task MuxTreeBuiltInNestedLoopsGetsNoFix()
    {
        const string source = """
            using Phaseward;

            public sealed class Select8 : Design
            {
                protected override void Describe(Circuit c)
                {
                    var level = new Net[8];
                    for (var i = 0; i < level.Length; i++)
                        level[i] = c.Input($"ch{i}");
                    for (var bit = 0; level.Length > 1; bit++)
                    {
                        var select = c.Input($"sel{bit}");
                        var selectBar = c.Inverter(select);
                        var next = new Net[level.Length / 2];
                        for (var i = 0; i < next.Length; i++)
                        {
                            next[i] = c.Node($"mux{bit}_{i}");
                            {|#0:c.TransmissionGate(level[2 * i], selectBar, next[i])|};
                            {|#1:c.TransmissionGate(level[2 * i + 1], select, next[i])|};
                        }

                        level = next;
                    }

                    c.Output("y", c.Inverter(level[0]));
                }
            }
            """;
        return new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>(source, source,
            PW2001.WithLocation(0).WithLocation(0), PW2001.WithLocation(1).WithLocation(0)).RunAsync();
    }

    // Two arms of a mux, each three gates deep, into one node and then two route gates, all on phases that conduct
    // together (route gates on clk.Low would make each arm's run end at the mux: PW2001Tests): two findings whose fixes
    // share the buffer before the second route gate. FixAll applies each edit once.
    [Fact]
    public Task FixAllMergesSharedSplitPoints()
    {
        var test = new PhasewardCodeFixTest<PassGatePathAnalyzer, InsertRestoringBufferFix>("""
            using Phaseward;

            public sealed class Arms : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var s = c.Input("s");
                    var sb = c.Inverter(s);
                    var pick = c.Node("pick");
                    var a1 = {|#0:c.TransmissionGate(c.Input("a"), clk.High)|};
                    var a2 = c.TransmissionGate(a1, clk.High);
                    {|#1:c.TransmissionGate(a2, s, pick)|};
                    var b1 = {|#2:c.TransmissionGate(c.Input("b"), clk.High)|};
                    var b2 = c.TransmissionGate(b1, clk.High);
                    {|#3:c.TransmissionGate(b2, sb, pick)|};
                    var r1 = c.TransmissionGate(pick, clk.High);
                    var r2 = c.TransmissionGate(r1, clk.High);
                    c.Output("y", c.Inverter(r2));
                }
            }
            """, """
            using Phaseward;

            public sealed class Arms : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var s = c.Input("s");
                    var sb = c.Inverter(s);
                    var pick = c.Node("pick");
                    var a1 = c.TransmissionGate(c.Input("a"), clk.High);
                    var a2 = c.TransmissionGate(a1, clk.High);
                    c.TransmissionGate(c.Buffer(a2), s, pick);
                    var b1 = c.TransmissionGate(c.Input("b"), clk.High);
                    var b2 = c.TransmissionGate(b1, clk.High);
                    c.TransmissionGate(c.Buffer(b2), sb, pick);
                    var r1 = c.TransmissionGate(pick, clk.High);
                    var r2 = c.TransmissionGate(c.Buffer(r1), clk.High);
                    c.Output("y", c.Inverter(r2));
                }
            }
            """, PW2001.WithLocation(1).WithLocation(0), PW2001.WithLocation(3).WithLocation(2));
        test.NumberOfFixAllIterations = 1;
        test.NumberOfIncrementalIterations = 2;
        return test.RunAsync();
    }

    private static string Indent(string text, int spaces)
        => string.Join("\n", text.Replace("\r\n", "\n").Split('\n').Select(l => l.Length == 0 ? l : new string(' ', spaces) + l));
}
