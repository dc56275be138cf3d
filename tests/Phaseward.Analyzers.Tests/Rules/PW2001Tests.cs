using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW2001 through the analyzer: chains written straight, in loops, as mux trees and across helpers; the limit option and
/// severity configuration. Scenario (invented): a buoy's telemetry front end routing sensor samples through pass gates.
/// </summary>
/// <remarks>
/// Figures use Phaseward's illustrative process (invented defaults: pass gate 5 kΩ, driver 4 kΩ, wire 1 fF, diffusion
/// 1.5 fF, gate load 2 fF, stage delay 20 ps), for which the limit is 2 (m_opt = 1.70·sqrt(20 ps / (5 kΩ · 4 fF)) = 1.70,
/// best whole spacing 2). The Elmore figures below are worked by hand with the RC-tree sum (Elmore, J. Appl. Phys. 19,
/// 1948; the tree form as in Rubinstein, Penfield and Horowitz, IEEE Trans. CAD 2(3), 1983): Σ R_k · C_downstream(k).
/// </remarks>
public class PW2001Tests
{
    private static DiagnosticResult PW2001 => new(RuleCatalog.SeriesPassGates.Id, DiagnosticSeverity.Warning);

    // Three gates from input a to an inverter. Nets: a = wire 1 + one TG terminal 1.5 = 2.5 fF; n1, n2 = 1 + 1.5·2 = 4 fF;
    // n3 = 1 + 1.5 + inverter gate 2 = 4.5 fF. Downstream: n3 4.5, n2 8.5, n1 12.5, a 15 fF.
    // Elmore = 4 kΩ·15 fF + 5 kΩ·(12.5 + 8.5 + 4.5) fF = 60 + 127.5 = 187.5 ps ("188 ps"); 50 %: ln 2 · 187.5 = 130 ps.
    // Restored every 2: mean C = 12.5/3 fF, R·C = 20.83 ps; t = 3·(ln 2·20.83 ps·3/2 + 20 ps/2) = 95.0 ps.
    [Fact]
    public Task StraightChainIsReportedAtTheFirstGateBeyondTheLimit()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var a = c.Input("a");
                    var n1 = {|#0:c.TransmissionGate(a, clk.High, "n1")|};
                    var n2 = c.TransmissionGate(n1, clk.High, "n2");
                    var n3 = {|#1:c.TransmissionGate(n2, clk.High, "n3")|};
                    c.Output("y", c.Inverter(n3));
                }
            }
            """,
            PW2001.WithLocation(1).WithLocation(0).WithArguments("3", "2", "188 ps", "129 ps", "2", "107 ps", "", "n1", "n3", "Relay"))
            .RunAsync();

    [Fact]
    public Task ChainAtTheLimitIsClean()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Short : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var n1 = c.TransmissionGate(c.Input("a"), clk.High);
                    var n2 = c.TransmissionGate(n1, clk.Low);
                    var restored = c.Buffer(n2);
                    var n3 = c.TransmissionGate(restored, clk.High);
                    c.Output("y", c.Inverter(c.TransmissionGate(n3, clk.Low)));
                }
            }
            """).RunAsync();

    // Six gates in a loop: a 2.5 fF, n1..n5 4 fF, n6 4.5 fF; downstream n6 4.5, n5 8.5, n4 12.5, n3 16.5, n2 20.5,
    // n1 24.5, a 27 fF. Elmore = 4 kΩ·27 fF + 5 kΩ·87 fF = 108 + 435 = 543 ps; 50 %: 376 ps.
    // Restored: mean C = 24.5/6 fF, R·C = 20.42 ps; t = 6·(ln 2·20.42 ps·3/2 + 10 ps) = 187 ps.
    // The loop's single call is both the first gate and the first gate beyond the limit.
    // hop (sample.High) → mux1, mux2 (on the input 'route') → leg (sample.Low) → inverter. Neighbours can all conduct
    // together, but hop and leg never do: the runs are hop, mux1, mux2 (while high) and mux1, mux2, leg (while low), each
    // of 3 > 2, not one of 4. Nets: a 2.5 fF; h, m1, m2 4 fF; l = 1 + 1.5 + inverter gate 2 = 4.5 fF.
    // Downstream: l 4.5, m2 8.5, m1 12.5, h 16.5, a 19 fF.
    //   hop..mux2: Elmore = 4 kΩ·19 fF + 5 kΩ·(16.5 + 12.5 + 8.5) fF = 76 + 187.5 = 263.5 ps; 50 %: 0.69·263.5 = 181.8 ps;
    //     restored every 2 (mean node C (4 + 4 + 4)/3 = 4 fF, R·C = 20 ps, input a 2.5 fF):
    //     0.69·4 kΩ·(2.5 + 2·4) fF + 0.69·20 ps·(3 + 1) + 20 ps = 28.98 + 55.2 + 20 = 104.2 ps.
    //   mux1..leg, driven from h through the 4 kΩ driver resistance (no restoring stage drives h):
    //     Elmore = 4 kΩ·16.5 fF + 5 kΩ·(12.5 + 8.5 + 4.5) fF = 66 + 127.5 = 193.5 ps; 50 %: 133.5 ps;
    //     restored (mean C 12.5/3 fF, R·C = 20.83 ps, input h 4 fF): 0.69·4 kΩ·(4 + 8.33) fF + 0.69·20.83 ps·4 + 20 ps
    //     = 34.04 + 57.5 + 20 = 111.5 ps.
    // (Elmore, J. Appl. Phys. 19(1), 1948; the tree sum of Rubinstein, Penfield and Horowitz, IEEE Trans. CAD 2(3), 1983.)
    [Fact]
    public Task GatesOnOppositePhasesWithDataGatesBetweenAreNotOneRun()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Crossover : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var route = c.Input("route");
                    var h = {|#0:c.TransmissionGate(c.Input("a"), clk.High, "hop")|};
                    var m1 = {|#1:c.TransmissionGate(h, route, "mux1")|};
                    var m2 = {|#2:c.TransmissionGate(m1, route, "mux2")|};
                    var l = {|#3:c.TransmissionGate(m2, clk.Low, "leg")|};
                    c.Output("y", c.Inverter(l));
                }
            }
            """,
            PW2001.WithLocation(2).WithLocation(0).WithArguments("3", "2", "264 ps", "182 ps", "2", "104 ps", "", "hop", "mux2", "Crossover"),
            PW2001.WithLocation(3).WithLocation(1).WithArguments("3", "2", "194 ps", "134 ps", "2", "112 ps", "", "mux1", "leg", "Crossover"))
            .RunAsync();

    // The same gates with the limit raised to 3: both runs of 3 are within it (the four gates would not be).
    [Fact]
    public Task PhaseBrokenRunsWithinTheLimitAreClean()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Crossover : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var route = c.Input("route");
                    var h = c.TransmissionGate(c.Input("a"), clk.High, "hop");
                    var m1 = c.TransmissionGate(h, route, "mux1");
                    var m2 = c.TransmissionGate(m1, route, "mux2");
                    var l = c.TransmissionGate(m2, clk.Low, "leg");
                    c.Output("y", c.Inverter(l));
                }
            }
            """)
            .WithEditorConfig("phaseward.max_series_pass_gates = 3")
            .RunAsync();

    [Fact]
    public Task ChainBuiltInALoopIsReportedAtTheLoopsCall()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = c.Input("a");
                    for (var i = 0; i < 6; i++)
                        x = {|#0:c.TransmissionGate(x, clk.High)|};
                    c.Output("y", c.Inverter(x));
                }
            }
            """,
            PW2001.WithLocation(0).WithLocation(0).WithArguments("6", "2", "543 ps", "375 ps", "2", "196 ps", "", "tg1", "tg3", "Row"))
            .RunAsync();

    [Fact]
    public Task LoopRestoredEverySecondIterationIsClean()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = c.Input("a");
                    for (var i = 0; i < 6; i++)
                    {
                        x = c.TransmissionGate(x, clk.High);
                        if ((i + 1) % 2 == 0)
                            x = c.Buffer(x);
                    }

                    c.Output("y", c.Inverter(x));
                }
            }
            """).RunAsync();

    // A four-input data-controlled mux (two levels, arms wired onto c.Node nets with the drive-existing-net overloads)
    // followed by one route gate: every path is 3 gates long, so the route gate is reported once (not once per input).
    // Its chain starts at the first-made first-level arm (ties broken by device order).
    [Fact]
    public Task MuxTreeIsReportedOnceAtTheGateBeyondTheLimit()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Select4 : Design
            {
                protected override void Describe(Circuit c)
                {
                    var s0 = c.Input("s0");
                    var s0b = c.Inverter(s0);
                    var s1 = c.Input("s1");
                    var s1b = c.Inverter(s1);
                    var low = c.Node("low");
                    var high = c.Node("high");
                    var pick = c.Node("pick");
                    {|#0:c.TransmissionGate(c.Input("ch0"), s0b, low)|};
                    c.TransmissionGate(c.Input("ch1"), s0, low);
                    c.TransmissionGate(c.Input("ch2"), s0b, high);
                    c.TransmissionGate(c.Input("ch3"), s0, high);
                    c.TransmissionGate(low, s1b, pick);
                    c.TransmissionGate(high, s1, pick);
                    var routed = {|#1:c.TransmissionGate(pick, c.Input("route_enable"), "routed")|};
                    c.Output("y", c.Inverter(routed));
                }
            }
            """,
            PW2001.WithLocation(1).WithLocation(0))
            .RunAsync();

    // An eight-input mux tree built in nested loops: paths are 3 gates long and end at the two last-level arms, each
    // reported once at its call in the loop; both chains start at the first-level arm made first (device order).
    [Fact]
    public Task MuxTreeBuiltInLoopsReportsEachLastLevelArm()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Select8 : Design
            {
                protected override void Describe(Circuit c)
                {
                    var level = new Net[8];
                    for (var i = 0; i < level.Length; i++)
                        level[i] = c.Input($"ch{i}");
                    for (var bit = 0; level.Length > 1; bit++)
                    {
                        var select = c.Input($"sel{bit}");
                        var selectBar = c.Inverter(select);
                        var next = new Net[level.Length / 2];
                        for (var i = 0; i < next.Length; i++)
                        {
                            next[i] = c.Node($"mux{bit}_{i}");
                            {|#0:c.TransmissionGate(level[2 * i], selectBar, next[i])|};
                            {|#1:c.TransmissionGate(level[2 * i + 1], select, next[i])|};
                        }

                        level = next;
                    }

                    c.Output("y", c.Inverter(level[0]));
                }
            }
            """,
            PW2001.WithLocation(0).WithLocation(0),
            PW2001.WithLocation(1).WithLocation(0))
            .RunAsync();

    // The chain's middle gate is made in a helper of the same class: the chain is followed through the call.
    [Fact]
    public Task ChainThroughAHelperMethod()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var first = {|#0:c.TransmissionGate(c.Input("a"), clk.High)|};
                    var middle = Hop(c, first, clk.High);
                    var last = {|#1:c.TransmissionGate(middle, clk.High)|};
                    c.Output("y", c.Inverter(last));
                }

                private static Net Hop(Circuit circuit, Net x, Phase when) => circuit.TransmissionGate(x, when);
            }
            """,
            PW2001.WithLocation(1).WithLocation(0))
            .RunAsync();

    // The gate beyond the limit is made in a helper in another file: reported at the call in Describe that led there,
    // with the helper's gate and then the chain's first gate as additional locations.
    [Fact]
    public Task ChainIntoAHelperInAnotherFile()
    {
        var test = new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Relay : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var first = {|#0:c.TransmissionGate(c.Input("a"), clk.High)|};
                    var second = c.TransmissionGate(first, clk.High);
                    c.Output("y", c.Inverter({|#1:Routing.Hop(c, second, clk.High)|}));
                }
            }
            """,
            PW2001.WithLocation(1).WithLocation(2).WithLocation(0));
        test.TestState.Sources.Add(("/0/Routing.cs", """
            using Phaseward;

            public static class Routing
            {
                public static Net Hop(Circuit c, Net x, Phase when)
                    => {|#2:c.TransmissionGate(x, when, "hop")|};
            }
            """));
        return test.RunAsync();
    }

    [Theory]
    [InlineData(3, 3, false)]
    [InlineData(4, 3, true)]
    [InlineData(2, 1, true)]
    public Task TheOptionSetsTheLimit(int gates, int limit, bool reported)
    {
        var source = $$"""
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = c.Input("a");
                    for (var i = 0; i < {{gates}}; i++)
                        x = {|#0:c.TransmissionGate(x, clk.High)|};
                    c.Output("y", c.Inverter(x));
                }
            }
            """;
        var expected = reported ? new[] { PW2001.WithLocation(0).WithLocation(0) } : System.Array.Empty<DiagnosticResult>();
        if (!reported) source = source.Replace("{|#0:", string.Empty).Replace("|}", string.Empty);
        return new PhasewardAnalyzerTest<PassGatePathAnalyzer>(source, expected)
            .WithEditorConfig("phaseward.max_series_pass_gates = " + limit)
            .RunAsync();
    }

    // An option above the optimum: the limit is 4, the restoring spacing offered stays the process optimum (2).
    [Fact]
    public Task TheMessageCarriesTheConfiguredLimit()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>("""
            using Phaseward;

            public sealed class Row : Design
            {
                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("sample", 10.Nanoseconds());
                    var x = c.Input("a");
                    for (var i = 0; i < 6; i++)
                        x = {|#0:c.TransmissionGate(x, clk.High)|};
                    c.Output("y", c.Inverter(x));
                }
            }
            """,
            PW2001.WithLocation(0).WithLocation(0).WithArguments("6", "4", "543 ps", "375 ps", "2", "196 ps", "", "tg1", "tg5", "Row"))
            .WithEditorConfig("phaseward.max_series_pass_gates = 4")
            .RunAsync();

    private const string ThreeGates = """
        using Phaseward;

        public sealed class Relay : Design
        {
            protected override void {|#9:Describe|}(Circuit c)
            {
                var clk = c.Clock("sample", 10.Nanoseconds());
                var n1 = {|#0:c.TransmissionGate(c.Input("a"), clk.High)|};
                var n2 = c.TransmissionGate(n1, clk.High);
                c.Output("y", c.Inverter({|#1:c.TransmissionGate(n2, clk.High)|}));
            }
        }
        """;

    [Theory]
    [InlineData("0")]
    [InlineData("two")]
    [InlineData("10001")]
    public Task AnInvalidLimitIsReportedAndTheComputedLimitApplies(string value)
        => Task.WhenAll(
            new PhasewardAnalyzerTest<ElaborationAnalyzer>(ThreeGates.Replace("{|#0:", "").Replace("{|#1:", "").Replace(")|}", ")"),
                    new DiagnosticResult(RuleCatalog.InvalidOption.Id, DiagnosticSeverity.Warning).WithLocation(9)
                        .WithArguments("phaseward.max_series_pass_gates", value, "a whole number from 1 to 10000", "computed by the rule"))
                .WithEditorConfig("phaseward.max_series_pass_gates = " + value)
                .RunAsync(),
            new PhasewardAnalyzerTest<PassGatePathAnalyzer>(ThreeGates.Replace("{|#9:Describe|}", "Describe"),
                    PW2001.WithLocation(1).WithLocation(0).WithArguments("3", "2", "188 ps", "129 ps", "2", "107 ps", "", "tg1", "tg3", "Relay"))
                .WithEditorConfig("phaseward.max_series_pass_gates = " + value)
                .RunAsync());

    [Fact]
    public Task SeverityIsConfigurable()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>(ThreeGates.Replace("{|#9:Describe|}", "Describe"),
                new DiagnosticResult(RuleCatalog.SeriesPassGates.Id, DiagnosticSeverity.Info).WithLocation(1).WithLocation(0))
            .WithEditorConfig("dotnet_diagnostic.PW2001.severity = suggestion")
            .RunAsync();

    [Fact]
    public Task SeverityNoneSilencesTheRule()
        => new PhasewardAnalyzerTest<PassGatePathAnalyzer>(ThreeGates.Replace("{|#9:Describe|}", "Describe").Replace("{|#0:", "").Replace("{|#1:", "").Replace(")|}", ")"))
            .WithEditorConfig("dotnet_diagnostic.PW2001.severity = none")
            .RunAsync();
}
