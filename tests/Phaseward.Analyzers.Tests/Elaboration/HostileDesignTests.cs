using System;
using System.Linq;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Designs written to trip the elaborator up (undecidable switch cases, ...). Each either elaborates to the run-time
/// netlist or is PW9001 at the construct, and what depends on it is skipped: never a guessed branch, a wrong count or a
/// misnamed device. Every design counts its stages from the construct under test and makes one inverter per stage.
/// </summary>
public class HostileDesignTests
{
    private const string Outside = "it is outside what compile-time elaboration reads (only the Phaseward DSL, members of this compilation and pure library members)";

    [Fact]
    public async Task ASwitchCaseWhoseGuardIsUnknownRunsNoSection()
    {
        // Once the guard cannot be evaluated, which section runs is not known: the default section must not be taken.
        var source = Design("""
            switch (count)
            {
                case 3 when {|#0:System.Environment.ProcessorCount|} > 0:
                    count = 5;
                    break;
                default:
                    count = 2;
                    break;
            }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "property 'Environment.ProcessorCount'", Outside)).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public async Task ASwitchCaseWhosePatternCannotBeDecidedRunsNoSection()
    {
        var source = Design("""
            object pair = (1, 2);
            switch (pair)
            {
                case {|#0:System.IComparable<int>|}:
                    count = 5;
                    break;
                default:
                    count = 2;
                    break;
            }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "this pattern", "whether the value matches it cannot be decided at compile time")).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public void ARefLocalIsAnotherNameForItsVariable()
    {
        // 'ref' locals alias what they refer to (a write through either is seen by both), and 'r = ref other' rebinds.
        var designs = new InMemoryDesigns(("/hostile/D.cs", Design("""
            var first = 0;
            ref var alias = ref first;
            alias += 2;
            var second = 10;
            alias = ref second;
            alias -= 9;
            ref var field = ref extra;
            field++;
            count = first + second + extra - 1;
            """, members: "private int extra;")));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(3, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public async Task ARefToAnArrayElementIsPW9001AndTheArrayIsNotReadAsBefore()
    {
        var source = Design("""
            var slots = new int[3];
            ref var slot = ref {|#0:slots[1]|};
            slot = 3;
            count = slots[1];
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "the ref local 'slot'",
            "only a ref to a local, parameter or field of the design is elaborated (not to an array element or a ref return)")).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public async Task AMethodOfTheDesignGivenAnUnknownArgumentStillDoesWhatDoesNotDependOnIt()
    {
        // Add counts every call whatever it is given: the count is 3 at run time, and the call is not skipped.
        var source = Design("""
            var tally = new Tally();
            tally.Add({|#0:System.Environment.ProcessorCount|});
            tally.Add(1);
            count = tally.Calls + 1;
            """, declarations: "public sealed class Tally { public int Calls; public int Sum; public void Add(int k) { Calls++; Sum += k; } }");
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "property 'Environment.ProcessorCount'", Outside)).RunAsync();
        var result = new InMemoryDesigns(("/hostile/D.cs", Plain(source))).CompileTime("Hostile.D");
        Assert.Equal(new[] { "s0", "s1", "s2" }, result.Netlist!.Devices.Select(d => d.Name));
    }

    [Fact]
    public async Task ALibraryCallThatCannotBeMadeLeavesItsCollectionUnknown()
    {
        // Before: the Add was skipped and the list read as if it had never been called (one stage made).
        var source = Design("""
            var names = new System.Collections.Generic.List<string> { "a" };
            names.Add({|#0:System.Environment.MachineName|});
            count = names.Count;
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "property 'Environment.MachineName'", Outside)).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public async Task ASortWhoseComparerIsUnknownIsNotAnExceptionOfTheDesign()
    {
        // Array.Sort wraps what the comparer threw; that is the unknown value, not an exception the design throws (PW9003),
        // and the half-sorted array is not read.
        var source = Design("""
            var widths = new[] { 3, 1, 2 };
            System.Array.Sort(widths, (a, b) => a < {|#0:System.Environment.ProcessorCount|} ? a - b : b - a);
            count = widths[0];
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "property 'Environment.ProcessorCount'", Outside)).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public void CastsAndAsTestTheValuesType()
    {
        // 'as' gives null for a value of another type, a failing cast throws InvalidCastException (caught here); before,
        // both gave the value unchanged (a Buf read as an Inv, a string as an int).
        var designs = new InMemoryDesigns(("/hostile/D.cs", Design("""
            var cells = new System.Collections.Generic.List<Cell> { new Inv(), new Buf() };
            count = 0;
            foreach (var cell in cells)
                count += (cell as Inv)?.N ?? 1;
            object text = "s";
            try { count += (int)text; }
            catch (System.InvalidCastException) { count -= 1; }
            object boxed = new Pt { X = 1 };
            count += ((Pt)boxed).X + ((text as string) is null ? 10 : 0);
            """, declarations: "public abstract class Cell { } public sealed class Inv : Cell { public int N = 2; } public sealed class Buf : Cell { } public struct Pt { public int X; }")));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(3, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public void AStructMethodCalledOnAValueRunsOnACopy()
    {
        // C# runs a struct method on a copy when its receiver is not a variable: a readonly field (outside the constructor),
        // a property, an 'in' parameter. Before, the interpreter changed the stored struct (4 and more stages).
        var designs = new InMemoryDesigns(("/hostile/D.cs", Design("""
            ro.Inc();
            rw.Inc();
            Auto.Inc();
            var holder = new Holder();
            holder.Prop.Inc();
            holder.Ro.Inc();
            var local = new Counter();
            Bump(local);
            count = ro.N + rw.N + Auto.N + holder.Prop.N + holder.Ro.N + local.N + 1;
            """,
            members: "private readonly Counter ro; private Counter rw; private Counter Auto { get; set; } private static void Bump(in Counter c) => c.Inc();",
            declarations: """
                public struct Counter { public int N; public void Inc() => N++; }
                public sealed class Holder { public Counter Prop { get; set; } public readonly Counter Ro; public Holder() { Ro.Inc(); } }
                """)));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(3, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Theory]
    [InlineData("Generic.Defaults")]
    [InlineData("Generic.PerTypeStatics")]
    [InlineData("Generic.MadeInGenericCode")]
    [InlineData("Generic.NestedStatics")]
    public void GenericCodeRunsWithItsTypeArguments(string design)
    {
        // default(T), 'is T' and 'as T' with what T stands for in the call (before: default(T) was null for T = int);
        // a generic type's statics per constructed type (before: Slot<int> and Slot<string> shared one Count), and a
        // type nested in a generic type's too, with its initializers seeing the outer type argument (before:
        // Outer<int>.Inner and Outer<long>.Inner shared one N, silently, and default(T) there was PW9001), and a type
        // argument made from one (Slot<List<T>>: before, one Slot for every T).
        var designs = new InMemoryDesigns(("/hostile/Generic.cs", """
            using System.Collections.Generic;
            using Phaseward;

            namespace Generic
            {
                public static class G
                {
                    public static T Dflt<T>() => default!;
                    public static T Twice<T>() => Dflt<T>();
                    public static bool Is<T>(object o) => o is T;
                    public static string Show<T>(T v) => "v" + v;
                    public static bool TryFirst<T>(IEnumerable<T> items, out T value) { foreach (var i in items) { value = i; return true; } value = default!; return false; }
                }

                public sealed class Box<T> { public T Value = default!; public T Get() => Value; public T Fresh() => default!; }
                public static class Make { public static Box<T> New<T>() => new Box<T>(); public static T Of<T>() => New<T>().Get(); }
                public static class Slot<T> { public static int Count; public static T Last = default!; static Slot() { Count = 10; } public static void Put(T v) { Last = v; Count++; } }

                public sealed class Defaults : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var b = new Box<int>();
                        var found = G.TryFirst(new int[0], out var first) ? 1 : 0;
                        c.Inverter(c.Input("a"), $"d{G.Dflt<int>()}_{b.Get()}_{b.Fresh()}_{G.Show(b.Value)}_{G.Twice<double>()}_{first}{found}_{G.Is<string>(3)}{G.Is<int>(3)}");
                        var x = c.Input("b");
                        for (var i = 0; i < b.Value + 2; i++)
                            x = c.Inverter(x, "g" + i);
                    }
                }

                public sealed class PerTypeStatics : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        Slot<int>.Put(4);
                        Slot<int>.Put(5);
                        Slot<string>.Put("s");
                        var n = Slot<int>.Count + Slot<string>.Count * 100 + Slot<long>.Count * 10000;
                        c.Inverter(c.Input("a"), "n" + n + Slot<int>.Last + Slot<string>.Last + Slot<double>.Last);
                    }
                }

                public static class Outer<T>
                {
                    public static class Inner { public static int N; public static readonly int Made = default(T) is null ? 3 : 5; }
                    public sealed class Tally<U> { public static int Count; public static void Add() => Count += Outer<U>.Inner.Made; }
                    public static void Bump() => Inner.N += 7;
                }

                public sealed class NestedStatics : Design
                {
                    private static int Through<T>() { Outer<T>.Inner.N++; return Outer<T>.Inner.N; }
                    private static int Deep<T>() { Slot<List<T>>.Put(new List<T>()); return Slot<List<T>>.Count; }

                    protected override void Describe(Circuit c)
                    {
                        Outer<int>.Inner.N = 2;
                        Outer<long>.Inner.N = 3;
                        Outer<int>.Bump();
                        Outer<int>.Tally<string>.Add();
                        Outer<int>.Tally<string>.Add();
                        Outer<long>.Tally<int>.Add();
                        var n = $"{Outer<int>.Inner.N}_{Outer<long>.Inner.N}_{Outer<string>.Inner.N}_{Through<int>()}_{Through<string>()}_"
                            + $"{Outer<int>.Inner.Made}{Outer<string>.Inner.Made}_{Outer<int>.Tally<string>.Count}_{Outer<long>.Tally<int>.Count}_{Outer<int>.Tally<int>.Count}"
                            + $"_{Deep<int>()}_{Deep<string>()}_{Deep<int>()}";
                        c.Inverter(c.Input("a"), "n" + n);
                    }
                }

                public sealed class MadeInGenericCode : Design
                {
                    protected override void Describe(Circuit c)
                        => c.Inverter(c.Input("a"), "n" + Make.Of<int>() + Make.New<double>().Value + (Make.Of<string>() is null));
                }
            }
            """));
        ParityTests.AssertParity(designs, design);
    }

    [Fact]
    public void PatternsCompareWholeNumbersExactly()
    {
        // A long above 2^53 and a ulong above long.MaxValue in patterns: before, the first was rounded through double (a
        // wrong arm) and the second made the elaborator fail (OverflowException).
        var designs = new InMemoryDesigns(("/hostile/D.cs", Design("""
            long wide = 9007199254740993L;
            ulong top = ulong.MaxValue;
            count = (wide is > 9007199254740992L ? 1 : 0) + (top is 18446744073709551615UL ? 1 : 0)
                + top switch { 0 => 10, 18446744073709551615UL => 1, _ => 20 } + (double.NaN is 0.0 ? 5 : 0);
            """)));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(3, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public Task AnArrayWithALongLengthIsChargedToTheMemoryBudget()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(Design("""
                long lanes = 5_000_000_000L;
                var nets = {|#0:new Net[lanes]|};
                count = nets.Length;
                """),
                new DiagnosticResult(RuleCatalog.ElaborationBudgetExceeded.Id, DiagnosticSeverity.Warning).WithLocation(0).WithArguments("D",
                    "the memory budget of 268435456 bytes (arrays, strings and collections the design's code makes; phaseward.elaboration_memory_budget) would be exceeded by 40000000000 more"))
            .RunAsync();

    [Theory]
    [InlineData("Iterators.EndlessWithBreak")]
    [InlineData("Iterators.MakingDevices")]
    [InlineData("Iterators.ThrowingConsumer")]
    [InlineData("Iterators.Nested")]
    public void AForeachOverAnIteratorRunsItOnlyAsFarAsTheLoopTakesIt(string design)
    {
        // Before, an iterator was run to completion when called: an endless one stopped at the step budget (PW9002), one
        // that makes devices made all of them, before the loop's own, and its finally ran before the loop body.
        var designs = new InMemoryDesigns(("/hostile/Iterators.cs", """
            using System;
            using System.Collections.Generic;
            using System.Linq;
            using Phaseward;

            namespace Iterators
            {
                public sealed class EndlessWithBreak : Design
                {
                    private int made;

                    private IEnumerable<int> Numbers()
                    {
                        for (var i = 0; ; i++)
                        {
                            made++;
                            yield return i;
                        }
                    }

                    protected override void Describe(Circuit c)
                    {
                        var x = c.Input("a");
                        foreach (var i in Numbers())
                        {
                            if (i >= 3) break;
                            x = c.Inverter(x, "it" + i);
                        }

                        c.Inverter(x, "made" + made);
                    }
                }

                public sealed class MakingDevices : Design
                {
                    private static IEnumerable<Net> Stages(Circuit c, Net x, string prefix)
                    {
                        try
                        {
                            for (var i = 0; i < 10; i++)
                            {
                                x = c.Inverter(x, prefix + i);
                                yield return x;
                            }
                        }
                        finally
                        {
                            c.Buffer(x, prefix + "end");
                        }
                    }

                    private static int Find(Circuit c)
                    {
                        foreach (var n in Stages(c, c.Input("b"), "u"))
                            if (n.Name == "u1") return 2;
                        return 0;
                    }

                    protected override void Describe(Circuit c)
                    {
                        var taken = 0;
                        foreach (var n in Stages(c, c.Input("a"), "st"))
                        {
                            c.Inverter(n, "after" + taken);
                            if (++taken == 2) break;
                        }

                        c.Inverter(c.Input("z"), "found" + Find(c));
                    }
                }

                public sealed class ThrowingConsumer : Design
                {
                    private static readonly List<string> Log = new();

                    private static IEnumerable<int> Three()
                    {
                        try
                        {
                            yield return 1;
                            yield return 2;
                            yield return 3;
                        }
                        finally
                        {
                            Log.Add("done");
                        }
                    }

                    protected override void Describe(Circuit c)
                    {
                        try
                        {
                            foreach (var i in Three())
                            {
                                if (i == 2) throw new InvalidOperationException("stop");
                                Log.Add("i" + i);
                            }
                        }
                        catch (InvalidOperationException)
                        {
                            Log.Add("caught");
                        }

                        c.Inverter(c.Input("a"), string.Join("_", Log));
                    }
                }

                public sealed class Nested : Design
                {
                    private static IEnumerable<int> Upto(int n)
                    {
                        for (var i = 0; i < n; i++)
                            yield return i;
                    }

                    private static IEnumerable<int> Pairs()
                    {
                        foreach (var a in Upto(3))
                            foreach (var b in Upto(a))
                                yield return a * 10 + b;
                    }

                    protected override void Describe(Circuit c)
                    {
                        var names = new List<string>();
                        foreach (var p in Pairs())
                        {
                            if (p > 20) break;
                            names.Add("p" + p);
                        }

                        c.Inverter(c.Input("a"), string.Join("_", names) + Upto(4).Sum());
                    }
                }
            }
            """));
        ParityTests.AssertParity(designs, design);
    }

    [Theory]
    [InlineData("var first = {|#0:Numbers()|}.First(); count = first + 3;")]
    [InlineData("var numbers = {|#0:Numbers()|}; var before = made; count = before + numbers.Count() - 2;")]
    public async Task AnIteratorWithEffectsRunToCompletionWhenCalledIsPW9001(string statements)
    {
        // Not enumerated straight by a foreach, the iterator runs to completion when called: its effects (here 'made++')
        // would come earlier than in C# (First takes one value; a sequence stored first has not run yet).
        var source = Design(statements, members: """
            private int made;
            private System.Collections.Generic.IEnumerable<int> Numbers() { for (var i = 0; i < 5; i++) { made++; yield return i; } }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>("using System.Linq;\n" + source, NotElaborated(0, "the iterator 'D.Numbers()'",
            "it changes state outside itself as it runs (a field, a captured variable, a collection it did not make, devices), and an iterator not enumerated "
            + "straight by a foreach is run to completion when called, so those changes would come earlier than in C#")).RunAsync();
        AssertNoStage("using System.Linq;\n" + source);
    }

    [Fact]
    public void AnIteratorWithoutEffectsIsRunToCompletionSilently()
    {
        // An iterator that only fills what it makes itself (a local list, new objects) and reads fields is not reported.
        var designs = new InMemoryDesigns(("/hostile/D.cs", "using System.Linq;\n" + Design("count = Stages().Sum(s => s.N) - 12;", members: """
            private readonly int[] widths = { 1, 2 };
            private System.Collections.Generic.IEnumerable<Stage> Stages()
            {
                var seen = new System.Collections.Generic.List<int>();
                foreach (var w in widths)
                {
                    seen.Add(w);
                    var stage = new Stage { N = w };
                    stage.N += seen.Count;
                    yield return stage;
                }

                yield return new Stage { N = seen.Sum() * 3 };
            }
            """, declarations: "public sealed class Stage { public int N; }")));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(3, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Theory]
    [InlineData("var parts = new object[] { \"a\", {|#0:System.Environment.MachineName|} }; name = string.Join(\"_\", parts);", "property 'Environment.MachineName'")]
    [InlineData("var tag = new Tag({|#0:System.Environment.MachineName|}, 2); name = \"t\" + tag;", "property 'Environment.MachineName'")]
    [InlineData("var set = new System.Collections.Generic.HashSet<object> { 1, {|#0:System.Environment.ProcessorCount|} }; name = \"s\" + set.Count;",
        "property 'Environment.ProcessorCount'")]
    public async Task AnUnknownInsideACollectionOrRecordIsNeverPrintedOrCompared(string statements, string what)
    {
        // Before, library code printed it as "(unknown)": a net named "a_(unknown)" or "tTag { Name = (unknown), N = 2 }".
        var source = Design("var name = \"\";\n" + statements + "\nc.Inverter(c.Input(\"n\"), \"s\" + name);", declarations: "public sealed record Tag(string Name, int N);");
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, what, Outside)).RunAsync();
        var result = new InMemoryDesigns(("/hostile/D.cs", Plain(source))).CompileTime("Hostile.D");
        Assert.DoesNotContain(result.Netlist!.Nets, n => n.Name.Contains("unknown", StringComparison.Ordinal) || n.Name.StartsWith("ss", StringComparison.Ordinal));
    }

    [Fact]
    public void AnEventsHandlersRunWhenItIsRaised()
    {
        // Before: events were PW9001 and 'count' unknown. Now the handler runs when raised: count is 3 + 1.
        var designs = new InMemoryDesigns(("/hostile/D.cs", Plain(Design("""
            Changed += k => count += k;
            Changed?.Invoke(1);
            """, members: "private event System.Action<int>? Changed;"))));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(4, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public async Task WhatCannotBeToldOfAnEventOrADelegateIsPW9001()
    {
        // A static event is not elaborated, and what its handler would assign stays unknown; removing a delegate made
        // again from the same lambda depends on whether the two share their captured variables' object (C# compares the
        // target), which is not modelled.
        var source = Design("""
            {|#0:Ticked += k => count += k|};
            System.Action<int> Make() => k => count -= k;
            System.Action<int> handlers = Make();
            handlers = {|#1:handlers - Make()|};
            handlers(1);
            """, members: "private static event System.Action<int>? Ticked;");
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "event 'D.Ticked'", "only instance events declared as fields (without add and remove accessors) of the design's types are elaborated"),
            NotElaborated(1, "removing this delegate", "whether it equals one already added cannot be told: C# compares a lambda's target object, which the elaborator does not model")).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public void CallbacksStoredAndCalledLaterSeeTheVariablesOfTheirIteration()
    {
        // Lambdas kept in a List<Func<...>> and a dictionary, called after the loop that made them: each sees its own
        // iteration's 'k' (a foreach variable too), all see the one shared 'for' variable and 'count'. Before, the list
        // could not hold them (PW9001), and lambdas kept in an array all saw the last iteration's 'k'.
        var designs = new InMemoryDesigns(("/hostile/D.cs", "using System.Linq;\n" + Design("""
            var stages = new System.Collections.Generic.List<System.Func<Net, Net>>();
            var labels = new System.Func<string>[2];
            var actions = new System.Collections.Generic.Dictionary<string, System.Action>();
            for (var i = 0; i < 2; i++)
            {
                var k = i;
                stages.Add(n => c.Inverter(n, "cb" + k));
                labels[i] = () => "l" + k + i;
            }

            foreach (var name in new[] { "p", "q" })
                actions[name] = () => count += name == "p" ? 1 : 10;
            actions["q"]();
            var y = c.Input("y");
            foreach (var stage in stages)
                y = stage(y);
            c.Inverter(y, string.Concat(labels.Select(l => l())));
            count -= 10;
            """)));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(6, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public async Task LibraryCodeComparingTwoDelegatesIsPW9001()
    {
        // C# compares delegates by target and method (lambdas made in one scope can be equal); that is not modelled.
        var source = "using System.Linq;\n" + Design("""
            var made = new System.Collections.Generic.List<System.Func<int>>();
            for (var i = 0; i < 3; i++)
                made.Add(() => i);
            count = {|#0:made.Distinct().Count()|};
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, NotElaborated(0, "the equality of delegates made by the design",
            "C# compares a delegate's target and method, which the elaborator does not model")).RunAsync();
    }

    private const string NullTypes = """
        public sealed class Cell { public string? Label; public Cell? Next; public int[]? Taps; public int Width => 4; public int Self() => 5; }
        public interface ISized { int Size(); }
        public sealed class Sized : ISized { public int Size() => 5; }
        public static class Through { public static int SizeOf<T>(T item) where T : ISized => item.Size(); }
        public static class Fragile { public static readonly int Stages; static Fragile() { Stages = 2; throw new System.InvalidOperationException("no plan"); } }
        """;

    [Theory]
    [InlineData("count = first.Next!.Self();")]
    [InlineData("count = first.Next!.Width;")]
    [InlineData("count = first.Next!.Label!.Length;")]
    [InlineData("count = first.Taps![0];")]
    [InlineData("count = first.Label!.Length;")]
    [InlineData("count = first.Next!.Next!.Self();")]
    [InlineData("count = Through.SizeOf<Sized>(null!);")]
    [InlineData("System.Func<int>? make = null; count = make!();")]
    public void AMemberReachedThroughNullThrowsWhatTheDesignCatches(string access)
    {
        // C# throws a NullReferenceException there. Before: the call ran on the design object itself (count 5, a wrong
        // chain, silently), and a field read through null was PW9001 as if the object were not the design's.
        var designs = new InMemoryDesigns(("/hostile/D.cs", Plain(Design($$"""
            var first = new Cell();
            try { {{access}} } catch (System.NullReferenceException) { count = 6; }
            """, declarations: NullTypes))));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(6, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public async Task AMemberReachedThroughNullOutsideATryIsPW9003NamingIt()
    {
        var source = Design("""
            var first = new Cell();
            count = {|#0:first.Next!.Self()|};
            """, declarations: NullTypes);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, new DiagnosticResult(RuleCatalog.DesignThrows.Id, DiagnosticSeverity.Error)
            .WithLocation(0).WithArguments("D", "'first.Next' is null, so the call to 'Cell.Self()' cannot be reached through it")).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public void AStaticConstructorThatThrowsIsATypeInitializationExceptionAtEveryUse()
    {
        // C# wraps the exception in a TypeInitializationException and throws it again at every later use; the statics
        // are never read. Before: PW9003 although the design catches it.
        var designs = new InMemoryDesigns(("/hostile/D.cs", Plain(Design("""
            try { count = Fragile.Stages; } catch (System.TypeInitializationException) { count = 4; }
            try { count += Fragile.Stages; } catch (System.TypeInitializationException e) when (e.InnerException is System.InvalidOperationException) { count += 3; }
            """, declarations: NullTypes))));
        ParityTests.AssertParity(designs, "Hostile.D");
        Assert.Equal(7, designs.CompileTime("Hostile.D").Netlist!.Devices.Count);
    }

    [Fact]
    public async Task ATypeWhoseInitializationFailedIsPW9003WhenUsedAgainOutsideATry()
    {
        var source = Design("""
            try { count = Fragile.Stages; } catch (System.TypeInitializationException) { count = 4; }
            count = {|#0:Fragile.Stages|};
            """, declarations: NullTypes);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, new DiagnosticResult(RuleCatalog.DesignThrows.Id, DiagnosticSeverity.Error)
            .WithLocation(0).WithArguments("D", "The type initializer for 'Hostile.Fragile' threw an exception.")).RunAsync();
        AssertNoStage(source);
    }

    [Fact]
    public async Task ReflectionBeyondATypesNameIsPW9001()
    {
        // typeof and GetType() answer a type's Name, Namespace, FullName (not generic), text and equality; the rest is
        // reflection, and a generic type's FullName names assemblies the source does not say.
        var source = Design("""
            var name = typeof(Cell).Name;
            count = {|#0:typeof(Cell).GetMethods()|}.Length;
            var full = {|#1:typeof(System.Collections.Generic.List<int>).FullName|};
            """, declarations: NullTypes);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            NotElaborated(0, "the call to 'Type.GetMethods()'", "of a type only its name, text and equality are read: the rest is reflection"),
            NotElaborated(1, "property 'Type.FullName'", "of a type only its Name, Namespace and FullName (when it is not generic) are read: the rest is reflection")).RunAsync();
        AssertNoStage(source);
    }

    private static DiagnosticResult NotElaborated(int location, string what, string why) => InverterChainDesign.NotElaborated(location, what, why);

    private static void AssertNoStage(string source) => InverterChainDesign.AssertNoStage(source, "Hostile");

    private static string Design(string statements, string members = "", string declarations = "") => InverterChainDesign.Source("Hostile", declarations, members, statements);

    private static string Plain(string marked) => InverterChainDesign.WithoutMarkup(marked);
}
