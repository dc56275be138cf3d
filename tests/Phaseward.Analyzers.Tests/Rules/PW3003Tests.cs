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
                    + "a 1.2 V level settles at 600 mV, a droop of 600 mV, more than the tolerated 300 mV"),
            new DiagnosticResult(RuleCatalog.ChargeSharing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(0)
                .WithMessage("When 'n2' conducts, floating node 'n1' (C1 = 4 fF) shares its charge with floating node 'n2' (C2 = 4.5 fF): "
                    + "a 1.2 V level settles at 565 mV, a droop of 635 mV, more than the tolerated 300 mV"))
            .RunAsync();
}
