using Phaseward.Internal;

namespace Phaseward;

/// <summary>
/// The electrical figures of a fabrication process that the rules need. Set the ones you know with an
/// object initializer: <c>c.UseProcess(new Process { PassGateResistance = 6.Kiloohms() })</c>; the others keep
/// their defaults.
/// </summary>
/// <remarks>
/// The defaults are INVENTED, ILLUSTRATIVE values (of the right order for a generic deep-submicron process),
/// chosen only so that designs check out of the box. They are not taken from any foundry. Replace them with your
/// process's figures before trusting any number Phaseward prints.
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
    private readonly Current storageLeakage = 5.Picoamperes();
    private readonly Voltage supply = 1.2.Volts();
    private readonly Voltage toleratedDroop = 0.3.Volts();
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

    /// <summary>Leakage current that drains a dynamic storage node (worst case: hot, fast corner).</summary>
    public Current StorageLeakage { get => storageLeakage; init => storageLeakage = new Current(Guard.Positive(value.Amperes, nameof(StorageLeakage), "A")); }

    /// <summary>Supply voltage.</summary>
    public Voltage Supply { get => supply; init => supply = new Voltage(Guard.Positive(value.Volts, nameof(Supply), "V")); }

    /// <summary>The largest droop a dynamic node may suffer and still be read correctly.</summary>
    public Voltage ToleratedDroop { get => toleratedDroop; init => toleratedDroop = new Voltage(Guard.Positive(value.Volts, nameof(ToleratedDroop), "V")); }

    /// <summary>How late a clock's complement arrives after its true phase (it opens the 1-1 and 0-0 overlaps).</summary>
    public Time ComplementSkew { get => complementSkew; init => complementSkew = new Time(Guard.NonNegative(value.Seconds, nameof(ComplementSkew), "s")); }

    /// <inheritdoc/>
    public override string ToString() => Name;

    private static Resistance PositiveOhms(Resistance value, string parameter) => new(Guard.Positive(value.Ohms, parameter, "Ω"));

    private static Capacitance NonNegativeFarads(Capacitance value, string parameter) => new(Guard.NonNegative(value.Farads, parameter, "F"));
}
