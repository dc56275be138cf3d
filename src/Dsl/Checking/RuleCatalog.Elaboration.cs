namespace Phaseward.Checking;

// PW9xxx: elaboration and analysis limits — what the compile-time elaborator could not do, searches stopped at their
// budgets, and invalid options.
public static partial class RuleCatalog
{
    /// <summary>Part of a design could not be elaborated at compile time (outside the supported subset).</summary>
    public static RuleDescriptor NotElaborated { get; } = new(
        "PW9001", RuleFamily.Elaboration, Severity.Warning,
        title: "Part of the design could not be elaborated at compile time",
        messageFormat: "Phaseward could not elaborate {0} here: {1}; what depends on it is skipped and the rest of design '{2}' "
            + "is still checked",
        description: "The compile-time elaborator interprets Describe() and the code it calls. "
            + "Code outside the subset it understands is not guessed: "
            + "it is reported once, whatever depends on its value is skipped, and the rest of the design is still "
            + "checked. Run Design.Check() "
            + "at run time to check the whole design.");

    /// <summary>Compile-time elaboration stopped: the step budget or the call-depth limit was reached.</summary>
    public static RuleDescriptor ElaborationBudgetExceeded { get; } = new(
        "PW9002", RuleFamily.Elaboration, Severity.Warning,
        title: "Compile-time elaboration stopped at its budget",
        messageFormat: "Phaseward stopped elaborating design '{0}' here: {1}; the part elaborated so far is still checked",
        description: "A step budget (loop iterations and calls), a device budget and a call-depth limit keep the editor "
            + "responsive when a loop or a "
            + "recursion does not end. Raise phaseward.elaboration_step_budget, phaseward.elaboration_device_budget or "
            + "phaseward.elaboration_recursion_limit if the design is merely large.");

    /// <summary>The design throws while it is elaborated (a DSL call rejected its arguments, or the code throws).</summary>
    public static RuleDescriptor DesignThrows { get; } = new(
        "PW9003", RuleFamily.Elaboration, Severity.Error,
        title: "The design throws while it is elaborated",
        messageFormat: "Design '{0}' throws here when it is elaborated: {1}",
        description: "A DSL call rejected its arguments (for example a negative capacitance), or the design's own code "
            + "throws. At run time "
            + "Design.Elaborate() would stop here with this exception.");

    /// <summary>A <c>phaseward.</c> option in .editorconfig has a value that cannot be used.</summary>
    public static RuleDescriptor InvalidOption { get; } = new(
        "PW9004", RuleFamily.Elaboration, Severity.Warning,
        title: "Invalid Phaseward option",
        messageFormat: "The value '{1}' of option '{0}' is not valid: expected {2}; the default ({3}) is used",
        description: "A key prefixed 'phaseward.' in .editorconfig or .globalconfig has a value Phaseward cannot read. "
            + "The default is used instead. "
            + "See docs/configuration.md for each key's format.");

    /// <summary>The latch-to-latch path search used up its budget: the paths from the remaining latches are not checked.</summary>
    public static RuleDescriptor LatchPathSearchStopped { get; } = new(
        "PW9005", RuleFamily.Elaboration, Severity.Warning,
        title: "Latch-to-latch path search stopped at its budget",
        messageFormat: "Phaseward stopped listing the latch-to-latch paths of design '{0}' at latch '{1}' after {2} search steps "
            + "(budget {3}): the {4} paths from the first {5} of {6} latches are checked, the paths from '{1}' and the {7} "
            + "latches after it are not",
        description: "Each latch's fan-out cone is searched up to the next latches; a long chain of logic through many "
            + "latches (a ripple counter, a chain of gates folding many latched bits) has a path for every pair of latches, so the "
            + "search grows with the square of the chain. A budget of steps bounds it. Past it, the rules that read the "
            + "paths (PW1001 to PW1004, PW4001 to PW4003 and PW4005) check only the paths listed. Raise "
            + "phaseward.latch_path_search_budget if the design is merely large.");
}
