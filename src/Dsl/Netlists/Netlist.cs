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
        private static readonly Device[] NoDevices = Array.Empty<Device>();

        // Per net, exactly sized (null: none). Arrays rather than lists: a million-net design then holds one object per
        // non-empty index entry instead of two, and the rules iterate them without enumerator objects.
        private readonly Device[]?[] drivers;
        private readonly Device[]?[] dataLoads;
        private readonly Device[]?[] controlLoads;
        private readonly Net[] netArray;
        private readonly Capacitance[] capacitances;
        private readonly IReadOnlyDictionary<int, Current> leakageOverrides;
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
            netArray = nets as Net[] ?? new List<Net>(nets).ToArray();
            leakageOverrides = leakage;

            // Each index in two passes: count per net, then fill arrays of exactly that size.
            var counts = new int[nets.Count];
            for (var d = 0; d < devices.Count; d++)
                counts[devices[d].Output.Id]++;
            drivers = Allocate(counts);
            for (var d = 0; d < devices.Count; d++)
                Fill(drivers, counts, devices[d].Output, devices[d]);

            Array.Clear(counts, 0, counts.Length);
            for (var d = 0; d < devices.Count; d++)
            {
                var deviceInputs = devices[d].Inputs;
                for (var i = 0; i < deviceInputs.Count; i++)
                    counts[deviceInputs[i].Id]++;
            }

            dataLoads = Allocate(counts);
            for (var d = 0; d < devices.Count; d++)
            {
                var deviceInputs = devices[d].Inputs;
                for (var i = 0; i < deviceInputs.Count; i++)
                    Fill(dataLoads, counts, deviceInputs[i], devices[d]);
            }

            Array.Clear(counts, 0, counts.Length);
            for (var d = 0; d < devices.Count; d++)
                if (devices[d].DataControl is { } control)
                    counts[control.Id]++;
            controlLoads = Allocate(counts);
            for (var d = 0; d < devices.Count; d++)
                if (devices[d].DataControl is { } control)
                    Fill(controlLoads, counts, control, devices[d]);

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

        // The same indexes as arrays, for the rules' hot loops: enumerating an IReadOnlyList boxes its enumerator.
        internal Device[] DriverList(Net net) => drivers[Index(net)] ?? NoDevices;

        internal Device[] DataLoadList(Net net) => dataLoads[Index(net)] ?? NoDevices;

        internal Device[] ControlLoadList(Net net) => controlLoads[Index(net)] ?? NoDevices;

        /// <summary>True for a primary input (driven from outside through the process's driver resistance).</summary>
        public bool IsInput(Net net) => isInput[Index(net)];

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

        // Arrays of the counted sizes; the counts are reset to 0 to serve as fill positions (and end as the counts again).
        private static Device[]?[] Allocate(int[] counts)
        {
            var index = new Device[]?[counts.Length];
            for (var i = 0; i < counts.Length; i++)
            {
                if (counts[i] > 0)
                    index[i] = new Device[counts[i]];
                counts[i] = 0;
            }

            return index;
        }

        private static void Fill(Device[]?[] index, int[] positions, Net net, Device device) => index[net.Id]![positions[net.Id]++] = device;
    }
}
