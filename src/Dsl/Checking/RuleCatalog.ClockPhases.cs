namespace Phaseward.Checking;

// PW1xxx: clock phases — latches transparent together, overlap races, clock crossings, clock-gate enables, loops with no storage.
public static partial class RuleCatalog
{
    /// <summary>Two latches transparent in the same window in series (or a latch feeding itself in its own phase).</summary>
    public static RuleDescriptor SameWindowLatches { get; } = new(
        "PW1001", RuleFamily.ClockPhases, Severity.Warning,
        title: "Latches transparent in the same phase are in series",
        messageFormat: "Latch '{0}' takes its data from latch '{1}' and both are transparent in {2}: data can run through both "
            + "in one phase",
        description: "A data path runs from one latch's storage node to another latch's input through logic only, and both "
            + "latches are transparent together, on the design's time base, for longer than the overlap allowance (a "
            + "quarter of the shorter window): the same phase, a gated copy or a slightly delayed copy. "
            + "Data launched through the first latch runs straight on through the second in the same phase, so the "
            + "pair stores nothing for a cycle. Put the second latch on the complementary phase, or insert a latch of "
            + "the complementary phase between them. Structural check on the clock windows.");

    /// <summary>A latch pair on complementary phases races through the clock overlap.</summary>
    public static RuleDescriptor OverlapRace { get; } = new(
        "PW1002", RuleFamily.ClockPhases, Severity.Warning,
        title: "Clock overlap lets data race through complementary latches",
        messageFormat: "Latch '{0}' races latch '{1}' through the {2} overlap of {3}: the fastest path takes {4} while both "
            + "pass gates conduct together for {5}, a margin of {6}, below the required {7} ({8})",
        description: "Two latches in series are both transparent for a short time: the 1-1 or 0-0 overlap of a clock and its "
            + "late complement, or a partial overlap of shifted or different clocks on the design's time base. "
            + "Data entering the first latch when it opens must not reach the second latch's storage node before the "
            + "second latch closes: the shortest delay through the first latch, the path and the second latch's pass "
            + "gate must exceed the overlap by at least phaseward.min_race_margin. "
            + "For a master-slave register this is t(TG1) + t(I1) + t(TG2) against the 0-0 overlap (rising-edge "
            + "register). First-order estimate at the fast corner (every delay times the process's fast-corner factor).");

    /// <summary>Data crosses between clocks with no fixed time relation without a synchronizer.</summary>
    public static RuleDescriptor ClockCrossing { get; } = new(
        "PW1003", RuleFamily.ClockPhases, Severity.Warning,
        title: "Data crosses between unrelated clocks without a synchronizer",
        messageFormat: "'{0}' on clock '{1}' takes data from latch '{2}' on clock '{3}', which has no fixed time relation to it "
            + "({4}), without a synchronizer: it can sample the data while it changes and go metastable",
        description: "Data launched by a latch on one clock reaches a storage stage on a clock with no fixed time relation to "
            + "it (declared independent, or with a period that shares no small common cycle). "
            + "The receiving stage can sample the data while it changes and go metastable. "
            + "Put two registers of the receiving clock in series, with no logic between, where the data arrives (a "
            + "synchronizer), and move multi-bit data with a handshake or a FIFO. "
            + "Structural check; it does not estimate the mean time between failures.");

    /// <summary>A clock gate's enable can change while the gate passes the clock.</summary>
    public static RuleDescriptor ClockGateEnable { get; } = new(
        "PW1004", RuleFamily.ClockPhases, Severity.Warning,
        title: "Clock gate's enable can change while the gate passes the clock",
        messageFormat: "Clock gate '{0}' passes clock '{1}' during {2} (while it is {3}), but its enable '{4}' can change {5}: "
            + "the gated clock can be clipped or get an extra pulse",
        description: "A clock gate that stops low passes its clock while the clock is high; if its enable changes then, the "
            + "gated clock gets a clipped or an extra pulse. "
            + "The enable must come, through logic, from storage transparent only while the clock is low, and arrive "
            + "(latest data through that storage plus the path) before the clock rises; the mirror holds for a gate "
            + "that stops high. Primary inputs are taken as stable unless phaseward.clock_gate_inputs_may_change is "
            + "true. Latch the enable on the phase in which the gate blocks the clock. The enable path's delay is a first-order "
            + "estimate at the slow corner (every delay times the process's slow-corner factor).");

    /// <summary>A feedback loop through restoring stages and data-controlled pass gates with no latch on it.</summary>
    public static RuleDescriptor LoopWithoutStorage { get; } = new(
        "PW1005", RuleFamily.ClockPhases, Severity.Warning,
        title: "Feedback loop with no storage element",
        messageFormat: "A feedback loop of {0} devices has no latch on it ({1}): {2}",
        description: "A loop of restoring stages and data-controlled pass gates that no clocked pass gate breaks holds no "
            + "storage element: with an odd number of inversions it oscillates when enabled (about twice the loop's "
            + "delay per period, first order), with an even number it settles at a level nothing writes, and its "
            + "timing cannot be analysed. A keeper loop, a cross-coupled pair of inverting stages and a latch's own "
            + "feedback (a pass gate on the inverse of the writing gate's control) are storage cells and are not "
            + "reported. Break the loop with a latch, or remove the feedback. The oscillation period is a first-order estimate.");
}
