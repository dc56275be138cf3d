using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.CodeFixes;

/// <summary>
/// The PW1003 code fix. Each fixed design is re-analysed by the framework and must compile and carry no clock-phase
/// diagnostic: two registers of the receiving clock in series where the data arrives is the usual synchronizer
/// (common practice; Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10, synchronizers; from memory).
/// </summary>
public class InsertSynchronizerCodeFixTests
{
    private static DiagnosticResult Pw1003(string receiver, string receiving, string sender, string sending)
        => new DiagnosticResult(RuleCatalog.ClockCrossing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
            .WithMessage($"'{receiver}' on clock '{receiving}' takes data from latch '{sender}' on clock '{sending}', which has no fixed time " +
                         $"relation to it ('{receiving}' is declared independent), without a synchronizer: it can sample the data while it changes and go metastable");

    [Fact]
    public Task InsertsTwoRegistersOfTheReceivingClockInFrontOfARegisterKeepingComments()
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, InsertSynchronizerCodeFix>(Design("Crossing", """
            var sensor = c.Clock("sensor", 4.Nanoseconds());
            var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);
            var sample = {|#1:c.StaticRegister(c.Input("height"), sensor, "sample")|};
            c.Output("tx", {|#0:c.StaticRegister(/* crossing */ sample, radio, "tx")|});
            """), Design("Crossing", """
            var sensor = c.Clock("sensor", 4.Nanoseconds());
            var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);
            var sample = c.StaticRegister(c.Input("height"), sensor, "sample");
            c.Output("tx", c.StaticRegister(/* crossing */ c.StaticRegister(c.StaticRegister(sample, radio), radio), radio, "tx"));
            """), Pw1003("tx", "radio", "sample.slave", "sensor"))
            .RunAsync();

    [Fact]
    public Task InsertsTheSynchronizerInFrontOfALowPhaseLatch()
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, InsertSynchronizerCodeFix>(Design("LatchCrossing", """
            var sensor = c.Clock("sensor", 4.Nanoseconds());
            var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);
            var sample = {|#1:c.DynamicLatch(c.Input("height"), sensor.High, "sample")|};
            c.Output("tx", {|#0:c.StaticLatch(c.Inverter(sample), radio.Low, "tx")|});
            """), Design("LatchCrossing", """
            var sensor = c.Clock("sensor", 4.Nanoseconds());
            var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);
            var sample = c.DynamicLatch(c.Input("height"), sensor.High, "sample");
            c.Output("tx", c.StaticLatch(c.StaticRegister(c.StaticRegister(c.Inverter(sample), radio), radio), radio.Low, "tx"));
            """), Pw1003("tx", "radio", "sample", "sensor"))
            .RunAsync();

    [Fact]
    public Task NoFixWhenTheClockIsMadeAtTheCall()
        // Repeating c.Clock(...) for the new registers would make more clocks.
        => new PhasewardCodeFixTest<ClockPhaseAnalyzer, InsertSynchronizerCodeFix>(Design("Inline", """
            var sensor = c.Clock("sensor", 4.Nanoseconds());
            var sample = {|#1:c.StaticRegister(c.Input("height"), sensor, "sample")|};
            {|#0:c.StaticRegister(sample, c.Clock("radio", 3.Nanoseconds(), independent: true), "tx")|};
            """), Design("Inline", """
            var sensor = c.Clock("sensor", 4.Nanoseconds());
            var sample = {|#1:c.StaticRegister(c.Input("height"), sensor, "sample")|};
            {|#0:c.StaticRegister(sample, c.Clock("radio", 3.Nanoseconds(), independent: true), "tx")|};
            """), Pw1003("tx", "radio", "sample.slave", "sensor"))
            .RunAsync();
}
