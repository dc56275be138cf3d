using System;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;
using Phaseward.Storage;

namespace Phaseward.Reproducers;

/// <summary>Reads what a deck needs from a finding's properties and the netlist, with clear errors when they do not match.</summary>
internal static class DeckInputs
{
    public static string Property(Finding finding, string key)
        => finding.Properties.TryGetValue(key, out var value) && value.Length > 0
            ? value
            : throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} has no '{key}' property, which its deck needs.", nameof(finding));

    /// <summary>A figure the finding carries as a property (SI units, invariant culture).</summary>
    public static double Number(Finding finding, string key)
    {
        var text = Property(finding, key);
        return double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value)
            ? value
            : throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} has '{key}' = '{text}', which is not a number.", nameof(finding));
    }

    public static Device DeviceById(Finding finding, Netlist netlist, string key)
    {
        var text = Property(finding, key);
        if (!int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var id) || id < 0 || id >= netlist.Devices.Count)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names device {text}, which is not in the netlist of design '{netlist.DesignName}'.", nameof(netlist));
        return netlist.Devices[id];
    }

    public static Net NetByName(Finding finding, Netlist netlist, string key)
    {
        var name = Property(finding, key);
        return DeckLookup.Of(netlist).Net(name) ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names net '{name}', which is not in the netlist of design '{netlist.DesignName}'.", nameof(netlist));
    }

    public static StorageNode StorageNodeByName(Finding finding, Netlist netlist, string key)
    {
        var net = NetByName(finding, netlist, key);
        return StorageNodes.Find(netlist, net)
            ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names '{net.Name}', which is not a storage node in design '{netlist.DesignName}'.", nameof(netlist));
    }

    /// <summary>The latch-to-latch path a finding names (its source and target latch properties), preferring the one
    /// whose entry gate is the finding's location when several connect the two latches.</summary>
    public static LatchPath LatchPathOf(Finding finding, Netlist netlist, LatchModel model)
    {
        var targetName = Property(finding, FindingPropertyKeys.TargetLatch);
        var sourceName = Property(finding, FindingPropertyKeys.SourceLatch);
        LatchPath? path = null;
        foreach (var p in DeckLookup.Of(netlist).Paths(sourceName, targetName))
            if (path is null || p.EntryGate.Span.Equals(finding.Location)) path = p;

        return path ?? throw new ArgumentException(
            $"The {finding.RuleId} finding at {finding.Location}: design '{netlist.DesignName}' has no path from latch '{sourceName}' to latch '{targetName}'.",
            nameof(finding));
    }
}
