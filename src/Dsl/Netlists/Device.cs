namespace Phaseward.Netlists;

/// <summary>A primitive: a restoring stage or a pass device, with its connections and where it was written.</summary>
/// <remarks>
/// A large design holds millions of these, so the fields are kept few and small: the inputs live in the device
/// (<see cref="DeviceInputs"/>), the kind is one byte and a resistance set in the design is a number (NaN: none).
/// </remarks>
public sealed class Device
{
    private readonly string? nameInCell;
    private readonly double resistanceOhms;
    private readonly byte kind;
    private string? name;

    /// <summary>A device named <paramref name="name"/>, or, when that is null, a part of a cell named
    /// <paramref name="nameInCell"/> inside it.</summary>
    internal Device(int id, string? name, DeviceKind kind, DeviceInputs inputs, Net output, Phase? clockControl,
        Net? dataControl, Resistance? resistance, bool isWeak, SourceSpan span, MacroInstance? macro, string? role, string? nameInCell = null)
    {
        if (name is null && (macro is null || nameInCell is null))
            throw new System.ArgumentException("A device needs a name, or a cell and its name inside the cell.", nameof(name));
        Id = id;
        this.name = name;
        this.nameInCell = nameInCell;
        this.kind = (byte)kind;
        Inputs = inputs;
        Output = output;
        ClockControl = clockControl;
        DataControl = dataControl;
        resistanceOhms = resistance is { } r ? r.Ohms : double.NaN;
        IsWeak = isWeak;
        Span = span;
        Macro = macro;
        Role = role;
    }

    /// <summary>The device's number in the netlist, in order of creation.</summary>
    public int Id { get; }

    /// <summary>The device's name; a cell's parts are named "cell.part", composed when first asked for (a large
    /// design then does not hold a string per part that nobody reads).</summary>
    public string Name => name ??= Macro!.Name + "." + nameInCell;

    /// <summary>What kind of primitive this is.</summary>
    public DeviceKind Kind => (DeviceKind)kind;

    /// <summary>Data inputs (one for inverters, buffers and pass gates; two for NAND and NOR).</summary>
    public DeviceInputs Inputs { get; }

    /// <summary>The net the device drives.</summary>
    public Net Output { get; }

    /// <summary>The clock phase a pass gate conducts in (null for data-controlled gates and restoring stages).</summary>
    public Phase? ClockControl { get; }

    /// <summary>The net that controls a data-controlled pass gate (it conducts while the net is high).</summary>
    public Net? DataControl { get; }

    /// <summary>An on-resistance set in the design for this device (null: the process figure applies).</summary>
    public Resistance? ResistanceOverride => double.IsNaN(resistanceOhms) ? null : new Resistance(resistanceOhms);

    /// <summary>A deliberately weak driver (a keeper's feedback stage).</summary>
    public bool IsWeak { get; }

    /// <summary>Where the device was written (the macro call for a macro's devices).</summary>
    public SourceSpan Span { get; }

    /// <summary>The library cell this device belongs to (null when written as a primitive).</summary>
    public MacroInstance? Macro { get; }

    /// <summary>The device's role inside its cell ("pass", "inverter", "feedback-inverter", "feedback-pass", ...).</summary>
    public string? Role { get; }

    /// <summary>True for stages that drive their output from the rails (inverter, buffer, NAND, NOR).</summary>
    public bool IsRestoring => Kind.IsRestoring();

    /// <summary>True for transmission gates.</summary>
    public bool IsPassDevice => Kind == DeviceKind.TransmissionGate;

    /// <inheritdoc/>
    public override string ToString() => $"{Kind} {Name}";
}
