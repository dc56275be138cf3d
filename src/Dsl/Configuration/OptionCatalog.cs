using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;

namespace Phaseward.Configuration;

/// <summary>
/// Every <c>phaseward.</c> key, defined once: name, type, default, range and parser (docs/configuration.md describes
/// each). The analyzers read them from the compiler's options, the report tool from the same config files; a new
/// threshold is one definition here and one line in <see cref="RulePolicyOptions"/>.
/// </summary>
internal static class OptionCatalog
{
    /// <summary>
    /// Default step budget. A loop that makes one device per iteration through a helper method costs three steps per
    /// device (iteration, helper call, DSL call), so 1,000,000 such devices take 3,000,000 steps; an endless loop
    /// stops after 10,000,000 steps (about a second of interpretation).
    /// </summary>
    public const long DefaultStepBudget = 10_000_000;

    /// <summary>
    /// Default cap on the devices (primitives) one design may elaborate to. Steps bound the interpretation, but a runaway
    /// loop that makes devices costs far more per step (each device is kept, with its source span): this cap stops it
    /// before it takes the compiler's memory and minutes of time. Twice the largest design the benchmark measures.
    /// </summary>
    public const int DefaultDeviceBudget = 2_000_000;

    /// <summary>Default limit on nested calls of interpreted methods (recursion depth).</summary>
    public const int DefaultRecursionLimit = 64;

    /// <summary>The largest recursion limit accepted: deeper nesting would risk the compiler's own stack.</summary>
    public const int MaxRecursionLimit = 512;

    /// <summary>
    /// Default memory budget in bytes for what the design's own code allocates at compile time (arrays at 8 bytes an
    /// element, strings at 2 bytes a character, collections at 8 bytes an item; the netlist itself is bounded by the
    /// device budget). 256 MiB: far above any design's tables of nets and names, far below what would strain an editor.
    /// </summary>
    public const long DefaultMemoryBudget = 256L * 1024 * 1024;

    /// <summary>The largest memory budget accepted (4 GiB): a larger one would let a design take the editor's memory.</summary>
    public const long MaxMemoryBudget = 4L * 1024 * 1024 * 1024;

    public static PhasewardOption<long> ElaborationStepBudget { get; } =
        WholeNumber("phaseward.elaboration_step_budget", DefaultStepBudget, 1, long.MaxValue / 2);

    public static PhasewardOption<long> ElaborationRecursionLimit { get; } =
        WholeNumber("phaseward.elaboration_recursion_limit", DefaultRecursionLimit, 1, MaxRecursionLimit);

    public static PhasewardOption<long> ElaborationDeviceBudget { get; } =
        WholeNumber("phaseward.elaboration_device_budget", DefaultDeviceBudget, 1, int.MaxValue);

    public static PhasewardOption<long> ElaborationMemoryBudget { get; } =
        WholeNumber("phaseward.elaboration_memory_budget", DefaultMemoryBudget, 1, MaxMemoryBudget);

    /// <summary>PW2001's cap; absent, the rule computes the optimum spacing from the process.</summary>
    public static PhasewardOption<int?> MaxSeriesPassGates { get; } = OptionalWholeNumber("phaseward.max_series_pass_gates", 1, 10_000);

    public static PhasewardOption<Time> MinimumRaceMargin { get; } = Duration("phaseward.min_race_margin", RulePolicy.Default.MinimumRaceMargin);

    public static PhasewardOption<Time> MinimumTimingSlack { get; } = Duration("phaseward.min_timing_slack", RulePolicy.Default.MinimumTimingSlack);

    public static PhasewardOption<double> KeeperWriteMargin { get; } = NumberBelow("phaseward.keeper_write_margin", RulePolicy.Default.KeeperWriteMargin, 0, 0.5);

    /// <summary>The latch-to-latch path search's step budget (PW9005 when it is used up).</summary>
    public static PhasewardOption<long> LatchPathSearchBudget { get; } =
        WholeNumber("phaseward.latch_path_search_budget", RulePolicy.DefaultLatchPathSearchBudget, 1, long.MaxValue / 2);

    /// <summary>PW1004: whether a clock gate's enable that comes from a primary input may change at any time.</summary>
    public static PhasewardOption<bool> ClockGateInputsMayChange { get; } =
        TrueOrFalse("phaseward.clock_gate_inputs_may_change", RulePolicy.Default.EnablesFromInputsMayChange);

    public static IReadOnlyList<PhasewardOption> All { get; } = new PhasewardOption[]
    {
        ElaborationStepBudget, ElaborationRecursionLimit, ElaborationDeviceBudget, ElaborationMemoryBudget,
        MaxSeriesPassGates, MinimumRaceMargin, MinimumTimingSlack, KeeperWriteMargin, ClockGateInputsMayChange,
        LatchPathSearchBudget,
    };

    /// <summary>The definition of <paramref name="key"/> (any case), or null for a key Phaseward does not know.</summary>
    public static PhasewardOption? Find(string key)
    {
        foreach (var option in All)
            if (string.Equals(option.Key, key, System.StringComparison.OrdinalIgnoreCase))
                return option;
        return null;
    }

    /// <summary>A whole number in [min, max]: digits, optionally with '_' separators as in C# (10_000_000).</summary>
    public static bool TryParseWholeNumber(string text, long min, long max, out long value)
        => long.TryParse(text.Trim().Replace("_", string.Empty), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out value)
           && value >= min && value <= max;

    private static PhasewardOption<long> WholeNumber(string key, long defaultValue, long min, long max)
        => new(key, defaultValue, $"a whole number from {Text(min)} to {Text(max)} (for example {Text(defaultValue)})", Text(defaultValue),
            text => TryParseWholeNumber(text, min, max, out var value) ? (true, value) : (false, defaultValue));

    private static PhasewardOption<int?> OptionalWholeNumber(string key, int min, int max)
        => new(key, null, $"a whole number from {Text(min)} to {Text(max)}", "computed by the rule",
            text => TryParseWholeNumber(text, min, max, out var value) ? (true, (int?)value) : (false, null));

    private static PhasewardOption<Time> Duration(string key, Time defaultValue)
        => new(key, defaultValue, Time.DurationFormat, defaultValue.ToString(),
            text => Time.TryParseDuration(text, out var value) ? (true, value) : (false, defaultValue));

    /// <summary>A number in [min, maxExclusive) (decimal point allowed, invariant culture).</summary>
    private static PhasewardOption<double> NumberBelow(string key, double defaultValue, double min, double maxExclusive)
        => new(key, defaultValue, $"a number from {Text(min)} up to (not including) {Text(maxExclusive)}, such as {Text(defaultValue)}", Text(defaultValue),
            text => double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && value >= min && value < maxExclusive
                ? (true, value)
                : (false, defaultValue));

    private static PhasewardOption<bool> TrueOrFalse(string key, bool defaultValue)
        => new(key, defaultValue, "true or false", defaultValue ? "true" : "false",
            text => bool.TryParse(text.Trim(), out var value) ? (true, value) : (false, defaultValue));

    private static string Text(long value) => value.ToString(CultureInfo.InvariantCulture);

    private static string Text(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
