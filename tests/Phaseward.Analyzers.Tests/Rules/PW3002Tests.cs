using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW3002 through the compiler. A High-phase dynamic latch floats for (1 − D)·T − s per period (the Low time less the
/// 30 ps complement skew of the illustrative process; common practice), against t_ret = 4.5 fF × 0.3 V / 5 pA = 270 µs (5 pA: a test figure each design sets, below the
/// 1 nA hot-corner default)
/// (common practice: Q = C·V, t = Q/I). The lowest safe frequency is (1 − D)/(t_ret + s), rounded up to three
/// significant digits. Reported at the call that made the node, with the root clock's declaration as additional location.
/// </summary>
public class PW3002Tests
{
    private static DiagnosticResult PW3002() => new DiagnosticResult(RuleCatalog.ClockTooSlowForDynamicStorage.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1);

    private static string Message(string node, string isolation, string period, string clock, string minimum, string retention = "270 µs", string leak = "5 pA")
        => $"Dynamic node '{node}' floats for up to {isolation} of every {period} period of clock '{clock}', longer than its retention time {retention} "
           + $"(C·ΔV/I_leak with C = 4.5 fF, ΔV = 300 mV, I_leak = {leak} at the hot corner); run the clock at {minimum} or faster";

    private static string Design(string body) => $$"""
        using Phaseward;

        public sealed class Housekeeping : Design
        {
            protected override void Describe(Circuit c)
            {
                c.UseProcess(new Process { StorageLeakage = 5.Picoamperes() });
        {{body}}
            }
        }
        """;

    [Fact]
    public Task SlowClockIsReportedWithTheLowestSafeFrequency()
        // Isolation 500 µs − 30 ps; f_min = 0.5 / (270 µs + 30 ps) = 1851.85 Hz → 1.86 kHz.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var tick = {|#1:c.Clock("housekeeping", 1.Milliseconds())|};
                    c.Output("level", {|#0:c.DynamicLatch(c.Input("battery_ok"), tick.High, "level")|});
            """),
            PW3002().WithMessage(Message("level.x", "500 µs", "1 ms", "housekeeping", "1.86 kHz")))
            .RunAsync();

    [Theory]
    [InlineData("540.Microseconds()")] // isolation 270 µs − 30 ps: just holds
    [InlineData("2.Nanoseconds()")]
    public Task FastEnoughClockIsNotReported(string period)
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design($$"""
                    var tick = c.Clock("housekeeping", {{period}});
                    c.Output("level", c.DynamicLatch(c.Input("battery_ok"), tick.High, "level"));
            """))
            .RunAsync();

    [Fact]
    public Task JustTooSlowIsReported()
        // 544 µs: isolation 272 µs − 30 ps > 270 µs; f_min 1.86 kHz as above.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var tick = {|#1:c.Clock("housekeeping", 544.Microseconds())|};
                    c.Output("level", {|#0:c.DynamicLatch(c.Input("battery_ok"), tick.High, "level")|});
            """),
            PW3002().WithMessage(Message("level.x", "272 µs", "544 µs", "housekeeping", "1.86 kHz")))
            .RunAsync();

    [Fact]
    public Task StaticCellsOnASlowClockAreNotReported()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var tick = c.Clock("housekeeping", 1.Seconds());
                    var d = c.Input("battery_ok");
                    c.Output("level", c.StaticLatch(d, tick.High, "level"));
                    c.Output("count", c.StaticRegister(d, tick, "count"));
            """))
            .RunAsync();

    [Fact]
    public Task BothLatchesOfEveryDynamicRegisterInALoopAreReportedAtTheCall()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var tick = {|#1:c.Clock("housekeeping", 1.Milliseconds())|};
                    var carry = c.Input("count_enable");
                    for (var bit = 0; bit < 2; bit++)
                    {
                        var state = {|#0:c.DynamicRegister(carry, tick, $"battery_count{bit}")|};
                        carry = c.Nand(state, carry);
                    }

                    c.Output("battery_carry", carry);
            """),
            PW3002().WithMessage(Message("battery_count0.master.x", "500 µs", "1 ms", "housekeeping", "1.86 kHz"))
                .FoundAtThisCall(4, "Housekeeping", "battery_count0.master.x, battery_count0.slave.x, battery_count1.master.x, ..."))
            .RunAsync();

    [Fact]
    public Task LeakageOverrideMakesAFastClockTooSlow()
        // 4.5 fF × 0.3 V / 2 nA = 675 ns < 5 µs − 30 ps; f_min = 0.5 / (675 ns + 30 ps) = 740.71 kHz → 741 kHz.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var tick = {|#1:c.Clock("housekeeping", 10.Microseconds())|};
                    var node = c.Node("level");
                    {|#0:c.TransmissionGate(c.Input("battery_ok"), tick.High, node)|};
                    c.SetLeakage(node, 2.Nanoamperes());
                    c.Output("sense", c.Inverter(node, "sense"));
            """),
            PW3002().WithMessage(Message("level", "5 µs", "10 µs", "housekeeping", "741 kHz", retention: "675 ns", leak: "2 nA")))
            .RunAsync();

    [Fact]
    public Task CapacitanceOverrideMakesASlowClockSafe()
        // 10 fF × 0.3 V / 5 pA = 600 µs > 500 µs − 30 ps.
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>(Design("""
                    var tick = c.Clock("housekeeping", 1.Milliseconds());
                    var node = c.Node("level");
                    c.TransmissionGate(c.Input("battery_ok"), tick.High, node);
                    c.SetCapacitance(node, 10.Femtofarads());
                    c.Output("sense", c.Inverter(node, "sense"));
            """))
            .RunAsync();

    [Fact]
    public Task ARegisterMadeInAHelperIsReportedInsideTheHelper()
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>("""
            using Phaseward;

            public sealed class Housekeeping : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = {|#1:c.Clock("housekeeping", 1.Milliseconds())|};
                    c.Output("count", {|#2:Count(c, c.Input("count_enable"), tick)|});
                }

                private static Net Count(Circuit c, Net enable, Clock clock)
                    => {|#0:c.DynamicRegister(enable, clock, "count")|};
            }
            """,
            PW3002().WithLocation(2).WithMessage(Message("count.master.x", "500 µs", "1 ms", "housekeeping", "371 kHz", retention: "1.35 µs", leak: "1 nA"))
                .FoundAtThisCall(2, "Housekeeping", "count.master.x, count.slave.x"))
            .RunAsync();
}
