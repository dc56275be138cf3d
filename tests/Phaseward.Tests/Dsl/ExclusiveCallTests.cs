using System;
using Phaseward.Netlists;
using Phaseward.Tests.BadInput;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Dsl;

// Circuit.Exclusive: the designer's statement that at most one of some control nets is high at a time.
public class ExclusiveCallTests
{
    [Fact]
    public void A_stated_group_makes_every_pair_in_it_exclusive_and_nothing_else()
    {
        var c = new Circuit("onehot");
        var s = new[] { c.Input("s0"), c.Input("s1"), c.Input("s2") };
        var other = c.Input("other");
        c.Exclusive(s);

        var netlist = c.ToNetlist();
        Assert.True(netlist.AreExclusive(s[0], s[1]));
        Assert.True(netlist.AreExclusive(s[2], s[0]));
        Assert.True(netlist.AreExclusive(s[1], s[2]));
        Assert.False(netlist.AreExclusive(s[0], other));
        Assert.False(netlist.AreExclusive(s[0], s[0]));
        // "At most one" is not "exactly one": a stated group is not complementary.
        Assert.False(netlist.AreComplementary(s[0], s[1]));
        Assert.Equal(new[] { s }, netlist.ExclusiveGroups);
    }

    [Fact]
    public void Groups_add_their_pairs_and_do_not_join_each_other()
    {
        var c = new Circuit("groups");
        var a = c.Input("a");
        var b = c.Input("b");
        var d = c.Input("d");
        c.Exclusive(a, b);
        c.Exclusive(b, d);

        var netlist = c.ToNetlist();
        Assert.True(netlist.AreExclusive(a, b));
        Assert.True(netlist.AreExclusive(d, b));
        // Exclusivity is not transitive: a and d may both be high while b is low.
        Assert.False(netlist.AreExclusive(a, d));
    }

    [Fact]
    public void A_net_and_its_inverse_are_exclusive_and_complementary_without_being_stated()
    {
        var c = new Circuit("inverse");
        var s = c.Input("s");
        var sBar = c.Inverter(s, "s_b");
        var twice = c.Inverter(sBar, "s_bb");
        var nand = c.Nand(s, c.Input("t"), "n");

        var netlist = c.ToNetlist();
        Assert.True(netlist.AreExclusive(s, sBar));
        Assert.True(netlist.AreExclusive(sBar, s));
        Assert.True(netlist.AreComplementary(s, sBar));
        Assert.True(netlist.AreExclusive(sBar, twice));
        // Twice inverted is the same polarity; a NAND output is not the inverse of one input.
        Assert.False(netlist.AreExclusive(s, twice));
        Assert.False(netlist.AreExclusive(s, nand));
    }

    [Fact]
    public void An_inverter_output_with_a_second_driver_is_not_taken_as_the_inverse()
    {
        var c = new Circuit("wired");
        var s = c.Input("s");
        var y = c.Node("y");
        c.Inverter(s, y);
        c.TransmissionGate(c.Input("other"), c.Input("en"), y);

        Assert.False(c.ToNetlist().AreExclusive(s, y));
    }

    [Fact]
    public void The_statement_is_in_the_canonical_netlist_text()
    {
        var c = new Circuit("text");
        var a = c.Input("sel_a");
        var b = c.Input("sel_b");
        c.Exclusive(a, b, c.Inverter(a, "sel_na"));

        Assert.Contains("exclusive sel_a,sel_b,sel_na" + Environment.NewLine, NetlistText.Write(c.ToNetlist(), includeSpans: false));
    }

    [Fact]
    public void The_statement_keeps_its_own_copy_of_the_nets()
    {
        var c = new Circuit("copy");
        var nets = new[] { c.Input("a"), c.Input("b") };
        c.Exclusive(nets);
        nets[1] = c.Input("late");

        var netlist = c.ToNetlist();
        Assert.Equal("b", netlist.ExclusiveGroups[0][1].Name);
        Assert.False(netlist.AreExclusive(netlist.Nets[0], nets[1]));
    }

    [Fact]
    public void Fewer_than_two_nets_are_refused()
    {
        var p = new Populated();
        Rejection.Argument(p.Circuit, () => p.Circuit.Exclusive(), "controls", "was 0");
        Rejection.Argument(p.Circuit, () => p.Circuit.Exclusive(p.A), "controls", "was 1: 'a'");
        Rejection.Null(p.Circuit, () => p.Circuit.Exclusive(null!), "controls");
    }

    [Fact]
    public void A_net_given_twice_is_refused()
    {
        var p = new Populated();
        Rejection.Argument(p.Circuit, () => p.Circuit.Exclusive(p.A, p.B, p.A), "controls", "'a'", "twice", "elements 0 and 2");
    }

    [Fact]
    public void A_null_net_is_refused()
    {
        var p = new Populated();
        Rejection.Null(p.Circuit, () => p.Circuit.Exclusive(p.A, null!), "controls");
    }

    [Fact]
    public void A_net_of_another_circuit_is_refused_and_nothing_is_stated()
    {
        var p = new Populated();
        var other = new Elsewhere();
        Rejection.Argument(p.Circuit, () => p.Circuit.Exclusive(p.A, p.B, other.Net), "controls", "'foreignnet'", "'elsewhere-design'", "element 2");
        Assert.Empty(p.Circuit.ToNetlist().ExclusiveGroups);
    }
}
