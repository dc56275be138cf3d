namespace Phaseward.Clocking;

/// <summary>A half-open interval of time [Start, End) within a clock period.</summary>
public readonly struct TimeInterval
{
    /// <summary>The interval from <paramref name="start"/> to <paramref name="end"/>.</summary>
    public TimeInterval(Time start, Time end)
    {
        Start = start;
        End = end;
    }

    /// <summary>Where the interval starts.</summary>
    public Time Start { get; }

    /// <summary>Where the interval ends.</summary>
    public Time End { get; }

    /// <summary>End − Start.</summary>
    public Time Length => End - Start;

    /// <inheritdoc/>
    public override string ToString() => $"[{Start}, {End})";
}
