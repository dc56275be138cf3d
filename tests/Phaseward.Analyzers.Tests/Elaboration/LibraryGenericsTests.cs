using System.Threading.Tasks;
using Phaseward.Analyzers.Tests.Verifiers;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Library generics whose result depends on their type argument, and struct values the library moves between
/// collections, each design elaborated exactly as the compiled design runs it (the oracle: the design compiled and run
/// by .NET, <see cref="ParityTests"/>). The library runs with its type arguments erased to object, so before, OfType kept
/// every element, Cast never threw, and a default(T) in generic code was null; and the struct elements a library call
/// copied (ToArray, ToList, CopyTo, Clone, Resize, Repeat, Fill, Add...) stayed one object in two places.
/// </summary>
public class LibraryGenericsTests
{
    [Theory]
    [InlineData("Quarry.OfTypeOfDesignTypes")]
    [InlineData("Quarry.OfTypeOfLibraryTypes")]
    [InlineData("Quarry.OfTypeInGenericCode")]
    [InlineData("Quarry.CastOfDesignTypes")]
    [InlineData("Quarry.CastOfLibraryTypes")]
    [InlineData("Quarry.CastInGenericCode")]
    [InlineData("Quarry.DefaultsInGenericCode")]
    [InlineData("Quarry.ExtremesOfNoValues")]
    public void TypeArgumentsAreHonoured(string design) => ParityTests.AssertParity(Designs, design);

    [Theory]
    [InlineData("Quarry.ListToArray")]
    [InlineData("Quarry.DictionaryValuesToArray")]
    [InlineData("Quarry.ArrayToList")]
    [InlineData("Quarry.CopyToAndClone")]
    [InlineData("Quarry.FilteredToArray")]
    [InlineData("Quarry.ResizeKeepsTheOldArray")]
    [InlineData("Quarry.RepeatGivesCopies")]
    [InlineData("Quarry.FillGivesCopies")]
    [InlineData("Quarry.TuplesOfStructs")]
    [InlineData("Quarry.AddAndAddRange")]
    [InlineData("Quarry.CollectionsFromSequences")]
    [InlineData("Quarry.BoxesStayShared")]
    public void StructElementsAreCopied(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async Task OfTypeWhereAnElementsTypeCannotBeDecidedIsPW9001()
    {
        // Whether a tuple is an IComparable<int> is not decided at compile time: the count is not guessed.
        var source = Source("""
            var items = new System.Collections.Generic.List<object> { (1, 2), "s" };
            count = 2 + {|#0:System.Linq.Enumerable.Count(System.Linq.Enumerable.OfType<System.IComparable<int>>(items))|};
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the call to 'OfType<System.IComparable<int>>'", "whether an element is of its type cannot be decided at compile time")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Quarry");
    }

    [Fact]
    public async Task CastWhereAnElementsTypeCannotBeDecidedIsPW9001()
    {
        var source = Source("""
            var items = new System.Collections.Generic.List<object> { (1, 2), "s" };
            count = 2 + {|#0:System.Linq.Enumerable.ToList(System.Linq.Enumerable.Cast<System.IComparable<int>>(items))|}.Count;
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the call to 'Cast<System.IComparable<int>>'", "whether an element is of its type cannot be decided at compile time")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Quarry");
    }

    private static string Source(string statements) => InverterChainDesign.Source("Quarry", "", "", statements);

    private static readonly InMemoryDesigns Designs = new(("/quarry/Quarry.cs", """
            using System;
            using System.Collections.Generic;
            using System.Linq;
            using Phaseward;

            namespace Quarry
            {
                public abstract class Base : Design { protected static void Say(Circuit c, string s) => c.Inverter(c.Input("a"), "v_" + s); }
                public interface ISieve { }
                public sealed class Grate : ISieve { }
                public sealed class Riddle : ISieve { }
                public enum Grade { Fine, Coarse }
                public struct Tub { public int X; public void Bump() => X++; }
                public interface ITub { void Bump(); int Get(); }
                public struct BoxTub : ITub { public int X; public void Bump() => X++; public int Get() => X; }
                public static class Gen
                {
                    public static int Count<T>(IEnumerable<ISieve> xs) => xs.OfType<T>().Count();
                    public static int CountAll<T>(IEnumerable<object> xs) => xs.OfType<T>().Count();
                    public static string CastAll<T>(IEnumerable<object> xs) { try { return "c" + xs.Cast<T>().ToList().Count; } catch (InvalidCastException) { return "x"; } }
                    public static T First<T>(List<T> xs) => xs.FirstOrDefault();
                    public static T Last<T>(IEnumerable<T> xs) => xs.LastOrDefault();
                    public static T[] Grow<T>(T[] xs) { Array.Resize(ref xs, xs.Length + 2); return xs; }
                    public static T None<T>() => Enumerable.Empty<T>().FirstOrDefault();
                    public static T[] Copies<T>(T[] xs) => xs.ToArray();
                }

                public sealed class OfTypeOfDesignTypes : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var l = new List<ISieve> { new Grate(), new Riddle(), new Grate() };
                        object[] mixed = { new Grate(), "g", new Riddle(), null };
                        Say(c, "n" + l.OfType<Riddle>().Count() + l.OfType<Grate>().ToList().Count + l.OfType<ISieve>().Count() + mixed.OfType<ISieve>().Count() + l.OfType<object>().Count());
                    }
                }
                public sealed class OfTypeOfLibraryTypes : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var o = new List<object> { c.Input("x"), "s", 3, 4L, Grade.Coarse, 2.5, 'q', null };
                        Say(c, "n" + o.OfType<Net>().Count() + o.OfType<string>().Count() + o.OfType<int>().Sum() + o.OfType<long>().Count() + o.OfType<IComparable>().Count()
                            + o.OfType<Grade>().Count() + o.OfType<double>().Count() + o.OfType<ValueType>().Count() + o.OfType<IFormattable>().Count());
                    }
                }
                public sealed class OfTypeInGenericCode : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var l = new List<ISieve> { new Grate(), new Riddle(), new Grate() };
                        var o = new List<object> { "s", 3, new Riddle() };
                        Say(c, "n" + Gen.Count<Grate>(l) + Gen.Count<Riddle>(l) + Gen.Count<ISieve>(l) + Gen.CountAll<string>(o) + Gen.CountAll<int>(o) + Gen.CountAll<ISieve>(o));
                    }
                }
                public sealed class CastOfDesignTypes : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var l = new List<ISieve> { new Grate(), new Riddle() };
                        var r = "ok";
                        try { r += l.Cast<Riddle>().ToList().Count; } catch (InvalidCastException) { r += "ice"; }
                        try { foreach (var g in l.Cast<Grate>()) r += "g"; } catch (InvalidCastException) { r += "ice"; }
                        r += l.Cast<ISieve>().Count() + l.Cast<object>().ToArray().Length;
                        object[] objects = { new Grate(), new Grate() };
                        r += objects.Cast<Grate>().ToList().Count;
                        Say(c, r);
                    }
                }
                public sealed class CastOfLibraryTypes : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var o = new List<object> { 1, 2, 3 };
                        var r = "ok" + o.Cast<int>().Sum();
                        try { r += o.Cast<long>().Sum(); } catch (InvalidCastException) { r += "ice"; }
                        try { r += o.Cast<string>().First(); } catch (InvalidCastException) { r += "ice"; }
                        var numbers = new List<object> { (short)1, (byte)2, 3u, 4L, 5, Grade.Coarse, 6.5f };
                        r += numbers.OfType<short>().Count() + "_" + numbers.OfType<byte>().Count() + numbers.OfType<uint>().Count() + numbers.OfType<int>().Count() + numbers.OfType<float>().Count() + numbers.OfType<Enum>().Count();
                        try { r += numbers.Take(1).Cast<short>().Sum(x => x); } catch (InvalidCastException) { r += "ice"; }
                        try { r += numbers.Skip(5).Take(1).Cast<int>().Sum(); } catch (InvalidCastException) { r += "ice"; }
                        try { r += numbers.Skip(5).Take(1).Cast<long>().Sum(); } catch (InvalidCastException) { r += "ice"; }
                        try { r += new object[] { 1, 0 }.Cast<Grade>().Max(); } catch (InvalidCastException) { r += "ice"; }
                        try { r += new object[] { 1L }.Cast<Grade>().Max(); } catch (InvalidCastException) { r += "ice"; }
                        try { r += new List<Grade> { Grade.Coarse }.Cast<object>().Cast<int>().Sum(); } catch (InvalidCastException) { r += "ice"; }
                        var strings = new List<object> { "p", "q" };
                        r += string.Concat(strings.Cast<string>());
                        Say(c, r);
                    }
                }
                public sealed class CastInGenericCode : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var o = new List<object> { new Grate(), new Riddle() };
                        Say(c, Gen.CastAll<ISieve>(o) + Gen.CastAll<Grate>(o) + Gen.CastAll<string>(new List<object> { "a" }) + Gen.CastAll<int>(new List<object> { "a" }));
                    }
                }
                public sealed class DefaultsInGenericCode : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = Gen.First(new List<int>()) + 1;
                        var m = Gen.Last(new List<double>()) + 2;
                        var g = Gen.First(new List<Grade>());
                        var z = Gen.None<int>() + 3;
                        var b = Gen.None<bool>();
                        var grown = Gen.Grow(new[] { 5 });
                        var t = Gen.First(new List<Tub>());
                        t.Bump();
                        Say(c, $"{n}_{m}_{g}_{z}_{b}_{grown.Sum()}_{t.X}_{Gen.None<string>() ?? "nil"}");
                    }
                }
                public sealed class ExtremesOfNoValues : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var r = "";
                        var none = new List<ISieve>();
                        try { r += none.Max(s => s is Grate ? Grade.Coarse : Grade.Fine); } catch (InvalidOperationException) { r += "e"; }
                        try { r += none.Min(s => s is Grate ? Grade.Coarse : Grade.Fine); } catch (InvalidOperationException) { r += "e"; }
                        try { r += new List<Grade>().Max(); } catch (InvalidOperationException) { r += "e"; }
                        r += none.Max(s => s.ToString()) ?? "nil";
                        r += new List<Grade> { Grade.Coarse, Grade.Fine }.Max();
                        Say(c, r);
                    }
                }

                public sealed class ListToArray : Base
                {
                    protected override void Describe(Circuit c) { var l = new List<Tub> { new Tub() }; var a = l.ToArray(); a[0].X = 3; Say(c, $"{l[0].X}{a[0].X}"); }
                }
                public sealed class DictionaryValuesToArray : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var d = new Dictionary<string, Tub> { ["k"] = new Tub() };
                        var a = d.Values.ToArray();
                        a[0].X = 4;
                        var b = d.Values.ToList().ToArray();
                        b[0].Bump();
                        Say(c, $"{d["k"].X}{a[0].X}{b[0].X}");
                    }
                }
                public sealed class ArrayToList : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = new Tub[1];
                        var l = a.ToList();
                        var m = new List<Tub>(a);
                        var h = new HashSet<Tub>(a);
                        a[0].X = 5;
                        Say(c, $"{a[0].X}{l[0].X}{m[0].X}{h.First().X}");
                    }
                }
                public sealed class CopyToAndClone : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = new Tub[1];
                        var b = new Tub[1];
                        a.CopyTo(b, 0);
                        b[0].X = 6;
                        var k = (Tub[])a.Clone();
                        k[0].X = 7;
                        var d = new Tub[1];
                        Array.Copy(a, d, 1);
                        d[0].X = 8;
                        var e = new Tub[1];
                        new List<Tub> { a[0] }.CopyTo(e);
                        e[0].X = 9;
                        Say(c, $"{a[0].X}{b[0].X}{k[0].X}{d[0].X}{e[0].X}");
                    }
                }
                public sealed class FilteredToArray : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = new Tub[2];
                        var f = a.Where(_ => true).ToArray();
                        f[0].X = 8;
                        var s = a.Select(t => t).Reverse().ToArray();
                        s[1].Bump();
                        var g = Gen.Copies(a);
                        g[0].X = 2;
                        Say(c, $"{a[0].X}{f[0].X}{s[1].X}{g[0].X}");
                    }
                }
                public sealed class ResizeKeepsTheOldArray : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = new Tub[1];
                        var old = a;
                        Array.Resize(ref a, 2);
                        a[0].X = 2;
                        var grown = Gen.Grow(old);
                        grown[0].X = 4;
                        Say(c, $"{old[0].X}{a[0].X}{grown[0].X}");
                    }
                }
                public sealed class RepeatGivesCopies : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var s = new Tub();
                        var a = Enumerable.Repeat(s, 2).ToArray();
                        a[0].X = 2;
                        var l = Enumerable.Repeat(s, 2).ToList();
                        s.X = 5;
                        Say(c, $"{a[0].X}{a[1].X}{l[0].X}{l[1].X}{s.X}");
                    }
                }
                public sealed class FillGivesCopies : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = new Tub[2];
                        var one = new Tub { X = 1 };
                        Array.Fill(a, one);
                        a[0].X = 5;
                        one.X = 3;
                        Say(c, $"{a[0].X}{a[1].X}{one.X}");
                    }
                }
                public sealed class TuplesOfStructs : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var l = new List<(Tub, int)> { (new Tub(), 1) };
                        var a = l.ToArray();
                        a[0].Item1.X = 3;
                        Say(c, $"{l[0].Item1.X}{a[0].Item1.X}");
                    }
                }
                public sealed class AddAndAddRange : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var s = new Tub();
                        var l = new List<Tub>();
                        l.Add(s);
                        l.Insert(0, s);
                        s.X = 4;
                        var a = new Tub[1];
                        l.AddRange(a);
                        a[0].X = 6;
                        var q = new Queue<Tub>();
                        q.Enqueue(s);
                        s.X = 9;
                        var d = new Dictionary<int, Tub>();
                        d[0] = s;
                        s.X = 1;
                        Say(c, $"{l[0].X}{l[1].X}{l[2].X}{q.Peek().X}{d[0].X}{s.X}");
                    }
                }
                public sealed class CollectionsFromSequences : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var a = new Tub[2];
                        a[1].X = 1;
                        var direct = a.ToDictionary(t => t.X);
                        var lk = a.ToLookup(t => t.X);
                        var h = a.Where(_ => true).ToHashSet();
                        var d = a.Where(_ => true).ToDictionary(t => t.X);
                        var byTub = a.Select(t => t).ToDictionary(t => t, t => t.X);
                        var q = new Queue<Tub>(a.Select(t => t));
                        var st = new Stack<Tub>(a.Where(_ => true));
                        a[0].X = 7;
                        Say(c, $"{h.Sum(t => t.X)}{d[0].X}{byTub.ContainsKey(new Tub())}{direct[0].X}{q.Peek().X}{st.Last().X}{lk[0].First().X}{a[0].X}");
                    }
                }
                public sealed class BoxesStayShared : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        ITub box = new BoxTub();
                        var l = new List<ITub> { box, box };
                        var a = l.ToArray();
                        a[0].Bump();
                        object[] o = { box };
                        var k = (object[])o.Clone();
                        ((ITub)k[0]).Bump();
                        var r = Enumerable.Repeat(box, 2).ToArray();
                        r[1].Bump();
                        Say(c, $"{box.Get()}{a[1].Get()}{l[0].Get()}{((ITub)o[0]).Get()}");
                    }
                }
            }
            """));
}
