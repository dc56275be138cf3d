namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// A call of the design's iterator runs nothing until the sequence is enumerated, and each enumeration runs it from the
/// start with the call's arguments, reading the state of that moment (C# specification, §15.15, iterators; §15.15.5,
/// enumerable objects: each GetEnumerator starts from the arguments as they were passed). Each design is elaborated
/// exactly as the compiled design runs it (the oracle: the design compiled and run by .NET, <see cref="ParityTests"/>).
/// Before, an iterator not consumed straight by a foreach ran to completion at the call, silently reading the state of
/// the call.
/// </summary>
public class DeferredIteratorTests
{
    [Theory]
    [InlineData("Deferred.ReadsStateAtEnumeration")]
    [InlineData("Deferred.EachEnumerationStartsFromTheArguments")]
    [InlineData("Deferred.ForeachOverAStoredIteratorInterleaves")]
    [InlineData("Deferred.LocalFunctionIteratorSeesItsCapturedLocal")]
    [InlineData("Deferred.IteratorPassedToAMethod")]
    [InlineData("Deferred.SpreadOfSequences")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/deferred/Deferred.cs", """
            using System.Collections.Generic;
            using System.Linq;
            using Phaseward;

            namespace Deferred
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class ReadsStateAtEnumeration : Base
                {
                    private int width = 2;
                    private IEnumerable<int> Bits() { for (var i = 0; i < width; i++) yield return i; }
                    protected override void Describe(Circuit c)
                    {
                        var bits = Bits();
                        width = 5;
                        Chain(c, bits.Count(), "rs");
                    }
                }
                public sealed class EachEnumerationStartsFromTheArguments : Base
                {
                    private static IEnumerable<int> Down(int n) { while (n > 0) yield return n--; }
                    protected override void Describe(Circuit c)
                    {
                        var down = Down(3);
                        Chain(c, down.Sum() + down.Count(), "ee");
                    }
                }
                public sealed class ForeachOverAStoredIteratorInterleaves : Base
                {
                    private int width = 5;
                    private IEnumerable<int> Bits() { for (var i = 0; i < width; i++) yield return i; }
                    protected override void Describe(Circuit c)
                    {
                        var bits = Bits();
                        var k = 0;
                        foreach (var b in bits) { width = 3; k++; }
                        Chain(c, k, "fo");
                    }
                }
                public sealed class LocalFunctionIteratorSeesItsCapturedLocal : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var lanes = 1;
                        IEnumerable<string> Names() { for (var i = 0; i < lanes; i++) yield return "lane" + i; }
                        var names = Names();
                        lanes = 4;
                        Chain(c, names.Count() + names.Last().Length, "lf");
                    }
                }
                public sealed class IteratorPassedToAMethod : Base
                {
                    private int taps = 1;
                    private IEnumerable<int> Taps() { for (var i = 0; i < taps; i++) yield return i + 1; }
                    private static int Total(IEnumerable<int> values) { var sum = 0; foreach (var v in values) sum += v; return sum; }
                    protected override void Describe(Circuit c)
                    {
                        var taps = Taps();
                        this.taps = 3;
                        Chain(c, Total(taps), "ip");
                    }
                }
                public sealed class Bus : IEnumerable<int>
                {
                    public IEnumerator<int> GetEnumerator() { yield return 4; yield return 5; }
                    System.Collections.IEnumerator System.Collections.IEnumerable.GetEnumerator() => GetEnumerator();
                }
                public sealed class SpreadOfSequences : Base
                {
                    private static IEnumerable<int> Taps() { yield return 1; yield return 2; }
                    protected override void Describe(Circuit c)
                    {
                        int[] all = [.. Taps(), .. new HashSet<int> { 3 }, .. new Bus(), .. Enumerable.Range(6, 2)];
                        char[] letters = [.. "ab"];
                        Chain(c, all.Sum() + all.Length + letters.Length, "sp");
                    }
                }
            }
            """));
}
