using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.CodeFixes;

/// <summary>
/// The PW1004 code fix. Each fixed design is re-analysed by the framework and must compile and carry no clock-phase
/// diagnostic: a latch on the phase in which the gate blocks the clock holds the enable still while the gate passes it
/// (common practice for glitch-free clock gating). Test process (<see cref="RuleSources"/>): t_TG = 34.5 ps,
/// t_inv = 27.6 ps; a 10 ns clock is high over [0, 5 ns).
/// </summary>
public class LatchClockGateEnableCodeFixTests
{
    private static DiagnosticResult Pw1004(string gate, string stateWindow, string level, string enable, string changes)
        => new DiagnosticResult(RuleCatalog.ClockGateEnable.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
            .WithArguments(gate, "clk", stateWindow, level, enable, changes);

    private static DiagnosticResult FromRegister(string gate, string register)
        => Pw1004(gate, "[0 s, 5 ns)", "high", register, $"during [0 s, 62.1 ps) (from latch '{register}.slave', transparent in clk.High, through a 27.6 ps path; slow corner, delays ×1)");

    [Fact]
    public Task LatchesAnEnableFromARegisterOnTheLowPhaseKeepingComments()
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Design("Gate", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = {|#1:c.StaticRegister(c.Input("want"), clk, "en_reg")|};
            var gated = {|#0:c.ClockGate(clk, /* from the register */ en, name: "gclk")|}; // the burst clock
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
            """), Design("Gate", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = c.StaticRegister(c.Input("want"), clk, "en_reg");
            var gated = c.ClockGate(clk, /* from the register */ c.Inverter(c.StaticLatch(en, clk.Low)), name: "gclk"); // the burst clock
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
            """), FromRegister("gclk", "en_reg"))
            .RunAsync();

    [Fact]
    public Task LatchesTheEnableOfAGateThatStopsHighOnTheHighPhase()
        // It passes the clock while it is low; the enable's latch on clk.Low opens at 5 ns, while the gate passes.
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Design("StopsHigh", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var wrong = {|#1:c.StaticLatch(c.Input("a"), clk.Low, "wrong")|};
            {|#0:c.ClockGate(clk, c.Inverter(wrong), ClockStopLevel.High, name: "g")|};
            """), Design("StopsHigh", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var wrong = c.StaticLatch(c.Input("a"), clk.Low, "wrong");
            c.ClockGate(clk, c.Inverter(c.StaticLatch(c.Inverter(wrong), clk.High)), ClockStopLevel.High, name: "g");
            """), Pw1004("g", "[5 ns, 10 ns)", "low", "inv1", "during [5 ns, 5.09 ns) (from latch 'wrong', transparent in clk.Low, through a 55.2 ps path; slow corner, delays ×1)"))
            .RunAsync();

    [Fact]
    public Task LatchesAnInputTakenAsChangingAtAnyTime()
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Design("FromInput", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            {|#0:c.ClockGate(clk, {|#1:c.Input("enable")|}, name: "gclk")|};
            """), Design("FromInput", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.Inverter(c.StaticLatch(c.Input("enable"), clk.Low)), name: "gclk");
            """), Pw1004("gclk", "[0 s, 5 ns)", "high", "enable",
                "at any time (from primary input 'enable', taken as changing at any time by phaseward.clock_gate_inputs_may_change)"))
            .WithEditorConfig("phaseward.clock_gate_inputs_may_change = true")
            .RunAsync();

    [Fact]
    public Task NoFixWhenTheLatchIsOnTheRightPhaseAndOnlyThePathIsSlow()
        // A 1 ns clock, low over [0.5, 1 ns): the latch opens while the gate blocks, but 20 stages after it (586.5 ps)
        // carry its change past 1 ns. Another latch would not help; a shorter path would.
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Slow, Slow,
                new DiagnosticResult(RuleCatalog.ClockGateEnable.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                    .WithArguments("gclk", "clk", "[0 s, 500 ps)", "high", "en19",
                        "during [500 ps, 1.09 ns) (from latch 'en_latch', transparent in clk.Low, through a 552 ps path; slow corner, delays ×1)"))
            .RunAsync();

    private static readonly string Slow = Design("Slow", """
        var clk = c.Clock("clk", 1.Nanoseconds());
        var en = {|#1:c.StaticLatch(c.Input("want"), clk.Low, "en_latch")|};
        for (var i = 1; i < 20; i++)
            en = c.Inverter(en, $"en{i}");
        {|#0:c.ClockGate(clk, en, name: "gclk")|};
        """);

    [Fact]
    public Task NoFixWhenTheEnableComesFromAnUnrelatedClock()
        // That needs a synchronizer (PW1003's fix), not a latch.
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Unrelated, Unrelated,
                new DiagnosticResult(RuleCatalog.ClockGateEnable.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                    .WithArguments("gclk", "clk", "[0 s, 5 ns)", "high", "en_reg",
                        "at any time (from latch 'en_reg.slave', transparent in radio.High, whose clock has no fixed time relation to 'clk')"))
            .RunAsync();

    private static readonly string Unrelated = Design("Unrelated", """
        var radio = c.Clock("radio", 7.Nanoseconds(), independent: true);
        var clk = c.Clock("clk", 10.Nanoseconds());
        {|#0:c.ClockGate(clk, {|#1:c.StaticRegister(c.Input("want"), radio, "en_reg")|}, name: "gclk")|};
        """);

    [Fact]
    public Task NoFixWhenTheClockIsMadeAtTheCall()
        // Repeating c.Clock(...) for the latch's phase would make a second clock.
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Inline, Inline,
                new DiagnosticResult(RuleCatalog.ClockGateEnable.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                    .WithArguments("gclk", "clk", "[0 s, 5 ns)", "high", "enable",
                        "at any time (from primary input 'enable', taken as changing at any time by phaseward.clock_gate_inputs_may_change)"))
            .WithEditorConfig("phaseward.clock_gate_inputs_may_change = true")
            .RunAsync();

    private static readonly string Inline = Design("Inline", """
        {|#0:c.ClockGate(c.Clock("clk", 10.Nanoseconds()), {|#1:c.Input("enable")|}, name: "gclk")|};
        """);

    [Fact]
    public Task AGateMadeInALoopIsRewrittenOnce()
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Design("Lanes", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 2; i++)
                {|#0:c.ClockGate(clk, {|#1:c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}")|}, name: $"lane{i}")|};
            """), Design("Lanes", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 2; i++)
                c.ClockGate(clk, c.Inverter(c.StaticLatch(c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}"), clk.Low)), name: $"lane{i}");
            """), FromRegister("lane0", "en0").FoundAtThisCall(2, "Lanes", "lane0, lane1"))
            .RunAsync();

    [Fact]
    public Task FixAllLatchesEveryGatesEnableThroughAHelper()
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, LatchClockGateEnableCodeFix>(Design("Helper", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            {|#0:c.ClockGate(clk, {|#1:c.StaticRegister(c.Input("a"), clk, "en_a")|}, name: "ga")|};
            Gate(c, clk);
            """, """
            private static Clock Gate(Circuit circuit, Clock clock)
                => {|#2:circuit.ClockGate(clock, {|#3:circuit.StaticRegister(circuit.Input("b"), clock, "en_b")|}, name: "gb")|};
            """), Design("Helper", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.Inverter(c.StaticLatch(c.StaticRegister(c.Input("a"), clk, "en_a"), clk.Low)), name: "ga");
            Gate(c, clk);
            """, """
            private static Clock Gate(Circuit circuit, Clock clock)
                => circuit.ClockGate(clock, circuit.Inverter(circuit.StaticLatch(circuit.StaticRegister(circuit.Input("b"), clock, "en_b"), clock.Low)), name: "gb");
            """), FromRegister("ga", "en_a"),
            new DiagnosticResult(RuleCatalog.ClockGateEnable.Id, DiagnosticSeverity.Warning).WithLocation(2).WithLocation(3)
                .WithArguments("gb", "clk", "[0 s, 5 ns)", "high", "en_b", "during [0 s, 62.1 ps) (from latch 'en_b.slave', transparent in clk.High, through a 27.6 ps path; slow corner, delays ×1)"))
            .RunAsync();
}
