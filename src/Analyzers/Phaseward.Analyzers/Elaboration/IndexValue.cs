namespace Phaseward.Analyzers.Elaboration;

/// <summary>A System.Index made by the design's code (<c>^1</c>); netstandard2.0 has no System.Index of its own.</summary>
internal readonly struct IndexValue
{
    public IndexValue(int value, bool fromEnd)
    {
        Value = value;
        FromEnd = fromEnd;
    }

    public int Value { get; }

    public bool FromEnd { get; }

    public int OffsetIn(int length) => FromEnd ? length - Value : Value;
}
