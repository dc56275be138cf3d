using System;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// PW1003: the sending latch (entry gate, storage node), the slowest path of stages and the receiving latch (entry
/// gate, storage node), each on its own clock. The two clocks have no fixed time relation, so their phase drifts and
/// sooner or later the data changes just as the receiving latch closes: the deck draws the receiving clock (and the
/// clocks derived from its root) shifted to that moment — by Phaseward's first-order delays, the data at the
/// receiving storage node crosses vdd/2 exactly when its window closes. Measures <c>v_at_close</c>, the level the
/// latch closes on (estimate vdd/2: neither a 0 nor a 1, which a real latch resolves only after a metastable wait;
/// switch-level models cannot show that wait), and <c>undecided</c> (1 when that level is within 30 % of the supply
/// of vdd/2).
/// </summary>
internal static class ClockCrossingDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var model = LatchModel.Of(netlist);
        var path = DeckInputs.LatchPathOf(finding, netlist, model);

        var a = path.From;
        var b = path.To;
        var entryA = a.EntryGates[0];
        var entryB = path.EntryGate;
        var phaseB = entryB.ClockControl!;
        var stages = StageRoute.Between(netlist, a.Storage, entryB.Inputs[0])
            ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path of stages from '{a.Storage.Name}' to '{entryB.Inputs[0].Name}'.", nameof(finding));
        var inversions = 0;
        foreach (var stage in stages)
            if (stage.Device.Kind.IsInverting()) inversions++;

        var windowA = PhaseWindow.Of(a.Phase);
        var windowB = PhaseWindow.Of(phaseB);
        var opensA = ClockWaveforms.NextOpening(a.Phase, windowA.Period);
        var delay = model.EntryDelay(a) + path.MaxDelay + model.StageDelay(entryB);
        var closeAt = opensA + delay;
        // The receiving clock's next close after that moment, on its own time line, and the shift that brings it there.
        var k = Math.Ceiling((closeAt - windowB.Closes) / windowB.Period - 1e-9);
        var shift = closeAt - (windowB.Closes + windowB.Period * k);
        var receivingRoot = phaseB.Clock.Root;
        var edge = Time.Min(ClockWaveforms.EdgeTime(a.Phase.Clock), ClockWaveforms.EdgeTime(phaseB.Clock));
        var dataAt = opensA - (windowA.Period - windowA.Length) / 2; // while the sending latch is shut: the data waits
        var end = closeAt + Time.Max(windowA.Period, windowB.Period);

        var deck = new DeckWriter(finding, netlist);
        deck.Describe($"Sub-circuit: latch '{a.Name}' (entry '{entryA.Name}' on {a.Phase.Name}, storage '{a.Storage.Name}'), the path of {stages.Count} stage(s) to latch '{b.Name}' (entry '{entryB.Name}' on {phaseB.Name}, storage '{b.Storage.Name}').");
        deck.Describe($"Stimulus: the data reaches '{entryA.Inputs[0].Name}' at {dataAt} and waits for '{a.Name}' to open at {opensA}; by Phaseward's delays ({delay}: the sending latch's entry, the path and the receiving gate) it reaches '{b.Storage.Name}' at {closeAt}. Clock '{receivingRoot.Name}' (no fixed time relation to '{a.Phase.Clock.Root.Name}') is drawn shifted by {shift} so that '{b.Name}' closes at that moment: the moment a crossing meets sooner or later.");
        deck.Describe("Measured: v_at_close, the receiving storage node's level when its latch closes (estimate vdd/2), and undecided = 1 when that is within 30 % of the supply of vdd/2: neither a 0 nor a 1.");
        deck.Param("t_close", SpiceNumbers.Of(closeAt), $"when '{b.Name}' closes in this deck (s)");

        var clocks = new ClockWaveforms(deck, end, shifts: clock => ReferenceEquals(clock.Root, receivingRoot) ? shift : Time.Zero);
        var input = deck.Node(entryA.Inputs[0]);
        deck.Pwl(input, new[] { (0.0, 0.0), ((dataAt - edge / 2).Seconds, 0.0), ((dataAt + edge / 2).Seconds, deck.Supply) }, "the crossing data, waiting for the sending latch");
        var storageA = deck.Node(a.Storage);
        deck.PassGate(entryA, input, storageA, clocks.Control(a.Phase));
        deck.Capacitor(storageA, netlist.CapacitanceOf(a.Storage), $"'{a.Storage.Name}', storage of '{a.Name}'");
        deck.Element($".ic v({storageA})=0");
        LatchPairDeck.DrawStages(deck, netlist, stages);
        var storageB = deck.Node(b.Storage);
        deck.PassGate(entryB, deck.Node(entryB.Inputs[0]), storageB, clocks.Control(phaseB));
        deck.Capacitor(storageB, netlist.CapacitanceOf(b.Storage), $"'{b.Storage.Name}', storage of '{b.Name}'");
        deck.Element($".ic v({storageB})={(inversions % 2 == 0 ? "0" : "{vdd}")}");

        var step = Time.Min(edge, delay / 100);
        deck.Transient(step, end, Time.Min(Time.Min(windowA.Period, windowB.Period) / 400, delay / 20));
        deck.Measure($".meas tran v_at_close FIND v({storageB}) AT={SpiceNumbers.Of(closeAt)}",
            new DeckEstimate("v_at_close", deck.Supply / 2, "V", "the level the latch closes on: undecided"));
        deck.Measure(".meas tran undecided PARAM='abs(v_at_close - vdd/2) < 0.3 * vdd ? 1 : 0'",
            new DeckEstimate("undecided", 1, string.Empty, "1: the latch closes on neither a 0 nor a 1"));
        return deck.Build();
    }
}
