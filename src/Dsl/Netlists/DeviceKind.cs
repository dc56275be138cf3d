namespace Phaseward.Netlists;

/// <summary>The primitives a netlist is made of. Macros expand into these.</summary>
public enum DeviceKind
{
    /// <summary>A restoring inverter.</summary>
    Inverter,
    /// <summary>A restoring non-inverting stage.</summary>
    Buffer,
    /// <summary>A restoring two-input NAND.</summary>
    Nand,
    /// <summary>A restoring two-input NOR.</summary>
    Nor,

    /// <summary>A transmission gate, controlled by a clock phase or by a data net.</summary>
    TransmissionGate,
}

/// <summary>Facts about device kinds.</summary>
public static class DeviceKindExtensions
{
    /// <summary>A restoring stage drives its output from the supply rails.</summary>
    public static bool IsRestoring(this DeviceKind kind) => kind != DeviceKind.TransmissionGate;

    /// <summary>A restoring stage whose output is the inverse of its input(s).</summary>
    public static bool IsInverting(this DeviceKind kind) => kind is DeviceKind.Inverter or DeviceKind.Nand or DeviceKind.Nor;
}
