using System.Collections;
using System.Collections.Generic;
using System.Threading;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The writes the elaborator skipped (<see cref="SkippedEffects"/>), with when each was skipped: a variable last written
/// before a skipped write that may have reached it reads as unknown, never as the value it held. A field is skipped for
/// every object that has it (which object the skipped code wrote is not known), a captured local for every frame, and a
/// change to a collection for every collection the design held then (which one it changed is not known either).
/// </summary>
internal sealed class SkippedWrites
{
    // One clock for every variable of every interpreter: it moves only when a write is skipped.
    private static long clock;

    private readonly Dictionary<ISymbol, long> symbols = new(SymbolEqualityComparer.Default);

    // When a skipped write last may have changed a collection (0: never).
    private long collections;

    /// <summary>The time a write made now is stamped with (<see cref="Variable.Written"/>).</summary>
    public static long Now => Volatile.Read(ref clock);

    /// <summary>Whether any write was skipped so far (the common case is none: reads then pay nothing).</summary>
    public bool Any { get; private set; }

    public void Add(SkippedEffects.Effects effects)
    {
        if (effects.Symbols.Count == 0 && !effects.ChangesCollections)
            return;
        var at = Interlocked.Increment(ref clock);
        foreach (var symbol in effects.Symbols)
            symbols[symbol] = at;
        if (effects.ChangesCollections)
            collections = at;
        Any = true;
    }

    /// <summary>Whether some skipped code may have written <paramref name="symbol"/> (in any object or construction).</summary>
    public bool MayHaveWritten(ISymbol symbol) => symbols.ContainsKey(symbol.OriginalDefinition);

    /// <summary>Whether a skipped write may have changed what <paramref name="variable"/> (the storage of
    /// <paramref name="symbol"/>) holds since it was last written.</summary>
    public bool MayHaveChanged(Variable variable, ISymbol? symbol)
        => (symbol is not null && symbols.TryGetValue(symbol.OriginalDefinition, out var at) && variable.Written < at)
           || (variable.Written < collections && HoldsCollection(variable.Value));

    private static bool HoldsCollection(object? value) => value switch
    {
        string => false,
        IEnumerable or System.Text.StringBuilder => true,
        TupleValue tuple => System.Array.Exists(tuple.Items, HoldsCollection),
        _ => false,
    };
}
