using System;
using System.Collections.Concurrent;
using System.Runtime.CompilerServices;
using System.Threading;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The elaborations of one compilation, shared by every Phaseward analyzer: each design is elaborated once per set of
/// limits, whichever analyzer asks first, and the others reuse the netlist.
/// </summary>
internal sealed class CompilationElaborations
{
    private static readonly ConditionalWeakTable<Compilation, CompilationElaborations> Table = new();
    private static readonly ConditionalWeakTable<Compilation, CompilationElaborations>.CreateValueCallback Factory = Create;

    private readonly ConcurrentDictionary<(INamedTypeSymbol, ElaborationLimits), Lazy<ElaborationResult>> results = new(new KeyComparer());

    private CompilationElaborations(ElaborationSession? session) => Session = session;

    /// <summary>Null when the compilation does not reference the Phaseward DSL.</summary>
    public ElaborationSession? Session { get; }

    /// <summary>The shared state of a compilation, or null if it does not reference Phaseward.</summary>
    public static ElaborationSession? For(Compilation compilation) => Table.GetValue(compilation, Factory).Session;

    public static ElaborationResult Elaborate(ElaborationSession session, DesignInfo design, ElaborationLimits limits, CancellationToken cancellationToken)
    {
        var shared = Table.GetValue(session.Compilation, Factory);
        while (true)
        {
            var key = (design.Type, limits);
            var lazy = shared.results.GetOrAdd(key, _ => new Lazy<ElaborationResult>(
                () => DesignElaborator.Elaborate(session, design, limits, cancellationToken), LazyThreadSafetyMode.ExecutionAndPublication));
            try
            {
                return lazy.Value;
            }
            catch (OperationCanceledException)
            {
                // The elaboration was started under another analyzer's token that has been cancelled: forget it and, unless
                // this caller is cancelled too, elaborate again under this caller's token.
                ((System.Collections.Generic.ICollection<System.Collections.Generic.KeyValuePair<(INamedTypeSymbol, ElaborationLimits), Lazy<ElaborationResult>>>)shared.results)
                    .Remove(new System.Collections.Generic.KeyValuePair<(INamedTypeSymbol, ElaborationLimits), Lazy<ElaborationResult>>(key, lazy));
                cancellationToken.ThrowIfCancellationRequested();
            }
        }
    }

    private static CompilationElaborations Create(Compilation compilation)
    {
        var designType = compilation.GetTypeByMetadataName("Phaseward.Design");
        return new CompilationElaborations(designType is null ? null : new ElaborationSession(compilation, designType));
    }

    private sealed class KeyComparer : System.Collections.Generic.IEqualityComparer<(INamedTypeSymbol Type, ElaborationLimits Limits)>
    {
        public bool Equals((INamedTypeSymbol Type, ElaborationLimits Limits) x, (INamedTypeSymbol Type, ElaborationLimits Limits) y)
            => SymbolEqualityComparer.Default.Equals(x.Type, y.Type) && x.Limits.Equals(y.Limits);

        public int GetHashCode((INamedTypeSymbol Type, ElaborationLimits Limits) obj)
            => SymbolEqualityComparer.Default.GetHashCode(obj.Type) * 31 + obj.Limits.GetHashCode();
    }
}
