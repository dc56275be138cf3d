namespace Phaseward.Rules.DynamicStorage;

/// <summary>Keys of the machine-readable properties the dynamic-storage rules attach to their findings (for code fixes and reports).</summary>
public static class DynamicStorageProperties
{
    /// <summary>The storage node's net name.</summary>
    public const string Node = "Node";

    /// <summary>The library cell that made the node ("DynamicLatch", "DynamicRegister", ...); absent for a hand-built node.</summary>
    public const string Cell = "Cell";

    /// <summary>The cell's instance name (absent for a hand-built node).</summary>
    public const string CellName = "CellName";

    /// <summary>The static cell that replaces the dynamic one with the same arguments ("StaticLatch" or "StaticRegister"); absent otherwise.</summary>
    public const string StaticReplacement = "StaticReplacement";

    /// <summary>PW3001: the gated clock whose stop isolates the node.</summary>
    public const string GatedClock = "GatedClock";

    /// <summary>PW3001: the nearest clock upstream of that gate that cannot stop (the clock to use instead).</summary>
    public const string UngatedClock = "UngatedClock";

    /// <summary>The root clock (PW3001: of the gate; PW3002: whose period is too long).</summary>
    public const string RootClock = "RootClock";

    /// <summary>The node's retention time in seconds (round-trip "R" format).</summary>
    public const string RetentionSeconds = "RetentionSeconds";

    /// <summary>PW3001: the declared maximum idle time in seconds, or "unbounded".</summary>
    public const string IdleSeconds = "IdleSeconds";

    /// <summary>PW3002: the longest isolation per period, in seconds.</summary>
    public const string IsolationSeconds = "IsolationSeconds";

    /// <summary>PW3002: the lowest safe root-clock frequency, in hertz.</summary>
    public const string MinimumFrequencyHertz = "MinimumFrequencyHertz";

    /// <summary>PW3003: the floating node the charge is shared with.</summary>
    public const string OtherNode = "OtherNode";

    /// <summary>PW3003: the droop in volts.</summary>
    public const string DroopVolts = "DroopVolts";

    /// <summary>The value of <see cref="IdleSeconds"/> when the gate declares no maximum idle time.</summary>
    public const string Unbounded = "unbounded";

    internal static string Number(double value) => value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
}
