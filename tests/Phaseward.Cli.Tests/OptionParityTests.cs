using System;
using System.Collections.Immutable;
using System.Globalization;
using System.IO;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;
using Phaseward.Cli.Policy;
using Phaseward.Configuration;
using AnalyzerOptions = Phaseward.Analyzers.Options.PhasewardOptions;

namespace Phaseward.Cli.Tests;

/// <summary>
/// The same <c>phaseward.</c> values, written in an .editorconfig, read by the analyzers (from the options the compiler
/// hands them for a file) and by the report tool (from the same file, and from its command line): the same policy and
/// the same problems, and the value each case expects.
/// </summary>
public sealed class OptionParityTests : IDisposable
{
    private readonly string directory = CliRun.NewTempDirectory();

    public void Dispose() => Directory.Delete(directory, recursive: true);

    // Expected: the value read ("invalid": refused, the default applies and the problem is reported).
    [Theory]
    [InlineData("phaseward.max_series_pass_gates", "1_000", "1000")]
    [InlineData("phaseward.max_series_pass_gates", " 4 ", "4")]
    [InlineData("phaseward.max_series_pass_gates", "10_000", "10000")]
    [InlineData("phaseward.max_series_pass_gates", "10001", "invalid")]
    [InlineData("phaseward.max_series_pass_gates", "0", "invalid")]
    [InlineData("phaseward.max_series_pass_gates", "four", "invalid")]
    [InlineData("phaseward.max_series_pass_gates", "4.5", "invalid")]
    [InlineData("phaseward.min_race_margin", "20ps", "2E-11")]
    [InlineData("phaseward.min_race_margin", "0.2 ns", "2E-10")]
    [InlineData("phaseward.min_race_margin", "1us", "1E-06")]
    [InlineData("phaseward.min_race_margin", "20", "invalid")]
    [InlineData("phaseward.min_race_margin", "-5ps", "invalid")]
    [InlineData("phaseward.min_race_margin", "5 parsecs", "invalid")]
    [InlineData("phaseward.min_timing_slack", "0.1ns", "1E-10")]
    [InlineData("phaseward.min_timing_slack", "soon", "invalid")]
    [InlineData("phaseward.keeper_write_margin", "0.25", "0.25")]
    [InlineData("phaseward.keeper_write_margin", "0.5", "invalid")]
    [InlineData("phaseward.keeper_write_margin", "-0.1", "invalid")]
    [InlineData("phaseward.clock_gate_inputs_may_change", "True", "True")]
    [InlineData("phaseward.clock_gate_inputs_may_change", "yes", "invalid")]
    public void AnalyzersAndReportReadAnOptionAlike(string key, string value, string expected)
    {
        var config = Path.Combine(directory, ".editorconfig");
        var source = Path.Combine(directory, "Designs", "Buoy.cs");
        File.WriteAllText(config, $"root = true\n\n[*.cs]\n{key} = {value}\n");

        // The analyzers: the options the compiler gives them for the file, read by the analyzers' own entry point.
        var compilerOptions = AnalyzerConfigSet.Create(new[] { AnalyzerConfig.Parse(File.ReadAllText(config), config) })
            .GetOptionsForSourcePath(source).AnalyzerOptions;
        var analyzers = AnalyzerOptions.Read(new CompilerOptions(compilerOptions));

        // The report tool: the same file through its configuration, for a design written in that source file.
        var (toolPolicy, toolProblems) = new ReportPolicy(ReportConfiguration.Load(new[] { config })).RulePolicyFor(source);

        Assert.Equal(Show(analyzers.Policy), Show(toolPolicy));
        Assert.Equal(analyzers.Problems.Select(p => p.ToString()), toolProblems.Select(p => p.ToString()));
        if (expected == "invalid")
        {
            var problem = Assert.Single(toolProblems);
            Assert.Equal((key, value.Trim()), (problem.Key, problem.Value.Trim()));
            Assert.Equal(Show(RulePolicy.Default), Show(toolPolicy));
        }
        else
        {
            Assert.Empty(toolProblems);
            Assert.Equal(expected, Read(toolPolicy, key));
        }

        // The tool's command line takes the same values through the same definition: the same value, or exit code 2.
        var definition = OptionCatalog.Find(key)!;
        var commandLine = new ReportPolicy();
        if (expected == "invalid")
        {
            var refused = Assert.Throws<InputException>(() => commandLine.SetOption(definition, value, "--option"));
            Assert.Contains(definition.Expected, refused.Message, StringComparison.Ordinal);
        }
        else
        {
            commandLine.SetOption(definition, value, "--option");
            Assert.Equal(Show(toolPolicy), Show(commandLine.RulePolicyFor(source).Policy));
        }
    }

    [Fact]
    public void ElaborationBudgetsAcceptSeparatorsAndRefuseWhatTheyCannotHold()
    {
        var options = ImmutableDictionary<string, string>.Empty
            .Add("phaseward.elaboration_step_budget", "50_000_000")
            .Add("phaseward.elaboration_recursion_limit", "513")
            .Add("phaseward.elaboration_memory_budget", "1_073_741_824");
        var read = AnalyzerOptions.Read(new CompilerOptions(options));
        Assert.Equal(50_000_000, read.Limits.StepBudget);
        Assert.Equal(OptionCatalog.DefaultRecursionLimit, read.Limits.RecursionLimit);
        Assert.Equal(1L << 30, read.Limits.MemoryBudget);
        Assert.Equal("phaseward.elaboration_recursion_limit", Assert.Single(read.Problems).Key);
    }

    private static string Show(RulePolicy p) => string.Join(" ", p.MaxSeriesPassGates?.ToString(CultureInfo.InvariantCulture) ?? "computed",
        p.MinimumRaceMargin.Seconds.ToString("R", CultureInfo.InvariantCulture), p.MinimumTimingSlack.Seconds.ToString("R", CultureInfo.InvariantCulture),
        p.KeeperWriteMargin.ToString("R", CultureInfo.InvariantCulture), p.EnablesFromInputsMayChange);

    private static string Read(RulePolicy p, string key) => key switch
    {
        "phaseward.max_series_pass_gates" => p.MaxSeriesPassGates?.ToString(CultureInfo.InvariantCulture) ?? "computed",
        "phaseward.min_race_margin" => p.MinimumRaceMargin.Seconds.ToString("G12", CultureInfo.InvariantCulture),
        "phaseward.min_timing_slack" => p.MinimumTimingSlack.Seconds.ToString("G12", CultureInfo.InvariantCulture),
        "phaseward.clock_gate_inputs_may_change" => p.EnablesFromInputsMayChange.ToString(),
        _ => p.KeeperWriteMargin.ToString("R", CultureInfo.InvariantCulture),
    };

    /// <summary>The options of one file as the compiler hands them to an analyzer.</summary>
    private sealed class CompilerOptions(ImmutableDictionary<string, string> values) : AnalyzerConfigOptions
    {
        public override bool TryGetValue(string key, out string value) => values.TryGetValue(key, out value!);
    }
}
