using System;
using Phaseward.Internal;

namespace Phaseward.Checking;

/// <summary>
/// Lint policy: thresholds that are a team's choice rather than a property of the design. The analyzers read it
/// from <c>.editorconfig</c> keys prefixed <c>phaseward.</c>; at run time pass one to <see cref="Design.Check"/>.
/// </summary>
public sealed class RulePolicy
{
    private readonly Time minimumRaceMargin = Time.Zero;
    private readonly Time minimumTimingSlack = Time.Zero;
    private readonly int? maxSeriesPassGates;
    private readonly double keeperWriteMargin = 0.1;
    private readonly long latchPathSearchBudget = DefaultLatchPathSearchBudget;

    /// <summary>
    /// The default of <see cref="LatchPathSearchBudget"/>: 5,000,000 steps. The benchmark's 10^6-device design takes
    /// 1.85 million (about 12 a path), so a design of that style at the compile-time device budget (2 million devices)
    /// fits with room to spare. A ripple chain, whose paths grow with the square of its length (about 3 steps a path),
    /// stops at about 1.7 million paths: a chain longer than about 1,800 registers has more (BENCHMARKS.md, "Latch paths").
    /// </summary>
    public const long DefaultLatchPathSearchBudget = 5_000_000;

    /// <summary>
    /// PW1004: false (default) takes a clock gate's enable that comes from a primary input as stable (the outside world
    /// changes it only while the gate blocks the clock); true takes it as changing at any time.
    /// Key <c>phaseward.clock_gate_inputs_may_change</c>.
    /// </summary>
    public bool EnablesFromInputsMayChange { get; init; }

    /// <summary>Every threshold at its default.</summary>
    public static RulePolicy Default { get; } = new();

    /// <summary>
    /// PW1002 reports a latch pair whose overlap race margin is below this (default 0: only negative margins).
    /// Key <c>phaseward.min_race_margin</c>. Zero or positive.
    /// </summary>
    public Time MinimumRaceMargin
    {
        get => minimumRaceMargin;
        init => minimumRaceMargin = new Time(Guard.NonNegative(value.Seconds, nameof(MinimumRaceMargin), "s"));
    }

    /// <summary>
    /// PW4001, PW4002 and PW4003 report a path, PW4004 a latch write window, whose slack is below this (default 0: only negative slack).
    /// Key <c>phaseward.min_timing_slack</c>. Zero or positive.
    /// </summary>
    public Time MinimumTimingSlack
    {
        get => minimumTimingSlack;
        init => minimumTimingSlack = new Time(Guard.NonNegative(value.Seconds, nameof(MinimumTimingSlack), "s"));
    }

    /// <summary>
    /// PW3005: how far past the switching point (half the supply) a write against a keeper must pull its node, as a
    /// fraction of the supply (default 0.1: 10 %). Key <c>phaseward.keeper_write_margin</c>. At least 0, below 0.5.
    /// </summary>
    public double KeeperWriteMargin
    {
        get => keeperWriteMargin;
        init
        {
            if (double.IsNaN(value) || value < 0 || value >= 0.5)
                throw new ArgumentException($"'{nameof(KeeperWriteMargin)}' must be at least 0 and below 0.5 of the supply (was {value.ToString("R", System.Globalization.CultureInfo.InvariantCulture)}).", nameof(KeeperWriteMargin));
            keeperWriteMargin = value;
        }
    }

    /// <summary>
    /// Steps the latch-to-latch path search may take (each net its searches reach and each path listed is a step;
    /// <see cref="Sequencing.LatchModel"/>). Past it the paths from the remaining latches are not listed, the rules
    /// that read paths (PW1001–PW1004, PW4001–PW4003, PW4005) check those listed, and PW9005 says so. Key
    /// <c>phaseward.latch_path_search_budget</c>. At least 1.
    /// </summary>
    public long LatchPathSearchBudget
    {
        get => latchPathSearchBudget;
        init
        {
            if (value < 1)
                throw new ArgumentException($"'{nameof(LatchPathSearchBudget)}' must be at least 1 step (was {value}).", nameof(LatchPathSearchBudget));
            latchPathSearchBudget = value;
        }
    }

    /// <summary>
    /// The most pass gates allowed in series without a restoring stage (PW2001; <c>phaseward.max_series_pass_gates</c>).
    /// Null: the optimum restoring-stage spacing computed from the design's process, but never below 2.
    /// </summary>
    public int? MaxSeriesPassGates
    {
        get => maxSeriesPassGates;
        init
        {
            if (value is < 1)
                throw new ArgumentException($"'{nameof(MaxSeriesPassGates)}' must be at least 1 pass gate (was {value}).", nameof(MaxSeriesPassGates));
            maxSeriesPassGates = value;
        }
    }
}
