using System.Collections.Generic;
using System.Text;
using Phaseward.Checking;
using Phaseward.Clocking;
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
        var windows = new PhaseWindowCache();
        foreach (var device in netlist.Devices)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            if (!ChargeSharingPaths.TryShare(netlist, device, windows, out var charged, out var other, out var partners, out var sharing))
                continue;

            var tolerated = netlist.Process.ToleratedDroop;
            if (sharing.Droop <= tolerated)
                continue;

            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.Node] = charged.Net.Name,
                [FindingPropertyKeys.OtherNode] = other.Net.Name,
                [FindingPropertyKeys.DroopVolts] = FindingPropertyValues.Number(sharing.Droop.Volts),
            };
            CellProperties.Add(properties, charged);

            yield return new Finding(
                RuleCatalog.ChargeSharing,
                device.Span,
                new object[]
                {
                    device.Name, charged.Net.Name, sharing.ChargedCapacitance, other.Net.Name, sharing.OtherCapacitance,
                    sharing.Level, sharing.Settled, sharing.Droop, tolerated, PartnerText(partners),
                },
                new[] { charged.PrimaryDriver.Span },
                properties);
        }
    }

    // Names the partners counted in C2 (the first few), so the figure can be checked by hand.
    private static string PartnerText(IReadOnlyList<SharingPartner> partners)
    {
        if (partners.Count == 0)
            return "";
        var text = new StringBuilder(", counting ").Append(partners.Count)
            .Append(partners.Count == 1 ? " more floating node" : " more floating nodes")
            .Append(" joined through pass gates that may conduct at the same time: ");
        for (var i = 0; i < partners.Count && i < NamedPartners; i++)
        {
            if (i > 0) text.Append(", ");
            text.Append('\'').Append(partners[i].Node.Net.Name).Append("' through '").Append(partners[i].Through.Name).Append('\'');
        }

        if (partners.Count > NamedPartners) text.Append(", ...");
        return text.Append("; state Circuit.Exclusive if their controls are never high together").ToString();
    }

    private const int NamedPartners = 3;
}
