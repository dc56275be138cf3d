using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (keeper too strong for its write path, PW3005). The mooring-strain selector keeps the picked gauge's bit
/// on a kept node; the keeper was made strong to ride out a noisy supply, and now the pass-gate mux that writes the
/// node cannot flip it: writing against the keeper stops short of the switching point. Figures are invented.
/// </summary>
public sealed class MooringHold : Design
{
    protected override void Describe(Circuit c) => Build(c, keeper: 6.Kiloohms());

    /// <summary>Two gauges picked by a select and its inverse, onto one kept node.</summary>
    internal static void Build(Circuit c, Resistance keeper)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var pick = c.Input("pick_stern");
        var held = c.Node("strain_held");
        c.TransmissionGate(c.Input("bow_strain"), c.Inverter(pick, "pick_bow"), held);
        c.TransmissionGate(c.Input("stern_strain"), pick, held);
        c.Keeper(held, "strain_keeper", keeper);
        c.Output("strain_bit", c.Inverter(held, "strain_bit"));
    }
}

/// <summary>The fix: a keeper weaker than the write path by the margin (at least 1.5 × its 7 kΩ).</summary>
public sealed class MooringHoldWeakKeeper : Design
{
    protected override void Describe(Circuit c) => MooringHold.Build(c, keeper: 40.Kiloohms());
}
