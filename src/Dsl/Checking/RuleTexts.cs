namespace Phaseward.Checking;

/// <summary>
/// Titles and message formats as constants, so that the analyzers' descriptors are built from compile-time constants
/// (the release-tracking analyzer reads them) and both front ends print the same words.
/// </summary>
public static class RuleTexts
{

    public const string SameWindowLatchesTitle = "Latches transparent in the same phase are in series";
    public const string SameWindowLatchesMessage = "Latch '{0}' takes its data from latch '{1}' and both are transparent in {2}: data can run through both in one phase";
    public const string SameWindowLatchesDescription = "A data path runs from one latch's storage node to another latch's input through logic only, and both latches are transparent together, on the design's time base, for longer than the overlap allowance (a quarter of the shorter window): the same phase, a gated copy or a slightly delayed copy. Data launched through the first latch runs straight on through the second in the same phase, so the pair stores nothing for a cycle. Put the second latch on the complementary phase, or insert a latch of the complementary phase between them.";

    public const string OverlapRaceTitle = "Clock overlap lets data race through complementary latches";
    public const string OverlapRaceMessage = "Latch '{0}' races latch '{1}' through the {2} overlap of {3}: the fastest path takes {4} while both pass gates conduct together for {5}, a margin of {6}, below the required {7}";
    public const string OverlapRaceDescription = "Two latches in series are both transparent for a short time: the 1-1 or 0-0 overlap of a clock and its late complement, or a partial overlap of shifted or different clocks on the design's time base. Data entering the first latch when it opens must not reach the second latch's storage node before the second latch closes: the shortest delay through the first latch, the path and the second latch's pass gate must exceed the overlap by at least phaseward.min_race_margin. For a master-slave register this is t(TG1) + t(I1) + t(TG2) against the 0-0 overlap (rising-edge register). First-order estimate, fast corner.";

    public const string ClockCrossingTitle = "Data crosses between unrelated clocks without a synchronizer";
    public const string ClockCrossingMessage = "'{0}' on clock '{1}' takes data from latch '{2}' on clock '{3}', which has no fixed time relation to it ({4}), without a synchronizer: it can sample the data while it changes and go metastable";
    public const string ClockCrossingDescription = "Data launched by a latch on one clock reaches a storage stage on a clock with no fixed time relation to it (declared independent, or with a period that shares no small common cycle). The receiving stage can sample the data while it changes and go metastable. Put two registers of the receiving clock in series, with no logic between, where the data arrives (a synchronizer), and move multi-bit data with a handshake or a FIFO. Structural check; it does not estimate the mean time between failures.";

    public const string ClockGateEnableTitle = "Clock gate's enable can change while the gate passes the clock";
    public const string ClockGateEnableMessage =
        "Clock gate '{0}' passes clock '{1}' during {2} (while it is {3}), but its enable '{4}' can change {5}: the gated clock can be clipped or get an extra pulse";
    public const string ClockGateEnableFromLatch = "during {0} (from latch '{1}', transparent in {2}, through a {3} path)";
    public const string ClockGateEnableUnrelated = "at any time (from latch '{0}', transparent in {1}, whose clock has no fixed time relation to '{2}')";
    public const string ClockGateEnableFromInput = "at any time (from primary input '{0}', taken as changing at any time by phaseward.clock_gate_inputs_may_change)";
    public const string ClockGateEnableDescription =
        "A clock gate that stops low passes its clock while the clock is high; if its enable changes then, the gated clock gets a clipped or an extra pulse. The enable must come, through logic, from storage transparent only while the clock is low, and arrive (latest data through that storage plus the path) before the clock rises; the mirror holds for a gate that stops high. Primary inputs are taken as stable unless phaseward.clock_gate_inputs_may_change is true. Latch the enable on the phase in which the gate blocks the clock.";

    public const string LoopWithoutStorageTitle = "Feedback loop with no storage element";
    public const string LoopWithoutStorageMessage = "A feedback loop of {0} devices has no latch on it ({1}): {2}";
    public const string LoopWithoutStorageOddLoop = "{0} inversions (odd): enabled, it oscillates with a period of about {1} (twice the loop's delay {2})";
    public const string LoopWithoutStorageEvenLoop = "{0} inversions (even): it settles at a level nothing writes";
    public const string LoopWithoutStorageTangledLoops = "loops that share nets, whose behaviour depends on their other inputs";
    public const string LoopWithoutStorageDescription = "A loop of restoring stages and data-controlled pass gates that no clocked pass gate breaks holds no storage element: with an odd number of inversions it oscillates when enabled (about twice the loop's delay per period, first order), with an even number it settles at a level nothing writes, and its timing cannot be analysed. A keeper loop, a cross-coupled pair of inverting stages and a latch's own feedback (a pass gate on the inverse of the writing gate's control) are storage cells and are not reported. Break the loop with a latch, or remove the feedback.";

    public const string RegisterSetupTitle = "Register setup time violated";
    public const string RegisterSetupMessage = "Register '{0}' misses its setup time on the path from register '{1}': clock-to-output {2} + path {3} + setup {4} = {5} exceeds the {6} available (slack {7})";
    public const string RegisterSetupDescription = "On a register-to-register path the launching register's clock-to-output, the slowest path and the capturing register's setup time must fit in the time between the launching and the capturing edge (a clock period, corrected for clock skew).";

    public const string RegisterHoldTitle = "Register hold time violated";
    public const string RegisterHoldMessage = "Register '{0}' can lose its data on the path from register '{1}': minimum clock-to-output {2} + shortest path {3} = {4} is less than its hold time {5} plus clock skew {6} (slack {7})";
    public const string RegisterHoldDescription = "New data launched by a register must not reach the next register's input before that register's master has closed: the shortest clock-to-output plus the shortest path must exceed the capturing register's hold time (the clock overlap after its edge) plus the clock skew between the two registers.";

    public const string LatchBorrowingTitle = "Latch path too slow even with time borrowing";
    public const string LatchBorrowingMessage = "Data from latch '{1}' reaches latch '{0}' {2} after '{0}' opens, but its phase ({3}) less its setup time and clock skew ({4}) allows only {5} (slack {6}; '{1}' had borrowed {7})";
    public const string LatchBorrowingDescription = "In a latch pipeline data may arrive at a latch after it opens and pass straight through (time borrowing), but it must arrive before the latch closes, less the latch's setup time and the clock skew. Borrowing is carried along the chain of latches to its steady state. First-order estimate, slow corner.";

    public const string LatchLoopTitle = "Latch loop gains time every cycle";
    public const string LatchLoopMessage = "The latch loop {0} ({1} paths) takes {2} round but its phases give it only {3}: each latch borrows {4} more every time round until one misses its window";
    public const string LatchLoopDescription = "Data going round a loop of latches must take no longer than the time between the loop's window openings added up round the loop. If the delays exceed it, every latch on the loop borrows more each cycle and the loop has no steady state; sooner or later data misses a window. First-order estimate, slow corner.";

    public const string LatchWriteWindowTitle = "Latch window too short to write its storage node";
    public const string LatchWriteWindowMessage =
        "Latch '{0}' cannot be written in its window: it is open {1}, {2} of it with both halves of its entry gate on (complement skew {3}), but the entry gate needs {4} to charge storage node '{5}' (0.69·R·C with R = {6}, C = {7}; margin {8})";
    public const string LatchWriteWindowDescription =
        "A latch's entry gate must charge its storage node while the latch is transparent. A window (less the complement skew at each end) shorter than the gate's RC delay into the node lets the latch close on its old value whatever the data's timing: a pulse latch with a short pulse and a heavy node is the usual case. First-order estimate.";
    public const string SeriesPassGatesTitle = "Pass gates in series without a restoring stage";
    public const string SeriesPassGatesMessage =
        "{0} pass gates in series without a restoring stage (limit {1}): Elmore delay {2} (50% estimate {3}); a restoring stage every {4} gates would give about {5}{6}";
    /// <summary>PW2001's {6} when its worst case counts branches not known to be exclusive as conducting together.</summary>
    public const string SeriesPassGatesAssumption =
        "; this worst case assumes that mux branches whose controls are not known to be exclusive conduct together (state Circuit.Exclusive to count them off)";
    public const string SeriesPassGatesDescription =
        "A chain of pass gates with no restoring stage is an RC ladder: its delay grows with the square of its length and its edges slow down. "
        + "The rule reports a chain longer than phaseward.max_series_pass_gates (default: the optimum restoring-stage spacing of the design's process, at least 2) "
        + "at its first gate beyond the limit. Figures are first-order estimates.";
    public const string DynamicNodeOnGatedClockTitle = "Dynamic node on a clock that can be gated off";
    public const string DynamicNodeOnGatedClockMessage =
        "Dynamic node '{0}' floats while gated clock '{1}' is stopped {2} (declared maximum idle time: {3}), but keeps its level only {4} (C·ΔV/I_leak with C = {5}, ΔV = {6}, I_leak = {7})";
    public const string DynamicNodeOnGatedClockDescription =
        "A node driven only through pass devices, with no keeper or restoring feedback, holds its bit as charge. When its clock gate stops the clock at a level that turns every driver off, leakage drains the node for as long as the clock stays off; if the gate declares no maximum idle time, or one longer than the node's retention time C·ΔV/I_leak, the bit can be lost. First-order, linear estimate.";

    public const string ClockTooSlowForDynamicStorageTitle = "Clock too slow for dynamic storage";
    public const string ClockTooSlowForDynamicStorageMessage =
        "Dynamic node '{0}' floats for up to {1} of every {2} period of clock '{3}', longer than its retention time {4} (C·ΔV/I_leak with C = {5}, ΔV = {6}, I_leak = {7}); run the clock at {8} or faster";
    public const string ClockTooSlowForDynamicStorageDescription =
        "A dynamic node is refreshed only while one of its pass devices conducts. With the clock running, the longest stretch of each period in which all of them are off (from the period, duty and complement skew) must be shorter than the node's retention time C·ΔV/I_leak. First-order, linear estimate.";

    public const string ChargeSharingTitle = "Charge sharing corrupts a dynamic node";
    public const string ChargeSharingMessage =
        "When '{0}' conducts, floating node '{1}' (C1 = {2}) shares its charge with floating node '{3}' (C2 = {4}): a {5} level settles at {6}, a droop of {7}, more than the tolerated {8}";
    public const string ChargeSharingDescription =
        "A pass device that opens between a charged floating node and another floating node shares the charge between them: the level settles at V·C1/(C1+C2), a droop of V·C2/(C1+C2) in the worst case (the other node at the opposite level). First-order estimate by conservation of charge.";
    public const string FightingDriversTitle = "Drivers fight on one node";
    public const string FightingDriversMessage =
        "'{0}' ({1}) and '{2}' ({3}) drive node '{4}' together {5}: when they disagree the node sits at {6} (divider, '{0}' pulling up) and {7} flows from rail to rail";
    public const string FightingDriversAlways = "all the time (two restoring stages)";
    public const string FightingDriversWhilePhase = "while {0} conducts ({1} per period)";
    public const string FightingDriversWhileControl = "whenever '{0}' is high";
    public const string FightingDriversWhileBothControls = "whenever '{0}' and '{1}' are both high (not stated exclusive)";
    public const string FightingDriversOverlap = "for {0} per period ({1} and {2} overlap)";
    public const string FightingDriversUnrelatedClocks = "whenever {0} and {1} conduct together (unrelated clocks)";
    public const string FightingDriversPhaseAndControl = "whenever '{1}' is high while {0} conducts";
    public const string FightingDriversDescription =
        "Two drivers that can conduct at the same time onto one net fight when they disagree: static current flows from rail to rail and the node settles at a divider of the two paths' resistances, an undefined level that may read either way. Counted: two restoring stages; a stage and a pass gate; clocked gates whose windows overlap; data-controlled gates whose controls are not provably exclusive (Circuit.Exclusive, or a control and its inverse). First-order estimate.";

    public const string KeeperTooStrongTitle = "Keeper too strong for its write path";
    public const string KeeperTooStrongMessage =
        "Keeper '{0}' ({1}) is too strong for the write path through '{2}' ({3}): writing a 0 against it pulls node '{4}' only down to {5}, above the {6} it must reach (switching point {7} less a {8} margin; a 1 mirrors this)";
    public const string KeeperTooStrongDescription =
        "A write against a keeper is a voltage divider: the node reaches V·R_w/(R_w + R_k), with R_w the write path (driver plus pass gates in series) and R_k the keeper. Unless that level gets past the switching point (half the supply) by a margin (phaseward.keeper_write_margin, default 10 % of the supply), the write does not flip the node. Make the keeper weaker (a larger resistance) or the write path stronger. First-order estimate.";

    public const string NotElaboratedTitle = "Part of the design could not be elaborated at compile time";
    public const string NotElaboratedMessage = "Phaseward could not elaborate {0} here: {1}; what depends on it is skipped and the rest of design '{2}' is still checked";
    public const string NotElaboratedDescription =
        "The compile-time elaborator interprets Describe() and the code it calls. Code outside the subset it understands is not guessed: " +
        "it is reported once, whatever depends on its value is skipped, and the rest of the design is still checked. Run Design.Check() " +
        "at run time to check the whole design.";

    public const string ElaborationBudgetExceededTitle = "Compile-time elaboration stopped at its budget";
    public const string ElaborationBudgetExceededMessage = "Phaseward stopped elaborating design '{0}' here: {1}; the part elaborated so far is still checked";
    public const string ElaborationBudgetExceededDescription =
        "A step budget (loop iterations and calls), a device budget and a call-depth limit keep the editor responsive when a loop or a " +
        "recursion does not end. Raise phaseward.elaboration_step_budget, phaseward.elaboration_device_budget or " +
        "phaseward.elaboration_recursion_limit if the design is merely large.";

    public const string DesignThrowsTitle = "The design throws while it is elaborated";
    public const string DesignThrowsMessage = "Design '{0}' throws here when it is elaborated: {1}";
    public const string DesignThrowsDescription =
        "A DSL call rejected its arguments (for example a negative capacitance), or the design's own code throws. At run time " +
        "Design.Elaborate() would stop here with this exception.";

    public const string InvalidOptionTitle = "Invalid Phaseward option";
    public const string InvalidOptionMessage = "The value '{1}' of option '{0}' is not valid: expected {2}; the default ({3}) is used";
    public const string InvalidOptionDescription =
        "A key prefixed 'phaseward.' in .editorconfig or .globalconfig has a value Phaseward cannot read. The default is used instead. " +
        "See docs/configuration.md for each key's format.";
}
