namespace Phaseward.Analyzers.Elaboration;

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
