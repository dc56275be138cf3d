using System;
using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace Phaseward.Benchmarks;

/// <summary>
/// Reference (a): an analyzer that only has the compiler walk every IOperation tree of the compilation (an operation
/// action on every operation kind) and counts the operations. It reports nothing: the floor for any analyzer that
/// looks at operations.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class WalkAnalyzer : DiagnosticAnalyzer
{
    private static readonly DiagnosticDescriptor Never = new(
        "WALK0001", "Never reported", "Never reported", "Benchmark", DiagnosticSeverity.Hidden, isEnabledByDefault: true);

    private static readonly ImmutableArray<OperationKind> AllKinds = Enum.GetValues<OperationKind>()
        .Where(k => k != OperationKind.None).Distinct().ToImmutableArray();

    private long operations;

    public long Operations => Interlocked.Read(ref operations);

    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Never);

    public override void Initialize(AnalysisContext context)
    {
        context.EnableConcurrentExecution();
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.RegisterOperationAction(_ => Interlocked.Increment(ref operations), AllKinds);
    }
}
