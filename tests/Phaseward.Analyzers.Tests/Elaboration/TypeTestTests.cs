using System.Threading.Tasks;
using Phaseward.Analyzers.Tests.Verifiers;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Run-time type tests and casts as .NET makes them, each design elaborated exactly as the compiled design runs it (the
/// oracle: the design compiled and run by .NET, <see cref="ParityTests"/>).
/// <list type="bullet">
/// <item>A type test sees the type arguments of a constructed type (C# specification, §12.12.12 the is operator and
/// §10.2.8/§10.3.5 implicit and explicit reference conversions, with variance §18.2.3.3): a <c>List&lt;int&gt;</c> is no
/// <c>List&lt;string&gt;</c>, a <c>Slot&lt;int&gt;</c> of the design's no <c>Slot&lt;string&gt;</c>. Before, the
/// library's collections were tested with their type arguments erased and the design's types by their definition.</item>
/// <item>Unboxing needs the exact boxed type (C# specification §10.3.7, ECMA-335 §III.4.33 unbox.any): an enum and its
/// underlying type are interchangeable, a <c>T?</c> takes a boxed T or null. Before, any boxed number unboxed as any
/// number.</item>
/// <item>A foreach variable of a narrower type than the elements is an explicit conversion of each element (C#
/// specification §13.9.5): the element that is not of it throws InvalidCastException.</item>
/// <item>An enum's CompareTo is its underlying type's (common practice: sbyte, byte, short, ushort and char compare by
/// difference in .NET's implementation, the wider types by -1/0/1).</item>
/// </list>
/// </summary>
public class TypeTestTests
{
    [Theory]
    [InlineData("Velmora.ListSwitchSeesTheElementType")]
    [InlineData("Velmora.InterfacesOfAConstructedList")]
    [InlineData("Velmora.AsAndCastOfAConstructedList")]
    [InlineData("Velmora.OfTypeOfConstructedCollections")]
    [InlineData("Velmora.LibraryCallResults")]
    [InlineData("Velmora.CollectionExpressionLists")]
    [InlineData("Velmora.GenericCodeMakesLists")]
    [InlineData("Velmora.DictionariesAndSets")]
    public void LibraryCollectionsKnowTheirTypeArguments(string design) => ParityTests.AssertParity(Designs, design);

    [Theory]
    [InlineData("Velmora.DesignGenericClass")]
    [InlineData("Velmora.DesignVariantInterface")]
    [InlineData("Velmora.DesignGenericBase")]
    [InlineData("Velmora.DesignGenericTestInGenericCode")]
    [InlineData("Velmora.DesignGenericCastThrows")]
    public void DesignTypesKnowTheirTypeArguments(string design) => ParityTests.AssertParity(Designs, design);

    [Theory]
    [InlineData("Velmora.UnboxLongAsInt")]
    [InlineData("Velmora.UnboxNumbersOfOtherTypes")]
    [InlineData("Velmora.UnboxEnumsAndUnderlyingTypes")]
    [InlineData("Velmora.UnboxNullables")]
    [InlineData("Velmora.UnboxSmallIntegers")]
    [InlineData("Velmora.UnboxInGenericCode")]
    [InlineData("Velmora.UnboxSmallIntegersFromEveryPlace")]
    public void UnboxingNeedsTheExactType(string design) => ParityTests.AssertParity(Designs, design);

    [Theory]
    [InlineData("Velmora.ForeachDowncastThrows")]
    [InlineData("Velmora.ForeachOverObjectsAsStrings")]
    [InlineData("Velmora.ForeachUnboxes")]
    public void ForeachConvertsEachElement(string design) => ParityTests.AssertParity(Designs, design);

    [Theory]
    [InlineData("Velmora.EnumCompareToIsTheUnderlyingTypes")]
    public void EnumCompareToIsTheUnderlyingTypes(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async Task A_type_test_of_a_sequence_whose_type_arguments_are_not_known_is_PW9001()
    {
        // Select gives an iterator of a type the library chooses: whether it is an IEnumerable<long> is not guessed.
        var source = InverterChainDesign.Source("Velmora", "", "", """
            object lanes = System.Linq.Enumerable.Select(new[] { 1, 2 }, v => v * 2);
            if ({|#0:lanes is System.Collections.Generic.IEnumerable<long>|}) count = 5;
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "this type test", "the type System.Collections.Generic.IEnumerable<long> cannot be tested at compile time")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Velmora");
    }

    private static readonly InMemoryDesigns Designs = new(("/velmora/Velmora.cs", """
            using System;
            using System.Collections;
            using System.Collections.Generic;
            using System.Linq;
            using Phaseward;

            namespace Velmora
            {
                public abstract class Base : Design
                {
                    protected static void Say(Circuit c, string s) => c.Output("o_" + s, c.Inverter(c.Input("i")));
                    protected static string F(bool b) => b ? "T" : "F";
                    protected static string Text(object? v) => v is null ? "null" : Convert.ToString(v, System.Globalization.CultureInfo.InvariantCulture)!;
                    protected static string Join(params int[] values) => string.Join("_", values.Select(v => v.ToString(System.Globalization.CultureInfo.InvariantCulture)));
                }
                public sealed class Slot<T> { public T? Held; }
                public interface IPort<T> { }
                public sealed class IntPort : IPort<int> { }
                public interface ISource<out T> { }
                public sealed class NameSource : ISource<string> { }
                public sealed class WidthSource : ISource<int> { }
                public class Holder<T> { }
                public sealed class IntHolder : Holder<int> { }
                public class Cell { public int Drive = 1; }
                public sealed class LatchCell : Cell { }
                public enum Mode { Idle, Scan, Run }
                public enum Phase { Rise, Fall }
                public enum Gauge : byte { Thin = 1, Thick = 6 }
                public enum Span : long { Short = 1, Long = 5_000_000_000 }
                public enum Sgn : sbyte { Neg = -1, Zero, Pos }
                public enum Tier : short { Low = -300, High = 400 }
                public enum Rank : ushort { First = 2, Last = 60_000 }
                public enum Notch : uint { A = 1, B = 4_000_000_000 }

                public sealed class ListSwitchSeesTheElementType : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = new List<int> { 1, 2 };
                        var s = o switch { List<string> => "s", List<long> => "l", List<int> l => "i" + l.Count, _ => "none" };
                        Say(c, s);
                    }
                }
                public sealed class InterfacesOfAConstructedList : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object ints = new List<int> { 1 };
                        object names = new List<string> { "a" };
                        object lazy = new[] { 1, 2 }.Select(v => v + 1);
                        Say(c, F(ints is IReadOnlyList<object>) + F(names is IReadOnlyList<object>) + F(names is IList<object>)
                            + F(ints is IEnumerable<int>) + F(names is IEnumerable<object>) + F(ints is ICollection<long>) + F(names is IReadOnlyCollection<string>)
                            + "_" + F(ints is IEnumerable) + F(ints is IList) + F(ints is ICollection) + F(ints is string) + F(ints is Cell) + F(lazy is IEnumerable) + F(lazy is IList));
                    }
                }
                public sealed class AsAndCastOfAConstructedList : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = new List<int> { 4, 5 };
                        var n = (o as List<string>)?.Count ?? 10;
                        n += (o as List<int>)?.Count ?? 100;
                        try { n += ((List<string>)o).Count; } catch (InvalidCastException) { n += 20; }
                        n += ((IList<int>)o)[1];
                        Say(c, "n" + n);
                    }
                }
                public sealed class OfTypeOfConstructedCollections : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var held = new object[] { new List<int>(), new List<string>(), new List<string> { "x" }, new HashSet<int>(), new Slot<string>() };
                        Say(c, held.OfType<List<string>>().Count() + "_" + held.OfType<IEnumerable<int>>().Count() + "_" + held.OfType<Slot<int>>().Count()
                            + "_" + held.OfType<IEnumerable<object>>().Count());
                    }
                }
                public sealed class LibraryCallResults : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object list = Enumerable.Range(0, 3).ToList();
                        object map = new[] { "a", "bb" }.ToDictionary(s => s, s => s.Length);
                        object set = new[] { 2L, 3L }.ToHashSet();
                        object names = new[] { "p", "q" }.ToList();
                        Say(c, F(list is List<int>) + F(list is List<long>) + F(map is Dictionary<string, int>) + F(map is IDictionary<string, long>)
                            + F(map is IReadOnlyDictionary<string, int>) + F(set is HashSet<long>) + F(set is ISet<int>) + F(names is List<string>) + F(names is IEnumerable<object>));
                    }
                }
                public sealed class CollectionExpressionLists : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        List<int> widths = [1, 2];
                        IList<string> tags = ["t"];
                        object a = widths, b = tags;
                        Say(c, F(a is List<object>) + F(a is List<int>) + F(b is List<string>) + F(b is List<int>));
                    }
                }
                public sealed class GenericCodeMakesLists : Base
                {
                    private static object Make<T>() => new List<T>();
                    protected override void Describe(Circuit c)
                    {
                        Say(c, F(Make<int>() is List<int>) + F(Make<int>() is List<string>) + F(Make<string>() is IEnumerable<object>) + F(Make<Cell>() is List<LatchCell>));
                    }
                }
                public sealed class DictionariesAndSets : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object map = new Dictionary<string, Cell>();
                        object set = new HashSet<Mode>();
                        var queue = new Queue<int>();
                        object q = queue;
                        object cells = ((Dictionary<string, Cell>)map).Values;
                        Say(c, F(cells is ICollection<Cell>) + F(cells is IEnumerable<object>) + F(cells is ICollection<LatchCell>) + F(map is Dictionary<string, Cell>) + F(map is Dictionary<string, LatchCell>) + F(map is IReadOnlyDictionary<string, Cell>)
                            + F(set is HashSet<Mode>) + F(set is HashSet<int>) + F(q is Queue<int>) + F(q is Queue<uint>) + F(q is IReadOnlyCollection<int>));
                    }
                }
                public sealed class DesignGenericClass : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = new Slot<int>();
                        var s = o switch { Slot<string> => "s", Slot<int> => "i", _ => "none" };
                        Say(c, s + F(o is Slot<string>) + F(o is Slot<int>) + F(o is Slot<long>));
                    }
                }
                public sealed class DesignVariantInterface : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object names = new NameSource(), widths = new WidthSource(), port = new IntPort();
                        Say(c, F(names is ISource<object>) + F(names is ISource<string>) + F(widths is ISource<object>) + F(widths is ISource<int>) + F(names is ISource<Cell>)
                            + "_" + F(port is IPort<string>) + F(port is IPort<int>) + F(port is IPort<object>) + F((port as IPort<string>) is null));
                    }
                }
                public sealed class DesignGenericBase : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object h = new IntHolder();
                        Say(c, F(h is Holder<int>) + F(h is Holder<long>) + F(h is Holder<object>));
                    }
                }
                public sealed class DesignGenericTestInGenericCode : Base
                {
                    private static bool IsSlotOf<T>(object o) => o is Slot<T>;
                    private static bool IsPortOf<T>(object o) => o is IPort<T>;
                    protected override void Describe(Circuit c)
                    {
                        var slot = new Slot<int>();
                        Say(c, F(IsSlotOf<int>(slot)) + F(IsSlotOf<string>(slot)) + F(IsPortOf<int>(new IntPort())) + F(IsPortOf<uint>(new IntPort())));
                    }
                }
                public sealed class DesignGenericCastThrows : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = new Slot<int> { Held = 3 };
                        var n = 1;
                        try { var s = (Slot<string>)o; n = 2; } catch (InvalidCastException) { n = 4; }
                        n += ((Slot<int>)o).Held;
                        Say(c, "n" + n);
                    }
                }

                public sealed class UnboxLongAsInt : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object boxed = 5L;
                        var n = 1;
                        try { n = (int)boxed; } catch (InvalidCastException) { n = 2; }
                        Say(c, "n" + n);
                    }
                }
                public sealed class UnboxNumbersOfOtherTypes : Base
                {
                    private static string Try(Func<object> f) { try { return Text(f()); } catch (InvalidCastException) { return "ic"; } catch (NullReferenceException) { return "nr"; } }
                    protected override void Describe(Circuit c)
                    {
                        object five = 5, letter = 'A', half = 1.5f, ten = 10m, big = 7u, nothing = null!;
                        Say(c, string.Join(",", Try(() => (long)five), Try(() => (char)five), Try(() => (int)letter), Try(() => (char)letter), Try(() => (double)half),
                            Try(() => (float)half), Try(() => (decimal)five), Try(() => (decimal)ten), Try(() => (uint)five), Try(() => (int)big), Try(() => (uint)big),
                            Try(() => (int)nothing), Try(() => (int)five)));
                    }
                }
                public sealed class UnboxEnumsAndUnderlyingTypes : Base
                {
                    private static string Try(Func<object> f) { try { return Text(f()); } catch (InvalidCastException) { return "ic"; } }
                    protected override void Describe(Circuit c)
                    {
                        object scan = Mode.Scan, two = 2, thick = Gauge.Thick, six = (byte)6, longTwo = 2L;
                        Say(c, string.Join(",", Try(() => (int)scan), Try(() => (Mode)two), Try(() => (Phase)scan), Try(() => (Mode)longTwo), Try(() => (long)scan),
                            Try(() => (byte)thick), Try(() => (int)thick), Try(() => (Gauge)six), Try(() => (Gauge)two), Try(() => (Mode)thick),
                            Try(() => new[] { scan }.Cast<Phase>().First()), Try(() => new[] { scan }.Cast<int>().First()), Try(() => new[] { scan }.Cast<long>().First()),
                            Try(() => new[] { two }.Cast<Mode>().First()), Try(() => new[] { scan }.Cast<int?>().First()!), Try(() => new[] { two }.Cast<Mode?>().First()!)));
                    }
                }
                public sealed class UnboxNullables : Base
                {
                    private static string Try(Func<object?> f) { try { return Text(f()); } catch (InvalidCastException) { return "ic"; } }
                    protected override void Describe(Circuit c)
                    {
                        object five = 5, nothing = null!, scan = Mode.Scan;
                        Say(c, string.Join(",", Try(() => (long?)five), Try(() => (int?)five), Try(() => (int?)nothing), Try(() => (Mode?)five), Try(() => (Mode?)scan),
                            Try(() => (char?)five), Try(() => (double?)five), Try(() => (int?)scan), Try(() => (Phase?)scan)));
                    }
                }
                public sealed class UnboxSmallIntegers : Base
                {
                    private static string Try(Func<object> f) { try { return Text(f()); } catch (InvalidCastException) { return "ic"; } }
                    protected override void Describe(Circuit c)
                    {
                        short a = 3, b = 4;
                        short sum = (short)(a + b);
                        a++;
                        b += 2;
                        byte w = 200;
                        w += 100;
                        object s1 = sum, s2 = a, s3 = b, s4 = w, s5 = (sbyte)-3, s6 = (ushort)9;
                        Say(c, string.Join(",", Try(() => (short)s1), Try(() => (int)s1), Try(() => (short)s2), Try(() => (int)s2), Try(() => (short)s3), Try(() => (long)s3),
                            Try(() => (byte)s4), Try(() => (int)s4), Try(() => (sbyte)s5), Try(() => (byte)s5), Try(() => (ushort)s6), Try(() => (short)s6)));
                    }
                }
                public sealed class UnboxSmallIntegersFromEveryPlace : Base
                {
                    private static string Try(Func<object> f) { try { return Text(f()); } catch (InvalidCastException) { return "ic"; } }
                    private static short Twice(short v) => (short)(v * 2);
                    protected override void Describe(Circuit c)
                    {
                        short a = 3, b = 4;
                        var flag = a < b;
                        short m = flag ? a : b;
                        short d = default;
                        var arr = new short[2];
                        (short, int) tp = (5, 1);
                        var q = new List<short> { 7 };
                        byte[] bytes = { 1, 2 };
                        short sw = a switch { 3 => 30, _ => 40 };
                        ushort us = 65535;
                        us++;
                        sbyte sb = -128;
                        sb--;
                        char ch = 'a';
                        ch += (char)1;
                        object[] boxes = { m, d, arr[1], tp.Item1, q[0], bytes[1], sw, Twice(a), Math.Max(a, b), us, sb, ch, q.Sum(v => v), bytes.Max() };
                        Say(c, string.Join(",", boxes.Select(o => Try(() => (int)o) + Try(() => (short)o))));
                    }
                }
                public sealed class UnboxInGenericCode : Base
                {
                    private static object Box<T>(T value) => value!;
                    private static string Try(Func<object> f) { try { return Text(f()); } catch (InvalidCastException) { return "ic"; } }
                    protected override void Describe(Circuit c)
                    {
                        short narrow = 12;
                        Say(c, string.Join(",", Try(() => (short)Box(narrow)), Try(() => (int)Box(narrow)), Try(() => (int)Box(Mode.Run)), Try(() => (long)Box(7))));
                    }
                }

                public sealed class ForeachDowncastThrows : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = 0;
                        foreach (LatchCell lc in new List<Cell> { new LatchCell { Drive = 2 }, new LatchCell { Drive = 3 } }) n += lc.Drive * 100;
                        foreach (LatchCell? lc in new Cell?[] { null, new LatchCell() }) n += lc is null ? 1000 : 2000;
                        try { foreach (LatchCell lc in new Cell[] { new LatchCell(), new Cell() }) n += lc.Drive; } catch (InvalidCastException) { n += 10; }
                        Say(c, "n" + n);
                    }
                }
                public sealed class ForeachOverObjectsAsStrings : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var text = "";
                        try { foreach (string s in new List<object> { "a", "b", 3, "d" }) text += s; } catch (InvalidCastException) { text += "_ic"; }
                        try { foreach (IPort<string> p in new object[] { new IntPort() }) text += "p"; } catch (InvalidCastException) { text += "_ip"; }
                        Say(c, text);
                    }
                }
                public sealed class ForeachUnboxes : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = 0;
                        try { foreach (int v in new object[] { 1, 2, 4L, 8 }) n += v; } catch (InvalidCastException) { n += 100; }
                        foreach (int v in new object[] { Mode.Run, 3 }) n += v * 1000;
                        Say(c, "n" + n);
                    }
                }

                public sealed class EnumCompareToIsTheUnderlyingTypes : Base
                {
                    protected override void Describe(Circuit c)
                        => Say(c, Join(Sgn.Neg.CompareTo(Sgn.Pos), Sgn.Pos.CompareTo(Sgn.Neg), Gauge.Thick.CompareTo(Gauge.Thin), Gauge.Thin.CompareTo(Gauge.Thick),
                            Tier.Low.CompareTo(Tier.High), Rank.Last.CompareTo(Rank.First), Sgn.Zero.CompareTo(Sgn.Zero), Gauge.Thin.CompareTo(null),
                            Mode.Idle.CompareTo(Mode.Run), Mode.Run.CompareTo(Mode.Idle), Span.Long.CompareTo(Span.Short), Notch.B.CompareTo(Notch.A), Notch.A.CompareTo(Notch.B),
                            new[] { Sgn.Pos, Sgn.Neg, Sgn.Zero }.Max().CompareTo(Sgn.Neg)));
                }
            }
            """));
}
