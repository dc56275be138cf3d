using System.IO;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.CodeFixes;

namespace Phaseward.Analyzers.Tests.Samples;

/// <summary>
/// The clock samples of samples/Quorvane at compile time, read from the repository as the designer wrote them: the
/// non-overlapping two-phase tally is clean under every analyzer, and the crossing sample's PW1003 code fix writes
/// exactly its synchronized twin. (At run time: SampleReportTests in Phaseward.Cli.Tests; netlist parity: ParityTests.)
/// </summary>
public class ClockSampleTests
{
    private static string Sample(string file) => File.ReadAllText(Repository.PathOf("samples", "Quorvane", file)).Replace("\r\n", "\n");

    private static readonly (string, string) ProcessFile = ("QuorvaneProcess.cs", Sample("QuorvaneProcess.cs"));

    [Fact]
    public async Task TheNonOverlappingTwoPhaseTallyIsCleanUnderEveryAnalyzer()
    {
        // phi1 high over [0, 800) ps and phi2 over [1000, 1800) ps of 2 ns, each complement 30 ps late: windows
        // [0, 830) and [1000, 1830) ps for the High phases the latches use, 170 ps apart (invented figures).
        await Clean<ClockPhaseAnalyzer>();
        await Clean<PassGatePathAnalyzer>();
        await Clean<DynamicStorageAnalyzer>();
        await Clean<TimingAnalyzer>();
        await Clean<ElaborationAnalyzer>();

        static Task Clean<TAnalyzer>() where TAnalyzer : DiagnosticAnalyzer, new()
        {
            var test = new PhasewardAnalyzerTest<TAnalyzer>(Sample("TwoPhaseTally.cs"));
            test.TestState.Sources.Add(ProcessFile);
            return test.RunAsync();
        }
    }

    [Fact]
    public Task TheCrossingSampleShowsPw1003AndItsCodeFixWritesTheSynchronizedTwin()
    {
        var text = Sample("RadioHandoff.cs");
        var twin = text.IndexOf("public sealed class RadioHandoffSynchronized", System.StringComparison.Ordinal);
        Assert.True(twin > 0, "RadioHandoff.cs no longer holds the class RadioHandoffSynchronized");
        var hazard = text.Substring(0, twin);
        const string Crossing = "c.StaticRegister(sample, radio, \"tx\")";
        const string Sender = "c.StaticRegister(c.Input(\"height_bit\"), sensor, \"sample\")";
        const string Fixed = "c.StaticRegister(c.StaticRegister(c.StaticRegister(sample, radio), radio), radio, \"tx\")";
        // The twin is what the fix writes, word for word.
        Assert.Contains(Fixed, text.Substring(twin));
        Assert.Contains(Crossing, hazard);

        var marked = hazard.Replace(Crossing, "{|#0:" + Crossing + "|}").Replace(Sender, "{|#1:" + Sender + "|}") + text.Substring(twin);
        var repaired = hazard.Replace(Crossing, Fixed) + text.Substring(twin);
        var expected = new DiagnosticResult(RuleCatalog.ClockCrossing.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
            .WithMessage("'tx' on clock 'radio' takes data from latch 'sample.slave' on clock 'sensor', which has no fixed time relation to it "
                         + "('radio' is declared independent), without a synchronizer: it can sample the data while it changes and go metastable");
        var test = new PhasewardCodeFixTest<ClockPhaseAnalyzer, InsertSynchronizerCodeFix>(marked, repaired, expected);
        test.TestState.Sources.Add(ProcessFile);
        test.FixedState.Sources.Add(ProcessFile);
        return test.RunAsync();
    }
}
