namespace Phaseward.Electrical;

/// <summary>
/// Which of the process's delay figures a check uses. Late-arrival checks (setup, borrowing, latch loops, write
/// windows, clock-gate enables) take the slow corner, early-arrival checks (races, hold) the fast corner, so that each
/// check is made where it is hardest to meet (common practice); the nominal figures are the ones the design gives.
/// </summary>
public enum Corner
{
    /// <summary>The process's figures as given (resistances, hence first-order delays, unscaled).</summary>
    Nominal,

    /// <summary>Every on-resistance, hence every first-order delay, times <see cref="Process.SlowDelayFactor"/>.</summary>
    Slow,

    /// <summary>Every on-resistance, hence every first-order delay, times <see cref="Process.FastDelayFactor"/>.</summary>
    Fast,
}
