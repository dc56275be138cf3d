using System;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Rules.DynamicStorage;

/// <summary>
/// PW3005. A write against a keeper is a resistive divider: V_node = V·R_w/(R_w + R_k) (Ohm's law; the same figure a
/// circuit simulator gives for two resistors, checked below against the closed form), and the write path is the
/// driver plus its pass gates in series (series resistances add). The requirement — the written level must pass the
/// switching point V/2 by a margin, 10 % of the supply by default — is common practice for keeper sizing.
/// Illustrative process: V = 1.2 V, driver (and primary-input driver) 4 kΩ, pass gate 5 kΩ, keeper 40 kΩ.
/// </summary>
public class KeeperTooStrongRuleTests
{
    private static readonly KeeperTooStrongRule Rule = new();

    private static (Netlist Netlist, Finding[] Findings) Check(Action<Circuit> describe, RulePolicy? policy = null)
    {
        var c = new Circuit("buoy");
        describe(c);
        var netlist = c.ToNetlist();
        return (netlist, Checker.Check(netlist, new[] { Rule }, policy).Findings.ToArray());
    }

    [Fact]
    public void TheDefaultKeeperLosesToAGateFromAnInput()
    {
        // R_w = 4 kΩ + 5 kΩ = 9 kΩ against 40 kΩ: 1.2 × 9 / 49 = 220 mV, below 1.2 × 0.4 = 480 mV.
        var (_, findings) = Check(c => c.Keeper(c.TransmissionGate(c.Input("d"), c.Input("sel"), "x")));
        Assert.Empty(findings);
    }

    [Fact]
    public void AStrongKeeperIsReportedWithBothResistancesAndTheLevel()
    {
        var (netlist, findings) = Check(c => c.Keeper(c.TransmissionGate(c.Input("d"), c.Input("sel"), "x"), resistance: 10.Kiloohms()));

        // 1.2 V × 9 / (9 + 10) = 568.4 mV, above 1.2 × (0.5 − 0.1) = 480 mV.
        var finding = Assert.Single(findings);
        Assert.Equal("PW3005", finding.RuleId);
        Assert.Equal("Keeper 'x.keeper' (10 kΩ) is too strong for the write path through 'x' (9 kΩ): writing a 0 against it pulls node 'x' "
            + "only down to 568 mV, above the 480 mV it must reach (switching point 600 mV less a 120 mV margin; a 1 mirrors this)", finding.Message);
        Assert.Equal(netlist.Device("x.keeper.feedback").Span, finding.Location);
        Assert.Equal(netlist.Device("x").Span, Assert.Single(finding.RelatedLocations));
        Assert.Equal(1.2 * 9 / 19, Number(finding, FindingPropertyKeys.LevelVolts), 12);
        Assert.Equal(9000, Number(finding, FindingPropertyKeys.WriteOhms), 9);
        Assert.Equal(10000, Number(finding, FindingPropertyKeys.KeeperOhms), 9);
        Assert.Equal(0.48, Number(finding, FindingPropertyKeys.RequiredVolts), 12);
    }

    [Theory]
    [InlineData(13.6, false)] // 1.2 × 9 / 22.6 = 477.9 mV
    [InlineData(13.4, true)]  // 1.2 × 9 / 22.4 = 482.1 mV
    public void TheMarginDecidesNearTheBoundary(double keeperKiloohms, bool reported)
    {
        var (_, findings) = Check(c => c.Keeper(c.TransmissionGate(c.Input("d"), c.Input("sel"), "x"), resistance: keeperKiloohms.Kiloohms()));
        Assert.Equal(reported ? 1 : 0, findings.Length);
    }

    [Theory]
    [InlineData(0.0, false)]  // must reach 600 mV
    [InlineData(0.05, false)] // 540 mV
    [InlineData(0.1, true)]   // 480 mV
    [InlineData(0.2, true)]   // 360 mV
    public void TheMarginIsAPolicy(double margin, bool reported)
    {
        // A 13 kΩ keeper against 9 kΩ: 1.2 × 9 / 22 = 490.9 mV.
        var (_, findings) = Check(c => c.Keeper(c.TransmissionGate(c.Input("d"), c.Input("sel"), "x"), resistance: 13.Kiloohms()),
            new RulePolicy { KeeperWriteMargin = margin });
        Assert.Equal(reported ? 1 : 0, findings.Length);
    }

    [Theory]
    [InlineData(3, false)] // 4 + 3 × 5 = 19 kΩ: 1.2 × 19 / 59 = 386 mV
    [InlineData(5, true)]  // 4 + 5 × 5 = 29 kΩ: 1.2 × 29 / 69 = 504 mV
    public void PassGatesInSeriesAddToTheWritePath(int gates, bool reported)
    {
        var (_, findings) = Check(c =>
        {
            var n = c.Inverter(c.Input("d"), "drive");
            var sel = c.Input("sel");
            for (var i = 0; i < gates; i++)
                n = c.TransmissionGate(n, sel, $"g{i}");
            c.Keeper(n);
        });
        Assert.Equal(reported ? 1 : 0, findings.Length);
        if (reported)
            Assert.Equal(29000, Number(findings[0], FindingPropertyKeys.WriteOhms), 9);
    }

    [Fact]
    public void TheWeakestArmOfAMuxIsTheOneChecked()
    {
        var (_, findings) = Check(c =>
        {
            var sel = c.Input("sel");
            var n = c.Node("n");
            c.TransmissionGate(c.Input("a"), sel, n);
            c.TransmissionGate(c.Input("b"), c.Inverter(sel, "selb"), n, onResistance: 60.Kiloohms());
            c.Keeper(n);
        });
        // The slow arm: 4 + 60 = 64 kΩ against 40 kΩ: 1.2 × 64 / 104 = 738 mV.
        var finding = Assert.Single(findings);
        Assert.Equal("n.tg2", finding.Properties[FindingPropertyKeys.Writer]);
        Assert.Equal(1.2 * 64 / 104, Number(finding, FindingPropertyKeys.LevelVolts), 12);
    }

    [Fact]
    public void TwoKeepersOnOneNodeActInParallel()
    {
        // 40 kΩ ∥ 40 kΩ = 20 kΩ; R_w 9 kΩ: 1.2 × 9 / 29 = 372 mV (clean); three: 13.3 kΩ, 1.2 × 9 / 22.3 = 484 mV.
        var (_, two) = Check(c =>
        {
            var x = c.TransmissionGate(c.Input("d"), c.Input("sel"), "x");
            c.Keeper(x, "k1");
            c.Keeper(x, "k2");
        });
        Assert.Empty(two);
        var (_, three) = Check(c =>
        {
            var x = c.TransmissionGate(c.Input("d"), c.Input("sel"), "x");
            c.Keeper(x, "k1");
            c.Keeper(x, "k2");
            c.Keeper(x, "k3");
        });
        Assert.Equal(40000.0 / 3, Number(Assert.Single(three), FindingPropertyKeys.KeeperOhms), 6);
    }

    [Fact]
    public void KeepersAddedInALoopAreCheckedOneByOne()
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            for (var i = 0; i < 4; i++)
            {
                var x = c.TransmissionGate(c.Input($"d{i}"), clk.High, $"bit{i}");
                if (i % 2 == 1)
                    c.Keeper(x, resistance: 8.Kiloohms());
                c.Output($"q{i}", c.Inverter(x));
            }
        });
        // Each written through its latch's pass gate from an input: 9 kΩ against 8 kΩ, 1.2 × 9 / 17 = 635 mV.
        Assert.Equal(new[] { "bit1", "bit3" }, findings.Select(f => f.Properties[FindingPropertyKeys.Node]).ToArray());
    }

    [Fact]
    public void AKeeperWithNothingWritingItIsNotChecked()
        => Assert.Empty(Check(c => c.Keeper(c.Node("alone"), resistance: 1.Kiloohms())).Findings);

    [Fact]
    public void ThePolicyRejectsAMarginOutsideItsRange()
    {
        var error = Assert.Throws<ArgumentException>(() => new RulePolicy { KeeperWriteMargin = 0.5 });
        Assert.Contains("KeeperWriteMargin", error.Message);
        Assert.Contains("0.5", error.Message);
    }

    [Fact]
    public void TheKeeperCallRejectsANonPositiveResistanceAndLeavesTheCircuitUnchanged()
    {
        var c = new Circuit("buoy");
        var x = c.Node("x");
        var error = Assert.Throws<ArgumentException>(() => c.Keeper(x, resistance: (-1).Kiloohms()));
        Assert.Equal("resistance", error.ParamName);
        Assert.Equal(0, c.DeviceCount);
    }

    [Theory]
    [InlineData(9e3, 10e3, 1.2)]
    [InlineData(1e3, 1e3, 1.0)]
    [InlineData(29e3, 40e3, 1.8)]
    public void TheDividerIsOhmsLaw(double write, double keeper, double supply)
    {
        // Two resistors in series across the supply carry I = V/(R_w + R_k); the node sits I·R_w above ground.
        var check = KeeperWrite.Of(new Resistance(keeper), new Resistance(write), new Voltage(supply), 0.1);
        var current = supply / (write + keeper);
        Assert.Equal(current * write, check.Level.Volts, 12);
    }

    private static double Number(Finding finding, string key) => double.Parse(finding.Properties[key], CultureInfo.InvariantCulture);

    /// <summary>A kept bit written as a block: a pass gate writes a node that a keeper of the given strength holds.</summary>
    private sealed class KeptBit(Resistance? keeper) : Block
    {
        protected override void Describe(Circuit c)
        {
            var x = c.TransmissionGate(c.Input("d"), c.Input("sel"), "x");
            c.Keeper(x, resistance: keeper);
            c.Output("q", c.Inverter(x, "q"));
        }
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void KeptBitsPlacedAsBlocksInALoopAreCheckedEachAndCleanWithTheProcessKeeper(bool weak)
    {
        // 10 kΩ against the 9 kΩ write path: 1.2 × 9 / 19 = 568 mV > 480 mV; the process's 40 kΩ gives 220 mV.
        var (_, findings) = Check(c =>
        {
            for (var bit = 0; bit < 3; bit++)
                c.Place(new KeptBit(weak ? null : 10.Kiloohms()), $"bit{bit}");
        });

        if (weak)
        {
            Assert.Empty(findings);
            return;
        }

        Assert.Equal(3, findings.Length);
        for (var bit = 0; bit < 3; bit++)
            Assert.Contains($"node 'bit{bit}.x' only down to 568 mV", findings[bit].Message);
    }
}
