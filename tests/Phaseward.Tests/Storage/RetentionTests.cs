using System;
using System.Linq;
using Phaseward.Storage;

namespace Phaseward.Tests.Storage;

/// <summary>
/// t_ret = C·ΔV / I_leak (the capacitor equation I = C·dV/dt with a constant current: common practice), checked
/// against ngspice and against an explicit time-stepping integration of dV/dt = −I/C done here.
/// </summary>
public class RetentionTests
{
    [Fact]
    public void WorkedNumbersFollowChargeOverCurrent()
    {
        // Common practice: Q = C·ΔV, t = Q / I. 4.5 fF × 0.3 V = 1.35 fC; 1.35 fC / 5 pA = 270 µs.
        var retention = Retention.Of(4.5.Femtofarads(), 0.3.Volts(), 5.Picoamperes());
        Assert.Equal(270e-6, retention.Time.Seconds, 1e-15);
        Assert.Equal("270 µs", retention.Time.ToString());

        // Common practice: 20 fF × 0.1 V / 5 pA = 400 µs (the ngspice reference's first point).
        Assert.Equal(400e-6, Retention.Of(20.Femtofarads(), 0.1.Volts(), 5.Picoamperes()).Time.Seconds, 1e-15);
    }

    [Fact]
    public void ConstantCurrentCaseMatchesNgspice()
    {
        var rows = RetentionReference.Rows.Where(r => r.Case == "const_current").ToArray();
        Assert.Equal(3, rows.Length);
        foreach (var row in rows)
        {
            var estimate = Retention.Of(new Capacitance(row.C), new Voltage(row.DeltaV), new Current(row.IOrR)).Time.Seconds;
            // ngspice-39, tests/reference/ngspice/netlists/retention_isrc.cir: an ideal current source, so the linear
            // estimate is exact (the README reports 7-digit agreement; 1e-5 relative here).
            Assert.InRange(estimate / row.T, 1 - 1e-5, 1 + 1e-5);
        }
    }

    [Fact]
    public void ResistiveLeakShowsWhereTheLinearEstimateDeparts()
    {
        var rows = RetentionReference.Rows.Where(r => r.Case == "leak_resistor").OrderBy(r => r.DeltaV).ToArray();
        Assert.Equal(3, rows.Length);
        var previousShortfall = 0.0;
        foreach (var row in rows)
        {
            // The linear estimate with the leak's initial current V0/R.
            var estimate = Retention.Of(new Capacitance(row.C), new Voltage(row.DeltaV), new Current(row.V0 / row.IOrR)).Time.Seconds;
            // Exponential discharge of an RC (basic circuit theory, common practice): t = −R·C·ln(1 − ΔV/V0).
            var exact = -row.IOrR * row.C * Math.Log(1 - row.DeltaV / row.V0);
            Assert.InRange(row.T / exact, 1 - 1e-5, 1 + 1e-5); // ngspice-39, netlists/retention_res.cir
            // A leak that weakens as the node discharges keeps the level longer: the estimate is short, by more as ΔV grows.
            var shortfall = 1 - estimate / row.T;
            Assert.True(shortfall > previousShortfall, $"ΔV = {row.DeltaV} V: shortfall {shortfall:P1} should exceed {previousShortfall:P1}");
            previousShortfall = shortfall;
        }

        // README figures: 5.1 %, 15.9 %, 27.9 % short at ΔV = 0.1, 0.3, 0.5 V.
        var shortfalls = rows.Select(r => 1 - Retention.Of(new Capacitance(r.C), new Voltage(r.DeltaV), new Current(r.V0 / r.IOrR)).Time.Seconds / r.T).ToArray();
        Assert.Equal(0.051, shortfalls[0], 0.001);
        Assert.Equal(0.159, shortfalls[1], 0.001);
        Assert.Equal(0.279, shortfalls[2], 0.001);
    }

    [Theory]
    [InlineData(4.5, 0.3, 5.0)]
    [InlineData(20.0, 0.1, 5.0)]
    [InlineData(12.0, 0.25, 0.8)]
    public void MatchesExplicitTimeSteppingOfTheCapacitorEquation(double femtofarads, double droop, double picoamperes)
    {
        var c = femtofarads * 1e-15;
        var i = picoamperes * 1e-12;
        var expected = Retention.Of(femtofarads.Femtofarads(), droop.Volts(), picoamperes.Picoamperes()).Time.Seconds;

        // Explicit (forward Euler) integration of C·dV/dt = −I from V0 = 1 V until the level has fallen by ΔV.
        const int stepsPerEstimate = 100_000;
        var dt = c * droop / i / stepsPerEstimate; // only sets the grid; the crossing is found by stepping
        double v = 1.0, t = 0.0;
        while (v > 1.0 - droop)
        {
            v -= i / c * dt;
            t += dt;
        }

        Assert.InRange(t, expected - 2 * dt, expected + 2 * dt);
    }

    [Fact]
    public void TimeSteppingAResistiveLeakReproducesNgspiceToo()
    {
        // The same integrator with I = V/R, as a check that it is not tuned to the linear answer: it must land on the
        // ngspice exponential values, not on C·ΔV/I.
        foreach (var row in RetentionReference.Rows.Where(r => r.Case == "leak_resistor"))
        {
            var dt = row.T / 200_000;
            double v = row.V0, t = 0.0;
            while (v > row.V0 - row.DeltaV)
            {
                v -= v / row.IOrR / row.C * dt;
                t += dt;
            }

            Assert.InRange(t / row.T, 1 - 1e-4, 1 + 1e-4);
        }
    }

    [Fact]
    public void NetRetentionUsesTheNetsCapacitanceAndLeakageOverrides()
    {
        var circuit = new Circuit("overrides");
        var clk = circuit.Clock("clk", 1.Nanoseconds());
        var d = circuit.Input("d");
        var a = circuit.TransmissionGate(d, clk.High, "a");
        var b = circuit.TransmissionGate(d, clk.High, "b");
        circuit.Inverter(a);
        circuit.Inverter(b);
        circuit.SetCapacitance(b, 9.Femtofarads());
        circuit.SetLeakage(b, 1.Picoamperes());
        var netlist = circuit.ToNetlist();

        // a: wire 1 fF + driver diffusion 1.5 fF + inverter gate 2 fF = 4.5 fF; process (hot-corner) leakage 1 nA; ΔV 0.3 V.
        var ra = Retention.Of(netlist, a);
        Assert.Equal(4.5e-15, ra.Capacitance.Farads, 1e-24);
        Assert.Equal(1e-9, ra.Leakage.Amperes, 1e-24);
        Assert.Equal(1.35e-6, ra.Time.Seconds, 1e-18);
        // b: 9 fF × 0.3 V / 1 pA = 2.7 ms (common practice: Q = C·V, t = Q/I).
        Assert.Equal(2.7e-3, Retention.Of(netlist, b).Time.Seconds, 1e-15);
    }

    [Fact]
    public void BadInputIsRejectedWithTheArgumentAndValue()
    {
        var error = Assert.Throws<ArgumentException>(() => Retention.Of(1.Femtofarads(), 0.3.Volts(), 0.Picoamperes()));
        Assert.Equal("leakage", error.ParamName);
        Assert.Contains("0 A", error.Message);
        Assert.Equal("toleratedDroop", Assert.Throws<ArgumentException>(() => Retention.Of(1.Femtofarads(), (-0.1).Volts(), 1.Picoamperes())).ParamName);
        Assert.Equal("capacitance", Assert.Throws<ArgumentException>(() => Retention.Of(new Capacitance(double.NaN), 0.3.Volts(), 1.Picoamperes())).ParamName);
    }
}
