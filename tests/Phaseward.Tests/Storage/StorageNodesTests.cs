using System.Linq;
using Phaseward.Netlists;
using Phaseward.Storage;

namespace Phaseward.Tests.Storage;

/// <summary>Which nets are storage nodes, and which of them are dynamic (common practice: a net driven only through
/// pass devices holds its level as charge unless a keeper or restoring feedback drives it).</summary>
public class StorageNodesTests
{
    [Fact]
    public void DynamicAndStaticLatchNodes()
    {
        var c = new Circuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        c.DynamicLatch(d, clk.High, "dyn");
        c.StaticLatch(d, clk.High, "stat");
        var netlist = c.ToNetlist();

        var nodes = StorageNodes.Of(netlist);
        Assert.Equal(new[] { "dyn.x", "stat.x" }, nodes.Select(n => n.Net.Name).ToArray());
        Assert.Equal(StorageKind.Dynamic, nodes[0].Kind);
        Assert.Empty(nodes[0].FeedbackDrivers);
        Assert.Equal(StorageKind.ClockedFeedback, nodes[1].Kind);
        Assert.Equal("stat.feedback-pass", Assert.Single(nodes[1].FeedbackDrivers).Name);
        Assert.Equal("stat.pass", nodes[1].PrimaryDriver.Name);
        Assert.Equal(MacroKind.StaticLatch, nodes[1].Cell!.Kind);
    }

    [Fact]
    public void HandBuiltLatchesAreClassifiedLikeTheCells()
    {
        var c = new Circuit("by-hand");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        // A static latch from primitives: pass gate, inverter, feedback inverter and feedback gate on the other phase.
        var x = c.Node("x");
        c.TransmissionGate(d, clk.High, x);
        var q = c.Inverter(x, "q");
        var fb = c.Inverter(q, "fb");
        c.TransmissionGate(fb, clk.Low, x);
        // An inverted copy fed back is no restoring feedback (it would fight the node): y stays dynamic.
        var y = c.Node("y");
        c.TransmissionGate(d, clk.High, y);
        var ybar = c.Inverter(y, "ybar");
        c.TransmissionGate(ybar, clk.Low, y);
        var netlist = c.ToNetlist();

        Assert.Equal(StorageKind.ClockedFeedback, StorageNodes.Find(netlist, x)!.Kind);
        Assert.Null(StorageNodes.Find(netlist, x)!.Cell);
        Assert.Equal(StorageKind.Dynamic, StorageNodes.Find(netlist, y)!.Kind);
    }

    [Fact]
    public void KeptNodesInputsAndRestoredNetsAreNotStorageNodes()
    {
        var c = new Circuit("not-storage");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        var kept = c.TransmissionGate(d, clk.High, "kept");
        c.Keeper(kept);
        var inverted = c.Inverter(d, "inv");
        var floating = c.Node("undriven");
        var netlist = c.ToNetlist();

        Assert.Null(StorageNodes.Find(netlist, kept));
        Assert.Null(StorageNodes.Find(netlist, d));
        Assert.Null(StorageNodes.Find(netlist, inverted));
        Assert.Null(StorageNodes.Find(netlist, floating));
        Assert.Empty(StorageNodes.Of(netlist));
    }

    [Fact]
    public void RegistersHaveTwoStorageNodesOneOnEachPhase()
    {
        var c = new Circuit("registers");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        c.DynamicRegister(d, clk, "r");
        var netlist = c.ToNetlist();

        var nodes = StorageNodes.Of(netlist);
        Assert.Equal(new[] { "r.master.x", "r.slave.x" }, nodes.Select(n => n.Net.Name).ToArray());
        Assert.Equal(ClockPolarity.Low, nodes[0].PrimaryDriver.ClockControl!.Polarity);
        Assert.Equal(ClockPolarity.High, nodes[1].PrimaryDriver.ClockControl!.Polarity);
        Assert.All(nodes, n => Assert.Equal(MacroKind.DynamicRegister, n.Cell!.Kind));
    }

    [Fact]
    public void ANetOfAnotherNetlistIsRejected()
    {
        var c1 = new Circuit("one");
        c1.Input("d");
        var c2 = new Circuit("two");
        var foreign = c2.Input("d");
        var error = Assert.Throws<System.ArgumentException>(() => StorageNodes.Find(c1.ToNetlist(), foreign));
        Assert.Contains("'d'", error.Message);
        Assert.Contains("'one'", error.Message);
    }
}
