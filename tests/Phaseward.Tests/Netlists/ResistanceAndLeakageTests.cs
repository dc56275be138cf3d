using Phaseward.Tests.Support;

namespace Phaseward.Tests.Netlists;

public class ResistanceAndLeakageTests
{
    // INVENTED figures for the test, all different so that a swapped figure shows.
    private static readonly Process Distinct = new()
    {
        PassGateResistance = 5.Kiloohms(),
        DriverResistance = 3.Kiloohms(),
        KeeperResistance = 70.Kiloohms(),
        StorageLeakage = 8.Picoamperes(),
    };

    [Fact]
    public void Pass_gates_use_the_process_on_resistance_unless_given_their_own()
    {
        var c = new Circuit("resistance");
        c.UseProcess(Distinct);
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.Input("a");
        c.TransmissionGate(a, clk.High, "plain");
        c.TransmissionGate(a, clk.High, "own", 11.Kiloohms());
        c.TransmissionGate(a, a, "muxarm");

        var netlist = c.ToNetlist();
        Assert.Equal(5.Kiloohms(), netlist.ResistanceOf(netlist.Device("plain")));
        Assert.Equal(11.Kiloohms(), netlist.ResistanceOf(netlist.Device("own")));
        Assert.Equal(5.Kiloohms(), netlist.ResistanceOf(netlist.Device("muxarm")));
    }

    [Fact]
    public void Restoring_stages_use_the_driver_resistance()
    {
        var c = new Circuit("resistance");
        c.UseProcess(Distinct);
        var a = c.Input("a");
        c.Inverter(a, "i");
        c.Buffer(a, "b");
        c.Nand(a, a, "n");
        c.Nor(a, a, "o");

        var netlist = c.ToNetlist();
        Assert.All(netlist.Devices, device => Assert.Equal(3.Kiloohms(), netlist.ResistanceOf(device)));
    }

    [Fact]
    public void Keeper_feedback_is_weak_and_its_sense_inverter_is_not()
    {
        var c = new Circuit("resistance");
        c.UseProcess(Distinct);
        c.Keeper(c.Node("n"));

        var netlist = c.ToNetlist();
        Assert.Equal(70.Kiloohms(), netlist.ResistanceOf(netlist.Device("n.keeper.feedback")));
        Assert.Equal(3.Kiloohms(), netlist.ResistanceOf(netlist.Device("n.keeper.sense")));
    }

    [Fact]
    public void Latch_devices_use_the_figures_of_their_kind()
    {
        var c = new Circuit("resistance");
        c.UseProcess(Distinct);
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.StaticLatch(c.Input("d"), clk.High, "S");

        var netlist = c.ToNetlist();
        Assert.Equal(5.Kiloohms(), netlist.ResistanceOf(netlist.Device("S.pass")));
        Assert.Equal(5.Kiloohms(), netlist.ResistanceOf(netlist.Device("S.feedback-pass")));
        Assert.Equal(3.Kiloohms(), netlist.ResistanceOf(netlist.Device("S.inverter")));
        Assert.Equal(3.Kiloohms(), netlist.ResistanceOf(netlist.Device("S.feedback-inverter")));
    }

    [Fact]
    public void Default_process_resistances_are_the_illustrative_ones()
    {
        var c = new Circuit("resistance");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.Input("a");
        c.TransmissionGate(a, clk.High, "t");
        c.Inverter(a, "i");

        var netlist = c.ToNetlist();
        Assert.Equal(Process.Illustrative.PassGateResistance, netlist.ResistanceOf(netlist.Device("t")));
        Assert.Equal(Process.Illustrative.DriverResistance, netlist.ResistanceOf(netlist.Device("i")));
    }

    [Fact]
    public void Leakage_is_the_process_figure_unless_set_for_the_net()
    {
        var c = new Circuit("leakage");
        c.UseProcess(Distinct);
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.DynamicLatch(c.Input("d"), clk.High, "L");
        var beforeOverride = c.ToNetlist();
        var storage = beforeOverride.Net("L.x");

        c.SetLeakage(storage, 0.5.Picoamperes());

        var netlist = c.ToNetlist();
        Assert.Equal(8.Picoamperes(), beforeOverride.LeakageOf(storage));
        Assert.Equal(0.5.Picoamperes(), netlist.LeakageOf(storage));
        Assert.Equal(8.Picoamperes(), netlist.LeakageOf(netlist.Net("L")));
        Assert.Equal(8.Picoamperes(), netlist.LeakageOf(netlist.Net("d")));
    }
}
