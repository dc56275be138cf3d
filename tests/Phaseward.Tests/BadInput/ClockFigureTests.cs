using Phaseward.Tests.Support;

namespace Phaseward.Tests.BadInput;

public class ClockFigureTests
{
    private readonly Populated p = new();

    private void Refused(System.Action call, string parameter, params string[] fragments)
        => Rejection.Argument(p.Circuit, call, parameter, fragments);

    [Theory]
    [InlineData(0.0, "0 s")]
    [InlineData(-1e-9, "-1 ns")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    [InlineData(double.NegativeInfinity, "-Infinity")]
    public void Period_must_be_positive_and_finite(double seconds, string shown)
        => Refused(() => p.Circuit.Clock("fast", new Time(seconds)), "period", "(was " + shown + ")");

    [Theory]
    [InlineData(0.0, "0")]
    [InlineData(1.0, "1")]
    [InlineData(-0.25, "-0.25")]
    [InlineData(1.5, "1.5")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Duty_must_lie_strictly_between_zero_and_one(double duty, string shown)
        => Refused(() => p.Circuit.Clock("fast", 1.Nanoseconds(), duty), "duty", "(was " + shown + ")");

    [Theory]
    [InlineData(-1e-12, "-1 ps")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Complement_skew_must_be_zero_or_positive_and_finite(double seconds, string shown)
        => Refused(() => p.Circuit.Clock("fast", 1.Nanoseconds(), complementSkew: new Time(seconds)), "complementSkew", "(was " + shown + ")");

    [Theory]
    [InlineData(0.25, 250)]  // the high phase (250 ps) is the shorter one
    [InlineData(0.75, 250)]  // the low phase (250 ps) is the shorter one
    [InlineData(0.5, 500)]
    public void Complement_skew_must_be_shorter_than_the_shorter_phase(double duty, int shorterPhasePicoseconds)
    {
        var phase = shorterPhasePicoseconds.Picoseconds();
        Refused(() => p.Circuit.Clock("fast", 1.Nanoseconds(), duty, phase), "complementSkew", "(" + phase + ")");
        Refused(() => p.Circuit.Clock("fast", 1.Nanoseconds(), duty, phase + 1.Picoseconds()), "complementSkew");

        var accepted = p.Circuit.Clock("fast", 1.Nanoseconds(), duty, phase - 1.Picoseconds());
        Assert.Equal(phase - 1.Picoseconds(), accepted.ComplementSkew);
    }

    [Fact]
    public void Zero_complement_skew_is_accepted()
        => Assert.Equal(Time.Zero, p.Circuit.Clock("ideal", 1.Nanoseconds(), complementSkew: Time.Zero).ComplementSkew);

    [Theory]
    [InlineData(0.0, "0 s")]
    [InlineData(-1e-6, "-1 µs")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Clock_gate_maximum_idle_must_be_positive_and_finite(double seconds, string shown)
        => Refused(() => p.Circuit.ClockGate(p.Clk, p.Enable, maxIdle: new Time(seconds)), "maxIdle", "(was " + shown + ")");

    [Theory]
    [InlineData(2)]
    [InlineData(-1)]
    [InlineData(int.MaxValue)]
    public void Clock_gate_stop_level_must_be_a_defined_value(int level)
        => Refused(() => p.Circuit.ClockGate(p.Clk, p.Enable, (ClockStopLevel)level), "stopsAt", "(was " + level + ")");

    [Theory]
    [InlineData(-1e-12, "-1 ps")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Buffered_clock_delay_must_be_zero_or_positive_and_finite(double seconds, string shown)
        => Refused(() => p.Circuit.BufferedClock(p.Clk, new Time(seconds)), "delay", "(was " + shown + ")");
}
