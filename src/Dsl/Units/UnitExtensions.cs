namespace Phaseward;

/// <summary>Unit literals on numbers: <c>1.Nanoseconds()</c>, <c>8.Kiloohms()</c>, <c>2.5.Femtofarads()</c>.</summary>
public static class UnitExtensions
{
    /// <summary><paramref name="value"/> seconds, as a <see cref="Time"/>.</summary>
    public static Time Seconds(this double value) => new(value);
    /// <summary><paramref name="value"/> seconds, as a <see cref="Time"/>.</summary>
    public static Time Seconds(this int value) => new((double)value);
    /// <summary><paramref name="value"/> milliseconds, as a <see cref="Time"/>.</summary>
    public static Time Milliseconds(this double value) => new(value / 1e3);
    /// <summary><paramref name="value"/> milliseconds, as a <see cref="Time"/>.</summary>
    public static Time Milliseconds(this int value) => new(value / 1e3);
    /// <summary><paramref name="value"/> microseconds, as a <see cref="Time"/>.</summary>
    public static Time Microseconds(this double value) => new(value / 1e6);
    /// <summary><paramref name="value"/> microseconds, as a <see cref="Time"/>.</summary>
    public static Time Microseconds(this int value) => new(value / 1e6);
    /// <summary><paramref name="value"/> nanoseconds, as a <see cref="Time"/>.</summary>
    public static Time Nanoseconds(this double value) => new(value / 1e9);
    /// <summary><paramref name="value"/> nanoseconds, as a <see cref="Time"/>.</summary>
    public static Time Nanoseconds(this int value) => new(value / 1e9);
    /// <summary><paramref name="value"/> picoseconds, as a <see cref="Time"/>.</summary>
    public static Time Picoseconds(this double value) => new(value / 1e12);
    /// <summary><paramref name="value"/> picoseconds, as a <see cref="Time"/>.</summary>
    public static Time Picoseconds(this int value) => new(value / 1e12);
    /// <summary><paramref name="value"/> femtoseconds, as a <see cref="Time"/>.</summary>
    public static Time Femtoseconds(this double value) => new(value / 1e15);
    /// <summary><paramref name="value"/> femtoseconds, as a <see cref="Time"/>.</summary>
    public static Time Femtoseconds(this int value) => new(value / 1e15);

    /// <summary><paramref name="value"/> ohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Ohms(this double value) => new(value);
    /// <summary><paramref name="value"/> ohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Ohms(this int value) => new((double)value);
    /// <summary><paramref name="value"/> kiloohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Kiloohms(this double value) => new(value * 1e3);
    /// <summary><paramref name="value"/> kiloohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Kiloohms(this int value) => new(value * 1e3);
    /// <summary><paramref name="value"/> megaohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Megaohms(this double value) => new(value * 1e6);
    /// <summary><paramref name="value"/> megaohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Megaohms(this int value) => new(value * 1e6);
    /// <summary><paramref name="value"/> gigaohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Gigaohms(this double value) => new(value * 1e9);
    /// <summary><paramref name="value"/> gigaohms, as a <see cref="Resistance"/>.</summary>
    public static Resistance Gigaohms(this int value) => new(value * 1e9);

    /// <summary><paramref name="value"/> farads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Farads(this double value) => new(value);
    /// <summary><paramref name="value"/> farads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Farads(this int value) => new((double)value);
    /// <summary><paramref name="value"/> picofarads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Picofarads(this double value) => new(value / 1e12);
    /// <summary><paramref name="value"/> picofarads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Picofarads(this int value) => new(value / 1e12);
    /// <summary><paramref name="value"/> femtofarads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Femtofarads(this double value) => new(value / 1e15);
    /// <summary><paramref name="value"/> femtofarads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Femtofarads(this int value) => new(value / 1e15);
    /// <summary><paramref name="value"/> attofarads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Attofarads(this double value) => new(value / 1e18);
    /// <summary><paramref name="value"/> attofarads, as a <see cref="Capacitance"/>.</summary>
    public static Capacitance Attofarads(this int value) => new(value / 1e18);

    /// <summary><paramref name="value"/> amperes, as a <see cref="Current"/>.</summary>
    public static Current Amperes(this double value) => new(value);
    /// <summary><paramref name="value"/> amperes, as a <see cref="Current"/>.</summary>
    public static Current Amperes(this int value) => new((double)value);
    /// <summary><paramref name="value"/> milliamperes, as a <see cref="Current"/>.</summary>
    public static Current Milliamperes(this double value) => new(value / 1e3);
    /// <summary><paramref name="value"/> milliamperes, as a <see cref="Current"/>.</summary>
    public static Current Milliamperes(this int value) => new(value / 1e3);
    /// <summary><paramref name="value"/> microamperes, as a <see cref="Current"/>.</summary>
    public static Current Microamperes(this double value) => new(value / 1e6);
    /// <summary><paramref name="value"/> microamperes, as a <see cref="Current"/>.</summary>
    public static Current Microamperes(this int value) => new(value / 1e6);
    /// <summary><paramref name="value"/> nanoamperes, as a <see cref="Current"/>.</summary>
    public static Current Nanoamperes(this double value) => new(value / 1e9);
    /// <summary><paramref name="value"/> nanoamperes, as a <see cref="Current"/>.</summary>
    public static Current Nanoamperes(this int value) => new(value / 1e9);
    /// <summary><paramref name="value"/> picoamperes, as a <see cref="Current"/>.</summary>
    public static Current Picoamperes(this double value) => new(value / 1e12);
    /// <summary><paramref name="value"/> picoamperes, as a <see cref="Current"/>.</summary>
    public static Current Picoamperes(this int value) => new(value / 1e12);
    /// <summary><paramref name="value"/> femtoamperes, as a <see cref="Current"/>.</summary>
    public static Current Femtoamperes(this double value) => new(value / 1e15);
    /// <summary><paramref name="value"/> femtoamperes, as a <see cref="Current"/>.</summary>
    public static Current Femtoamperes(this int value) => new(value / 1e15);

    /// <summary><paramref name="value"/> volts, as a <see cref="Voltage"/>.</summary>
    public static Voltage Volts(this double value) => new(value);
    /// <summary><paramref name="value"/> volts, as a <see cref="Voltage"/>.</summary>
    public static Voltage Volts(this int value) => new((double)value);
    /// <summary><paramref name="value"/> millivolts, as a <see cref="Voltage"/>.</summary>
    public static Voltage Millivolts(this double value) => new(value / 1e3);
    /// <summary><paramref name="value"/> millivolts, as a <see cref="Voltage"/>.</summary>
    public static Voltage Millivolts(this int value) => new(value / 1e3);

    /// <summary><paramref name="value"/> hertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Hertz(this double value) => new(value);
    /// <summary><paramref name="value"/> hertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Hertz(this int value) => new((double)value);
    /// <summary><paramref name="value"/> kilohertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Kilohertz(this double value) => new(value * 1e3);
    /// <summary><paramref name="value"/> kilohertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Kilohertz(this int value) => new(value * 1e3);
    /// <summary><paramref name="value"/> megahertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Megahertz(this double value) => new(value * 1e6);
    /// <summary><paramref name="value"/> megahertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Megahertz(this int value) => new(value * 1e6);
    /// <summary><paramref name="value"/> gigahertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Gigahertz(this double value) => new(value * 1e9);
    /// <summary><paramref name="value"/> gigahertz, as a <see cref="Frequency"/>.</summary>
    public static Frequency Gigahertz(this int value) => new(value * 1e9);
}
