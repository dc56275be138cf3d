using Phaseward.Tests.Support;

namespace Phaseward.Tests.Units;

// SI prefixes: k = 1e3, M = 1e6, G = 1e9, m = 1e-3, µ = 1e-6, n = 1e-9, p = 1e-12, f = 1e-15, a = 1e-18
// (BIPM, "The International System of Units (SI)", 9th ed., 2019, Table 7).
public class UnitLiteralTests
{
    [Fact]
    public void Time_literals_on_int_and_double()
    {
        Figures.Close(2, 2.Seconds().Seconds);
        Figures.Close(2.5, 2.5.Seconds().Seconds);
        Figures.Close(3e-3, 3.Milliseconds().Seconds);
        Figures.Close(3.5e-3, 3.5.Milliseconds().Seconds);
        Figures.Close(4e-6, 4.Microseconds().Seconds);
        Figures.Close(4.5e-6, 4.5.Microseconds().Seconds);
        Figures.Close(1e-9, 1.Nanoseconds().Seconds);
        Figures.Close(1.25e-9, 1.25.Nanoseconds().Seconds);
        Figures.Close(20e-12, 20.Picoseconds().Seconds);
        Figures.Close(20.5e-12, 20.5.Picoseconds().Seconds);
        Figures.Close(7e-15, 7.Femtoseconds().Seconds);
        Figures.Close(7.5e-15, 7.5.Femtoseconds().Seconds);
    }

    [Fact]
    public void Resistance_literals_on_int_and_double()
    {
        Figures.Close(50, 50.Ohms().Ohms);
        Figures.Close(50.5, 50.5.Ohms().Ohms);
        Figures.Close(8e3, 8.Kiloohms().Ohms);
        Figures.Close(8.2e3, 8.2.Kiloohms().Ohms);
        Figures.Close(2e6, 2.Megaohms().Ohms);
        Figures.Close(2.2e6, 2.2.Megaohms().Ohms);
        Figures.Close(1e9, 1.Gigaohms().Ohms);
        Figures.Close(1.5e9, 1.5.Gigaohms().Ohms);
    }

    [Fact]
    public void Capacitance_literals_on_int_and_double()
    {
        Figures.Close(1, 1.Farads().Farads);
        Figures.Close(0.5, 0.5.Farads().Farads);
        Figures.Close(3e-12, 3.Picofarads().Farads);
        Figures.Close(3.3e-12, 3.3.Picofarads().Farads);
        Figures.Close(2e-15, 2.Femtofarads().Farads);
        Figures.Close(1.5e-15, 1.5.Femtofarads().Farads);
        Figures.Close(400e-18, 400.Attofarads().Farads);
        Figures.Close(250.5e-18, 250.5.Attofarads().Farads);
    }

    [Fact]
    public void Current_literals_on_int_and_double()
    {
        Figures.Close(1, 1.Amperes().Amperes);
        Figures.Close(0.25, 0.25.Amperes().Amperes);
        Figures.Close(2e-3, 2.Milliamperes().Amperes);
        Figures.Close(2.5e-3, 2.5.Milliamperes().Amperes);
        Figures.Close(3e-6, 3.Microamperes().Amperes);
        Figures.Close(3.5e-6, 3.5.Microamperes().Amperes);
        Figures.Close(4e-9, 4.Nanoamperes().Amperes);
        Figures.Close(4.5e-9, 4.5.Nanoamperes().Amperes);
        Figures.Close(5e-12, 5.Picoamperes().Amperes);
        Figures.Close(5.5e-12, 5.5.Picoamperes().Amperes);
        Figures.Close(6e-15, 6.Femtoamperes().Amperes);
        Figures.Close(6.5e-15, 6.5.Femtoamperes().Amperes);
    }

    [Fact]
    public void Voltage_literals_on_int_and_double()
    {
        Figures.Close(1, 1.Volts().Volts);
        Figures.Close(1.2, 1.2.Volts().Volts);
        Figures.Close(300e-3, 300.Millivolts().Volts);
        Figures.Close(12.5e-3, 12.5.Millivolts().Volts);
    }

    [Fact]
    public void Frequency_literals_on_int_and_double()
    {
        Figures.Close(60, 60.Hertz().Hertz);
        Figures.Close(59.94, 59.94.Hertz().Hertz);
        Figures.Close(32e3, 32.Kilohertz().Hertz);
        Figures.Close(32.768e3, 32.768.Kilohertz().Hertz);
        Figures.Close(100e6, 100.Megahertz().Hertz);
        Figures.Close(12.5e6, 12.5.Megahertz().Hertz);
        Figures.Close(2e9, 2.Gigahertz().Hertz);
        Figures.Close(2.4e9, 2.4.Gigahertz().Hertz);
    }

    [Fact]
    public void Zero_values_are_the_default()
    {
        Assert.Equal(0, Time.Zero.Seconds);
        Assert.Equal(0, Resistance.Zero.Ohms);
        Assert.Equal(0, Capacitance.Zero.Farads);
        Assert.Equal(0, Current.Zero.Amperes);
        Assert.Equal(0, Voltage.Zero.Volts);
        Assert.Equal(0, Charge.Zero.Coulombs);
        Assert.Equal(0, Frequency.Zero.Hertz);
    }
}
