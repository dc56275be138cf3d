using Phaseward;

namespace Quorvane;

/// <summary>
/// Clean design. The buoy's pressure transducer is sampled by a comparator whose decision is captured in a
/// two-phase latch pipeline (alternating phases, every latch followed by its restoring inverter); the captured bit
/// also goes to the telemetry packer through a static register, whose master opens on the phase the capture latch
/// is closed in. Figures are invented for this demo.
/// </summary>
public sealed class PressureSampler : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var sample = c.Clock("sample", 4.Nanoseconds());
        var decision = c.Input("comparator");

        var first = c.StaticLatch(decision, sample.High, "capture");
        var second = c.StaticLatch(first, sample.Low, "hold");
        var packed = c.StaticRegister(c.Inverter(first), sample, "packer");

        c.Output("pressure_bit", second);
        c.Output("telemetry_bit", packed);
    }
}
