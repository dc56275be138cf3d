using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Macros;

// A dynamic latch is a pass gate on its phase into a storage node and a restoring inverter after it; a static latch
// adds an inverter and a pass gate on the complementary phase that feed the output back into the storage node
// (common practice; the usual textbook latch, e.g. Weste & Harris, "CMOS VLSI Design", 4th ed., chapter 10 -- from memory).
public class LatchExpansionTests
{
    [Fact]
    public void Dynamic_latch_is_a_pass_gate_into_a_storage_node_then_an_inverter()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");

        var q = c.DynamicLatch(d, clk.High, "L");

        var netlist = c.ToNetlist();
        Assert.Equal(new[] { "d", "L.x", "L" }, netlist.Nets.Names());
        Assert.Equal(2, netlist.Devices.Count);
        var storage = netlist.Net("L.x");

        var pass = netlist.Devices[0];
        Assert.Equal(("L.pass", DeviceKind.TransmissionGate, "pass"), (pass.Name, pass.Kind, pass.Role));
        Assert.Equal(new[] { d }, pass.Inputs);
        Assert.Same(storage, pass.Output);
        Assert.Same(clk.High, pass.ClockControl);

        var inverter = netlist.Devices[1];
        Assert.Equal(("L.inverter", DeviceKind.Inverter, "inverter"), (inverter.Name, inverter.Kind, inverter.Role));
        Assert.Equal(new[] { storage }, inverter.Inputs);
        Assert.Same(q, inverter.Output);
        Assert.Equal("L", q.Name);
        Assert.False(inverter.IsWeak);

        Assert.True(netlist.IsDrivenOnlyThroughPassDevices(storage));
    }

    [Fact]
    public void Dynamic_latch_is_one_macro_instance_owning_both_devices()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.DynamicLatch(c.Input("d"), clk.Low, "L");

        var netlist = c.ToNetlist();
        var macro = Assert.Single(netlist.Macros);
        Assert.Equal(MacroKind.DynamicLatch, macro.Kind);
        Assert.Equal("L", macro.Name);
        Assert.Null(macro.Parent);
        Assert.Empty(macro.Parts);
        Assert.Equal(netlist.Devices, macro.Devices);
        Assert.All(netlist.Devices, device => Assert.Same(macro, device.Macro));
        Assert.Same(clk.Low, netlist.Devices[0].ClockControl);
    }

    [Fact]
    public void Static_latch_adds_a_feedback_inverter_and_a_feedback_pass_gate_on_the_complementary_phase()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");

        var q = c.StaticLatch(d, clk.High, "S");

        var netlist = c.ToNetlist();
        Assert.Equal(new[] { "d", "S.x", "S", "S.fb" }, netlist.Nets.Names());
        Assert.Equal(4, netlist.Devices.Count);
        var storage = netlist.Net("S.x");
        var feedback = netlist.Net("S.fb");

        var pass = netlist.Device("S.pass");
        Assert.Equal((DeviceKind.TransmissionGate, "pass"), (pass.Kind, pass.Role));
        Assert.Equal(new[] { d }, pass.Inputs);
        Assert.Same(storage, pass.Output);
        Assert.Same(clk.High, pass.ClockControl);

        var inverter = netlist.Device("S.inverter");
        Assert.Equal((DeviceKind.Inverter, "inverter"), (inverter.Kind, inverter.Role));
        Assert.Equal(new[] { storage }, inverter.Inputs);
        Assert.Same(q, inverter.Output);

        var feedbackInverter = netlist.Device("S.feedback-inverter");
        Assert.Equal((DeviceKind.Inverter, "feedback-inverter"), (feedbackInverter.Kind, feedbackInverter.Role));
        Assert.Equal(new[] { q }, feedbackInverter.Inputs);
        Assert.Same(feedback, feedbackInverter.Output);

        var feedbackPass = netlist.Device("S.feedback-pass");
        Assert.Equal((DeviceKind.TransmissionGate, "feedback-pass"), (feedbackPass.Kind, feedbackPass.Role));
        Assert.Equal(new[] { feedback }, feedbackPass.Inputs);
        Assert.Same(storage, feedbackPass.Output);
        Assert.Same(clk.Low, feedbackPass.ClockControl);

        Assert.Equal(new[] { pass, feedbackPass }, netlist.DriversOf(storage));
        var macro = Assert.Single(netlist.Macros);
        Assert.Equal(MacroKind.StaticLatch, macro.Kind);
        Assert.Equal(netlist.Devices, macro.Devices);
    }

    [Fact]
    public void Static_latch_transparent_while_low_feeds_back_while_high()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.StaticLatch(c.Input("d"), clk.Low, "S");

        var netlist = c.ToNetlist();
        Assert.Same(clk.Low, netlist.Device("S.pass").ClockControl);
        Assert.Same(clk.High, netlist.Device("S.feedback-pass").ClockControl);
    }

    [Fact]
    public void Unnamed_latches_are_numbered()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");

        var first = c.DynamicLatch(d, clk.High);
        var second = c.StaticLatch(first, clk.Low);

        Assert.Equal("latch1", first.Name);
        Assert.Equal("latch2", second.Name);
        Assert.Equal(new[] { "d", "latch1.x", "latch1", "latch2.x", "latch2", "latch2.fb" }, c.ToNetlist().Nets.Names());
    }

    [Fact]
    public void Unnamed_latch_skips_a_number_whose_internal_nets_are_taken()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.Node("latch1.x");

        var q = c.DynamicLatch(c.Input("d"), clk.High);

        Assert.Equal("latch2", q.Name);
    }

    [Fact]
    public void Latch_on_a_gated_clock_uses_the_gated_phase()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var gated = c.ClockGate(clk, c.Input("en"));
        c.DynamicLatch(c.Input("d"), gated.High, "L");

        Assert.Same(gated.High, c.ToNetlist().Device("L.pass").ClockControl);
    }
}
