using System.Linq;
using System.Threading.Tasks;
using Phaseward.Analyzers.Tests.Verifiers;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// An iterator enumerated by library code (LINQ) is run to the end when the library first enumerates it
/// (docs/elaboration.md). In C# it runs one MoveNext at a time (C# specification, §15.15, iterators): whether and where
/// it throws depends on how far it is enumerated (First stops after one element, TakeWhile at the first that fails).
/// One that throws when run to the end is therefore PW9001 at the call, naming it, and what depends on its values is
/// not made; one never enumerated does not run at all. Before, the exception was thrown at the call, into the caller's catch, silently (the oracle for
/// each scenario: the design compiled and run by .NET gives 1, 2 and 3 where the elaborator gave 3, 3 and 50).
/// </summary>
public class ThrowingIteratorTests
{
    private const string Why = "it throws ({0}) when run to the end, and an iterator not enumerated straight by a foreach is run to completion when "
        + "called: in C# none of it runs until it is enumerated, and whether it throws depends on how far it is enumerated";

    [Fact]
    public async Task An_iterator_throwing_after_the_element_First_takes_is_PW9001_not_caught_early()
    {
        var source = InverterChainDesign.Source("Saltmarsh", "", """
            private static System.Collections.Generic.IEnumerable<int> Taps() { yield return 1; throw new System.InvalidOperationException("tail"); }
            """, """
            try { count = System.Linq.Enumerable.First({|#0:Taps()|}); } catch (System.InvalidOperationException) { count = 3; }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the iterator 'D.Taps()'", string.Format(Why, "InvalidOperationException: tail"))).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Saltmarsh");
    }

    [Fact]
    public async Task An_iterator_whose_tail_TakeWhile_never_reaches_throws_is_PW9001()
    {
        var source = InverterChainDesign.Source("Saltmarsh", "", """
            private static int Zero() => 0;
            private static System.Collections.Generic.IEnumerable<int> Widths() { yield return 1; yield return 2; yield return 8; yield return 1 / Zero(); }
            """, """
            try { count = System.Linq.Enumerable.Sum(System.Linq.Enumerable.TakeWhile({|#0:Widths()|}, w => w < 5)); } catch (System.DivideByZeroException) { count = 50; }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source,
            InverterChainDesign.NotElaborated(0, "the iterator 'D.Widths()'", string.Format(Why, "DivideByZeroException: Attempted to divide by zero."))).RunAsync();
        InverterChainDesign.AssertNoStage(source, "Saltmarsh");
    }

    [Fact]
    public async Task An_iterators_argument_check_is_not_thrown_at_the_call()
    {
        // .NET runs nothing of Lanes at the call, and the design never enumerates it: the assignment after it happens,
        // no catch runs (2 stages), and nothing is reported.
        var source = InverterChainDesign.Source("Saltmarsh", "", """
            private static System.Collections.Generic.IEnumerable<int> Lanes(int n) { if (n < 0) throw new System.ArgumentException("n"); for (var i = 0; i < n; i++) yield return i; }
            """, """
            try { var lanes = Lanes(-1); count = 2; } catch (System.ArgumentException) { count = 4; }
            """);
        await new PhasewardAnalyzerTest<ElaborationAnalyzer>(source).RunAsync();
        var netlist = new InMemoryDesigns(("/saltmarsh/D.cs", source)).CompileTime("Saltmarsh.D").Netlist!;
        Assert.Equal(2, netlist.Devices.Count(d => d.Name.StartsWith('s')));
        Assert.Equal(2, new InMemoryDesigns(("/saltmarsh/D.cs", source)).RunTime("Saltmarsh.D").Devices.Count(d => d.Name.StartsWith('s')));
    }
}
