using System;
using System.Collections.Immutable;
using System.Diagnostics;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Benchmarks;

namespace Phaseward.Analyzers.Tests.Robustness;

/// <summary>Analysis of a design of a million devices stops when cancelled (a generous bound: this is not a speed target).</summary>
public class CancellationTests
{
    private static readonly TimeSpan StopBound = TimeSpan.FromSeconds(30);

    [Fact]
    public async Task AnalysisOfAMillionDeviceLoopDesignStopsWhenCancelled()
    {
        var source = DesignGenerator.Generate(DesignShape.Loop, 1_000_000, "Million");
        var tree = BoundedAnalysis.Parse("/src/Million.cs", source);
        var compilation = BoundedAnalysis.Compile(new[] { tree }, "Million");
        Assert.Empty(compilation.GetDiagnostics().WhereErrors());

        var withAnalyzers = compilation.WithAnalyzers(BoundedAnalysis.Analyzers, new CompilationWithAnalyzersOptions(
            new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty), null, concurrentAnalysis: true, logAnalyzerExecutionTime: false));
        using var cancellation = new CancellationTokenSource();
        var analysis = Task.Run(() => withAnalyzers.GetAnalyzerDiagnosticsAsync(cancellation.Token));

        // Let the elaboration get well under way (a million devices take seconds), then cancel.
        await Task.WhenAny(analysis, Task.Delay(TimeSpan.FromSeconds(2)));
        Assert.False(analysis.IsCompleted, "The analysis finished before it could be cancelled; the test would prove nothing.");
        var watch = Stopwatch.StartNew();
        cancellation.Cancel();
        var finished = await Task.WhenAny(analysis, Task.Delay(StopBound));
        watch.Stop();

        Assert.True(finished == analysis, $"Analysis still running {StopBound.TotalSeconds:N0} s after cancellation.");
        await Assert.ThrowsAnyAsync<OperationCanceledException>(() => analysis);
    }
}

internal static class DiagnosticFilters
{
    public static System.Collections.Generic.IEnumerable<Diagnostic> WhereErrors(this ImmutableArray<Diagnostic> diagnostics)
        => System.Linq.Enumerable.Where(diagnostics, d => d.Severity == DiagnosticSeverity.Error);
}
