using System.Linq;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>A tuple built by interpreted code (<c>(a, b)</c>): its elements, in order. It prints as ValueTuple does: "(1, 2)".</summary>
/// <remarks>
/// Equal as ValueTuple is (element by element, each with its own Equals), so a tuple works as a dictionary key or set
/// element. Its hash only places it in the library's tables: .NET's ValueTuple hash is seeded per process, so a design
/// that reads one (<c>(1, 2).GetHashCode()</c>) is PW9001 before it gets here.
/// </remarks>
internal sealed class TupleValue
{
    public TupleValue(object?[] items) => Items = items;

    public object?[] Items { get; }

    /// <summary>As <c>ValueTuple.ToString()</c>: the elements' texts (null as nothing) between parentheses, ", " apart.</summary>
    public override string ToString() => "(" + string.Join(", ", Items.Select(Arithmetic.Text)) + ")";

    public override bool Equals(object? obj)
    {
        if (obj is not TupleValue other || other.Items.Length != Items.Length)
            return false;
        for (var i = 0; i < Items.Length; i++)
            if (!ElementsEqual(Items[i], other.Items[i]))
                return false;
        return true;
    }

    // As EqualityComparer<T>.Default does (no shortcut for the same reference: a design's Equals is called as at run time);
    // an element not known cannot be compared.
    private static bool ElementsEqual(object? item, object? other)
    {
        if (Unknown.Is(item) || Unknown.Is(other))
            throw new UnknownValueException();
        return item is null ? other is null : other is not null && item.Equals(other);
    }

    public override int GetHashCode()
    {
        var hash = Items.Length;
        foreach (var item in Items)
            hash = unchecked((hash * 31) + (item?.GetHashCode() ?? 0));
        return hash;
    }
}
