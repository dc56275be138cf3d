using System.Text.RegularExpressions;

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
}
