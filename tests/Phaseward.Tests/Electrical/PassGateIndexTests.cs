using System;
using System.Linq;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Electrical;

/// <summary>
/// The pass gates' dense numbering everything per gate is kept by (PassGateNetwork.IndexOf / GateAt), checked against
/// LINQ's filter of the device list: the pass gates in device order, numbered from 0.
/// </summary>
public class PassGateIndexTests
{
    private static Netlist Mixed(string name)
    {
        // Inverters, pass gates on a clock and on data, and a NAND, interleaved in the device list.
        var c = Figures.NewCircuit(name);
        var clk = c.Clock("clk", 2.Nanoseconds(), 0.5, 0.Picoseconds());
        var a = c.Inverter(c.Input("a"), "a_b");
        var x = c.Node("x");
        c.TransmissionGate(a, clk.High, x);
        var y = c.Inverter(x, "y");
        var z = c.Node("z");
        c.TransmissionGate(y, c.Input("e"), z);
        var w = c.Node("w");
        c.TransmissionGate(z, clk.Low, w);
        c.Nand(w, a, "q");
        return c.ToNetlist();
    }

    [Fact]
    public void Pass_gates_are_numbered_densely_in_device_order()
    {
        var netlist = Mixed("numbered");
        var network = PassGateNetwork.Of(netlist);
        var expected = netlist.Devices.Where(d => d.IsPassDevice).ToList();

        Assert.Equal(3, expected.Count);
        Assert.Equal(expected.Count, network.PassGateCount);
        Assert.Equal(expected, Enumerable.Range(0, network.PassGateCount).Select(network.GateAt));
        Assert.Equal(Enumerable.Range(0, expected.Count), expected.Select(network.IndexOf));
    }

    [Fact]
    public void A_restoring_stage_or_another_designs_gate_has_no_pass_index()
    {
        var netlist = Mixed("numbered");
        var network = PassGateNetwork.Of(netlist);
        var inverter = netlist.Devices.First(d => !d.IsPassDevice);
        var foreign = Mixed("other").Devices.First(d => d.IsPassDevice);

        var notPass = Assert.Throws<ArgumentException>(() => network.IndexOf(inverter));
        Assert.Contains("'numbered'", notPass.Message);
        Assert.Contains(inverter.Name, notPass.Message);
        var elsewhere = Assert.Throws<ArgumentException>(() => network.IndexOf(foreign));
        Assert.Contains(foreign.Name, elsewhere.Message);
    }
}
