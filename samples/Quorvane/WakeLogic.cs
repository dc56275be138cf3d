using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (feedback loop with no storage, PW1005). The buoy's wake-up logic "holds" its wake request by feeding the
/// NAND's output back to its own input through two inverters: three inversions and no latch, so once the request
/// arrives the loop oscillates instead of holding. Figures are invented for this demo.
/// </summary>
public sealed class WakeLogic : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var held = c.Node("wake_held");
        var wake = c.Nand(c.Input("wake_request"), held, "wake");
        c.Inverter(c.Inverter(wake, "wake_sense"), held);
        c.Output("wake_out", wake);
    }
}

/// <summary>The fix: a register on the sampling clock holds the wake state from one cycle to the next.</summary>
public sealed class WakeLogicRegistered : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var sample = c.Clock("sample", 10.Nanoseconds());
        var held = c.Node("wake_held");
        var wake = c.Nand(c.Input("wake_request"), held, "wake");
        c.Inverter(c.StaticRegister(wake, sample, "wake_state"), held);
        c.Output("wake_out", wake);
    }
}
