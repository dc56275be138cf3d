using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Values as .NET prints, compares and converts them, checked against the design compiled and run by .NET
/// (<see cref="ParityTests"/>): every design names one inverter with the text it computes, so any difference shows in
/// the netlist. Before: the design's own enums were plain ints (printed as numbers, matched <c>is int</c>, and
/// <c>ToString()</c>, <c>Enum.Parse</c> or <c>GetNames</c> on them were PW9001 with the elaborator's own message).
/// What cannot be known at compile time is PW9001 at the construct, never a value.
/// </summary>
public class ValueSemanticsTests
{
    [Theory]
    [InlineData("Values.EnumText")]
    [InlineData("Values.FlagsText")]
    [InlineData("Values.BoxedEnum")]
    [InlineData("Values.EnumLibrary")]
    [InlineData("Values.EnumArithmetic")]
    [InlineData("Values.EnumSums")]
    [InlineData("Values.TupleText")]
    [InlineData("Values.TupleEquality")]
    [InlineData("Values.ReferenceEquality")]
    [InlineData("Values.RecordPrinting")]
    [InlineData("Values.CultureFree")]
    [InlineData("Values.GenericObjectText")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async Task TheNameOfAValueTwoEnumMembersShareIsPW9001()
    {
        // .NET does not say which of the names it prints: none is guessed.
        var source = Design("""
            var text = {|#0:$"{Alias.First}"|};
            count = text.Length;
            """, declarations: "public enum Alias { First = 1, Same = 1 }");
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "the name of the value 1 of the enum Alias", "several members have that value, and which name .NET prints is not specified")).RunAsync();
    }

    [Fact]
    public async Task TheIdentityOfBoxedValuesIsPW9001()
    {
        // Each boxing makes a new object in .NET ('a == b' is false for two boxes of 1): which box holds a value is not
        // modelled, so the answer is not guessed from the values.
        var source = Design("""
            object a = 1, b = 1;
            object s = "cell", t = string.Concat("ce", "ll");
            if ({|#0:a == b|}) count = 5;
            if ({|#1:ReferenceEquals(a, b)|}) count = 6;
            if ({|#2:s == t|}) count = 7;
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "the reference equality of boxed values", "each boxing makes a new object, and which box holds a value is not modelled at compile time"),
            NotElaborated(1, "the reference equality of boxed values", "each boxing makes a new object, and which box holds a value is not modelled at compile time"),
            NotElaborated(2, "the reference equality of two equal strings", "whether they are one object depends on interning, which is not modelled at compile time")).RunAsync();
    }

    [Fact]
    public async Task HashCodesThatDifferFromProcessToProcessArePW9001()
    {
        // A record's generated GetHashCode hashes its EqualityContract (a Type): another number in every process. The
        // design's own GetHashCode is interpreted, and records still work as dictionary keys.
        var source = Design("""
            var hash = {|#0:new Probe(1).GetHashCode()|};
            var typeHash = {|#1:typeof(Probe).GetHashCode()|};
            Hue? maybe = null;
            var own = new Keyed(4).GetHashCode() + Hue.Teal.GetHashCode() + maybe.GetHashCode();
            var seen = new System.Collections.Generic.HashSet<Probe> { new(1), new(1), new(2) };
            count = own + seen.Count - 8;
            """, declarations: """
            public sealed record Probe(int X);
            public sealed record Keyed(int X) { public override int GetHashCode() => X * 2; }
            public enum Hue { Amber = 1, Teal = 2 }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "the hash code of the record 'Probe'", "a record's generated GetHashCode hashes its EqualityContract (a Type), whose hash differs from process to process"),
            NotElaborated(1, "the call to 'Type.GetHashCode()'", "of a type only its name, text and equality are read: the rest is reflection")).RunAsync();
        ParityTests.AssertParity(new InMemoryDesigns(("/values/D.cs", InverterChainDesign.WithoutMarkup(source.Replace("{|#0:new Probe(1).GetHashCode()|}", "0").Replace("{|#1:typeof(Probe).GetHashCode()|}", "0")))), "Values.D");
    }

    [Fact]
    public async Task TextThatDependsOnTheCultureIsPW9001()
    {
        // The design runs in the current culture of its machine: a fraction prints "1,5" in one culture and "1.5" in
        // another, a minus sign may be U+2212, "i".ToUpper() is "İ" in Turkish. Only what no culture changes is computed.
        const string Culture = "it depends on the culture the design runs under (the decimal separator, the minus sign, group separators); format it with CultureInfo.InvariantCulture";
        const string CallCulture = "what it gives depends on the culture the design runs under (the decimal separator, the minus sign, group separators); pass CultureInfo.InvariantCulture";
        var source = Design("""
            var d = 1.5;
            var n = -3;
            var a = {|#0:$"{d}"|};
            var b = {|#1:d.ToString()|};
            var e = {|#2:"i".ToUpper()|};
            var f = {|#3:double.Parse("2.5")|};
            var g = {|#4:string.Format("{0}", 0.5)|};
            var h = {|#5:"a" + d|};
            var k = {|#6:System.Convert.ToString(d)|};
            var m = {|#7:"s" + n|};
            var p = {|#8:new System.Text.StringBuilder().Append(d)|};
            var q = {|#9:int.Parse("-4")|};
            var r = {|#10:string.Join(",", new[] { (Tone)(-2) })|};
            var t = {|#11:((Tone)(-2)).ToString()|};
            """, declarations: "public enum Tone { Low = 1 }");
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "the text of the Double 1.5", Culture),
            NotElaborated(1, "the call to 'double.ToString()'", CallCulture),
            NotElaborated(2, "the call to 'string.ToUpper()'", "it changes case by the culture the design runs under, and the text has letters whose case differs between cultures (i, I, letters beyond ASCII); use ToUpperInvariant or ToLowerInvariant"),
            NotElaborated(3, "the call to 'double.Parse(string)'", CallCulture),
            NotElaborated(4, "the call to 'string.Format(string, object?)'", CallCulture),
            NotElaborated(5, "the text of the Double 1.5", Culture),
            NotElaborated(6, "the call to 'Convert.ToString(double)'", CallCulture),
            NotElaborated(7, "the text of the Int32 -3", Culture),
            NotElaborated(8, "the call to 'StringBuilder.Append(double)'", "the text of the Double 1.5: " + Culture),
            NotElaborated(9, "the call to 'int.Parse(string)'", CallCulture),
            NotElaborated(10, "the call to 'string.Join<Tone>(string?, IEnumerable<Tone>)'", CallCulture),
            NotElaborated(11, "the text of the Tone -2", Culture)).RunAsync();
    }

    [Fact]
    public async Task TheTextOfACollectionWhoseTypeArgumentsAreNotKnownIsPW9001()
    {
        // A collection prints its type with its type arguments: known from a variable's own type, not through an interface.
        var source = Design("""
            System.Collections.Generic.IEnumerable<int> items = new System.Collections.Generic.List<int>();
            var nested = new System.Collections.Generic.List<System.Collections.Generic.List<int>> { new() };
            var a = {|#0:$"{items}"|};
            var b = {|#1:string.Join(",", nested)|};
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "the text of a List", "it prints its type with its type arguments, which are not known here (the elaborator holds library collections with object elements)"),
            NotElaborated(1, "the call to 'string.Join<List<int>>(string?, IEnumerable<List<int>>)'", "it prints a collection's type, whose type arguments are not known here (the elaborator holds library collections with object elements)")).RunAsync();
    }

    private static readonly InMemoryDesigns Designs = new(("/values/Values.cs", """
            using System;
            using System.Linq;
            using System.Collections.Generic;
            using Phaseward;

            namespace Values
            {
                public abstract class Base : Design { protected static void Say(Circuit c, string s) => c.Output("y", c.Inverter(c.Input("a"), "v_" + s)); }
                public enum Hue { Amber = 1, Teal = 2, Ochre = 4 }
                [Flags] public enum Trait { None = 0, Gated = 1, Skewed = 2, Latched = 4, Tuned = Gated | Latched }
                public enum Level : byte { Low = 1, High = 200 }
                public sealed class Slot<T> { }
                public sealed class Rack { public sealed class Shelf<T> { } public sealed class Bin { } }
                public sealed class GenericObjectText : Base
                {
                    // object.ToString prints the run-time type as Type.ToString does (type arguments in brackets, '+' for nesting).
                    protected override void Describe(Circuit c)
                        => Say(c, $"{new Slot<string>()}|{new Slot<Slot<int>>()}|{new Rack.Shelf<long>()}|{new Rack.Bin()}|{new Slot<Hue>().ToString()}");
                }
                public sealed class EnumText : Base
                {
                    private static string Named(Hue hue = Hue.Ochre) => $"{hue}";
                    private static string Joined(Hue hue) => "" + hue + '/' + hue.ToString();
                    protected override void Describe(Circuit c)
                    {
                        var hue = Hue.Teal;
                        Say(c, $"{hue}|{Named()}|{Joined(Hue.Amber)}|{hue:D}|{hue:X}|{hue:x}|{Hue.Ochre.ToString("G")}|{(Hue)3}|{(Hue)8}|{Hue.Amber | Hue.Teal:F}|{Level.High}|{(Level)7:X}|{(Hue)(-2):X}");
                    }
                }
                public sealed class FlagsText : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var t = Trait.Gated | Trait.Skewed;
                        var all = t | Trait.Latched;
                        Say(c, $"{t}|{all}|{Trait.Gated | Trait.Latched}|{(Trait)0}|{(Trait)8}|{Trait.Skewed | (Trait)8}|{all.HasFlag(Trait.Tuned)}|{t.HasFlag(Trait.Latched)}|{all & ~Trait.Skewed}");
                    }
                }
                public sealed class BoxedEnum : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = Hue.Ochre;
                        var s = o is int ? "int" : "notint";
                        s += o switch { int n => "i" + n, Hue k => "c" + k, _ => "?" };
                        switch (o)
                        {
                            case int n when n > 3: s += "big"; break;
                            case Hue h: s += "hue" + h; break;
                        }

                        object two = 2;
                        s += (int)o + "_" + (Hue)two + "_" + (o is Hue.Ochre) + "_" + o.Equals(Hue.Ochre) + "_" + o.Equals(4) + "_" + (o as Enum);
                        Say(c, s);
                    }
                }
                public sealed class EnumLibrary : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var counts = new Dictionary<Hue, int> { [Hue.Teal] = 1 };
                        counts[Hue.Teal] += 2;
                        counts[Hue.Amber] = 5;
                        var list = new List<Hue> { Hue.Teal, Hue.Ochre, Hue.Amber };
                        var ordered = string.Join(",", list.OrderByDescending(h => h));
                        var parsed = Enum.Parse<Hue>("Teal");
                        var flags = Enum.Parse<Trait>(" Gated , Skewed");
                        var ok = Enum.TryParse<Hue>("Nope", out var missing);
                        var ok2 = Enum.TryParse("ochre", true, out Hue found);
                        var names = string.Join("+", Enum.GetNames(typeof(Trait)));
                        var values = string.Join("+", Enum.GetValues<Hue>());
                        Say(c, $"{counts[Hue.Teal]}{counts[Hue.Amber]}|{string.Join(",", counts.Keys)}|{ordered}|{parsed}|{flags}|{ok}{missing}|{ok2}{found}|{names}|{values}|{list.Contains(Hue.Ochre)}|{Enum.IsDefined(Hue.Teal)}{Enum.IsDefined((Hue)3)}|{Enum.GetName(Hue.Ochre)}|{Hue.Teal.CompareTo(Hue.Ochre) < 0}|{list.Max()}");
                    }
                }
                public sealed class EnumArithmetic : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var lv = Level.High;
                        byte raw = (byte)lv;
                        var mixed = (Hue)(int)Trait.Latched;
                        Say(c, $"{raw}|{(int)lv}|{Hue.Ochre > Hue.Teal}|{mixed}|{mixed == Hue.Ochre}|{(long)Hue.Teal * 3}|{default(Hue)}|{Hue.Teal is Hue.Teal or Hue.Amber}");
                    }
                }
                public sealed class EnumSums : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var step = 1;
                        var x = Hue.Amber;
                        x++;
                        x += 2;
                        var lv = Level.High;
                        lv += 100;
                        var tag = "";
                        var high = Level.High;
                        try { high = checked(high + 100); } catch (OverflowException) { tag = "ovf"; }
                        Say(c, $"{Hue.Amber + step}|{step + Hue.Amber}|{Hue.Ochre - Hue.Amber}|{Hue.Ochre - 2}|{x}|{lv}|{(int)lv}|{tag}{high}|{Trait.Latched - Trait.Gated}");
                    }
                }
                public sealed class TupleText : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = (1, 2);
                        var named = (Tag: "x", Hue.Teal, (3, 'c'), (string?)null, true);
                        var pairs = new List<(int, string)> { (1, "a"), (2, "b") };
                        Say(c, $"{a}|{"" + a}|{a.ToString()}|{string.Join(";", pairs)}|{named}|{(a, a)}|{pairs[1]}");
                    }
                }
                public sealed class TupleEquality : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = (1, "b");
                        var keys = new Dictionary<(int, string), int> { [(1, "a")] = 5 };
                        keys[(2, "b")] = 6;
                        var set = new HashSet<(int, Hue)> { (1, Hue.Teal), (1, Hue.Teal), (2, Hue.Teal) };
                        Say(c, $"{a == (1, "b")}{a != (1, "c")}{(a, 2.5) == ((1, "b"), 2.5)}{(1, 2L) == (1L, 2)}{a.Equals((1, "b"))}{a.Equals((1, 'b'))}|{keys[(1, "a")]}{keys[(2, "b")]}{keys.ContainsKey((1, "b"))}|{set.Count}");
                    }
                }
                public sealed record Gauge(int Span);
                public sealed class Lane { public int N; }
                public sealed class ReferenceEquality : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var g = new Gauge(1);
                        object g1 = g, g2 = new Gauge(1);
                        object l1 = new Lane(), l2 = new Lane();
                        object s1 = "p", s2 = "q";
                        var same = l1;
                        Say(c, $"{g1 == g2}{g1 == (object)g}{g1.Equals(g2)}{ReferenceEquals(g, g1)}{ReferenceEquals(g, g2)}{l1 == l2}{l1 == same}{s1 == s2}{ReferenceEquals(null, null)}{g1 != null}");
                    }
                }
                public sealed record Batch(List<int> Items, Hue[] Hues);
                public record Plaque(int A) { protected virtual bool PrintMembers(System.Text.StringBuilder b) { b.Append("A is ").Append(A); return true; } }
                public record Marker(int A);
                public sealed record Badge(int B) : Marker(7);
                public sealed record Quiet();
                public sealed class RecordPrinting : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var list = new List<int>();
                        var map = new Dictionary<string, Hue>();
                        int[] numbers = { 1 };
                        Say(c, $"{new Batch(new List<int>(), new Hue[0])}|{new Plaque(3)}|{list}|{map}|{"" + list}|{list.ToString()}|{numbers}|{new Badge(2)}|{new Quiet()}|{new HashSet<Hue>()}");
                    }
                }
                public sealed class CultureFree : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var inv = System.Globalization.CultureInfo.InvariantCulture;
                        var b = new System.Text.StringBuilder().Append(3).Append('x').Append(2.0).AppendFormat("{0:D3}", 9).Append(1.5.ToString(inv));
                        Say(c, $"{7}|{1.0}|{"ab".ToUpper()}|{12.ToString()}|{int.Parse("42")}|{double.Parse("25")}|{string.Format("{0}-{1:D2}", 3, 4)}|{Convert.ToString(5)}|{double.Parse("2.5", inv) * 2}|{b}|{string.Join(",", new[] { 1, 2 })}|{0.25.ToString("F2", inv)}|{int.Parse(" 4 ") + 9}|{true}|{'q'}");
                    }
                }
            }
            """));

    private static DiagnosticResult NotElaborated(int location, string what, string why) => InverterChainDesign.NotElaborated(location, what, why);

    private static string Design(string statements, string members = "", string declarations = "") => InverterChainDesign.Source("Values", declarations, members, statements);
}
