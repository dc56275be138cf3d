using System.Linq;
using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Macros;

// A positive-edge master-slave register: the master latch is transparent while the clock is low, the slave while it is
// high, so the output changes only at the rising edge (common practice; e.g. Rabaey, Chandrakasan & Nikolic,
// "Digital Integrated Circuits", 2nd ed., chapter 7 -- from memory).
public class RegisterExpansionTests
{
    [Fact]
    public void Dynamic_register_is_a_master_latch_on_clock_low_then_a_slave_on_clock_high()
    {
        var c = new Circuit("registers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");

        var q = c.DynamicRegister(d, clk, "R");

        var netlist = c.ToNetlist();
        Assert.Equal(new[] { "d", "R.master.x", "R.master", "R.slave.x", "R" }, netlist.Nets.Names());
        Assert.Equal("R", q.Name);
        Assert.Equal(4, netlist.Devices.Count);

        var masterPass = netlist.Device("R.master.pass");
        Assert.Equal(new[] { d }, masterPass.Inputs);
        Assert.Same(netlist.Net("R.master.x"), masterPass.Output);
        Assert.Same(clk.Low, masterPass.ClockControl);

        var masterInverter = netlist.Device("R.master.inverter");
        Assert.Equal(new[] { netlist.Net("R.master.x") }, masterInverter.Inputs);
        Assert.Same(netlist.Net("R.master"), masterInverter.Output);

        var slavePass = netlist.Device("R.slave.pass");
        Assert.Equal(new[] { netlist.Net("R.master") }, slavePass.Inputs);
        Assert.Same(netlist.Net("R.slave.x"), slavePass.Output);
        Assert.Same(clk.High, slavePass.ClockControl);

        var slaveInverter = netlist.Device("R.slave.inverter");
        Assert.Equal(new[] { netlist.Net("R.slave.x") }, slaveInverter.Inputs);
        Assert.Same(q, slaveInverter.Output);
    }

    [Fact]
    public void Dynamic_register_nests_its_two_latches_under_one_macro()
    {
        var c = new Circuit("registers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");

        var netlist = c.ToNetlist();
        Assert.Equal(new[] { "R", "R.master", "R.slave" }, netlist.Macros.Select(m => m.Name).ToArray());
        var register = netlist.Macro("R");
        var master = netlist.Macro("R.master");
        var slave = netlist.Macro("R.slave");

        Assert.Equal(MacroKind.DynamicRegister, register.Kind);
        Assert.Null(register.Parent);
        Assert.Equal(new[] { master, slave }, register.Parts);
        Assert.Equal(netlist.Devices, register.Devices);

        Assert.Equal(MacroKind.DynamicLatch, master.Kind);
        Assert.Same(register, master.Parent);
        Assert.Empty(master.Parts);
        Assert.Equal(new[] { netlist.Device("R.master.pass"), netlist.Device("R.master.inverter") }, master.Devices);

        Assert.Equal(MacroKind.DynamicLatch, slave.Kind);
        Assert.Same(register, slave.Parent);
        Assert.Equal(new[] { netlist.Device("R.slave.pass"), netlist.Device("R.slave.inverter") }, slave.Devices);

        // Each device belongs to its innermost cell.
        Assert.Same(master, netlist.Device("R.master.inverter").Macro);
        Assert.Same(slave, netlist.Device("R.slave.pass").Macro);
    }

    [Fact]
    public void Static_register_is_two_static_latches_with_feedback_on_the_opposite_phases()
    {
        var c = new Circuit("registers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");

        var q = c.StaticRegister(d, clk, "R");

        var netlist = c.ToNetlist();
        Assert.Equal(new[] { "d", "R.master.x", "R.master", "R.master.fb", "R.slave.x", "R", "R.slave.fb" }, netlist.Nets.Names());
        Assert.Equal(8, netlist.Devices.Count);
        Assert.Equal("R", q.Name);

        Assert.Same(clk.Low, netlist.Device("R.master.pass").ClockControl);
        Assert.Same(clk.High, netlist.Device("R.master.feedback-pass").ClockControl);
        Assert.Same(clk.High, netlist.Device("R.slave.pass").ClockControl);
        Assert.Same(clk.Low, netlist.Device("R.slave.feedback-pass").ClockControl);

        Assert.Equal(new[] { netlist.Net("R.master") }, netlist.Device("R.master.feedback-inverter").Inputs);
        Assert.Same(netlist.Net("R.master.fb"), netlist.Device("R.master.feedback-inverter").Output);
        Assert.Same(netlist.Net("R.master.x"), netlist.Device("R.master.feedback-pass").Output);
        Assert.Equal(new[] { q }, netlist.Device("R.slave.feedback-inverter").Inputs);
        Assert.Same(netlist.Net("R.slave.x"), netlist.Device("R.slave.feedback-pass").Output);

        var register = netlist.Macro("R");
        Assert.Equal(MacroKind.StaticRegister, register.Kind);
        Assert.Equal(8, register.Devices.Count);
        Assert.All(register.Parts, part => Assert.Equal(MacroKind.StaticLatch, part.Kind));
        Assert.All(register.Parts, part => Assert.Equal(4, part.Devices.Count));
    }

    [Fact]
    public void Unnamed_registers_are_numbered()
    {
        var c = new Circuit("registers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var first = c.DynamicRegister(c.Input("d"), clk);
        var second = c.StaticRegister(first, clk);

        Assert.Equal("reg1", first.Name);
        Assert.Equal("reg2", second.Name);
        Assert.Contains(c.ToNetlist().Nets, n => n.Name == "reg2.master.fb");
    }

    [Fact]
    public void Unnamed_register_skips_a_number_whose_internal_nets_are_taken()
    {
        var c = new Circuit("registers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.Node("reg1.master");

        var q = c.DynamicRegister(c.Input("d"), clk);

        Assert.Equal("reg2", q.Name);
    }
}
