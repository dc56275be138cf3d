namespace Phaseward.Rules.ClockPhases;

/// <summary>Keys of the machine-readable properties that the clock-phase and timing findings carry (for code fixes and reports).</summary>
public static class FindingProperties
{
    /// <summary>Name of the latch (or register) the finding is reported at.</summary>
    public const string TargetLatch = "TargetLatch";

    /// <summary>Name of the latch (or register) that feeds it.</summary>
    public const string SourceLatch = "SourceLatch";

    /// <summary>The phase the reported latch is transparent in ("clk.High").</summary>
    public const string Phase = "Phase";

    /// <summary>The complementary phase of the same clock ("clk.Low"): what the PW1001 fix switches the latch to.</summary>
    public const string ComplementPhase = "ComplementPhase";

    /// <summary>The clock of the reported latch's phase (PW1003: the receiving clock).</summary>
    public const string Clock = "Clock";

    /// <summary>PW1003: the clock of the latch that sends the data.</summary>
    public const string SendingClock = "SendingClock";

    /// <summary>"High" or "Low": the reported latch's polarity.</summary>
    public const string Polarity = "Polarity";

    /// <summary>"High" or "Low": the other polarity.</summary>
    public const string ComplementPolarity = "ComplementPolarity";

    /// <summary>"true" when the reported latch is a register's master or slave (the fix inserts a latch instead of switching the phase).</summary>
    public const string IsRegisterStage = "IsRegisterStage";

    /// <summary>The register the reported latch belongs to, when it is a register stage.</summary>
    public const string Register = "Register";

    /// <summary>
    /// "true" when every clocked gate of the reported latch (entry and feedback) comes from its one call: a library
    /// latch or register, or a hand-built latch of a single clocked pass gate. Then changing the phase at that call
    /// switches the whole latch; otherwise ("false", e.g. a hand-built static latch whose feedback gate is another call)
    /// it would break the latch, and the PW1001 fix is not offered.
    /// </summary>
    public const string PhaseSetByOneCall = "PhaseSetByOneCall";

    /// <summary>A race margin or a timing slack, in seconds (invariant culture, round-trip format).</summary>
    public const string MarginSeconds = "MarginSeconds";
}
