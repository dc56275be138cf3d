namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// A library member that wraps what the design's callback threw: List.Sort and Array.Sort throw
/// InvalidOperationException ("Failed to compare two elements in the array.") whose InnerException is the comparer's
/// exception (.NET's documented behaviour of Sort; C# specification §21.4, the exception caught is the one thrown).
/// Each design is elaborated exactly as the compiled design runs it (the oracle: the design compiled and run by .NET,
/// <see cref="ParityTests"/>). Before, the design saw the elaborator's own carrier as the InnerException, silently.
/// </summary>
public class LibraryWrappedExceptionTests
{
    [Theory]
    [InlineData("Wrapped.SortComparerThrows")]
    [InlineData("Wrapped.ArraySortComparerThrowsWithAMessage")]
    [InlineData("Wrapped.OrderByKeyThrowsUnwrapped")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/wrapped/Wrapped.cs", """
            using System;
            using System.Collections.Generic;
            using System.Linq;
            using Phaseward;

            namespace Wrapped
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class SortComparerThrows : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = 1; var taps = new List<int> { 3, 1, 2 };
                        try { taps.Sort((a, b) => throw new ArgumentException("tap")); }
                        catch (InvalidOperationException e) when (e.InnerException is ArgumentException) { n = 3; }
                        catch (InvalidOperationException) { n = 5; }
                        Chain(c, n, "sc");
                    }
                }
                public sealed class ArraySortComparerThrowsWithAMessage : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = 1; var lanes = new[] { "bb", "a", "ccc" };
                        try { Array.Sort(lanes, (a, b) => a.Length == 1 ? throw new FormatException("lane width") : a.Length - b.Length); }
                        catch (InvalidOperationException e) { n = e.InnerException!.Message.Length + (e.InnerException is FormatException ? 4 : 0); }
                        Chain(c, n, "as");
                    }
                }
                public sealed class OrderByKeyThrowsUnwrapped : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = 0; var taps = new List<int> { 3, 1, 2 };
                        try { n = taps.OrderBy<int, int>(x => throw new ArgumentException("k")).First(); }
                        catch (InvalidOperationException) { n = 30; }
                        catch (ArgumentException) { n = 4; }
                        Chain(c, n, "ob");
                    }
                }
            }
            """));
}
