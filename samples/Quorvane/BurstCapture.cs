using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (dynamic storage on a gatable clock). Between wave bursts the buoy gates its capture clock off to save
/// battery, and nothing bounds how long it stays off; the capture latches are dynamic, so their bits leak away while
/// the clock is stopped. Figures are invented for this demo.
/// </summary>
public sealed class BurstCapture : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var capture = c.Clock("capture", 2.Nanoseconds());
        var burstEnable = c.Input("burst_enable");
        var burst = c.ClockGate(capture, burstEnable, ClockStopLevel.Low, name: "burst");

        var bit = c.Input("wave_bit");
        var held = c.DynamicLatch(bit, burst.High, "wave_hold");
        c.Output("wave_sample", c.DynamicLatch(held, burst.Low, "wave_pass"));
    }
}

/// <summary>The fix: static latches keep their bits however long the burst clock is stopped.</summary>
public sealed class BurstCaptureStatic : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var capture = c.Clock("capture", 2.Nanoseconds());
        var burstEnable = c.Input("burst_enable");
        var burst = c.ClockGate(capture, burstEnable, ClockStopLevel.Low, name: "burst");

        var bit = c.Input("wave_bit");
        var held = c.StaticLatch(bit, burst.High, "wave_hold");
        c.Output("wave_sample", c.StaticLatch(held, burst.Low, "wave_pass"));
    }
}
