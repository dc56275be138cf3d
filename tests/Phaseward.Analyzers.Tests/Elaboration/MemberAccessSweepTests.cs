using System.Linq;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Nothing the elaborator cannot evaluate is read as a default. A design takes its stage count (3) through one kind of
/// member access per row -- fields, properties, indexers, events and methods; static and instance; of the design's own
/// types, of the library (pure, and outside: file, environment, clock, randomness, reflection, threads, network,
/// processes) and of the DSL -- and at compile time it is either interpreted (then the netlist equals the run-time one)
/// or it is PW9001 at that access: never a silent 0, false or null.
/// </summary>
public class MemberAccessSweepTests
{
    public static TheoryData<string, string, string, string, bool> Rows() => new()
    {
        // name, declarations beside the design, the design's members, the expression, interpreted?
        { "const field", "", "private const int N = 3;", "N", true },
        { "static readonly field with initializer", "", "private static readonly int N = 1 + 2;", "N", true },
        { "static readonly field set by the static constructor", "", "private static readonly int N; static D() { N = 3; }", "N", true },
        { "static auto-property set by the static constructor", "", "private static int N { get; set; } static D() => N = 3;", "N", true },
        { "static field of another type set by its static constructor",
            "public static class Plan { public static readonly int Stages; public static readonly bool Used; static Plan() { Stages = 3; Used = true; } }",
            "", "Plan.Used ? Plan.Stages : 0", true },
        { "static initializer reading another type's static constructor",
            "public static class A { public static readonly int X; static A() { X = 3; } } public static class B { public static readonly int Y = A.X; }",
            "", "B.Y", true },
        { "static field of a generic type", "public static class Holder<T> { public static int Value; static Holder() { Value = 3; } }", "", "Holder<int>.Value", true },
        { "static property with a getter", "", "private static int N => 1 + 2;", "N", true },
        { "instance field with initializer", "", "private readonly int n = 3;", "n", true },
        { "instance field set by the constructor", "", "private readonly int n; public D() { n = 3; }", "n", true },
        { "auto-property with initializer", "", "private int N { get; } = 3;", "N", true },
        { "get-only auto-property set by the constructor", "", "private int N { get; } public D() { N = 3; }", "N", true },
        { "field of a base class set by its constructor", "public abstract class Base : Design { protected readonly int n; protected Base() { n = 3; } }", "", "n", true },
        { "property of a user object", "public sealed class Config { public int Stages { get; set; } = 1; }", "", "new Config { Stages = 3 }.Stages", true },
        { "record positional property", "public sealed record Plan(int Stages, string Name);", "", "new Plan(3, \"p\").Stages", true },
        { "struct field", "public struct Pair { public int A; public int B; public Pair(int a, int b) { A = a; B = b; } }", "", "new Pair(1, 2).A + new Pair(1, 2).B", true },
        { "array element left at its default", "", "", "(new int[4])[2] + 3", true },
        { "tuple element", "", "", "(1, 3).Item2", true },
        { "enum member", "public enum Count { One = 1, Three = 3 }", "", "(int)Count.Three", true },
        { "default literal", "", "", "default(int) + 3", true },
        { "nullable value", "", "", "((int?)null) ?? 3", true },
        { "library constant", "", "", "int.MaxValue / int.MaxValue * 3", true },
        { "library static field", "", "", "string.Empty.Length + 3", true },
        { "captured local read by a local function", "", "", "Local(); int Local() => 3;", true },

        // fields, continued
        { "static field of a user class with an initializer", "public static class Plan { public static int Stages = 3; }", "", "Plan.Stages", true },
        { "field of a user struct left at its default", "public struct Pair { public int A; }", "private Pair pair;", "pair.A + 3", true },
        { "default of a user struct", "public struct Pair { public int A; public int B; }", "", "default(Pair).B + 3", true },
        { "default of a library struct outside the pure library", "", "", "default(System.DateTime).Year * 0 + 3", false },
        { "default of a pure library struct", "", "", "(int)(default(decimal) + 3m)", true },
        { "elements of a struct array, each its own value", "public struct Pair { public int A; }", "",
            "Fill(new Pair[2]); static int Fill(Pair[] pairs) { pairs[0].A = 5; return pairs[1].A + 3; }", true },
        { "static field of a library type outside the pure set (file system)", "", "", "System.IO.Path.DirectorySeparatorChar * 0 + 3", false },

        // properties, continued
        { "explicit property over a field", "", "private readonly int n = 3; private int N { get { return n; } }", "N", true },
        { "virtual property overridden by the design",
            "public abstract class Base : Design { protected virtual int N => 1; }", "protected override int N => 3;", "N", true },
        { "property read through an interface", "public interface IPlan { int Stages { get; } } public sealed class Plan : IPlan { public int Stages => 3; }",
            "", "((IPlan)new Plan()).Stages", true },
        { "instance property of a library type", "", "", "\"abc\".Length", true },
        { "static property of a pure library type", "", "", "System.Globalization.CultureInfo.InvariantCulture.Name.Length + 3", true },
        { "static and instance property of the DSL", "", "", "Process.Illustrative.Name.Length * 0 + 3", true },
        { "threads", "", "", "System.Threading.Thread.CurrentThread.ManagedThreadId * 0 + 3", false },

        // indexers
        { "indexer of a user type", "public sealed class Row { private readonly int[] values = { 1, 3 }; public int this[int i] => values[i]; }", "",
            "new Row()[1]", true },
        { "list indexer", "", "", "new System.Collections.Generic.List<int> { 1, 3 }[1]", true },
        { "dictionary indexer", "", "", "new System.Collections.Generic.Dictionary<string, int> { [\"n\"] = 3 }[\"n\"]", true },
        { "string indexer", "", "", "\"a3\"[1] - '0'", true },

        // events
        { "event of the design read as a value", "", "private event System.Action? Changed;", "Changed is null ? 3 : 0", true },
        { "static event of the design read as a value", "", "private static event System.Action? Changed;", "Changed is null ? 3 : 0", false },

        // methods
        { "static method of the design", "", "private static int Three() => 3;", "Three()", true },
        { "instance method of a user object", "public sealed class Plan { private readonly int n = 3; public int Stages() => n; }", "", "new Plan().Stages()", true },
        { "virtual method overridden by the design",
            "public abstract class Base : Design { protected virtual int N() => 1; }", "protected override int N() => 3;", "N()", true },
        { "method called through an interface", "public interface IPlan { int Stages(); } public sealed class Plan : IPlan { public int Stages() => 3; }",
            "", "((IPlan)new Plan()).Stages()", true },
        { "extension method", "public static class Counting { public static int Triple(this int x) => 3 * x; }", "", "1.Triple()", true },
        { "delegate of a lambda", "", "", "((System.Func<int>)(() => 3))()", true },
        { "delegate of a method group", "", "private static int Three() => 3;", "new System.Func<int>(Three)()", true },
        { "static method of a pure library type", "", "", "System.Math.Max(1, 3)", true },
        { "instance method of a pure library type", "", "", "\"a,b,c\".Split(',').Length", true },
        { "method of the DSL", "", "", "c.Input(\"n\").Name.Length + 2", true },
        { "file system", "", "", "System.IO.File.Exists(\"stages.txt\") ? 3 : 3", false },
        { "clock through a static method", "", "", "(int)(System.Diagnostics.Stopwatch.GetTimestamp() * 0) + 3", false },
        { "randomness through a static method", "", "", "System.Guid.NewGuid().ToString().Length * 0 + 3", false },
        { "a type's name", "", "", "typeof(int).Name.Length * 0 + 3", true },
        { "the design's type name through GetType", "", "", "GetType().Name.Length * 0 + 3", true },
        { "reflection", "", "", "typeof(int).GetMethods().Length * 0 + 3", false },
        { "reflection through GetType", "", "", "GetType().GetMethods().Length * 0 + 3", false },
        { "environment read by a lambda of a lazy sequence a foreach runs", "", "",
            "Sum(); int Sum() { var total = 0; foreach (var n in System.Linq.Enumerable.OrderBy(new[] { 3 }, x => System.Environment.ProcessorCount)) total += n; return total; }",
            false },
        { "network", "", "", "System.Net.Dns.GetHostName().Length * 0 + 3", false },
        { "process", "", "", "System.Diagnostics.Process.GetCurrentProcess().Id * 0 + 3", false },
        { "clock of the machine", "", "", "System.DateTime.Now.Second * 0 + 3", false },
        { "environment", "", "", "System.Environment.ProcessorCount * 0 + 3", false },
        { "randomness", "", "", "new System.Random().Next(3, 4)", false },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void AccessIsInterpretedOrReported(string kind, string declarations, string members, string expression, bool interpreted)
    {
        var isBlock = expression.Contains(';');
        var value = isBlock ? expression.Substring(0, expression.IndexOf(';')) : expression;
        var locals = isBlock ? expression.Substring(expression.IndexOf(';') + 1) : "";
        var baseType = declarations.Contains("abstract class Base") ? "Base" : "Design";
        var source = $$"""
            using Phaseward;

            namespace Sweep
            {
                {{declarations}}

                public sealed class D : {{baseType}}
                {
                    {{members}}

                    protected override void Describe(Circuit c)
                    {
                        var count = {{value}};
                        var x = c.Input("x");
                        for (var i = 0; i < count; i++)
                            x = c.Inverter(x, "s" + i);
                        c.Output("y", x);
                        {{locals}}
                    }
                }
            }
            """;
        var designs = new InMemoryDesigns(("/sweep/D.cs", source));
        var compileTime = designs.CompileTime("Sweep.D");
        if (interpreted)
        {
            ParityTests.AssertParity(designs, "Sweep.D");
            Assert.Equal(3, designs.RunTime("Sweep.D").Devices.Count);
        }
        else
        {
            var issue = Assert.Single(compileTime.Issues);
            Assert.True(issue.RuleId == RuleCatalog.NotElaborated.Id, kind + ": " + issue);
            Assert.Empty(compileTime.Netlist!.Devices);
        }
    }
}
