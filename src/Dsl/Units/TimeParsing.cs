using System.Globalization;

namespace Phaseward;

public readonly partial struct Time
{
    /// <summary>What <see cref="TryParseDuration"/> accepts, for error messages.</summary>
    public const string DurationFormat = "a duration of zero or more with its unit, such as 5ps or 0.2ns (s, ms, us, ns, ps, fs)";

    /// <summary>
    /// Reads a duration of zero or more written with its unit, as in configuration files: <c>5ps</c>, <c>0.2 ns</c>,
    /// <c>1us</c> (s, ms, us or µs, ns, ps, fs; invariant culture). False for anything else.
    /// </summary>
    public static bool TryParseDuration(string? text, out Time value)
    {
        value = Zero;
        if (text is null)
            return false;
        var trimmed = text.Trim();
        var split = trimmed.Length;
        while (split > 0 && char.IsLetter(trimmed[split - 1]))
            split--;
        var scale = trimmed.Substring(split).ToLowerInvariant() switch
        {
            "s" => 1.0,
            "ms" => 1e-3,
            "us" or "µs" => 1e-6,
            "ns" => 1e-9,
            "ps" => 1e-12,
            "fs" => 1e-15,
            _ => double.NaN,
        };
        if (double.IsNaN(scale)
            || !double.TryParse(trimmed.Substring(0, split).Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var number)
            || number < 0 || double.IsInfinity(number))
            return false;
        value = new Time(number * scale);
        return true;
    }
}
