namespace Phaseward.Tests.Units;

/// <summary>Durations as configuration files write them (SI prefixes: common practice).</summary>
public class DurationParsingTests
{
    [Theory]
    [InlineData("5ps", 5e-12)]
    [InlineData(" 0.2 ns ", 0.2e-9)]
    [InlineData("1us", 1e-6)]
    [InlineData("1µs", 1e-6)]
    [InlineData("3ms", 3e-3)]
    [InlineData("2s", 2.0)]
    [InlineData("7fs", 7e-15)]
    [InlineData("0ps", 0.0)]
    [InlineData("1e1PS", 10e-12)]
    public void Reads_a_number_with_its_unit(string text, double seconds)
    {
        Assert.True(Time.TryParseDuration(text, out var value));
        Assert.Equal(seconds, value.Seconds, seconds * 1e-12 + 1e-30);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("5")]
    [InlineData("soon")]
    [InlineData("-5ps")]
    [InlineData("5 hours")]
    [InlineData("infinityns")]
    public void Refuses_anything_else(string? text)
    {
        Assert.False(Time.TryParseDuration(text, out var value));
        Assert.Equal(Time.Zero, value);
    }
}
