using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// A collection the body of its own foreach changes: the foreach takes the collection's enumerator (C# specification,
/// §13.9.5, the foreach statement), and a List, Dictionary or HashSet changed since then throws InvalidOperationException
/// at the next MoveNext; which changes count is the runtime's (.NET 10 here: a Dictionary's Remove does not). Each design
/// is elaborated exactly as the compiled design runs it (the oracle: the design compiled and run by .NET,
/// <see cref="ParityTests"/>). Before, a list was enumerated from a copy (no exception, silently) and a dictionary or set
/// failed the elaborator (PW9001).
/// </summary>
public class CollectionChangedInForeachTests
{
    [Theory]
    [InlineData("Changed.ListAddInItsForeach")]
    [InlineData("Changed.ListIndexerSetInItsForeach")]
    [InlineData("Changed.ListSortInItsForeach")]
    [InlineData("Changed.ListChangedAfterTheLastItem")]
    [InlineData("Changed.DictionaryAddInItsForeach")]
    [InlineData("Changed.DictionaryRemoveInItsForeach")]
    [InlineData("Changed.HashSetAddInItsForeach")]
    [InlineData("Changed.ChangedListInACalledHelper")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    [Fact]
    public async Task A_change_no_catch_takes_is_PW9003_at_the_foreach()
    {
        // The design ends there at run time: nothing after the loop is made.
        var source = InverterChainDesign.Source("Crowsnest", "", "", """
            var taps = new System.Collections.Generic.List<int> { 1, 2 };
            foreach (var t in {|#0:taps|}) { count++; if (t == 2) taps.Remove(2); }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, new DiagnosticResult(RuleCatalog.DesignThrows.Id, DiagnosticSeverity.Error)
            .WithLocation(0).WithArguments("D", "InvalidOperationException: Collection was modified; enumeration operation may not execute.")).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Crowsnest");
    }

    private static readonly InMemoryDesigns Designs = new(("/changed/Changed.cs", """
            using System;
            using System.Collections.Generic;
            using Phaseward;

            namespace Changed
            {
                public abstract class Base : Design { protected void Chain(Circuit c, int n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class ListAddInItsForeach : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var taps = new List<int> { 1, 2 }; var n = 1;
                        try { foreach (var t in taps) if (t == 1) taps.Add(3); } catch (InvalidOperationException) { n = 4; }
                        Chain(c, n + taps.Count, "la");
                    }
                }
                public sealed class ListIndexerSetInItsForeach : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var taps = new List<int> { 1, 2, 3 }; var n = 1;
                        try { foreach (var t in taps) { n += t; if (t == 1) taps[2] = 5; } } catch (InvalidOperationException) { n += 10; }
                        Chain(c, n + taps[2], "li");
                    }
                }
                public sealed class ListSortInItsForeach : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var taps = new List<int> { 3, 1, 2 }; var n = 0;
                        try { foreach (var t in taps) { n += t; taps.Sort(); } } catch (InvalidOperationException) { n += 20; }
                        Chain(c, n + taps[0], "ls");
                    }
                }
                public sealed class ListChangedAfterTheLastItem : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var taps = new List<int> { 1, 2 }; var n = 0;
                        try { foreach (var t in taps) { n++; if (t == 2) taps.Remove(2); } } catch (InvalidOperationException) { n += 7; }
                        Chain(c, n + taps.Count, "lr");
                    }
                }
                public sealed class DictionaryAddInItsForeach : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var widths = new Dictionary<string, int> { ["a"] = 1, ["b"] = 2 }; var n = 0;
                        try { foreach (var kv in widths) { n += kv.Value; if (kv.Key == "a") widths["z"] = 9; } } catch (InvalidOperationException) { n += 30; }
                        Chain(c, n + widths.Count, "da");
                    }
                }
                public sealed class DictionaryRemoveInItsForeach : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var widths = new Dictionary<int, int> { [1] = 1, [2] = 2, [3] = 3 }; var n = 0;
                        try { foreach (var key in widths.Keys) { n++; if (key == 2) widths.Remove(key); } } catch (InvalidOperationException) { n += 30; }
                        Chain(c, n + widths.Count, "dr");
                    }
                }
                public sealed class HashSetAddInItsForeach : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var lanes = new HashSet<int> { 4 }; var n = 1;
                        try { foreach (var l in lanes) lanes.Add(l + 1); } catch (InvalidOperationException e) { n = e.Message.Length % 13; }
                        Chain(c, n + lanes.Count, "hs");
                    }
                }
                public sealed class ChangedListInACalledHelper : Base
                {
                    private readonly List<string> names = new() { "p", "q" };
                    private void Grow(string s) { if (s == "p") names.Add("r"); }
                    protected override void Describe(Circuit c)
                    {
                        var n = 2;
                        try { foreach (var s in names) Grow(s); } catch (InvalidOperationException) { n = 5; }
                        Chain(c, n + names.Count, "ch");
                    }
                }
            }
            """));
}
