namespace Phaseward.Checking;

// PW4xxx: timing — register setup and hold, latch borrowing, write windows, latch loops.
public static partial class RuleCatalog
{
    /// <summary>A register-to-register path misses the capturing register's setup time.</summary>
    public static RuleDescriptor RegisterSetup { get; } = new(
        "PW4001", RuleFamily.Timing, Severity.Warning,
        title: "Register setup time violated",
        messageFormat: "Register '{0}' misses its setup time on the path from register '{1}': clock-to-output {2} + path {3} + "
            + "setup {4} = {5} exceeds the {6} available (slack {7}; {8}){9}",
        description: "On a register-to-register path the launching register's clock-to-output, the slowest path and the "
            + "capturing register's setup time must fit in the time between the launching and the capturing edge (a "
            + "clock period, corrected for clock skew). First-order estimate at the slow corner (every delay times the "
            + "process's slow-corner factor). One finding per capturing register, for its worst path; the message counts the "
            + "other launching registers that fail it.");

    /// <summary>A register-to-register path is shorter than the capturing register's hold time (plus clock skew).</summary>
    public static RuleDescriptor RegisterHold { get; } = new(
        "PW4002", RuleFamily.Timing, Severity.Warning,
        title: "Register hold time violated",
        messageFormat: "Register '{0}' can lose its data on the path from register '{1}': minimum clock-to-output {2} + "
            + "shortest path {3} = {4} is less than its hold time {5} plus clock skew {6} (slack {7}; {8}){9}",
        description: "New data launched by a register must not reach the next register's input before that register's master "
            + "has closed: the shortest clock-to-output plus the shortest path must exceed the capturing register's "
            + "hold time (the clock overlap after its edge, less its master's pass-gate delay) plus the clock skew between the "
            + "two registers. First-order estimate at the fast corner (every delay times the process's fast-corner factor). "
            + "One finding per capturing register, for its worst path; the message counts the other launching registers "
            + "that fail it.");

    /// <summary>A two-phase latch path arrives after the capturing latch closes, even with time borrowing.</summary>
    public static RuleDescriptor LatchBorrowing { get; } = new(
        "PW4003", RuleFamily.Timing, Severity.Warning,
        title: "Latch path too slow even with time borrowing",
        messageFormat: "Data from latch '{1}' reaches latch '{0}' {2} after '{0}' opens, but its phase ({3}) less its setup "
            + "time and clock skew ({4}) allows only {5} (slack {6}; '{1}' had borrowed {7}; {8})",
        description: "In a latch pipeline data may arrive at a latch after it opens and pass straight through (time "
            + "borrowing), but it must arrive before the latch closes, less the latch's setup time and the clock skew. "
            + "Borrowing is carried along the chain of latches to its steady state. First-order estimate at the slow corner "
            + "(every delay times the process's slow-corner factor).");

    /// <summary>A latch's window is too short for its entry gate to write the storage node.</summary>
    public static RuleDescriptor LatchWriteWindow { get; } = new(
        "PW4004", RuleFamily.Timing, Severity.Warning,
        title: "Latch window too short to write its storage node",
        messageFormat: "Latch '{0}' cannot be written in its window: it is open {1}, {2} of it with both halves of its entry "
            + "gate on (complement skew {3}), but the entry gate needs {4} to charge storage node '{5}' (0.69·R·C with "
            + "R = {6}, C = {7}; margin {8}; {9})",
        description: "A latch's entry gate must charge its storage node while the latch is transparent. "
            + "A window (less the complement skew at each end) shorter than the gate's RC delay into the node lets the "
            + "latch close on its old value whatever the data's timing: a pulse latch with a short pulse and a heavy "
            + "node is the usual case. First-order estimate at the slow corner (R times the process's slow-corner factor).");

    /// <summary>A loop of latches whose delays exceed the time its phases give it: borrowing grows every cycle.</summary>
    public static RuleDescriptor LatchLoop { get; } = new(
        "PW4005", RuleFamily.Timing, Severity.Warning,
        title: "Latch loop gains time every cycle",
        messageFormat: "The latch loop {0} ({1} paths) takes {2} round but its phases give it only {3}: each latch borrows {4} "
            + "more every time round until one misses its window ({5})",
        description: "Data going round a loop of latches must take no longer than the time between the loop's window openings "
            + "added up round the loop. If the delays exceed it, every latch on the loop borrows more each cycle and "
            + "the loop has no steady state; sooner or later data misses a window. First-order estimate at the slow corner "
            + "(every delay times the process's slow-corner factor).");
}
