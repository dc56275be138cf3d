namespace Phaseward.Checking;

// PW3xxx: dynamic storage — retention on stopped or slow clocks, charge sharing, fighting drivers, keepers.
public static partial class RuleCatalog
{
    /// <summary>A dynamic storage node floats while its gated clock is stopped, for longer than it retains its level.</summary>
    public static RuleDescriptor DynamicNodeOnGatedClock { get; } = new(
        "PW3001", RuleFamily.DynamicStorage, Severity.Warning,
        title: "Dynamic node on a clock that can be gated off",
        messageFormat: "Dynamic node '{0}' floats while gated clock '{1}' is stopped {2} (declared maximum idle time: {3}), but "
            + "keeps its level only {4} (C·ΔV/I_leak with C = {5}, ΔV = {6}, I_leak = {7} at the hot corner)",
        description: "A node driven only through pass devices, with no keeper or restoring feedback, holds its bit as charge. "
            + "When its clock gate stops the clock at a level that turns every driver off, leakage drains the node for "
            + "as long as the clock stays off; if the gate declares no maximum idle time, or one longer than the "
            + "node's retention time C·ΔV/I_leak, the bit can be lost. ΔV is what the node's droop allowance leaves after the "
            + "worst charge sharing on it (one budget per node, shared with PW3003). First-order, linear estimate with the "
            + "hot-corner leakage.");

    /// <summary>A running clock leaves a dynamic storage node floating for longer than it retains its level.</summary>
    public static RuleDescriptor ClockTooSlowForDynamicStorage { get; } = new(
        "PW3002", RuleFamily.DynamicStorage, Severity.Warning,
        title: "Clock too slow for dynamic storage",
        messageFormat: "Dynamic node '{0}' floats for up to {1} of every {2} period of clock '{3}', longer than its retention "
            + "time {4} (C·ΔV/I_leak with C = {5}, ΔV = {6}, I_leak = {7} at the hot corner); run the clock at {8} or faster",
        description: "A dynamic node is refreshed only while one of its pass devices conducts. "
            + "With the clock running, the longest stretch of each period in which all of them are off (from the "
            + "period, duty and complement skew) must be shorter than the node's retention time C·ΔV/I_leak, ΔV being what "
            + "the node's droop allowance leaves after the worst charge sharing on it (one budget per node, shared with "
            + "PW3003). First-order, linear estimate with the hot-corner leakage.");

    /// <summary>A pass device joins a charged floating node to another floating node and the shared level droops too far.</summary>
    public static RuleDescriptor ChargeSharing { get; } = new(
        "PW3003", RuleFamily.DynamicStorage, Severity.Warning,
        title: "Charge sharing corrupts a dynamic node",
        messageFormat: "When '{0}' conducts, floating node '{1}' (C1 = {2}) shares its charge with floating node '{3}' (C2 = "
            + "{4}{9}): a {5} level settles at {6}, a droop of {7}, more than the tolerated {8}",
        description: "A pass device that opens between a charged floating node and another floating node shares the charge "
            + "between them: the level settles at V·C1/(C1+C2), a droop of V·C2/(C1+C2) in the worst case (the other "
            + "node at the opposite level). C2 also counts the floating nodes one pass gate away from the other node "
            + "whose gates may conduct at the same time (not provably exclusive: state Circuit.Exclusive for one-hot "
            + "selects). Reported when the droop exceeds the node's droop allowance (the process's tolerated droop, by "
            + "default a quarter of the supply); what it leaves of the allowance is what leakage may take (PW3001, "
            + "PW3002). First-order estimate by conservation of charge.");

    /// <summary>Two or more conducting paths drive one net at the same time.</summary>
    public static RuleDescriptor FightingDrivers { get; } = new(
        "PW3004", RuleFamily.DynamicStorage, Severity.Warning,
        title: "Drivers fight on one node",
        messageFormat: "'{0}' ({1}) and '{2}' ({3}) drive node '{4}' together {5}: when they disagree the node sits at {6} "
            + "(divider, '{0}' pulling up) and {7} flows from rail to rail",
        description: "Two drivers that can conduct at the same time onto one net fight when they disagree: static current "
            + "flows from rail to rail and the node settles at a divider of the two paths' resistances, an undefined "
            + "level that may read either way. Counted: two restoring stages; a stage and a pass gate; clocked gates "
            + "whose windows overlap; data-controlled gates whose controls are not provably exclusive "
            + "(Circuit.Exclusive, or a control and its inverse). First-order estimate.");

    /// <summary>A keeper stronger than the write path of its node: a write cannot flip it.</summary>
    public static RuleDescriptor KeeperTooStrong { get; } = new(
        "PW3005", RuleFamily.DynamicStorage, Severity.Warning,
        title: "Keeper too strong for its write path",
        messageFormat: "Keeper '{0}' ({1}) is too strong for the write path through '{2}' ({3}): writing a 0 against it pulls "
            + "node '{4}' only down to {5}, above the {6} it must reach (switching point {7} less a {8} margin; a 1 "
            + "mirrors this)",
        description: "A write against a keeper is a voltage divider: the node reaches V·R_w/(R_w + R_k), with R_w the write "
            + "path (driver plus pass gates in series) and R_k the keeper. "
            + "Unless that level gets past the switching point (half the supply) by a margin "
            + "(phaseward.keeper_write_margin, default 10 % of the supply), the write does not flip the node. "
            + "Make the keeper weaker (a larger resistance) or the write path stronger. First-order estimate.");
}
