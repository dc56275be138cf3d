namespace Phaseward;

/// <summary>Which level of its clock a phase is active at.</summary>
public enum ClockPolarity
{
    High,
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

    public Clock Clock { get; }

    public ClockPolarity Polarity { get; }

    /// <summary>The opposite phase of the same clock.</summary>
    public Phase Complement => Polarity == ClockPolarity.High ? Clock.Low : Clock.High;

    public string Name => Clock.Name + "." + Polarity;

    public override string ToString() => Name;
}
