using System;
using System.Text.RegularExpressions;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// The design the elaboration sweeps vary: the statements under test run first and may change <c>count</c> (3), then
/// <c>count</c> inverters named s0, s1, ... are chained. A construct read wrongly or silently shows in the devices.
/// </summary>
internal static class InverterChainDesign
{
    public static string Source(string designNamespace, string declarations, string members, string statements) => $$"""
        using Phaseward;

        namespace {{designNamespace}}
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

    /// <summary>The source without its {|#n: ... |} diagnostic markup (for run-time compilation and parity).</summary>
    public static string WithoutMarkup(string marked) => Regex.Replace(marked, @"\{\|#\d:|\|\}", "");

    /// <summary>PW9001 at markup <paramref name="location"/> of the design D: what is not elaborated, and why.</summary>
    public static DiagnosticResult NotElaborated(int location, string what, string why)
        => new DiagnosticResult(RuleCatalog.NotElaborated.Id, DiagnosticSeverity.Warning).WithLocation(location).WithArguments(what, why, "D");

    /// <summary>Nothing that depends on the construct under test is made: something is reported, and no stage at all.</summary>
    public static void AssertNoStage(string marked, string designNamespace)
    {
        var result = new InMemoryDesigns(("/" + designNamespace.ToLowerInvariant() + "/D.cs", WithoutMarkup(marked))).CompileTime(designNamespace + ".D");
        Assert.True(result.Issues.Count > 0);
        Assert.DoesNotContain(result.Netlist!.Devices, d => d.Name.StartsWith("s", StringComparison.Ordinal));
    }
}
