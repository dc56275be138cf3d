using System.Globalization;

namespace Phaseward.Reproducers;

/// <summary>Numbers as SPICE reads them: plain SI values in invariant culture, round-trip precision.</summary>
internal static class SpiceNumbers
{
    /// <summary>Ten significant digits: enough for any figure here, without the last-digit noise of binary fractions.</summary>
    public static string Of(double value) => value.ToString("G10", CultureInfo.InvariantCulture);

    /// <summary>Round-trip precision, for the estimates a reader may compare exactly.</summary>
    public static string Exact(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    public static string Of(Time value) => Of(value.Seconds);
}
