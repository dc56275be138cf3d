namespace Phaseward.Clocking;

/// <summary>A half-open interval of time [Start, End) within a clock period.</summary>
public readonly struct TimeInterval
{
    public TimeInterval(Time start, Time end)
    {
        Start = start;
        End = end;
    }

    public Time Start { get; }

    public Time End { get; }

    public Time Length => End - Start;

    public override string ToString() => $"[{Start}, {End})";
}
