using System.Collections.Generic;
using System.Linq;

namespace Phaseward
{
    /// <summary>Every rule's descriptor, keyed by ID: the one source of titles and messages for both front ends.</summary>
    public static class RuleCatalog
    {
        public static RuleDescriptor DesignFound { get; } = new(
            RuleIds.DesignFound, RuleTexts.DesignFoundTitle, RuleTexts.DesignFoundMessage, RuleCategories.Elaboration, Severity.Info, RuleTexts.DesignFoundDescription);

        public static RuleDescriptor SameWindowLatches { get; } = new(
            RuleIds.SameWindowLatches, RuleTexts.SameWindowLatchesTitle, RuleTexts.SameWindowLatchesMessage, RuleCategories.ClockPhases, Severity.Warning, RuleTexts.SameWindowLatchesDescription);

        public static RuleDescriptor OverlapRace { get; } = new(
            RuleIds.OverlapRace, RuleTexts.OverlapRaceTitle, RuleTexts.OverlapRaceMessage, RuleCategories.ClockPhases, Severity.Warning, RuleTexts.OverlapRaceDescription);

        public static RuleDescriptor RegisterSetup { get; } = new(
            RuleIds.RegisterSetup, RuleTexts.RegisterSetupTitle, RuleTexts.RegisterSetupMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.RegisterSetupDescription);

        public static RuleDescriptor RegisterHold { get; } = new(
            RuleIds.RegisterHold, RuleTexts.RegisterHoldTitle, RuleTexts.RegisterHoldMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.RegisterHoldDescription);

        public static RuleDescriptor LatchBorrowing { get; } = new(
            RuleIds.LatchBorrowing, RuleTexts.LatchBorrowingTitle, RuleTexts.LatchBorrowingMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.LatchBorrowingDescription);

        public static IReadOnlyList<RuleDescriptor> All { get; } = new[]
        {
            DesignFound,
            SameWindowLatches,
            OverlapRace,
            RegisterSetup,
            RegisterHold,
            LatchBorrowing,
        };

        private static readonly Dictionary<string, RuleDescriptor> ById = All.ToDictionary(d => d.Id);

        public static RuleDescriptor? Find(string id) => id is not null && ById.TryGetValue(id, out var descriptor) ? descriptor : null;
    }
}
