using System;

namespace Phaseward.Tests.Support;

/// <summary>Comparisons of SI values that allow for the last bits of floating-point rounding.</summary>
internal static class Figures
{
    private const double RelativeTolerance = 1e-12;

    public static void Close(double expected, double actual)
        => Assert.True(Math.Abs(expected - actual) <= RelativeTolerance * Math.Max(Math.Abs(expected), Math.Abs(actual)),
            $"Expected {expected:R}, got {actual:R}.");

    public static void Close(Time expected, Time actual) => Close(expected.Seconds, actual.Seconds);

    public static void Close(Capacitance expected, Capacitance actual) => Close(expected.Farads, actual.Farads);

    public static void Close(Resistance expected, Resistance actual) => Close(expected.Ohms, actual.Ohms);

    public static void Close(Current expected, Current actual) => Close(expected.Amperes, actual.Amperes);
}
