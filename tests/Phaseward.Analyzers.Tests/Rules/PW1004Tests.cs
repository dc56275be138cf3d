using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW1004 through the analyzer. A clock gate that stops low passes the clock while it is high; its enable must come
/// from storage transparent only while the clock is low and settle before the clock rises (common practice for
/// glitch-free clock gating). Test process (<see cref="RuleSources"/>): t_TG = 34.5 ps, t_inv = 27.6 ps.
/// Reported at the gate, with the storage the enable comes from as additional location.
/// </summary>
public class PW1004Tests
{
    private static DiagnosticResult Pw1004() => new DiagnosticResult(RuleIds.ClockGateEnable, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1);

    [Fact]
    public Task AnEnableStraightFromARegisterIsReported()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Gate", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = {|#1:c.StaticRegister(c.Input("want"), clk, "en_reg")|};
            var gated = {|#0:c.ClockGate(clk, en, name: "gclk")|};
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
            """),
            Pw1004().WithMessage("Clock gate 'gclk' passes clock 'clk' during [0 s, 5 ns) (while it is high), but its enable 'en_reg' can change during "
                + "[0 s, 62.1 ps) (from latch 'en_reg.slave', transparent in clk.High, through a 27.6 ps path): the gated clock can be clipped or get an extra pulse"))
            .RunAsync();

    [Fact]
    public Task TheEnableLatchedWhileTheClockIsLowIsClean()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Latched", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = c.StaticRegister(c.Input("want"), clk, "en_reg");
            var gated = c.ClockGate(clk, c.Inverter(c.StaticLatch(en, clk.Low, "en_latch")), name: "gclk");
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
            """))
            .RunAsync();

    [Fact]
    public Task InputsMayBeTakenAsChangingAtAnyTime()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("FromInput", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, {|#1:c.Input("enable")|}, name: "gclk");
            """).Replace("c.ClockGate(clk", "{|#0:c.ClockGate(clk").Replace("name: \"gclk\")", "name: \"gclk\")|}"),
            Pw1004().WithMessage("Clock gate 'gclk' passes clock 'clk' during [0 s, 5 ns) (while it is high), but its enable 'enable' can change at any time "
                + "(from primary input 'enable', taken as changing at any time by phaseward.clock_gate_inputs_may_change): the gated clock can be clipped or get an extra pulse"))
            .WithEditorConfig("phaseward.clock_gate_inputs_may_change = true")
            .RunAsync();

    [Fact]
    public Task InputsAreStableByDefault()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("FromInputDefault", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.Input("enable"), name: "gclk");
            """))
            .RunAsync();

    [Fact]
    public Task GatesMadeByAHelperInALoopAreReportedEach()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Lanes", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 2; i++)
                Lane(c, clk, i);
            """, """
            private static Clock Lane(Circuit c, Clock clk, int i)
                => {|#0:c.ClockGate(clk, {|#1:c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}")|}, name: $"lane{i}")|};
            """),
            Pw1004().WithArguments("lane0", "clk", "[0 s, 5 ns)", "high", "en0", "during [0 s, 62.1 ps) (from latch 'en0.slave', transparent in clk.High, through a 27.6 ps path)"),
            Pw1004().WithArguments("lane1", "clk", "[0 s, 5 ns)", "high", "en1", "during [0 s, 62.1 ps) (from latch 'en1.slave', transparent in clk.High, through a 27.6 ps path)"))
            .RunAsync();
}
