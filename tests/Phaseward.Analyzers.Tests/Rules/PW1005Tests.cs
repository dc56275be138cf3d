using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW1005 through the analyzer. A loop of restoring stages with no storage element oscillates (odd inversions) or
/// latches up (even): common practice. Period about 2·Σ t_p (ring oscillator, Rabaey, Chandrakasan, Nikolić, "Digital
/// Integrated Circuits: A Design Perspective", 2nd ed., ch. 5, from memory); with the test process every stage is
/// t_inv = 27.6 ps (<see cref="RuleSources"/>). Reported at the loop's first device, its next ones as additional locations.
/// </summary>
public class PW1005Tests
{
    private static DiagnosticResult Pw1005(string message)
        => new DiagnosticResult(RuleCatalog.LoopWithoutStorage.Id, DiagnosticSeverity.Warning).WithMessage(message);

    private static Task Verify(string source, params DiagnosticResult[] expected)
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(source, expected).RunAsync();

    [Fact]
    public Task ANandFedBackThroughTwoInvertersOscillates()
        // 3 × 27.6 = 82.8 ps round the loop: period about 165.6 ps.
        => Verify(Design("Ring", """
            var fb = c.Node("fb");
            var n = {|#0:c.Nand(c.Input("en"), fb, "n")|};
            var i1 = {|#1:c.Inverter(n, "i1")|};
            {|#2:c.Inverter(i1, fb)|};
            c.Output("q", i1);
            """),
            Pw1005("A feedback loop of 3 devices has no latch on it ('n', 'i1', 'fb.inv1'): 3 inversions (odd): enabled, "
                + "it oscillates with a period of about 166 ps (twice the loop's delay 82.8 ps)").WithLocation(0).WithLocation(1).WithLocation(2));

    [Fact]
    public Task ARegisterInTheLoopBreaksIt()
        // A register, not a single latch: a latch fed back to itself runs round in its own phase (PW1001).
        => Verify(Design("Broken", """
            var clk = c.Clock("clk", 1.Nanoseconds());
            var fb = c.Node("fb");
            var n = c.Nand(c.Input("en"), fb, "n");
            c.Inverter(c.StaticRegister(n, clk, "hold"), fb);
            c.Output("q", n);
            """));

    [Fact]
    public Task KeepersSetResetPairsAndLatchFeedbackAreStorageCells()
        => Verify(Design("Cells", """
            var kept = c.TransmissionGate(c.Input("d"), c.Input("sel"), "kept");
            c.Keeper(kept);
            var qb = c.Node("qb");
            var q = c.Nand(c.Input("set_n"), qb, "q");
            c.Nand(c.Input("reset_n"), q, qb);
            var en = c.Input("en");
            var held = c.Node("held");
            c.TransmissionGate(c.Input("d2"), en, held);
            c.TransmissionGate(c.Inverter(c.Inverter(held, "hb"), "back"), c.Inverter(en, "enb"), held);
            c.Output("q", q);
            """));

    [Fact]
    public Task RingsMadeByAHelperInALoopAreOneFindingEach()
        // Three stages each: 82.8 ps round, period 166 ps. Every ring's devices come from the helper's three calls.
        => Verify(Design("Rings", """
            for (var i = 0; i < 2; i++)
                Ring(c, $"r{i}");
            """, """
            private static void Ring(Circuit c, string name)
            {
                var start = c.Node(name);
                var a = {|#0:c.Inverter(start, name + ".a")|};
                var b = {|#1:c.Inverter(a, name + ".b")|};
                {|#2:c.Inverter(b, start)|};
            }
            """),
            Pw1005("A feedback loop of 3 devices has no latch on it ('r0.a', 'r0.b', 'r0.inv1'): 3 inversions (odd): enabled, "
                + "it oscillates with a period of about 166 ps (twice the loop's delay 82.8 ps)").WithLocation(0).WithLocation(1).WithLocation(2),
            Pw1005("A feedback loop of 3 devices has no latch on it ('r1.a', 'r1.b', 'r1.inv1'): 3 inversions (odd): enabled, "
                + "it oscillates with a period of about 166 ps (twice the loop's delay 82.8 ps)").WithLocation(0).WithLocation(1).WithLocation(2));

    [Fact]
    public Task ARingBuiltInAForLoopIsOneFindingAtTheCallInTheLoop()
        // Five stages: 138 ps round, period 276 ps; all but the closing inverter come from the one call in the loop.
        => Verify(Design("ForRing", """
            var start = c.Node("start");
            var n = start;
            for (var i = 0; i < 4; i++)
                n = {|#0:c.Inverter(n, $"s{i}")|};
            {|#1:c.Inverter(n, start)|};
            """),
            Pw1005("A feedback loop of 5 devices has no latch on it ('s0', 's1', 's2', 's3', ...): 5 inversions (odd): enabled, "
                + "it oscillates with a period of about 276 ps (twice the loop's delay 138 ps)").WithLocation(0).WithLocation(1));

    [Fact]
    public Task SeverityFromEditorConfig()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Design("Quiet", """
                var n = c.Node("n");
                {|#0:c.Inverter(n, n)|};
                """),
                new DiagnosticResult(RuleCatalog.LoopWithoutStorage.Id, DiagnosticSeverity.Info).WithLocation(0)
                    .WithArguments(1, "'n.inv1'", "1 inversions (odd): enabled, it oscillates with a period of about 55.2 ps (twice the loop's delay 27.6 ps)"))
            .WithEditorConfig("dotnet_diagnostic.PW1005.severity = suggestion")
            .RunAsync();

    private const string WakeCell = """

        public sealed class WakeCell : Block
        {
            private readonly Clock clock;
            private readonly bool registered;

            public WakeCell(Clock clock, bool registered)
            {
                this.clock = clock;
                this.registered = registered;
            }

            protected override void Describe(Circuit c)
            {
                var held = c.Node("held");
                var wake = {|#0:c.Nand(c.Input("request"), held, "wake")|};
                if (registered)
                    c.Inverter(c.StaticRegister(wake, clock, "state"), held);
                else
                    {|#2:c.Inverter({|#1:c.Inverter(wake, "sense")|}, held)|};
                c.Output("out", wake);
            }
        }
        """;

    private static string Placed(string name, bool registered) => Design(name, $$"""
        var clk = c.Clock("clk", 10.Nanoseconds());
        for (var i = 0; i < 2; i++)
            c.Place(new WakeCell(clk, registered: {{(registered ? "true" : "false")}}), $"w{i}");
        """);

    [Fact]
    public Task LoopsInsideBlocksPlacedInALoopAreOneFindingPerPlacedCell()
        // Three stages each: 82.8 ps round, period 166 ps; both copies point at the block's three calls.
        => Verify(Placed("Cells", registered: false) + WakeCell,
            Pw1005("A feedback loop of 3 devices has no latch on it ('w0.wake', 'w0.sense', 'w0.held.inv1'): 3 inversions (odd): enabled, "
                + "it oscillates with a period of about 166 ps (twice the loop's delay 82.8 ps)").WithLocation(0).WithLocation(1).WithLocation(2),
            Pw1005("A feedback loop of 3 devices has no latch on it ('w1.wake', 'w1.sense', 'w1.held.inv1'): 3 inversions (odd): enabled, "
                + "it oscillates with a period of about 166 ps (twice the loop's delay 82.8 ps)").WithLocation(0).WithLocation(1).WithLocation(2));

    [Fact]
    public Task BlocksWhoseLoopGoesThroughARegisterAreClean()
        => Verify(Placed("RegisteredCells", registered: true) + Unmarked(WakeCell));

    [Fact]
    public Task RingsMadeByAHelperInALoopWithARegisterInEachAreClean()
        => Verify(Design("RegisteredRings", """
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 2; i++)
                Ring(c, clk, $"r{i}");
            """, """
            private static void Ring(Circuit c, Clock clk, string name)
            {
                var start = c.Node(name);
                var a = c.Inverter(start, name + ".a");
                c.Inverter(c.StaticRegister(a, clk, name + ".hold"), start);
            }
            """));

    private static string Unmarked(string source) => System.Text.RegularExpressions.Regex.Replace(source, @"\{\|#\d+:|\|\}", string.Empty);
}
