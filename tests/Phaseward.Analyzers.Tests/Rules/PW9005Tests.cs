using System.Linq;
using System.Text.RegularExpressions;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Phaseward.Sequencing;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// PW9005 through the analyzer: a ripple chain, whose latch-to-latch paths number n + n(n − 1)/2 (each register's
/// slave reaches every later master through the carry, each master its own slave: counted on the chain's structure),
/// stops the path search at a budget set in .editorconfig. The expected figures are those of the same design
/// elaborated at run time and searched with the same budget; the path count is checked against the structure.
/// </summary>
public class PW9005Tests
{
    private const int Bits = 24;

    private static string Counter(string registerCall) => Design("SampleCounter", $$"""
        var tick = c.Clock("tick", 1000.Nanoseconds());
        var carry = c.Input("count_enable");
        for (var bit = 0; bit < {{Bits}}; bit++)
            carry = c.Nand({{registerCall}}, carry);
        c.Output("carry_out", carry);
        """);

    // The same counter with each bit a placed block, chained by LINQ's Aggregate over a lambda.
    private const string CounterOfBlocks = """
        using System.Linq;
        using Phaseward;

        public sealed class BlockCounter : Design
        {
            protected override void Describe(Circuit c)
            {
                var tick = c.Clock("tick", 1000.Nanoseconds());
                var carry = Enumerable.Range(0, 24).Aggregate(c.Input("count_enable"),
                    (carry, bit) => c.Place(new CounterBit(carry, tick), "bit" + bit).CarryOut);
                c.Output("carry_out", carry);
            }
        }

        public sealed class CounterBit : Block
        {
            private readonly Net carryIn;
            private readonly Clock tick;

            public CounterBit(Net carryIn, Clock tick) => (this.carryIn, this.tick) = (carryIn, tick);

            public Net CarryOut { get; private set; } = null!;

            protected override void Describe(Circuit c)
                => CarryOut = c.Nand({|#0:c.DynamicRegister(carryIn, tick, "count")|}, carryIn);
        }
        """;

    private static string Plain(string source) => Regex.Replace(source, @"\{\|#\d+:|\|\}", string.Empty);

    // The message the run-time model of the same design gives under the same budget.
    private static DiagnosticResult Expected(string source, string typeName, long budget)
    {
        var model = LatchModel.Of(new InMemoryDesigns(("/src/Counter.cs", Plain(source))).RunTime(typeName), budget);
        Assert.True(model.PathSearchStopped);
        Assert.Equal(2 * Bits, model.Latches.Count);
        var first = model.Latches[model.LatchesSearched];
        return new DiagnosticResult(RuleCatalog.LatchPathSearchStopped.Id, DiagnosticSeverity.Warning).WithLocation(0)
            .WithArguments(typeName, first.Name, $"{model.PathSearchSteps:N0}", $"{budget:N0}", $"{model.Paths.Count:N0}",
                $"{model.LatchesSearched:N0}", $"{2 * Bits:N0}", $"{2 * Bits - model.LatchesSearched - 1:N0}");
    }

    [Fact]
    public void TheWholeSearchListsAPathForEveryPairOfTheChain()
    {
        var model = LatchModel.Of(new InMemoryDesigns(("/src/Counter.cs", Plain(Counter("c.DynamicRegister(carry, tick, \"count\" + bit)"))))
            .RunTime("SampleCounter"), long.MaxValue / 2);
        Assert.False(model.PathSearchStopped);
        Assert.Equal(Bits + Bits * (Bits - 1) / 2, model.Paths.Count);
    }

    [Fact]
    public Task ASearchStoppedAtTheConfiguredBudgetIsReportedAtTheFirstLatchNotSearched()
    {
        var source = Counter("{|#0:c.DynamicRegister(carry, tick, \"count\" + bit)|}");
        return new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, Expected(source, "SampleCounter", 100))
            .WithEditorConfig("phaseward.latch_path_search_budget = 100")
            .RunAsync();
    }

    [Fact]
    public Task ACounterOfPlacedBlocksStopsTheSameWay()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(CounterOfBlocks, Expected(CounterOfBlocks, "BlockCounter", 150))
            .WithEditorConfig("phaseward.latch_path_search_budget = 1_50")
            .RunAsync();

    [Fact]
    public Task AtTheDefaultBudgetTheChainIsSearchedWholeAndNothingIsReported()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(Plain(Counter("c.DynamicRegister(carry, tick, \"count\" + bit)")))
            .RunAsync();

    [Fact]
    public Task ABudgetBelowOneStepIsPW9004AndTheDefaultApplies()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(
                Plain(Counter("c.DynamicRegister(carry, tick, \"count\" + bit)")).Replace("void Describe", "void {|#0:Describe|}"),
                new DiagnosticResult(RuleCatalog.InvalidOption.Id, DiagnosticSeverity.Warning).WithLocation(0)
                    .WithArguments("phaseward.latch_path_search_budget", "0", "a whole number from 1 to 4611686018427387903 (for example 5000000)", "5000000"))
            .WithEditorConfig("phaseward.latch_path_search_budget = 0")
            .RunAsync();
}
