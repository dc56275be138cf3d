using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Reproducers;

/// <summary>
/// PW3005: the kept node, its keeper (the weak feedback stage and the stage that senses the node) and its weakest
/// write path (the writer with the rest of its path lumped behind it, see <see cref="DrivePaths"/>). The node holds
/// a 1; the write path then writes a 0 against the keeper. Two copies of the sub-circuit: in the first the keeper's
/// input is held where it was (the keeper keeps driving a 1, as the estimate takes it), and <c>v_level</c> measures
/// the divider; in the second the keeper's loop is closed, and <c>flipped</c> says whether the write won (1) or the
/// keeper held the node (0) with these ideal stages, which switch at exactly vdd/2.
/// </summary>
internal static class KeeperWriteDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var net = DeckInputs.NetByName(finding, netlist, FindingPropertyKeys.Node);
        var writer = DrivePaths.Driver(finding, netlist, net, DeckInputs.Property(finding, FindingPropertyKeys.Writer));
        var write = new Resistance(DeckInputs.Number(finding, FindingPropertyKeys.WriteOhms));
        var keeperOhms = DeckInputs.Number(finding, FindingPropertyKeys.KeeperOhms);
        var level = DeckInputs.Number(finding, FindingPropertyKeys.LevelVolts);
        var keepers = new List<Device>();
        foreach (var driver in netlist.DriversOf(net))
            if (driver.IsWeak && driver.IsRestoring && driver.Inputs.Count == 1)
                keepers.Add(driver);
        if (keepers.Count == 0)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: node '{net.Name}' has no weak restoring stage (keeper) in design '{netlist.DesignName}'.", nameof(finding));

        var capacitance = netlist.CapacitanceOf(net);
        var tau = new Time(Math.Max(write.Ohms * keeperOhms / (write.Ohms + keeperOhms) * capacitance.Farads, 1e-13));
        foreach (var keeper in keepers)
            if (Sense(netlist, keeper, net) is { } sense)
                tau = Time.Max(tau, new Time(netlist.ResistanceOf(sense).Ohms * netlist.CapacitanceOf(sense.Output).Farads));
        var writeAt = tau * 5;
        var end = writeAt + tau * 60;

        var deck = new DeckWriter(finding, netlist);
        deck.Describe($"Sub-circuit: node '{net.Name}' ({capacitance}), its keeper ({string.Join(", ", keepers.ConvertAll(k => $"'{k.Name}'"))}, {new Resistance(keeperOhms)} in all) and its weakest write path through '{writer.Name}' ({write} in all), drawn twice.");
        deck.Describe($"Stimulus: the node holds a 1 (the keeper drives it); at {writeAt} the write path starts writing a 0 against it.");
        deck.Describe("Copy 1, keeper held: the keeper's input stays where it was, so the keeper keeps driving a 1 (as the estimate takes it): v_level is the divider V·R_w/(R_w+R_k). "
            + "Copy 2, keeper loop closed: flipped = 1 if the node ends below vdd/2 (the write won), 0 if the keeper held it. These ideal stages switch at exactly vdd/2; real ones do not, which is why the rule asks for a margin.");

        var gnd = deck.Fresh("gnd_rail");
        deck.Dc(gnd, "0", "the level the write path drives");
        var on = deck.Fresh("on_write");
        var edge = tau.Seconds / 20;
        deck.Pwl(on, new[] { (0.0, 0.0), (writeAt.Seconds, 0.0), (writeAt.Seconds + edge, deck.Supply) }, $"the write path conducts from {writeAt}");

        deck.Comment("copy 1: keeper held");
        var held = deck.Node(net);
        DrivePaths.Draw(deck, netlist, writer, write, gnd, held, on, "write path");
        foreach (var keeper in keepers)
        {
            var input = deck.Fresh("held_" + DeckWriter.Safe(keeper.Inputs[0].Name));
            deck.Dc(input, keeper.Kind == DeviceKind.Buffer ? "{vdd}" : "0", $"the keeper's input '{keeper.Inputs[0].Name}' held at the level that makes it drive a 1");
            deck.RestoringStage(keeper, input, held);
        }

        deck.Capacitor(held, capacitance, $"'{net.Name}'");
        deck.Element($".ic v({held})={{vdd}}");

        deck.Comment("copy 2: keeper loop closed");
        var closed = deck.Fresh("n_" + DeckWriter.Safe(net.Name) + "_loop");
        DrivePaths.Draw(deck, netlist, writer, write, gnd, closed, on, "write path");
        foreach (var keeper in keepers)
        {
            var input = deck.Fresh("loop_" + DeckWriter.Safe(keeper.Inputs[0].Name));
            if (Sense(netlist, keeper, net) is { } sense)
            {
                deck.RestoringStage(sense, closed, input);
                deck.Capacitor(input, netlist.CapacitanceOf(sense.Output), $"'{sense.Output.Name}', the keeper's sense");
            }
            else
            {
                deck.Element($"{deck.NextName("B")}_{input} {input} 0 V = {{vdd}} / (1 + exp((V({closed}) - {{vdd/2}}) / 0.01))   $ the keeper's input '{keeper.Inputs[0].Name}', taken as the inverse of the node");
            }

            deck.Element($".ic v({input})={(keeper.Kind == DeviceKind.Buffer ? "{vdd}" : "0")}");
            deck.RestoringStage(keeper, input, closed);
        }

        deck.Capacitor(closed, capacitance, $"'{net.Name}' (copy 2)");
        deck.Element($".ic v({closed})={{vdd}}");

        deck.Transient(tau / 50, end * 1.02, tau / 10); // a little past the measuring instant, so that FIND ... AT= has a point after it
        deck.Measure($".meas tran v_level FIND v({held}) AT={SpiceNumbers.Of(DeckWriter.SettledBefore(end))}",
            new DeckEstimate("v_level", level, "V", "level a 0 written against the keeper reaches, V·R_w/(R_w+R_k)"));
        deck.Measure($".meas tran v_loop FIND v({closed}) AT={SpiceNumbers.Of(DeckWriter.SettledBefore(end))}", null);
        deck.Measure(".meas tran flipped PARAM='v_loop < vdd/2 ? 1 : 0'",
            new DeckEstimate("flipped", level < deck.Supply / 2 ? 1 : 0, string.Empty, "1 when the divider level is below the switching point vdd/2"));
        return deck.Build();
    }

    // The restoring stage that senses the node and drives the keeper's input, when the keeper is built that way.
    private static Device? Sense(Netlist netlist, Device keeper, Net node)
    {
        foreach (var driver in netlist.DriversOf(keeper.Inputs[0]))
            if (driver.IsRestoring && !driver.IsWeak && driver.Inputs.Count == 1 && ReferenceEquals(driver.Inputs[0], node))
                return driver;
        return null;
    }
}
