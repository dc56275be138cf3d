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

/// <summary>A System.Range made by the design's code (<c>1..^1</c>).</summary>
internal readonly struct RangeValue
{
    public RangeValue(IndexValue start, IndexValue end)
    {
        Start = start;
        End = end;
    }

    public IndexValue Start { get; }

    public IndexValue End { get; }
}
