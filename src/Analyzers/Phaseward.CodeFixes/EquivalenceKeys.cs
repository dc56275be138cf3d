namespace Phaseward.CodeFixes
{
    /// <summary>Public equivalence keys of Phaseward's code actions (FixAll groups actions by these).</summary>
    public static class EquivalenceKeys
    {
        public const string Prefix = "Phaseward.";

        // PW1001
        public const string SwitchLatchPhase = Prefix + "PW1001.SwitchLatchPhase";
        public const string InsertLatchBeforeRegister = Prefix + "PW1001.InsertLatchBeforeRegister";
    }
}
