namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// A sequence of the design's own type (a class that implements IEnumerable&lt;T&gt;, by an iterator or by handing out
/// a collection's enumerator) handed to the library: LINQ, string.Join, a list's constructor, Zip. Each design is
/// elaborated exactly as the compiled design runs it (the oracle: the design compiled and run by .NET,
/// <see cref="ParityTests"/>). Before, only a foreach enumerated such a sequence; every library call given one was PW9001.
/// </summary>
public class DesignSequenceTests
{
    [Theory]
    [InlineData("Sequences.SelectOverAnIteratorBus")]
    [InlineData("Sequences.CountAndWhereOverAWrappedList")]
    [InlineData("Sequences.JoinNamesOfABus")]
    [InlineData("Sequences.ListFromADesignSequence")]
    [InlineData("Sequences.ZipTwoDesignSequences")]
    [InlineData("Sequences.GenericDesignSequence")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public void An_iterator_with_side_effects_given_to_the_library_is_reported_not_run_early()
    {
        // Run to completion when called, its Enumerations++ would come before .NET runs it (at the library's first
        // MoveNext): PW9001 at the iterator, as for any such iterator not enumerated straight by a foreach.
        var result = Designs.CompileTime("Sequences.SideEffectInGetEnumeratorRunsOncePerEnumeration");
        Assert.Contains(result.Issues, i => i.RuleId == Phaseward.Checking.RuleCatalog.NotElaborated.Id && i.Arguments[0] == "the iterator 'Counted.GetEnumerator()'");
        Assert.DoesNotContain(result.Netlist!.Devices, d => d.Name.StartsWith("se", System.StringComparison.Ordinal) && d.Kind == Phaseward.Netlists.DeviceKind.Inverter);
    }

    private static readonly InMemoryDesigns Designs = new(("/sequences/Sequences.cs", """
            using System;
            using System.Collections;
            using System.Collections.Generic;
            using System.Linq;
            using Phaseward;

            namespace Sequences
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class Bus : IEnumerable<Net>
                {
                    private readonly Net[] lines;
                    public Bus(Circuit c, string name, int width) { lines = new Net[width]; for (var i = 0; i < width; i++) lines[i] = c.Input(name + i); }
                    public IEnumerator<Net> GetEnumerator() { foreach (var line in lines) yield return line; }
                    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
                }
                public sealed class Widths : IEnumerable<int>
                {
                    private readonly List<int> values = new() { 2, 5, 1, 4 };
                    public IEnumerator<int> GetEnumerator() => values.GetEnumerator();
                    IEnumerator IEnumerable.GetEnumerator() => values.GetEnumerator();
                }
                public sealed class Ring<T> : IEnumerable<T>
                {
                    private readonly List<T> items = new();
                    public void Add(T item) => items.Add(item);
                    public IEnumerator<T> GetEnumerator() { for (var i = items.Count - 1; i >= 0; i--) yield return items[i]; }
                    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
                }
                public sealed class Counted : IEnumerable<int>
                {
                    public static int Enumerations;
                    public IEnumerator<int> GetEnumerator() { Enumerations++; yield return 1; yield return 2; }
                    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
                }
                public sealed class SelectOverAnIteratorBus : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var bus = new Bus(c, "d", 3);
                        var inverted = bus.Select((line, i) => c.Inverter(line, "inv" + i)).ToList();
                        for (var i = 0; i < inverted.Count; i++) c.Output("q" + i, inverted[i]);
                    }
                }
                public sealed class CountAndWhereOverAWrappedList : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var widths = new Widths();
                        Chain(c, widths.Count() + widths.Where(w => w > 1).Sum() + widths.Max(), "cw");
                    }
                }
                public sealed class JoinNamesOfABus : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var bus = new Bus(c, "j", 2);
                        var names = string.Join("_", bus.Select(n => n.Name));
                        Chain(c, names.Length, "jn");
                    }
                }
                public sealed class ListFromADesignSequence : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var list = new List<int>(new Widths());
                        list.Sort();
                        Chain(c, list[0] + list[3], "lf");
                    }
                }
                public sealed class ZipTwoDesignSequences : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var bus = new Bus(c, "z", 4);
                        var pairs = bus.Zip(new Widths(), (line, w) => (line, w)).OrderBy(p => p.w).ToArray();
                        foreach (var (line, w) in pairs) c.Output("o" + w, c.Inverter(line, "zi" + w));
                    }
                }
                public sealed class GenericDesignSequence : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var ring = new Ring<string> { "a", "bb", "ccc" };
                        Chain(c, ring.First().Length + ring.Aggregate(0, (n, s) => n * 2 + s.Length), "gs");
                    }
                }
                public sealed class SideEffectInGetEnumeratorRunsOncePerEnumeration : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var counted = new Counted();
                        var total = counted.Sum() + counted.Count();
                        foreach (var n in counted) total += n;
                        Chain(c, total + Counted.Enumerations, "se");
                    }
                }
            }
            """));
}
