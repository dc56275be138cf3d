using System.Collections.Generic;
using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Analyzers.Diagnostics;

/// <summary>Every descriptor Phaseward reports, built from the rules' constant IDs and texts.</summary>
internal static class Descriptors
{
    public static readonly DiagnosticDescriptor SameWindowLatches = DescriptorFactory.Create(
        RuleIds.SameWindowLatches, RuleTexts.SameWindowLatchesTitle, RuleTexts.SameWindowLatchesMessage, RuleCategories.ClockPhases,
        DiagnosticSeverity.Warning, RuleTexts.SameWindowLatchesDescription);

    public static readonly DiagnosticDescriptor OverlapRace = DescriptorFactory.Create(
        RuleIds.OverlapRace, RuleTexts.OverlapRaceTitle, RuleTexts.OverlapRaceMessage, RuleCategories.ClockPhases,
        DiagnosticSeverity.Warning, RuleTexts.OverlapRaceDescription);

    public static readonly DiagnosticDescriptor ClockCrossing = DescriptorFactory.Create(
        RuleIds.ClockCrossing, RuleTexts.ClockCrossingTitle, RuleTexts.ClockCrossingMessage, RuleCategories.ClockPhases,
        DiagnosticSeverity.Warning, RuleTexts.ClockCrossingDescription);

    public static readonly DiagnosticDescriptor ClockGateEnable = DescriptorFactory.Create(
        RuleIds.ClockGateEnable, RuleTexts.ClockGateEnableTitle, RuleTexts.ClockGateEnableMessage, RuleCategories.ClockPhases,
        DiagnosticSeverity.Warning, RuleTexts.ClockGateEnableDescription);

    public static readonly DiagnosticDescriptor LoopWithoutStorage = DescriptorFactory.Create(
        RuleIds.LoopWithoutStorage, RuleTexts.LoopWithoutStorageTitle, RuleTexts.LoopWithoutStorageMessage, RuleCategories.ClockPhases,
        DiagnosticSeverity.Warning, RuleTexts.LoopWithoutStorageDescription);

    public static readonly DiagnosticDescriptor RegisterSetup = DescriptorFactory.Create(
        RuleIds.RegisterSetup, RuleTexts.RegisterSetupTitle, RuleTexts.RegisterSetupMessage, RuleCategories.Timing,
        DiagnosticSeverity.Warning, RuleTexts.RegisterSetupDescription);

    public static readonly DiagnosticDescriptor RegisterHold = DescriptorFactory.Create(
        RuleIds.RegisterHold, RuleTexts.RegisterHoldTitle, RuleTexts.RegisterHoldMessage, RuleCategories.Timing,
        DiagnosticSeverity.Warning, RuleTexts.RegisterHoldDescription);

    public static readonly DiagnosticDescriptor LatchBorrowing = DescriptorFactory.Create(
        RuleIds.LatchBorrowing, RuleTexts.LatchBorrowingTitle, RuleTexts.LatchBorrowingMessage, RuleCategories.Timing,
        DiagnosticSeverity.Warning, RuleTexts.LatchBorrowingDescription);
    public static readonly DiagnosticDescriptor LatchWriteWindow = DescriptorFactory.Create(
        RuleIds.LatchWriteWindow, RuleTexts.LatchWriteWindowTitle, RuleTexts.LatchWriteWindowMessage, RuleCategories.Timing,
        DiagnosticSeverity.Warning, RuleTexts.LatchWriteWindowDescription);

    public static readonly DiagnosticDescriptor LatchLoop = DescriptorFactory.Create(
        RuleIds.LatchLoop, RuleTexts.LatchLoopTitle, RuleTexts.LatchLoopMessage, RuleCategories.Timing,
        DiagnosticSeverity.Warning, RuleTexts.LatchLoopDescription);
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

    public static readonly DiagnosticDescriptor FightingDrivers = DescriptorFactory.Create(
        RuleIds.FightingDrivers, RuleTexts.FightingDriversTitle, RuleTexts.FightingDriversMessage,
        RuleCategories.DynamicStorage, DiagnosticSeverity.Warning, RuleTexts.FightingDriversDescription);

    public static readonly DiagnosticDescriptor KeeperTooStrong = DescriptorFactory.Create(
        RuleIds.KeeperTooStrong, RuleTexts.KeeperTooStrongTitle, RuleTexts.KeeperTooStrongMessage,
        RuleCategories.DynamicStorage, DiagnosticSeverity.Warning, RuleTexts.KeeperTooStrongDescription);

    public static readonly DiagnosticDescriptor NotElaborated = DescriptorFactory.Create(
        RuleIds.NotElaborated, RuleTexts.NotElaboratedTitle, RuleTexts.NotElaboratedMessage, RuleCategories.Elaboration,
        DiagnosticSeverity.Info, RuleTexts.NotElaboratedDescription);

    public static readonly DiagnosticDescriptor ElaborationBudgetExceeded = DescriptorFactory.Create(
        RuleIds.ElaborationBudgetExceeded, RuleTexts.ElaborationBudgetExceededTitle, RuleTexts.ElaborationBudgetExceededMessage,
        RuleCategories.Elaboration, DiagnosticSeverity.Warning, RuleTexts.ElaborationBudgetExceededDescription);

    public static readonly DiagnosticDescriptor DesignThrows = DescriptorFactory.Create(
        RuleIds.DesignThrows, RuleTexts.DesignThrowsTitle, RuleTexts.DesignThrowsMessage, RuleCategories.Elaboration,
        DiagnosticSeverity.Error, RuleTexts.DesignThrowsDescription);

    public static readonly DiagnosticDescriptor InvalidOption = DescriptorFactory.Create(
        RuleIds.InvalidOption, RuleTexts.InvalidOptionTitle, RuleTexts.InvalidOptionMessage, RuleCategories.Elaboration,
        DiagnosticSeverity.Warning, RuleTexts.InvalidOptionDescription);

    // Add each new descriptor here too: the finding-to-diagnostic mapping looks descriptors up by rule ID.
    private static readonly DiagnosticDescriptor[] All =
    {
        SameWindowLatches,
        OverlapRace,
        ClockCrossing,
        ClockGateEnable,
        LoopWithoutStorage,
        SeriesPassGates,
        DynamicNodeOnGatedClock,
        ClockTooSlowForDynamicStorage,
        ChargeSharing,
        FightingDrivers,
        KeeperTooStrong,
        RegisterSetup,
        RegisterHold,
        LatchBorrowing,
        LatchWriteWindow,
        LatchLoop,
        NotElaborated,
        ElaborationBudgetExceeded,
        DesignThrows,
        InvalidOption,
    };

    private static readonly ImmutableDictionary<string, DiagnosticDescriptor> ById = CreateLookup();

    /// <summary>The descriptor of a rule ID (from <see cref="RuleIds"/>), or null if none is declared.</summary>
    public static DiagnosticDescriptor? Find(string id) => ById.TryGetValue(id, out var descriptor) ? descriptor : null;

    private static ImmutableDictionary<string, DiagnosticDescriptor> CreateLookup()
    {
        var builder = ImmutableDictionary.CreateBuilder<string, DiagnosticDescriptor>();
        foreach (var descriptor in All)
            builder.Add(descriptor.Id, descriptor);
        return builder.ToImmutable();
    }

    /// <summary>Every declared descriptor (for tests that compare the analyzers with the DSL's catalog).</summary>
    public static IReadOnlyList<DiagnosticDescriptor> Declared => All;
}
