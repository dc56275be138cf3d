using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// PW4005: the latch loop drawn once round, opened at its first latch's input: each latch's entry gate and storage
/// node and the slowest path of stages to the next, on their clocks; where the loop comes back to the first latch,
/// a copy of that latch's entry gate and storage node loads the last stage as the real one does. The data waits at
/// the first latch's input and passes when it opens; it comes back round after the loop's delay. Measures
/// <c>t_round</c>, from the first latch's opening to the data back at its input, and <c>growth</c> = t_round less the
/// time the phases give the loop: what the first latch borrows more the next time round. When a latch on the loop is
/// shut as the data reaches it (it missed its window, PW4003's business), the data waits and t_round comes out longer.
/// </summary>
internal static class LatchLoopDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var targetName = DeckInputs.Property(finding, FindingPropertyKeys.TargetLatch);
        var sourceName = DeckInputs.Property(finding, FindingPropertyKeys.SourceLatch);
        var model = LatchModel.Of(netlist);
        if (DeckLookup.Of(netlist).DivergentLoop(sourceName, targetName) is not { } loop)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: design '{netlist.DesignName}' has no latch loop from '{sourceName}' to '{targetName}' that gains time.", nameof(finding));

        var first = loop.Paths[0].From;
        var entryIntoFirst = loop.Paths[loop.Paths.Count - 1].EntryGate;
        var window = PhaseWindow.Of(first.Phase);
        var opens = ClockWaveforms.NextOpening(entryIntoFirst.ClockControl!, window.Period);
        var edge = ClockWaveforms.EdgeTime(first.Phase.Clock);
        var dataAt = opens - (window.Period - window.Length) / 2;
        var end = opens + loop.TotalDelay + window.Period;

        var deck = new DeckWriter(finding, netlist);
        deck.AtCorner(Corner.Slow);
        deck.Describe($"Sub-circuit: the latch loop {loop.Describe()} once round ({loop.Paths.Count} paths), opened at '{entryIntoFirst.Inputs[0].Name}', the input of '{first.Name}'.");
        deck.Describe($"Stimulus: the data waits at the input of '{first.Name}' from {dataAt}; '{first.Name}' opens at {opens}.");
        deck.Describe($"Measured: t_round, from that opening to the data back at '{entryIntoFirst.Inputs[0].Name}' at vdd/2 (Phaseward's loop delay {loop.TotalDelay}), and growth = t_round - {loop.TimeAllowed} (the time its phases give it). A latch on the loop that is shut when the data reaches it makes the data wait: t_round is then longer than the sum of the delays.");
        deck.Param("t_allowed", SpiceNumbers.Of(loop.TimeAllowed), "the time the phases give the loop (s)");

        var clocks = new ClockWaveforms(deck, end);
        var launch = deck.Fresh("launch");
        deck.Pwl(launch, new[] { (0.0, 0.0), ((dataAt - edge / 2).Seconds, 0.0), ((dataAt + edge / 2).Seconds, deck.Supply) }, $"the data at the input of '{first.Name}', waiting");
        var from = launch;
        var entry = entryIntoFirst;
        foreach (var path in loop.Paths)
        {
            var latch = path.From;
            var storage = deck.Node(latch.Storage);
            deck.PassGate(entry, from, storage, clocks.Control(entry.ClockControl!));
            deck.Capacitor(storage, netlist.CapacitanceOf(latch.Storage), $"'{latch.Storage.Name}', storage of '{latch.Name}'");
            deck.Element($".ic v({storage})={(ReferenceEquals(latch, first) ? "0" : "{vdd/2}")}");
            var stages = StageRoute.Between(netlist, latch.Storage, path.EntryGate.Inputs[0])
                ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path of stages from '{latch.Storage.Name}' to '{path.EntryGate.Inputs[0].Name}'.", nameof(finding));
            LatchPairDeck.DrawStages(deck, netlist, stages);
            entry = path.EntryGate;
            from = deck.Node(path.EntryGate.Inputs[0]);
        }

        // Back at the first latch's input: a copy of its entry gate and storage node as the last stage's load.
        var load = deck.Fresh("n_" + DeckWriter.Safe(first.Storage.Name) + "_load");
        deck.PassGate(entryIntoFirst, from, load, clocks.Control(entryIntoFirst.ClockControl!));
        deck.Capacitor(load, netlist.CapacitanceOf(first.Storage), $"'{first.Storage.Name}' again, as the last stage's load");

        deck.Transient(Time.Min(edge, loop.TotalDelay / 2000), end, Time.Min(window.Period / 400, loop.TotalDelay / 200));
        deck.Measure($".meas tran t_back WHEN v({from})={{vdd/2}} CROSS=1 TD={SpiceNumbers.Of(opens)}", null);
        deck.Measure($".meas tran t_round PARAM='t_back - {SpiceNumbers.Of(opens)}'",
            new DeckEstimate("t_round", loop.TotalDelay.Seconds, "s", "Σ (entry + slowest path) round the loop"));
        deck.Measure(".meas tran growth PARAM='t_round - t_allowed'",
            new DeckEstimate("growth", loop.Growth.Seconds, "s", "loop delay − the time its phases give it"));
        return deck.Build();
    }
}
