using System;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// A field, property, array element or struct member whose type is a library struct outside the pure library
/// (<c>DateTime</c>, <c>Guid</c>, <c>TimeSpan</c>, a generic library struct such as <c>KeyValuePair&lt;int, Net&gt;</c> or
/// <c>List&lt;int&gt;.Enumerator</c>) holds a default the elaborator does not make. Reading it before anything was assigned is
/// PW9001 at the read, naming the type -- never a silent unknown that quietly drops or misnames devices. What depends on
/// it is skipped: no stage is made from the count it decides.
/// </summary>
public class LibraryStructDefaultTests
{
    private const string Why = "is read before a value is assigned to it, and the default of a library struct outside the pure library is not made at compile time";

    private const string WhyInLibrary = "a value used here holds it (a field or element never assigned), and the default of a library struct outside the pure library is not made at compile time";

    public static TheoryData<string, string, string, string, string, string> Reads() => new()
    {
        // name, declarations beside the design, the design's members, statements setting count (the read marked #0),
        // the type PW9001 names, the why (null: the read itself, quoted)
        { "field of a block",
            "public sealed class Stage : Block { private System.DateTime stamp; public int Count; protected override void Describe(Circuit c) { Count = {|#0:stamp|}.Ticks == 0 ? 1 : 2; c.Inverter(c.Input(\"i\"), \"s\" + Count); } }",
            "", "var stage = new Stage(); c.Place(stage, \"st\"); count = stage.Count;", "DateTime", "'stamp' " + Why },
        { "static field of the design", "", "private static System.Guid id;", "count = $\"{{|#0:id|}}\".Length;", "Guid", "'id' " + Why },
        { "static field of a helper class", "public static class Plan { public static System.DateTime Started; }", "",
            "count = {|#0:Plan.Started|}.Year;", "DateTime", "'Plan.Started' " + Why },
        { "auto-property of the design", "", "private System.TimeSpan Period { get; set; }", "count = {|#0:Period|}.Milliseconds;", "TimeSpan", "'Period' " + Why },
        { "static auto-property", "", "private static System.DateTimeOffset Since { get; }", "count = {|#0:Since|}.Offset.Hours;", "DateTimeOffset", "'Since' " + Why },
        { "field of a struct of the design", "public struct Holder { public System.DateTime When; public int N; }", "private Holder holder;",
            "var when = {|#0:holder.When|}; count = new System.Collections.Generic.List<System.DateTime> { when }.Count;", "DateTime", "'holder.When' " + Why },
        { "field of a struct read by a property pattern", "public struct Holder { public System.Guid Id; public int N; }", "private Holder holder;",
            "count = holder is { {|#0:Id|}: var id } ? 3 : 1;", "Guid", "'Id' " + Why },
        { "generic library struct", "", "private System.Collections.Generic.KeyValuePair<int, Net> pair;", "count = {|#0:pair|}.Key;",
            "KeyValuePair<int, Net>", "'pair' " + Why },
        { "enumerator of a list", "", "private System.Collections.Generic.List<int>.Enumerator items;", "var copy = {|#0:items|}; count = copy.Current;",
            "List<int>.Enumerator", "'items' " + Why },
        { "element of a new array", "", "", "var stamps = new System.DateTime[2]; count = {|#0:stamps[1]|}.Day;", "DateTime", "'stamps[1]' " + Why },
        { "element met by a library method", "", "", "count = {|#0:string.Join(\",\", new System.DateTime[2])|}.Length;", "DateTime", WhyInLibrary },
        { "element met by a foreach", "", "", "count = 0; foreach (var stamp in new System.Guid[2]) count += {|#0:stamp|}.ToString().Length;", "Guid", "'stamp' " + Why },
        { "field printed by a record's generated ToString", "public record struct Sample(int Value) { public System.DateTime Taken; }", "",
            "count = {|#0:new Sample(3).ToString()|}.Length;", "DateTime", WhyInLibrary },
        { "field compared by a record's generated equality", "public sealed record Sample(int Value) { public System.Guid Id; }", "",
            "count = {|#0:new Sample(3) == new Sample(3)|} ? 3 : 1;", "Guid", WhyInLibrary },
        { "field read by a compound assignment", "", "private System.TimeSpan elapsed;",
            "{|#0:elapsed|} += {|#1:System.TimeSpan.FromTicks(3)|}; count = elapsed.Milliseconds;", "TimeSpan", "'elapsed' " + Why },
    };

    [Theory]
    [MemberData(nameof(Reads))]
    public async Task AReadOfTheUnmadeDefaultIsPW9001NamingTheType(string kind, string declarations, string members, string statements, string type, string why)
    {
        var source = Source(declarations, members, statements);
        var expected = new DiagnosticResult(RuleCatalog.NotElaborated.Id, DiagnosticSeverity.Warning).WithLocation(0)
            .WithArguments("the default value of '" + type + "'", why, "D");
        var test = new PhasewardAnalyzerTest<ElaborationAnalyzer>(source, expected);
        // 'FromTicks' is not a pure library member: the compound assignment's operand (#1) is reported too.
        if (statements.Contains("{|#1:", StringComparison.Ordinal))
            test.TestState.ExpectedDiagnostics.Add(new DiagnosticResult(RuleCatalog.NotElaborated.Id, DiagnosticSeverity.Warning)
                .WithLocation(1).WithArguments("the call to 'TimeSpan.FromTicks(long)'",
                    "it is outside what compile-time elaboration runs (only the Phaseward DSL, methods of this compilation and pure library members such as string, Math, LINQ and the collections)",
                    "D"));
        await test.RunAsync();

        // What depends on the value is skipped: no stage is made from a count it decided.
        var result = new InMemoryDesigns(("/defaults/D.cs", Plain(source))).CompileTime("Defaults.D");
        Assert.DoesNotContain(result.Netlist!.Devices, d => d.Name.StartsWith("s", StringComparison.Ordinal) || d.Name.StartsWith("st.s", StringComparison.Ordinal));
        Assert.True(result.Issues.Count >= 1, kind);
    }

    [Fact]
    public void ALocalAssignedThroughOutIsReadWithTheAssignedValue()
    {
        // Declared without a value, then assigned by an out argument (and by 'out var'): the default is never read, so
        // nothing is reported and the netlist is the run-time one.
        var designs = new InMemoryDesigns(("/defaults/D.cs", Source("", """
                private static void Pick(out System.Collections.Generic.KeyValuePair<string, int> pair) => pair = new("p", 2);
                private static bool Try(out System.Collections.Generic.KeyValuePair<string, int> pair) { pair = new("q", 1); return true; }
                """, """
                System.Collections.Generic.KeyValuePair<string, int> chosen;
                Pick(out chosen);
                count = chosen.Value + (Try(out var other) ? other.Value : 5);
                """)));
        ParityTests.AssertParity(designs, "Defaults.D");
        Assert.Equal(3, designs.CompileTime("Defaults.D").Netlist!.Devices.Count);
    }

    [Fact]
    public void AFieldAssignedBeforeItIsReadIsNotReported()
    {
        // A field of such a type that the constructor assigns (from a value the elaborator can make) is read normally.
        var designs = new InMemoryDesigns(("/defaults/D.cs", Source("",
            "private readonly System.Collections.Generic.KeyValuePair<int, string> pair; public D() { pair = new(3, \"three\"); }",
            "count = pair.Key;")));
        ParityTests.AssertParity(designs, "Defaults.D");
        Assert.Equal(3, designs.CompileTime("Defaults.D").Netlist!.Devices.Count);
    }

    private static string Source(string declarations, string members, string statements) => InverterChainDesign.Source("Defaults", declarations, members, statements);

    private static string Plain(string marked) => InverterChainDesign.WithoutMarkup(marked);
}
