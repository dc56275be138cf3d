using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Netlists;

/// <summary>
/// <see cref="DeviceInputs"/> keeps a device's one or two inputs in the device itself; it must behave as the
/// IReadOnlyList contract of the .NET base library says (checked against arrays and LINQ, the reference here).
/// </summary>
public class DeviceInputsTests
{
    [Fact]
    public void A_two_input_stage_lists_its_inputs_in_order_as_an_array_would()
    {
        var c = new Circuit("inputs");
        var a = c.Input("a");
        var b = c.Input("b");
        c.Nand(a, b, "y");

        var inputs = c.ToNetlist().Device("y").Inputs;

        Assert.Equal(2, inputs.Count);
        Assert.Same(a, inputs[0]);
        Assert.Same(b, inputs[1]);
        var byForeach = new List<Net>();
        foreach (var input in inputs)
            byForeach.Add(input);
        Assert.Equal(new[] { a, b }, byForeach);
        Assert.True(new[] { a, b }.SequenceEqual((IReadOnlyList<Net>)inputs));
        Assert.Equal(new[] { "a", "b" }, inputs.Select(n => n.Name).ToArray());
    }

    [Fact]
    public void A_one_input_stage_has_one_input_and_a_clear_error_past_it()
    {
        var c = new Circuit("inputs");
        var a = c.Input("a");
        c.Inverter(a, "y");

        var inputs = c.ToNetlist().Device("y").Inputs;

        Assert.Same(a, Assert.Single(inputs));
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => { _ = inputs[1]; });
        Assert.Contains("1 input(s)", error.Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => { _ = inputs[-1]; });
    }

    [Fact]
    public void The_default_value_is_empty_not_a_list_holding_null()
    {
        var none = default(DeviceInputs);

        Assert.Empty(none);
        Assert.Throws<ArgumentOutOfRangeException>(() => { _ = none[0]; });
    }

    [Fact]
    public void A_resistance_set_in_the_design_survives_and_none_stays_none()
    {
        var c = new Circuit("inputs");
        var a = c.Input("a");
        var on = c.Input("on");
        c.TransmissionGate(a, on, "y", onResistance: new Resistance(4_700));
        c.Inverter(a, "z");
        var netlist = c.ToNetlist();

        Assert.Equal(new Resistance(4_700), netlist.Device("y").ResistanceOverride);
        Assert.Null(netlist.Device("z").ResistanceOverride);
    }
}
