namespace Phaseward;

/// <summary>Which level of its clock a phase is active at.</summary>
public enum ClockPolarity
{
    /// <summary>While the clock is high.</summary>
    High,
    /// <summary>While the clock is low.</summary>
    Low,
}

/// <summary>One phase of a clock: <see cref="Clock.High"/> or <see cref="Clock.Low"/>. A pass gate on a phase conducts while it is active.</summary>
public sealed class Phase
{
    internal Phase(Clock clock, ClockPolarity polarity)
    {
        Clock = clock;
        Polarity = polarity;
    }

    /// <summary>The clock this phase belongs to.</summary>
    public Clock Clock { get; }

    /// <summary>High or low.</summary>
    public ClockPolarity Polarity { get; }

    /// <summary>The opposite phase of the same clock.</summary>
    public Phase Complement => Polarity == ClockPolarity.High ? Clock.Low : Clock.High;

    /// <summary>The clock's name and the polarity, as in <c>clk.High</c>.</summary>
    public string Name => Clock.Name + "." + Polarity;

    /// <inheritdoc/>
    public override string ToString() => Name;
}
