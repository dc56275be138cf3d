using System;
using System.Globalization;
using System.Linq;
using CsCheck;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Tests.Properties;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1005. That a loop of restoring stages with no storage element either oscillates (odd inversions) or latches up
/// (even) is common practice; the period estimate T = 2·Σ t_p of a ring of stages is the ring-oscillator formula of
/// Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 5 (T = 2·N·t_p;
/// from memory), with t_p = 0.69·R·C per stage. Flat test process: every stage 27.6 ps (see <see cref="Figures"/>).
/// The strongly connected components come from Tarjan's algorithm (SIAM J. Computing 1(2), 1972); the component
/// sets are checked here against a plain reachability computation.
/// </summary>
public class LoopWithoutStorageRuleTests
{
    private static readonly LoopWithoutStorageRule Rule = new();

    private static Finding[] Run(Action<Circuit> describe)
    {
        var c = Figures.NewCircuit("loops");
        describe(c);
        return Figures.Run(Rule, c);
    }

    [Fact]
    public void ANandFedBackThroughTwoInvertersIsAnOddLoopWithItsPeriod()
    {
        var c = Figures.NewCircuit("loops");
        var fb = c.Node("fb");
        var n = c.Nand(c.Input("en"), fb, "n");
        var i1 = c.Inverter(n, "i1");
        c.Inverter(i1, fb);
        var netlist = c.ToNetlist();

        var finding = Assert.Single(Rule.Check(new RuleContext(netlist, RulePolicy.Default)));

        // Three stages of 27.6 ps: loop delay 82.8 ps, period about 2 × 82.8 = 165.6 ps.
        Assert.Equal("PW1005", finding.RuleId);
        Assert.Equal("A feedback loop of 3 devices has no latch on it ('n', 'i1', 'fb.inv1'): 3 inversions (odd): enabled, "
            + "it oscillates with a period of about 166 ps (twice the loop's delay 82.8 ps)", finding.Message);
        Assert.Equal(netlist.Device("n").Span, finding.Location);
        Assert.Equal("3", finding.Properties[FindingPropertyKeys.LoopDevices]);
        Assert.Equal("3", finding.Properties[FindingPropertyKeys.Inversions]);
        Assert.Equal(165.6e-12, double.Parse(finding.Properties[FindingPropertyKeys.OscillationPeriodSeconds], CultureInfo.InvariantCulture), 1e-18);
    }

    [Fact]
    public void TheSameLoopBrokenByARegisterIsClean()
    {
        // A register rather than one latch: a single latch fed back to itself is PW1001's finding instead.
        var c = Figures.NewCircuit("loops");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var fb = c.Node("fb");
        var n = c.Nand(c.Input("en"), fb, "n");
        c.Inverter(c.StaticRegister(n, clk, "hold"), fb);
        Assert.Empty(Checker.Check(c.ToNetlist()).Findings);
    }

    [Fact]
    public void AnEvenLoopOfThreeStagesSettlesAndIsReported()
    {
        var finding = Assert.Single(Run(c =>
        {
            var fb = c.Node("fb");
            var a = c.Inverter(fb, "a");
            var b = c.Inverter(a, "b");
            c.Buffer(b, fb);
        }));
        Assert.Equal("A feedback loop of 3 devices has no latch on it ('a', 'b', 'fb.buf1'): 2 inversions (even): it settles at a level nothing writes",
            finding.Message);
        Assert.False(finding.Properties.ContainsKey(FindingPropertyKeys.OscillationPeriodSeconds));
    }

    [Fact]
    public void AGateFeedingItsOwnControlIsALoop()
    {
        var finding = Assert.Single(Run(c =>
        {
            var ctl = c.Node("ctl");
            var y = c.TransmissionGate(c.Input("d"), ctl, "y");
            c.Inverter(y, ctl);
        }));
        Assert.Equal("2", finding.Properties[FindingPropertyKeys.LoopDevices]);
        Assert.Equal("1", finding.Properties[FindingPropertyKeys.Inversions]);
    }

    [Fact]
    public void AnInverterFeedingItselfIsALoopOfOne()
    {
        var finding = Assert.Single(Run(c =>
        {
            var n = c.Node("n");
            c.Inverter(n, n);
        }));
        Assert.Equal("1", finding.Properties[FindingPropertyKeys.LoopDevices]);
    }

    [Fact]
    public void AKeeperLoopIsAStorageCell()
        => Assert.Empty(Run(c =>
        {
            var x = c.TransmissionGate(c.Input("d"), c.Input("sel"), "x");
            c.Keeper(x);
            c.Output("q", c.Inverter(x, "q"));
        }));

    [Fact]
    public void CrossCoupledNandsAreASetResetLatch()
        => Assert.Empty(Run(c =>
        {
            var qb = c.Node("qb");
            var q = c.Nand(c.Input("set_n"), qb, "q");
            c.Nand(c.Input("reset_n"), q, qb);
        }));

    [Fact]
    public void ALatchsOwnFeedbackOnTheInverseControlIsAStorageCell()
        => Assert.Empty(Run(c =>
        {
            var en = c.Input("en");
            var enb = c.Inverter(en, "enb");
            var q = c.Node("q");
            c.TransmissionGate(c.Input("d"), en, q);
            var back = c.Inverter(c.Inverter(q, "qb"), "back");
            c.TransmissionGate(back, enb, q);
        }));

    [Fact]
    public void FeedbackThroughAGateOnAnUnrelatedControlIsReported()
    {
        var finding = Assert.Single(Run(c =>
        {
            var q = c.Node("q");
            c.TransmissionGate(c.Input("d"), c.Input("en"), q);
            var back = c.Inverter(c.Inverter(q, "qb"), "back");
            c.TransmissionGate(back, c.Input("hold"), q);
        }));
        Assert.Equal("3", finding.Properties[FindingPropertyKeys.LoopDevices]);
        Assert.Equal("2", finding.Properties[FindingPropertyKeys.Inversions]);
    }

    [Fact]
    public void StaticLatchesAndRegistersAreNotLoops()
        => Assert.Empty(Run(c =>
        {
            var clk = c.Clock("clk", 1.Nanoseconds());
            c.Output("q", c.StaticRegister(c.StaticLatch(c.Input("d"), clk.High, "l"), clk, "r"));
        }));

    [Fact]
    public void ARingBuiltInALoopNamesItsFirstFourDevicesAndItsLength()
    {
        var finding = Assert.Single(Run(c =>
        {
            var start = c.Node("start");
            var n = start;
            for (var i = 0; i < 4; i++)
                n = c.Inverter(n, $"s{i}");
            c.Inverter(n, start);
        }));
        // Five stages: loop delay 5 × 27.6 = 138 ps, period 276 ps.
        Assert.Equal("A feedback loop of 5 devices has no latch on it ('s0', 's1', 's2', 's3', ...): 5 inversions (odd): enabled, "
            + "it oscillates with a period of about 276 ps (twice the loop's delay 138 ps)", finding.Message);
    }

    [Fact]
    public void LoopsMadeByAHelperAreOneFindingEach()
    {
        static void Ring(Circuit c, string prefix)
        {
            var start = c.Node(prefix);
            c.Inverter(c.Inverter(c.Inverter(start, prefix + ".a"), prefix + ".b"), start);
        }

        var findings = Run(c =>
        {
            Ring(c, "left");
            Ring(c, "right");
        });
        Assert.Equal(new[] { "left.a", "right.a" }, findings.Select(f => f.Properties[FindingPropertyKeys.FirstDevice]).ToArray());
    }

    [Fact]
    public void LoopsThatShareANetAreOneFinding()
    {
        var finding = Assert.Single(Run(c =>
        {
            var hub = c.Node("hub");
            var a = c.Inverter(hub, "a");
            var b = c.Inverter(hub, "b");
            c.Nand(a, b, hub);
        }));
        Assert.Equal("A feedback loop of 3 devices has no latch on it ('a', 'b', 'hub.nand1'): loops that share nets, whose behaviour depends on their other inputs",
            finding.Message);
        Assert.False(finding.Properties.ContainsKey(FindingPropertyKeys.Inversions));
    }

    [Fact]
    public void AVeryLongRingIsFoundWithoutDeepRecursion()
    {
        var finding = Assert.Single(Run(c =>
        {
            var start = c.Node("start");
            var n = start;
            for (var i = 0; i < 200_000; i++)
                n = c.Inverter(n);
            c.Inverter(n, start);
        }));
        Assert.Equal("200001", finding.Properties[FindingPropertyKeys.LoopDevices]);
    }

    [Fact]
    public void ComponentsAgreeWithReachabilityOnRandomCircuits()
    {
        // Two nets are in one loop exactly when each reaches the other over loop edges (the definition of a strongly
        // connected component), computed here by a search from every net: quadratic, fine for small circuits.
        // Circuits drawn by CsCheck from a choice sequence: a failure shrinks to a small circuit, printed with its seed.
        var loopsSeen = 0;
        ChoiceSequence.Of(60).Sample(choices =>
        {
            var netlist = RandomLoopCircuit(new ChoiceSequence(choices));
            var expected = ReachabilityLoops(netlist);
            var found = CombinationalLoops.Of(netlist)
                .Select(loop => string.Join(",", loop.Select(d => d.Id)))
                .OrderBy(s => s, StringComparer.Ordinal)
                .ToArray();
            Assert.Equal(expected, found);
            System.Threading.Interlocked.Add(ref loopsSeen, found.Length);
        }, iter: 80, print: choices => Phaseward.Netlists.NetlistText.Write(RandomLoopCircuit(new ChoiceSequence(choices)), includeSpans: false));

        Assert.True(loopsSeen > 10, $"The random circuits held only {loopsSeen} loops.");
    }

    // Twelve nodes and fourteen random devices (inverters, data- and clock-controlled pass gates) among them.
    private static Netlist RandomLoopCircuit(Random random)
    {
        var c = Figures.NewCircuit("random");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var nets = Enumerable.Range(0, 12).Select(i => c.Node($"n{i}")).ToList();
        var driven = new bool[nets.Count];
        for (var d = 0; d < 14; d++)
        {
            var output = random.Next(nets.Count);
            var input = nets[random.Next(nets.Count)];
            switch (random.Next(4))
            {
                case 0 when !driven[output]:
                    c.Inverter(input, nets[output]);
                    driven[output] = true;
                    break;
                case 1:
                    c.TransmissionGate(input, nets[random.Next(nets.Count)], nets[output]);
                    break;
                case 2:
                    c.TransmissionGate(input, clk.High, nets[output]);
                    break;
            }
        }

        return c.ToNetlist();
    }

    private static string[] ReachabilityLoops(Netlist netlist)
    {
        var n = netlist.Nets.Count;
        var reach = new bool[n, n];
        foreach (var device in netlist.Devices.Where(CombinationalLoops.IsLoopEdge))
        {
            foreach (var input in device.Inputs)
                reach[input.Id, device.Output.Id] = true;
            if (device.DataControl is { } control)
                reach[control.Id, device.Output.Id] = true;
        }

        for (var k = 0; k < n; k++)
            for (var i = 0; i < n; i++)
                for (var j = 0; j < n; j++)
                    if (reach[i, k] && reach[k, j]) reach[i, j] = true;

        var loops = new System.Collections.Generic.List<string>();
        var seen = new bool[n];
        for (var v = 0; v < n; v++)
        {
            if (seen[v] || !reach[v, v]) continue;
            var members = Enumerable.Range(0, n).Where(w => reach[v, w] && reach[w, v]).ToHashSet();
            foreach (var w in members) seen[w] = true;
            var devices = netlist.Devices.Where(CombinationalLoops.IsLoopEdge)
                .Where(d => members.Contains(d.Output.Id)
                    && (d.Inputs.Any(i => members.Contains(i.Id)) || (d.DataControl is { } ctl && members.Contains(ctl.Id))))
                .Select(d => d.Id);
            loops.Add(string.Join(",", devices));
        }

        return loops.OrderBy(s => s, StringComparer.Ordinal).ToArray();
    }

    /// <summary>A wake cell written as a block: a NAND whose output comes back to its input, through two inverters
    /// (a loop with no storage) or through a register (broken by clocked storage).</summary>
    private sealed class WakeCell(Clock clock, bool registered) : Block
    {
        protected override void Describe(Circuit c)
        {
            var held = c.Node("held");
            var wake = c.Nand(c.Input("request"), held, "wake");
            c.Inverter(registered ? c.StaticRegister(wake, clock, "state") : c.Inverter(wake, "sense"), held);
            c.Output("out", wake);
        }
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void WakeCellsPlacedAsBlocksInALoopAreOneFindingPerLoopAndCleanWhenRegistered(bool registered)
    {
        var findings = Run(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            foreach (var i in Enumerable.Range(0, 3))
                c.Place(new WakeCell(clk, registered), $"w{i}");
        });

        if (registered)
        {
            Assert.Empty(findings);
            return;
        }

        // Three stages of 27.6 ps: 82.8 ps round, period about 166 ps, in each placed cell.
        Assert.Equal(3, findings.Length);
        for (var i = 0; i < 3; i++)
            Assert.Contains($"('w{i}.wake', 'w{i}.sense', 'w{i}.held.inv1'): 3 inversions (odd)", findings[i].Message);
    }
}
