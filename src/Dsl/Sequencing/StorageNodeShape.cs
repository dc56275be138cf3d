using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// What the latch finder recognises around one net: whether it is a storage node, the static-latch feedback loop
/// and the latch's output stage.
/// </summary>
internal static class StorageNodeShape
{
    /// <summary>
    /// A storage node: not a primary input, and driven only by pass devices (at least one) and weak keeper stages.
    /// </summary>
    public static bool IsStorageNode(Netlist netlist, Net net, out bool hasKeeper)
    {
        hasKeeper = false;
        var drivers = netlist.DriverList(net);
        if (drivers.Length == 0 || netlist.IsInput(net))
            return false;
        var passDrivers = 0;
        foreach (var driver in drivers)
        {
            if (driver.IsPassDevice) passDrivers++;
            else if (driver.IsWeak) hasKeeper = true;
            else return false;
        }

        return passDrivers > 0;
    }

    /// <summary>The static-latch loop storage → inverter → inverter → <paramref name="gate"/>: the second inverter, or null.</summary>
    public static Device? FeedbackStageOf(Netlist netlist, Device gate, Net storage)
    {
        foreach (var second in netlist.DriverList(gate.Inputs[0]))
        {
            if (second.Kind != DeviceKind.Inverter || second.IsWeak)
                continue;
            foreach (var first in netlist.DriverList(second.Inputs[0]))
                if (first.Kind == DeviceKind.Inverter && !first.IsWeak && ReferenceEquals(first.Inputs[0], storage))
                    return second;
        }

        return null;
    }

    /// <summary>The restoring stage that reads the storage node: the cell's "inverter" if any, else the first strong restoring load.</summary>
    public static Device? OutputStageOf(Netlist netlist, Net storage, Device entry)
    {
        Device? first = null;
        foreach (var load in netlist.DataLoadList(storage))
        {
            if (!load.IsRestoring || load.IsWeak)
                continue;
            if (entry.Macro is not null && ReferenceEquals(load.Macro, entry.Macro) && load.Role == "inverter")
                return load;
            if (first is null || load.Id < first.Id)
                first = load;
        }

        return first;
    }
}
