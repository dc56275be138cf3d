using System;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Rules.DynamicStorage;

/// <summary>
/// PW3004. Two conducting paths that disagree form a resistive divider across the supply: the node sits at
/// V·R2/(R1 + R2) and V/(R1 + R2) flows (Ohm's law; series resistances add along a path). That drivers whose
/// conduction overlaps fight is common practice. Illustrative process: V = 1.2 V, drivers 4 kΩ, pass gates 5 kΩ,
/// complement skew 30 ps; a 10 ns clock at duty 0.5 conducts High over [0, 5.03 ns) and Low over [5 ns, 10.03 ns).
/// </summary>
public class FightingDriversRuleTests
{
    private static readonly FightingDriversRule Rule = new();

    private static (Netlist Netlist, Finding[] Findings) Check(Action<Circuit> describe)
    {
        var c = new Circuit("buoy");
        describe(c);
        var netlist = c.ToNetlist();
        return (netlist, Checker.Check(netlist, new[] { Rule }).Findings.ToArray());
    }

    [Fact]
    public void TwoGatesOnOnePhaseFightForTheWholeWindow()
    {
        var (netlist, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), clk.High, n);
            c.TransmissionGate(c.Input("b"), clk.High, n);
        });

        // 9 kΩ each: 600 mV, 1.2 V / 18 kΩ = 66.7 µA, for the whole 5.03 ns window.
        var finding = Assert.Single(findings);
        Assert.Equal("PW3004", finding.RuleId);
        Assert.Equal("'n.tg1' (9 kΩ) and 'n.tg2' (9 kΩ) drive node 'n' together for 5.03 ns per period (clk.High and clk.High overlap): "
            + "when they disagree the node sits at 600 mV (divider, 'n.tg1' pulling up) and 66.7 µA flows from rail to rail", finding.Message);
        Assert.Equal(netlist.Device("n.tg2").Span, finding.Location);
        Assert.Equal(netlist.Device("n.tg1").Span, Assert.Single(finding.RelatedLocations));
        Assert.Equal(5.03, Number(finding, FindingPropertyKeys.OverlapSeconds) * 1e9, 12);
        Assert.Equal(0.6, Number(finding, FindingPropertyKeys.LevelVolts), 12);
    }

    [Fact]
    public void ComplementaryPhasesFightOnlyInTheOverlaps()
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), clk.High, n);
            c.TransmissionGate(c.Input("b"), clk.Low, n);
        });
        // The 0-0 overlap after the falling edge and the 1-1 overlap after the rising edge: 30 ps each.
        Assert.Equal(60, Number(Assert.Single(findings), FindingPropertyKeys.OverlapSeconds) * 1e12, 9);
    }

    [Fact]
    public void AMuxOnAControlAndItsInverseIsClean()
        => Assert.Empty(Check(c =>
        {
            var sel = c.Input("sel");
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), sel, n);
            c.TransmissionGate(c.Input("b"), c.Inverter(sel, "selb"), n);
        }).Findings);

    [Fact]
    public void ControlsNotProvablyExclusiveFightUntilStatedSo()
    {
        void Mux(Circuit c, bool stated)
        {
            var sel = c.Input("sel");
            var other = c.Input("selb");
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), sel, n, onResistance: 20.Kiloohms());
            c.TransmissionGate(c.Input("b"), other, n);
            if (stated) c.Exclusive(sel, other);
        }

        var finding = Assert.Single(Check(c => Mux(c, stated: false)).Findings);
        // 4 + 20 = 24 kΩ against 9 kΩ: 1.2 × 9 / 33 = 327 mV, 1.2 / 33 kΩ = 36.4 µA.
        Assert.Equal("'n.tg1' (24 kΩ) and 'n.tg2' (9 kΩ) drive node 'n' together whenever 'sel' and 'selb' are both high (not stated exclusive): "
            + "when they disagree the node sits at 327 mV (divider, 'n.tg1' pulling up) and 36.4 µA flows from rail to rail", finding.Message);
        Assert.Equal(1.2 / 33e3, Number(finding, FindingPropertyKeys.CurrentAmperes), 15);
        Assert.Empty(Check(c => Mux(c, stated: true)).Findings);
    }

    [Fact]
    public void AClockedAndADataControlledGateCanConductTogether()
    {
        var finding = Assert.Single(Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), clk.High, n);
            c.TransmissionGate(c.Input("b"), c.Input("reset"), n);
        }).Findings);
        Assert.Contains("together whenever 'reset' is high while clk.High conducts:", finding.Message);
    }

    [Fact]
    public void GatesOnUnrelatedClocksAreReported()
    {
        var finding = Assert.Single(Check(c =>
        {
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), c.Clock("fast", 10.Nanoseconds()).High, n);
            c.TransmissionGate(c.Input("b"), c.Clock("slow", 1.Microseconds()).Low, n);
        }).Findings);
        Assert.Contains("whenever fast.High and slow.Low conduct together (unrelated clocks)", finding.Message);
        Assert.False(finding.Properties.ContainsKey(FindingPropertyKeys.OverlapSeconds));
    }

    [Fact]
    public void StaticLatchesRegistersKeepersAndOneSourceTwiceAreNotFights()
        => Assert.Empty(Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var q = c.StaticRegister(c.StaticLatch(c.Input("d"), clk.High, "l"), clk, "r");
            var n = c.Node("n");
            var src = c.Input("src");
            c.TransmissionGate(src, clk.High, n);
            c.TransmissionGate(src, c.Input("en"), n);
            c.Keeper(n);
            c.Output("q", q);
        }).Findings);

    [Fact]
    public void ABusDrivenInALoopThroughAHelperIsOneFindingPerBit()
    {
        static void Drive(Circuit c, Net bus, Phase phase, string source) => c.TransmissionGate(c.Input(source), phase, bus);

        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var bit = 0; bit < 4; bit++)
            {
                var bus = c.Node($"bus{bit}");
                Drive(c, bus, clk.Low, $"adc{bit}");
                Drive(c, bus, clk.Low, $"dac{bit}");
                Drive(c, bus, clk.Low, $"aux{bit}");
            }
        });
        Assert.Equal(new[] { "bus0", "bus1", "bus2", "bus3" }, findings.Select(f => f.Properties[FindingPropertyKeys.Node]).ToArray());
    }

    [Fact]
    public void TheFixedBusOnExclusiveSelectsIsClean()
        => Assert.Empty(Check(c =>
        {
            var bus = c.Node("bus");
            var adc = c.Input("pick_adc");
            var dac = c.Input("pick_dac");
            c.Exclusive(adc, dac);
            c.TransmissionGate(c.Input("adc"), adc, bus);
            c.TransmissionGate(c.Input("dac"), dac, bus);
        }).Findings);

    private static double Number(Finding finding, string key) => double.Parse(finding.Properties[key], CultureInfo.InvariantCulture);

    /// <summary>A bus bit written as a block: two sources onto one node, picked by two request lines (which can be
    /// high together) or by one select and its inverse (exclusive by construction).</summary>
    private sealed class BusBit(bool selected) : Block
    {
        protected override void Describe(Circuit c)
        {
            var bus = c.Node("bus");
            var pick = c.Input("pick");
            c.TransmissionGate(c.Input("a"), pick, bus);
            c.TransmissionGate(c.Input("b"), selected ? c.Inverter(pick, "pick_b") : c.Input("other"), bus);
            c.Output("q", c.Inverter(bus, "q"));
        }
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void BusBitsPlacedAsBlocksInALoopAreOneFindingPerNodeAndCleanWithASelect(bool selected)
    {
        var (_, findings) = Check(c =>
        {
            for (var bit = 0; bit < 3; bit++)
                c.Place(new BusBit(selected), $"bit{bit}");
        });

        if (selected)
        {
            Assert.Empty(findings);
            return;
        }

        // 4 kΩ input driver + 5 kΩ gate on each side: 600 mV, 1.2 V / 18 kΩ = 66.7 µA.
        Assert.Equal(new[] { "bit0.bus", "bit1.bus", "bit2.bus" }, findings.Select(f => f.Properties[FindingPropertyKeys.Node]).ToArray());
        Assert.All(findings, f => Assert.Contains("sits at 600 mV", f.Message));
    }
}
