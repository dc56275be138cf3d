using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
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
    private const string FromRegister = "during [0 s, 62.1 ps) (from latch '{0}', transparent in clk.High, through a 27.6 ps path; slow corner, delays ×1)";

    private static DiagnosticResult Pw1004() => new DiagnosticResult(RuleCatalog.ClockGateEnable.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1);

    // A gate that stops low on the 10 ns clock (high over [0, 5 ns)), its enable straight from a register's slave.
    private static DiagnosticResult FromRegisterSlave(string gate, string enable, string slave)
        => Pw1004().WithArguments(gate, "clk", "[0 s, 5 ns)", "high", enable, string.Format(FromRegister, slave));

    private static Task Verify(string source, params DiagnosticResult[] expected)
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(source, expected).RunAsync();

    [Fact]
    public Task AnEnableStraightFromARegisterIsReported()
        // The slave opens at 0: its entry gate 34.5 ps, then its output inverter 27.6 ps: the enable moves until 62.1 ps.
        => Verify(Design("Gate", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = {|#1:c.StaticRegister(c.Input("want"), clk, "en_reg")|};
            var gated = {|#0:c.ClockGate(clk, en, name: "gclk")|};
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
            """),
            Pw1004().WithMessage("Clock gate 'gclk' passes clock 'clk' during [0 s, 5 ns) (while it is high), but its enable 'en_reg' can change during "
                + "[0 s, 62.1 ps) (from latch 'en_reg.slave', transparent in clk.High, through a 27.6 ps path; slow corner, delays ×1): the gated clock can be clipped or get an extra pulse"));

    [Fact]
    public Task TheEnableLatchedWhileTheClockIsLowIsClean()
        => Verify(Design("Latched", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var en = c.StaticRegister(c.Input("want"), clk, "en_reg");
            var gated = c.ClockGate(clk, c.Inverter(c.StaticLatch(en, clk.Low, "en_latch")), name: "gclk");
            c.Output("q", c.DynamicLatch(c.Input("d"), gated.High, "cap"));
            """));

    [Fact]
    public Task AGateThatStopsHighWantsTheEnableLatchedWhileTheClockIsHigh()
        // It passes the clock while it is low, [5 ns, 10 ns); a latch on clk.Low opens at 5 ns, and its data is through
        // its entry gate (34.5 ps), its output stage and the inverter (2 × 27.6 ps) by 5.09 ns.
        => Verify(Design("StopsHigh", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            var wrong = {|#1:c.StaticLatch(c.Input("a"), clk.Low, "wrong")|};
            {|#0:c.ClockGate(clk, c.Inverter(wrong), ClockStopLevel.High, name: "g1")|};
            c.ClockGate(clk, c.Inverter(c.StaticLatch(c.Input("b"), clk.High, "right")), ClockStopLevel.High, name: "g2");
            """),
            Pw1004().WithArguments("g1", "clk", "[5 ns, 10 ns)", "low", "inv1",
                "during [5 ns, 5.09 ns) (from latch 'wrong', transparent in clk.Low, through a 55.2 ps path; slow corner, delays ×1)"));

    [Fact]
    public Task InputsMayBeTakenAsChangingAtAnyTime()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("FromInput", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            {|#0:c.ClockGate(clk, {|#1:c.Input("enable")|}, name: "gclk")|};
            """),
            Pw1004().WithMessage("Clock gate 'gclk' passes clock 'clk' during [0 s, 5 ns) (while it is high), but its enable 'enable' can change at any time "
                + "(from primary input 'enable', taken as changing at any time by phaseward.clock_gate_inputs_may_change): the gated clock can be clipped or get an extra pulse"))
            .WithEditorConfig("phaseward.clock_gate_inputs_may_change = true")
            .RunAsync();

    [Fact]
    public Task InputsAreStableByDefaultAndWhenTheOptionIsFalse()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("FromInputDefault", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.Input("enable"), name: "gclk");
            """))
            .WithEditorConfig("phaseward.clock_gate_inputs_may_change = false")
            .RunAsync();

    [Fact]
    public Task AnOptionThatIsNotABooleanIsPW9004AndTheDefaultApplies()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(Design("BadOption", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.ClockGate(clk, c.Input("enable"), name: "gclk");
            """).Replace("void Describe", "void {|#0:Describe|}"),
            new DiagnosticResult(RuleCatalog.InvalidOption.Id, DiagnosticSeverity.Warning).WithLocation(0)
                .WithArguments("phaseward.clock_gate_inputs_may_change", "sometimes", "true or false", "false"))
            .WithEditorConfig("phaseward.clock_gate_inputs_may_change = sometimes")
            .RunAsync();

    [Fact]
    public Task GatesMadeByAHelperInALoopAreReportedEach()
        => Verify(Design("Lanes", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 2; i++)
                {|#2:Lane(c, clk, i)|};
            """, """
            private static Clock Lane(Circuit c, Clock clk, int i)
                => {|#0:c.ClockGate(clk, {|#1:c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}")|}, name: $"lane{i}")|};
            """),
            FromRegisterSlave("lane0", "en0", "en0.slave").WithLocation(2).FoundAtThisCall(2, "Lanes", "lane0, lane1"));

    [Fact]
    public Task GatesMadeByAHelperInALoopWithLatchedEnablesAreClean()
        => Verify(Design("LatchedLanes", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 2; i++)
                Lane(c, clk, i);
            """, """
            private static Clock Lane(Circuit c, Clock clk, int i)
                => c.ClockGate(clk, c.Inverter(c.StaticLatch(c.StaticRegister(c.Input($"want{i}"), clk, $"en{i}"), clk.Low, $"hold{i}")), name: $"lane{i}");
            """));

    private const string LaneBlock = """

        public sealed class GatedLane : Block
        {
            private readonly Clock clock;
            private readonly bool latched;

            public GatedLane(Clock clock, bool latched)
            {
                this.clock = clock;
                this.latched = latched;
            }

            public Clock Gated { get; private set; } = null!;

            protected override void Describe(Circuit c)
            {
                var enable = {|#1:c.StaticRegister(c.Input("want"), clock, "en_reg")|};
                if (latched)
                    enable = c.Inverter(c.StaticLatch(enable, clock.Low, "en_latch"));
                Gated = {|#0:c.ClockGate(clock, enable, name: "gclk")|};
                c.Output("q", c.DynamicLatch(c.Input("d"), Gated.High, "cap"));
            }
        }
        """;

    [Fact]
    public Task GatesInsideBlocksPlacedInALoopAreReportedAtTheBlocksCallOncePerPlacedGate()
        => Verify(Design("Blocks", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            foreach (var i in new[] { 0, 1 })
                {|#2:c.Place(new GatedLane(clk, latched: false), $"lane{i}")|};
            """) + LaneBlock,
            FromRegisterSlave("lane0.gclk", "lane0.en_reg", "lane0.en_reg.slave").WithLocation(2).FoundAtThisCall(2, "Blocks", "lane0.gclk, lane1.gclk"));

    [Fact]
    public Task GatesInsideBlocksWithLatchedEnablesAreClean()
        => Verify(Design("LatchedBlocks", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            foreach (var i in new[] { 0, 1 })
                c.Place(new GatedLane(clk, latched: true), $"lane{i}");
            """) + LaneBlock.Replace("{|#0:", "").Replace("{|#1:", "").Replace(")|}", ")"));
}
