using System;
using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>
/// The elaborated design: primitives only, with nets, clocks, ports and the electrical figures the rules use.
/// Built once by <see cref="Circuit"/>; the indexes (drivers, loads, capacitances) are computed up front so that
/// every rule can run in time linear in the size of the design.
/// </summary>
public sealed class Netlist
{
    private readonly NetDeviceIndex drivers;
    private readonly NetDeviceIndex dataLoads;
    private readonly NetDeviceIndex controlLoads;
    private readonly Net[] netArray;
    private readonly Capacitance[] capacitances;
    private readonly IReadOnlyDictionary<int, Current> leakageOverrides;
    private readonly bool[] isInput;
    private Dictionary<Net, Port>? inputPortOf; // made on first use: few rules need it
    private readonly ExclusiveControls exclusive;

    internal Netlist(string designName, Process process, IReadOnlyList<Net> nets, IReadOnlyList<Device> devices,
        IReadOnlyList<Clock> clocks, IReadOnlyList<MacroInstance> macros, IReadOnlyList<Port> inputs, IReadOnlyList<Port> outputs,
        IReadOnlyDictionary<int, Capacitance> capacitanceOverrides, IReadOnlyDictionary<int, Current> leakage,
        IReadOnlyList<Net[]>? exclusiveGroups = null)
    {
        DesignName = designName;
        Process = process;
        Nets = nets;
        Devices = devices;
        Clocks = clocks;
        Macros = macros;
        Inputs = inputs;
        Outputs = outputs;
        netArray = nets as Net[] ?? new List<Net>(nets).ToArray();
        leakageOverrides = leakage;

        drivers = NetDeviceIndex.Build(devices, nets.Count, NetConnection.Output);
        dataLoads = NetDeviceIndex.Build(devices, nets.Count, NetConnection.DataInput);
        controlLoads = NetDeviceIndex.Build(devices, nets.Count, NetConnection.Control);

        exclusive = new ExclusiveControls(exclusiveGroups, nets.Count);

        isInput = new bool[nets.Count];
        foreach (var port in inputs)
            isInput[port.Net.Id] = true;

        var enableLoads = new int[nets.Count];
        foreach (var clock in clocks)
            if (clock.Enable is { } enable)
                enableLoads[enable.Id]++;

        capacitances = new Capacitance[nets.Count];
        foreach (var net in netArray)
            capacitances[net.Id] = capacitanceOverrides.TryGetValue(net.Id, out var set)
                ? set
                : EstimateCapacitance(net, enableLoads[net.Id]);
    }

    /// <summary>The design's name.</summary>
    public string DesignName { get; }

    /// <summary>The process the electrical figures come from.</summary>
    public Process Process { get; }

    /// <summary>Every net, in order of creation.</summary>
    public IReadOnlyList<Net> Nets { get; }

    /// <summary>Every primitive device, in order of creation (macros expanded).</summary>
    public IReadOnlyList<Device> Devices { get; }

    /// <summary>Root and derived clocks, in order of declaration.</summary>
    public IReadOnlyList<Clock> Clocks { get; }

    /// <summary>Every macro call, whose devices keep a link to it.</summary>
    public IReadOnlyList<MacroInstance> Macros { get; }

    /// <summary>The design's inputs.</summary>
    public IReadOnlyList<Port> Inputs { get; }

    /// <summary>The design's outputs.</summary>
    public IReadOnlyList<Port> Outputs { get; }

    /// <summary>Devices whose output is this net (restoring stages and pass gates).</summary>
    public IReadOnlyList<Device> DriversOf(Net net) => drivers.Of(Index(net)).AsReadOnlyList();

    /// <summary>Devices that take this net as a data input.</summary>
    public IReadOnlyList<Device> DataLoadsOf(Net net) => dataLoads.Of(Index(net)).AsReadOnlyList();

    /// <summary>Pass gates controlled by this net.</summary>
    public IReadOnlyList<Device> ControlLoadsOf(Net net) => controlLoads.Of(Index(net)).AsReadOnlyList();

    // The same indexes as ranges, for the rules' hot loops: no list object, no boxed enumerator.
    internal DeviceRange DriverList(Net net) => drivers.Of(Index(net));

    internal DeviceRange DataLoadList(Net net) => dataLoads.Of(Index(net));

    internal DeviceRange ControlLoadList(Net net) => controlLoads.Of(Index(net));

    /// <summary>The groups of control nets stated exclusive with <see cref="Circuit.Exclusive"/>, in order of statement.</summary>
    public IReadOnlyList<IReadOnlyList<Net>> ExclusiveGroups => exclusive.Groups;

    /// <summary>
    /// True when <paramref name="a"/> and <paramref name="b"/> are never high together: they were stated in one
    /// <see cref="Circuit.Exclusive"/> group, or one is the other's inverse (the output of an inverter, its only
    /// driver, whose input is the other). A net is not exclusive with itself.
    /// </summary>
    public bool AreExclusive(Net a, Net b)
    {
        Index(a);
        Index(b);
        if (ReferenceEquals(a, b)) return false;
        return exclusive.StatedTogether(a, b) || ExclusiveControls.IsInverseOf(this, a, b) || ExclusiveControls.IsInverseOf(this, b, a);
    }

    /// <summary>True when one stated <see cref="Circuit.Exclusive"/> group holds every net of <paramref name="controls"/>:
    /// any two distinct ones are exclusive, known in one pass instead of a comparison per pair.</summary>
    internal bool OneExclusiveGroupHolds(IReadOnlyList<Net> controls) => exclusive.OneGroupHoldsAll(controls);

    /// <summary>True when exactly one of <paramref name="a"/> and <paramref name="b"/> is high at any time: one is the
    /// other's inverse (a stated exclusive group says at most one, not exactly one).</summary>
    public bool AreComplementary(Net a, Net b)
    {
        Index(a);
        Index(b);
        return ExclusiveControls.IsInverseOf(this, a, b) || ExclusiveControls.IsInverseOf(this, b, a);
    }

    /// <summary>True for a primary input (driven from outside through the process's driver resistance).</summary>
    public bool IsInput(Net net) => isInput[Index(net)];

    /// <summary>The input port <paramref name="net"/> comes in through, or null when it is not a primary input (one
    /// lookup: a design can have as many inputs as devices).</summary>
    internal Port? InputPortOf(Net net)
    {
        if (!IsInput(net)) return null;
        var ports = System.Threading.LazyInitializer.EnsureInitialized(ref inputPortOf, () =>
        {
            var byNet = new Dictionary<Net, Port>(Inputs.Count);
            foreach (var port in Inputs)
                if (!byNet.ContainsKey(port.Net)) // the first port, as a scan in port order would find
                    byNet.Add(port.Net, port);
            return byNet;
        })!;
        return ports[net];
    }

    /// <summary>
    /// The net's capacitance: the value set in the design, else the process estimate
    /// wire + gate × (gate loads) + diffusion × (pass-gate terminals and stage outputs on the net).
    /// </summary>
    public Capacitance CapacitanceOf(Net net) => capacitances[Index(net)];

    /// <summary>The storage leakage of this net: the value set in the design, else the process figure.</summary>
    public Current LeakageOf(Net net) => leakageOverrides.TryGetValue(Index(net), out var set) ? set : Process.StorageLeakage;

    /// <summary>The device's effective resistance: its own figure, else the process figure for its kind.</summary>
    public Resistance ResistanceOf(Device device)
        => device.ResistanceOverride
           ?? (device.IsPassDevice ? Process.PassGateResistance
               : device.IsWeak ? Process.KeeperResistance
               : Process.DriverResistance);

    /// <summary>All devices that have no restoring driver on the net, i.e. whose output is held only through pass devices.</summary>
    public bool IsDrivenOnlyThroughPassDevices(Net net)
    {
        var netDrivers = DriverList(net);
        if (netDrivers.Length == 0 || IsInput(net))
            return false;
        foreach (var driver in netDrivers)
            if (driver.IsRestoring)
                return false;
        return true;
    }

    /// <inheritdoc/>
    public override string ToString() => NetlistText.Write(this, includeSpans: false);

    private Capacitance EstimateCapacitance(Net net, int enableLoads)
    {
        var gateLoads = enableLoads;
        var diffusionTerminals = 0;
        foreach (var load in DataLoadList(net))
        {
            if (load.IsPassDevice) diffusionTerminals++;
            else gateLoads++;
        }

        gateLoads += ControlLoadList(net).Length;
        diffusionTerminals += DriverList(net).Length;
        return Process.WireCapacitance + Process.GateCapacitance * gateLoads + Process.DiffusionCapacitance * diffusionTerminals;
    }

    private int Index(Net net)
    {
        if (net is null) throw new ArgumentNullException(nameof(net));
        if ((uint)net.Id >= (uint)netArray.Length || !ReferenceEquals(netArray[net.Id], net))
            throw new ArgumentException($"Net '{net.Name}' does not belong to the netlist of design '{DesignName}'.", nameof(net));
        return net.Id;
    }
}
