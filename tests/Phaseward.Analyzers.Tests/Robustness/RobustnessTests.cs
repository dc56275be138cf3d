using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Robustness;

/// <summary>Half-typed and mutated designs never make the elaborator throw (AD0001) or hang; cancellation is honoured.</summary>
public class RobustnessTests
{
    private const string Design = """
        using System.Collections.Generic;
        using Phaseward;

        public sealed class Typing : Design
        {
            private readonly int width = 3;

            protected override void Describe(Circuit c)
            {
                var clk = c.Clock("clk", 4.Nanoseconds());
                var nets = new List<Net>();
                for (var i = 0; i < width; i++)
                    nets.Add(c.DynamicLatch(c.Input("d" + i), i % 2 == 0 ? clk.High : clk.Low));
                var (a, b) = (nets[0], nets[1]);
                c.Output("y", c.Nand(a, b));
            }
        }
        """;

    public static IEnumerable<object[]> Mutations()
    {
        // Every prefix cut at a line boundary, and a few typical typing states.
        var lines = Design.Split('\n');
        for (var n = 1; n < lines.Length; n++)
            yield return new object[] { string.Join("\n", lines.Take(n)) };
        yield return new object[] { Design.Replace("c.Input(\"d\" + i)", "c.Input(") };
        yield return new object[] { Design.Replace("nets[1]", "nets[") };
        yield return new object[] { Design.Replace("width; i++", "width; i+") };
        yield return new object[] { Design.Replace("4.Nanoseconds()", "4.Nanosecond()") };
        yield return new object[] { Design.Replace("var (a, b)", "var (a, b, q)") };
        yield return new object[] { Design.Replace("private readonly int width = 3;", "private readonly int width = ;") };
        yield return new object[] { Design.Replace("c.Nand(a, b)", "c.Nand(a, b, c)") };
        yield return new object[] { Design.Replace("nets.Add(", "nets.Add(nets, ") };
    }

    [Theory]
    [MemberData(nameof(Mutations))]
    public async Task NeverThrowsOnBrokenSource(string source)
    {
        var compilation = CSharpCompilation.Create("Broken", new[] { CSharpSyntaxTree.ParseText(source, path: "/src/Typing.cs") },
            PhasewardTest.References, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        var failures = new List<Exception>();
        var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty),
            (e, _, _) => failures.Add(e), concurrentAnalysis: false, logAnalyzerExecutionTime: false);
        var diagnostics = await compilation.WithAnalyzers(ImmutableArray.Create<DiagnosticAnalyzer>(new ElaborationAnalyzer()), options)
            .GetAnalyzerDiagnosticsAsync(CancellationToken.None);

        Assert.Empty(failures);
        Assert.DoesNotContain(diagnostics, d => d.Id == "AD0001");
        // Code that does not compile is the compiler's to report; the elaborator adds no PW9001 for it.
        Assert.DoesNotContain(diagnostics, d => d.Id == RuleCatalog.NotElaborated.Id && d.GetMessage().Contains("failed on it"));
    }

    [Theory]
    [InlineData("public Looping() : this() { }")]
    [InlineData("public Looping() : this(4) { } public Looping(int bits) : this() { }")]
    public async Task ConstructorChainThatCallsItselfStopsAtTheRecursionLimit(string constructors)
    {
        // Does not compile (CS0516 / CS0768), but is what the editor sees mid-edit: it once overflowed the elaborator's stack.
        var source = "using Phaseward;\npublic sealed class Looping : Design\n{\n    " + constructors + "\n" +
                     "    protected override void Describe(Circuit c) => c.Output(\"y\", c.Input(\"a\"));\n}\n";
        var tree = BoundedAnalysis.Parse("/src/Looping.cs", source);
        var diagnostics = await BoundedAnalysis.DocumentAsync(BoundedAnalysis.Compile(new[] { tree }), tree, "a constructor chain that calls itself");
        Assert.Contains(diagnostics, d => d.Id == RuleCatalog.ElaborationBudgetExceeded.Id && d.GetMessage().Contains("nest deeper"));
    }

    [Theory]
    [InlineData("for (var i = 0; ; i < 4; i++)")]   // a stray ';' where the condition goes: no condition, so no end
    [InlineData("for (var i = 0; i < 4; i+)")]      // a half-typed increment: i never changes
    [InlineData("for (var i = 0; i < 4; i < 4)")]   // a comparison where the increment goes (CS0201)
    public async Task ALoopWhoseHeaderDoesNotCompileIsSkipped(string header)
    {
        // Run as written, each of these loops makes inverters until the device budget stops it (PW9002): seconds of
        // work, and devices that are not in the design, on every keystroke while the header is being typed.
        var source = "using Phaseward;\npublic sealed class Half : Design\n{\n    protected override void Describe(Circuit c)\n    {\n" +
                     "        var n = c.Input(\"a\");\n        " + header + "\n            n = c.Inverter(n);\n" +
                     "        c.Output(\"y\", c.Inverter(c.Input(\"b\")));\n    }\n}\n";
        var tree = BoundedAnalysis.Parse("/src/Half.cs", source);
        var compilation = BoundedAnalysis.Compile(new[] { tree });
        Assert.Contains(compilation.GetDiagnostics(), d => d.Severity == DiagnosticSeverity.Error);

        var diagnostics = await BoundedAnalysis.DocumentAsync(compilation, tree, header);
        Assert.DoesNotContain(diagnostics, d => d.Id == RuleCatalog.ElaborationBudgetExceeded.Id);
    }

    [Fact]
    public async Task ALoopWhoseHeaderOnlyWarnsIsRunEvenWhenWarningsAreErrors()
    {
        // An obsolete member in the header is a warning (CS0618) that TreatWarningsAsErrors makes an error: the header
        // still compiles to what it says, so the loop runs and its eight pass gates in series are PW2001's finding.
        var source = """
            using System;
            using Phaseward;

            public sealed class Chain : Design
            {
                [Obsolete("use Length")]
                private static int Gates => 8;

                protected override void Describe(Circuit c)
                {
                    var clk = c.Clock("clk", 4.Nanoseconds());
                    var n = c.Inverter(c.Input("a"));
                    for (var i = 0; i < Gates; i++)
                        n = c.TransmissionGate(n, clk.High);
                    c.Output("y", c.Inverter(n));
                }
            }
            """;
        var tree = BoundedAnalysis.Parse("/src/Chain.cs", source);
        var compilation = BoundedAnalysis.Compile(new[] { tree });
        compilation = compilation.WithOptions(compilation.Options.WithGeneralDiagnosticOption(ReportDiagnostic.Error));
        Assert.Contains(compilation.GetDiagnostics(), d => d.Id == "CS0618" && d.Severity == DiagnosticSeverity.Error);

        var diagnostics = await BoundedAnalysis.DocumentAsync(compilation, tree, "an obsolete member in a loop header");
        Assert.Contains(diagnostics, d => d.Id == RuleCatalog.SeriesPassGates.Id);
    }

    [Fact]
    public void EndlessLoopMakingDevicesStopsAtTheDeviceBudget()
    {
        // Steps alone let such a loop make millions of devices (minutes, gigabytes) before the step budget runs out.
        var designs = new InMemoryDesigns(("/src/Runaway.cs", """
            using Phaseward;

            public sealed class Runaway : Design
            {
                protected override void Describe(Circuit c)
                {
                    var n = c.Input("a");
                    for (var i = 0; i >= 0; i++)
                        n = c.Inverter(n);
                    c.Output("y", n);
                }
            }
            """));
        var result = designs.CompileTime("Runaway", new ElaborationLimits(ElaborationLimits.DefaultStepBudget, ElaborationLimits.DefaultRecursionLimit, 1_000));

        var issue = Assert.Single(result.Issues);
        Assert.Equal(RuleCatalog.ElaborationBudgetExceeded.Id, issue.RuleId);
        Assert.Contains("device budget of 1000 devices", string.Join(" ", issue.Arguments));
        // Each inverter makes a net too: the input and 1,000 inverter outputs make 1,001 nets, just past the budget.
        Assert.Equal(1_000, result.Netlist!.Devices.Count);
    }

    [Fact]
    public void EndlessLoopMakingNetsStopsAtTheDeviceBudget()
    {
        var designs = new InMemoryDesigns(("/src/Nets.cs", """
            using Phaseward;

            public sealed class Nets : Design
            {
                protected override void Describe(Circuit c)
                {
                    for (var i = 0; i >= 0; i++)
                        c.Node();
                }
            }
            """));
        var result = designs.CompileTime("Nets", new ElaborationLimits(ElaborationLimits.DefaultStepBudget, ElaborationLimits.DefaultRecursionLimit, 1_000));

        var issue = Assert.Single(result.Issues);
        Assert.Contains("device budget of 1000 devices (or nets", string.Join(" ", issue.Arguments));
        Assert.Equal(1_001, result.Netlist!.Nets.Count);
    }

    [Fact]
    public void CancellationIsHonoured()
    {
        var designs = new InMemoryDesigns(("/src/Endless.cs", """
            using Phaseward;

            public sealed class Endless : Design
            {
                protected override void Describe(Circuit c)
                {
                    while (true) { }
                }
            }
            """));
        using var cancelled = new CancellationTokenSource();
        cancelled.Cancel();
        var design = designs.Session.Catalog.Designs.Single();
        Assert.ThrowsAny<OperationCanceledException>(() => DesignElaborator.Elaborate(designs.Session, design, ElaborationLimits.Default, cancelled.Token));
    }
}
