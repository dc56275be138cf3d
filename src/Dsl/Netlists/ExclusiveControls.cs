using System;
using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>
/// Which control nets are never high together: the groups stated with <see cref="Circuit.Exclusive"/>, and every net
/// with its inverse (the input and output of an inverter that is the output's only driver). Built once per netlist;
/// a query costs the number of groups the two nets are in.
/// </summary>
internal sealed class ExclusiveControls
{
    private static readonly Net[][] NoGroups = Array.Empty<Net[]>();

    private readonly Net[][] groups;
    // The groups each net is in, as one flat array in group order (net i's are groupsOfNet[start[i] .. start[i+1]]).
    private readonly int[] start;
    private readonly int[] groupsOfNet;

    public ExclusiveControls(IReadOnlyList<Net[]>? stated, int netCount)
    {
        groups = stated is null || stated.Count == 0 ? NoGroups : new List<Net[]>(stated).ToArray();
        start = new int[netCount + 1];
        foreach (var group in groups)
            foreach (var net in group)
                start[net.Id + 1]++;
        for (var i = 0; i < netCount; i++)
            start[i + 1] += start[i];
        groupsOfNet = new int[start[netCount]];
        var fill = (int[])start.Clone();
        for (var g = 0; g < groups.Length; g++)
            foreach (var net in groups[g])
                groupsOfNet[fill[net.Id]++] = g;
    }

    public IReadOnlyList<IReadOnlyList<Net>> Groups => groups;

    /// <summary>True when the two nets are in one stated group.</summary>
    public bool StatedTogether(Net a, Net b)
    {
        // Both runs are in increasing group order: one merge finds a common group.
        int i = start[a.Id], endA = start[a.Id + 1], j = start[b.Id], endB = start[b.Id + 1];
        while (i < endA && j < endB)
        {
            var ga = groupsOfNet[i];
            var gb = groupsOfNet[j];
            if (ga == gb) return true;
            if (ga < gb) i++;
            else j++;
        }

        return false;
    }

    /// <summary>True when one stated group holds every net of <paramref name="nets"/> (then any two distinct ones are
    /// exclusive): the candidates are the first net's groups, each looked up in the others' runs.</summary>
    public bool OneGroupHoldsAll(IReadOnlyList<Net> nets)
    {
        if (nets.Count == 0) return false;
        var first = nets[0].Id;
        for (var k = start[first]; k < start[first + 1]; k++)
        {
            var group = groupsOfNet[k];
            var all = true;
            for (var n = 1; n < nets.Count && all; n++)
                all = Array.BinarySearch(groupsOfNet, start[nets[n].Id], start[nets[n].Id + 1] - start[nets[n].Id], group) >= 0;
            if (all) return true;
        }

        return false;
    }

    /// <summary>True when <paramref name="inverse"/> is driven by one inverter, and only by it, whose input is <paramref name="net"/>.</summary>
    public static bool IsInverseOf(Netlist netlist, Net inverse, Net net)
    {
        var drivers = netlist.DriverList(inverse);
        if (drivers.Length != 1 || netlist.IsInput(inverse)) return false;
        var driver = drivers[0];
        return driver.Kind == DeviceKind.Inverter && !driver.IsWeak && ReferenceEquals(driver.Inputs[0], net);
    }

    /// <summary>
    /// The nets that may be exclusive with some other net (indexed by net id): those in a stated group, and the input
    /// and output of every inverter that is not a weak keeper. A pass gate on any other net conducts with every other
    /// data-controlled gate as far as anything known goes, so it needs no comparing.
    /// </summary>
    public static bool[] MayHavePartner(Netlist netlist)
    {
        var partners = new bool[netlist.Nets.Count];
        foreach (var group in netlist.ExclusiveGroups)
            foreach (var net in group)
                partners[net.Id] = true;
        foreach (var device in netlist.Devices)
            if (device.Kind == DeviceKind.Inverter && !device.IsWeak)
            {
                partners[device.Inputs[0].Id] = true;
                partners[device.Output.Id] = true;
            }

        return partners;
    }
}
