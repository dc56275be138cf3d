using Phaseward;

namespace Tidewater
{
    /// <summary>
    /// Clean design. The buoy's pressure transducer is sampled by a comparator whose decision is captured in a
    /// two-phase latch pipeline (alternating phases, every latch followed by its restoring inverter) and handed to the
    /// telemetry packer through a static register. Figures are invented for this demo.
    /// </summary>
    public sealed class PressureSampler : Design
    {
        protected override void Describe(Circuit c)
        {
            c.UseProcess(TidewaterProcess.Figures());
            var sample = c.Clock("sample", 4.Nanoseconds());
            var decision = c.Input("comparator");

            var first = c.StaticLatch(decision, sample.High, "capture");
            var second = c.StaticLatch(first, sample.Low, "hold");
            var packed = c.StaticRegister(c.Inverter(second), sample, "packer");

            c.Output("telemetry_bit", packed);
        }
    }
}
