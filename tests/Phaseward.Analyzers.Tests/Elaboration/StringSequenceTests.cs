namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Strings in everyday generator code: a string as the sequence of its chars handed to LINQ (a string is an
/// IEnumerable&lt;char&gt;), and <c>builder.Append($"...")</c>, which C# compiles to the builder's interpolated string
/// handler (C# specification, interpolated string handlers, C# 10). Each design is elaborated exactly as the compiled
/// design runs it (the oracle: the design compiled and run by .NET, <see cref="ParityTests"/>). Before, both were PW9001:
/// the string could not be passed to LINQ, and the handler was taken for a ref argument.
/// </summary>
public class StringSequenceTests
{
    [Theory]
    [InlineData("Strings.CountUpperCase")]
    [InlineData("Strings.SelectOverChars")]
    [InlineData("Strings.DistinctAndOrder")]
    [InlineData("Strings.CharMethodGroup")]
    [InlineData("Strings.AppendInterpolated")]
    [InlineData("Strings.AppendLineInterpolatedWithFormat")]
    [InlineData("Strings.FormattableDesignTypeInHoles")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async System.Threading.Tasks.Task String_Format_of_a_design_IFormattable_is_PW9001()
    {
        var source = InverterChainDesign.Source("Quarry", """
            public readonly struct Volt : System.IFormattable
            {
                public string ToString(string? format, System.IFormatProvider? provider) => format == "K" ? "k3" : "m3300";
            }
            """, "", """
            var text = {|#0:string.Format("{0:K}", new Volt())|};
            count = text.Length;
            """);
        await new Verifiers.PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the call to 'string.Format(string, object?)'",
                "it would format an object of the design that is IFormattable, through its ToString(format, provider), which the library cannot call back")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Quarry");
    }

    [Fact]
    public async System.Threading.Tasks.Task A_library_method_group_that_could_change_a_collection_is_PW9001()
    {
        // list.Add as a delegate changes the list when called later: not taken as a method group.
        var source = InverterChainDesign.Source("Quarry", "", "", """
            var taps = new System.Collections.Generic.List<int>();
            System.Action<int> add = {|#0:taps.Add|};
            add(1);
            count = taps.Count + 2;
            """);
        await new Verifiers.PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the method group 'List<int>.Add(int)'",
                "only methods and local functions of this compilation, and static library methods of values (char.IsDigit, Math.Abs, int.Parse), are passed as delegates; wrap it in a lambda")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Quarry");
    }

    private static readonly InMemoryDesigns Designs = new(("/strings/Strings.cs", """
            using System;
            using System.Linq;
            using System.Text;
            using Phaseward;

            namespace Strings
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class CountUpperCase : Base
                {
                    protected override void Describe(Circuit c) => Chain(c, "LaneMuxBank".Count(ch => ch >= 'A' && ch <= 'Z'), "cu");
                }
                public sealed class SelectOverChars : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        foreach (var name in "xyz".Select(ch => "tap_" + ch))
                            c.Output(name, c.Inverter(c.Input(name + "_in"), name + "_inv"));
                    }
                }
                public sealed class DistinctAndOrder : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var letters = new string("mirrorbank".Distinct().OrderBy(ch => ch).ToArray());
                        Chain(c, letters.Length, letters);
                    }
                }
                public sealed class CharMethodGroup : Base
                {
                    protected override void Describe(Circuit c) => Chain(c, "a1b22c333".Count(char.IsDigit), "cm");
                }
                public sealed class AppendInterpolated : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var name = new StringBuilder();
                        for (var i = 0; i < 3; i++) name.Append($"l{i}_");
                        Chain(c, 2, name.ToString());
                    }
                }
                public sealed class AppendLineInterpolatedWithFormat : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var text = new StringBuilder().Append($"w{7,3}|{12:D4}").AppendLine($"{"x",-2}end").ToString();
                        Chain(c, text.Length, "al");
                    }
                }
                public readonly struct Volt : IFormattable
                {
                    private readonly int millivolts;
                    public Volt(int millivolts) => this.millivolts = millivolts;
                    public override string ToString() => "v" + millivolts;
                    public string ToString(string? format, IFormatProvider? provider) => format == "K" ? "k" + millivolts / 1000 : "m" + millivolts;
                }
                public sealed class FormattableDesignTypeInHoles : Base
                {
                    // A hole formats an IFormattable through ToString(format, provider); concatenation and ToString() call ToString().
                    protected override void Describe(Circuit c)
                    {
                        var v = new Volt(3300);
                        var text = $"{v}|{v:K}|{v,6}" + "/" + v + "/" + v.ToString() + new StringBuilder().Append($"{v:K}");
                        Chain(c, 1, text.Replace("|", "_").Replace(" ", "_").Replace("/", "_"));
                    }
                }
            }
            """));
}
