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
        public static readonly DiagnosticDescriptor DynamicNodeOnGatedClock = DescriptorFactory.Create(
            RuleIds.DynamicNodeOnGatedClock, RuleTexts.DynamicNodeOnGatedClockTitle, RuleTexts.DynamicNodeOnGatedClockMessage,
            RuleCategories.DynamicStorage, DiagnosticSeverity.Warning, RuleTexts.DynamicNodeOnGatedClockDescription);

        public static readonly DiagnosticDescriptor ClockTooSlowForDynamicStorage = DescriptorFactory.Create(
            RuleIds.ClockTooSlowForDynamicStorage, RuleTexts.ClockTooSlowForDynamicStorageTitle, RuleTexts.ClockTooSlowForDynamicStorageMessage,
            RuleCategories.DynamicStorage, DiagnosticSeverity.Warning, RuleTexts.ClockTooSlowForDynamicStorageDescription);

        public static readonly DiagnosticDescriptor ChargeSharing = DescriptorFactory.Create(
            RuleIds.ChargeSharing, RuleTexts.ChargeSharingTitle, RuleTexts.ChargeSharingMessage,
            RuleCategories.DynamicStorage, DiagnosticSeverity.Warning, RuleTexts.ChargeSharingDescription);
    }
}
