namespace Phaseward;

/// <summary>Unit literals on numbers: <c>1.Nanoseconds()</c>, <c>8.Kiloohms()</c>, <c>2.5.Femtofarads()</c>.</summary>
public static class UnitExtensions
{
    public static Time Seconds(this double value) => new(value);
    public static Time Seconds(this int value) => new((double)value);
    public static Time Milliseconds(this double value) => new(value / 1e3);
    public static Time Milliseconds(this int value) => new(value / 1e3);
    public static Time Microseconds(this double value) => new(value / 1e6);
    public static Time Microseconds(this int value) => new(value / 1e6);
    public static Time Nanoseconds(this double value) => new(value / 1e9);
    public static Time Nanoseconds(this int value) => new(value / 1e9);
    public static Time Picoseconds(this double value) => new(value / 1e12);
    public static Time Picoseconds(this int value) => new(value / 1e12);
    public static Time Femtoseconds(this double value) => new(value / 1e15);
    public static Time Femtoseconds(this int value) => new(value / 1e15);

    public static Resistance Ohms(this double value) => new(value);
    public static Resistance Ohms(this int value) => new((double)value);
    public static Resistance Kiloohms(this double value) => new(value * 1e3);
    public static Resistance Kiloohms(this int value) => new(value * 1e3);
    public static Resistance Megaohms(this double value) => new(value * 1e6);
    public static Resistance Megaohms(this int value) => new(value * 1e6);
    public static Resistance Gigaohms(this double value) => new(value * 1e9);
    public static Resistance Gigaohms(this int value) => new(value * 1e9);

    public static Capacitance Farads(this double value) => new(value);
    public static Capacitance Farads(this int value) => new((double)value);
    public static Capacitance Picofarads(this double value) => new(value / 1e12);
    public static Capacitance Picofarads(this int value) => new(value / 1e12);
    public static Capacitance Femtofarads(this double value) => new(value / 1e15);
    public static Capacitance Femtofarads(this int value) => new(value / 1e15);
    public static Capacitance Attofarads(this double value) => new(value / 1e18);
    public static Capacitance Attofarads(this int value) => new(value / 1e18);

    public static Current Amperes(this double value) => new(value);
    public static Current Amperes(this int value) => new((double)value);
    public static Current Milliamperes(this double value) => new(value / 1e3);
    public static Current Milliamperes(this int value) => new(value / 1e3);
    public static Current Microamperes(this double value) => new(value / 1e6);
    public static Current Microamperes(this int value) => new(value / 1e6);
    public static Current Nanoamperes(this double value) => new(value / 1e9);
    public static Current Nanoamperes(this int value) => new(value / 1e9);
    public static Current Picoamperes(this double value) => new(value / 1e12);
    public static Current Picoamperes(this int value) => new(value / 1e12);
    public static Current Femtoamperes(this double value) => new(value / 1e15);
    public static Current Femtoamperes(this int value) => new(value / 1e15);

    public static Voltage Volts(this double value) => new(value);
    public static Voltage Volts(this int value) => new((double)value);
    public static Voltage Millivolts(this double value) => new(value / 1e3);
    public static Voltage Millivolts(this int value) => new(value / 1e3);

    public static Frequency Hertz(this double value) => new(value);
    public static Frequency Hertz(this int value) => new((double)value);
    public static Frequency Kilohertz(this double value) => new(value * 1e3);
    public static Frequency Kilohertz(this int value) => new(value * 1e3);
    public static Frequency Megahertz(this double value) => new(value * 1e6);
    public static Frequency Megahertz(this int value) => new(value * 1e6);
    public static Frequency Gigahertz(this double value) => new(value * 1e9);
    public static Frequency Gigahertz(this int value) => new(value * 1e9);
}
