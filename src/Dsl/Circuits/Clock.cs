using Phaseward.Netlists;

namespace Phaseward;

/// <summary>How a clock came to be.</summary>
public enum ClockKind
{
    /// <summary>A free-running clock entering the design.</summary>
    Root,

    /// <summary>A copy of another clock that stops while its enable is low.</summary>
    Gated,

    /// <summary>A copy of another clock delayed by a clock buffer.</summary>
    Buffered,
}

/// <summary>The level a gated clock is held at while its enable is low.</summary>
public enum ClockStopLevel
{
    /// <summary>Held low: phases active on <see cref="ClockPolarity.Low"/> stay open, <see cref="ClockPolarity.High"/> ones stay shut.</summary>
    Low,

    /// <summary>Held high: phases active on <see cref="ClockPolarity.High"/> stay open, <see cref="ClockPolarity.Low"/> ones stay shut.</summary>
    High,
}

/// <summary>A clock and its two phases. Root clocks come from <see cref="Circuit.Clock"/>, derived ones from
/// <see cref="Circuit.ClockGate"/> and <see cref="Circuit.BufferedClock"/>.</summary>
public sealed class Clock
{
    private readonly Time? complementSkew;
    private readonly Time? delay;
    private readonly Time offset;
    private readonly bool independent;

    internal Clock(Circuit owner, int id, string name, ClockKind kind, Clock? source, Time period, double duty,
        Time? complementSkew, Time? delay, Net? enable, ClockStopLevel stopLevel, Time? maxIdle, SourceSpan span,
        Time offset = default, bool independent = false)
    {
        this.offset = offset;
        this.independent = independent;
        Owner = owner;
        Id = id;
        Name = name;
        Kind = kind;
        Source = source;
        Period = period;
        Duty = duty;
        this.complementSkew = complementSkew;
        this.delay = delay;
        Enable = enable;
        StopLevel = stopLevel;
        MaxIdle = maxIdle;
        Span = span;
        High = new Phase(this, ClockPolarity.High);
        Low = new Phase(this, ClockPolarity.Low);
    }

    internal Circuit Owner { get; }

    /// <summary>The clock's number in its circuit, in order of creation.</summary>
    public int Id { get; }

    /// <summary>The clock's name (with the scope of the block it was made in).</summary>
    public string Name { get; }

    /// <summary>Root, gated or buffered.</summary>
    public ClockKind Kind { get; }

    /// <summary>The clock this one is derived from (null for a root clock).</summary>
    public Clock? Source { get; }

    /// <summary>The root clock at the start of the derivation chain (itself for a root clock).</summary>
    public Clock Root => Source?.Root ?? this;

    /// <summary>The period (a derived clock has its root's period).</summary>
    public Time Period { get; }

    /// <summary>1 / <see cref="Period"/>.</summary>
    public Frequency Frequency => Period.ToFrequency();

    /// <summary>Fraction of the period during which the clock is high.</summary>
    public double Duty { get; }

    /// <summary>How late the complement arrives after the true clock (explicit, else the root's, else the process's).</summary>
    public Time ComplementSkew => complementSkew ?? Source?.ComplementSkew ?? Owner.Process.ComplementSkew;

    /// <summary>Delay this clock adds to its source (zero for root and gated clocks; a buffer without its own delay
    /// takes the stage delay of the process in force).</summary>
    public Time Delay => delay ?? Owner.Process.StageDelay;

    /// <summary>Where the root clock's rising edge lies on the design's time base (a derived clock: its root's).</summary>
    public Time Offset => Source?.Offset ?? offset;

    /// <summary>
    /// True when the root clock was declared independent (its own crystal): it has no fixed time relation to any
    /// clock outside its own derivation tree (a derived clock: its root's).
    /// </summary>
    public bool IsIndependent => Source?.IsIndependent ?? independent;

    /// <summary>When this clock rises on the design's time base, within its period: the root's offset plus the delay from the root.</summary>
    public Time RisingEdge => Offset + DelayFromRoot;

    /// <summary>Total delay from the root clock to this one.</summary>
    public Time DelayFromRoot => Delay + (Source?.DelayFromRoot ?? Time.Zero);

    /// <summary>The enable of a gated clock (null otherwise).</summary>
    public Net? Enable { get; }

    /// <summary>The level a gated clock holds while disabled.</summary>
    public ClockStopLevel StopLevel { get; }

    /// <summary>The longest time a gated clock is declared to stay disabled (null: unbounded).</summary>
    public Time? MaxIdle { get; }

    /// <summary>True if this clock, or any clock it derives from, is gated and so can stop.</summary>
    public bool CanStop => Kind == ClockKind.Gated || (Source?.CanStop ?? false);

    /// <summary>Where the clock was declared.</summary>
    public SourceSpan Span { get; }

    /// <summary>The phase in which the clock is high: latches on it are transparent while the clock is high.</summary>
    public Phase High { get; }

    /// <summary>The phase in which the clock is low (the complement, with its skew).</summary>
    public Phase Low { get; }

    /// <summary>The phase of this clock with the given polarity.</summary>
    public Phase this[ClockPolarity polarity] => polarity == ClockPolarity.High ? High : Low;

    /// <inheritdoc/>
    public override string ToString() => Name;
}
