using System;
using System.Globalization;
using Phaseward.Electrical;
using Phaseward.Internal;

namespace Phaseward;

/// <summary>
/// The electrical figures of a fabrication process that the rules need. Set the ones you know with an
/// object initializer: <c>c.UseProcess(new Process { PassGateResistance = 6.Kiloohms() })</c>; the others keep
/// their defaults.
/// </summary>
/// <remarks>
/// <para>The defaults are INVENTED, ILLUSTRATIVE values (of the right order for a generic deep-submicron process),
/// chosen only so that designs check out of the box. They are not taken from any foundry. Replace them with your
/// process's figures before trusting any number Phaseward prints.</para>
/// <para>Corners: the resistances and <see cref="StageDelay"/> are nominal (typical devices, nominal supply, room
/// temperature). Checks of late arrival (setup, borrowing, latch loops, write windows, clock-gate enables) scale every
/// on-resistance, hence every first-order delay, by <see cref="SlowDelayFactor"/>; checks of early arrival (races,
/// hold) by <see cref="FastDelayFactor"/>; retention uses <see cref="StorageLeakage"/>, the hot-corner leakage. The
/// invented defaults (slow ×1.3, fast ×0.75, 1 nA hot leakage) are of the order of a recent process's slow and fast
/// corners against typical (from memory), not any foundry's figures.</para>
/// </remarks>
public sealed class Process
{
    private readonly string name = "illustrative (invented defaults)";
    private readonly Resistance passGateResistance = 5.Kiloohms();
    private readonly Resistance driverResistance = 4.Kiloohms();
    private readonly Resistance keeperResistance = 40.Kiloohms();
    private readonly Capacitance gateCapacitance = 2.Femtofarads();
    private readonly Capacitance diffusionCapacitance = 1.5.Femtofarads();
    private readonly Capacitance wireCapacitance = 1.Femtofarads();
    private readonly Time stageDelay = 20.Picoseconds();
    private readonly Current storageLeakage = 1.Nanoamperes();
    private readonly double slowDelayFactor = 1.3;
    private readonly double fastDelayFactor = 0.75;
    private readonly Voltage supply = 1.2.Volts();
    private readonly Voltage? toleratedDroop;
    private readonly Time complementSkew = 30.Picoseconds();

    /// <summary>The invented, illustrative defaults (see the remarks on <see cref="Process"/>).</summary>
    public static Process Illustrative { get; } = new();

    /// <summary>A label for reports.</summary>
    public string Name { get => name; init => name = Guard.Name(value, nameof(Name)); }

    /// <summary>Effective on-resistance of a minimum transmission gate (both devices conducting).</summary>
    public Resistance PassGateResistance { get => passGateResistance; init => passGateResistance = PositiveOhms(value, nameof(PassGateResistance)); }

    /// <summary>Effective output resistance of a minimum restoring stage (inverter, NAND, NOR, buffer) and of an input driver.</summary>
    public Resistance DriverResistance { get => driverResistance; init => driverResistance = PositiveOhms(value, nameof(DriverResistance)); }

    /// <summary>Output resistance of a weak keeper (deliberately much weaker than a normal stage).</summary>
    public Resistance KeeperResistance { get => keeperResistance; init => keeperResistance = PositiveOhms(value, nameof(KeeperResistance)); }

    /// <summary>Input capacitance of one gate load (restoring-stage input, pass-gate control, clock-gate enable).</summary>
    public Capacitance GateCapacitance { get => gateCapacitance; init => gateCapacitance = NonNegativeFarads(value, nameof(GateCapacitance)); }

    /// <summary>Diffusion capacitance that each pass-gate terminal or stage output adds to its net.</summary>
    public Capacitance DiffusionCapacitance { get => diffusionCapacitance; init => diffusionCapacitance = NonNegativeFarads(value, nameof(DiffusionCapacitance)); }

    /// <summary>Wire capacitance of one net.</summary>
    public Capacitance WireCapacitance { get => wireCapacitance; init => wireCapacitance = NonNegativeFarads(value, nameof(WireCapacitance)); }

    /// <summary>Intrinsic delay of one restoring stage (the buffer delay when spacing restoring stages).</summary>
    public Time StageDelay { get => stageDelay; init => stageDelay = new Time(Guard.Positive(value.Seconds, nameof(StageDelay), "s")); }

    /// <summary>
    /// Leakage current that drains a dynamic storage node at the hot corner (high temperature, fast devices), the
    /// corner retention checks use: the off pass devices' subthreshold and junction leakage plus the gate leakage of
    /// the stage reading the node. Minimum devices of a recent process leak of the order of 0.1 to a few nA hot (from
    /// memory); the default, 1 nA, is invented.
    /// </summary>
    public Current StorageLeakage { get => storageLeakage; init => storageLeakage = new Current(Guard.Positive(value.Amperes, nameof(StorageLeakage), "A")); }

    /// <summary>Supply voltage.</summary>
    public Voltage Supply { get => supply; init => supply = new Voltage(Guard.Positive(value.Volts, nameof(Supply), "V")); }

    /// <summary>
    /// The largest droop a dynamic node may suffer and still be read correctly: one allowance per node, which charge
    /// sharing and leakage share (charge sharing spends first, leakage may take what is left). By default a quarter of
    /// <see cref="Supply"/> (<see cref="DefaultDroopFraction"/>; 0.3 V at 1.2 V: the read stage's switching point at
    /// half the supply, with half of that kept as noise margin, common practice); set an absolute value to override it.
    /// </summary>
    public Voltage ToleratedDroop { get => toleratedDroop ?? Supply * DefaultDroopFraction; init => toleratedDroop = new Voltage(Guard.Positive(value.Volts, nameof(ToleratedDroop), "V")); }

    /// <summary>The fraction of the supply a node may droop by when <see cref="ToleratedDroop"/> is not set: 0.25.</summary>
    public const double DefaultDroopFraction = 0.25;

    /// <summary>How late a clock's complement arrives after its true phase (it opens the 1-1 and 0-0 overlaps).</summary>
    public Time ComplementSkew { get => complementSkew; init => complementSkew = new Time(Guard.NonNegative(value.Seconds, nameof(ComplementSkew), "s")); }

    /// <summary>
    /// How much slower than nominal every on-resistance (hence every first-order delay) is at the slow corner (slow
    /// devices, low supply, hot): at least 1. Setup, borrowing, latch-loop, write-window and clock-gate-enable checks
    /// use it. Invented default 1.3.
    /// </summary>
    public double SlowDelayFactor { get => slowDelayFactor; init => slowDelayFactor = Factor(value, nameof(SlowDelayFactor), atLeastOne: true); }

    /// <summary>
    /// How fast against nominal every on-resistance (hence every first-order delay) is at the fast corner (fast
    /// devices, high supply, cold): more than 0 and at most 1. Race and hold checks use it. Invented default 0.75.
    /// </summary>
    public double FastDelayFactor { get => fastDelayFactor; init => fastDelayFactor = Factor(value, nameof(FastDelayFactor), atLeastOne: false); }

    /// <summary>The factor on-resistances and first-order delays take at <paramref name="corner"/> (1 for nominal).</summary>
    public double DelayFactor(Corner corner) => corner switch
    {
        Corner.Slow => SlowDelayFactor,
        Corner.Fast => FastDelayFactor,
        Corner.Nominal => 1.0,
        _ => throw new ArgumentException($"'{nameof(corner)}' must be Nominal, Slow or Fast (was {(int)corner}).", nameof(corner)),
    };

    /// <inheritdoc/>
    public override string ToString() => Name;

    // Nominal lies between the corners, so each factor is checked on its own (in whatever order an initializer sets
    // them) and the fast corner can never be slower than the slow one.
    private static double Factor(double value, string parameter, bool atLeastOne)
    {
        var text = value.ToString("R", CultureInfo.InvariantCulture);
        if (double.IsNaN(value) || double.IsInfinity(value) || value <= 0)
            throw new ArgumentException($"'{parameter}' must be a positive, finite factor (was {text}).", parameter);
        if (atLeastOne && value < 1)
            throw new ArgumentException($"'{parameter}' must be at least 1: the slow corner is not faster than nominal (was {text}).", parameter);
        if (!atLeastOne && value > 1)
            throw new ArgumentException($"'{parameter}' must be at most 1: the fast corner is not slower than nominal (was {text}).", parameter);
        return value;
    }

    private static Resistance PositiveOhms(Resistance value, string parameter) => new(Guard.Positive(value.Ohms, parameter, "Ω"));

    private static Capacitance NonNegativeFarads(Capacitance value, string parameter) => new(Guard.NonNegative(value.Farads, parameter, "F"));
}
