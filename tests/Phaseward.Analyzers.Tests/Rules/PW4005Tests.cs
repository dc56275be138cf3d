using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW4005 through the analyzer: a loop of latches P (clk.High) → n inverters → Q (clk.Low) → Q's inverter and one more
/// → P, on a 1 ns clock with no overlap. The steady-state latch-loop constraint (Sakallah, Mudge &amp; Olukotun 1990, from
/// memory): the delays round a loop may not exceed the time its phases give it, here one period. With the test
/// process (<see cref="RuleSources"/>: t_TG = 34.5 ps, t_inv = 27.6 ps, each path's last stage also charging the next
/// latch's storage node through its open entry gate) the loop takes 207.0 + n · 27.6 ps: n = 29 gives 1007.4 ps, a
/// growth of 7.4 ps every time round; n = 28 gives 979.8 ps and settles (the same figures as TimingTests at run time).
/// </summary>
public class PW4005Tests
{
    private static string Loop(string name, int inverters) => Design(name, $$"""
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var start = c.Node("start");
        var net = {|#1:c.DynamicLatch(start, clk.High, "P")|};
        for (var i = 0; i < {{inverters}}; i++)
            net = c.Inverter(net);
        var q = {|#0:c.DynamicLatch(net, clk.Low, "Q")|};
        c.Inverter(q, start);
        """);

    [Fact]
    public Task ALoopWhoseDelaysExceedThePeriodIsReportedOnceWithItsGrowth()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Loop("Ring", 29),
            new DiagnosticResult(RuleCatalog.LatchLoop.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                .WithMessage("The latch loop P → Q → P (2 paths) takes 1.01 ns round but its phases give it only 1 ns: each latch borrows "
                             + "7.4 ps more every time round until one misses its window (slow corner, delays ×1)"))
            .RunAsync();

    [Fact]
    public Task ALoopThatFitsThePeriodIsClean()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Loop("Ring", 28).Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")).RunAsync();
}
