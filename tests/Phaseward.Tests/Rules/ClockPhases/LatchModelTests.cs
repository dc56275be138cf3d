using System.Linq;
using Phaseward.Electrical;
using Phaseward.Sequencing;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>Latches and registers are found on the primitives: library cells and hand-built circuits alike.</summary>
public class LatchModelTests
{
    [Fact]
    public void LibraryLatchesAreNamedByTheirCellAndHandBuiltOnesByTheirStorageNet()
    {
        var c = Figures.NewCircuit("names");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        c.DynamicLatch(d, clk.High, "cellDyn");
        c.StaticLatch(d, clk.Low, "cellStat");
        var x = c.TransmissionGate(d, clk.High, "handDyn");
        c.Inverter(x);

        var model = LatchModel.Of(c.ToNetlist());

        Assert.Equal(new[] { "cellDyn", "cellStat", "handDyn" }, model.Latches.Select(l => l.Name).ToArray());
        Assert.Equal(new[] { "cellDyn.x", "cellStat.x", "handDyn" }, model.Latches.Select(l => l.Storage.Name).ToArray());
        Assert.False(model.Latches[0].IsStatic);
        Assert.True(model.Latches[1].IsStatic);
        Assert.Single(model.Latches[1].FeedbackGates);
        Assert.Same(clk.Low, model.Latches[1].Phase);
        Assert.Null(model.Latches[2].Cell);
    }

    [Fact]
    public void A_ripple_chain_has_a_path_per_pair_and_its_listing_can_be_cancelled()
    {
        // A ripple chain: n + n(n − 1)/2 paths, counted on its structure (Figures.Ripple); this is why such a chain
        // costs the square of its length.
        const int n = 40;
        var netlist = Figures.Ripple(n, 1.Nanoseconds());

        using var cancelled = new System.Threading.CancellationTokenSource();
        cancelled.Cancel();
        Assert.ThrowsAny<System.OperationCanceledException>(() => LatchModel.Of(netlist, cancelled.Token));
        Assert.ThrowsAny<System.OperationCanceledException>(() => TimingFigures.For(netlist, Corner.Slow, cancelled.Token));

        // Nothing half-made was kept: the model made afterwards is whole.
        var model = LatchModel.Of(netlist);
        Assert.Equal(2 * n, model.Latches.Count);
        Assert.Equal(n + n * (n - 1) / 2, model.Paths.Count);
        Assert.Same(model, LatchModel.Of(netlist, cancelled.Token));
    }

    [Fact]
    public void EntryGatesInTwoWindowsMakeTwoLatchesOnOneNode()
    {
        // The model's rule (see LatchModel): entry gates of one window make one latch, named after the node and the
        // window's first phase when the node holds more than one; a buffered copy of a phase opens in the same window.
        var c = Figures.NewCircuit("windows");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var other = c.Clock("other", 3.Nanoseconds(), independent: true);
        var late = c.BufferedClock(clk, 50.Picoseconds());
        var d = c.Input("d");
        var e = c.Input("e");
        var s = c.Node("s");
        c.TransmissionGate(d, clk.High, s);
        c.TransmissionGate(e, other.High, s);
        c.TransmissionGate(e, late.High, s);
        c.Inverter(s, "q");

        var model = LatchModel.Of(c.ToNetlist());

        Assert.Equal(new[] { "s@clk.High", "s@other.High" }, model.Latches.Select(l => l.Name).ToArray());
        Assert.Equal(new[] { clk.High, late.High }, model.Latches[0].EntryGates.Select(g => g.ClockControl).ToArray());
        Assert.Equal(new[] { other.High }, model.Latches[1].EntryGates.Select(g => g.ClockControl).ToArray());
        Assert.All(model.Latches, l => Assert.Same(s, l.Storage));
        Assert.All(model.Latches, l => Assert.Equal("q", l.Output.Name));
        Assert.Same(model.Latches[0], model.LatchEnteredBy(model.Latches[0].EntryGates[1]));
    }

    [Fact]
    public void HandBuiltStaticLatchAndKeeperLatchAreFoundLikeTheCell()
    {
        var c = Figures.NewCircuit("hand");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        var s = c.Node("hs");
        c.TransmissionGate(d, clk.High, s);
        var q = c.Inverter(s, "hq");
        var fb = c.Inverter(q, "hfb");
        c.TransmissionGate(fb, clk.Low, s);

        var k = c.TransmissionGate(d, clk.Low, "hk");
        c.Inverter(k, "hkq");
        c.Keeper(k);

        c.StaticLatch(d, clk.High, "cell");

        var model = LatchModel.Of(c.ToNetlist());
        Assert.Equal(new[] { "hs", "hk", "cell" }, model.Latches.Select(l => l.Name).ToArray());
        var hand = model.Latches[0];
        Assert.True(hand.IsStatic);
        Assert.Single(hand.EntryGates);
        Assert.Single(hand.FeedbackGates);
        Assert.Equal("hq", hand.Output.Name);
        Assert.True(model.Latches[1].HasKeeper);
        Assert.Equal("hkq", model.Latches[1].Output.Name);

        // The same structure gives the same timing figures.
        var figures = TimingFigures.For(c.ToNetlist(), Corner.Nominal);
        Assert.Equal(figures.Latches[2].Setup, figures.Latches[0].Setup);
        Assert.Equal(figures.Latches[2].DataToOutput, figures.Latches[0].DataToOutput);
    }

    [Fact]
    public void DataControlledPassGatesMakeNoLatch()
    {
        var c = Figures.NewCircuit("mux");
        var a = c.Input("a");
        var sel = c.Input("sel");
        var m = c.TransmissionGate(a, sel, "m");
        c.Inverter(m);

        Assert.Empty(LatchModel.Of(c.ToNetlist()).Latches);
    }

    [Fact]
    public void RegisterCellsAndHandBuiltMasterSlavePairsAreRegisters()
    {
        var c = Figures.NewCircuit("regs");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");
        c.DynamicRegister(d, clk, "cellReg");
        var mx = c.TransmissionGate(d, clk.Low, "mx");
        var mq = c.Inverter(mx, "mq");
        var sx = c.TransmissionGate(mq, clk.High, "sx");
        c.Inverter(sx, "handReg");

        var model = LatchModel.Of(c.ToNetlist());

        Assert.Equal(new[] { "cellReg", "handReg" }, model.Registers.Select(r => r.Name).ToArray());
        Assert.Equal("cellReg.master", model.Registers[0].Master.Name);
        Assert.Equal("cellReg.slave", model.Registers[0].Slave.Name);
        Assert.Equal("mx", model.Registers[1].Master.Name);
        Assert.True(model.Registers[1].IsPositiveEdge);
        Assert.Same(model.Registers[1], model.RegisterOf(model.Latches.Single(l => l.Name == "sx")));
    }

    [Fact]
    public void PathDelaysAreSumsOfFirstOrderStageDelays()
    {
        // Stage delay 0.69·R·C: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective",
        // 2nd ed., ch. 5 (t_p = 0.69·R_eq·C_L; from memory). Two paths from A to B: one inverter + NAND (2 stages),
        // or three inverters + NAND (4 stages): min 2 · 27.6 ps (each stage its own net), max 5 · 27.6 ps: at most the NAND
        // also charges B's storage node through B's open entry gate, 0.69 · 4 kΩ · (10 + 10) fF (a side branch is a
        // capacitive load where it leaves the path: Elmore 1948; Rubinstein, Penfield, Horowitz, IEEE TCAD 2(3), 1983).
        var c = Figures.NewCircuit("paths");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.DynamicLatch(c.Input("d"), clk.High, "A");
        var slow = c.Inverter(c.Inverter(a));
        var joined = c.Nand(a, slow);
        c.DynamicLatch(joined, clk.Low, "B");

        var path = LatchModel.Of(c.ToNetlist()).Paths.Single();

        Assert.Equal("A", path.From.Name);
        Assert.Equal("B", path.To.Name);
        Assert.Equal(2 * Figures.InvPs, Figures.Ps(path.MinDelay), 6);
        Assert.Equal(5 * Figures.InvPs, Figures.Ps(path.MaxDelay), 6);
    }
}
