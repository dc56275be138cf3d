using System.Collections.Generic;
using System.Globalization;
using Microsoft.CodeAnalysis.Diagnostics;

namespace Phaseward.Analyzers.Options;

/// <summary>
/// Typed reads of <c>phaseward.</c> keys. A missing key gives the default; a value that cannot be used gives the
/// default and records a problem naming the key, the value and the expected format.
/// </summary>
internal sealed class OptionReader
{
    private readonly AnalyzerConfigOptions options;
    private readonly List<OptionProblem> problems;

    public OptionReader(AnalyzerConfigOptions options, List<OptionProblem> problems)
    {
        this.options = options;
        this.problems = problems;
    }

    /// <summary>A whole number in [min, max] (digits, optionally with '_' separators as in C#: 10_000_000).</summary>
    public long Integer(string key, long defaultValue, long min, long max)
    {
        if (!options.TryGetValue(key, out var text))
            return defaultValue;
        var cleaned = text.Trim().Replace("_", string.Empty);
        if (long.TryParse(cleaned, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value) && value >= min && value <= max)
            return value;
        problems.Add(new OptionProblem(key, text, $"a whole number from {Format(min)} to {Format(max)} (for example {Format(defaultValue)})", Format(defaultValue)));
        return defaultValue;
    }

    public int Integer(string key, int defaultValue, int min, int max) => (int)Integer(key, (long)defaultValue, min, max);

    /// <summary>A positive number (decimal point allowed, invariant culture).</summary>
    public double PositiveNumber(string key, double defaultValue)
    {
        if (!options.TryGetValue(key, out var text))
            return defaultValue;
        if (double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && value > 0 && !double.IsInfinity(value))
            return value;
        problems.Add(new OptionProblem(key, text, "a positive number such as " + defaultValue.ToString("R", CultureInfo.InvariantCulture),
            defaultValue.ToString("R", CultureInfo.InvariantCulture)));
        return defaultValue;
    }

    /// <summary>A whole number in [min, max], or null when the key is absent (the rule then derives its own value).</summary>
    public int? OptionalInteger(string key, int min, int max)
    {
        if (!options.TryGetValue(key, out var text))
            return null;
        var cleaned = text.Trim().Replace("_", string.Empty);
        if (int.TryParse(cleaned, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value) && value >= min && value <= max)
            return value;
        problems.Add(new OptionProblem(key, text, $"a whole number from {Format(min)} to {Format(max)}", "computed by the rule"));
        return null;
    }

    /// <summary>A number in [min, maxExclusive) (decimal point allowed, invariant culture).</summary>
    public double Number(string key, double defaultValue, double min, double maxExclusive)
    {
        if (!options.TryGetValue(key, out var text))
            return defaultValue;
        if (double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && value >= min && value < maxExclusive)
            return value;
        var shown = defaultValue.ToString("R", CultureInfo.InvariantCulture);
        problems.Add(new OptionProblem(key, text,
            $"a number from {min.ToString("R", CultureInfo.InvariantCulture)} up to (not including) {maxExclusive.ToString("R", CultureInfo.InvariantCulture)}, such as {shown}", shown));
        return defaultValue;
    }

    /// <summary>A duration of zero or more with its unit: <c>5ps</c>, <c>0.2 ns</c>, <c>1us</c> (s, ms, us/µs, ns, ps, fs).</summary>
    public Time Duration(string key, Time defaultValue)
    {
        if (!options.TryGetValue(key, out var text))
            return defaultValue;
        if (Time.TryParseDuration(text, out var value))
            return value;
        problems.Add(new OptionProblem(key, text, Time.DurationFormat, defaultValue.ToString()));
        return defaultValue;
    }

    /// <summary>true or false.</summary>
    public bool Boolean(string key, bool defaultValue)
    {
        if (!options.TryGetValue(key, out var text))
            return defaultValue;
        if (bool.TryParse(text.Trim(), out var value))
            return value;
        problems.Add(new OptionProblem(key, text, "true or false", defaultValue ? "true" : "false"));
        return defaultValue;
    }

    private static string Format(long value) => value.ToString(CultureInfo.InvariantCulture);
}
