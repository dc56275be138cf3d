using System;
using System.Linq;
using System.Text.RegularExpressions;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Designs written to trip the elaborator up (undecidable switch cases, ...). Each either elaborates to the run-time
/// netlist or is PW9001 at the construct, and what depends on it is skipped: never a guessed branch, a wrong count or a
/// misnamed device. Every design counts its stages from the construct under test and makes one inverter per stage.
/// </summary>
public class HostileDesignTests
{
    private const string Outside = "it is outside what compile-time elaboration reads (only the Phaseward DSL, members of this compilation and pure library members)";

    [Fact]
    public async Task ASwitchCaseWhoseGuardIsUnknownRunsNoSection()
    {
        // Once the guard cannot be evaluated, which section runs is not known: the default section must not be taken.
        var source = Design("""
            switch (count)
            {
                case 3 when {|#0:System.Environment.ProcessorCount|} > 0:
                    count = 5;
                    break;
                default:
                    count = 2;
                    break;
            }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "property 'Environment.ProcessorCount'", Outside)).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public async Task ASwitchCaseWhosePatternCannotBeDecidedRunsNoSection()
    {
        var source = Design("""
            object pair = (1, 2);
            switch (pair)
            {
                case {|#0:System.IComparable<int>|}:
                    count = 5;
                    break;
                default:
                    count = 2;
                    break;
            }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "this pattern", "whether the value matches it cannot be decided at compile time")).RunAsync();
        AssertNoStage(source);
    }

    private static DiagnosticResult NotElaborated(int location, string what, string why)
        => new DiagnosticResult(RuleCatalog.NotElaborated.Id, DiagnosticSeverity.Warning).WithLocation(location).WithArguments(what, why, "D");

    /// <summary>Nothing that depends on the construct is made: no stage at all.</summary>
    private static void AssertNoStage(string source)
    {
        var result = new InMemoryDesigns(("/hostile/D.cs", Plain(source))).CompileTime("Hostile.D");
        Assert.True(result.Issues.Count > 0);
        Assert.DoesNotContain(result.Netlist!.Devices, d => d.Name.StartsWith("s", StringComparison.Ordinal));
    }

    private static string Design(string statements, string members = "", string declarations = "") => $$"""
        using Phaseward;

        namespace Hostile
        {
            {{declarations}}

            public sealed class D : Design
            {
                {{members}}

                protected override void Describe(Circuit c)
                {
                    var count = 3;
                    {{statements}}
                    var x = c.Input("x");
                    for (var i = 0; i < count; i++)
                        x = c.Inverter(x, "s" + i);
                    c.Output("y", x);
                }
            }
        }
        """;

    private static string Plain(string marked) => Regex.Replace(marked, @"\{\|#\d:|\|\}", "");
}
