using Phaseward.Tests.Support;

namespace Phaseward.Tests.BadInput;

public class NameTests
{
    private readonly Populated p = new();

    private void Refused(System.Action call, string parameter, params string[] fragments)
        => Rejection.Argument(p.Circuit, call, parameter, fragments);

    [Theory]
    [InlineData("")]
    [InlineData(" ")]
    [InlineData("\t ")]
    public void Empty_or_white_space_names_are_refused_everywhere(string blank)
    {
        var c = p.Circuit;
        var shown = "\"" + blank + "\"";
        Refused(() => c.Input(blank), "name", shown);
        Refused(() => c.Node(blank), "name", shown);
        Refused(() => c.Output(blank, p.A), "name", shown);
        Refused(() => c.Inverter(p.A, blank), "name", shown);
        Refused(() => c.Buffer(p.A, blank), "name", shown);
        Refused(() => c.Nand(p.A, p.B, blank), "name", shown);
        Refused(() => c.Nor(p.A, p.B, blank), "name", shown);
        Refused(() => c.TransmissionGate(p.A, p.Clk.High, blank), "name", shown);
        Refused(() => c.TransmissionGate(p.A, p.B, blank), "name", shown);
        Refused(() => c.DynamicLatch(p.A, p.Clk.High, blank), "name", shown);
        Refused(() => c.StaticLatch(p.A, p.Clk.High, blank), "name", shown);
        Refused(() => c.DynamicRegister(p.A, p.Clk, blank), "name", shown);
        Refused(() => c.StaticRegister(p.A, p.Clk, blank), "name", shown);
        Refused(() => c.Keeper(p.A, blank), "name", shown);
        Refused(() => c.Clock(blank, 1.Nanoseconds()), "name", shown);
        Refused(() => c.ClockGate(p.Clk, p.Enable, name: blank), "name", shown);
        Refused(() => c.BufferedClock(p.Clk, name: blank), "name", shown);
        Refused(() => c.UseProcess(new Process { Name = blank }), "Name", shown);
    }

    [Fact]
    public void A_blank_design_name_is_refused()
    {
        var error = Assert.Throws<System.ArgumentException>(() => new Circuit(" "));
        Assert.Equal("designName", error.ParamName);
        Assert.Contains("\" \"", error.Message, System.StringComparison.Ordinal);
    }

    [Fact]
    public void Duplicate_net_names_are_refused_for_every_call_that_names_a_net()
    {
        var c = p.Circuit;
        Refused(() => c.Input("a"), "name", "\"a\"", "'populated'");
        Refused(() => c.Input("y"), "name", "\"y\"");
        Refused(() => c.Node("n"), "name", "\"n\"");
        Refused(() => c.Node("q.x"), "name", "\"q.x\"");
        Refused(() => c.Inverter(p.A, "b"), "name", "\"b\"");
        Refused(() => c.Buffer(p.A, "y"), "name", "\"y\"");
        Refused(() => c.Nand(p.A, p.B, "n"), "name", "\"n\"");
        Refused(() => c.Nor(p.A, p.B, "q"), "name", "\"q\"");
        Refused(() => c.TransmissionGate(p.A, p.Clk.High, "q.fb"), "name", "\"q.fb\"");
        Refused(() => c.TransmissionGate(p.A, p.B, "en"), "name", "\"en\"");
    }

    [Fact]
    public void Duplicate_clock_names_are_refused()
    {
        var c = p.Circuit;
        Refused(() => c.Clock("clk", 3.Nanoseconds()), "name", "\"clk\"", "'populated'");
        Refused(() => c.Clock("gclk", 3.Nanoseconds()), "name", "\"gclk\"");
        Refused(() => c.ClockGate(p.Clk, p.Enable, name: "clk"), "name", "\"clk\"");
        Refused(() => c.BufferedClock(p.Clk, name: "gclk"), "name", "\"gclk\"");
    }

    [Fact]
    public void Duplicate_output_names_are_refused()
        => Refused(() => p.Circuit.Output("out", p.A), "name", "\"out\"", "'populated'");

    [Fact]
    public void A_cell_named_like_an_existing_net_is_refused()
    {
        var c = p.Circuit;
        Refused(() => c.DynamicLatch(p.A, p.Clk.High, "a"), "name", "\"a\"");
        Refused(() => c.StaticLatch(p.A, p.Clk.High, "n"), "name", "\"n\"");
        Refused(() => c.DynamicRegister(p.A, p.Clk, "y"), "name", "\"y\"");
        Refused(() => c.StaticRegister(p.A, p.Clk, "b"), "name", "\"b\"");
        Refused(() => c.Keeper(p.A, "en"), "name", "\"en\"");
    }

    [Fact]
    public void A_latch_whose_storage_node_name_is_taken_is_refused()
    {
        p.Circuit.Node("s.x");

        Refused(() => p.Circuit.DynamicLatch(p.A, p.Clk.High, "s"), "name", "\"s.x\"");
        Refused(() => p.Circuit.StaticLatch(p.A, p.Clk.High, "s"), "name", "\"s.x\"");
    }

    [Fact]
    public void A_static_latch_whose_feedback_net_name_is_taken_is_refused_but_a_dynamic_one_is_not()
    {
        p.Circuit.Node("f.fb");

        Refused(() => p.Circuit.StaticLatch(p.A, p.Clk.High, "f"), "name", "\"f.fb\"");
        Assert.Equal("f", p.Circuit.DynamicLatch(p.A, p.Clk.High, "f").Name);
    }

    [Theory]
    [InlineData("r.master")]
    [InlineData("r.master.x")]
    [InlineData("r.slave.x")]
    public void A_register_whose_internal_nets_are_taken_is_refused(string taken)
    {
        p.Circuit.Node(taken);

        Refused(() => p.Circuit.DynamicRegister(p.A, p.Clk, "r"), "name", "\"" + taken + "\"");
        Refused(() => p.Circuit.StaticRegister(p.A, p.Clk, "r"), "name", "\"" + taken + "\"");
    }

    [Theory]
    [InlineData("r.master.fb")]
    [InlineData("r.slave.fb")]
    public void A_static_register_whose_feedback_nets_are_taken_is_refused(string taken)
    {
        p.Circuit.Node(taken);

        Refused(() => p.Circuit.StaticRegister(p.A, p.Clk, "r"), "name", "\"" + taken + "\"");
    }

    [Fact]
    public void A_second_keeper_on_a_node_needs_its_own_name()
    {
        p.Circuit.Keeper(p.Node);

        Refused(() => p.Circuit.Keeper(p.Node), "name", "\"n.keeper\"");
        Assert.Equal("n.keeper2", p.Circuit.Keeper(p.Node, "n.keeper2").Name);
    }

    [Fact]
    public void Clock_and_net_names_are_separate_but_auto_names_avoid_both()
    {
        var c = p.Circuit;
        c.Clock("inv1", 1.Nanoseconds());

        Assert.Equal("clk", c.Node("clk").Name); // a net may share a clock's name
        Assert.Equal("inv2", c.Inverter(p.A).Name);
    }
}
