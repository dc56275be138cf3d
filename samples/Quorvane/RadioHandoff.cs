using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (data crossing between unrelated clocks, PW1003). The buoy samples wave height on its sensor clock and hands
/// each sample to the radio, which runs from its own crystal. The radio's register can sample the bit while it
/// changes and go metastable. Figures are invented.
/// </summary>
public sealed class RadioHandoff : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var sensor = c.Clock("sensor", 4.Nanoseconds());
        var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);

        var sample = c.StaticRegister(c.Input("height_bit"), sensor, "sample");
        c.Output("tx_bit", c.StaticRegister(sample, radio, "tx"));
    }
}

/// <summary>The fix (what PW1003's code fix writes): two registers of the radio clock in series where the bit arrives.</summary>
public sealed class RadioHandoffSynchronized : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var sensor = c.Clock("sensor", 4.Nanoseconds());
        var radio = c.Clock("radio", 3.Nanoseconds(), independent: true);

        var sample = c.StaticRegister(c.Input("height_bit"), sensor, "sample");
        c.Output("tx_bit", c.StaticRegister(c.StaticRegister(c.StaticRegister(sample, radio), radio), radio, "tx"));
    }
}
