using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Diagnostics
{
    /// <summary>Every descriptor Phaseward reports, built from the rules' constant IDs and texts.</summary>
    internal static class Descriptors
    {
        public static readonly DiagnosticDescriptor DesignFound = DescriptorFactory.Create(
            RuleIds.DesignFound, RuleTexts.DesignFoundTitle, RuleTexts.DesignFoundMessage, RuleCategories.Elaboration,
            DiagnosticSeverity.Info, RuleTexts.DesignFoundDescription);

        public static readonly DiagnosticDescriptor SeriesPassGates = DescriptorFactory.Create(
            RuleIds.SeriesPassGates, RuleTexts.SeriesPassGatesTitle, RuleTexts.SeriesPassGatesMessage, RuleCategories.PassGatePaths,
            DiagnosticSeverity.Warning, RuleTexts.SeriesPassGatesDescription);
    }
}
