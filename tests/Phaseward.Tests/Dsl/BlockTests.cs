using System;
using System.Linq;

namespace Phaseward.Tests.Dsl;

public class BlockTests
{
    private sealed class Stage : Block
    {
        private readonly Net input;
        private readonly Phase phase;
        private readonly Block? inner;

        public Stage(Net input, Phase phase, Block? inner = null)
        {
            this.input = input;
            this.phase = phase;
            this.inner = inner;
        }

        public Net Output { get; private set; } = null!;

        protected override void Describe(Circuit c)
        {
            var stored = c.DynamicLatch(input, phase, "l");
            var node = c.Node();
            c.Inverter(stored, node);
            Output = c.Inverter(node, "r");
            c.ClockGate(phase.Clock, Output);
            if (inner is not null)
                c.Place(inner, "inner");
        }
    }

    [Fact]
    public void Names_made_inside_a_block_get_its_instance_name_and_the_same_local_names_can_be_used_twice()
    {
        var c = new Circuit("blocks");
        var clk = c.Clock("clk", 4.Nanoseconds());
        var first = c.Place(new Stage(c.Input("d"), clk.High), "first");
        var second = c.Place(new Stage(first.Output, clk.Low), "second");

        Assert.Equal("first.r", first.Output.Name);
        Assert.Equal("second.r", second.Output.Name);
        var netlist = c.ToNetlist();
        Assert.Contains(netlist.Nets, n => n.Name == "first.l.x");
        Assert.Contains(netlist.Nets, n => n.Name == "second.node1");
        Assert.Contains(netlist.Devices, d => d.Name == "second.node1.inv1");
        Assert.Contains(netlist.Clocks, k => k.Name == "second.clk.gated1");
        Assert.Equal(string.Empty, c.Scope);
    }

    [Fact]
    public void Blocks_nest()
    {
        var c = new Circuit("nested");
        var clk = c.Clock("clk", 4.Nanoseconds());
        var d = c.Input("d");
        c.Place(new Stage(d, clk.High, new Stage(d, clk.Low)), "lane3");

        Assert.Contains(c.ToNetlist().Nets, n => n.Name == "lane3.inner.r");
    }

    [Fact]
    public void A_duplicate_instance_name_in_one_scope_is_refused_and_changes_nothing()
    {
        var c = new Circuit("dup");
        var clk = c.Clock("clk", 4.Nanoseconds());
        var d = c.Input("d");
        c.Place(new Stage(d, clk.High), "lane");
        var devices = c.DeviceCount;

        var e = Assert.Throws<ArgumentException>(() => c.Place(new Stage(d, clk.High), "lane"));
        Assert.Equal("name", e.ParamName);
        Assert.Contains("\"lane\" is already placed in design 'dup'", e.Message);
        Assert.Equal(devices, c.DeviceCount);
    }

    [Theory]
    [InlineData("a.b")]
    [InlineData(" ")]
    public void A_bad_instance_name_is_refused_with_its_value(string name)
    {
        var c = new Circuit("bad");
        var clk = c.Clock("clk", 4.Nanoseconds());
        var e = Assert.Throws<ArgumentException>(() => c.Place(new Stage(c.Input("d"), clk.High), name));
        Assert.Contains("\"" + name + "\"", e.Message);
        Assert.Equal(0, c.DeviceCount);
    }

    [Fact]
    public void The_scope_is_closed_even_when_the_block_throws()
    {
        var c = new Circuit("throws");
        var clk = c.Clock("clk", 4.Nanoseconds());
        Assert.Throws<ArgumentNullException>(() => c.Place(new Stage(null!, clk.High), "broken"));
        Assert.Equal(string.Empty, c.Scope);
        Assert.Equal("after", c.Input("after").Name);
        Assert.True(c.ToNetlist().Nets.All(n => !n.Name.StartsWith("broken", StringComparison.Ordinal)));
    }
}
