namespace Phaseward
{
    /// <summary>
    /// Titles and message formats as constants, so that the analyzers' descriptors are built from compile-time constants
    /// (the release-tracking analyzer reads them) and both front ends print the same words.
    /// </summary>
    public static class RuleTexts
    {
        public const string DesignFoundTitle = "Phaseward checked a design";
        public const string DesignFoundMessage = "Phaseward checked design '{0}'";
        public const string DesignFoundDescription = "Reported once per design class to show that the Phaseward analyzers are loaded into the build.";
    }
}
