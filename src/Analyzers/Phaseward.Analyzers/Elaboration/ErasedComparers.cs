using System;
using System.Collections;
using System.Collections.Generic;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The library's own comparers (<c>StringComparer.Ordinal</c>) given to library code that runs with its type arguments
/// erased to object: an <c>IComparer&lt;string&gt;</c> is not an <c>IComparer&lt;object&gt;</c>, so it is passed through
/// its non-generic interface, which compares the same way.
/// </summary>
internal static class ErasedComparers
{
    /// <summary>The comparer as the erased parameter type wants it, or null when it is not such a comparer.</summary>
    public static object? Adapt(object value, Type type)
    {
        if (type == typeof(IComparer<object>) && value is IComparer comparer)
            return Comparer<object>.Create(comparer.Compare);
        if (type == typeof(IEqualityComparer<object>) && value is IEqualityComparer equality)
            return new EqualityAdapter(equality);
        return null;
    }

    private sealed class EqualityAdapter : IEqualityComparer<object>
    {
        private readonly IEqualityComparer inner;

        public EqualityAdapter(IEqualityComparer inner) => this.inner = inner;

        public new bool Equals(object? x, object? y) => inner.Equals(x, y);

        public int GetHashCode(object obj) => inner.GetHashCode(obj);

        // Two sets made with the same comparer take .NET's same-comparer paths (SymmetricExceptWith, SetEquals).
        public override bool Equals(object? obj) => obj is EqualityAdapter other && inner.Equals(other.inner);

        public override int GetHashCode() => inner.GetHashCode();
    }
}
