using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;

namespace Phaseward.Analyzers.Tests.CodeFixes;

/// <summary>
/// "Use a static latch" / "Use a static register" for PW3001 and PW3002: the fixed design compiles, the finding is gone
/// (the static cell's node is never isolated: its input and feedback gates are on complementary phases), comments stay.
/// </summary>
public class UseStaticCellCodeFixTests
{
    private static DiagnosticResult PW3001(int marker = 0) => new DiagnosticResult(RuleCatalog.DynamicNodeOnGatedClock.Id, DiagnosticSeverity.Warning).WithLocation(marker).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations);

    private static DiagnosticResult PW3002(int marker = 0) => new DiagnosticResult(RuleCatalog.ClockTooSlowForDynamicStorage.Id, DiagnosticSeverity.Warning).WithLocation(marker).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations);

    private static PhasewardCodeFixTest<DynamicStorageAnalyzer, UseStaticCellCodeFix> Test(string source, string fixedSource, params DiagnosticResult[] expected)
        => new(source, fixedSource, expected);

    [Fact]
    public Task DynamicLatchOnAGatedClockBecomesAStaticLatchWithTheSameArguments()
        => Test("""
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    // Holds the wave bit between bursts.
                    var held = {|#0:c./* cell */DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold")|}; // the hazard
                    c.Output("wave_sample", held);
                }
            }
            """, """
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    // Holds the wave bit between bursts.
                    var held = c./* cell */StaticLatch(c.Input("wave_bit"), burst.High, "wave_hold"); // the hazard
                    c.Output("wave_sample", held);
                }
            }
            """, PW3001()).Choosing(EquivalenceKeys.UseStaticLatch).RunAsync();

    [Fact]
    public Task DynamicRegisterOnAGatedClockBecomesAStaticRegister()
        => Test("""
            using Phaseward;

            public sealed class BurstCount : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst");
                    c.Output("count", {|#0:c.DynamicRegister(c.Input("count_enable"), burst, name: "count")|});
                }
            }
            """, """
            using Phaseward;

            public sealed class BurstCount : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst");
                    c.Output("count", c.StaticRegister(c.Input("count_enable"), burst, name: "count"));
                }
            }
            """, PW3001()).Choosing(EquivalenceKeys.UseStaticRegister).RunAsync();

    [Fact]
    public Task SlowDynamicRegistersInALoopBecomeStaticRegisters()
        // One call, two bits, two nodes each: four findings, one rewrite.
        => Test("""
            using Phaseward;

            public sealed class Housekeeping : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var carry = c.Input("count_enable");
                    for (var bit = 0; bit < 2; bit++)
                    {
                        var state = {|#0:c.DynamicRegister(carry, tick, $"battery_count{bit}")|};
                        carry = c.Nand(state, carry);
                    }

                    c.Output("battery_carry", carry);
                }
            }
            """, """
            using Phaseward;

            public sealed class Housekeeping : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var carry = c.Input("count_enable");
                    for (var bit = 0; bit < 2; bit++)
                    {
                        var state = c.StaticRegister(carry, tick, $"battery_count{bit}");
                        carry = c.Nand(state, carry);
                    }

                    c.Output("battery_carry", carry);
                }
            }
            """, PW3002(), PW3002(), PW3002(), PW3002()).Choosing(EquivalenceKeys.UseStaticRegister).RunAsync();

    [Fact]
    public Task FixAllTurnsEverySlowDynamicLatchInTheDocumentStatic()
        => Test("""
            using Phaseward;

            public sealed class Levels : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var d = c.Input("battery_ok");
                    var first = {|#0:c.DynamicLatch(d, tick.High, "first")|};
                    // second stage
                    var second = {|#1:c.DynamicLatch(first, tick.Low, "second")|};
                    c.Output("level", {|#2:c.DynamicLatch(second, tick.High)|});
                }
            }
            """, """
            using Phaseward;

            public sealed class Levels : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var d = c.Input("battery_ok");
                    var first = c.StaticLatch(d, tick.High, "first");
                    // second stage
                    var second = c.StaticLatch(first, tick.Low, "second");
                    c.Output("level", c.StaticLatch(second, tick.High));
                }
            }
            """, PW3002(0), PW3002(1), PW3002(2)).Choosing(EquivalenceKeys.UseStaticLatch).RunAsync();

    [Fact]
    public async Task FixAllForLatchesLeavesTheRegisterToItsOwnFix()
    {
        const string Source = """
            using Phaseward;

            public sealed class Mixed : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var d = c.Input("battery_ok");
                    var a = {|#0:c.DynamicLatch(d, tick.High, "a")|};
                    var b = {|#1:c.DynamicLatch(a, tick.Low, "b")|};
                    c.Output("count", {|#2:c.DynamicRegister(b, tick, "count")|});
                }
            }
            """;
        var test = Test(Source, """
            using Phaseward;

            public sealed class Mixed : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var d = c.Input("battery_ok");
                    var a = c.StaticLatch(d, tick.High, "a");
                    var b = c.StaticLatch(a, tick.Low, "b");
                    c.Output("count", {|#0:c.DynamicRegister(b, tick, "count")|});
                }
            }
            """, PW3002(0), PW3002(1), PW3002(2), PW3002(2)).Choosing(EquivalenceKeys.UseStaticLatch);
        test.FixedState.ExpectedDiagnostics.AddRange(new[] { PW3002(0), PW3002(0) });
        await test.RunAsync();
    }

    [Fact]
    public Task ALatchInAHelperWithOneCallerIsFixedInTheHelper()
        => Test("""
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("a", Hold(c, c.Input("a_bit"), burst.High));
                }

                private static Net Hold(Circuit c, Net d, Phase phase)
                    => {|#0:c.DynamicLatch(d, phase, "hold")|};
            }
            """, """
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("a", Hold(c, c.Input("a_bit"), burst.High));
                }

                private static Net Hold(Circuit c, Net d, Phase phase)
                    => c.StaticLatch(d, phase, "hold");
            }
            """, PW3001()).Choosing(EquivalenceKeys.UseStaticLatch).RunAsync();

    [Fact]
    public Task NoFixInsideAHelperUsedFromSeveralPlaces()
    {
        // Rewriting the helper would also change the latch clocked from the free-running clock.
        const string Source = """
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("a", Hold(c, c.Input("a_bit"), burst.High, "hold_a"));
                    c.Output("b", Hold(c, c.Input("b_bit"), capture.High, "hold_b"));
                }

                private static Net Hold(Circuit c, Net d, Phase phase, string name)
                    => {|#0:c.DynamicLatch(d, phase, name)|};
            }
            """;
        return Test(Source, Source, PW3001()).RunAsync();
    }

    [Fact]
    public Task NoFixWhenTheLatchIsMadeInAHelperInAnotherFile()
    {
        const string Source = """
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("a", {|#0:Library.Hold(c, c.Input("a_bit"), burst.High)|});
                }
            }
            """;
        const string Library = """
            using Phaseward;

            public static class Library
            {
                public static Net Hold(Circuit c, Net d, Phase phase)
                    => c.DynamicLatch(d, phase, "hold");
            }
            """;
        var test = Test(Source, Source, PW3001());
        test.TestState.Sources.Add(("/0/Library.cs", Library));
        test.FixedState.Sources.Add(("/0/Library.cs", Library));
        return test.RunAsync();
    }

    [Fact]
    public Task NoFixForAHandBuiltNode()
    {
        const string Source = """
            using Phaseward;

            public sealed class Hand : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var node = c.Node("level");
                    {|#0:c.TransmissionGate(c.Input("battery_ok"), tick.High, node)|};
                    c.Output("sense", c.Inverter(node, "sense"));
                }
            }
            """;
        return Test(Source, Source, PW3002()).RunAsync();
    }
}
