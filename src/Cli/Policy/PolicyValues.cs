using System;
using System.Globalization;
using Phaseward.Checking;

namespace Phaseward.Cli.Policy;

/// <summary>
/// The rules' thresholds for the report: the <c>phaseward.</c> keys of the .editorconfig files above the input, then the
/// command-line options, with the same meaning and units as for the analyzers (docs/configuration.md).
/// </summary>
internal sealed class PolicyValues
{
    public const string MaxSeriesPassGatesKey = "phaseward.max_series_pass_gates";
    public const string MinimumRaceMarginKey = "phaseward.min_race_margin";
    public const string MinimumTimingSlackKey = "phaseward.min_timing_slack";

    public int? MaxSeriesPassGates { get; set; }

    public Time MinimumRaceMargin { get; set; } = RulePolicy.Default.MinimumRaceMargin;

    public Time MinimumTimingSlack { get; set; } = RulePolicy.Default.MinimumTimingSlack;

    public RulePolicy ToRulePolicy() => new()
    {
        MaxSeriesPassGates = MaxSeriesPassGates,
        MinimumRaceMargin = MinimumRaceMargin,
        MinimumTimingSlack = MinimumTimingSlack,
    };

    /// <summary>Sets one threshold from its key's text; <paramref name="where"/> names the file or option in the error.</summary>
    public bool TrySet(string key, string value, string where)
    {
        switch (key.ToLowerInvariant())
        {
            case MaxSeriesPassGatesKey:
                if (!int.TryParse(value.Trim(), NumberStyles.Integer, CultureInfo.InvariantCulture, out var gates) || gates < 1 || gates > 10_000)
                    throw Invalid(value, where, "a whole number of pass gates from 1 to 10000");
                MaxSeriesPassGates = gates;
                return true;
            case MinimumRaceMarginKey:
                MinimumRaceMargin = ParseDuration(value, where);
                return true;
            case MinimumTimingSlackKey:
                MinimumTimingSlack = ParseDuration(value, where);
                return true;
            default:
                return false;
        }
    }

    /// <summary>A duration of zero or more with its unit: 5ps, 0.2ns, 1 us (s, ms, us, µs, ns, ps, fs).</summary>
    public static Time ParseDuration(string text, string where)
        => Time.TryParseDuration(text, out var value) ? value : throw Invalid(text, where, Time.DurationFormat);

    private static InputException Invalid(string value, string where, string expected)
        => new($"the value '{value}' of {where} is not valid: expected {expected}");
}
