using System;
using Phaseward.Storage;

namespace Phaseward.Tests.Storage;

/// <summary>
/// Charge sharing between two floating capacitances: V·C1/(C1+C2) by conservation of charge (Q = C·V, common
/// practice). The same expression for a precharged dynamic output sharing with an internal node at 0 V appears in
/// Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits", 2nd ed., the dynamic-logic section on charge sharing
/// (section number from memory: 6.4). Also checked here by time-stepping the two capacitors through a resistor.
/// </summary>
public class ChargeSharingTests
{
    [Theory]
    [InlineData(30.0, 10.0, 1.2)]
    [InlineData(4.0, 4.5, 1.2)]
    [InlineData(50.0, 15.0, 2.5)]
    [InlineData(5.0, 0.0, 1.0)]
    public void SettledLevelConservesCharge(double c1Femto, double c2Femto, double volts)
    {
        var sharing = ChargeSharing.Of(c1Femto.Femtofarads(), c2Femto.Femtofarads(), volts.Volts());

        // Common practice: the charge before (C1·V + C2·0) equals the charge after ((C1 + C2)·Vf).
        var before = c1Femto.Femtofarads() * volts.Volts();
        var after = (c1Femto + c2Femto).Femtofarads() * sharing.Settled;
        Assert.Equal(before.Coulombs, after.Coulombs, 1e-27);
        Assert.Equal(volts, (sharing.Settled + sharing.Droop).Volts, 1e-12);
        Assert.Equal(volts * c2Femto / (c1Femto + c2Femto), sharing.Droop.Volts, 1e-12);
    }

    [Fact]
    public void WorkedNumbers()
    {
        // 30 fF at 1.2 V joined to 10 fF at 0 V: 36 fC over 40 fF = 0.9 V, a 0.3 V droop (common practice).
        var sharing = ChargeSharing.Of(30.Femtofarads(), 10.Femtofarads(), 1.2.Volts());
        Assert.Equal(0.9, sharing.Settled.Volts, 1e-12);
        Assert.Equal("300 mV", sharing.Droop.ToString());
    }

    [Theory]
    [InlineData(30.0, 10.0, 1.2, 5.0)]
    [InlineData(4.0, 4.5, 1.2, 5.0)]
    public void MatchesTimeSteppingTwoCapacitorsThroughTheirPassDevice(double c1Femto, double c2Femto, double volts, double kiloohms)
    {
        var c1 = c1Femto * 1e-15;
        var c2 = c2Femto * 1e-15;
        var r = kiloohms * 1e3;
        var tau = r * c1 * c2 / (c1 + c2);
        var dt = tau / 1000;
        double v1 = volts, v2 = 0;
        for (var t = 0.0; t < 30 * tau; t += dt)
        {
            var i = (v1 - v2) / r; // forward Euler on C1·dV1/dt = −i, C2·dV2/dt = +i
            v1 -= i / c1 * dt;
            v2 += i / c2 * dt;
        }

        var sharing = ChargeSharing.Of(new Capacitance(c1), new Capacitance(c2), new Voltage(volts));
        Assert.Equal(sharing.Settled.Volts, v1, 1e-6);
        Assert.Equal(sharing.Settled.Volts, v2, 1e-6);
    }

    [Fact]
    public void BadInputIsRejectedWithTheArgumentAndValue()
    {
        var error = Assert.Throws<ArgumentException>(() => ChargeSharing.Of((-1).Femtofarads(), 1.Femtofarads(), 1.Volts()));
        Assert.Equal("charged", error.ParamName);
        Assert.Contains("-1 fF", error.Message);
    }
}
