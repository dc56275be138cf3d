using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;

namespace Phaseward.Analyzers.Tests.CodeFixes;

/// <summary>
/// "Clock it from the ungated clock" for PW3001: the cell's phase (or a register's clock) is taken from the clock
/// upstream of the gate; the fixed design compiles and the finding is gone (a free-running 2 ns clock refreshes the node
/// every nanosecond). Offered only where the variable is provably that clock.
/// </summary>
public class ClockFromUngatedClockCodeFixTests
{
    private static DiagnosticResult PW3001(int marker = 0) => new DiagnosticResult(RuleCatalog.DynamicNodeOnGatedClock.Id, DiagnosticSeverity.Warning).WithLocation(marker).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations);

    private static PhasewardCodeFixTest<DynamicStorageAnalyzer, ClockFromUngatedClockCodeFix> Test(string source, string fixedSource, params DiagnosticResult[] expected)
        => new PhasewardCodeFixTest<DynamicStorageAnalyzer, ClockFromUngatedClockCodeFix>(source, fixedSource, expected).Choosing(EquivalenceKeys.ClockFromUngatedClock);

    private static string Design(string body) => $$"""
        using Phaseward;

        public sealed class BurstCapture : Design
        {
            protected override void Describe(Circuit c)
            {
        {{body}}
            }
        }
        """;

    [Fact]
    public Task TheLatchPhaseComesFromTheUngatedClock()
        => Test(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    // hold between bursts
                    var held = {|#0:c.DynamicLatch(c.Input("wave_bit"), /* phase */ burst.High, "wave_hold")|}; // the hazard
                    c.Output("wave_sample", held);
            """), Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    // hold between bursts
                    var held = c.DynamicLatch(c.Input("wave_bit"), /* phase */ capture.High, "wave_hold"); // the hazard
                    c.Output("wave_sample", held);
            """), PW3001()).RunAsync();

    [Fact]
    public Task TheRegisterClockComesFromTheUngatedClock()
        => Test(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst");
                    c.Output("count", {|#0:c.DynamicRegister(c.Input("count_enable"), burst, "count")|});
            """), Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.High, name: "burst");
                    c.Output("count", c.DynamicRegister(c.Input("count_enable"), capture, "count"));
            """), PW3001()).RunAsync();

    [Fact]
    public Task ThroughTwoGatesToTheNearestUngatedClockABufferedCopy()
        // The nearest clock upstream that cannot stop is the buffered copy, so the latch keeps the buffer's delay.
        => Test(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var late = c.BufferedClock(capture, name: "capture_late");
                    var burst = c.ClockGate(late, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    var fine = c.ClockGate(burst, c.Input("fine_enable"), ClockStopLevel.Low, name: "fine");
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), fine.High, "wave_hold")|});
            """), Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var late = c.BufferedClock(capture, name: "capture_late");
                    var burst = c.ClockGate(late, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    var fine = c.ClockGate(burst, c.Input("fine_enable"), ClockStopLevel.Low, name: "fine");
                    c.Output("wave_sample", c.DynamicLatch(c.Input("wave_bit"), late.High, "wave_hold"));
            """), PW3001()).RunAsync();

    [Fact]
    public Task FixAllReclocksEveryLatchInTheDocument()
        => Test(Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    var bit = c.Input("wave_bit");
                    var first = {|#0:c.DynamicLatch(bit, burst.High, "first")|};
                    for (var i = 0; i < 2; i++)
                        c.Output($"sample{i}", {|#1:c.DynamicLatch(first, burst.High, $"copy{i}")|});
                    c.Output("count", {|#2:c.DynamicRegister(bit, burst, "count")|});
            """), Design("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    var bit = c.Input("wave_bit");
                    var first = c.DynamicLatch(bit, capture.High, "first");
                    for (var i = 0; i < 2; i++)
                        c.Output($"sample{i}", c.DynamicLatch(first, capture.High, $"copy{i}"));
                    c.Output("count", c.DynamicRegister(bit, capture, "count"));
            """), PW3001(0), PW3001(1), PW3001(1), PW3001(2)).RunAsync();

    private static Task NoFix(string body)
    {
        var source = Design(body);
        return new PhasewardCodeFixTest<DynamicStorageAnalyzer, ClockFromUngatedClockCodeFix>(source, source, PW3001()).RunAsync();
    }

    [Fact]
    public Task NoFixThroughABufferAfterTheGate()
        // Swapping would drop the buffer's delay: not a drop-in change.
        => NoFix("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    var late = c.BufferedClock(burst, name: "burst_late");
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), late.High, "wave_hold")|});
            """);

    [Fact]
    public Task NoFixWhenTheGatedClockVariableIsReassigned()
        => NoFix("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "first_burst");
                    burst = c.ClockGate(capture, c.Input("other_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold")|});
            """);

    [Fact]
    public Task NoFixWhenTheUngatedClockVariableIsReassigned()
        => NoFix("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    capture = c.Clock("other", 3.Nanoseconds());
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold")|});
            """);

    [Fact]
    public Task NoFixWhenThePhaseIsHeldInAVariable()
        => NoFix("""
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    var phase = burst.High;
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), phase, "wave_hold")|});
            """);

    [Fact]
    public Task NoFixWhenTheGatedClockIsAssignedApartFromItsDeclaration()
        => NoFix("""
                    Clock burst;
                    {
                        var capture = c.Clock("capture", 2.Nanoseconds());
                        burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    }
                    c.Output("wave_sample", {|#0:c.DynamicLatch(c.Input("wave_bit"), burst.High, "wave_hold")|});
            """);

    [Fact]
    public Task NoFixWhenTheCellTakesItsPhaseFromAHelperParameter()
    {
        const string Source = """
            using Phaseward;

            public sealed class BurstCapture : Design
            {
                protected override void Describe(Circuit c)
                {
                    var capture = c.Clock("capture", 2.Nanoseconds());
                    var burst = c.ClockGate(capture, c.Input("burst_enable"), ClockStopLevel.Low, name: "burst");
                    c.Output("a", Hold(c, c.Input("a_bit"), burst));
                }

                private static Net Hold(Circuit c, Net d, Clock clock)
                    => {|#0:c.DynamicLatch(d, clock.High, "hold")|};
            }
            """;
        return new PhasewardCodeFixTest<DynamicStorageAnalyzer, ClockFromUngatedClockCodeFix>(Source, Source, PW3001()).RunAsync();
    }
}
