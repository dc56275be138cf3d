using System;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Values crossing the boundary between the design's code and the .NET library, and exceptions crossing the design's
/// try statements, elaborated exactly as the compiled design runs them (the oracle: the design compiled and run by
/// .NET, <see cref="ParityTests"/>). Before: library members ran with their type arguments erased to object, so the
/// defaults .NET fills in (FirstOrDefault on an empty List&lt;int&gt;, the slots Array.Resize adds, what Array.Clear leaves,
/// a missing TryGetValue) were null: a device vanished silently behind a null condition, or Sum() was a false PW9003.
/// </summary>
public class LibraryBoundaryTests
{
    [Theory]
    [InlineData("Boundary.EmptyDefaults")]
    [InlineData("Boundary.ResizedArrays")]
    [InlineData("Boundary.ResizedBools")]
    [InlineData("Boundary.ClearedLongs")]
    [InlineData("Boundary.MissingKey")]
    [InlineData("Boundary.GenericPadding")]
    [InlineData("Boundary.LogAndRethrow")]
    [InlineData("Boundary.PlacedTwice")]
    [InlineData("Boundary.TupleKeys")]
    [InlineData("Boundary.SetAgainstSet")]
    [InlineData("Boundary.GenericCompare")]
    [InlineData("Boundary.RangesAndComparers")]
    [InlineData("Boundary.StaticInit")]
    [InlineData("Boundary.FilterFirst")]
    [InlineData("Boundary.BaseStaticInit")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public void AnErasedDefaultInGenericCodeIsTheDefaultOfWhatTheTypeParameterStandsFor()
    {
        // The static type of an erased default in generic code is a type parameter: resolved where the code runs (bool),
        // it is false as in .NET. Before, the null stayed and the if reported it.
        var designs = new InMemoryDesigns(("/boundary/D.cs", Source("", "private static T Pick<T>(System.Collections.Generic.List<T> items) => System.Linq.Enumerable.FirstOrDefault(items)!;",
            "if (Pick(new System.Collections.Generic.List<bool>())) count = 1; else count = 5;")));
        ParityTests.AssertParity(designs, "Boundary.D");
        Assert.Equal(5, designs.CompileTime("Boundary.D").Netlist!.Devices.Count);
    }

    private static readonly InMemoryDesigns Designs = new(("/boundary/Boundary.cs", """
            using System;
            using System.Linq;
            using System.Collections.Generic;
            using Phaseward;

            namespace Boundary
            {
                public abstract class Base : Design
                {
                    protected static void Mark(Circuit c, string text) => c.Inverter(c.Input("a"), "m_" + text);
                    protected static void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); }
                }
                public sealed class EmptyDefaults : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var lanes = new List<int>();
                        var text = "f" + lanes.FirstOrDefault() + lanes.LastOrDefault() + lanes.SingleOrDefault() + new int[0].ElementAtOrDefault(3)
                            + lanes.DefaultIfEmpty().First() + string.Concat(lanes.DefaultIfEmpty()) + new List<bool>().FirstOrDefault()
                            + new double[0].LastOrDefault() + lanes.FirstOrDefault(l => l > 2) + lanes.DefaultIfEmpty().ToArray().Length;
                        Mark(c, text);
                        Chain(c, lanes.FirstOrDefault() + 2, "e");
                    }
                }
                public sealed class ResizedArrays : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var taps = new[] { 1, 2 };
                        Array.Resize(ref taps, 4);
                        var gains = new double[1];
                        Array.Resize(ref gains, 2);
                        Mark(c, string.Join("_", taps) + "s" + taps.Sum() + "g" + string.Join("_", gains) + taps.ToList().IndexOf(0));
                        Chain(c, taps.Sum(), "r");
                    }
                }
                public sealed class ResizedBools : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var enables = new bool[1];
                        Array.Resize(ref enables, 3);
                        var off = 0;
                        foreach (var e in enables)
                            if (!e) off++;
                        Mark(c, enables[1] ? "on" : "off");
                        Chain(c, off, "b");
                    }
                }
                public sealed class ClearedLongs : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var weights = new long[3] { 5, 6, 7 };
                        Array.Clear(weights);
                        var spans = new int[] { 4, 5, 6 };
                        Array.Clear(spans, 1, 1);
                        Mark(c, string.Concat(weights) + "_" + weights.Sum() + "_" + string.Concat(spans));
                        Chain(c, (int)weights.Sum() + spans.Sum() - 8, "cl");
                    }
                }
                public sealed class MissingKey : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var depth = new Dictionary<string, int> { ["alu"] = 2 };
                        var flags = new Dictionary<string, bool>();
                        depth.TryGetValue("fpu", out var missing);
                        var found = flags.TryGetValue("fast", out var fast);
                        Mark(c, "v" + (missing + 1) + found + fast);
                        Chain(c, missing + 2 + (fast ? 5 : 0), "k");
                    }
                }
                public sealed class GenericPadding : Base
                {
                    private static IEnumerable<T> Padded<T>(List<T> items) => items.DefaultIfEmpty();
                    protected override void Describe(Circuit c) => Chain(c, Padded(new List<int>()).Sum() + Padded(new List<int> { 2 }).Sum() + 1, "gp");
                }
                public sealed class LogAndRethrow : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var log = "";
                        try
                        {
                            try { throw new InvalidOperationException("bus"); }
                            catch (InvalidOperationException) { log += "seen"; throw; }
                        }
                        catch (InvalidOperationException e) { log += "_" + e.Message; }
                        try
                        {
                            try { throw new ArgumentException("lane"); }
                            catch (ArgumentException e) { e = new ArgumentException("other"); log += "_" + e.Message; throw; }
                        }
                        catch (ArgumentException e) { log += "_" + e.Message; }
                        Mark(c, log);
                    }
                }
                public sealed class Cell : Block { protected override void Describe(Circuit c) => c.Inverter(c.Input("i"), "n"); }
                public sealed class PlacedTwice : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        c.Place(new Cell(), "u");
                        try { c.Place(new Cell(), "u"); }
                        catch (ArgumentException e) { Mark(c, "p" + e.ParamName + e.Message.Length); }
                    }
                }
                public sealed record Lane(string Name);
                public sealed class TupleKeys : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var depth = new Dictionary<(int Row, string Col), int> { [(1, "a")] = 5 };
                        depth[(2, "b")] = 6;
                        depth[(1, "a")] += 1;
                        var seen = new HashSet<(int, int)> { (1, 2), (1, 2), (2, 1) };
                        var lanes = new Dictionary<(Lane, int), string> { [(new Lane("x"), 1)] = "first" };
                        Mark(c, "k" + depth[(1, "a")] + depth.ContainsKey((2, "b")) + depth.ContainsKey((2, "a")) + seen.Count
                            + new[] { (1, 2), (1, 2), (2, 2) }.Distinct().Count() + lanes[(new Lane("x"), 1)]);
                        Chain(c, depth[(1, "a")] - seen.Count, "t");
                    }
                }
                public sealed class SetAgainstSet : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var ports = new HashSet<int> { 5, 3, 1, 7 };
                        ports.SymmetricExceptWith(new HashSet<int> { 3, 4, 5 });
                        var pins = new HashSet<int> { 5, 3, 1, 7 };
                        pins.SymmetricExceptWith(new[] { 3, 4, 5 });
                        Mark(c, string.Concat(ports) + "_" + string.Concat(pins) + ports.SetEquals(new HashSet<int> { 1, 4, 7 }));
                    }
                }
                public sealed class GenericCompare : Base
                {
                    private static T Larger<T>(T a, T b) where T : IComparable<T> => a.CompareTo(b) >= 0 ? a : b;
                    protected override void Describe(Circuit c)
                    {
                        Mark(c, "m" + Larger(3, 7) + Larger("ab", "b") + Larger(2L, 1L));
                        Chain(c, Larger(2, 4), "g");
                    }
                }
                public sealed class RangesAndComparers : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var widths = new[] { 5, 3, 8, 1 };
                        var names = new List<string> { "beta", "Alpha", "gamma" };
                        var caseless = new HashSet<string>(StringComparer.OrdinalIgnoreCase) { "Bus", "BUS", "net" };
                        var byName = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase) { ["Clk"] = 2 };
                        Mark(c, widths.Take(..2).Sum() + "_" + widths.Take(^2..).Sum() + "_" + string.Join("_", names.OrderBy(n => n, StringComparer.Ordinal))
                            + caseless.Count + byName["CLK"] + names.Max(StringComparer.Ordinal));
                    }
                }
                public static class Logbook { public static readonly List<string> Lines = new(); public static int Note(string s) { Lines.Add(s); return 2; } }
                public static class Strict { public static int Seed = Logbook.Note("field"); static Strict() { Logbook.Lines.Add("cctor"); } public static void Touch() => Logbook.Lines.Add("touch"); public static int Level => 3; }
                public static class Gauge { static Gauge() { Logbook.Lines.Add("gauge"); } public static int Level => 1; }
                public sealed class Sensor { static Sensor() { Logbook.Lines.Add("sensor"); } public Sensor() { Logbook.Lines.Add("made"); } }
                public static class Relaxed { public static int Seed = Logbook.Note("relaxed"); public static void Touch() => Logbook.Lines.Add("loose"); }
                public static class Ledger { public static readonly List<string> Lines = new(); public static int Note(string s) { Lines.Add(s); return 2; } }
                public class Housing { public int Made = Ledger.Note("housing-field"); static Housing() { Ledger.Lines.Add("housing-cctor"); } public Housing() { Ledger.Lines.Add("housing"); } }
                public sealed class Probe : Housing { public int Tip = Ledger.Note("probe-field"); static Probe() { Ledger.Lines.Add("probe-cctor"); } public Probe() { Ledger.Lines.Add("probe"); } }
                public sealed class BaseStaticInit : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        Ledger.Lines.Add("start");
                        _ = new Probe();
                        _ = new Probe();
                        Mark(c, string.Join("_", Ledger.Lines));
                    }
                }
                public sealed class StaticInit : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        Logbook.Lines.Add("start");
                        Strict.Touch();
                        _ = new Sensor();
                        var level = Gauge.Level;
                        Relaxed.Touch();
                        Logbook.Lines.Add("mid");
                        var seed = Relaxed.Seed + Strict.Seed + level;
                        Mark(c, string.Join("_", Logbook.Lines) + seed);
                    }
                }
                public sealed class FilterFirst : Base
                {
                    private readonly List<string> trail = new();
                    private bool Note(string step, bool verdict) { trail.Add(step); return verdict; }
                    private void Fail(string why) { try { throw new InvalidOperationException(why); } finally { trail.Add("inner-finally"); } }
                    protected override void Describe(Circuit c)
                    {
                        try { Fail("clock"); }
                        catch (InvalidOperationException e) when (Note("filter-" + e.Message, true)) { trail.Add("caught"); }
                        try
                        {
                            try { throw new ArgumentException("skew"); }
                            catch (ArgumentException) when (Note("declined", false)) { trail.Add("never"); }
                            finally { trail.Add("finally2"); }
                        }
                        catch (ArgumentException e) when (Note("outer", e.Message == "skew")) { trail.Add("outer-caught"); }
                        try
                        {
                            try { throw new InvalidOperationException("drive"); }
                            catch (InvalidOperationException) when (((string?)null)!.Length > 0) { trail.Add("never"); }
                        }
                        catch (Exception e) { trail.Add("kept-" + e.Message + (e is InvalidOperationException)); }
                        Mark(c, string.Join("_", trail));
                    }
                }
            }
            """));

    private static DiagnosticResult NotElaborated(int location, string what, string why) => InverterChainDesign.NotElaborated(location, what, why);

    private static void AssertNoStage(string source) => InverterChainDesign.AssertNoStage(source, "Boundary");

    private static string Source(string declarations, string members, string statements) => InverterChainDesign.Source("Boundary", declarations, members, statements);
}
