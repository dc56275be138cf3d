using Phaseward.Tests.Support;

namespace Phaseward.Tests.Netlists;

// First-order lumped net capacitance: the wire, plus one gate capacitance per transistor gate the net drives, plus one
// diffusion capacitance per source/drain terminal on the net (common practice; e.g. Rabaey, Chandrakasan & Nikolic,
// "Digital Integrated Circuits", 2nd ed., chapter 5, the inverter's load capacitance as intrinsic + wire + fan-out
// gate capacitance -- from memory).
// The figures below are INVENTED for the test, picked as 1, 10 and 100 fF so each term's count shows as one digit.
public class CapacitanceEstimateTests
{
    private static readonly Process Decades = new()
    {
        WireCapacitance = 1.Femtofarads(),
        GateCapacitance = 10.Femtofarads(),
        DiffusionCapacitance = 100.Femtofarads(),
    };

    private static Circuit NewCircuit()
    {
        var c = new Circuit("capacitance");
        c.UseProcess(Decades);
        return c;
    }

    [Fact]
    public void A_net_with_nothing_on_it_is_the_wire_alone()
    {
        var c = NewCircuit();
        var a = c.Input("a");

        Figures.Close(1.Femtofarads(), c.ToNetlist().CapacitanceOf(a));
    }

    [Fact]
    public void Gate_loads_count_restoring_inputs_data_controls_and_clock_gate_enables()
    {
        var c = NewCircuit();
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.Input("a");
        var other = c.Input("other");
        c.Inverter(a);                      // 1 gate
        c.Nand(a, a);                       // 2 gates: both inputs of the NAND
        c.Nor(a, other);                    // 1 gate
        c.Buffer(a);                        // 1 gate
        c.TransmissionGate(other, a);       // 1 gate: a controls the pass gate
        c.ClockGate(clk, a);                // 1 gate: a enables the clock gate

        // 1 fF wire + 7 x 10 fF gates, no terminals (an input's driver is outside the design).
        Figures.Close(71.Femtofarads(), c.ToNetlist().CapacitanceOf(a));
    }

    [Fact]
    public void Pass_gate_data_inputs_and_drivers_count_as_diffusion()
    {
        var c = NewCircuit();
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.Input("a");
        var b = c.Input("b");
        var n = c.Node("n");
        c.Inverter(a, n);                   // driver: 1 terminal
        c.TransmissionGate(b, clk.High, n); // driver: 1 terminal
        c.TransmissionGate(a, b, n);        // driver: 1 terminal
        c.TransmissionGate(n, clk.Low);     // n is a pass-gate data input: 1 terminal
        c.Inverter(n);                      // 1 gate

        // 1 fF + 1 x 10 fF + 4 x 100 fF
        Figures.Close(411.Femtofarads(), c.ToNetlist().CapacitanceOf(n));
    }

    [Fact]
    public void A_pass_gate_control_and_data_input_on_the_same_net_count_once_each()
    {
        var c = NewCircuit();
        var a = c.Input("a");
        c.TransmissionGate(a, a);

        // 1 fF + 1 gate (control) + 1 terminal (data input)
        Figures.Close(111.Femtofarads(), c.ToNetlist().CapacitanceOf(a));
    }

    [Fact]
    public void Static_latch_nets_by_hand()
    {
        var c = NewCircuit();
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        c.StaticLatch(d, clk.High, "S");

        var netlist = c.ToNetlist();
        // d: pass-gate data input -> 1 terminal.
        Figures.Close(101.Femtofarads(), netlist.CapacitanceOf(d));
        // S.x: driven by the pass gate and the feedback pass gate (2 terminals), read by the inverter (1 gate).
        Figures.Close(211.Femtofarads(), netlist.CapacitanceOf(netlist.Net("S.x")));
        // S: driven by the inverter (1 terminal), read by the feedback inverter (1 gate).
        Figures.Close(111.Femtofarads(), netlist.CapacitanceOf(netlist.Net("S")));
        // S.fb: driven by the feedback inverter (1 terminal), data input of the feedback pass gate (1 terminal).
        Figures.Close(201.Femtofarads(), netlist.CapacitanceOf(netlist.Net("S.fb")));
    }

    [Fact]
    public void Keeper_node_by_hand()
    {
        var c = NewCircuit();
        var clk = c.Clock("clk", 1.Nanoseconds());
        var dyn = c.TransmissionGate(c.Input("d"), clk.High, "dyn");
        c.Keeper(dyn);

        var netlist = c.ToNetlist();
        // dyn: driven by the pass gate and the weak feedback inverter (2 terminals), read by the sense inverter (1 gate).
        Figures.Close(211.Femtofarads(), netlist.CapacitanceOf(dyn));
        // dyn.keeper: driven by the sense inverter (1 terminal), read by the feedback inverter (1 gate).
        Figures.Close(111.Femtofarads(), netlist.CapacitanceOf(netlist.Net("dyn.keeper")));
    }

    [Fact]
    public void The_illustrative_process_figures_give_the_same_sum()
    {
        var c = new Circuit("capacitance");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        c.DynamicLatch(d, clk.High, "L");
        var p = c.Process;

        var netlist = c.ToNetlist();
        // L.x: 1 pass-gate output terminal, 1 inverter gate.
        Figures.Close(p.WireCapacitance + p.GateCapacitance + p.DiffusionCapacitance, netlist.CapacitanceOf(netlist.Net("L.x")));
        // With the illustrative figures (1 fF wire, 2 fF gate, 1.5 fF diffusion): 4.5 fF.
        Figures.Close(4.5.Femtofarads(), netlist.CapacitanceOf(netlist.Net("L.x")));
    }

    [Fact]
    public void SetCapacitance_replaces_the_estimate()
    {
        var c = NewCircuit();
        var clk = c.Clock("clk", 1.Nanoseconds());
        var q = c.DynamicLatch(c.Input("d"), clk.High, "L");
        var netlist = c.ToNetlist();
        var storage = netlist.Net("L.x");

        c.SetCapacitance(storage, 3.Femtofarads());

        var after = c.ToNetlist();
        Assert.Equal(3.Femtofarads(), after.CapacitanceOf(storage));
        Figures.Close(101.Femtofarads(), after.CapacitanceOf(q)); // the output's estimate is untouched
    }

    [Fact]
    public void Estimates_use_the_process_in_force_when_the_netlist_is_made()
    {
        var c = new Circuit("capacitance");
        var a = c.Input("a");
        c.Inverter(a);
        c.UseProcess(Decades);

        Figures.Close(11.Femtofarads(), c.ToNetlist().CapacitanceOf(a));
    }

    [Fact]
    public void A_net_of_another_netlist_is_refused()
    {
        var c = NewCircuit();
        c.Input("a");
        var stranger = new Circuit("other").Input("a");

        var error = Assert.Throws<System.ArgumentException>(() => c.ToNetlist().CapacitanceOf(stranger));
        Assert.Equal("net", error.ParamName);
        Assert.Contains("'a'", error.Message, System.StringComparison.Ordinal);
    }
}
