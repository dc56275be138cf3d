using System.Linq;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests;

/// <summary>PW9001: constructs outside the subset are reported once each, and the rest of the design is still elaborated.</summary>
public class NotElaboratedTests
{
    private const string Source = """
        using System;
        using System.Linq;
        using System.Text;
        using Phaseward;

        public sealed class Mixed : Design
        {
            protected override void Describe(Circuit c)
            {
                var a = c.Input("a");
                var n = {|#0:Environment.ProcessorCount|};
                for (var i = 0; i < n; i++)
                    c.Inverter(a);
                var seed = {|#1:new Random()|}.Next();
                c.Buffer(a, "b" + seed);
                var when = {|#2:DateTime.Now|}.Ticks;
                c.Inverter(a, "t" + when);
                if ({|#3:System.IO.File.Exists("settings")|})
                    c.Inverter(a, "from_file");
                var kind = {|#4:typeof(Circuit).GetMethods()|}.Length;
                c.Inverter(a, "after");
                c.Output("y", c.Inverter(a, "last"));
            }
        }
        """;

    [Fact]
    public Task EachConstructOutsideTheSubsetIsReportedOnce()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(Source,
                Enumerable.Range(0, 5).Select(i => new DiagnosticResult(RuleCatalog.NotElaborated.Id, DiagnosticSeverity.Warning).WithLocation(i)).ToArray())
            .RunAsync();

    [Fact]
    public void TheRestOfTheDesignIsStillElaborated()
    {
        var designs = new InMemoryDesigns(("/src/Mixed.cs", Source.Replace("{|#0:", "").Replace("{|#1:", "").Replace("{|#2:", "").Replace("{|#3:", "").Replace("{|#4:", "").Replace("|}", "")));
        var result = designs.CompileTime("Mixed");

        // Skipped: the loop bounded by the machine's processor count, the devices named from randomness and the clock, the
        // inverter made only if a file exists (files, environment, time and randomness are never read at compile time).
        // Elaborated: input a, "after", "last" and the output.
        Assert.Equal(new[] { "after", "last" }, result.Netlist!.Devices.Select(d => d.Name));
        Assert.Single(result.Netlist.Outputs);
        Assert.Equal(5, result.Issues.Count);
        Assert.All(result.Issues, i => Assert.Equal(RuleCatalog.NotElaborated.Id, i.RuleId));
        Assert.Contains(result.Issues, i => i.Arguments[0].Contains("Environment.ProcessorCount"));
    }

    [Fact]
    public Task ReportedOnceEvenInsideALoop()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using System;
            using Phaseward;

            public sealed class Looping : Design
            {
                protected override void Describe(Circuit c)
                {
                    var a = c.Input("a");
                    for (var i = 0; i < 10; i++)
                        c.Inverter(a, {|#0:Guid.NewGuid()|}.ToString());
                }
            }
            """, new DiagnosticResult(RuleCatalog.NotElaborated.Id, DiagnosticSeverity.Warning).WithLocation(0)).RunAsync();

    [Fact]
    public Task SilentWithoutTheDsl()
    {
        var test = new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            public abstract class Design { protected abstract void Describe(object c); }
            public sealed class Sampler : Design { protected override void Describe(object c) { System.Console.WriteLine(); } }
            """);
        test.TestState.AdditionalReferences.Clear();
        test.TestState.AdditionalReferences.AddRange(Basic.Reference.Assemblies.Net80.References.All);
        return test.RunAsync();
    }
}

/// <summary>PW9002: the step budget and the recursion limit stop runaway elaboration.</summary>
public class ElaborationBudgetTests
{
    private const string EndlessLoop = """
        using Phaseward;

        public sealed class Endless : Design
        {
            protected override void Describe(Circuit c)
            {
                var a = c.Input("a");
                c.Inverter(a, "before");
                {|#0:while (true)
                {
                }|}
            }
        }
        """;

    [Fact]
    public Task EndlessLoopStopsAtAConfiguredBudget()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(EndlessLoop,
                new DiagnosticResult(RuleCatalog.ElaborationBudgetExceeded.Id, DiagnosticSeverity.Warning).WithLocation(0)
                    .WithArguments("Endless", "the step budget of 1000 steps (loop iterations and calls; phaseward.elaboration_step_budget) is used up"))
            .WithEditorConfig("phaseward.elaboration_step_budget = 1000")
            .RunAsync();

    [Fact]
    public Task EndlessLoopMakingDevicesStopsAtAConfiguredDeviceBudget()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
                using Phaseward;

                public sealed class Runaway : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var n = c.Input("a");
                        {|#0:for (var i = 0; i >= 0; i++)
                            n = c.Inverter(n);|}
                    }
                }
                """,
                new DiagnosticResult(RuleCatalog.ElaborationBudgetExceeded.Id, DiagnosticSeverity.Warning).WithLocation(0)
                    .WithArguments("Runaway", "the device budget of 500 devices (or nets; phaseward.elaboration_device_budget) is used up"))
            .WithEditorConfig("phaseward.elaboration_device_budget = 500")
            .RunAsync();

    [Fact]
    public void EndlessLoopStopsAtTheDefaultBudget()
    {
        var result = new InMemoryDesigns(("/src/Endless.cs", EndlessLoop.Replace("{|#0:", "").Replace("|}", ""))).CompileTime("Endless");
        var issue = Assert.Single(result.Issues);
        Assert.Equal(RuleCatalog.ElaborationBudgetExceeded.Id, issue.RuleId);
        Assert.Equal(ElaborationLimits.DefaultStepBudget + 1, result.Steps);
        Assert.Equal(new[] { "before" }, result.Netlist!.Devices.Select(d => d.Name));
    }

    [Fact]
    public Task UnboundedRecursionStopsAtTheDepthLimit()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Deep : Design
            {
                protected override void Describe(Circuit c) => Chain(c, c.Input("a"), 0);

                private static void Chain(Circuit c, Net x, int depth) => {|#0:Chain(c, c.Buffer(x), depth + 1)|};
            }
            """,
            new DiagnosticResult(RuleCatalog.ElaborationBudgetExceeded.Id, DiagnosticSeverity.Warning).WithLocation(0)
                .WithArguments("Deep", "calls nest deeper than the limit of 10 (phaseward.elaboration_recursion_limit)"))
            .WithEditorConfig("phaseward.elaboration_recursion_limit = 10")
            .RunAsync();

    [Fact]
    public void AHundredThousandDevicesFitTheDefaultBudget()
    {
        var result = new InMemoryDesigns(("/src/Wide.cs", """
            using Phaseward;

            public sealed class Wide : Design
            {
                protected override void Describe(Circuit c)
                {
                    var a = c.Input("a");
                    for (var i = 0; i < 100_000; i++)
                        Stage(c, a);
                }

                private static Net Stage(Circuit c, Net input) => c.Inverter(input);
            }
            """)).CompileTime("Wide");

        Assert.Empty(result.Issues);
        Assert.Equal(100_000, result.Netlist!.Devices.Count);
        // Three steps per device (iteration, helper call, DSL call), plus the loop's last test and c.Input:
        // a million such devices use about 3,000,000 of the budget.
        Assert.Equal(300_002, result.Steps);
        Assert.True(result.Steps * 10 < ElaborationLimits.DefaultStepBudget);
    }
}

/// <summary>PW9003: a DSL call that throws (bad constant) is an error at the call, with the DSL's message.</summary>
public class DesignThrowsTests
{
    [Fact]
    public Task NegativeCapacitanceIsAnErrorAtTheCall()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Leaky : Design
            {
                protected override void Describe(Circuit c)
                {
                    var n = c.Input("n");
                    {|#0:c.SetCapacitance(n, -2.Femtofarads())|};
                    c.Inverter(n, "still_here");
                }
            }
            """,
            new DiagnosticResult(RuleCatalog.DesignThrows.Id, DiagnosticSeverity.Error).WithLocation(0)
                .WithArguments("Leaky", "'total' must be a positive, finite value (was -2 fF).\nParameter name: total".Replace("\nParameter name: total", " (Parameter 'total')")))
            .RunAsync();

    [Fact]
    public Task ACallInAHelperInAnotherFileIsReportedAtTheCallInDescribe()
    {
        var test = new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Split : Design
            {
                protected override void Describe(Circuit c)
                {
                    var n = c.Input("n");
                    {|#0:Library.Load(c, n)|};
                }
            }
            """,
            new DiagnosticResult(RuleCatalog.DesignThrows.Id, DiagnosticSeverity.Error).WithLocation(0).WithLocation(1));
        test.TestState.Sources.Add("""
            using Phaseward;

            public static class Library
            {
                public static void Load(Circuit c, Net n) => {|#1:c.SetLeakage(n, 0.Picoamperes())|};
            }
            """);
        return test.RunAsync();
    }

    [Fact]
    public void ACallThatThrowsOnEveryIterationStopsAfterAHundredExceptions()
    {
        var result = new InMemoryDesigns(("/src/Repeat.cs", """
            using Phaseward;

            public sealed class Repeat : Design
            {
                protected override void Describe(Circuit c)
                {
                    var n = c.Input("n");
                    for (var i = 0; i < 1_000_000; i++)
                        c.SetCapacitance(n, -i.Femtofarads());
                }
            }
            """)).CompileTime("Repeat");
        var issue = Assert.Single(result.Issues);
        Assert.Equal(RuleCatalog.DesignThrows.Id, issue.RuleId);
        // i = 0 throws too (a capacitance must be positive). 100 iterations of four steps each (iteration, Femtofarads,
        // the Capacitance negation operator, SetCapacitance) plus c.Input, then elaboration stops.
        Assert.Equal(1 + 4 * Interpreter.MaxThrows, result.Steps);
    }

    [Fact]
    public void UserThrowStopsTheDesignWithItsMessage()
    {
        var result = new InMemoryDesigns(("/src/Guarded.cs", """
            using System;
            using Phaseward;

            public sealed class Guarded : Design
            {
                private readonly int bits = 0;

                protected override void Describe(Circuit c)
                {
                    c.Inverter(c.Input("a"), "first");
                    if (bits < 1)
                        throw new ArgumentOutOfRangeException(nameof(bits), "need at least one bit");
                    c.Inverter(c.Input("b"), "never");
                }
            }
            """)).CompileTime("Guarded");
        var issue = Assert.Single(result.Issues);
        Assert.Equal(RuleCatalog.DesignThrows.Id, issue.RuleId);
        Assert.Equal("ArgumentOutOfRangeException: need at least one bit", issue.Arguments[1]);
        Assert.Equal(new[] { "first" }, result.Netlist!.Devices.Select(d => d.Name));
    }
}

/// <summary>PW9004: an option value that cannot be read is reported, naming the key and the expected format.</summary>
public class InvalidOptionTests
{
    [Theory]
    [InlineData("phaseward.elaboration_step_budget", "lots", "a whole number from 1 to 4611686018427387903 (for example 10000000)", "10000000")]
    [InlineData("phaseward.elaboration_step_budget", "0", "a whole number from 1 to 4611686018427387903 (for example 10000000)", "10000000")]
    [InlineData("phaseward.elaboration_recursion_limit", "100000", "a whole number from 1 to 512 (for example 64)", "64")]
    public Task InvalidValueIsReportedAtDescribe(string key, string value, string expected, string fallback)
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Plain : Design
            {
                protected override void {|#0:Describe|}(Circuit c) => c.Inverter(c.Input("a"));
            }
            """,
            new DiagnosticResult(RuleCatalog.InvalidOption.Id, DiagnosticSeverity.Warning).WithLocation(0).WithArguments(key, value, expected, fallback))
            .WithEditorConfig(key + " = " + value)
            .RunAsync();

    [Fact]
    public Task ABadValueIsReportedOncePerFileHoweverManyDesignsItHolds()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class First : Design
            {
                protected override void {|#0:Describe|}(Circuit c) => c.Inverter(c.Input("a"));
            }

            public sealed class Second : Design
            {
                protected override void Describe(Circuit c) => c.Inverter(c.Input("b"));
            }

            public sealed class Third : Design
            {
                protected override void Describe(Circuit c) => c.Inverter(c.Input("c"));
            }
            """,
            new DiagnosticResult(RuleCatalog.InvalidOption.Id, DiagnosticSeverity.Warning).WithLocation(0)
                .WithArguments("phaseward.elaboration_recursion_limit", "deep", "a whole number from 1 to 512 (for example 64)", "64"))
            .WithEditorConfig("phaseward.elaboration_recursion_limit = deep")
            .RunAsync();

    [Fact]
    public Task ValidValuesWithDigitSeparatorsAreAccepted()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>("""
            using Phaseward;

            public sealed class Plain : Design
            {
                protected override void Describe(Circuit c) => c.Inverter(c.Input("a"));
            }
            """)
            .WithEditorConfig("phaseward.elaboration_step_budget = 2_000_000\nphaseward.elaboration_recursion_limit = 200")
            .RunAsync();
}
