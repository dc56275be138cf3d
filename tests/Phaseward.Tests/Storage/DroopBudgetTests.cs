using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Storage;

namespace Phaseward.Tests.Storage;

/// <summary>
/// One droop allowance per node. Charge sharing spends V·C2/(C1 + C2) of it (conservation of charge, Q = C·V before
/// and after: common practice; e.g. Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits", 2nd ed., ch. 6,
/// charge sharing in dynamic logic, from memory), leakage may take what is left: t_ret = C·(ΔV_allow − ΔV_share)/I_leak
/// (Q = C·V, t = Q/I: common practice). Default allowance: a quarter of the supply, 0.3 V at 1.2 V.
/// Circuit: a dynamic node 'a' (40 fF, written on clk.High) shares its charge, through a pass gate on clk.Low, with a
/// floating node 'b'; the clock is gated (stops low) for at most 10 µs. Leakage 1 nA (the hot default).
/// </summary>
public class DroopBudgetTests
{
    private static Netlist Shared(double otherFemtofarads, Process? process = null)
    {
        var c = new Circuit("budget");
        if (process is not null) c.UseProcess(process);
        var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 10.Microseconds(), "g");
        var a = c.TransmissionGate(c.Input("d"), gated.High, "a");
        var b = c.TransmissionGate(a, gated.Low, "b");
        c.Inverter(a, "qa");
        c.Inverter(b, "qb");
        c.SetCapacitance(a, 40.Femtofarads());
        c.SetCapacitance(b, otherFemtofarads.Femtofarads());
        return c.ToNetlist();
    }

    private static StorageNode NodeA(Netlist netlist) => StorageNodes.Of(netlist).Single(n => n.Net.Name == "a");

    [Fact]
    public void ChargeSharingSpendsFirstAndLeakageTakesWhatIsLeft()
    {
        // ΔV_share = 1.2 V · 5 / (40 + 5) = 133.3 mV; left 300 − 133.3 = 166.7 mV; t_ret = 40 fF · 166.7 mV / 1 nA = 6.67 µs.
        var budget = NodeA(Shared(5)).Budget;
        Assert.Equal(0.3, budget.Allowance.Volts, 12);
        Assert.Equal(1.2 * 5 / 45, budget.SharingDroop.Volts, 12);
        Assert.Equal(0.3 - 1.2 * 5 / 45, budget.LeftForLeakage.Volts, 12);
        Assert.Equal(40e-15 * (0.3 - 1.2 * 5 / 45) / 1e-9, budget.Retention.Time.Seconds, 1e-18);
        Assert.False(budget.SpentBySharing);
    }

    [Fact]
    public void TheSharedBudgetTurnsAnIdleTimeThatLeakageAloneWouldSurviveIntoAFinding()
    {
        // Leakage alone: 40 fF · 0.3 V / 1 nA = 12 µs > 10 µs idle. With the sharing: 6.67 µs < 10 µs: PW3001, and no
        // PW3003 (133 mV is within the 300 mV allowance).
        var findings = Checker.Check(Shared(5)).Findings;
        var pw3001 = Assert.Single(findings, f => f.RuleId == "PW3001" && f.Properties["Node"] == "a");
        Assert.Contains("keeps its level only 6.67 µs (C·ΔV/I_leak with C = 40 fF, ΔV = 167 mV (300 mV allowance less 133 mV of charge sharing through", pw3001.Message);
        Assert.DoesNotContain(findings, f => f.RuleId == "PW3003");

        // Without the second node there is nothing to share: 12 µs, clean.
        var c = new Circuit("alone");
        var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 10.Microseconds(), "g");
        var a = c.TransmissionGate(c.Input("d"), gated.High, "a");
        c.Inverter(a, "qa");
        c.SetCapacitance(a, 40.Femtofarads());
        Assert.DoesNotContain(Checker.Check(c.ToNetlist()).Findings, f => f.RuleId == "PW3001");
    }

    [Fact]
    public void SharingThatSpendsTheWholeAllowanceIsOneFindingOfPw3003()
    {
        // ΔV_share = 1.2 V · 40 / 80 = 600 mV > 300 mV: PW3003; the retention rules leave node 'a' to it.
        var netlist = Shared(40);
        Assert.True(NodeA(netlist).Budget.SpentBySharing);
        Assert.Equal(0, NodeA(netlist).Retention.Time.Seconds);
        var findings = Checker.Check(netlist).Findings;
        Assert.Single(findings, f => f.RuleId == "PW3003");
        Assert.DoesNotContain(findings, f => f.RuleId is "PW3001" or "PW3002" && f.Properties["Node"] == "a");
    }

    [Fact]
    public void TheDefaultAllowanceIsAQuarterOfTheSupplyAndAnAbsoluteOneIsAccepted()
    {
        Assert.Equal(0.3, new Process().ToleratedDroop.Volts, 12);
        Assert.Equal(0.225, new Process { Supply = 0.9.Volts() }.ToleratedDroop.Volts, 12);
        Assert.Equal(0.2, new Process { Supply = 0.9.Volts(), ToleratedDroop = 0.2.Volts() }.ToleratedDroop.Volts, 12);
        // An absolute allowance of 0.2 V: left 200 − 133.3 = 66.7 mV.
        var budget = NodeA(Shared(5, new Process { ToleratedDroop = 0.2.Volts() })).Budget;
        Assert.Equal(0.2 - 1.2 * 5 / 45, budget.LeftForLeakage.Volts, 12);
        var error = Assert.Throws<ArgumentException>(() => new Process { ToleratedDroop = (-0.1).Volts() });
        Assert.Equal(nameof(Process.ToleratedDroop), error.ParamName);
        Assert.Contains("-100 mV", error.Message);
    }
}
