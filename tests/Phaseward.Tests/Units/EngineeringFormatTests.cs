namespace Phaseward.Tests.Units;

// Engineering notation: exponent a multiple of three, shown with its SI prefix (BIPM, "The International System of
// Units (SI)", 9th ed., 2019, Table 7), here to three significant digits.
public class EngineeringFormatTests
{
    [Theory]
    [InlineData(1.25e-9, "s", "1.25 ns")]
    [InlineData(8e3, "Ω", "8 kΩ")]
    [InlineData(2e-15, "F", "2 fF")]
    [InlineData(4.7e-6, "s", "4.7 µs")]
    [InlineData(1.2, "V", "1.2 V")]
    [InlineData(12345, "Ω", "12.3 kΩ")]
    [InlineData(123.456e-12, "s", "123 ps")]
    [InlineData(0.5e-18, "F", "0.5 aF")]
    [InlineData(2.5e9, "Hz", "2.5 GHz")]
    [InlineData(1e-3, "A", "1 mA")]
    public void Picks_the_prefix_and_three_significant_digits(double value, string unit, string expected)
        => Assert.Equal(expected, Engineering.Format(value, unit));

    [Theory]
    [InlineData(999.7, "Ω", "1 kΩ")]
    [InlineData(999.96e-12, "s", "1 ns")]
    [InlineData(-999.7e-15, "F", "-1 pF")]
    public void Rounding_that_reaches_a_thousand_carries_into_the_next_prefix(double value, string unit, string expected)
        => Assert.Equal(expected, Engineering.Format(value, unit));

    [Fact]
    public void Zero_has_no_prefix()
        => Assert.Equal("0 s", Engineering.Format(0, "s"));

    [Fact]
    public void Negative_values_keep_their_sign_and_prefix()
    {
        Assert.Equal("-2.5 ns", Engineering.Format(-2.5e-9, "s"));
        Assert.Equal("-8 kΩ", (-8.Kiloohms()).ToString());
    }

    [Fact]
    public void Not_a_number_and_infinity_are_written_out()
    {
        Assert.Equal("NaN s", Engineering.Format(double.NaN, "s"));
        Assert.Equal("Infinity Ω", Engineering.Format(double.PositiveInfinity, "Ω"));
        Assert.Equal("-Infinity F", Engineering.Format(double.NegativeInfinity, "F"));
    }

    [Fact]
    public void Quantities_format_with_their_own_units()
    {
        Assert.Equal("1.25 ns", 1.25.Nanoseconds().ToString());
        Assert.Equal("8 kΩ", 8.Kiloohms().ToString());
        Assert.Equal("2 fF", 2.Femtofarads().ToString());
        Assert.Equal("5 pA", 5.Picoamperes().ToString());
        Assert.Equal("300 mV", 0.3.Volts().ToString());
        Assert.Equal("600 aC", (2.Femtofarads() * 0.3.Volts()).ToString());
        Assert.Equal("250 MHz", 250.Megahertz().ToString());
    }

    [Fact]
    public void Values_beyond_the_prefix_table_stay_on_its_last_prefix()
    {
        Assert.Equal("5000 TΩ", Engineering.Format(5e15, "Ω"));
        Assert.Equal("0.01 aF", Engineering.Format(1e-20, "F"));
    }

    [Fact]
    public void Two_compared_values_get_enough_digits_to_differ()
    {
        // 270.45 µs against 270.0 µs: three digits would print both as "270 µs".
        Assert.Equal(("270.5 µs", "270 µs"), Engineering.FormatApart(270.45e-6, 270e-6, "s"));
        Assert.Equal(("541 µs", "270 µs"), Engineering.FormatApart(541e-6, 270e-6, "s"));
        Assert.Equal(("1 ns", "1 ns"), Engineering.FormatApart(1e-9, 1e-9, "s"));
        Assert.Equal("1.2346 ns", Engineering.Format(1.23456e-9, "s", 5));
    }
}
