using System.Linq;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// A tuple built by interpreted code (<c>(a, b)</c>): its elements, in order. It prints, and compares as a key of a
/// library collection, as <c>ValueTuple</c> does: "(1, 2)", element by element.
/// </summary>
internal sealed class TupleValue
{
    public TupleValue(object?[] items) => Items = items;

    public object?[] Items { get; }

    /// <summary>As <c>ValueTuple.ToString()</c>: the elements' texts (null as nothing) between parentheses, ", " apart.</summary>
    public override string ToString() => "(" + string.Join(", ", Items.Select(Arithmetic.Text)) + ")";

    public override bool Equals(object? obj)
        => obj is TupleValue other && other.Items.Length == Items.Length && Items.Zip(other.Items, (a, b) => Equals(a, b)).All(same => same);

    // Used only by library collections to place keys (never shown to the design: its GetHashCode of a tuple is PW9001).
    public override int GetHashCode() => Items.Aggregate(17, (hash, item) => unchecked((hash * 31) + (item?.GetHashCode() ?? 0)));
}
