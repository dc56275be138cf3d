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
/// PW4004: the latch's slowest entry gate and its storage node, drawn twice. The data at the gate's input rises while
/// the latch is shut and waits for the window (the most time the window can give it); the node starts at 0 V.
/// Copy 1 runs on the clock, its gate conducting while both halves are on (the window less the complement skew at
/// each end, as the rule counts it): <c>v_close</c> is the node's level when the window closes and <c>written</c> is 1
/// when it got past vdd/2. Copy 2 holds the gate on from the same moment: <c>t_write</c> is the time the gate needs
/// to bring the node to vdd/2, the latch's entry delay.
/// </summary>
internal static class LatchWriteWindowDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var model = LatchModel.Of(netlist);
        var name = DeckInputs.Property(finding, FindingPropertyKeys.TargetLatch);
        if (DeckLookup.Of(netlist).Latch(name) is not { } latch)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names latch '{name}', which is not in design '{netlist.DesignName}'.", nameof(finding));

        var write = LatchWriteWindow.Of(model, latch);
        Device gate = latch.EntryGates[0];
        foreach (var g in latch.EntryGates)
            if (model.StageDelay(g) > model.StageDelay(gate)) gate = g;
        var phase = latch.Phase;
        var clock = phase.Clock;
        var window = PhaseWindow.Of(phase);
        var rc = write.Resistance * write.Capacitance;
        var opensAt = ClockWaveforms.NextOpening(phase, window.Period);
        var fullyOnAt = opensAt + write.Skew;
        var closesAt = fullyOnAt + write.FullyOn;
        var end = fullyOnAt + Time.Max(window.Period, rc * 6);
        var edge = ClockWaveforms.EdgeTime(clock);
        var riseAt = opensAt - (window.Period - window.Length) / 2; // between the previous window's close and this one's opening

        var deck = new DeckWriter(finding, netlist);
        deck.AtCorner(Corner.Slow);
        deck.Describe($"Sub-circuit: latch '{latch.Name}''s entry gate '{gate.Name}' ({write.Resistance}, on {phase.Name}) and its storage node '{latch.Storage.Name}' ({write.Capacitance}), drawn twice.");
        deck.Describe($"Stimulus: the data at '{gate.Inputs[0].Name}' rises at {riseAt}, while the latch is shut, and waits; the node starts at 0 V. Copy 1: the gate conducts while both of its halves are on, from {fullyOnAt} to {closesAt} ({write.FullyOn}). Copy 2: the gate stays on from {fullyOnAt}.");
        deck.Describe("Measured: v_close, copy 1's node when the window closes, and written = 1 if that is past vdd/2; t_write, copy 2's time from the gate turning on to its node at vdd/2 (Phaseward's entry delay 0.69·R·C).");

        var clocks = new ClockWaveforms(deck, end);
        var clk = clocks.ClockNode(clock);
        var clkb = clocks.ComplementNode(clock);
        var both = deck.Fresh("on_both_halves");
        deck.Element(phase.Polarity == ClockPolarity.High
            ? $"B_both {both} 0 V = min(V({clk}), {{vdd}} - V({clkb}))   $ {phase.Name} with both halves on: clock high and complement low"
            : $"B_both {both} 0 V = min({{vdd}} - V({clk}), V({clkb}))   $ {phase.Name} with both halves on: clock low and complement high");
        var data = deck.Fresh("data");
        deck.Pwl(data, new[] { (0.0, 0.0), ((riseAt - edge / 2).Seconds, 0.0), ((riseAt + edge / 2).Seconds, deck.Supply) },
            $"the data at '{gate.Inputs[0].Name}': low through the first window, high (waiting) before the measured one opens");

        deck.Comment("copy 1: on the clock");
        var node = deck.Node(latch.Storage);
        deck.PassGate(gate, data, node, both);
        deck.Capacitor(node, write.Capacitance, $"'{latch.Storage.Name}', storage of '{latch.Name}'");
        deck.Element($".ic v({node})=0");

        deck.Comment("copy 2: the gate held on from the same moment");
        var held = deck.Fresh("n_" + DeckWriter.Safe(latch.Storage.Name) + "_held");
        var on = deck.Fresh("on_held");
        deck.Pwl(on, new[] { (0.0, 0.0), ((fullyOnAt - edge / 2).Seconds, 0.0), ((fullyOnAt + edge / 2).Seconds, deck.Supply) }, "the gate turns on as copy 1's does, and stays on");
        deck.PassGate(gate, data, held, on);
        deck.Capacitor(held, write.Capacitance, $"'{latch.Storage.Name}' (copy 2)");
        deck.Element($".ic v({held})=0");

        var step = Time.Min(edge, Time.Min(rc, write.FullyOn > Time.Zero ? write.FullyOn : rc) / 50);
        deck.Transient(step, end, Time.Min(window.Period / 200, rc / 20));
        var at = SpiceNumbers.Of(fullyOnAt);
        deck.Measure($".meas tran v_close FIND v({node}) AT={SpiceNumbers.Of(closesAt)}",
            new DeckEstimate("v_close", deck.Supply * (1 - Math.Exp(-write.FullyOn.Seconds / rc.Seconds)), "V", "V·(1 − e^(−t/RC)) over the window with both halves on"));
        deck.Measure(".meas tran written PARAM='v_close > vdd/2 ? 1 : 0'",
            new DeckEstimate("written", write.Margin >= Time.Zero ? 1 : 0, string.Empty, "1 when the window is at least the entry delay"));
        deck.Measure($".meas tran t_write TRIG AT={at} TARG v({held}) VAL={{vdd/2}} RISE=1 TD={at}",
            new DeckEstimate("t_write", write.EntryDelay.Seconds, "s", "entry delay 0.69·R·C"));
        return deck.Build();
    }
}
