using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Reflection;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Robustness;

/// <summary>
/// Runs every Phaseward analyzer (found by reflection) the way the editor and the compiler do, with a generous time bound:
/// a hang is a failure, not a speed figure (speed lives in benchmarks/).
/// </summary>
internal static class BoundedAnalysis
{
    /// <summary>
    /// The device budget for the typing and mutation tests (the samples have fewer than a hundred devices). Half-typed code
    /// is often a loop that does not end yet; with the default budgets (2,000,000 devices, 10,000,000 steps) such a loop is
    /// still stopped, but only after seconds to tens of seconds on this class of machine (see BENCHMARKS.md), and thousands
    /// of variants must run in about a minute, so these tests set budgets as a project with small designs would. The
    /// device budget also bounds the latch paths: a loop that does not end and chains registers through logic (a ripple
    /// counter with no last bit) has a path from every register to every later one, so the timing rules' work grows with
    /// the square of its length (BENCHMARKS.md, "Open points"); at 20,000 devices one such variant took over 30 s.
    /// </summary>
    public const int TypingDeviceBudget = 2_000;

    /// <summary>The step budget for the same tests (the samples take under a thousand steps; the default is 10,000,000).</summary>
    public const int TypingStepBudget = 200_000;

    /// <summary>Far above what any analysis here needs (milliseconds); reaching it means the analyzer hangs.</summary>
    public static readonly TimeSpan HangBound = TimeSpan.FromSeconds(30);

    public static ImmutableArray<DiagnosticAnalyzer> Analyzers { get; } = typeof(PhasewardAnalyzer).Assembly.GetTypes()
        .Where(t => !t.IsAbstract && typeof(DiagnosticAnalyzer).IsAssignableFrom(t) && t.GetCustomAttribute<DiagnosticAnalyzerAttribute>() is not null)
        .OrderBy(t => t.Name, StringComparer.Ordinal)
        .Select(t => (DiagnosticAnalyzer)Activator.CreateInstance(t)!)
        .ToImmutableArray();

    public static CSharpParseOptions ParseOptions { get; } = new(LanguageVersion.Latest);

    /// <summary>The Quorvane sample sources (path, text), in file-name order.</summary>
    public static IReadOnlyList<(string Path, string Text)> Samples { get; } = System.IO.Directory
        .GetFiles(Repository.PathOf("samples", "Quorvane"), "*.cs")
        .OrderBy(p => p, StringComparer.Ordinal)
        .Select(p => ("/samples/Quorvane/" + System.IO.Path.GetFileName(p), System.IO.File.ReadAllText(p)))
        .ToList();

    public static CSharpCompilation Compile(IEnumerable<SyntaxTree> trees, string name = "Robustness")
        => CSharpCompilation.Create(name, trees, PhasewardTest.References,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));

    public static SyntaxTree Parse(string path, string text) => CSharpSyntaxTree.ParseText(text, ParseOptions, path, System.Text.Encoding.UTF8);

    /// <summary>
    /// Analyses one document as the editor does (semantic diagnostics of that document) and fails on an analyzer exception
    /// (AD0001 or the exception callback), on an internal elaborator failure reported as PW9001, or on a hang.
    /// </summary>
    public static async Task<ImmutableArray<Diagnostic>> DocumentAsync(Compilation compilation, SyntaxTree tree, string what)
    {
        var failures = new List<string>();
        var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty, TypingOptions.Instance),
            (e, analyzer, _) => { lock (failures) failures.Add(analyzer.GetType().Name + ": " + e); }, concurrentAnalysis: false, logAnalyzerExecutionTime: false);
        var withAnalyzers = compilation.WithAnalyzers(Analyzers, options);
        using var bound = new CancellationTokenSource(HangBound);
        var model = withAnalyzers.Compilation.GetSemanticModel(tree);
        var analysis = Task.Run(() => withAnalyzers.GetAnalyzerSemanticDiagnosticsAsync(model, null, bound.Token));
        if (await Task.WhenAny(analysis, Task.Delay(HangBound + TimeSpan.FromSeconds(10))) != analysis)
            throw new Xunit.Sdk.XunitException($"Analysis of {what} did not stop within {HangBound.TotalSeconds:N0} s even when cancelled (hang).");
        ImmutableArray<Diagnostic> diagnostics;
        try
        {
            diagnostics = await analysis;
        }
        catch (OperationCanceledException) when (bound.IsCancellationRequested)
        {
            throw new Xunit.Sdk.XunitException($"Analysis of {what} ran past {HangBound.TotalSeconds:N0} s (hang).");
        }

        Assert.True(failures.Count == 0, $"Analyzer exception on {what}:\n{string.Join("\n", failures)}");
        var ad0001 = diagnostics.FirstOrDefault(d => d.Id == "AD0001");
        Assert.True(ad0001 is null, $"AD0001 on {what}: {ad0001}");
        var internalFailure = diagnostics.FirstOrDefault(d => d.Id == RuleCatalog.NotElaborated.Id && d.GetMessage().Contains("failed on it"));
        Assert.True(internalFailure is null, $"The elaborator failed internally on {what}: {internalFailure}");
        return diagnostics;
    }
}

/// <summary>The analyzer options of the typing tests: the device and step budgets of <see cref="BoundedAnalysis"/>.</summary>
internal sealed class TypingOptions : AnalyzerConfigOptionsProvider
{
    public static readonly TypingOptions Instance = new();

    private static readonly Options Values = new();

    public override AnalyzerConfigOptions GlobalOptions => Values;

    public override AnalyzerConfigOptions GetOptions(SyntaxTree tree) => Values;

    public override AnalyzerConfigOptions GetOptions(AdditionalText textFile) => Values;

    private sealed class Options : AnalyzerConfigOptions
    {
        public override bool TryGetValue(string key, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out string? value)
        {
            value = key switch
            {
                "phaseward.elaboration_device_budget" => BoundedAnalysis.TypingDeviceBudget.ToString(System.Globalization.CultureInfo.InvariantCulture),
                "phaseward.elaboration_step_budget" => BoundedAnalysis.TypingStepBudget.ToString(System.Globalization.CultureInfo.InvariantCulture),
                _ => null,
            };
            return value is not null;
        }
    }
}
