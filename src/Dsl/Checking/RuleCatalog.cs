using System.Collections.Generic;
using System.Linq;

namespace Phaseward
{
    /// <summary>Every rule's descriptor, keyed by ID: the one source of titles and messages for both front ends.</summary>
    public static class RuleCatalog
    {
        public static RuleDescriptor NotElaborated { get; } = new(
            RuleIds.NotElaborated, RuleTexts.NotElaboratedTitle, RuleTexts.NotElaboratedMessage, RuleCategories.Elaboration,
            Severity.Info, RuleTexts.NotElaboratedDescription);

        public static RuleDescriptor ElaborationBudgetExceeded { get; } = new(
            RuleIds.ElaborationBudgetExceeded, RuleTexts.ElaborationBudgetExceededTitle, RuleTexts.ElaborationBudgetExceededMessage,
            RuleCategories.Elaboration, Severity.Warning, RuleTexts.ElaborationBudgetExceededDescription);

        public static RuleDescriptor DesignThrows { get; } = new(
            RuleIds.DesignThrows, RuleTexts.DesignThrowsTitle, RuleTexts.DesignThrowsMessage, RuleCategories.Elaboration,
            Severity.Error, RuleTexts.DesignThrowsDescription);

        public static RuleDescriptor InvalidOption { get; } = new(
            RuleIds.InvalidOption, RuleTexts.InvalidOptionTitle, RuleTexts.InvalidOptionMessage, RuleCategories.Elaboration,
            Severity.Warning, RuleTexts.InvalidOptionDescription);

        public static IReadOnlyList<RuleDescriptor> All { get; } = new[]
        {
            NotElaborated,
            ElaborationBudgetExceeded,
            DesignThrows,
            InvalidOption,
        };

        private static readonly Dictionary<string, RuleDescriptor> ById = All.ToDictionary(d => d.Id);

        public static RuleDescriptor? Find(string id) => id is not null && ById.TryGetValue(id, out var descriptor) ? descriptor : null;
    }
}
