using System;
using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Reproducers;

/// <summary>
/// PW1005: the loop's devices in order round the loop, each stage with its node's capacitance; restoring stages as
/// the simple models (a NAND or NOR with its other inputs at the level that enables the loop), data-controlled pass
/// gates held conducting. The first node starts at 0 V, the others where the stages put them. An odd loop
/// oscillates: <c>t_period</c> measures its period (Phaseward's estimate: twice the loop's delay, 2·Σ 0.69·R·C). An
/// even loop settles at a rail and stays: <c>latched</c> is 1 when the first node ends within 10 % of a rail.
/// </summary>
internal static class LoopDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var firstName = DeckInputs.Property(finding, FindingPropertyKeys.FirstDevice);
        if (!finding.Properties.TryGetValue(FindingPropertyKeys.Inversions, out var inversionsText))
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} is a tangle of loops that share nets: its behaviour depends on their other inputs, and there is no single loop to draw in a deck.", nameof(finding));
        var inversions = int.Parse(inversionsText, CultureInfo.InvariantCulture);
        var loop = Ordered(finding, netlist, firstName);
        var odd = inversions % 2 == 1;
        var delay = new Time(DeckInputs.Number(finding, FindingPropertyKeys.LoopDelaySeconds));
        var period = delay * 2;
        var end = period * 8;

        var deck = new DeckWriter(finding, netlist);
        deck.Describe($"Sub-circuit: the loop of {loop.Count} device(s) ({string.Join(" -> ", loop.ConvertAll(d => "'" + d.Name + "'"))} -> back), {inversions} inversion(s), loop delay {delay}.");
        deck.Describe($"Stimulus: none from outside; the loop is enabled (other inputs of its gates at their enabling level, data-controlled pass gates on) and '{loop[0].Output.Name}' starts at 0 V.");
        deck.Describe(odd
            ? "Measured: t_period, the period of the oscillation at the first device's output (between its second and third rising crossings of vdd/2)."
            : "Measured: latched = 1 when the first device's output ends within 10 % of a rail (the loop holds whatever level it fell into, and nothing writes it).");

        string? on = null;
        foreach (var device in loop)
        {
            var from = deck.Node(device.Inputs[InLoopInput(device, loop)]);
            var output = deck.Node(device.Output);
            if (device.IsRestoring)
            {
                deck.RestoringStage(device, from, output);
            }
            else
            {
                if (on is null)
                {
                    on = deck.Fresh("on_data_gates");
                    deck.Dc(on, "{vdd}", "data-controlled pass gates on the loop held conducting");
                }

                deck.PassGate(device, from, output, on);
            }

            deck.Capacitor(output, netlist.CapacitanceOf(device.Output), $"'{device.Output.Name}'");
        }

        var watched = deck.Node(loop[0].Output);
        deck.Element($".ic v({watched})=0");
        deck.Transient(period / 1000, end, period / 200);
        if (odd)
        {
            deck.Measure($".meas tran t_period TRIG v({watched}) VAL={{vdd/2}} RISE=2 TARG v({watched}) VAL={{vdd/2}} RISE=3",
                new DeckEstimate("t_period", period.Seconds, "s", "twice the loop's delay, 2·Σ 0.69·R·C"));
        }
        else
        {
            deck.Measure($".meas tran v_end FIND v({watched}) AT={SpiceNumbers.Of(end * 0.99)}", null);
            deck.Measure(".meas tran latched PARAM='abs(v_end - vdd/2) > 0.4 * vdd ? 1 : 0'",
                new DeckEstimate("latched", 1, string.Empty, "1: an even loop settles at a rail and holds it"));
        }

        return deck.Build();
    }

    // The loop whose first device is the finding's, in order round the loop (each device's output feeds the next).
    private static List<Device> Ordered(Finding finding, Netlist netlist, string firstName)
    {
        foreach (var loop in CombinationalLoops.Of(netlist))
        {
            if (loop.Count == 0 || loop[0].Name != firstName) continue;
            var ordered = new List<Device> { loop[0] };
            while (ordered.Count < loop.Count)
            {
                var last = ordered[ordered.Count - 1];
                Device? next = null;
                foreach (var device in loop)
                    if (!ordered.Contains(device) && Array.IndexOf(InputsOf(device), last.Output) >= 0)
                        next = device;
                if (next is null) break;
                ordered.Add(next);
            }

            if (ordered.Count == loop.Count && InLoopInput(ordered[0], ordered) >= 0)
                return ordered;
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: the loop from '{firstName}' is not a single chain of stages through their data inputs (it runs through a pass gate's control), which this deck does not draw.", nameof(finding));
        }

        throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: design '{netlist.DesignName}' has no loop starting at '{firstName}'.", nameof(finding));
    }

    private static Net[] InputsOf(Device device)
    {
        var inputs = new Net[device.Inputs.Count];
        for (var i = 0; i < inputs.Length; i++) inputs[i] = device.Inputs[i];
        return inputs;
    }

    // The index of the device's input that the previous device of the loop drives (-1 when it is the control).
    private static int InLoopInput(Device device, List<Device> loop)
    {
        var previous = loop[(loop.IndexOf(device) + loop.Count - 1) % loop.Count];
        for (var i = 0; i < device.Inputs.Count; i++)
            if (ReferenceEquals(device.Inputs[i], previous.Output))
                return i;
        return -1;
    }
}
