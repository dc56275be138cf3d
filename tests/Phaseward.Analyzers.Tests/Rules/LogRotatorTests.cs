using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// A designer's 4-bit log rotator through the compiler: two 2:1 mux stages (rotate by 1 on s0, by 2 on s1), each
/// output bit a pair of pass gates on a select and its other select, into dynamic latches; written with LINQ and a
/// helper, as designers write it. The conducting path from a source latch's output inverter to a capturing latch's
/// storage node is three pass gates, the other branch at each mux input being a capacitive side load.
/// Hand computation on the flat test figures (<see cref="RuleSources"/>), Elmore delay T = Σ_k R_k · C_down(k)
/// (W. C. Elmore, J. Appl. Phys. 19(1), 1948; side branches as loads: Rubinstein, Penfield, Horowitz, "Signal Delay
/// in RC Tree Networks", IEEE Trans. CAD 2(3), 1983): driver 4 kΩ · 40 fF = 160 ps, gate 1 5 kΩ · 30 fF = 150 ps,
/// gate 2 5 kΩ · 20 fF = 100 ps, entry gate 5 kΩ · 10 fF = 50 ps: T = 460 ps, 50 % delay 0.69 · 460 = 317.4 ps.
/// With every branch conducting (selects not known to be exclusive): 440 + 250 + 100 + 50 = 840 ps.
/// </summary>
public class LogRotatorTests
{
    private static string Rotator(string selects) => RuleSources.Design("Rotator", $$"""
        var clk = c.Clock("clk", 2.Nanoseconds(), 0.5, 0.Picoseconds());
        var d = System.Linq.Enumerable.Range(0, 4).Select(i => c.DynamicLatch(c.Input("in" + i), clk.Low, "A" + i)).ToArray();
        var s0 = c.Input("s0");
        var s1 = c.Input("s1");
        {{selects}}
        var m2 = Stage(c, Stage(c, d, 1, s0, ns0, "m1_"), 2, s1, ns1, "m2_");
        for (var i = 0; i < 4; i++)
            c.Output("q" + i, {|#0:c.DynamicLatch(m2[i], clk.High, "L" + i)|});
        """, """
        private static Net[] Stage(Circuit c, Net[] input, int shift, Net select, Net other, string prefix)
        {
            var outputs = new Net[input.Length];
            for (var i = 0; i < input.Length; i++)
            {
                outputs[i] = c.Node(prefix + i);
                {|#1:c.TransmissionGate(input[i], other, outputs[i])|};
                c.TransmissionGate(input[(i - shift + input.Length) % input.Length], select, outputs[i]);
            }

            return outputs;
        }
        """).Replace("using Phaseward;", "using System.Linq;\nusing Phaseward;");

    // Reported at the capturing latch's entry gate (the third gate, past a limit of 2), the run's first gate (the
    // first mux's branch on the other select) related; one diagnostic for the four latches made at that call.
    private static DiagnosticResult PW2001(string elmore, string fifty, string assumption)
        => new DiagnosticResult(RuleCatalog.SeriesPassGates.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
            .WithArguments("3", "2", elmore, fifty, "1", "199 ps", assumption, "m1_0.tg1", "L0.pass", "Rotator")
            .FoundAtThisCall(4, "Rotator", "m1_0.tg1, m1_1.tg1, m1_2.tg1, ...");

    [Fact]
    public Task SelectsAndTheirInversesGiveTheConductingPathDelay()
        // T = 460 ps, 0.69 · 460 = 317 ps; the other select is an inverter's output, so no assumption is stated.
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>(Rotator("""
            var ns0 = c.Inverter(s0, "ns0");
            var ns1 = c.Inverter(s1, "ns1");
            """),
            PW2001("460 ps", "317 ps", ""))
            .WithEditorConfig("phaseward.max_series_pass_gates = 2")
            .RunAsync();

    [Fact]
    public Task SelectsNotKnownExclusiveCountEveryBranchAndSaySo()
        // Four independent select inputs: every branch may conduct, T = 840 ps, 0.69 · 840 = 580 ps, and the message
        // states the assumption.
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>(Rotator("""
            var ns0 = c.Input("ns0");
            var ns1 = c.Input("ns1");
            """),
            PW2001("840 ps", "580 ps", Phaseward.Rules.PassGatePaths.PassGateChainRule.ExclusivityAssumption))
            .WithEditorConfig("phaseward.max_series_pass_gates = 2")
            .RunAsync();

    [Fact]
    public Task StatingTheSelectsExclusiveGivesTheConductingPathAgain()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>(Rotator("""
            var ns0 = c.Input("ns0");
            var ns1 = c.Input("ns1");
            c.Exclusive(s0, ns0);
            c.Exclusive(ns1, s1);
            """),
            PW2001("460 ps", "317 ps", ""))
            .WithEditorConfig("phaseward.max_series_pass_gates = 2")
            .RunAsync();
}
