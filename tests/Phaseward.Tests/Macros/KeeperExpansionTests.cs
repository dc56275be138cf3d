using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Macros;

// A keeper: an inverter senses the node and a weak inverter feeds the inverse back, holding the level against leakage
// while any real driver can still overpower it (common practice).
public class KeeperExpansionTests
{
    [Fact]
    public void Keeper_is_a_sense_inverter_and_a_weak_feedback_inverter()
    {
        var c = new Circuit("keepers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var node = c.TransmissionGate(c.Input("d"), clk.High, "dyn");

        var sensed = c.Keeper(node);

        var netlist = c.ToNetlist();
        Assert.Equal("dyn.keeper", sensed.Name);
        Assert.Equal(3, netlist.Devices.Count);

        var sense = netlist.Device("dyn.keeper.sense");
        Assert.Equal((DeviceKind.Inverter, "sense-inverter", false), (sense.Kind, sense.Role, sense.IsWeak));
        Assert.Equal(new[] { node }, sense.Inputs);
        Assert.Same(sensed, sense.Output);

        var feedback = netlist.Device("dyn.keeper.feedback");
        Assert.Equal((DeviceKind.Inverter, "weak-feedback-inverter", true), (feedback.Kind, feedback.Role, feedback.IsWeak));
        Assert.Equal(new[] { sensed }, feedback.Inputs);
        Assert.Same(node, feedback.Output);

        var macro = netlist.Macro("dyn.keeper");
        Assert.Equal(MacroKind.Keeper, macro.Kind);
        Assert.Null(macro.Parent);
        Assert.Empty(macro.Parts);
        Assert.Equal(new[] { sense, feedback }, macro.Devices);
    }

    [Fact]
    public void Keeper_takes_a_name()
    {
        var c = new Circuit("keepers");
        var sensed = c.Keeper(c.Node("n"), "hold");

        var netlist = c.ToNetlist();
        Assert.Equal("hold", sensed.Name);
        Assert.Equal(new[] { "hold.sense", "hold.feedback" }, System.Linq.Enumerable.ToArray(System.Linq.Enumerable.Select(netlist.Devices, d => d.Name)));
    }

    [Fact]
    public void A_weak_keeper_does_not_count_as_a_restoring_driver_for_contention()
    {
        var c = new Circuit("keepers");
        var a = c.Input("a");
        var node = c.Node("n");
        c.Keeper(node);

        c.Inverter(a, node);

        Assert.Equal(2, c.ToNetlist().DriversOf(node).Count);
    }
}
