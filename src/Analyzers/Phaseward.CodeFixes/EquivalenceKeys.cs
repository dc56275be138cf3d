namespace Phaseward.CodeFixes
{
    /// <summary>Public equivalence keys of Phaseward's code actions (FixAll groups actions by these).</summary>
    public static class EquivalenceKeys
    {
        public const string Prefix = "Phaseward.";

        // PW2001
        public const string InsertRestoringBuffer = Prefix + "PW2001.InsertRestoringBuffer";
        public const string InsertRestoringInverter = Prefix + "PW2001.InsertRestoringInverter";
    }
}
