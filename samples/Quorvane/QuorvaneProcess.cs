using Phaseward;

namespace Quorvane;

/// <summary>
/// The electrical figures the Quorvane designs are checked with. INVENTED for these demos (of a plausible order
/// for a small mixed-signal process), not taken from any foundry.
/// </summary>
public static class QuorvaneProcess
{
    public static Process Figures() => new()
    {
        Name = "Quorvane demo process (invented figures)",
        PassGateResistance = 3.Kiloohms(),
        DriverResistance = 4.Kiloohms(),
        StageDelay = 40.Picoseconds(),
        StorageLeakage = 5.Picoamperes(),
        ToleratedDroop = 0.3.Volts(),
        Supply = 1.2.Volts(),
        ComplementSkew = 15.Picoseconds(),
    };
}
