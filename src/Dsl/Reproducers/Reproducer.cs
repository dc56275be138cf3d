using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Reproducers;

/// <summary>
/// Writes a finding as a SPICE deck that reproduces the hazard: the sub-circuit involved, its figures, clocks and a
/// stimulus, with a <c>.meas</c> per figure and Phaseward's estimate beside it. Pure: returns text; writing files and
/// running a simulator is the caller's (the report tool's <c>--spice</c> and <c>--confirm</c>).
/// </summary>
public static class Reproducer
{
    private static readonly Dictionary<string, Func<Finding, Netlist, SpiceDeck>> Builders = new(StringComparer.Ordinal)
    {
        [RuleCatalog.SameWindowLatches.Id] = LatchPairDeck.Build,
        [RuleCatalog.OverlapRace.Id] = LatchPairDeck.Build,
        [RuleCatalog.ClockCrossing.Id] = ClockCrossingDeck.Build,
        [RuleCatalog.ClockGateEnable.Id] = ClockGateDeck.Build,
        [RuleCatalog.LoopWithoutStorage.Id] = LoopDeck.Build,
        [RuleCatalog.SeriesPassGates.Id] = PassGateChainDeck.Build,
        [RuleCatalog.DynamicNodeOnGatedClock.Id] = RetentionDeck.Build,
        [RuleCatalog.ClockTooSlowForDynamicStorage.Id] = RetentionDeck.Build,
        [RuleCatalog.ChargeSharing.Id] = ChargeSharingDeck.Build,
        [RuleCatalog.FightingDrivers.Id] = FightingDriversDeck.Build,
        [RuleCatalog.KeeperTooStrong.Id] = KeeperWriteDeck.Build,
        [RuleCatalog.RegisterSetup.Id] = RegisterPathDeck.Build,
        [RuleCatalog.RegisterHold.Id] = RegisterPathDeck.Build,
        [RuleCatalog.LatchBorrowing.Id] = LatchBorrowingDeck.Build,
        [RuleCatalog.LatchWriteWindow.Id] = LatchWriteWindowDeck.Build,
        [RuleCatalog.LatchLoop.Id] = LatchLoopDeck.Build,
    };

    /// <summary>The rule IDs whose findings have a deck.</summary>
    public static IReadOnlyCollection<string> SupportedRuleIds => Builders.Keys;

    /// <summary>True when findings of this rule can be written as a deck.</summary>
    public static bool Supports(string ruleId) => ruleId is not null && Builders.ContainsKey(ruleId);

    /// <summary>
    /// The deck of one finding of <paramref name="netlist"/>. Throws <see cref="ArgumentException"/> naming the finding
    /// when its rule has no electrical figures to reproduce (elaboration and option findings) or when the finding does
    /// not belong to this netlist.
    /// </summary>
    public static SpiceDeck Deck(Finding finding, Netlist netlist)
    {
        if (finding is null) throw new ArgumentNullException(nameof(finding));
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        if (!Builders.TryGetValue(finding.RuleId, out var build))
            throw new ArgumentException(
                $"The {finding.RuleId} finding at {finding.Location} has no electrical figures to reproduce in a SPICE deck "
                + $"(decks exist for {string.Join(", ", Sorted())}).", nameof(finding));
        return build(finding, netlist);
    }

    /// <summary>The decks of every finding of a report whose rule has one, in the report's order.</summary>
    public static IReadOnlyList<SpiceDeck> Decks(CheckReport report)
    {
        if (report is null) throw new ArgumentNullException(nameof(report));
        var decks = new List<SpiceDeck>();
        foreach (var finding in report.Findings)
            if (Supports(finding.RuleId))
                decks.Add(Deck(finding, report.Netlist));
        return decks;
    }

    private static List<string> Sorted()
    {
        var ids = new List<string>(Builders.Keys);
        ids.Sort(StringComparer.Ordinal);
        return ids;
    }
}
