namespace Phaseward.CodeFixes
{
    /// <summary>Public equivalence keys of Phaseward's code actions (FixAll groups actions by these).</summary>
    public static class EquivalenceKeys
    {
        public const string Prefix = "Phaseward.";
    }
}
