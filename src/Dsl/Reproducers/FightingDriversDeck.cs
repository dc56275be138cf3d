using System;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Reproducers;

/// <summary>
/// PW3004: the node and the two drivers that fight on it, each with the rest of its path lumped behind it (see
/// <see cref="DrivePaths"/>). The first driver pulls up and the second down (they disagree), both conducting: a
/// data-controlled gate's control is held on, and clocked gates conduct while both windows are open, which the deck
/// holds for the whole run (the level the node is pulled to whenever they overlap for longer than its time constant).
/// Measures <c>v_fight</c>, the node's level, and <c>i_fight</c>, the current from rail to rail.
/// </summary>
internal static class FightingDriversDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var net = DeckInputs.NetByName(finding, netlist, FindingPropertyKeys.Node);
        var up = DrivePaths.Driver(finding, netlist, net, DeckInputs.Property(finding, FindingPropertyKeys.Driver));
        var down = DrivePaths.Driver(finding, netlist, net, DeckInputs.Property(finding, FindingPropertyKeys.OtherDriver));
        var r1 = new Resistance(DeckInputs.Number(finding, FindingPropertyKeys.DriverOhms));
        var r2 = new Resistance(DeckInputs.Number(finding, FindingPropertyKeys.OtherDriverOhms));
        var level = DeckInputs.Number(finding, FindingPropertyKeys.LevelVolts);
        var current = DeckInputs.Number(finding, FindingPropertyKeys.CurrentAmperes);
        var capacitance = netlist.CapacitanceOf(net);
        var tau = new Time((r1.Ohms * r2.Ohms / (r1.Ohms + r2.Ohms)) * capacitance.Farads);
        var end = new Time(Math.Max(tau.Seconds, 1e-12) * 40);

        var deck = new DeckWriter(finding, netlist);
        deck.Describe($"Sub-circuit: node '{net.Name}' ({capacitance}) and its two drivers: '{up.Name}' (path {r1}) pulling up and '{down.Name}' (path {r2}) pulling down, each with the rest of its path lumped behind it.");
        deck.Describe("Stimulus: both drivers conduct from the start and disagree (the first drives vdd, the second 0 V); the node starts at vdd/2."
            + (finding.Properties.TryGetValue(FindingPropertyKeys.OverlapSeconds, out var overlap)
                ? $" Their clocks overlap for {new Time(double.Parse(overlap, CultureInfo.InvariantCulture))} per period: the deck holds both windows open, which is where the node goes while they overlap (it gets there when the overlap is longer than the node's time constant, about {tau})."
                : string.Empty));
        deck.Describe("Measured: v_fight, the node's level (Phaseward's estimate: the divider V·R2/(R1+R2)), and i_fight, the current through the pull-up path (V/(R1+R2)).");

        var high = deck.Fresh("vdd_rail");
        var low = deck.Fresh("gnd_rail");
        deck.Dc(high, "{vdd}", "the level the first driver drives");
        deck.Dc(low, "0", "the level the second driver drives");
        var on = deck.Fresh("on_both");
        deck.Dc(on, "{vdd}", "both pass devices held conducting (their controls or windows on together)");
        var node = deck.Node(net);
        var probe = deck.Fresh("up_probe");
        DrivePaths.Draw(deck, netlist, up, r1, high, probe, on, "pull-up path");
        deck.Element($"V_probe {probe} {node} 0   $ measures the current of the pull-up path");
        DrivePaths.Draw(deck, netlist, down, r2, low, node, on, "pull-down path");
        deck.Capacitor(node, capacitance, $"'{net.Name}'");
        deck.Element($".ic v({node})={SpiceNumbers.Of(deck.Supply / 2)}");

        deck.Transient(end / 2000, end * 1.02, end / 500); // a little past the measuring instant, so that FIND ... AT= has a point after it
        deck.Measure($".meas tran v_fight FIND v({node}) AT={SpiceNumbers.Of(DeckWriter.SettledBefore(end))}",
            new DeckEstimate("v_fight", level, "V", "divider V·R2/(R1+R2)"));
        deck.Measure($".meas tran i_fight FIND i(V_probe) AT={SpiceNumbers.Of(DeckWriter.SettledBefore(end))}",
            new DeckEstimate("i_fight", current, "A", "rail-to-rail current V/(R1+R2)"));
        return deck.Build();
    }
}
