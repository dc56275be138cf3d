using System;
using System.Collections.Generic;

namespace Phaseward
{
    /// <summary>
    /// The elaborated design: primitives only, with nets, clocks, ports and the electrical figures the rules use.
    /// Built once by <see cref="Circuit"/>; the indexes (drivers, loads, capacitances) are computed up front so that
    /// every rule can run in time linear in the size of the design.
    /// </summary>
    public sealed class Netlist
    {
        private static readonly IReadOnlyList<Device> NoDevices = Array.Empty<Device>();

        // What the internal accessors return for a net with no such devices; never added to.
        private static readonly List<Device> NoDeviceList = new(0);

        private readonly List<Device>?[] drivers;
        private readonly List<Device>?[] dataLoads;
        private readonly List<Device>?[] controlLoads;
        private readonly Capacitance[] capacitances;
        private readonly Current?[] leakageOverrides;
        private readonly bool[] isInput;

        internal Netlist(string designName, Process process, IReadOnlyList<Net> nets, IReadOnlyList<Device> devices,
            IReadOnlyList<Clock> clocks, IReadOnlyList<MacroInstance> macros, IReadOnlyList<Port> inputs, IReadOnlyList<Port> outputs,
            IReadOnlyDictionary<int, Capacitance> capacitanceOverrides, IReadOnlyDictionary<int, Current> leakage)
        {
            DesignName = designName;
            Process = process;
            Nets = nets;
            Devices = devices;
            Clocks = clocks;
            Macros = macros;
            Inputs = inputs;
            Outputs = outputs;

            drivers = new List<Device>?[nets.Count];
            dataLoads = new List<Device>?[nets.Count];
            controlLoads = new List<Device>?[nets.Count];
            foreach (var device in devices)
            {
                Add(drivers, device.Output, device);
                var deviceInputs = device.Inputs;
                for (var i = 0; i < deviceInputs.Count; i++)
                    Add(dataLoads, deviceInputs[i], device);
                if (device.DataControl is { } control)
                    Add(controlLoads, control, device);
            }

            isInput = new bool[nets.Count];
            foreach (var port in inputs)
                isInput[port.Net.Id] = true;

            var enableLoads = new int[nets.Count];
            foreach (var clock in clocks)
                if (clock.Enable is { } enable)
                    enableLoads[enable.Id]++;

            capacitances = new Capacitance[nets.Count];
            leakageOverrides = new Current?[nets.Count];
            foreach (var net in nets)
            {
                capacitances[net.Id] = capacitanceOverrides.TryGetValue(net.Id, out var set)
                    ? set
                    : EstimateCapacitance(net, enableLoads[net.Id]);
                if (leakage.TryGetValue(net.Id, out var current))
                    leakageOverrides[net.Id] = current;
            }
        }

        public string DesignName { get; }

        public Process Process { get; }

        public IReadOnlyList<Net> Nets { get; }

        public IReadOnlyList<Device> Devices { get; }

        /// <summary>Root and derived clocks, in order of declaration.</summary>
        public IReadOnlyList<Clock> Clocks { get; }

        public IReadOnlyList<MacroInstance> Macros { get; }

        public IReadOnlyList<Port> Inputs { get; }

        public IReadOnlyList<Port> Outputs { get; }

        /// <summary>Devices whose output is this net (restoring stages and pass gates).</summary>
        public IReadOnlyList<Device> DriversOf(Net net) => drivers[Index(net)] ?? NoDevices;

        /// <summary>Devices that take this net as a data input.</summary>
        public IReadOnlyList<Device> DataLoadsOf(Net net) => dataLoads[Index(net)] ?? NoDevices;

        /// <summary>Pass gates controlled by this net.</summary>
        public IReadOnlyList<Device> ControlLoadsOf(Net net) => controlLoads[Index(net)] ?? NoDevices;

        // The same indexes as concrete lists, for the rules' hot loops: enumerating an IReadOnlyList boxes its enumerator.
        internal List<Device> DriverList(Net net) => drivers[Index(net)] ?? NoDeviceList;

        internal List<Device> DataLoadList(Net net) => dataLoads[Index(net)] ?? NoDeviceList;

        internal List<Device> ControlLoadList(Net net) => controlLoads[Index(net)] ?? NoDeviceList;

        /// <summary>True for a primary input (driven from outside through the process's driver resistance).</summary>
        public bool IsInput(Net net) => isInput[Index(net)];

        /// <summary>
        /// The net's capacitance: the value set in the design, else the process estimate
        /// wire + gate × (gate loads) + diffusion × (pass-gate terminals and stage outputs on the net).
        /// </summary>
        public Capacitance CapacitanceOf(Net net) => capacitances[Index(net)];

        /// <summary>The storage leakage of this net: the value set in the design, else the process figure.</summary>
        public Current LeakageOf(Net net) => leakageOverrides[Index(net)] ?? Process.StorageLeakage;

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
            if (netDrivers.Count == 0 || IsInput(net))
                return false;
            foreach (var driver in netDrivers)
                if (driver.IsRestoring)
                    return false;
            return true;
        }

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

            gateLoads += ControlLoadsOf(net).Count;
            diffusionTerminals += DriversOf(net).Count;
            return Process.WireCapacitance + Process.GateCapacitance * gateLoads + Process.DiffusionCapacitance * diffusionTerminals;
        }

        private int Index(Net net)
        {
            if (net is null) throw new ArgumentNullException(nameof(net));
            if ((uint)net.Id >= (uint)Nets.Count || !ReferenceEquals(Nets[net.Id], net))
                throw new ArgumentException($"Net '{net.Name}' does not belong to the netlist of design '{DesignName}'.", nameof(net));
            return net.Id;
        }

        private static void Add(List<Device>?[] index, Net net, Device device) => (index[net.Id] ??= new List<Device>(2)).Add(device);
    }
}
