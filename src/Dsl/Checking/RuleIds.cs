namespace Phaseward
{
    /// <summary>
    /// The one list of Phaseward rule IDs. The first digit is the family: 1 clock phases, 2 pass-gate paths,
    /// 3 dynamic storage, 4 timing, 9 elaboration.
    /// </summary>
    public static class RuleIds
    {
        /// <summary>Part of a design could not be elaborated at compile time (outside the supported subset).</summary>
        public const string NotElaborated = "PW9001";

        /// <summary>Compile-time elaboration stopped: the step budget or the call-depth limit was reached.</summary>
        public const string ElaborationBudgetExceeded = "PW9002";

        /// <summary>The design throws while it is elaborated (a DSL call rejected its arguments, or the code throws).</summary>
        public const string DesignThrows = "PW9003";

        /// <summary>A <c>phaseward.</c> option in .editorconfig has a value that cannot be used.</summary>
        public const string InvalidOption = "PW9004";
    }
}
