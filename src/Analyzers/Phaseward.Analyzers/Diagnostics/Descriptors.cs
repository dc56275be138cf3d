using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Diagnostics
{
    /// <summary>Every descriptor Phaseward reports, built from the rules' constant IDs and texts.</summary>
    internal static class Descriptors
    {
        public static readonly DiagnosticDescriptor DesignFound = DescriptorFactory.Create(
            RuleIds.DesignFound, RuleTexts.DesignFoundTitle, RuleTexts.DesignFoundMessage, RuleCategories.Elaboration,
            DiagnosticSeverity.Info, RuleTexts.DesignFoundDescription);

        public static readonly DiagnosticDescriptor SameWindowLatches = DescriptorFactory.Create(
            RuleIds.SameWindowLatches, RuleTexts.SameWindowLatchesTitle, RuleTexts.SameWindowLatchesMessage, RuleCategories.ClockPhases,
            DiagnosticSeverity.Warning, RuleTexts.SameWindowLatchesDescription);

        public static readonly DiagnosticDescriptor OverlapRace = DescriptorFactory.Create(
            RuleIds.OverlapRace, RuleTexts.OverlapRaceTitle, RuleTexts.OverlapRaceMessage, RuleCategories.ClockPhases,
            DiagnosticSeverity.Warning, RuleTexts.OverlapRaceDescription);

        public static readonly DiagnosticDescriptor RegisterSetup = DescriptorFactory.Create(
            RuleIds.RegisterSetup, RuleTexts.RegisterSetupTitle, RuleTexts.RegisterSetupMessage, RuleCategories.Timing,
            DiagnosticSeverity.Warning, RuleTexts.RegisterSetupDescription);

        public static readonly DiagnosticDescriptor RegisterHold = DescriptorFactory.Create(
            RuleIds.RegisterHold, RuleTexts.RegisterHoldTitle, RuleTexts.RegisterHoldMessage, RuleCategories.Timing,
            DiagnosticSeverity.Warning, RuleTexts.RegisterHoldDescription);

        public static readonly DiagnosticDescriptor LatchBorrowing = DescriptorFactory.Create(
            RuleIds.LatchBorrowing, RuleTexts.LatchBorrowingTitle, RuleTexts.LatchBorrowingMessage, RuleCategories.Timing,
            DiagnosticSeverity.Warning, RuleTexts.LatchBorrowingDescription);
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
