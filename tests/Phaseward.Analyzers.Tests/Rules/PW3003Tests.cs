using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW3003 through the compiler. Droop V·C2/(C1+C2) by conservation of charge (common practice; the formula's source is
/// named in Phaseward.Tests/Storage/ChargeSharingTests), V = 1.2 V and ΔV = 0.3 V tolerated (illustrative process).
/// Reported at the pass device that opens, with the call that made the charged node as additional location.
/// </summary>
public class PW3003Tests
{
    private static DiagnosticResult PW3003() => new DiagnosticResult(RuleCatalog.ChargeSharing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1);

    private static string Design(string body) => $$"""
        using Phaseward;

        public sealed class Sharing : Design
        {
            protected override void Describe(Circuit c)
            {
        {{body}}
            }
        }
        """;

    [Fact]
    public Task TwoDynamicNodesInSeriesShareCharge()
        // a: wire 1 + two pass-gate terminals 2 × 1.5 = 4 fF; b: wire 1 + one terminal 1.5 + inverter gate 2 = 4.5 fF.
        // Droop 1.2 V × 4.5 / 8.5 = 635.3 mV; settles at 1.2 V × 4 / 8.5 = 564.7 mV.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    var a = {|#1:c.TransmissionGate(c.Input("d"), clk.Low, "a")|};
                    var b = {|#0:c.TransmissionGate(a, clk.High, "b")|};
                    c.Output("q", c.Inverter(b, "q"));
            """),
            PW3003().WithMessage("When 'b' conducts, floating node 'a' (C1 = 4 fF) shares its charge with floating node 'b' (C2 = 4.5 fF): "
                + "a 1.2 V level settles at 565 mV, a droop of 635 mV, more than the tolerated 300 mV"))
            .RunAsync();

    [Theory]
    [InlineData("13.6.Femtofarads()")] // 1.2 × 4.5 / 18.1 = 298.3 mV
    [InlineData("100.Femtofarads()")]  // 1.2 × 4.5 / 104.5 = 51.7 mV
    public Task ABigEnoughStorageCapacitorAbsorbsTheSharing(string capacitance)
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design($$"""
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    var a = c.TransmissionGate(c.Input("d"), clk.Low, "a");
                    c.SetCapacitance(a, {{capacitance}});
                    c.Output("q", c.Inverter(c.TransmissionGate(a, clk.High, "b"), "q"));
            """))
            .RunAsync();

    [Fact]
    public Task JustTooSmallAStorageCapacitorIsReportedWithIt()
        // 1.2 × 4.5 / 17.5 = 308.6 mV droop; settles at 1.2 × 13 / 17.5 = 891.4 mV.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    var a = {|#1:c.TransmissionGate(c.Input("d"), clk.Low, "a")|};
                    c.SetCapacitance(a, 13.Femtofarads());
                    c.Output("q", c.Inverter({|#0:c.TransmissionGate(a, clk.High, "b")|}, "q"));
            """),
            PW3003().WithMessage("When 'b' conducts, floating node 'a' (C1 = 13 fF) shares its charge with floating node 'b' (C2 = 4.5 fF): "
                + "a 1.2 V level settles at 891 mV, a droop of 309 mV, more than the tolerated 300 mV"))
            .RunAsync();

    [Fact]
    public Task LatchesFeedRestoredOutputsAndDoNotShare()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    var held = c.DynamicLatch(c.Input("d"), clk.Low, "first");
                    c.Output("q", c.DynamicLatch(held, clk.High, "second"));
            """))
            .RunAsync();

    [Fact]
    public Task AChainBuiltInALoopIsReportedOncePerSharingGate()
        // n0 → n1: 4 fF with 4 fF, droop 1.2 × 4 / 8 = 600 mV. n1 → n2: 4 fF with 4.5 fF, droop 635 mV as above.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    var n = c.Input("d");
                    for (var i = 0; i < 3; i++)
                        n = {|#0:c.TransmissionGate(n, i % 2 == 0 ? clk.Low : clk.High, $"n{i}")|};
                    c.Output("q", c.Inverter(n, "q"));
            """),
            new DiagnosticResult(RuleCatalog.ChargeSharing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(0)
                .WithMessage("When 'n1' conducts, floating node 'n0' (C1 = 4 fF) shares its charge with floating node 'n1' (C2 = 4 fF): "
                    + "a 1.2 V level settles at 600 mV, a droop of 600 mV, more than the tolerated 300 mV")
                .FoundAtThisCall(2, "Sharing", "n1, n2"))
            .RunAsync();

    // A register-file read port as the designer writes it: a 2-to-4 decoder drives the read selects, four 40 fF
    // dynamic cells, one bit line (wire 1 + four terminals 4 × 1.5 + the sense inverter's gate 2 = 9 fF).
    private static string ReadPort(string statement, bool marked) => Design($$"""
                    var clk = c.Clock("clk", 10.Nanoseconds());
                    var a0 = c.Input("a0");
                    var a1 = c.Input("a1");
                    var a0b = c.Inverter(a0, "a0_b");
                    var a1b = c.Inverter(a1, "a1_b");
                    var selects = new[] { c.Nor(a0, a1, "rsel0"), c.Nor(a0b, a1, "rsel1"), c.Nor(a0, a1b, "rsel2"), c.Nor(a0b, a1b, "rsel3") };
                    {{statement}}
                    var bitLine = c.Node("rbl");
                    for (var i = 0; i < selects.Length; i++)
                    {
                        var cell = {{(marked ? "{|#1:" : "")}}c.TransmissionGate(c.Input($"d{i}"), clk.High, $"cell{i}"){{(marked ? "|}" : "")}};
                        c.SetCapacitance(cell, 40.Femtofarads());
                        {{(marked ? "{|#0:" : "")}}c.TransmissionGate(cell, selects[i], bitLine){{(marked ? "|}" : "")}};
                    }

                    c.Output("q", c.Inverter(bitLine, "sense"));
            """);

    [Fact]
    public Task AOneHotReadPortStatedExclusiveIsClean()
        // One read gate open at a time: 40 fF shares with 9 fF, droop 1.2 V × 9 / 49 = 220.4 mV, under 300 mV.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(ReadPort("c.Exclusive(selects);", marked: false))
            .RunAsync();

    [Fact]
    public Task TheSameReadPortWithoutTheStatementSharesWithEveryCell()
        // Every read gate may be open together: C2 = 9 + 3 × 40 = 129 fF, droop 1.2 × 129 / 169 = 916 mV, settles
        // at 1.2 × 40 / 169 = 284 mV. Four causes at one call in a loop: one diagnostic per cause.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(ReadPort("// decoded, but not stated", marked: true),
            PW3003().WithMessage("When 'rbl.tg1' conducts, floating node 'cell0' (C1 = 40 fF) shares its charge with floating node 'rbl' (C2 = 129 fF, "
                + "counting 3 more floating nodes joined through pass gates that may conduct at the same time: 'cell1' through "
                + "'rbl.tg2', 'cell2' through 'rbl.tg3', 'cell3' through 'rbl.tg4'; state Circuit.Exclusive if their controls are "
                + "never high together): a 1.2 V level settles at 284 mV, a droop of 916 mV, more than the tolerated 300 mV")
                .FoundAtThisCall(4, "Sharing", "rbl.tg1, rbl.tg2, rbl.tg3, ..."),
            // The same unstated selects also make the read gates fight (PW3004, same analyzer).
            new DiagnosticResult(RuleCatalog.FightingDrivers.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(0)
                .WithMessage("'rbl.tg1' (14 kΩ) and 'rbl.tg2' (14 kΩ) drive node 'rbl' together whenever 'rsel0' and 'rsel1' are both high "
                    + "(not stated exclusive): when they disagree the node sits at 600 mV (divider, 'rbl.tg1' pulling up) and 42.9 µA "
                    + "flows from rail to rail"))
            .RunAsync();
}
