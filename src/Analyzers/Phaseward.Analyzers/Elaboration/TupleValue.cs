namespace Phaseward.Analyzers.Elaboration;

/// <summary>A tuple built by interpreted code (<c>(a, b)</c>): its elements, in order.</summary>
internal sealed class TupleValue
{
    public TupleValue(object?[] items) => Items = items;

    public object?[] Items { get; }
}
