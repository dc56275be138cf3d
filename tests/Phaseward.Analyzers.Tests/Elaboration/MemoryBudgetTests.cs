using System.Linq;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// PW9002 for allocations past the memory budget: refused at the allocation, before anything is allocated, and the
/// rest of the design elaborated so far is still checked.
/// </summary>
public class MemoryBudgetTests
{
    [Fact]
    public Task AHugeArrayIsRefusedAtItsAllocation()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Hoarder : Design
            {
                protected override void Describe(Circuit c)
                {
                    c.Inverter(c.Input("a"), "before");
                    var nets = {|#0:new Net[int.MaxValue / 2]|};
                    c.Inverter(nets[0], "after");
                }
            }
            """,
            new DiagnosticResult(RuleCatalog.ElaborationBudgetExceeded.Id, DiagnosticSeverity.Warning).WithLocation(0)
                .WithArguments("Hoarder", "the memory budget of 268435456 bytes (arrays, strings and collections the design's code makes; phaseward.elaboration_memory_budget) would be exceeded by 8589934584 more"))
            .RunAsync();

    [Fact]
    public Task TheBudgetIsConfigured()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Names : Design
            {
                protected override void Describe(Circuit c)
                {
                    var pad = {|#0:new string('x', 600)|};
                    c.Inverter(c.Input("a"), pad);
                }
            }
            """,
            new DiagnosticResult(RuleCatalog.ElaborationBudgetExceeded.Id, DiagnosticSeverity.Warning).WithLocation(0)
                .WithArguments("Names", "the memory budget of 1000 bytes (arrays, strings and collections the design's code makes; phaseward.elaboration_memory_budget) would be exceeded by 1200 more"))
            .WithEditorConfig("phaseward.elaboration_memory_budget = 1_000")
            .RunAsync();

    [Theory]
    [InlineData("new System.Collections.Generic.List<Net>(int.MaxValue)")]
    [InlineData("new string('x', int.MaxValue).Length")]
    [InlineData("\"\".PadLeft(int.MaxValue)")]
    [InlineData("new System.Text.StringBuilder().Append('x', int.MaxValue)")]
    [InlineData("System.Linq.Enumerable.Range(0, int.MaxValue).ToArray()")]
    [InlineData("System.Linq.Enumerable.Repeat(1, int.MaxValue).ToList()")]
    [InlineData("DoubleUp()")]
    public void EveryWayOfAskingForHugeMemoryStopsWithPW9002(string allocation)
    {
        var designs = new InMemoryDesigns(("/src/Greedy.cs", $$"""
            using System.Linq;
            using Phaseward;

            public sealed class Greedy : Design
            {
                protected override void Describe(Circuit c)
                {
                    c.Inverter(c.Input("a"), "before");
                    var big = {{allocation}};
                    c.Inverter(c.Input("b"), "after" + big);
                }

                private static string DoubleUp()
                {
                    var s = "x";
                    for (var i = 0; i < 40; i++)
                        s += s;
                    return s;
                }
            }
            """));
        var result = designs.CompileTime("Greedy");
        var issue = Assert.Single(result.Issues);
        Assert.Equal(RuleCatalog.ElaborationBudgetExceeded.Id, issue.RuleId);
        Assert.Equal(new[] { "before" }, result.Netlist!.Devices.Select(d => d.Name));
    }
}
