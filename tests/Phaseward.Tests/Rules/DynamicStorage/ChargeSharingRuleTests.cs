using System;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Tests.Rules.DynamicStorage;

/// <summary>
/// PW3003. Droop V·C2/(C1+C2) by conservation of charge (common practice; see <see cref="Storage.ChargeSharingTests"/>
/// for the source), V the 1.2 V supply and ΔV = 0.3 V tolerated (illustrative process).
/// </summary>
public class ChargeSharingRuleTests
{
    private static readonly Rule Rule = new ChargeSharingRule();

    private static (Netlist Netlist, Finding[] Findings) Check(Action<Circuit> describe)
    {
        var c = new Circuit("buoy");
        describe(c);
        var netlist = c.ToNetlist();
        return (netlist, Checker.Check(netlist, new[] { Rule }).Findings.ToArray());
    }

    [Fact]
    public void TwoDynamicNodesInSeriesShareCharge()
    {
        var (netlist, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var a = c.TransmissionGate(c.Input("d"), clk.Low, "a");
            var b = c.TransmissionGate(a, clk.High, "b");
            c.Inverter(b, "q");
        });

        // a: wire 1 + two pass-gate terminals 2 × 1.5 = 4 fF; b: wire 1 + one terminal 1.5 + inverter gate 2 = 4.5 fF.
        // Droop 1.2 V × 4.5 / 8.5 = 635.3 mV; settles at 1.2 V × 4 / 8.5 = 564.7 mV.
        var finding = Assert.Single(findings);
        Assert.Equal(
            "When 'b' conducts, floating node 'a' (C1 = 4 fF) shares its charge with floating node 'b' (C2 = 4.5 fF): "
            + "a 1.2 V level settles at 565 mV, a droop of 635 mV, more than the tolerated 300 mV",
            finding.Message);
        Assert.Equal(netlist.Devices.Single(d => d.Name == "b").Span, finding.Location);
        Assert.Equal(netlist.Devices.Single(d => d.Name == "a").Span, Assert.Single(finding.RelatedLocations));
        Assert.Equal(1.2 * 4.5 / 8.5, double.Parse(finding.Properties[FindingPropertyKeys.DroopVolts], CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal("a", finding.Properties[FindingPropertyKeys.Node]);
        Assert.Equal("b", finding.Properties[FindingPropertyKeys.OtherNode]);
    }

    [Theory]
    [InlineData(100.0, false)] // 1.2 × 4.5 / 104.5 = 51.7 mV
    [InlineData(13.6, false)]  // 1.2 × 4.5 / 18.1 = 298.3 mV
    [InlineData(13.0, true)]   // 1.2 × 4.5 / 17.5 = 308.6 mV
    public void ABigEnoughStorageCapacitorAbsorbsTheSharing(double femtofarads, bool reported)
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var a = c.TransmissionGate(c.Input("d"), clk.Low, "a");
            c.SetCapacitance(a, femtofarads.Femtofarads());
            c.Inverter(c.TransmissionGate(a, clk.High, "b"), "q");
        });
        Assert.Equal(reported ? 1 : 0, findings.Length);
    }

    [Fact]
    public void ADataControlledGateFromADynamicNodeIntoAFloatingNodeCounts()
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var x = c.TransmissionGate(c.Input("d"), clk.High, "x");
            var y = c.TransmissionGate(x, c.Input("sel"), "y");
            c.Inverter(y, "q");
        });
        Assert.Equal("y", Assert.Single(findings).Properties[FindingPropertyKeys.OtherNode]);
    }

    [Fact]
    public void GatesSwitchedByOneControlNetConductTogetherAndDoNotShare()
    {
        // A route switched by one enable: whenever the second gate conducts, so does the first, which keeps the middle
        // node driven from the input. A second, independent enable brings the sharing back.
        var (_, shared) = Check(c =>
        {
            var enable = c.Input("route_enable");
            var middle = c.TransmissionGate(c.Input("d"), enable, "middle");
            c.Inverter(c.TransmissionGate(middle, enable, "end"), "q");
        });
        Assert.Empty(shared);

        var (_, independent) = Check(c =>
        {
            var middle = c.TransmissionGate(c.Input("d"), c.Input("first_enable"), "middle");
            c.Inverter(c.TransmissionGate(middle, c.Input("second_enable"), "end"), "q");
        });
        Assert.Equal("middle", Assert.Single(independent).Properties[FindingPropertyKeys.Node]);
    }

    [Fact]
    public void DrivenOrRestoredNodesDoNotShareCharge()
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var d = c.Input("d");
            // From a primary input, and from a restoring stage: driven, not shared.
            c.Inverter(c.TransmissionGate(d, clk.High, "from_input"));
            c.Inverter(c.TransmissionGate(c.Inverter(d), clk.High, "from_inverter"));
            // From a static latch's node (its feedback keeps it driven all period) into a floating node.
            var s = c.StaticLatch(d, clk.High, "s");
            var sx = c.TransmissionGate(s, clk.Low, "after_static"); // s is the latch output (restored) anyway
            c.Inverter(sx);
            // Registers hand over through restoring inverters.
            c.DynamicRegister(d, clk, "r");
            // Into a node kept by a keeper.
            var kept = c.TransmissionGate(c.TransmissionGate(d, clk.Low, "dyn"), clk.High, "kept");
            c.Keeper(kept);
        });
        Assert.Empty(findings);
    }

    [Fact]
    public void AnOutputDrivenAllThroughTheWindowIsNotFloating()
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var d = c.Input("d");
            var a = c.TransmissionGate(d, clk.Low, "a");
            var b = c.TransmissionGate(a, clk.High, "b");
            c.TransmissionGate(c.Inverter(d), clk.High, b); // b is driven from a restoring stage throughout
            c.Inverter(b, "q");
        });
        Assert.Empty(findings);
    }

    [Fact]
    public void ASourceNodeRefreshedThroughoutTheWindowIsNotFloating()
    {
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var d = c.Input("d");
            var a = c.TransmissionGate(d, clk.High, "a"); // conducts whenever the next gate does
            c.Inverter(c.TransmissionGate(a, clk.High, "b"), "q");
        });
        Assert.Empty(findings);
    }

    [Fact]
    public void TheSupplyOfTheProcessSetsTheLevel()
    {
        var (_, findings) = Check(c =>
        {
            c.UseProcess(new Process { Supply = 0.6.Volts() });
            var clk = c.Clock("clk", 10.Nanoseconds());
            var a = c.TransmissionGate(c.Input("d"), clk.Low, "a");
            c.Inverter(c.TransmissionGate(a, clk.High, "b"), "q");
        });
        // 0.6 V × 4.5 / 8.5 = 317.6 mV > 300 mV.
        Assert.Contains("a 600 mV level settles at 282 mV, a droop of 318 mV", Assert.Single(findings).Message);
    }

    // A register-file read port: four dynamic cells of 40 fF each (written on clk.High) read through pass gates onto
    // one bit line. The bit line: wire 1 + four pass-gate terminals 4 × 1.5 + the sense inverter's gate 2 = 9 fF.
    private static (Netlist Netlist, Finding[] Findings) ReadPort(Action<Circuit, Net[]> state)
        => Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var bitLine = c.Node("rbl");
            var selects = new Net[4];
            for (var i = 0; i < selects.Length; i++)
            {
                var cell = c.TransmissionGate(c.Input($"d{i}"), clk.High, $"cell{i}");
                c.SetCapacitance(cell, 40.Femtofarads());
                selects[i] = c.Input($"rsel{i}");
                c.TransmissionGate(cell, selects[i], bitLine);
            }

            state(c, selects);
            c.Inverter(bitLine, "sense");
        });

    [Fact]
    public void AOneHotReadPortStatedExclusiveSharesACellWithTheBitLineAlone()
    {
        // One read gate open at a time: 40 fF shares with 9 fF, droop 1.2 V × 9 / 49 = 220.4 mV, under 300 mV.
        var (_, findings) = ReadPort((c, selects) => c.Exclusive(selects));
        Assert.Empty(findings);
    }

    [Fact]
    public void ReadSelectsNotKnownExclusiveShareACellWithTheBitLineAndEveryOtherCell()
    {
        // Worst case, every read gate open together: C2 = 9 + 3 × 40 = 129 fF; droop 1.2 V × 129 / 169 = 916.0 mV,
        // the level settles at 1.2 V × 40 / 169 = 284.0 mV (conservation of charge over the five nodes).
        var (_, findings) = ReadPort((_, _) => { });
        Assert.Equal(4, findings.Length);
        Assert.Equal(
            "When 'rbl.tg1' conducts, floating node 'cell0' (C1 = 40 fF) shares its charge with floating node 'rbl' (C2 = 129 fF, "
            + "counting 3 more floating nodes joined through pass gates that may conduct at the same time: 'cell1' through "
            + "'rbl.tg2', 'cell2' through 'rbl.tg3', 'cell3' through 'rbl.tg4'; state Circuit.Exclusive if their controls are "
            + "never high together): a 1.2 V level settles at 284 mV, a droop of 916 mV, more than the tolerated 300 mV",
            findings[0].Message);
        Assert.Equal(1.2 * 129 / 169, double.Parse(findings[0].Properties[FindingPropertyKeys.DroopVolts], CultureInfo.InvariantCulture), 1e-12);
    }

    [Fact]
    public void StatingTwoOfFourSelectsExclusiveLeavesTheOtherTwoCounted()
    {
        // rsel0/rsel1 stated exclusive: opening rbl.tg1 can still find rbl.tg3 and rbl.tg4 open, not rbl.tg2.
        // C2 = 9 + 2 × 40 = 89 fF for cell0.
        var (_, findings) = ReadPort((c, selects) => c.Exclusive(selects[0], selects[1]));
        Assert.Contains("(C2 = 89 fF, counting 2 more floating nodes joined through pass gates that may conduct at the same time: "
            + "'cell2' through 'rbl.tg3', 'cell3' through 'rbl.tg4';", findings.Single(f => f.Properties[FindingPropertyKeys.Node] == "cell0").Message);
    }

    [Theory]
    [InlineData(true)]   // y → z on clk.High too: z is open while x's charge spreads into y, so it takes a share.
    [InlineData(false)]  // y → z on clk.Low: the windows meet only for the complement skew, and z is not counted.
    public void AClockedGateCountsItsFarNodeOnlyWhenItsWindowOverlapsTheOpeningOne(bool samePhase)
    {
        // x (wire 1 + two terminals 2 × 1.5 = 4 fF) → gate y on clk.High → y (4 fF likewise) → gate z → z (wire 1 +
        // one terminal 1.5 + inverter gate 2 = 4.5 fF). Same phase: C2 = 4 + 4.5 = 8.5 fF; otherwise C2 = 4 fF.
        var (_, findings) = Check(c =>
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            var x = c.TransmissionGate(c.Input("d"), clk.Low, "x");
            var y = c.TransmissionGate(x, clk.High, "y");
            var z = c.TransmissionGate(y, samePhase ? clk.High : clk.Low, "z");
            c.Inverter(z, "q");
        });

        var atY = findings.Single(f => f.Properties[FindingPropertyKeys.Node] == "x");
        var c2 = samePhase ? 4.0 + 4.5 : 4.0;
        Assert.Equal(1.2 * c2 / (4.0 + c2), double.Parse(atY.Properties[FindingPropertyKeys.DroopVolts], CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal(samePhase, atY.Message.Contains("'z' through 'z'", StringComparison.Ordinal));
    }
}
