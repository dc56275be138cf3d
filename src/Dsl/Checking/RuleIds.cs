namespace Phaseward
{
    /// <summary>
    /// The one list of Phaseward rule IDs. The first digit is the family: 1 clock phases, 2 pass-gate paths,
    /// 3 dynamic storage, 4 timing, 9 elaboration.
    /// </summary>
    public static class RuleIds
    {
        /// <summary>Temporary: proves the analyzer loads into a real build (replaced by the compile-time elaborator).</summary>
        public const string DesignFound = "PW9000";

        /// <summary>Pass gates in series without a restoring stage.</summary>
        public const string SeriesPassGates = "PW2001";
    }
}
