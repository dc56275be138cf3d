using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW3005 through the compiler. The write against a keeper is a divider, V·R_w/(R_w + R_k) (Ohm's law), which must get
/// past half the supply by a margin (default 10 % of the supply: common practice). Illustrative process: V = 1.2 V,
/// drivers 4 kΩ, pass gates 5 kΩ, keepers 40 kΩ. Reported at the keeper, with the write path's gate as additional location.
/// </summary>
public class PW3005Tests
{
    private static DiagnosticResult Pw3005() => new DiagnosticResult(RuleCatalog.KeeperTooStrong.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1);

    private static string Design(string body) => $$"""
        using Phaseward;

        public sealed class Kept : Design
        {
            protected override void Describe(Circuit c)
            {
        {{body}}
            }
        }
        """;

    [Fact]
    public Task AStrongKeeperIsReported()
        // 1.2 V × 9 kΩ / (9 + 10) kΩ = 568 mV, above 1.2 V × (0.5 − 0.1) = 480 mV.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var x = {|#1:c.TransmissionGate(c.Input("d"), c.Input("sel"), "x")|};
                    {|#0:c.Keeper(x, resistance: 10.Kiloohms())|};
                    c.Output("q", c.Inverter(x, "q"));
            """),
            Pw3005().WithMessage("Keeper 'x.keeper' (10 kΩ) is too strong for the write path through 'x' (9 kΩ): writing a 0 against it pulls node 'x' "
                + "only down to 568 mV, above the 480 mV it must reach (switching point 600 mV less a 120 mV margin; a 1 mirrors this)"))
            .RunAsync();

    [Fact]
    public Task TheProcessKeeperLosesAndIsClean()
        // 1.2 × 9 / 49 = 220 mV.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var x = c.TransmissionGate(c.Input("d"), c.Input("sel"), "x");
                    c.Keeper(x);
                    c.Output("q", c.Inverter(x, "q"));
            """))
            .RunAsync();

    private const string ThirteenKiloohms = """
                    var x = {|#1:c.TransmissionGate(c.Input("d"), c.Input("sel"), "x")|};
                    {|#0:c.Keeper(x, resistance: 13.Kiloohms())|};
                    c.Output("q", c.Inverter(x, "q"));
        """;

    [Fact]
    public Task TheMarginOptionLowersTheBar()
        // 1.2 × 9 / 22 = 491 mV: above 480 mV (reported by default), below 540 mV with a 5 % margin.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design(ThirteenKiloohms.Replace("{|#1:", "").Replace("{|#0:", "").Replace("|}", "")))
            .WithEditorConfig("phaseward.keeper_write_margin = 0.05")
            .RunAsync();

    [Fact]
    public Task TheDefaultMarginReportsIt()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design(ThirteenKiloohms),
                Pw3005().WithArguments("x.keeper", "13 kΩ", "x", "9 kΩ", "x", "491 mV", "480 mV", "600 mV", "120 mV"))
            .RunAsync();

    [Fact]
    public Task KeepersAddedInALoopThroughAHelperAreEachChecked()
        // Bits 1 and 3 get an 8 kΩ keeper: 1.2 × 9 / 17 = 635 mV each; one squiggle per bit at the helper's call.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>($$"""
            using Phaseward;

            public sealed class Bits : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    for (var i = 0; i < 4; i++)
                        c.Output($"q{i}", c.Inverter(Bit(c, i, clk)));
                }

                private static Net Bit(Circuit c, int i, Clock clk)
                {
                    var x = {|#1:c.TransmissionGate(c.Input($"d{i}"), clk.High, $"bit{i}")|};
                    if (i % 2 == 1)
                        {|#0:c.Keeper(x, resistance: 8.Kiloohms())|};
                    return x;
                }
            }
            """,
            Pw3005().WithArguments("bit1.keeper", "8 kΩ", "bit1", "9 kΩ", "bit1", "635 mV", "480 mV", "600 mV", "120 mV"),
            Pw3005().WithArguments("bit3.keeper", "8 kΩ", "bit3", "9 kΩ", "bit3", "635 mV", "480 mV", "600 mV", "120 mV"))
            .RunAsync();

    [Fact]
    public Task AMarginOutOfRangeIsPW9004AndTheDefaultApplies()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(Design("""
                    c.Keeper(c.TransmissionGate(c.Input("d"), c.Input("sel"), "x"));
            """).Replace("void Describe", "void {|#0:Describe|}"),
            new DiagnosticResult(RuleCatalog.InvalidOption.Id, DiagnosticSeverity.Warning).WithLocation(0)
                .WithArguments("phaseward.keeper_write_margin", "0.7", "a number from 0 up to (not including) 0.5, such as 0.1", "0.1"))
            .WithEditorConfig("phaseward.keeper_write_margin = 0.7")
            .RunAsync();

    private static string KeptBits(bool strong) => $$"""
        using Phaseward;

        public sealed class Bits : Design
        {
            protected override void Describe(Circuit c)
            {
                foreach (var bit in new[] { 0, 1 })
                    c.Place(new KeptBit({{(strong ? "10.Kiloohms()" : "null")}}), $"bit{bit}");
            }
        }

        public sealed class KeptBit : Block
        {
            private readonly Resistance? keeper;

            public KeptBit(Resistance? keeper) => this.keeper = keeper;

            protected override void Describe(Circuit c)
            {
                var x = {|#1:c.TransmissionGate(c.Input("d"), c.Input("sel"), "x")|};
                {|#0:c.Keeper(x, resistance: keeper)|};
                c.Output("q", c.Inverter(x, "q"));
            }
        }
        """;

    [Fact]
    public Task KeptBitsPlacedAsBlocksInALoopAreEachChecked()
        // 1.2 V × 9 kΩ / (9 + 10) kΩ = 568 mV, above 480 mV, in each placed bit.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(KeptBits(strong: true),
            Pw3005().WithArguments("bit0.x.keeper", "10 kΩ", "bit0.x", "9 kΩ", "bit0.x", "568 mV", "480 mV", "600 mV", "120 mV"),
            Pw3005().WithArguments("bit1.x.keeper", "10 kΩ", "bit1.x", "9 kΩ", "bit1.x", "568 mV", "480 mV", "600 mV", "120 mV"))
            .RunAsync();

    [Fact]
    public Task KeptBitsPlacedAsBlocksWithTheProcessKeeperAreClean()
        // The process's 40 kΩ keeper: 1.2 × 9 / 49 = 220 mV.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(System.Text.RegularExpressions.Regex.Replace(KeptBits(strong: false), @"\{\|#\d+:|\|\}", string.Empty))
            .RunAsync();
}
