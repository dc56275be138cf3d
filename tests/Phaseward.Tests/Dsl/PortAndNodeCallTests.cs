using Phaseward.Tests.Support;

namespace Phaseward.Tests.Dsl;

public class PortAndNodeCallTests
{
    [Fact]
    public void Input_makes_a_named_net_and_an_input_port()
    {
        var c = new Circuit("ports");
        var a = c.Input("a");

        var netlist = c.ToNetlist();
        Assert.Equal("a", a.Name);
        Assert.Equal(0, a.Id);
        var port = Assert.Single(netlist.Inputs);
        Assert.Equal("a", port.Name);
        Assert.Same(a, port.Net);
        Assert.True(netlist.IsInput(a));
        Assert.Empty(netlist.DriversOf(a));
    }

    [Fact]
    public void Output_names_an_existing_net_without_adding_nets_or_devices()
    {
        var c = new Circuit("ports");
        var a = c.Input("a");
        var y = c.Inverter(a, "y");

        c.Output("result", y);

        var netlist = c.ToNetlist();
        var port = Assert.Single(netlist.Outputs);
        Assert.Equal("result", port.Name);
        Assert.Same(y, port.Net);
        Assert.Equal(2, netlist.Nets.Count);
        Assert.Equal(1, c.DeviceCount);
        Assert.False(netlist.IsInput(y));
    }

    [Fact]
    public void Output_may_name_the_same_net_twice_under_different_names()
    {
        var c = new Circuit("ports");
        var a = c.Input("a");
        c.Output("first", a);
        c.Output("second", a);

        Assert.Equal(new[] { "first", "second" }, System.Linq.Enumerable.ToArray(System.Linq.Enumerable.Select(c.ToNetlist().Outputs, p => p.Name)));
    }

    [Fact]
    public void Node_makes_an_undriven_net_named_or_auto_named()
    {
        var c = new Circuit("ports");
        var named = c.Node("mux");
        var first = c.Node();
        var second = c.Node();

        Assert.Equal("mux", named.Name);
        Assert.Equal("node1", first.Name);
        Assert.Equal("node2", second.Name);
        var netlist = c.ToNetlist();
        Assert.Equal(new[] { "mux", "node1", "node2" }, netlist.Nets.Names());
        Assert.Empty(netlist.DriversOf(named));
        Assert.Equal(0, c.DeviceCount);
    }

    [Fact]
    public void Auto_names_skip_names_already_taken()
    {
        var c = new Circuit("ports");
        c.Input("node1");

        Assert.Equal("node2", c.Node().Name);
    }

    [Fact]
    public void Net_ids_follow_creation_order()
    {
        var c = new Circuit("ports");
        var a = c.Input("a");
        var n = c.Node("n");
        var y = c.Inverter(a);

        Assert.Equal(new[] { 0, 1, 2 }, new[] { a.Id, n.Id, y.Id });
        Assert.Equal(new[] { a, n, y }, c.ToNetlist().Nets);
    }
}
