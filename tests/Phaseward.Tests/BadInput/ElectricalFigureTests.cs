using System;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.BadInput;

public class ElectricalFigureTests
{
    private readonly Populated p = new();

    private void Refused(Action call, string parameter, params string[] fragments)
        => Rejection.Argument(p.Circuit, call, parameter, fragments);

    [Theory]
    [InlineData(0.0, "0 Ω")]
    [InlineData(-2e3, "-2 kΩ")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void On_resistance_must_be_positive_and_finite_in_every_transmission_gate_form(double ohms, string shown)
    {
        var c = p.Circuit;
        var r = new Resistance(ohms);
        var was = "(was " + shown + ")";
        Refused(() => c.TransmissionGate(p.A, p.Clk.High, "t", r), "onResistance", was);
        Refused(() => c.TransmissionGate(p.A, p.Clk.High, p.Node, r), "onResistance", was);
        Refused(() => c.TransmissionGate(p.A, p.B, "t", r), "onResistance", was);
        Refused(() => c.TransmissionGate(p.A, p.B, p.Node, r), "onResistance", was);
    }

    [Theory]
    [InlineData(0.0, "0 F")]
    [InlineData(-3e-15, "-3 fF")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Set_capacitance_must_be_positive_and_finite(double farads, string shown)
        => Refused(() => p.Circuit.SetCapacitance(p.Node, new Capacitance(farads)), "total", "(was " + shown + ")");

    [Fact]
    public void A_refused_capacitance_keeps_the_earlier_override()
    {
        Refused(() => p.Circuit.SetCapacitance(p.A, new Capacitance(-1e-15)), "total");

        Assert.Equal(5.Femtofarads(), p.Circuit.ToNetlist().CapacitanceOf(p.A));
    }

    [Theory]
    [InlineData(0.0, "0 A")]
    [InlineData(-5e-12, "-5 pA")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.NegativeInfinity, "-Infinity")]
    public void Set_leakage_must_be_positive_and_finite(double amperes, string shown)
        => Refused(() => p.Circuit.SetLeakage(p.Node, new Current(amperes)), "leakage", "(was " + shown + ")");

    public static TheoryData<string, Func<Process>, string> InvalidProcessFigures() => new()
    {
        { "PassGateResistance", () => new Process { PassGateResistance = Resistance.Zero }, "0 Ω" },
        { "PassGateResistance", () => new Process { PassGateResistance = new Resistance(double.NaN) }, "NaN" },
        { "DriverResistance", () => new Process { DriverResistance = -4.Kiloohms() }, "-4 kΩ" },
        { "DriverResistance", () => new Process { DriverResistance = new Resistance(double.PositiveInfinity) }, "Infinity" },
        { "KeeperResistance", () => new Process { KeeperResistance = Resistance.Zero }, "0 Ω" },
        { "KeeperResistance", () => new Process { KeeperResistance = new Resistance(double.NaN) }, "NaN" },
        { "GateCapacitance", () => new Process { GateCapacitance = -2.Femtofarads() }, "-2 fF" },
        { "GateCapacitance", () => new Process { GateCapacitance = new Capacitance(double.NaN) }, "NaN" },
        { "DiffusionCapacitance", () => new Process { DiffusionCapacitance = -1.5.Femtofarads() }, "-1.5 fF" },
        { "DiffusionCapacitance", () => new Process { DiffusionCapacitance = new Capacitance(double.PositiveInfinity) }, "Infinity" },
        { "WireCapacitance", () => new Process { WireCapacitance = -1.Femtofarads() }, "-1 fF" },
        { "WireCapacitance", () => new Process { WireCapacitance = new Capacitance(double.NaN) }, "NaN" },
        { "StageDelay", () => new Process { StageDelay = Time.Zero }, "0 s" },
        { "StageDelay", () => new Process { StageDelay = -20.Picoseconds() }, "-20 ps" },
        { "StageDelay", () => new Process { StageDelay = new Time(double.PositiveInfinity) }, "Infinity" },
        { "StorageLeakage", () => new Process { StorageLeakage = Current.Zero }, "0 A" },
        { "StorageLeakage", () => new Process { StorageLeakage = new Current(double.NaN) }, "NaN" },
        { "Supply", () => new Process { Supply = -1.2.Volts() }, "-1.2 V" },
        { "Supply", () => new Process { Supply = new Voltage(double.PositiveInfinity) }, "Infinity" },
        { "ToleratedDroop", () => new Process { ToleratedDroop = Voltage.Zero }, "0 V" },
        { "ToleratedDroop", () => new Process { ToleratedDroop = new Voltage(double.NaN) }, "NaN" },
        { "ComplementSkew", () => new Process { ComplementSkew = -30.Picoseconds() }, "-30 ps" },
        { "ComplementSkew", () => new Process { ComplementSkew = new Time(double.NaN) }, "NaN" },
    };

    [Theory]
    [MemberData(nameof(InvalidProcessFigures))]
    public void Process_figures_are_checked_as_they_are_set(string figure, Func<Process> make, string shown)
        => Refused(() => p.Circuit.UseProcess(make()), figure, "(was " + shown + ")");
}
