using System;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// PW4003: the launching latch (entry gate, storage node), the slowest path of stages to the capturing latch and its
/// entry gate and storage node, on their clocks. The data reaches the launching latch's input as late as Phaseward
/// takes it: when that latch opens plus what it had borrowed. Measures <c>t_arrival</c>, from the capturing latch's
/// opening to the data at its input (at vdd/2), and <c>slack</c> = the borrow limit (its window less setup and clock
/// skew) − t_arrival, each beside Phaseward's estimate.
/// </summary>
internal static class LatchBorrowingDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var targetName = DeckInputs.Property(finding, FindingPropertyKeys.TargetLatch);
        var sourceName = DeckInputs.Property(finding, FindingPropertyKeys.SourceLatch);
        var figures = TimingFigures.For(netlist, Corner.Slow);
        if (DeckLookup.Of(netlist).Arrival(sourceName, targetName) is not { } arrival)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: design '{netlist.DesignName}' has no borrowing path from latch '{sourceName}' to latch '{targetName}'.", nameof(finding));

        var path = arrival.Path;
        var a = path.From;
        var b = path.To;
        var entryA = a.EntryGates[0];
        var entryB = path.EntryGate;
        var stages = StageRoute.Between(netlist, a.Storage, entryB.Inputs[0])
            ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path of stages from '{a.Storage.Name}' to '{entryB.Inputs[0].Name}'.", nameof(finding));
        var windowA = PhaseWindow.Of(a.Phase);
        var windowB = PhaseWindow.Of(entryB.ClockControl!);
        var period = windowA.Period;
        var opensA = ClockWaveforms.NextOpening(a.Phase, period);
        var opensB = opensA + (windowA.TimeToNextOpeningOf(windowB)
            ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: the two latches' clocks have no fixed time relation.", nameof(finding)));
        var dataAt = opensA + arrival.SourceBorrow;
        var limit = figures.Of(b).BorrowLimit;
        var edge = ClockWaveforms.EdgeTime(a.Phase.Clock);
        var end = opensB + Time.Max(windowB.Length, arrival.Arrival) + period;

        var deck = new DeckWriter(finding, netlist);
        deck.AtCorner(Corner.Slow);
        deck.Describe($"Sub-circuit: latch '{a.Name}' (entry '{entryA.Name}' on {a.Phase.Name}, storage '{a.Storage.Name}'), the path of {stages.Count} stage(s) to latch '{b.Name}' (entry '{entryB.Name}' on {entryB.ClockControl!.Name}, storage '{b.Storage.Name}').");
        deck.Describe($"Stimulus: the data reaches '{entryA.Inputs[0].Name}' at {dataAt}: '{a.Name}' opens at {opensA} and had borrowed {arrival.SourceBorrow}. '{b.Name}' opens at {opensB}.");
        deck.Describe($"Measured: t_arrival, from '{b.Name}' opening to '{entryB.Inputs[0].Name}' at vdd/2, and slack = {limit} (its window less setup and clock skew) - t_arrival.");
        deck.Param("t_limit", SpiceNumbers.Of(limit), "the latest arrival the capturing latch allows after it opens (s)");

        var clocks = new ClockWaveforms(deck, end);
        var input = deck.Node(entryA.Inputs[0]);
        // A stiff source: the estimate starts at the launching latch's input.
        deck.Pwl(input, new[] { (0.0, 0.0), ((dataAt - edge / 2).Seconds, 0.0), ((dataAt + edge / 2).Seconds, deck.Supply) }, "the data, as late as Phaseward takes it");
        var storageA = deck.Node(a.Storage);
        deck.PassGate(entryA, input, storageA, clocks.Control(a.Phase));
        deck.Capacitor(storageA, netlist.CapacitanceOf(a.Storage), $"'{a.Storage.Name}', storage of '{a.Name}'");
        deck.Element($".ic v({storageA})=0");
        LatchPairDeck.DrawStages(deck, netlist, stages);
        var inputB = deck.Node(entryB.Inputs[0]);
        var storageB = deck.Node(b.Storage);
        deck.PassGate(entryB, inputB, storageB, clocks.Control(entryB.ClockControl!));
        deck.Capacitor(storageB, netlist.CapacitanceOf(b.Storage), $"'{b.Storage.Name}', storage of '{b.Name}'");

        var step = Time.Min(edge, period / 2000);
        deck.Transient(step, end, Time.Min(period / 400, edge * 2));
        var at = SpiceNumbers.Of(opensB);
        // The crossing after the data left: look from the data's change, and time it from the capturing latch's opening.
        var from = SpiceNumbers.Of(dataAt);
        deck.Measure($".meas tran t_cross WHEN v({inputB})={{vdd/2}} CROSS=1 TD={from}", null);
        deck.Measure($".meas tran t_arrival PARAM='t_cross - {at}'",
            new DeckEstimate("t_arrival", arrival.Arrival.Seconds, "s", "launching latch's entry + its borrow + slowest path − the gap between the openings"));
        deck.Measure(".meas tran slack PARAM='t_limit - t_arrival'",
            new DeckEstimate("slack", arrival.Slack.Seconds, "s", "borrow limit − arrival"));
        return deck.Build();
    }
}
