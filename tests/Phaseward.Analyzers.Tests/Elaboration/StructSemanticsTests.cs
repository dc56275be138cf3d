namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Structs as C# has them, each design elaborated exactly as the compiled design runs it (the oracle: the design
/// compiled and run by .NET, <see cref="ParityTests"/>). A struct stored as an object or an interface is a box, made
/// once by the boxing conversion and then shared; unboxing copies the value out; a foreach or using variable is
/// read-only, so a method that changes it runs on a copy; 'using (s)' disposes a copy. Before, every store copied a
/// struct by its run-time type (a box was never shared), and a foreach over structs changed the elements. Also here: a
/// user-defined && and || ask the type's operator false or true before evaluating the right operand, and a slice of a
/// string in a list pattern is a string.
/// </summary>
public class StructSemanticsTests
{
    [Theory]
    [InlineData("Structs.BoxAlias")]
    [InlineData("Structs.BoxPassedAsInterface")]
    [InlineData("Structs.BoxInListShared")]
    [InlineData("Structs.BoxCastToInterface")]
    [InlineData("Structs.BoxedCopies")]
    [InlineData("Structs.ForeachOverArray")]
    [InlineData("Structs.ForeachOverList")]
    [InlineData("Structs.ForeachInGenericCode")]
    [InlineData("Structs.GenericOverBoxes")]
    [InlineData("Structs.UsingStructVariable")]
    [InlineData("Structs.UserShortCircuit")]
    [InlineData("Structs.StringSlicePattern")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/structs/Structs.cs", """
            using System;
            using System.Collections.Generic;
            using Phaseward;

            namespace Structs
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public interface ITally { void Inc(); int Get(); }
                public struct Tally : ITally { public int X; public void Inc() => X++; public int Get() => X; }
                public sealed class BoxAlias : Base
                {
                    protected override void Describe(Circuit c) { ITally a = new Tally(); ITally b = a; b.Inc(); Chain(c, 1 + a.Get() + b.Get(), "ba"); }
                }
                public sealed class BoxPassedAsInterface : Base
                {
                    private static void Bump(ITally x) => x.Inc();
                    protected override void Describe(Circuit c) { ITally a = new Tally(); Bump(a); Bump(a); var list = new List<ITally> { a }; list[0].Inc(); Chain(c, 1 + a.Get(), "bp"); }
                }
                public sealed class BoxInListShared : Base
                {
                    protected override void Describe(Circuit c) { object o = new Tally(); var l = new List<object> { o, o }; ((ITally)l[0]).Inc(); Chain(c, 1 + ((Tally)l[1]).X + ((Tally)o).X, "bl"); }
                }
                public sealed class BoxCastToInterface : Base
                {
                    protected override void Describe(Circuit c) { object o = new Tally(); ((ITally)o).Inc(); ((ITally)o).Inc(); Chain(c, 1 + ((Tally)o).X, "bc"); }
                }
                public sealed class BoxedCopies : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var s = new Tally();
                        ITally boxed = s;
                        boxed.Inc(); boxed.Inc();
                        object o = s;
                        ((ITally)o).Inc();
                        var back = (Tally)o;
                        var s2 = (Tally)boxed;
                        s2.Inc();
                        Chain(c, s.X + 10 * boxed.Get() + back.X + s2.X + ((Tally)boxed).X, "bx");
                    }
                }
                public sealed class ForeachOverArray : Base
                {
                    protected override void Describe(Circuit c) { var arr = new Tally[2]; foreach (var x in arr) { x.Inc(); x.Inc(); } Chain(c, 1 + arr[0].X + arr[1].X, "fa"); }
                }
                public sealed class ForeachOverList : Base
                {
                    protected override void Describe(Circuit c) { var l = new List<Tally> { new Tally() }; foreach (var x in l) x.Inc(); Chain(c, 1 + l[0].X, "fl"); }
                }
                public static class Gen
                {
                    public static void IncAll<T>(T[] xs) where T : ITally { for (var i = 0; i < xs.Length; i++) xs[i].Inc(); foreach (var x in xs) x.Inc(); }
                    public static int IncCopy<T>(T x) where T : ITally { x.Inc(); return x.Get(); }
                }
                public sealed class ForeachInGenericCode : Base
                {
                    protected override void Describe(Circuit c) { var arr = new Tally[2]; Gen.IncAll(arr); var one = new Tally(); var r = Gen.IncCopy(one); Chain(c, arr[0].X + arr[1].X + 10 * one.X + r, "fg"); }
                }
                public sealed class GenericOverBoxes : Base
                {
                    protected override void Describe(Circuit c) { ITally[] boxes = { new Tally(), new Tally() }; Gen.IncAll(boxes); Chain(c, boxes[0].Get() + boxes[1].Get(), "gb"); }
                }
                public struct Lease : IDisposable { public int Count; public void Dispose() => Count++; }
                public sealed class UsingStructVariable : Base
                {
                    protected override void Describe(Circuit c) { var s = new Lease(); using (s) { } s.Dispose(); using (var t = new Lease()) { t.Dispose(); } Chain(c, 1 + s.Count, "us"); }
                }
                public readonly struct Tri
                {
                    public readonly int V;
                    public Tri(int v) => V = v;
                    public static bool operator true(Tri t) => t.V > 0;
                    public static bool operator false(Tri t) => t.V <= 0;
                    public static Tri operator |(Tri a, Tri b) => new(a.V + b.V);
                    public static Tri operator &(Tri a, Tri b) => new(a.V * b.V);
                }
                public sealed class UserShortCircuit : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = 0;
                        Tri T(int v) { n++; return new Tri(v); }
                        var r = T(2) || T(7);
                        var q = T(0) && T(9);
                        var s = T(0) || T(3);
                        var p = T(2) && T(4);
                        Chain(c, r.V + q.V + s.V + p.V + n, "sc");
                    }
                }
                public sealed class StringSlicePattern : Base
                {
                    protected override void Describe(Circuit c) { var s = "abcd" is [_, .. var rest] ? rest : "none"; Chain(c, s.Length + (s == "bcd" ? 2 : 0), "sp"); }
                }
            }
            """));
}
