using System.Runtime.CompilerServices;
using Phaseward.Netlists;

namespace Phaseward;

// Restoring stages and pass gates. Each comes in two forms: one that makes a new output net (optionally named) and
// one that drives a net made earlier with Node() -- the form needed for wired pass-gate muxes and feedback loops.
public sealed partial class Circuit
{
    private static readonly string[] OneInput = { "input" };
    private static readonly string[] TwoInputs = { "a", "b" };

    /// <summary>Declares a net that is driven later (by devices given it as their <c>output</c>).</summary>
    public Net Node(string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        name = ScopedOrNull(name);
        CheckNewNetName(name, nameof(name));
        return NewNet(name ?? AutoName(Scoped("node")));
    }

    /// <summary>An inverter driven by <paramref name="input"/>; returns its new output net (named <paramref name="name"/>, or an automatic name).</summary>
    public Net Inverter(Net input, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Inverter, input, null, OneInput, null, null, name, null, null, Site(callerFile, callerLine));

    /// <summary>An inverter from <paramref name="input"/> driving <paramref name="output"/>, a net declared earlier with Node().</summary>
    public void Inverter(Net input, Net output, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Inverter, input, null, OneInput, null, null, null, Existing(output), null, Site(callerFile, callerLine));

    /// <summary>A non-inverting restoring stage (two inverters).</summary>
    public Net Buffer(Net input, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Buffer, input, null, OneInput, null, null, name, null, null, Site(callerFile, callerLine));

    /// <summary>A non-inverting restoring stage from <paramref name="input"/> driving <paramref name="output"/>, a net declared earlier with Node().</summary>
    public void Buffer(Net input, Net output, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Buffer, input, null, OneInput, null, null, null, Existing(output), null, Site(callerFile, callerLine));

    /// <summary>A two-input NAND of <paramref name="a"/> and <paramref name="b"/>; returns its new output net.</summary>
    public Net Nand(Net a, Net b, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Nand, a, b, TwoInputs, null, null, name, null, null, Site(callerFile, callerLine));

    /// <summary>A two-input NAND of <paramref name="a"/> and <paramref name="b"/> driving <paramref name="output"/>, a net declared earlier with Node().</summary>
    public void Nand(Net a, Net b, Net output, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Nand, a, b, TwoInputs, null, null, null, Existing(output), null, Site(callerFile, callerLine));

    /// <summary>A two-input NOR of <paramref name="a"/> and <paramref name="b"/>; returns its new output net.</summary>
    public Net Nor(Net a, Net b, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Nor, a, b, TwoInputs, null, null, name, null, null, Site(callerFile, callerLine));

    /// <summary>A two-input NOR of <paramref name="a"/> and <paramref name="b"/> driving <paramref name="output"/>, a net declared earlier with Node().</summary>
    public void Nor(Net a, Net b, Net output, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddPrimitive(DeviceKind.Nor, a, b, TwoInputs, null, null, null, Existing(output), null, Site(callerFile, callerLine));

    /// <summary>A transmission gate that conducts while <paramref name="when"/> is active.</summary>
    public Net TransmissionGate(Net input, Phase when, string? name = null, Resistance? onResistance = null,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckPhase(when, nameof(when));
        return AddPrimitive(DeviceKind.TransmissionGate, input, null, OneInput, when, null, name, null,
            CheckResistance(onResistance, nameof(onResistance)), Site(callerFile, callerLine));
    }

    /// <summary>A transmission gate that conducts while <paramref name="when"/> is active, driving an existing net.</summary>
    public void TransmissionGate(Net input, Phase when, Net output, Resistance? onResistance = null,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckPhase(when, nameof(when));
        AddPrimitive(DeviceKind.TransmissionGate, input, null, OneInput, when, null, null, Existing(output),
            CheckResistance(onResistance, nameof(onResistance)), Site(callerFile, callerLine));
    }

    /// <summary>A data-controlled transmission gate (as in a mux): it conducts while <paramref name="control"/> is high.</summary>
    public Net TransmissionGate(Net input, Net control, string? name = null, Resistance? onResistance = null,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckNet(control, nameof(control));
        return AddPrimitive(DeviceKind.TransmissionGate, input, null, OneInput, null, control, name, null,
            CheckResistance(onResistance, nameof(onResistance)), Site(callerFile, callerLine));
    }

    /// <summary>A data-controlled transmission gate driving an existing net (the arms of a pass-gate mux).</summary>
    public void TransmissionGate(Net input, Net control, Net output, Resistance? onResistance = null,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckNet(control, nameof(control));
        AddPrimitive(DeviceKind.TransmissionGate, input, null, OneInput, null, control, null, Existing(output),
            CheckResistance(onResistance, nameof(onResistance)), Site(callerFile, callerLine));
    }
}
