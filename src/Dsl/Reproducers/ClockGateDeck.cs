using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// PW1004: the gate's source clock on the design's time line, the gate as its logic function (a gate that stops low
/// passes the clock while the enable is high: clock AND enable; one that stops high: clock OR NOT enable), and the
/// enable. From a latch: the latch's entry gate and storage node on its phase and the path of stages to the enable,
/// with data at the latch's input that arms the gate arriving as late as Phaseward takes it (when the latch opens, or
/// its latest arrival after that); the enable then moves while the gate passes the clock. From a primary input (or a
/// latch on an unrelated clock, which can change at any time): the enable driven directly, rising in the middle of a
/// window in which the gate passes the clock. Measures <c>t_enable</c> (latch opening to the enable at vdd/2),
/// <c>w_pulse</c> (the gated clock's first pulse) and <c>clipped</c> (1 when that pulse is shorter than the clock's
/// own by more than two edge times).
/// </summary>
internal static class ClockGateDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var gateName = DeckInputs.Property(finding, FindingPropertyKeys.GatedClock);
        var gate = DeckLookup.Of(netlist).Clock(gateName);
        if (gate?.Source is not { } source || gate.Enable is not { } enable)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names clock gate '{gateName}', which is not a clock gate of design '{netlist.DesignName}'.", nameof(finding));

        var stopsLow = gate.StopLevel == ClockStopLevel.Low;
        var period = source.Period;
        var passStart = new Time(DeckInputs.Number(finding, FindingPropertyKeys.PassStartSeconds));
        var passLength = new Time(DeckInputs.Number(finding, FindingPropertyKeys.PassEndSeconds)) - passStart;
        var fromLatch = DeckInputs.Property(finding, FindingPropertyKeys.Origin) == FindingPropertyValues.EnableFromLatch;
        var model = LatchModel.Of(netlist);
        Latch? latch = null;
        if (fromLatch)
        {
            var storageName = DeckInputs.Property(finding, FindingPropertyKeys.Storage);
            latch = DeckLookup.Of(netlist).Latch(storageName);
            if (latch is null)
                throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names latch '{storageName}', which is not in design '{netlist.DesignName}'.", nameof(finding));
        }

        // When the enable moves: from a latch, its opening in the second period plus its latest data; otherwise in the
        // middle of the second period's passing window.
        var edge = ClockWaveforms.EdgeTime(source);
        Time enableAt;
        Time opensAt = Time.Zero;
        Time changeLength = Time.Zero;
        Time dataAt = Time.Zero;
        if (latch is not null)
        {
            opensAt = ClockWaveforms.NextOpening(latch.Phase, period);
            changeLength = new Time(DeckInputs.Number(finding, FindingPropertyKeys.ChangeEndSeconds) - DeckInputs.Number(finding, FindingPropertyKeys.ChangeStartSeconds));
            var late = changeLength - new Time(DeckInputs.Number(finding, FindingPropertyKeys.EnableDelaySeconds));
            dataAt = late > edge * 3 ? opensAt + late : opensAt - edge * 3;
            enableAt = opensAt + changeLength;
        }
        else
        {
            enableAt = NextStart(passStart, period, period) + passLength / 2;
        }

        var windowStart = NextStart(passStart, period, enableAt - passLength);
        var inside = enableAt > windowStart && enableAt < windowStart + passLength;
        var end = enableAt + period * 2;

        var deck = new DeckWriter(finding, netlist);
        deck.AtCorner(Corner.Slow);
        deck.Describe($"Sub-circuit: clock gate '{gate.Name}' on clock '{source.Name}' (it stops {(stopsLow ? "low" : "high")}, so it passes the clock while it is {(stopsLow ? "high" : "low")}), drawn as its logic function"
            + (latch is null ? $", and its enable '{enable.Name}' driven directly." : $", and the enable's storage: latch '{latch.Name}' (entry '{latch.EntryGates[0].Name}' on {latch.Phase.Name}, storage '{latch.Storage.Name}') and the path from it to '{enable.Name}'."));
        deck.Describe(latch is null
            ? $"Stimulus: the enable rises at {enableAt}, in the middle of a window in which the gate passes the clock ([{windowStart}, {windowStart + passLength})): it can, being {(fromLatch ? "on an unrelated clock" : "a primary input taken as changing at any time")}."
            : $"Stimulus: the data that arms the gate reaches the latch's input at {dataAt} (as late as Phaseward takes it: {(dataAt > opensAt ? "its latest arrival after the latch opens" : "waiting when the latch opens")}); the latch opens at {opensAt}, so the enable moves until about {enableAt}, while the gate passes the clock over [{windowStart}, {windowStart + passLength}).");
        deck.Describe((latch is null ? string.Empty : "Measured: t_enable, from the latch's opening to the enable at vdd/2. ")
            + $"w_pulse: the gated clock's first {(stopsLow ? "high" : "low")} pulse, against the clock's own {passLength}; clipped = 1 when it is shorter by more than two edge times (a runt or clipped pulse).");

        var clocks = new ClockWaveforms(deck, end);
        var clk = clocks.ClockNode(source);
        var enableNode = deck.Node(enable);
        var armed = true;
        if (latch is null)
        {
            deck.Pwl(enableNode, new[] { (0.0, 0.0), ((enableAt - edge / 2).Seconds, 0.0), ((enableAt + edge / 2).Seconds, deck.Supply) }, "the enable, rising while the gate passes the clock");
        }
        else
        {
            var entry = latch.EntryGates[0];
            var stages = StageRoute.Between(netlist, latch.Storage, enable)
                ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path of stages from '{latch.Storage.Name}' to '{enable.Name}'.", nameof(finding));
            var inversions = 0;
            foreach (var stage in stages)
                if (stage.Device.Kind.IsInverting()) inversions++;
            armed = inversions % 2 == 0; // data rising arms the gate when the path does not invert
            // The data as a stiff source at the latch's input: the estimate starts at the latch (its entry gate), and a
            // driver resistance here would share the storage node's charge with the input's before the latch could settle.
            double Level(bool high) => high ? deck.Supply : 0;
            var input = deck.Node(entry.Inputs[0]);
            deck.Pwl(input, new[] { (0.0, Level(!armed)), ((dataAt - edge / 2).Seconds, Level(!armed)), ((dataAt + edge / 2).Seconds, Level(armed)) },
                $"the data that arms the gate, at '{entry.Inputs[0].Name}'");
            var storage = deck.Node(latch.Storage);
            deck.PassGate(entry, input, storage, clocks.Control(latch.Phase));
            deck.Capacitor(storage, netlist.CapacitanceOf(latch.Storage), $"'{latch.Storage.Name}', storage of '{latch.Name}'");
            deck.Element($".ic v({storage})={(armed ? "0" : "{vdd}")}");
            LatchPairDeck.DrawStages(deck, netlist, stages);
        }

        var gated = deck.Fresh("gated_" + DeckWriter.Safe(gate.Name));
        var clockHigh = $"1 / (1 + exp(-(V({clk}) - {{vdd/2}}) / 0.01))";
        var enabled = $"1 / (1 + exp(-(V({enableNode}) - {{vdd/2}}) / 0.01))";
        deck.Element(stopsLow
            ? $"B_gate {gated} 0 V = {{vdd}} * {clockHigh} * {enabled}   $ '{gate.Name}': the clock while enabled, held low otherwise"
            : $"B_gate {gated} 0 V = {{vdd}} * (1 - (1 - {clockHigh}) * {enabled})   $ '{gate.Name}': the clock while enabled, held high otherwise");

        var step = Time.Min(edge, changeLength > Time.Zero ? changeLength / 50 : edge);
        deck.Transient(step, end, Time.Min(period / 400, edge * 2));
        if (latch is not null)
        {
            var opens = SpiceNumbers.Of(opensAt);
            deck.Measure($".meas tran t_enable TRIG AT={opens} TARG v({enableNode}) VAL={{vdd/2}} RISE=1 TD={opens}",
                new DeckEstimate("t_enable", changeLength.Seconds, "s", "the latch's latest data after opening, its entry gate and the path to the enable"));
        }

        var from = SpiceNumbers.Of(windowStart - edge * 2);
        deck.Measure(stopsLow
                ? $".meas tran w_pulse TRIG v({gated}) VAL={{vdd/2}} RISE=1 TD={from} TARG v({gated}) VAL={{vdd/2}} FALL=1 TD={from}"
                : $".meas tran w_pulse TRIG v({gated}) VAL={{vdd/2}} FALL=1 TD={from} TARG v({gated}) VAL={{vdd/2}} RISE=1 TD={from}",
            inside ? new DeckEstimate("w_pulse", (windowStart + passLength - enableAt).Seconds, "s", "what is left of the window after the enable moves") : null);
        deck.Param("w_full", SpiceNumbers.Of(passLength), "the clock's own pulse while the gate passes it (s)");
        deck.Param("t_edge", SpiceNumbers.Of(edge), "the clock's edge time (s)");
        deck.Measure(".meas tran clipped PARAM='w_pulse < w_full - 2 * t_edge ? 1 : 0'",
            inside ? new DeckEstimate("clipped", 1, string.Empty, "1: the enable moves inside the window, so the first pulse is clipped") : null);
        return deck.Build();
    }

    // The first start of a window (at 'start' every 'period') at or after 'after'.
    private static Time NextStart(Time start, Time period, Time after)
    {
        var k = Math.Ceiling((after - start) / period - 1e-9);
        return start + period * k;
    }
}
