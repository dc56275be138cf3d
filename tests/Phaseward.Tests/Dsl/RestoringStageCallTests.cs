using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Dsl;

public class RestoringStageCallTests
{
    [Fact]
    public void Inverter_makes_an_auto_named_output_driven_by_one_device()
    {
        var c = new Circuit("stages");
        var a = c.Input("a");

        var y = c.Inverter(a);

        var device = Assert.Single(c.ToNetlist().Devices);
        Assert.Equal("inv1", y.Name);
        Assert.Equal(DeviceKind.Inverter, device.Kind);
        Assert.Equal("inv1", device.Name);
        Assert.Equal(new[] { a }, device.Inputs);
        Assert.Same(y, device.Output);
        Assert.Null(device.ClockControl);
        Assert.Null(device.DataControl);
        Assert.Null(device.ResistanceOverride);
        Assert.Null(device.Macro);
        Assert.Null(device.Role);
        Assert.False(device.IsWeak);
        Assert.True(device.IsRestoring);
        Assert.False(device.IsPassDevice);
    }

    [Fact]
    public void Inverter_takes_a_name_for_its_output()
    {
        var c = new Circuit("stages");
        var y = c.Inverter(c.Input("a"), "ybar");

        Assert.Equal("ybar", y.Name);
        Assert.Equal("ybar", Assert.Single(c.ToNetlist().Devices).Name);
    }

    [Fact]
    public void Inverter_can_drive_a_net_declared_earlier()
    {
        var c = new Circuit("stages");
        var a = c.Input("a");
        var loop = c.Node("loop");

        c.Inverter(a, loop);

        var netlist = c.ToNetlist();
        var device = Assert.Single(netlist.Devices);
        Assert.Same(loop, device.Output);
        Assert.Equal("loop.inv1", device.Name);
        Assert.Equal(new[] { device }, netlist.DriversOf(loop));
        Assert.Equal(2, netlist.Nets.Count);
    }

    [Fact]
    public void Buffer_in_both_forms()
    {
        var c = new Circuit("stages");
        var a = c.Input("a");
        var made = c.Buffer(a);
        var node = c.Node("n");
        c.Buffer(made, node);

        var netlist = c.ToNetlist();
        Assert.Equal("buf1", made.Name);
        Assert.All(netlist.Devices, d => Assert.Equal(DeviceKind.Buffer, d.Kind));
        Assert.Equal(new[] { a }, netlist.Devices[0].Inputs);
        Assert.Equal(new[] { made }, netlist.Devices[1].Inputs);
        Assert.Same(node, netlist.Devices[1].Output);
        Assert.False(DeviceKind.Buffer.IsInverting());
    }

    [Fact]
    public void Nand_in_both_forms_keeps_its_inputs_in_order()
    {
        var c = new Circuit("stages");
        var a = c.Input("a");
        var b = c.Input("b");
        var made = c.Nand(a, b, "ab");
        var node = c.Node("n");
        c.Nand(b, made, node);

        var netlist = c.ToNetlist();
        Assert.Equal(DeviceKind.Nand, netlist.Devices[0].Kind);
        Assert.Equal(new[] { a, b }, netlist.Devices[0].Inputs);
        Assert.Same(made, netlist.Devices[0].Output);
        Assert.Equal(new[] { b, made }, netlist.Devices[1].Inputs);
        Assert.Same(node, netlist.Devices[1].Output);
        Assert.True(DeviceKind.Nand.IsInverting());
    }

    [Fact]
    public void Nor_in_both_forms_keeps_its_inputs_in_order()
    {
        var c = new Circuit("stages");
        var a = c.Input("a");
        var b = c.Input("b");
        var made = c.Nor(a, b);
        var node = c.Node("n");
        c.Nor(made, a, node);

        var netlist = c.ToNetlist();
        Assert.Equal("nor1", made.Name);
        Assert.Equal(DeviceKind.Nor, netlist.Devices[0].Kind);
        Assert.Equal(new[] { a, b }, netlist.Devices[0].Inputs);
        Assert.Equal(new[] { made, a }, netlist.Devices[1].Inputs);
        Assert.Same(node, netlist.Devices[1].Output);
        Assert.True(DeviceKind.Nor.IsInverting());
        Assert.True(DeviceKind.Inverter.IsInverting());
    }

    [Fact]
    public void Every_device_is_indexed_as_a_load_of_its_inputs_and_a_driver_of_its_output()
    {
        var c = new Circuit("stages");
        var a = c.Input("a");
        var b = c.Input("b");
        var x = c.Nand(a, b);
        var y = c.Inverter(a);

        var netlist = c.ToNetlist();
        Assert.Equal(netlist.Devices, netlist.DataLoadsOf(a));
        Assert.Equal(new[] { netlist.Devices[0] }, netlist.DataLoadsOf(b));
        Assert.Equal(new[] { netlist.Devices[0] }, netlist.DriversOf(x));
        Assert.Equal(new[] { netlist.Devices[1] }, netlist.DriversOf(y));
        Assert.Empty(netlist.DataLoadsOf(y));
        Assert.Equal(new[] { 0, 1 }, new[] { netlist.Devices[0].Id, netlist.Devices[1].Id });
    }
}
