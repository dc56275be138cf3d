using System.Globalization;

namespace Phaseward.Checking;

/// <summary>
/// How finding property values are written (<see cref="FindingPropertyKeys"/>): figures as invariant round-trip
/// numbers in SI units, flags as "true"/"false", and the named values below.
/// </summary>
public static class FindingPropertyValues
{
    /// <summary><see cref="FindingPropertyKeys.IdleSeconds"/> when the gate declares no maximum idle time.</summary>
    public const string Unbounded = "unbounded";

    /// <summary><see cref="FindingPropertyKeys.Origin"/>: the enable comes from a latch on a related clock.</summary>
    public const string EnableFromLatch = "Latch";

    /// <summary><see cref="FindingPropertyKeys.Origin"/>: the enable comes from a latch whose clock has no fixed time
    /// relation to the gate's (a synchronizer's business, not a latch's).</summary>
    public const string EnableFromUnrelatedClock = "UnrelatedClock";

    /// <summary><see cref="FindingPropertyKeys.Origin"/>: the enable comes from a primary input.</summary>
    public const string EnableFromInput = "Input";

    /// <summary>A figure in SI units, invariant culture, round-trip format.</summary>
    public static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>A flag.</summary>
    public static string Flag(bool value) => value ? "true" : "false";
}
