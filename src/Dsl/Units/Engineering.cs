using System;
using System.Globalization;

namespace Phaseward;

/// <summary>Formats SI values with engineering prefixes and three significant digits ("1.25 ns").</summary>
public static class Engineering
{
    private static readonly string[] Prefixes = { "a", "f", "p", "n", "µ", "m", "", "k", "M", "G", "T" };
    private const int UnitPrefixIndex = 6;

    /// <summary><paramref name="value"/> with an SI prefix and <paramref name="unit"/>, to three significant digits.</summary>
    public static string Format(double value, string unit) => Format(value, unit, 3);

    /// <summary>
    /// Formats two values that a message compares with just enough significant digits (3 at least) to tell them
    /// apart, so that "floats for 270 µs, longer than its retention 270 µs" cannot happen.
    /// </summary>
    public static (string First, string Second) FormatApart(double first, double second, string unit)
    {
        for (var digits = 3; digits < 9; digits++)
        {
            var a = Format(first, unit, digits);
            var b = Format(second, unit, digits);
            if (a != b || first == second)
                return (a, b);
        }

        return (Format(first, unit, 9), Format(second, unit, 9));
    }

    /// <summary>Formats with the given number of significant digits (trailing zeros dropped).</summary>
    public static string Format(double value, string unit, int significantDigits)
    {
        if (double.IsNaN(value) || double.IsInfinity(value))
            return value.ToString(CultureInfo.InvariantCulture) + " " + unit;
        if (value == 0)
            return "0 " + unit;

        var exponent = (int)Math.Floor(Math.Log10(Math.Abs(value)) / 3);
        exponent = Math.Max(-UnitPrefixIndex, Math.Min(Prefixes.Length - 1 - UnitPrefixIndex, exponent));
        var scaled = value / Math.Pow(10, exponent * 3);
        // Rounding to three significant digits can carry into the next prefix (999.7 -> 1000).
        var rounded = RoundSignificant(scaled, significantDigits);
        if (Math.Abs(rounded) >= 1000 && exponent < Prefixes.Length - 1 - UnitPrefixIndex)
        {
            exponent++;
            rounded = RoundSignificant(value / Math.Pow(10, exponent * 3), significantDigits);
        }

        var pattern = "0." + new string('#', Math.Max(2, significantDigits - 1));
        return rounded.ToString(pattern, CultureInfo.InvariantCulture) + " " + Prefixes[exponent + UnitPrefixIndex] + unit;
    }

    private static double RoundSignificant(double value, int digits)
    {
        if (value == 0) return 0;
        var magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value))) + 1;
        var decimals = Math.Max(0, digits - magnitude);
        return Math.Round(value, decimals, MidpointRounding.AwayFromZero);
    }
}
