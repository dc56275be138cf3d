using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (clock gate's enable can change while the gate passes the clock, PW1004). The buoy's burst recorder runs
/// its sample clock only while a burst is armed, but takes the gate's enable straight from a register: the register's
/// slave opens on the rising edge, exactly when the gate starts to pass the clock, so the burst clock can get a
/// clipped first pulse. Figures are invented for this demo.
/// </summary>
public sealed class BurstGate : Design
{
    protected override void Describe(Circuit c) => Build(c, latched: false);

    /// <summary>The arming register, the gate and a static register on the burst clock that records the wave height.</summary>
    internal static void Build(Circuit c, bool latched)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var sample = c.Clock("sample", 10.Nanoseconds());
        var armed = c.StaticRegister(c.Input("burst_request"), sample, "burst_armed");
        var enable = latched ? c.Inverter(c.StaticLatch(armed, sample.Low, "burst_enable_latch"), "burst_enable") : armed;
        var burst = c.ClockGate(sample, enable, name: "burst");
        c.Output("burst_height", c.StaticRegister(c.Input("wave_height"), burst, "burst_record"));
    }
}

/// <summary>The fix: the enable is latched while the sample clock is low, when the gate blocks it, so it holds still
/// while the gate passes the clock.</summary>
public sealed class BurstGateLatched : Design
{
    protected override void Describe(Circuit c) => BurstGate.Build(c, latched: true);
}
