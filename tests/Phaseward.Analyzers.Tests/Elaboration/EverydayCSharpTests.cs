namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// C# as programmers write it every day, each construct elaborated exactly as the compiled design runs it (the
/// oracle: the design compiled and run by .NET, <see cref="ParityTests"/>). Before: an indexer's setter lost its value
/// (PW9001), List.Sort and Max on the design's IComparable records were a false PW9003, <c>new T()</c> and
/// <c>GetValueOrDefault</c> on a nullable were PW9001, and a write or foreach through null was PW9001 instead of the
/// NullReferenceException the design catches, typeof or GetType() (to name what a block makes by its type), combined delegates and events
/// were PW9001; so were a foreach over a sequence of the design's own type (a bus that is IEnumerable&lt;Net&gt;) and a
/// nested initializer (<c>new Lane { Tap = { Depth = 2 }, Names = { "a" } }</c>). A property read or written through
/// <c>base.</c> ran the override again (PW9002 at the recursion limit), a generic class's constructor and a partial
/// method's body could not read their own parameters (PW9001), and a static abstract property read through a type
/// parameter (<c>T.Prefix</c>) was read as an empty static of the interface, silently.
/// </summary>
public class EverydayCSharpTests
{
    [Theory]
    [InlineData("Everyday.Operators")]
    [InlineData("Everyday.Conversions")]
    [InlineData("Everyday.StructCtor")]
    [InlineData("Everyday.DefaultInterface")]
    [InlineData("Everyday.FieldWriteNull")]
    [InlineData("Everyday.ForeachNull")]
    [InlineData("Everyday.StaticMethodCctor")]
    [InlineData("Everyday.Formats")]
    [InlineData("Everyday.Indexers")]
    [InlineData("Everyday.InitRequired")]
    [InlineData("Everyday.TupleSwap")]
    [InlineData("Everyday.LinqGroup")]
    [InlineData("Everyday.PropertyEffects")]
    [InlineData("Everyday.CompareRecords")]
    [InlineData("Everyday.DictOrder")]
    [InlineData("Everyday.NullableStruct")]
    [InlineData("Everyday.StringSwitch")]
    [InlineData("Everyday.GenericConstraint")]
    [InlineData("Everyday.NamedByType")]
    [InlineData("Everyday.Multicast")]
    [InlineData("Everyday.Events")]
    [InlineData("Everyday.BusOfOwnType")]
    [InlineData("Everyday.BusHandingOutAListEnumerator")]
    [InlineData("Everyday.BusLeftEarly")]
    [InlineData("Everyday.NestedInitializers")]
    [InlineData("Everyday.TemplateDerived")]
    [InlineData("Everyday.GenericConstructor")]
    [InlineData("Everyday.PartialParts")]
    [InlineData("Everyday.StaticAbstracts")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/everyday/Everyday.cs", """
            using System;
            using System.Linq;
            using System.Collections.Generic;
            using Phaseward;

            namespace Everyday
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public readonly record struct Width(int Bits) { public static Width operator +(Width a, Width b) => new(a.Bits + b.Bits); public static bool operator >(Width a, int b) => a.Bits > b; public static bool operator <(Width a, int b) => a.Bits < b; public static Width operator ++(Width a) => new(a.Bits + 1); }
                public sealed class Operators : Base
                {
                    protected override void Describe(Circuit c) { var w = new Width(2) + new Width(3); w++; Chain(c, w > 5 ? w.Bits : 1, "o"); }
                }
                public sealed class Meters { public double V; public static implicit operator double(Meters m) => m.V; public static explicit operator Meters(double d) => new Meters { V = d * 2 }; }
                public sealed class Conversions : Base
                {
                    protected override void Describe(Circuit c) { var m = (Meters)1.5; double d = m; Chain(c, (int)d, "cv"); }
                }
                public struct Counter { public int N; public Counter() { N = 4; } }
                public sealed class StructCtor : Base
                {
                    protected override void Describe(Circuit c) { var a = new Counter(); var b = default(Counter); var arr = new Counter[2]; Chain(c, a.N + b.N + arr[1].N, "sc"); }
                }
                public interface IStage { int Count => 2; int Extra(); }
                public sealed class Stage : IStage { public int Extra() => 3; }
                public sealed class DefaultInterface : Base
                {
                    protected override void Describe(Circuit c) { IStage s = new Stage(); Chain(c, s.Count + s.Extra(), "di"); }
                }
                public sealed class Node { public int V; public Node? Next; }
                public sealed class FieldWriteNull : Base
                {
                    protected override void Describe(Circuit c) { var n = new Node(); var k = 1; try { n.Next!.V = 5; k = 2; } catch (NullReferenceException) { k = 3; } Chain(c, k, "fw"); }
                }
                public sealed class ForeachNull : Base
                {
                    protected override void Describe(Circuit c) { List<int>? l = null; var k = 1; try { foreach (var i in l!) k += i; } catch (NullReferenceException) { k = 4; } Chain(c, k, "fn"); }
                }
                public static class Plan { public static int Made; static Plan() { Made = 3; } public static int Get() => Made + 1; }
                public sealed class StaticMethodCctor : Base
                {
                    protected override void Describe(Circuit c) => Chain(c, Plan.Get(), "sm");
                }
                public sealed class Formats : Base
                {
                    protected override void Describe(Circuit c) { var x = 7; var inv = System.Globalization.CultureInfo.InvariantCulture; var s = $"{x:D3}_{3.14159.ToString("F2", inv)}_{x,5}_{0.5.ToString("P0", inv)}_{1234567.ToString("N0", inv)}_{x:X}_{-x:X}_{x:x4}"; c.Inverter(c.Input("a"), s.Replace(" ", "_").Replace(",", "c").Replace("%", "pc")); }
                }
                public sealed class Bank { private readonly int[] v = new int[4]; public int this[int i] { get => v[i]; set => v[i] = value * 2; } public int this[string k] => k.Length; }
                public sealed class Indexers : Base
                {
                    protected override void Describe(Circuit c) { var b = new Bank(); b[1] = 2; b[1] += 1; Chain(c, b[1] + b["ab"], "ix"); }
                }
                public sealed class Spec { public required int Stages { get; init; } public string Tag { get; init; } = "t"; }
                public sealed class InitRequired : Base
                {
                    protected override void Describe(Circuit c) { var s = new Spec { Stages = 3 }; Chain(c, s.Stages, s.Tag); }
                }
                public sealed class TupleSwap : Base
                {
                    protected override void Describe(Circuit c) { var (a, b) = (1, 4); (a, b) = (b, a); var arr = new[] { 5, 6 }; (arr[0], arr[1]) = (arr[1], arr[0]); Chain(c, a * 10 + b + arr[0], "ts"); }
                }
                public sealed class LinqGroup : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var words = new[] { "ab", "cd", "e", "fgh", "ij" };
                        var g = words.GroupBy(w => w.Length).OrderByDescending(x => x.Count()).ThenBy(x => x.Key).Select(x => $"{x.Key}:{string.Join("", x)}").ToArray();
                        var lookup = words.ToLookup(w => w[0] < 'f');
                        var zipped = words.Zip(Enumerable.Range(1, 9), (w, i) => w + i).Aggregate((p, q) => p + q);
                        c.Inverter(c.Input("a"), string.Join("_", g).Replace(":", "k") + lookup[true].Count() + zipped);
                    }
                }
                public sealed class Tick { private int n; public int Next => ++n; }
                public sealed class PropertyEffects : Base
                {
                    protected override void Describe(Circuit c) { var t = new Tick(); var s = t.Next + t.Next * 10; Chain(c, s % 9, "pe"); }
                }
                public record Part(string Name, int Size) : IComparable<Part> { public int CompareTo(Part? o) => Size.CompareTo(o!.Size); }
                public sealed class CompareRecords : Base
                {
                    protected override void Describe(Circuit c) { var l = new List<Part> { new("a", 3), new("b", 1), new("c", 2) }; l.Sort(); var m = l.Max()!; c.Inverter(c.Input("a"), string.Concat(l.Select(p => p.Name)) + m.Name); }
                }
                public sealed class DictOrder : Base
                {
                    protected override void Describe(Circuit c) { var d = new Dictionary<string, int> { ["z"] = 1, ["a"] = 2 }; d.Remove("z"); d["m"] = 3; d["q"] = 4; var hs = new HashSet<int> { 5, 1, 9 }; hs.Remove(1); hs.Add(2); c.Inverter(c.Input("a"), string.Concat(d.Keys) + string.Concat(hs)); }
                }
                public sealed class NullableStruct : Base
                {
                    protected override void Describe(Circuit c) { int? a = null; int? b = 3; var s = (a ?? 1) + (b ?? 0) + (a.HasValue ? 10 : 0) + a.GetValueOrDefault(2) + (a + b ?? 5); Chain(c, s, "ns"); }
                }
                public sealed class StringSwitch : Base
                {
                    protected override void Describe(Circuit c) { var kind = "latch"; var n = kind switch { "reg" => 1, "latch" when kind.Length > 3 => 2, _ => 3 }; Chain(c, n, "ss"); }
                }
                public interface IShape { int Stages { get; } }
                public sealed class Three : IShape { public int Stages => 3; }
                public static class Build { public static int Of<T>() where T : IShape, new() => new T().Stages; }
                public sealed class GenericConstraint : Base
                {
                    protected override void Describe(Circuit c) => Chain(c, Build.Of<Three>(), "gc");
                }
                public abstract class Unit : Block { protected override void Describe(Circuit c) => c.Output("o", c.Inverter(c.Input("i"), GetType().Name.ToLowerInvariant())); }
                public sealed class Adder : Unit { }
                public sealed class Shifter : Unit { public sealed class Inner { } }
                public sealed class Box<T> { public sealed class Lid { } }
                public sealed class Multicast : Base
                {
                    private int calls;
                    private int Count() => ++calls;
                    protected override void Describe(Circuit c)
                    {
                        var n = 0;
                        Action a = () => n += 1;
                        a += () => n += 10;
                        a += () => n *= 2;
                        a();
                        a -= () => n += 1; // another lambda: not equal, nothing removed
                        a();
                        Func<int> f = () => 1;
                        f += () => 7;
                        Func<int> g = Count;
                        g += Count;
                        g += f;
                        g -= Count; // the last Count added
                        var fromG = g() + calls * 100;
                        Action? none = null;
                        none += () => n += 1000;
                        none -= none;
                        Chain(c, n % 7 + f() + fromG % 5 + (none is null ? 1 : 0), "m");
                    }
                }
                public sealed class Bus
                {
                    public event Action<int>? Fired;
                    public void Fire(int v) => Fired?.Invoke(v);
                    public bool Quiet => Fired is null;
                }
                public sealed class Events : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var b = new Bus();
                        var quietBefore = b.Quiet;
                        var t = 0;
                        Action<int> doubler = v => t *= v;
                        b.Fired += v => t += v;
                        b.Fired += doubler;
                        b.Fire(3);
                        b.Fired -= doubler;
                        b.Fire(2);
                        Chain(c, t % 9 + (quietBefore ? 1 : 0) + (b.Quiet ? 10 : 0), "ev");
                    }
                }
                public sealed class NamedByType : Base
                {
                    private static string Of<T>() => typeof(T).Name + (typeof(T) == typeof(Adder) ? "_is_adder" : "");
                    protected override void Describe(Circuit c)
                    {
                        Unit[] stages = { new Adder(), new Shifter(), new Adder() };
                        for (var i = 0; i < stages.Length; i++)
                            c.Place(stages[i], $"{stages[i].GetType().Name}{i}");
                        var same = stages[0].GetType() == stages[2].GetType() && stages[0].GetType() != typeof(Shifter) && stages[1].GetType().Equals(typeof(Shifter));
                        var text = $"{typeof(Shifter.Inner)}_{typeof(Box<int>)}_{typeof(Box<string>.Lid)}_{typeof(int[]).Name}_{typeof(Shifter).FullName}_{typeof(Adder).Namespace}";
                        c.Inverter(c.Input("a"), (GetType().Name + Of<Adder>() + Of<Shifter>() + same + text).Replace(".", "_").Replace("+", "p").Replace("`", "q").Replace("[", "o").Replace("]", "c").Replace(",", "m"));
                    }
                }
                public sealed class Wires : IEnumerable<Net>
                {
                    private readonly List<Net> bits = new();
                    public int Yielded;
                    public void Add(Net n) => bits.Add(n);
                    public IEnumerator<Net> GetEnumerator() { foreach (var b in bits) { Yielded++; yield return b; } }
                    System.Collections.IEnumerator System.Collections.IEnumerable.GetEnumerator() => GetEnumerator();
                }
                public sealed class BusOfOwnType : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var bus = new Wires { c.Input("d0"), c.Input("d1"), c.Input("d2") };
                        var k = 0;
                        foreach (var bit in bus) c.Inverter(bit, "buf" + k++ + "_" + bus.Yielded);
                    }
                }
                public sealed class ListedWires : IEnumerable<Net>
                {
                    private readonly List<Net> bits;
                    public ListedWires(params Net[] nets) => bits = new List<Net>(nets);
                    public IEnumerator<Net> GetEnumerator() => bits.GetEnumerator();
                    System.Collections.IEnumerator System.Collections.IEnumerable.GetEnumerator() => bits.GetEnumerator();
                }
                public sealed class BusHandingOutAListEnumerator : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var bus = new ListedWires(c.Input("e0"), c.Input("e1"));
                        var k = 0;
                        foreach (var bit in bus) c.Inverter(bit, "le" + k++);
                    }
                }
                public sealed class BusLeftEarly : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var bus = new Wires { c.Input("f0"), c.Input("f1"), c.Input("f2") };
                        foreach (var bit in bus) { c.Inverter(bit, "early" + bus.Yielded); if (bus.Yielded == 2) break; }
                        Chain(c, bus.Yielded, "ye");
                    }
                }
                public sealed class Tap { public int Depth = 1; public List<string> Names = new(); }
                public struct Spot { public int X; public int Y; }
                public sealed class Lane { public Tap Tap { get; } = new(); public Spot At; public List<string> Names { get; } = new() { "z" }; }
                public sealed class NestedInitializers : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var lane = new Lane { Tap = { Depth = 2, Names = { "p", "q" } }, At = { X = 3 }, Names = { "a", "b" } };
                        Chain(c, lane.Tap.Depth + lane.Tap.Names.Count + lane.At.X + lane.Names.Count, "ni");
                    }
                }
                public class TemplateBase : Base
                {
                    private int stored;
                    protected virtual int W => 2;
                    protected virtual int this[int i] => i * 2;
                    protected virtual int Stored { get => stored; set => stored = value; }
                    protected override void Describe(Circuit c) { Stored = 1; Chain(c, W + this[1] + Stored, "tb"); }
                }
                public sealed class TemplateDerived : TemplateBase
                {
                    protected override int W => base.W + 1;
                    protected override int this[int i] => base[i] + 1;
                    protected override int Stored { get => base.Stored + 1; set => base.Stored = value * 2; }
                }
                public sealed class Crate<T>
                {
                    public readonly int N;
                    public readonly string Tag;
                    public Crate(int n, string tag = "t") { N = n; Tag = tag + typeof(T).Name; }
                }
                public sealed class GenericConstructor : Base
                {
                    protected override void Describe(Circuit c) { var b = new Crate<string>(4); var g = new Crate<int>(2, "u"); Chain(c, b.N + g.N + g.Tag.Length, "gc"); }
                }
                public sealed partial class PartialParts : Base
                {
                    partial void Extra(ref int s, int i);
                    protected override void Describe(Circuit c) { var s = 1; Extra(ref s, 3); Chain(c, s, "pp"); }
                }
                public sealed partial class PartialParts
                {
                    partial void Extra(ref int s, int i) { s += i; }
                }
                public interface IKind { static abstract string Prefix { get; } static abstract int Width(int n); static virtual int Extra => 1; }
                public sealed class Narrow : IKind { public static string Prefix => "nw"; public static int Width(int n) => n; }
                public sealed class Wide : IKind { public static string Prefix { get; } = "wdx"; public static int Width(int n) => 2 * n; public static int Extra => 5; }
                public sealed class StaticAbstracts : Base
                {
                    private static int Count<T>() where T : IKind => T.Width(2) + T.Extra + T.Prefix.Length;
                    protected override void Describe(Circuit c) { c.Inverter(c.Input("kind"), Name<Narrow>() + Name<Wide>()); Chain(c, Count<Narrow>() + Count<Wide>(), "sa"); }
                    private static string Name<T>() where T : IKind => T.Prefix + "_";
                }
            }
            """));
}
