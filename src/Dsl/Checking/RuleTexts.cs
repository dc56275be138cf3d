namespace Phaseward
{
    /// <summary>
    /// Titles and message formats as constants, so that the analyzers' descriptors are built from compile-time constants
    /// (the release-tracking analyzer reads them) and both front ends print the same words.
    /// </summary>
    public static class RuleTexts
    {
        public const string NotElaboratedTitle = "Part of the design could not be elaborated at compile time";
        public const string NotElaboratedMessage = "Phaseward could not elaborate {0} here: {1}; what depends on it is skipped and the rest of design '{2}' is still checked";
        public const string NotElaboratedDescription =
            "The compile-time elaborator interprets Describe() and the code it calls. Code outside the subset it understands is not guessed: " +
            "it is reported once, whatever depends on its value is skipped, and the rest of the design is still checked. Run Design.Check() " +
            "at run time to check the whole design.";

        public const string ElaborationBudgetExceededTitle = "Compile-time elaboration stopped at its budget";
        public const string ElaborationBudgetExceededMessage = "Phaseward stopped elaborating design '{0}' here: {1}; the part elaborated so far is still checked";
        public const string ElaborationBudgetExceededDescription =
            "A step budget (loop iterations and calls) and a call-depth limit keep the editor responsive when a loop or a recursion does " +
            "not end. Raise phaseward.elaboration_step_budget or phaseward.elaboration_recursion_limit if the design is merely large.";

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
}
