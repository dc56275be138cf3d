using System.Collections.Generic;
using System.Linq;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Checking;

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

    public static RuleDescriptor SameWindowLatches { get; } = new(
        RuleIds.SameWindowLatches, RuleTexts.SameWindowLatchesTitle, RuleTexts.SameWindowLatchesMessage, RuleCategories.ClockPhases, Severity.Warning, RuleTexts.SameWindowLatchesDescription);

    public static RuleDescriptor OverlapRace { get; } = new(
        RuleIds.OverlapRace, RuleTexts.OverlapRaceTitle, RuleTexts.OverlapRaceMessage, RuleCategories.ClockPhases, Severity.Warning, RuleTexts.OverlapRaceDescription);

    public static RuleDescriptor ClockCrossing { get; } = new(
        RuleIds.ClockCrossing, RuleTexts.ClockCrossingTitle, RuleTexts.ClockCrossingMessage, RuleCategories.ClockPhases, Severity.Warning, RuleTexts.ClockCrossingDescription);

    public static RuleDescriptor ClockGateEnable { get; } = new(
        RuleIds.ClockGateEnable, RuleTexts.ClockGateEnableTitle, RuleTexts.ClockGateEnableMessage, RuleCategories.ClockPhases, Severity.Warning,
        RuleTexts.ClockGateEnableDescription);

    public static RuleDescriptor LoopWithoutStorage { get; } = new(
        RuleIds.LoopWithoutStorage, RuleTexts.LoopWithoutStorageTitle, RuleTexts.LoopWithoutStorageMessage, RuleCategories.ClockPhases, Severity.Warning,
        RuleTexts.LoopWithoutStorageDescription);

    public static RuleDescriptor RegisterSetup { get; } = new(
        RuleIds.RegisterSetup, RuleTexts.RegisterSetupTitle, RuleTexts.RegisterSetupMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.RegisterSetupDescription);

    public static RuleDescriptor RegisterHold { get; } = new(
        RuleIds.RegisterHold, RuleTexts.RegisterHoldTitle, RuleTexts.RegisterHoldMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.RegisterHoldDescription);

    public static RuleDescriptor LatchBorrowing { get; } = new(
        RuleIds.LatchBorrowing, RuleTexts.LatchBorrowingTitle, RuleTexts.LatchBorrowingMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.LatchBorrowingDescription);

    public static RuleDescriptor LatchWriteWindow { get; } = new(
        RuleIds.LatchWriteWindow, RuleTexts.LatchWriteWindowTitle, RuleTexts.LatchWriteWindowMessage,
        RuleCategories.Timing, Severity.Warning, RuleTexts.LatchWriteWindowDescription);
    public static RuleDescriptor LatchLoop { get; } = new(
        RuleIds.LatchLoop, RuleTexts.LatchLoopTitle, RuleTexts.LatchLoopMessage, RuleCategories.Timing, Severity.Warning, RuleTexts.LatchLoopDescription);
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

    public static RuleDescriptor FightingDrivers { get; } = new(
        RuleIds.FightingDrivers, RuleTexts.FightingDriversTitle, RuleTexts.FightingDriversMessage,
        RuleCategories.DynamicStorage, Severity.Warning, RuleTexts.FightingDriversDescription);

    public static RuleDescriptor KeeperTooStrong { get; } = new(
        RuleIds.KeeperTooStrong, RuleTexts.KeeperTooStrongTitle, RuleTexts.KeeperTooStrongMessage,
        RuleCategories.DynamicStorage, Severity.Warning, RuleTexts.KeeperTooStrongDescription);

    public static IReadOnlyList<RuleDescriptor> All { get; } = new[]
    {
        SeriesPassGates,
        SameWindowLatches,
        OverlapRace,
        ClockCrossing,
        ClockGateEnable,
        LoopWithoutStorage,
        RegisterSetup,
        RegisterHold,
        LatchBorrowing,
        LatchWriteWindow,
        LatchLoop,
        DynamicNodeOnGatedClock,
        ClockTooSlowForDynamicStorage,
        ChargeSharing,
        FightingDrivers,
        KeeperTooStrong,
        NotElaborated,
        ElaborationBudgetExceeded,
        DesignThrows,
        InvalidOption,
    };

    private static readonly Dictionary<string, RuleDescriptor> ById = All.ToDictionary(d => d.Id);

    public static RuleDescriptor? Find(string id) => id is not null && ById.TryGetValue(id, out var descriptor) ? descriptor : null;
}
