using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW3004 through the compiler. Two paths that disagree divide the supply: V·R2/(R1 + R2), current V/(R1 + R2)
/// (Ohm's law); that overlapping drivers fight is common practice. Illustrative process: V = 1.2 V, drivers 4 kΩ,
/// pass gates 5 kΩ, complement skew 30 ps. Reported at the later driver, the earlier one as additional location.
/// </summary>
public class PW3004Tests
{
    private static DiagnosticResult Pw3004() => new DiagnosticResult(RuleCatalog.FightingDrivers.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1);

    private static string Design(string body) => $$"""
        using Phaseward;

        public sealed class Bus : Design
        {
            protected override void Describe(Circuit c)
            {
        {{body}}
            }
        }
        """;

    [Fact]
    public Task TwoRequestLinesFight()
        // 9 kΩ each: 600 mV, 1.2 V / 18 kΩ = 66.7 µA.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var bus = c.Node("bus");
                    {|#1:c.TransmissionGate(c.Input("a"), c.Input("ra"), bus)|};
                    {|#0:c.TransmissionGate(c.Input("b"), c.Input("rb"), bus)|};
                    c.Output("q", c.Inverter(bus, "q"));
            """),
            Pw3004().WithMessage("'bus.tg1' (9 kΩ) and 'bus.tg2' (9 kΩ) drive node 'bus' together whenever 'ra' and 'rb' are both high (not stated exclusive): "
                + "when they disagree the node sits at 600 mV (divider, 'bus.tg1' pulling up) and 66.7 µA flows from rail to rail"))
            .RunAsync();

    [Fact]
    public Task StatingTheRequestsExclusiveClearsIt()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var bus = c.Node("bus");
                    var ra = c.Input("ra");
                    var rb = c.Input("rb");
                    c.Exclusive(ra, rb);
                    c.TransmissionGate(c.Input("a"), ra, bus);
                    c.TransmissionGate(c.Input("b"), rb, bus);
                    c.Output("q", c.Inverter(bus, "q"));
            """))
            .RunAsync();

    [Fact]
    public Task AControlAndItsInverseAreExclusive()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var bus = c.Node("bus");
                    var sel = c.Input("sel");
                    c.TransmissionGate(c.Input("a"), sel, bus);
                    c.TransmissionGate(c.Input("b"), c.Inverter(sel), bus);
                    c.Output("q", c.Inverter(bus, "q"));
            """))
            .RunAsync();

    [Fact]
    public Task ComplementaryPhasesFightInTheOverlapsAndAHelperInALoopIsOneFindingPerNode()
        // High [0, 5.03 ns) and Low [5 ns, 10.03 ns): 30 ps after each edge, 60 ps per period.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>($$"""
            using Phaseward;

            public sealed class Lanes : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    for (var i = 0; i < 2; i++)
                        c.Output($"q{i}", c.Inverter(Lane(c, clk, i)));
                }

                private static Net Lane(Circuit c, Clock clk, int i)
                {
                    var n = c.Node($"n{i}");
                    {|#1:c.TransmissionGate(c.Input($"a{i}"), clk.High, n)|};
                    {|#0:c.TransmissionGate(c.Input($"b{i}"), clk.Low, n)|};
                    return n;
                }
            }
            """,
            Pw3004().WithArguments("n0.tg1", "9 kΩ", "n0.tg2", "9 kΩ", "n0", "for 60 ps per period (clk.High and clk.Low overlap)", "600 mV", "66.7 µA"),
            Pw3004().WithArguments("n1.tg1", "9 kΩ", "n1.tg2", "9 kΩ", "n1", "for 60 ps per period (clk.High and clk.Low overlap)", "600 mV", "66.7 µA"))
            .RunAsync();

    private static string BusBits(bool selected) => $$"""
        using Phaseward;

        public sealed class Bits : Design
        {
            protected override void Describe(Circuit c)
            {
                for (var bit = 0; bit < 2; bit++)
                    c.Place(new BusBit({{(selected ? "true" : "false")}}), $"bit{bit}");
            }
        }

        public sealed class BusBit : Block
        {
            private readonly bool selected;

            public BusBit(bool selected) => this.selected = selected;

            protected override void Describe(Circuit c)
            {
                var bus = c.Node("bus");
                var pick = c.Input("pick");
                {|#1:c.TransmissionGate(c.Input("a"), pick, bus)|};
                {|#0:c.TransmissionGate(c.Input("b"), selected ? c.Inverter(pick, "pick_b") : c.Input("other"), bus)|};
                c.Output("q", c.Inverter(bus, "q"));
            }
        }
        """;

    [Fact]
    public Task BusBitsPlacedAsBlocksInALoopAreOneFindingPerNode()
        // 9 kΩ each side: 600 mV, 66.7 µA, in each placed bit; both squiggles on the block's two gate calls.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(BusBits(selected: false),
            Pw3004().WithMessage("'bit0.bus.tg1' (9 kΩ) and 'bit0.bus.tg2' (9 kΩ) drive node 'bit0.bus' together whenever 'bit0.pick' and 'bit0.other' are both high "
                + "(not stated exclusive): when they disagree the node sits at 600 mV (divider, 'bit0.bus.tg1' pulling up) and 66.7 µA flows from rail to rail"),
            Pw3004().WithMessage("'bit1.bus.tg1' (9 kΩ) and 'bit1.bus.tg2' (9 kΩ) drive node 'bit1.bus' together whenever 'bit1.pick' and 'bit1.other' are both high "
                + "(not stated exclusive): when they disagree the node sits at 600 mV (divider, 'bit1.bus.tg1' pulling up) and 66.7 µA flows from rail to rail"))
            .RunAsync();

    [Fact]
    public Task BusBitsPlacedAsBlocksOnASelectAndItsInverseAreClean()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(System.Text.RegularExpressions.Regex.Replace(BusBits(selected: true), @"\{\|#\d+:|\|\}", string.Empty))
            .RunAsync();
}
