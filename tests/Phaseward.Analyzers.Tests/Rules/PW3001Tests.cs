using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW3001 through the compiler: the design's C# is elaborated and the finding lands at the call that made the node,
/// with the clock gate as an additional location. Figures: illustrative process, a latch node of 1 fF wire + 1.5 fF
/// pass-gate diffusion + 2 fF inverter gate = 4.5 fF, ΔV = 0.3 V, I_leak = 5 pA (a test figure each design sets, far
/// below the 1 nA hot-corner default, so the times stay long), so t_ret = 4.5 fF × 0.3 V / 5 pA =
/// 270 µs (common practice: Q = C·V, t = Q/I; the formula itself is checked in Phaseward.Tests/Storage/RetentionTests).
/// </summary>
public class PW3001Tests
{
    private static DiagnosticResult PW3001(int marker = 0) => new DiagnosticResult(RuleCatalog.DynamicNodeOnGatedClock.Id, DiagnosticSeverity.Warning).WithLocation(marker);

    // A declared idle time is shown with the float around the stop and the restart (idle + 2·L, L the node's longest
    // gap while the clock runs: about 2 ns on these 2 ns clocks, below the digits shown).
    private static string Message(string node, string gate, string level, string idle, string retention = "270 µs", string c = "4.5 fF", string leak = "5 pA")
        => $"Dynamic node '{node}' floats while gated clock '{gate}' is stopped {level} (declared maximum idle time: "
           + (idle == "unbounded" ? idle : $"{idle}, so it floats up to {idle} with the clock periods around the stop and the restart") + "), "
           + $"but keeps its level only {retention} (C·ΔV/I_leak with C = {c}, ΔV = 300 mV, I_leak = {leak} at the hot corner)";

    private static string Design(string body) => $$"""
        using Phaseward;

        public sealed class Capture : Design
        {
            protected override void Describe(Circuit c)
            {
                c.UseProcess(new Process { StorageLeakage = 5.Picoamperes() });
        {{body}}
            }
        }
        """;

    [Fact]
    public Task DynamicLatchOnAGatedClockIsReportedAtItsCallWithTheGateAsAdditionalLocation()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst")|};
                    var held = {|#0:c.DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold")|};
                    c.Output("wave_sample", held);
            """),
            PW3001().WithLocation(1).WithMessage(Message("wave_hold.x", "burst", "low", "unbounded")))
            .RunAsync();

    [Fact]
    public Task StaticLatchOnTheSameGatedClockIsNotReported()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("wave_sample", c.StaticLatch(c.Input("wave_bit"), burst.High, "wave_hold"));
            """))
            .RunAsync();

    [Fact]
    public Task DynamicLatchOnTheUngatedClockIsNotReported()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("wave_sample", c.DynamicLatch(c.Input("wave_bit"), capture.High, "wave_hold"));
            """))
            .RunAsync();

    [Fact]
    public Task StoppedLowHoldsTheLowPhaseOpenAndTheHighPhaseOff()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst")|};
                    var bit = c.Input("wave_bit");
                    var held = {|#0:c.DynamicLatch(bit, burst.High, "wave_hold")|};
                    c.Output("wave_sample", c.DynamicLatch(held, burst.Low, "wave_pass"));
            """),
            PW3001().WithLocation(1).WithMessage(Message("wave_hold.x", "burst", "low", "unbounded")))
            .RunAsync();

    [Fact]
    public Task StoppedHighHoldsTheHighPhaseOpenAndTheLowPhaseOff()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst")|};
                    var bit = c.Input("wave_bit");
                    var held = c.DynamicLatch(bit, burst.High, "wave_hold");
                    c.Output("wave_sample", {|#0:c.DynamicLatch(held, burst.Low, "wave_pass")|});
            """),
            PW3001().WithLocation(1).WithMessage(Message("wave_pass.x", "burst", "high", "unbounded")))
            .RunAsync();

    [Theory]
    [InlineData("100.Microseconds()")]
    [InlineData("269.99.Microseconds()")] // with 2·L ≈ 1.94 ns around the stop and the restart: 269.992 µs, just within t_ret
    public Task DeclaredIdleTimeNoLongerThanRetentionIsSafe(string maxIdle)
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design($$"""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, maxIdle: {{maxIdle}}, name: "burst");
                    c.Output("wave_sample", c.DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold"));
            """))
            .RunAsync();

    [Theory]
    [InlineData("271.Microseconds()", "271 µs")]
    [InlineData("2.Seconds()", "2 s")]
    public Task DeclaredIdleTimeLongerThanRetentionIsReportedWithIt(string maxIdle, string shown)
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design($$"""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, maxIdle: {{maxIdle}}, name: "burst")|};
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold")|});
            """),
            PW3001().WithLocation(1).WithMessage(Message("wave_hold.x", "burst", "low", shown)))
            .RunAsync();

    [Fact]
    public Task OnlyTheSlaveOfADynamicRegisterOnAClockStoppedLowFloats()
        // Master open while the clock is low (held open), slave open while it is high (held off).
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst")|};
                    c.Output("count", {|#0:c.DynamicRegister(c.Input("count_enable"), burst, "count")|});
            """),
            PW3001().WithLocation(1).WithMessage(Message("count.slave.x", "burst", "low", "unbounded")))
            .RunAsync();

    [Fact]
    public Task OnlyTheMasterOfADynamicRegisterOnAClockStoppedHighFloats()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst")|};
                    c.Output("count", {|#0:c.DynamicRegister(c.Input("count_enable"), burst, "count")|});
            """),
            PW3001().WithLocation(1).WithMessage(Message("count.master.x", "burst", "high", "unbounded")))
            .RunAsync();

    [Fact]
    public Task StaticRegisterOnAGatedClockIsNotReported()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst");
                    c.Output("count", c.StaticRegister(c.Input("count_enable"), burst, "count"));
            """))
            .RunAsync();

    [Fact]
    public Task CapacitanceOverrideEntersTheFigures()
        // 3 fF × 0.3 V / 5 pA = 180 µs, shorter than the declared 200 µs.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, maxIdle: 200.Microseconds(), name: "burst")|};
                    var node = c.Node("hold");
                    {|#0:c.TransmissionGate(c.Input("wave_bit"), burst.High, node)|};
                    c.SetCapacitance(node, 3.Femtofarads());
                    c.Output("wave_sample", c.Inverter(node, "sense"));
            """),
            PW3001().WithLocation(1).WithMessage(Message("hold", "burst", "low", "200 µs", retention: "180 µs", c: "3 fF")))
            .RunAsync();

    [Fact]
    public Task LeakageOverrideThatStretchesRetentionPastTheIdleTimeClearsTheFinding()
        // 4.5 fF × 0.3 V / 0.1 pA = 13.5 ms, longer than the declared 10 ms.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, maxIdle: 10.Milliseconds(), name: "burst");
                    var node = c.Node("hold");
                    c.TransmissionGate(c.Input("wave_bit"), burst.High, node);
                    c.SetLeakage(node, 0.1.Picoamperes());
                    c.Output("wave_sample", c.Inverter(node, "sense"));
            """))
            .RunAsync();

    [Fact]
    public Task LeakageOverrideThatShortensRetentionIsReportedWithIt()
        // 4.5 fF × 0.3 V / 50 pA = 27 µs, shorter than the declared 100 µs.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, maxIdle: 100.Microseconds(), name: "burst")|};
                    var node = c.Node("hold");
                    {|#0:c.TransmissionGate(c.Input("wave_bit"), burst.High, node)|};
                    c.SetLeakage(node, 50.Picoamperes());
                    c.Output("wave_sample", c.Inverter(node, "sense"));
            """),
            PW3001().WithLocation(1).WithMessage(Message("hold", "burst", "low", "100 µs", retention: "27 µs", leak: "50 pA")))
            .RunAsync();

    [Fact]
    public Task EveryLatchMadeInALoopIsReportedAtTheCallInTheLoop()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst")|};
                    for (var i = 0; i < 3; i++)
                        c.Output($"wave_sample{i}", {|#0:c.DynamicLatch(c.Input($"wave_bit{i}"), burst.High, $"wave_hold{i}")|});
            """),
            PW3001().WithLocation(1).WithMessage(Message("wave_hold0.x", "burst", "low", "unbounded"))
                .FoundAtThisCall(3, "Capture", "wave_hold0.x, wave_hold1.x, wave_hold2.x"))
            .RunAsync();

    [Fact]
    public Task ALatchMadeInAHelperOfTheSameFileIsReportedInsideTheHelperOncePerUse()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>("""
            using Phaseward;

            public sealed class Capture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#1:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst")|};
                    c.Output("a", Hold(c, c.Input("a_bit"), burst.High, "hold_a"));
                    c.Output("b", Hold(c, c.Input("b_bit"), capture.High, "hold_b"));
                }

                private static Net Hold(Circuit c, Net d, Phase phase, string name)
                    => {|#0:c.DynamicLatch(d, phase, name)|};
            }
            """,
            PW3001().WithLocation(1).WithMessage(Message("hold_a.x", "burst", "low", "unbounded", retention: "1.35 µs", leak: "1 nA")))
            .RunAsync();

    [Fact]
    public Task ALatchMadeInAHelperInAnotherFileIsReportedAtTheHelperCall()
    {
        var test = new PhasewardAnalyzerTest<DynamicStorageAnalyzer>("""
            using Phaseward;

            public sealed class Capture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = {|#2:c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst")|};
                    c.Output("a", {|#0:Library.Hold(c, c.Input("a_bit"), burst.High, "hold_a")|});
                }
            }
            """,
            // The call in Describe, then the helper's own call (another file), then the clock gate.
            PW3001().WithLocation(1).WithLocation(2).WithMessage(Message("hold_a.x", "burst", "low", "unbounded", retention: "1.35 µs", leak: "1 nA")));
        test.TestState.Sources.Add(("/0/Library.cs", """
            using Phaseward;

            public static class Library
            {
                public static Net Hold(Circuit c, Net d, Phase phase, string name)
                    => {|#1:c.DynamicLatch(d, phase, name)|};
            }
            """));
        return test.RunAsync();
    }
}
