using System.Collections.Generic;
using System.Linq;

namespace Phaseward
{
    /// <summary>Every rule's descriptor, keyed by ID: the one source of titles and messages for both front ends.</summary>
    public static class RuleCatalog
    {
        public static RuleDescriptor DesignFound { get; } = new(
            RuleIds.DesignFound, RuleTexts.DesignFoundTitle, RuleTexts.DesignFoundMessage, RuleCategories.Elaboration, Severity.Info, RuleTexts.DesignFoundDescription);

        public static RuleDescriptor SeriesPassGates { get; } = new(
            RuleIds.SeriesPassGates, RuleTexts.SeriesPassGatesTitle, RuleTexts.SeriesPassGatesMessage, RuleCategories.PassGatePaths, Severity.Warning,
            RuleTexts.SeriesPassGatesDescription);
        public static RuleDescriptor DynamicNodeOnGatedClock { get; } = new(
            RuleIds.DynamicNodeOnGatedClock, RuleTexts.DynamicNodeOnGatedClockTitle, RuleTexts.DynamicNodeOnGatedClockMessage,
            RuleCategories.DynamicStorage, Severity.Warning, RuleTexts.DynamicNodeOnGatedClockDescription);

        public static RuleDescriptor ClockTooSlowForDynamicStorage { get; } = new(
            RuleIds.ClockTooSlowForDynamicStorage, RuleTexts.ClockTooSlowForDynamicStorageTitle, RuleTexts.ClockTooSlowForDynamicStorageMessage,
            RuleCategories.DynamicStorage, Severity.Warning, RuleTexts.ClockTooSlowForDynamicStorageDescription);

        public static RuleDescriptor ChargeSharing { get; } = new(
            RuleIds.ChargeSharing, RuleTexts.ChargeSharingTitle, RuleTexts.ChargeSharingMessage,
            RuleCategories.DynamicStorage, Severity.Warning, RuleTexts.ChargeSharingDescription);

        public static IReadOnlyList<RuleDescriptor> All { get; } = new[]
        {
            SeriesPassGates,
            DesignFound,
            DynamicNodeOnGatedClock,
            ClockTooSlowForDynamicStorage,
            ChargeSharing,
        };

        private static readonly Dictionary<string, RuleDescriptor> ById = All.ToDictionary(d => d.Id);

        public static RuleDescriptor? Find(string id) => id is not null && ById.TryGetValue(id, out var descriptor) ? descriptor : null;
    }
}
