using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>
/// For every net, the devices connected to it in one way (as output, data input or control), stored flat: one array
/// of devices ordered by net, and where each net's run starts. Two objects for the whole netlist instead of one or two
/// per net, so a large design leaves the collector little to copy and a sweep reads memory in order.
/// </summary>
internal sealed class NetDeviceIndex
{
    // ends[i]: where net i's run ends (and net i + 1's begins); net 0's begins at 0.
    private readonly int[] ends;
    private readonly Device[] items;

    private NetDeviceIndex(int[] ends, Device[] items)
    {
        this.ends = ends;
        this.items = items;
    }

    /// <summary>The devices of net <paramref name="netId"/>, in netlist order.</summary>
    public DeviceRange Of(int netId)
    {
        var start = netId == 0 ? 0 : ends[netId - 1];
        return new DeviceRange(items, start, ends[netId] - start);
    }

    /// <summary>Builds the index in two passes over the devices: count per net, then place in netlist order.</summary>
    public static NetDeviceIndex Build(IReadOnlyList<Device> devices, int netCount, NetConnection connection)
    {
        var positions = new int[netCount];
        for (var d = 0; d < devices.Count; d++)
            Visit(devices[d], connection, positions, null);

        // Counts become starts; placing advances each start to its run's end.
        var total = 0;
        for (var i = 0; i < netCount; i++)
        {
            var count = positions[i];
            positions[i] = total;
            total += count;
        }

        var items = new Device[total];
        for (var d = 0; d < devices.Count; d++)
            Visit(devices[d], connection, positions, items);
        return new NetDeviceIndex(positions, items);
    }

    // Counts (items == null) or places the device under every net it connects to in the given way.
    private static void Visit(Device device, NetConnection connection, int[] positions, Device[]? items)
    {
        switch (connection)
        {
            case NetConnection.Output:
                Place(device.Output.Id);
                break;
            case NetConnection.DataInput:
                var inputs = device.Inputs;
                for (var i = 0; i < inputs.Count; i++)
                    Place(inputs[i].Id);
                break;
            case NetConnection.Control:
                if (device.DataControl is { } control)
                    Place(control.Id);
                break;
        }

        void Place(int netId)
        {
            if (items is null)
                positions[netId]++;
            else
                items[positions[netId]++] = device;
        }
    }
}

/// <summary>How a device is connected to a net, for <see cref="NetDeviceIndex"/>.</summary>
internal enum NetConnection
{
    Output,
    DataInput,
    Control,
}
