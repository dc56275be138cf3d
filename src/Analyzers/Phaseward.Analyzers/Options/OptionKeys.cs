namespace Phaseward.Analyzers.Options;

/// <summary>The <c>phaseward.</c> keys read from .editorconfig / .globalconfig (documented in docs/configuration.md).</summary>
internal static class OptionKeys
{
    public const string ElaborationStepBudget = "phaseward.elaboration_step_budget";
    public const string ElaborationRecursionLimit = "phaseward.elaboration_recursion_limit";
    public const string ElaborationDeviceBudget = "phaseward.elaboration_device_budget";
    public const string ElaborationMemoryBudget = "phaseward.elaboration_memory_budget";
    public const string MaxSeriesPassGates = "phaseward.max_series_pass_gates";
    public const string MinimumRaceMargin = "phaseward.min_race_margin";
    public const string MinimumTimingSlack = "phaseward.min_timing_slack";
    public const string KeeperWriteMargin = "phaseward.keeper_write_margin";
    public const string ClockGateInputsMayChange = "phaseward.clock_gate_inputs_may_change";
}
