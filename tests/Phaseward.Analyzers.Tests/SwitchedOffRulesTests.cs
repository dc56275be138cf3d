using System.Collections.Generic;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests;

/// <summary>
/// A rule none of whose diagnostics the build lets through for a document is not run there: a team that switches a rule
/// off should not pay for it on every keystroke. The severities are the compiler's documented configuration
/// (<c>dotnet_diagnostic.ID.severity</c> in .editorconfig, where <c>none</c> suppresses and <c>silent</c> still reports
/// hidden diagnostics; <c>NoWarn</c> in the compilation's options). A spy rule borrowing PW3004's and PW3005's IDs counts
/// its runs (the test framework analyses a source more than once, so a rule that runs counts one or more). The tests of this class run one after another (xunit runs a class's tests in sequence), so the counter is theirs.
/// </summary>
public class SwitchedOffRulesTests
{
    private const string Source = """
        using Phaseward;

        public sealed class Bus : Design
        {
            protected override void Describe(Circuit c)
            {
                c.Output("q", c.Inverter(c.Input("a"), "q"));
            }
        }
        """;

    [Fact]
    public async Task A_rule_whose_only_diagnostic_is_set_to_none_is_not_run()
    {
        Assert.Equal(0, await RunsOf<FightingOnlySpy>("dotnet_diagnostic.PW3004.severity = none"));
    }

    [Fact]
    public async Task A_rule_with_no_setting_runs()
    {
        Assert.True(await RunsOf<FightingOnlySpy>(editorConfig: null) > 0);
    }

    [Fact]
    public async Task Silent_still_reports_hidden_diagnostics_so_the_rule_runs()
    {
        Assert.NotEqual(0, await RunsOf<FightingOnlySpy>("dotnet_diagnostic.PW3004.severity = silent"));
    }

    [Fact]
    public async Task A_rule_runs_while_any_of_its_diagnostics_is_on()
    {
        Assert.NotEqual(0, await RunsOf<FightingAndKeeperSpy>("dotnet_diagnostic.PW3004.severity = none"));
        Assert.Equal(0, await RunsOf<FightingAndKeeperSpy>("dotnet_diagnostic.PW3004.severity = none\ndotnet_diagnostic.PW3005.severity = none"));
    }

    [Fact]
    public async Task NoWarn_in_the_compilation_switches_the_rule_off()
    {
        Assert.Equal(0, await RunsOf<FightingOnlySpy>(editorConfig: null, noWarn: true));
    }

    [Fact]
    public async Task Settings_that_disagree_keep_the_rule_running()
    {
        // NoWarn suppresses and the document's .editorconfig raises it: whichever the compiler lets win, the rule runs.
        Assert.NotEqual(0, await RunsOf<FightingOnlySpy>("dotnet_diagnostic.PW3004.severity = error", noWarn: true));
    }

    [Fact]
    public async Task A_setting_for_other_files_does_not_switch_it_off_here()
    {
        var test = Test<FightingOnlySpy>();
        test.TestState.AnalyzerConfigFiles.Add(("/.editorconfig", "root = true\n\n[Other.cs]\ndotnet_diagnostic.PW3004.severity = none\n"));
        var before = Spy.Runs;
        await test.RunAsync();
        Assert.NotEqual(0, Spy.Runs - before);
    }

    [Fact]
    public Task The_real_family_still_reports_its_other_rules_when_one_is_off()
        // The bus's two request lines fight (PW3004, switched off here); the keeper on x is too strong (PW3005, still
        // reported): 1.2 V × 9 kΩ / (9 + 10) kΩ = 568 mV (divider, Ohm's law; the figures of PW3005Tests).
        => new PhasewardAnalyzerTest<DynamicStorageAnalyzer>("""
            using Phaseward;

            public sealed class Kept : Design
            {
                protected override void Describe(Circuit c)
                {
                    var bus = c.Node("bus");
                    c.TransmissionGate(c.Input("a"), c.Input("ra"), bus);
                    c.TransmissionGate(c.Input("b"), c.Input("rb"), bus);
                    c.Output("p", c.Inverter(bus, "p"));
                    var x = {|#1:c.TransmissionGate(c.Input("d"), c.Input("sel"), "x")|};
                    {|#0:c.Keeper(x, resistance: 10.Kiloohms())|};
                    c.Output("q", c.Inverter(x, "q"));
                }
            }
            """,
            new DiagnosticResult(RuleCatalog.KeeperTooStrong.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                .WithMessage("Keeper 'x.keeper' (10 kΩ) is too strong for the write path through 'x' (9 kΩ): writing a 0 against it pulls node 'x' "
                    + "only down to 568 mV, above the 480 mV it must reach (switching point 600 mV less a 120 mV margin; a 1 mirrors this)"))
            .WithEditorConfig("dotnet_diagnostic.PW3004.severity = none")
            .RunAsync();

    private static PhasewardAnalyzerTest<TSpy> Test<TSpy>()
        where TSpy : Spy, new()
        => new(Source);

    private static async Task<int> RunsOf<TSpy>(string? editorConfig, bool noWarn = false)
        where TSpy : Spy, new()
    {
        var test = Test<TSpy>();
        if (editorConfig is not null)
            test.WithEditorConfig(editorConfig);
        if (noWarn)
        {
            test.SolutionTransforms.Add((solution, projectId) =>
            {
                var options = solution.GetProject(projectId)!.CompilationOptions!;
                return solution.WithProjectCompilationOptions(projectId, options.WithSpecificDiagnosticOptions(
                    options.SpecificDiagnosticOptions.SetItem(RuleCatalog.FightingDrivers.Id, ReportDiagnostic.Suppress)));
            });
        }

        var before = Spy.Runs;
        await test.RunAsync();
        return Spy.Runs - before;
    }

    /// <summary>A test-only rule that finds nothing and, when asked to, counts its runs.</summary>
    private sealed class SpyRule : Rule
    {
        private readonly bool counts;

        public SpyRule(bool counts, params RuleDescriptor[] descriptors)
        {
            this.counts = counts;
            Descriptors = descriptors;
        }

        public override IReadOnlyList<RuleDescriptor> Descriptors { get; }

        public override IEnumerable<Finding> Check(RuleContext context)
        {
            if (counts)
                Interlocked.Increment(ref Spy.RunCount);
            return Enumerable.Empty<Finding>();
        }
    }

    // No [DiagnosticAnalyzer] attribute: handed to the test directly and never shipped.
#pragma warning disable RS1001 // Missing DiagnosticAnalyzerAttribute (test-only analyzers, see above)
    public abstract class Spy : FindingAnalyzer
    {
        internal static int RunCount;

        internal static int Runs => Volatile.Read(ref RunCount);

        protected override RuleFamily Family => RuleFamily.DynamicStorage;
    }

    // Each spy also has a rule that stays on (PW3003's ID), as a family analyzer does: the compiler skips an analyzer all
    // of whose diagnostics are off, and what is tested here is the skipping of one rule inside an analyzer that runs.
    public sealed class FightingOnlySpy : Spy
    {
        internal override IReadOnlyList<Rule> Rules { get; } = new Rule[]
        {
            new SpyRule(counts: true, RuleCatalog.FightingDrivers),
            new SpyRule(counts: false, RuleCatalog.ChargeSharing),
        };
    }

    public sealed class FightingAndKeeperSpy : Spy
    {
        internal override IReadOnlyList<Rule> Rules { get; } = new Rule[]
        {
            new SpyRule(counts: true, RuleCatalog.FightingDrivers, RuleCatalog.KeeperTooStrong),
            new SpyRule(counts: false, RuleCatalog.ChargeSharing),
        };
    }
#pragma warning restore RS1001
}
