using System.Threading.Tasks;
using Phaseward.Analyzers.Tests.Verifiers;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// An array knows its element type at run time, as .NET has it (ECMA-335, 6th edition, §I.8.7.1, array covariance; C#
/// specification, §17.6, array covariance, and §12.21.2, simple assignment to an array element): a <c>string[]</c> held as
/// <c>object[]</c> refuses an int with ArrayTypeMismatchException, is a <c>string[]</c> to <c>is</c> and casts, and an
/// <c>int[]</c> is not an <c>object[]</c>. Each design is elaborated exactly as the compiled design runs it (the oracle:
/// the design compiled and run by .NET, <see cref="ParityTests"/>). Before, every array the design made was an array of
/// objects to the elaborator: the store went through and the type tests answered for object[], silently.
/// </summary>
public class ArrayTypeTests
{
    [Theory]
    [InlineData("Arrays.CovariantStoreThrows")]
    [InlineData("Arrays.CovariantStoreOfTheRightTypeIsKept")]
    [InlineData("Arrays.CovariantStoreOfNullIsKept")]
    [InlineData("Arrays.LibraryArrayStoreThrows")]
    [InlineData("Arrays.ParamsArrayIsOfItsElementType")]
    [InlineData("Arrays.TypeTestsSeeTheElementType")]
    [InlineData("Arrays.IntArrayIsNotAnObjectArray")]
    [InlineData("Arrays.CastBackToTheElementType")]
    [InlineData("Arrays.CastToAWrongArrayTypeThrows")]
    [InlineData("Arrays.CollectionExpressionArray")]
    [InlineData("Arrays.DesignClassArrays")]
    [InlineData("Arrays.InterfacesOfAnArray")]
    [InlineData("Arrays.SetValueChecksTheElementType")]
    [InlineData("Arrays.CopyOfFittingElements")]
    [InlineData("Arrays.ShortArrayThroughItsInterface")]
    [InlineData("Arrays.CloneKeepsTheElementType")]
    [InlineData("Arrays.EmptyArraysOfTwoTypes")]
    [InlineData("Arrays.GenericCodeMakesArraysOfItsTypeArgument")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async Task A_copy_that_would_throw_partway_is_PW9001()
    {
        // .NET copies element by element and throws InvalidCastException at the int: how much was copied is not modelled.
        var source = InverterChainDesign.Source("Quarry", "", "", """
            var from = new object[] { "a", 1 };
            var to = new string[2];
            {|#0:System.Array.Copy(from, to, 2)|};
            count = to[0].Length + 2;
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the call to 'Array.Copy(Array, Array, int)'",
                "an element of the source is not 'string': .NET throws partway through the copy, and where it stops is not modelled")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Quarry");
    }

    private static readonly InMemoryDesigns Designs = new(("/arrays/Arrays.cs", """
            using System;
            using System.Collections.Generic;
            using Phaseward;

            namespace Arrays
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public class Lane { public int Width = 1; }
                public sealed class WideLane : Lane { }
                public sealed class CovariantStoreThrows : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object[] slots = new string[2];
                        var n = 1;
                        try { slots[0] = 5; n = 2; } catch (ArrayTypeMismatchException) { n = 4; }
                        Chain(c, n, "cs");
                    }
                }
                public sealed class CovariantStoreOfTheRightTypeIsKept : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object[] slots = new string[2];
                        slots[1] = "ok";
                        Chain(c, ((string)slots[1]).Length, "ck");
                    }
                }
                public sealed class CovariantStoreOfNullIsKept : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object[] slots = new string[] { "a", "b" };
                        slots[0] = null!;
                        Chain(c, slots[0] is null ? 3 : 1, "cn");
                    }
                }
                public sealed class LibraryArrayStoreThrows : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object[] parts = "a,b,c".Split(',');
                        var n = parts.Length;
                        try { parts[1] = 7; } catch (ArrayTypeMismatchException) { n += 2; }
                        Chain(c, n, "ls");
                    }
                }
                public sealed class ParamsArrayIsOfItsElementType : Base
                {
                    private static int Fill(params string[] names) { object[] o = names; try { o[0] = 1; return 1; } catch (ArrayTypeMismatchException) { return 3; } }
                    protected override void Describe(Circuit c) => Chain(c, Fill("a", "b"), "pa");
                }
                public sealed class TypeTestsSeeTheElementType : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = new string[3];
                        var n = 1;
                        if (o is string[] s) n += s.Length;
                        if (o is object[]) n += 10;
                        if (o is int[]) n += 100;
                        if (o is IEnumerable<string>) n += 20;
                        if (o is IList<object>) n += 40;
                        if (o is IReadOnlyList<int>) n += 1000;
                        Chain(c, n, "tt");
                    }
                }
                public sealed class IntArrayIsNotAnObjectArray : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object o = new int[] { 4, 5 };
                        var n = 1;
                        if (o is object[]) n += 10;
                        if (o is int[] numbers) n += numbers[1];
                        if (o is Array) n += 2;
                        if (o is IList<int>) n += 20;
                        if (o is IEnumerable<object>) n += 100;
                        var asObjects = o as object[];
                        if (asObjects is null) n += 1;
                        Chain(c, n, "ia");
                    }
                }
                public sealed class CastBackToTheElementType : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object[] held = new Lane[] { new Lane { Width = 3 } };
                        var lanes = (Lane[])held;
                        Chain(c, lanes[0].Width, "cb");
                    }
                }
                public sealed class CastToAWrongArrayTypeThrows : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object[] held = new Lane[] { new Lane() };
                        var n = 1;
                        try { var wide = (WideLane[])held; n = 2 + wide.Length; } catch (InvalidCastException) { n = 5; }
                        Chain(c, n, "cw");
                    }
                }
                public sealed class CollectionExpressionArray : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        string[] names = ["x", "y"];
                        object[] o = names;
                        var n = 1;
                        try { o[0] = 2.5; } catch (ArrayTypeMismatchException) { n = 3; }
                        Chain(c, n, "ce");
                    }
                }
                public sealed class DesignClassArrays : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        Lane[] lanes = new WideLane[2];
                        var n = 1;
                        try { lanes[0] = new Lane(); n = 2; } catch (ArrayTypeMismatchException) { n = 4; }
                        lanes[1] = new WideLane { Width = 2 };
                        Chain(c, n + lanes[1].Width, "dc");
                    }
                }
                public sealed class InterfacesOfAnArray : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        IList<object> list = new string[] { "p", "q" };
                        var n = list.Count;
                        try { list[0] = 3; } catch (ArrayTypeMismatchException) { n += 5; }
                        Chain(c, n, "ie");
                    }
                }
                public sealed class SetValueChecksTheElementType : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        Array slots = new string[2];
                        var n = 1;
                        slots.SetValue("fits", 0);
                        try { slots.SetValue(3, 1); n = 2; } catch (InvalidCastException) { n = 4; }
                        Chain(c, n + ((string)slots.GetValue(0)!).Length, "sv");
                    }
                }
                public sealed class CopyOfFittingElements : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var source = new object[] { "ab", "cde" };
                        var target = new string[3];
                        Array.Copy(source, target, 2);
                        source.CopyTo(target, 1);
                        Chain(c, target[0].Length + target[2].Length, "cf");
                    }
                }
                public sealed class CloneKeepsTheElementType : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var names = new[] { "m", "n" };
                        var copy = names.Clone();
                        var n = copy is string[] strings ? strings.Length : 0;
                        try { ((object[])copy)[0] = 1; } catch (ArrayTypeMismatchException) { n += 3; }
                        Chain(c, n, "cl");
                    }
                }
                public sealed class EmptyArraysOfTwoTypes : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        object words = Array.Empty<string>();
                        object lanes = Array.Empty<Lane>();
                        var n = 1 + (words is string[] ? 2 : 0) + (lanes is string[] ? 10 : 0) + (lanes is Lane[] ? 4 : 0);
                        Chain(c, n, "ea");
                    }
                }
                public sealed class GenericCodeMakesArraysOfItsTypeArgument : Base
                {
                    private static T[] Pair<T>(T first, T second) => new[] { first, second };
                    private static int Probe<T>(T[] items, object intruder) { object[] seen = (object[])(object)items; try { seen[0] = intruder; return 1; } catch (ArrayTypeMismatchException) { return 5; } }
                    protected override void Describe(Circuit c)
                    {
                        var n = Probe(Pair("a", "b"), 2) + Probe(Pair<object>("a", "b"), 2);
                        Chain(c, n, "gc");
                    }
                }
                public sealed class ShortArrayThroughItsInterface : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        System.Collections.Generic.IList<short> widths = new short[] { 1, 2 };
                        widths[0] = 4;
                        Chain(c, widths[0] + widths[1], "sa");
                    }
                }
            }
            """));
}
