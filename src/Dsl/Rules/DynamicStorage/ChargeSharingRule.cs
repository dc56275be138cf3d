using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Storage;

namespace Phaseward.Rules.DynamicStorage;

/// <summary>
/// PW3003: a pass device whose input and output are both storage nodes, each possibly floating while the device
/// conducts. When it opens, the input node's charge is shared with the output node; the droop
/// V·C2/(C1+C2) (V the supply, C1 the input node, C2 the output node taken at 0 V) is reported when it exceeds the
/// process's tolerated droop (the node's whole droop allowance; what it leaves is what leakage may take, see
/// <see cref="DroopBudget"/>).
/// </summary>
/// <remarks>
/// Counts: a pass device (clock- or data-controlled) from storage node A to storage node B, where A's drivers do
/// not keep it driven throughout the device's conduction window (any instant, for a data-controlled device) and
/// B's other drivers do not either. Not counted: an input or output driven by a restoring stage or keeper, or
/// from a primary input (a driven node is restored, not shared); a storage node kept driven all the while (a
/// static latch's node with its feedback gate). The direction is the device's: the input node's value flows to
/// the output, so the input node is the charged one and its droop is the one reported.
/// </remarks>
public sealed class ChargeSharingRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.ChargeSharing };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var netlist = context.Netlist;
        foreach (var device in netlist.Devices)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            if (!ChargeSharingPaths.TryShare(netlist, device, out var charged, out var other, out var sharing))
                continue;

            var tolerated = netlist.Process.ToleratedDroop;
            if (sharing.Droop <= tolerated)
                continue;

            var properties = new Dictionary<string, string>
            {
                [DynamicStorageProperties.Node] = charged.Net.Name,
                [DynamicStorageProperties.OtherNode] = other.Net.Name,
                [DynamicStorageProperties.DroopVolts] = DynamicStorageProperties.Number(sharing.Droop.Volts),
            };
            CellProperties.Add(properties, charged);

            yield return new Finding(
                RuleCatalog.ChargeSharing,
                device.Span,
                new object[]
                {
                    device.Name, charged.Net.Name, sharing.ChargedCapacitance, other.Net.Name, sharing.OtherCapacitance,
                    sharing.Level, sharing.Settled, sharing.Droop, tolerated,
                },
                new[] { charged.PrimaryDriver.Span },
                properties);
        }
    }
}
