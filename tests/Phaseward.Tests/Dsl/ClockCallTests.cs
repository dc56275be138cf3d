using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.Dsl;

public class ClockCallTests
{
    [Fact]
    public void Clock_with_defaults_is_a_free_running_root_with_half_duty_and_the_process_skew()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());

        Assert.Equal("clk", clk.Name);
        Assert.Equal(ClockKind.Root, clk.Kind);
        Assert.Equal(2.Nanoseconds(), clk.Period);
        Assert.Equal(0.5, clk.Duty);
        Assert.Equal(c.Process.ComplementSkew, clk.ComplementSkew);
        Assert.Null(clk.Source);
        Assert.Same(clk, clk.Root);
        Assert.Equal(Time.Zero, clk.Delay);
        Assert.Equal(Time.Zero, clk.DelayFromRoot);
        Assert.Null(clk.Enable);
        Assert.Null(clk.MaxIdle);
        Assert.False(clk.CanStop);
        Assert.Equal(0, clk.Id);
    }

    [Fact]
    public void Clock_frequency_is_the_inverse_of_its_period()
    {
        var clk = new Circuit("clocks").Clock("clk", 4.Nanoseconds());

        Figures.Close(250e6, clk.Frequency.Hertz); // f = 1/T (definition of the hertz, SI Brochure 9th ed., Table 4)
    }

    [Fact]
    public void Clock_takes_an_explicit_duty_and_complement_skew()
    {
        var clk = new Circuit("clocks").Clock("clk", 1.Nanoseconds(), duty: 0.25, complementSkew: 10.Picoseconds());

        Assert.Equal(0.25, clk.Duty);
        Assert.Equal(10.Picoseconds(), clk.ComplementSkew);
    }

    [Fact]
    public void Clock_without_its_own_skew_follows_the_process_set_later()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.UseProcess(new Process { ComplementSkew = 12.Picoseconds() });

        Assert.Equal(12.Picoseconds(), clk.ComplementSkew);
    }

    [Fact]
    public void Clock_phases_are_high_and_low_and_complement_each_other()
    {
        var clk = new Circuit("clocks").Clock("clk", 1.Nanoseconds());

        Assert.Same(clk, clk.High.Clock);
        Assert.Same(clk, clk.Low.Clock);
        Assert.Equal(ClockPolarity.High, clk.High.Polarity);
        Assert.Equal(ClockPolarity.Low, clk.Low.Polarity);
        Assert.Same(clk.Low, clk.High.Complement);
        Assert.Same(clk.High, clk.Low.Complement);
        Assert.Same(clk.High, clk[ClockPolarity.High]);
        Assert.Same(clk.Low, clk[ClockPolarity.Low]);
        Assert.Equal("clk.High", clk.High.Name);
        Assert.Equal("clk.Low", clk.Low.Name);
    }

    [Fact]
    public void ClockGate_with_defaults_copies_its_source_stops_low_and_is_unbounded()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds(), duty: 0.4, complementSkew: 15.Picoseconds());
        var enable = c.Input("en");

        var gated = c.ClockGate(clk, enable);

        Assert.Equal("clk.gated1", gated.Name);
        Assert.Equal(ClockKind.Gated, gated.Kind);
        Assert.Same(clk, gated.Source);
        Assert.Same(clk, gated.Root);
        Assert.Same(enable, gated.Enable);
        Assert.Equal(ClockStopLevel.Low, gated.StopLevel);
        Assert.Null(gated.MaxIdle);
        Assert.Equal(clk.Period, gated.Period);
        Assert.Equal(clk.Duty, gated.Duty);
        Assert.Equal(15.Picoseconds(), gated.ComplementSkew);
        Assert.Equal(Time.Zero, gated.Delay);
        Assert.True(gated.CanStop);
    }

    [Fact]
    public void ClockGate_takes_a_stop_level_a_maximum_idle_time_and_a_name()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());
        var gated = c.ClockGate(clk, c.Input("en"), stopsAt: ClockStopLevel.High, maxIdle: 5.Microseconds(), name: "sampler");

        Assert.Equal("sampler", gated.Name);
        Assert.Equal(ClockStopLevel.High, gated.StopLevel);
        Assert.Equal(5.Microseconds(), gated.MaxIdle);
    }

    [Fact]
    public void ClockGate_auto_names_count_up_per_source_clock()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());
        var en = c.Input("en");

        Assert.Equal("clk.gated1", c.ClockGate(clk, en).Name);
        Assert.Equal("clk.gated2", c.ClockGate(clk, en).Name);
    }

    [Fact]
    public void Clock_auto_names_take_the_lowest_free_number_around_names_the_designer_chose()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());
        var en = c.Input("en");
        c.ClockGate(clk, en, name: "clk.gated2");
        c.BufferedClock(clk, name: "clk.buf1");

        Assert.Equal("clk.gated1", c.ClockGate(clk, en).Name);
        Assert.Equal("clk.gated3", c.ClockGate(clk, en).Name);
        c.ClockGate(clk, en, name: "clk.gated4");
        Assert.Equal("clk.gated5", c.ClockGate(clk, en).Name);
        Assert.Equal("clk.buf2", c.BufferedClock(clk).Name);
        Assert.Equal("clk.gated6", c.ClockGate(clk, en).Name);
    }

    [Fact]
    public void BufferedClock_delay_defaults_to_the_process_stage_delay()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());

        var buffered = c.BufferedClock(clk);

        Assert.Equal("clk.buf1", buffered.Name);
        Assert.Equal(ClockKind.Buffered, buffered.Kind);
        Assert.Same(clk, buffered.Source);
        Assert.Equal(c.Process.StageDelay, buffered.Delay);
        Assert.Equal(clk.Period, buffered.Period);
        Assert.False(buffered.CanStop);
    }

    [Fact]
    public void BufferedClock_default_delay_follows_the_process_set_later()
    {
        // UseProcess applies "for the whole design (whenever it is called)".
        var c = new Circuit("clocks");
        var buffered = c.BufferedClock(c.Clock("clk", 2.Nanoseconds()));
        c.UseProcess(new Process { StageDelay = 35.Picoseconds() });

        Assert.Equal(35.Picoseconds(), buffered.Delay);
        Assert.Contains("delay=35 ps", NetlistText.Write(c.ToNetlist(), includeSpans: false), System.StringComparison.Ordinal);
    }

    [Fact]
    public void BufferedClock_takes_an_explicit_delay_and_name_and_delays_add_up_from_the_root()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());
        var first = c.BufferedClock(clk, delay: 40.Picoseconds(), name: "tree.a");
        var gated = c.ClockGate(first, c.Input("en"));
        var second = c.BufferedClock(gated, delay: 25.Picoseconds());

        Assert.Equal("tree.a", first.Name);
        Assert.Equal(40.Picoseconds(), first.Delay);
        Figures.Close(65.Picoseconds(), second.DelayFromRoot);
        Assert.Same(clk, second.Root);
        Assert.True(second.CanStop);
    }

    [Fact]
    public void BufferedClock_accepts_a_zero_delay()
    {
        var c = new Circuit("clocks");
        var buffered = c.BufferedClock(c.Clock("clk", 2.Nanoseconds()), delay: Time.Zero);

        Assert.Equal(Time.Zero, buffered.Delay);
    }

    [Fact]
    public void Netlist_lists_clocks_in_order_of_declaration()
    {
        var c = new Circuit("clocks");
        var clk = c.Clock("clk", 2.Nanoseconds());
        var gated = c.ClockGate(clk, c.Input("en"));
        var other = c.Clock("aux", 3.Nanoseconds());

        Assert.Equal(new[] { clk, gated, other }, c.ToNetlist().Clocks);
        Assert.Equal(new[] { 0, 1, 2 }, new[] { clk.Id, gated.Id, other.Id });
    }
}
