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

/// <summary>The same compilation analysed 20 times with concurrent execution gives identical diagnostics in identical order.</summary>
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

        var reference = await Render(compilation, concurrent: true);
        Assert.Equal(sequential.OrderBy(l => l, StringComparer.Ordinal), reference.OrderBy(l => l, StringComparer.Ordinal));
        for (var run = 1; run < 20; run++)
        {
            var lines = await Render(compilation, concurrent: true);
            Assert.Equal(reference, lines);
        }
    }

    private static async Task<IReadOnlyList<string>> Render(Compilation compilation, bool concurrent)
    {
        var failures = new List<Exception>();
        var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty),
            (e, _, _) => { lock (failures) failures.Add(e); }, concurrentAnalysis: concurrent, logAnalyzerExecutionTime: false);
        using var bound = new CancellationTokenSource(BoundedAnalysis.HangBound);
        var diagnostics = await compilation.WithAnalyzers(BoundedAnalysis.Analyzers, options).GetAnalyzerDiagnosticsAsync(bound.Token);
        Assert.Empty(failures);
        return diagnostics.Select(d => $"{d.Id} {d.Severity} {d.Location.GetLineSpan()} [{string.Join("; ", d.AdditionalLocations.Select(l => l.GetLineSpan().ToString()))}] " +
                                       $"{d.GetMessage()} {{{string.Join(", ", d.Properties.OrderBy(p => p.Key, StringComparer.Ordinal).Select(p => p.Key + "=" + p.Value))}}}")
            .ToList();
    }
}
