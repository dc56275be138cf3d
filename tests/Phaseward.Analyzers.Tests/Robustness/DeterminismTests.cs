using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Benchmarks;

namespace Phaseward.Analyzers.Tests.Robustness;

/// <summary>
/// The same compilation analysed 20 times with concurrent execution gives identical diagnostics in identical order: for every
/// document and analyzer the same diagnostics, reported in the same order, as in a sequential run.
/// </summary>
public class DeterminismTests
{
    [Fact]
    public async Task ConcurrentAnalysisIsDeterministic()
    {
        // Every sample (their hazards give findings of each family) and generated designs of both shapes, so several
        // documents and designs are analysed at once and share the per-compilation elaborations.
        var trees = BoundedAnalysis.Samples.Select(s => BoundedAnalysis.Parse(s.Path, s.Text)).ToList();
        trees.Add(BoundedAnalysis.Parse("/src/LoopLanes.cs", DesignGenerator.Generate(DesignShape.Loop, 20_000, "LoopLanes")));
        trees.Add(BoundedAnalysis.Parse("/src/StraightLanes.cs", DesignGenerator.Generate(DesignShape.StraightLine, 2_000, "StraightLanes")));
        var compilation = BoundedAnalysis.Compile(trees, "Determinism");

        var sequential = await Render(compilation, concurrent: false);
        Assert.Contains(sequential, line => line.StartsWith("PW1001", StringComparison.Ordinal));
        Assert.Contains(sequential, line => line.StartsWith("PW2001", StringComparison.Ordinal));
        Assert.Contains(sequential, line => line.StartsWith("PW3001", StringComparison.Ordinal));

        for (var run = 0; run < 20; run++)
            AssertSame(sequential, await Render(compilation, concurrent: true), $"concurrent run {run} vs the sequential run");
    }

    private static void AssertSame(IReadOnlyList<string> expected, IReadOnlyList<string> actual, string what)
    {
        if (expected.SequenceEqual(actual))
            return;
        var first = Enumerable.Range(0, Math.Min(expected.Count, actual.Count)).FirstOrDefault(i => expected[i] != actual[i], Math.Min(expected.Count, actual.Count));
        throw new Xunit.Sdk.XunitException($"{what}: {expected.Count} vs {actual.Count} diagnostics, first difference at {first}:\n" +
            $"expected: {(first < expected.Count ? expected[first] : "(end)")}\nactual:   {(first < actual.Count ? actual[first] : "(end)")}\n" +
            $"only expected: {string.Join("\n  ", expected.Except(actual).Take(5))}\nonly actual: {string.Join("\n  ", actual.Except(expected).Take(5))}");
    }

    private static async Task<IReadOnlyList<string>> Render(Compilation compilation, bool concurrent)
    {
        var failures = new List<Exception>();
        var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty),
            (e, _, _) => { lock (failures) failures.Add(e); }, concurrentAnalysis: concurrent, logAnalyzerExecutionTime: false);
        using var bound = new CancellationTokenSource(BoundedAnalysis.HangBound);
        var result = await compilation.WithAnalyzers(BoundedAnalysis.Analyzers, options).GetAnalysisResultAsync(bound.Token);
        Assert.Empty(failures);

        // Per document (by path) and per analyzer (by name), in the order the analyzer reported them. The order in which the
        // analyzer driver concatenates documents under concurrent execution is the driver's, not ours, and does vary.
        var lines = new List<string>();
        foreach (var (tree, byAnalyzer) in result.SemanticDiagnostics.OrderBy(e => e.Key.FilePath, StringComparer.Ordinal))
            foreach (var (analyzer, diagnostics) in byAnalyzer.OrderBy(e => e.Key.GetType().Name, StringComparer.Ordinal))
                lines.AddRange(diagnostics.Select(d => $"{d.Id} {d.Severity} {d.Location.GetLineSpan()} [{string.Join("; ", d.AdditionalLocations.Select(l => l.GetLineSpan().ToString()))}] " +
                    $"{d.GetMessage()} {{{string.Join(", ", d.Properties.OrderBy(p => p.Key, StringComparer.Ordinal).Select(p => p.Key + "=" + p.Value))}}} ({analyzer.GetType().Name})"));
        Assert.Equal(result.GetAllDiagnostics().Length, lines.Count);
        return lines;
    }
}
