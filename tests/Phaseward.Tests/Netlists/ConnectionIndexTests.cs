using System;
using System.Collections.Generic;
using System.Linq;
using CsCheck;
using Phaseward.Tests.Properties;

namespace Phaseward.Tests.Netlists;

// The netlist's per-net indexes (drivers, data loads, control loads) are stored flat for speed; these tests compare
// them, net by net and in order, with the definition read straight off the device list.
public class ConnectionIndexTests
{
    // Random circuits drawn by CsCheck from a choice sequence: a failure shrinks to a small circuit, printed with its
    // seed (CsCheck_Seed).
    [Fact]
    public void Every_index_lists_the_connected_devices_in_netlist_order()
    {
        ChoiceSequence.Of(1200).Sample(choices =>
        {
            var netlist = RandomCircuit(new ChoiceSequence(choices)).ToNetlist();
            foreach (var net in netlist.Nets)
            {
                Assert.Equal(netlist.Devices.Where(d => d.Output == net), netlist.DriversOf(net));
                Assert.Equal(netlist.Devices.SelectMany(d => d.Inputs.Where(i => i == net).Select(_ => d)), netlist.DataLoadsOf(net));
                Assert.Equal(netlist.Devices.Where(d => d.DataControl == net), netlist.ControlLoadsOf(net));
            }
        }, iter: 60, print: choices => Phaseward.Netlists.NetlistText.Write(RandomCircuit(new ChoiceSequence(choices)).ToNetlist(), includeSpans: false));
    }

    [Fact]
    public void A_net_with_nothing_connected_has_empty_indexes()
    {
        var c = new Circuit("empty");
        var first = c.Node("first");
        var last = c.Node("last");
        var netlist = c.ToNetlist();

        foreach (var net in new[] { first, last })
        {
            Assert.Empty(netlist.DriversOf(net));
            Assert.Empty(netlist.DataLoadsOf(net));
            Assert.Empty(netlist.ControlLoadsOf(net));
        }
    }

    // Primitives of every kind wired at random among the nets made so far (a NAND may take one net twice), driving a
    // new net or, for pass gates, an existing node: many nets with several drivers, loads and controls.
    private static Circuit RandomCircuit(Random random)
    {
        var devices = random.Next(400);
        var c = new Circuit("random");
        var clock = c.Clock("clk", 2.Nanoseconds());
        var nets = new List<Net> { c.Input("a"), c.Input("b"), c.Node("m") };
        Net Any() => nets[random.Next(nets.Count)];
        for (var i = 0; i < devices; i++)
        {
            switch (random.Next(6))
            {
                case 0: nets.Add(c.Inverter(Any())); break;
                case 1: nets.Add(c.Nand(Any(), Any())); break;
                case 2: nets.Add(c.TransmissionGate(Any(), clock.High)); break;
                case 3: nets.Add(c.TransmissionGate(Any(), Any())); break;
                case 4: c.TransmissionGate(Any(), Any(), nets[2]); break;
                default: nets.Add(c.DynamicLatch(Any(), clock.Low)); break;
            }
        }

        return c;
    }
}
