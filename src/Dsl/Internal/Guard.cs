using System;
using System.Globalization;

namespace Phaseward.Internal;

/// <summary>Argument checks that name the argument and the offending value.</summary>
internal static class Guard
{
    public static T NotNull<T>(T? value, string parameter) where T : class
        => value ?? throw new ArgumentNullException(parameter, $"'{parameter}' must not be null.");

    public static string Name(string? value, string parameter)
    {
        if (value is null)
            throw new ArgumentNullException(parameter, $"'{parameter}' must not be null.");
        if (value.Trim().Length == 0)
            throw new ArgumentException($"'{parameter}' must not be empty or white space (was \"{value}\").", parameter);
        return value;
    }

    public static double Positive(double value, string parameter, string unit)
    {
        if (double.IsNaN(value) || double.IsInfinity(value) || value <= 0)
            throw new ArgumentException($"'{parameter}' must be a positive, finite value (was {Describe(value, unit)}).", parameter);
        return value;
    }

    public static double NonNegative(double value, string parameter, string unit)
    {
        if (double.IsNaN(value) || double.IsInfinity(value) || value < 0)
            throw new ArgumentException($"'{parameter}' must be zero or a positive, finite value (was {Describe(value, unit)}).", parameter);
        return value;
    }

    public static double Fraction(double value, string parameter)
    {
        if (double.IsNaN(value) || value <= 0 || value >= 1)
            throw new ArgumentException($"'{parameter}' must lie strictly between 0 and 1 (was {value.ToString("R", CultureInfo.InvariantCulture)}).", parameter);
        return value;
    }

    private static string Describe(double value, string unit)
        => double.IsNaN(value) || double.IsInfinity(value)
            ? value.ToString(CultureInfo.InvariantCulture)
            : Engineering.Format(value, unit);
}
