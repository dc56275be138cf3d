using Phaseward.Tests.Support;

namespace Phaseward.Tests.Dsl;

public class ProcessAndFigureCallTests
{
    [Fact]
    public void A_new_circuit_uses_the_illustrative_process()
    {
        var c = new Circuit("process");

        Assert.Same(Process.Illustrative, c.Process);
        Assert.Equal("illustrative (invented defaults)", c.Process.Name);
        Assert.Same(Process.Illustrative, c.ToNetlist().Process);
    }

    [Fact]
    public void UseProcess_object_initializer_sets_the_given_figures_and_keeps_the_other_defaults()
    {
        var c = new Circuit("process");
        var process = new Process
        {
            Name = "invented demo process",
            PassGateResistance = 6.Kiloohms(),
            DriverResistance = 3.Kiloohms(),
            KeeperResistance = 50.Kiloohms(),
            GateCapacitance = 1.5.Femtofarads(),
            DiffusionCapacitance = 1.Femtofarads(),
            WireCapacitance = 0.5.Femtofarads(),
            StageDelay = 15.Picoseconds(),
            StorageLeakage = 2.Picoamperes(),
            Supply = 1.8.Volts(),
            ToleratedDroop = 0.4.Volts(),
            ComplementSkew = 25.Picoseconds(),
        };

        c.UseProcess(process);

        Assert.Same(process, c.Process);
        Assert.Same(process, c.ToNetlist().Process);
        Assert.Equal("invented demo process", c.Process.Name);
        Assert.Equal(6.Kiloohms(), c.Process.PassGateResistance);
        Assert.Equal(3.Kiloohms(), c.Process.DriverResistance);
        Assert.Equal(50.Kiloohms(), c.Process.KeeperResistance);
        Assert.Equal(1.5.Femtofarads(), c.Process.GateCapacitance);
        Assert.Equal(1.Femtofarads(), c.Process.DiffusionCapacitance);
        Assert.Equal(0.5.Femtofarads(), c.Process.WireCapacitance);
        Assert.Equal(15.Picoseconds(), c.Process.StageDelay);
        Assert.Equal(2.Picoamperes(), c.Process.StorageLeakage);
        Assert.Equal(1.8.Volts(), c.Process.Supply);
        Assert.Equal(0.4.Volts(), c.Process.ToleratedDroop);
        Assert.Equal(25.Picoseconds(), c.Process.ComplementSkew);
    }

    [Fact]
    public void Process_figures_left_out_of_the_initializer_keep_the_illustrative_values()
    {
        var process = new Process { PassGateResistance = 6.Kiloohms() };
        var defaults = Process.Illustrative;

        Assert.Equal(defaults.Name, process.Name);
        Assert.Equal(defaults.DriverResistance, process.DriverResistance);
        Assert.Equal(defaults.KeeperResistance, process.KeeperResistance);
        Assert.Equal(defaults.GateCapacitance, process.GateCapacitance);
        Assert.Equal(defaults.DiffusionCapacitance, process.DiffusionCapacitance);
        Assert.Equal(defaults.WireCapacitance, process.WireCapacitance);
        Assert.Equal(defaults.StageDelay, process.StageDelay);
        Assert.Equal(defaults.StorageLeakage, process.StorageLeakage);
        Assert.Equal(defaults.Supply, process.Supply);
        Assert.Equal(defaults.ToleratedDroop, process.ToleratedDroop);
        Assert.Equal(defaults.ComplementSkew, process.ComplementSkew);
    }

    [Fact]
    public void Process_accepts_zero_for_the_figures_that_may_be_zero()
    {
        var process = new Process
        {
            GateCapacitance = Capacitance.Zero,
            DiffusionCapacitance = Capacitance.Zero,
            WireCapacitance = Capacitance.Zero,
            ComplementSkew = Time.Zero,
        };

        Assert.Equal(Capacitance.Zero, process.WireCapacitance);
        Assert.Equal(Time.Zero, process.ComplementSkew);
    }

    [Fact]
    public void The_last_UseProcess_call_wins()
    {
        var c = new Circuit("process");
        var first = new Process { Name = "first" };
        var second = new Process { Name = "second" };
        c.UseProcess(first);
        c.UseProcess(second);

        Assert.Same(second, c.Process);
    }

    [Fact]
    public void SetCapacitance_replaces_the_estimate_of_that_net_only()
    {
        var c = new Circuit("figures");
        var a = c.Input("a");
        var b = c.Input("b");
        var estimateOfB = c.ToNetlist().CapacitanceOf(b);

        c.SetCapacitance(a, 12.Femtofarads());

        var netlist = c.ToNetlist();
        Assert.Equal(12.Femtofarads(), netlist.CapacitanceOf(a));
        Assert.Equal(estimateOfB, netlist.CapacitanceOf(b));
    }

    [Fact]
    public void SetCapacitance_called_twice_keeps_the_last_value()
    {
        var c = new Circuit("figures");
        var a = c.Input("a");
        c.SetCapacitance(a, 12.Femtofarads());
        c.SetCapacitance(a, 4.Femtofarads());

        Assert.Equal(4.Femtofarads(), c.ToNetlist().CapacitanceOf(a));
    }

    [Fact]
    public void SetLeakage_replaces_the_process_figure_for_that_net_only()
    {
        var c = new Circuit("figures");
        var a = c.Input("a");
        var b = c.Input("b");

        c.SetLeakage(a, 40.Femtoamperes());

        var netlist = c.ToNetlist();
        Assert.Equal(40.Femtoamperes(), netlist.LeakageOf(a));
        Assert.Equal(c.Process.StorageLeakage, netlist.LeakageOf(b));
    }

    [Fact]
    public void A_netlist_is_a_snapshot_that_later_calls_do_not_change()
    {
        var c = new Circuit("figures");
        var a = c.Input("a");
        var before = c.ToNetlist();
        c.Inverter(a);
        c.SetCapacitance(a, 9.Femtofarads());

        Assert.Single(before.Nets);
        Assert.Empty(before.Devices);
        Assert.NotEqual(9.Femtofarads(), before.CapacitanceOf(a));
    }
}
