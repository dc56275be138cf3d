using Phaseward.Tests.Support;

namespace Phaseward.Tests.Units;

public class UnitArithmeticTests
{
    [Fact]
    public void Same_unit_arithmetic()
    {
        var a = 3.Nanoseconds();
        var b = 1.Nanoseconds();

        Figures.Close(4e-9, (a + b).Seconds);
        Figures.Close(2e-9, (a - b).Seconds);
        Figures.Close(-3e-9, (-a).Seconds);
        Figures.Close(6e-9, (a * 2).Seconds);
        Figures.Close(6e-9, (2 * a).Seconds);
        Figures.Close(1.5e-9, (a / 2).Seconds);
        Figures.Close(3, a / b);
    }

    [Fact]
    public void Comparisons_equality_and_ordering()
    {
        var small = 2.Kiloohms();
        var large = 5.Kiloohms();

        Assert.True(small < large);
        Assert.True(large > small);
        Assert.True(small <= 2.Kiloohms());
        Assert.True(large >= 5.Kiloohms());
        Assert.True(small == 2000.Ohms());
        Assert.True(small != large);
        Assert.True(small.Equals((object)2.Kiloohms()));
        Assert.False(small.Equals((object)2.Kilohertz()));
        Assert.Equal(2.Kiloohms().GetHashCode(), small.GetHashCode());
        Assert.Equal(-1, small.CompareTo(large));
        Assert.Equal(small, Resistance.Min(small, large));
        Assert.Equal(large, Resistance.Max(small, large));
    }

    [Fact]
    public void Arithmetic_of_the_other_quantities()
    {
        Figures.Close(3e-15, (1.Femtofarads() + 2.Femtofarads()).Farads);
        Figures.Close(4e-12, (5.Picoamperes() - 1.Picoamperes()).Amperes);
        Figures.Close(0.6, (0.3.Volts() * 2).Volts);
        Figures.Close(2, 1.Gigahertz() / 500.Megahertz());
        Assert.True(1.Femtofarads() < 2.Femtofarads());
        Assert.Equal(1.Volts(), Voltage.Max(1.Volts(), 0.5.Volts()));
        Assert.Equal(1.Picoamperes(), Current.Min(1.Picoamperes(), 2.Picoamperes()));
    }

    [Fact]
    public void Ohms_times_farads_is_seconds()
    {
        // 1 Ω·F = 1 (V/A)·(C/V) = 1 C/A = 1 s (BIPM, "The International System of Units (SI)", 9th ed., 2019, Table 4).
        // 8 kΩ x 2 fF = 16e-12 s.
        Time tau = 8.Kiloohms() * 2.Femtofarads();
        Time same = 2.Femtofarads() * 8.Kiloohms();

        Figures.Close(16e-12, tau.Seconds);
        Assert.Equal(tau, same);
    }

    [Fact]
    public void Capacitance_times_voltage_over_current_is_time()
    {
        // Q = C·V (the farad is C/V) and t = Q/I (the ampere is C/s) (SI Brochure, 9th ed., Tables 2 and 4).
        // 2 fF x 0.3 V = 0.6 fC; 0.6 fC / 5 pA = 1.2e-4 s.
        Charge charge = 2.Femtofarads() * 0.3.Volts();
        Time droopTime = charge / 5.Picoamperes();

        Figures.Close(0.6e-15, charge.Coulombs);
        Figures.Close(0.6e-15, (0.3.Volts() * 2.Femtofarads()).Coulombs);
        Figures.Close(1.2e-4, droopTime.Seconds);
    }

    [Fact]
    public void Period_and_frequency_are_reciprocal()
    {
        Figures.Close(1e9, 1.Nanoseconds().ToFrequency().Hertz);
        Figures.Close(4e-9, 250.Megahertz().ToPeriod().Seconds);
    }

    [Fact]
    public void IsFinite_flags_nan_and_infinity()
    {
        Assert.True(1.Nanoseconds().IsFinite);
        Assert.False(new Time(double.NaN).IsFinite);
        Assert.False(new Resistance(double.PositiveInfinity).IsFinite);
        Assert.False(new Capacitance(double.NegativeInfinity).IsFinite);
    }
}
