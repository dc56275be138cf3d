using System;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using Phaseward.Internal;
using Phaseward.Netlists;

namespace Phaseward;

/// <summary>
/// What a <see cref="Design"/> describes its circuit with. Every call validates all its arguments before it changes
/// anything, so a call that throws leaves the circuit exactly as it was.
/// </summary>
/// <remarks>
/// The trailing <c>callerFile</c>/<c>callerLine</c> parameters are filled in by the C# compiler; do not pass them.
/// </remarks>
public sealed partial class Circuit
{
    private readonly List<Net> nets = new();
    private readonly List<Device> devices = new();
    private readonly List<Clock> clocks = new();
    private readonly List<MacroInstance> macros = new();
    private readonly List<Port> inputs = new();
    private readonly List<Port> outputs = new();
    private readonly HashSet<string> netNames = new(StringComparer.Ordinal);
    private readonly HashSet<string> clockNames = new(StringComparer.Ordinal);
    private readonly HashSet<string> outputNames = new(StringComparer.Ordinal);
    private readonly List<NetDrive> netDrives = new();
    private readonly Dictionary<int, Capacitance> capacitanceOverrides = new();
    private readonly Dictionary<int, Current> leakageOverrides = new();
    private readonly Dictionary<string, int> autoNameCounters = new(StringComparer.Ordinal);
    private readonly Dictionary<string, int> autoClockCounters = new(StringComparer.Ordinal);

    internal Circuit(string designName)
    {
        DesignName = Guard.Name(designName, nameof(designName));
    }

    /// <summary>The name of the design being described (the netlist keeps it).</summary>
    public string DesignName { get; }

    /// <summary>The process figures in force (the illustrative defaults until <see cref="UseProcess"/> is called).</summary>
    public Process Process { get; private set; } = Process.Illustrative;

    /// <summary>How many primitives the circuit holds so far.</summary>
    public int DeviceCount => devices.Count;

    /// <summary>How many nets the circuit holds so far (the compile-time elaborator bounds it like the devices).</summary>
    internal int NetCount => nets.Count;

    /// <summary>
    /// Set by the compile-time elaborator: where the DSL call being executed was written. At run time it is null and
    /// the caller's file and line are used.
    /// </summary>
    internal Func<SourceSpan>? SourceSiteProvider { get; set; }

    /// <summary>Uses the given process figures for the whole design (whenever it is called).</summary>
    public void UseProcess(Process process) => Process = Guard.NotNull(process, nameof(process));

    /// <summary>Sets the total capacitance of a net, replacing the process estimate.</summary>
    public void SetCapacitance(Net net, Capacitance total)
    {
        CheckNet(net, nameof(net));
        Guard.Positive(total.Farads, nameof(total), "F");
        capacitanceOverrides[net.Id] = total;
    }

    /// <summary>Sets the leakage that drains a storage net, replacing the process figure.</summary>
    public void SetLeakage(Net net, Current leakage)
    {
        CheckNet(net, nameof(net));
        Guard.Positive(leakage.Amperes, nameof(leakage), "A");
        leakageOverrides[net.Id] = leakage;
    }

    /// <summary>The netlist built so far (used by <see cref="Design.Elaborate"/> and the compile-time elaborator).</summary>
    internal Netlist ToNetlist()
        => new(DesignName, Process, nets.ToArray(), devices.ToArray(), clocks.ToArray(), macros.ToArray(), inputs.ToArray(), outputs.ToArray(),
            new Dictionary<int, Capacitance>(capacitanceOverrides), new Dictionary<int, Current>(leakageOverrides),
            exclusiveGroups.ToArray());

    private SourceSpan Site(string callerFile, int callerLine) => SourceSiteProvider?.Invoke() ?? new SourceSpan(callerFile, callerLine);

    private void CheckNet(Net? net, string parameter)
    {
        if (net is null)
            throw new ArgumentNullException(parameter, $"'{parameter}' must not be null.");
        if (!ReferenceEquals(net.Owner, this))
            throw new ArgumentException($"'{parameter}' is net '{net.Name}' of another circuit ('{net.Owner.DesignName}'); nets cannot be shared between circuits.", parameter);
    }

    private void CheckPhase(Phase? phase, string parameter)
    {
        if (phase is null)
            throw new ArgumentNullException(parameter, $"'{parameter}' must not be null.");
        CheckClock(phase.Clock, parameter);
    }

    private void CheckClock(Clock? clock, string parameter)
    {
        if (clock is null)
            throw new ArgumentNullException(parameter, $"'{parameter}' must not be null.");
        if (!ReferenceEquals(clock.Owner, this))
            throw new ArgumentException($"'{parameter}' is clock '{clock.Name}' of another circuit ('{clock.Owner.DesignName}').", parameter);
    }

    /// <summary>Checks that a name given by the designer is usable and free; null means "make one up".</summary>
    private void CheckNewNetName(string? name, string parameter)
    {
        if (name is null) return;
        Guard.Name(name, parameter);
        if (netNames.Contains(name))
            throw new ArgumentException($"'{parameter}': a net named \"{name}\" already exists in design '{DesignName}'.", parameter);
    }

    private void CheckCanDriveStrongly(Net output, string parameter)
    {
        var drive = netDrives[output.Id];
        if ((drive & NetDrive.PrimaryInput) != 0)
            throw new ArgumentException($"'{parameter}': net '{output.Name}' is a primary input, already driven from outside; a restoring stage on it would fight that driver.", parameter);
        if ((drive & NetDrive.RestoringStage) != 0)
            throw new ArgumentException($"'{parameter}': net '{output.Name}' is already driven by a restoring stage; a second one would fight it.", parameter);
    }

    // A net name (or a cell's name, free together with its internal nets) that no net or clock has.
    private string AutoName(string prefix, params string[] internalSuffixes)
        => NextFreeName(autoNameCounters, prefix, internalSuffixes,
            static (circuit, suffixes, candidate) => circuit.netNames.Contains(candidate) || circuit.clockNames.Contains(candidate) || circuit.AnyTaken(candidate, suffixes));

    // prefix + the lowest free number after the last one given for this prefix: names are never removed, so every
    // lower number is still taken and this is the lowest free one, found without rescanning from 1 (which made k
    // auto names with one prefix cost O(k²)). The test is static and gets its state passed in: nothing is allocated.
    private string NextFreeName(Dictionary<string, int> counters, string prefix, string[] state, Func<Circuit, string[], string, bool> isTaken)
    {
        counters.TryGetValue(prefix, out var count);
        string candidate;
        do
        {
            count++;
            candidate = prefix + count.ToString(System.Globalization.CultureInfo.InvariantCulture);
        }
        while (isTaken(this, state, candidate));

        counters[prefix] = count;
        return candidate;
    }

    private bool AnyTaken(string cellName, string[] suffixes)
    {
        foreach (var suffix in suffixes)
            if (netNames.Contains(cellName + suffix))
                return true;
        return false;
    }

    private Net NewNet(string name)
    {
        var net = new Net(this, nets.Count, name);
        nets.Add(net);
        netDrives.Add(NetDrive.None);
        netNames.Add(name);
        return net;
    }

    private Device AddDevice(string? name, DeviceKind kind, DeviceInputs deviceInputs, Net output, Phase? clockControl, Net? dataControl,
        Resistance? resistance, bool isWeak, SourceSpan span, MacroInstance? macro = null, string? role = null, string? nameInCell = null)
    {
        var device = new Device(devices.Count, name, kind, deviceInputs, output, clockControl, dataControl, resistance, isWeak, span, macro, role, nameInCell);
        devices.Add(device);
        macro?.Add(device);
        if (kind.IsRestoring() && !isWeak)
            netDrives[output.Id] |= NetDrive.RestoringStage;
        return device;
    }

    /// <summary>What already drives a net, by net id: two strong drivers on one net would fight.</summary>
    [Flags]
    private enum NetDrive : byte
    {
        None = 0,
        PrimaryInput = 1,
        RestoringStage = 2,
    }

    private static string Prefix(DeviceKind kind) => kind switch
    {
        DeviceKind.Inverter => "inv",
        DeviceKind.Buffer => "buf",
        DeviceKind.Nand => "nand",
        DeviceKind.Nor => "nor",
        _ => "tg",
    };

    // The overloads that drive an existing net pass it through here: AddPrimitive reads a null output as "make a new net".
    private static Net Existing(Net? output)
        => output ?? throw new ArgumentNullException(nameof(output), $"'{nameof(output)}' must not be null.");

    private static Resistance? CheckResistance(Resistance? value, string parameter)
        => value is { } r ? new Resistance(Guard.Positive(r.Ohms, parameter, "Ω")) : null;

    // The one shape every primitive shares: validate, then make (or reuse) the output net and add the device.
    // The inputs come as one or two nets (second null for one-input stages), not an array: a DSL call then makes no
    // garbage for them, and the device keeps them in itself (DeviceInputs).
    private Net AddPrimitive(DeviceKind kind, Net input, Net? second, string[] inputParameters, Phase? clockControl, Net? dataControl,
        string? name, Net? output, Resistance? resistance, SourceSpan span)
    {
        CheckNet(input, inputParameters[0]);
        if (inputParameters.Length > 1)
            CheckNet(second, inputParameters[1]);
        name = ScopedOrNull(name);
        if (output is not null)
        {
            CheckNet(output, nameof(output));
            if (kind.IsRestoring()) CheckCanDriveStrongly(output, nameof(output));
        }
        else
        {
            CheckNewNetName(name, nameof(name));
        }

        var outputNet = output ?? NewNet(name ?? AutoName(Scoped(Prefix(kind))));
        var deviceName = output is null ? outputNet.Name : AutoName(ScopedOnce(outputNet.Name + "." + Prefix(kind)));
        AddDevice(deviceName, kind, new DeviceInputs(input, second), outputNet, clockControl, dataControl, resistance, false, span);
        return outputNet;
    }
}
