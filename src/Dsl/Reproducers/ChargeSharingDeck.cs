using System;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Storage;

namespace Phaseward.Reproducers;

/// <summary>
/// PW3003: the two floating nodes and the pass device between them. The charged node is precharged to vdd and the
/// other discharged to 0 V (the worst case), both are then left floating, and the device opens. Measures
/// <c>v_settled</c>, the charged node's level once the charge is shared, and <c>droop</c>, vdd less that level.
/// </summary>
internal static class ChargeSharingDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var charged = DeckInputs.StorageNodeByName(finding, netlist, FindingPropertyKeys.Node);
        var other = DeckInputs.StorageNodeByName(finding, netlist, FindingPropertyKeys.OtherNode);
        Device? device = null;
        foreach (var d in netlist.DataLoadsOf(charged.Net))
            if (d.IsPassDevice && ReferenceEquals(d.Output, other.Net) && (finding.Arguments.Count == 0 || d.Name == finding.Arguments[0]))
                device = d;
        if (device is null)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no pass device joins '{charged.Net.Name}' to '{other.Net.Name}' in design '{netlist.DesignName}'.", nameof(finding));

        // The rule's own computation (partners, C2, the shared level), so the deck's estimates are the finding's.
        if (!ChargeSharingPaths.TryShare(netlist, device, new PhaseWindowCache(), out _, out _, out var partners, out var sharing))
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: '{device.Name}' does not share charge between floating nodes in design '{netlist.DesignName}'.", nameof(finding));
        var c1 = sharing.ChargedCapacitance;
        var c2 = sharing.OtherCapacitance;
        var deck = new DeckWriter(finding, netlist);
        deck.Describe($"Sub-circuit: '{device.Name}' between floating nodes '{charged.Net.Name}' (C1 = {c1}) and '{other.Net.Name}' (C2 = {c2} in all)"
            + (partners.Count == 0 ? "." : $", with the {partners.Count} floating node(s) joined to '{other.Net.Name}' through gates that may conduct at the same time."));
        deck.Describe($"Stimulus: '{charged.Net.Name}' precharged to vdd and '{other.Net.Name}'{(partners.Count == 0 ? "" : " and its partners")} to 0 V (the worst case) through precharge switches, which then open; then '{device.Name}'{(partners.Count == 0 ? "" : " and the partners' gates")} conduct (controls driven directly).");
        deck.Describe("Measured: v_settled, the charged node's level at the end (Phaseward's estimate V·C1/(C1+C2)), and droop = vdd - v_settled. Leakage is left out, as the estimate does.");

        var r = netlist.ResistanceOf(device);
        var tau = r * (c1 + c2);
        var precharge = new Time(Math.Max(tau.Seconds, 1e-12)) * 20;
        var share = precharge + new Time(Math.Max(tau.Seconds, 1e-12)) * 2;
        var end = share + new Time(Math.Max(tau.Seconds, 1e-12)) * 30;
        var edge = new Time(Math.Max(tau.Seconds, 1e-12)) * 0.05;

        var vdd = deck.Fresh("vdd_rail");
        var gnd = deck.Fresh("gnd_rail");
        deck.Dc(vdd, "{vdd}", "precharge level of the charged node");
        deck.Dc(gnd, "0", "level of the other node");
        var pre = deck.Fresh("on_precharge");
        var on = deck.Fresh("on_share");
        deck.Pwl(pre, new[] { (0.0, deck.Supply), (precharge.Seconds, deck.Supply), ((precharge + edge).Seconds, 0.0) }, "precharge, then both nodes float");
        deck.Pwl(on, new[] { (0.0, 0.0), (share.Seconds, 0.0), ((share + edge).Seconds, deck.Supply) }, $"'{device.Name}' opens");
        var n1 = deck.Node(charged.Net);
        var n2 = deck.Node(other.Net);
        deck.Element($"X_pre1 {vdd} {n1} {pre} pw_tg ron={SpiceNumbers.Of(r.Ohms)}   $ precharge switch (not part of the design)");
        deck.Element($"X_pre2 {gnd} {n2} {pre} pw_tg ron={SpiceNumbers.Of(r.Ohms)}   $ precharge switch (not part of the design)");
        deck.PassGate(device, n1, n2, on);
        deck.Capacitor(n1, c1, $"C1, '{charged.Net.Name}'");
        deck.Capacitor(n2, other.Retention.Capacitance, $"C2, '{other.Net.Name}'");
        var index = 0;
        foreach (var partner in partners)
        {
            var node = deck.Node(partner.Node.Net);
            index++;
            deck.Element($"X_pre_p{index} {gnd} {node} {pre} pw_tg ron={SpiceNumbers.Of(netlist.ResistanceOf(partner.Through).Ohms)}   $ precharge switch (not part of the design)");
            deck.PassGate(partner.Through, node, n2, on);
            deck.Capacitor(node, partner.Node.Retention.Capacitance, $"partner '{partner.Node.Net.Name}'");
        }

        deck.Transient(end / 5000, end, end / 1000);
        deck.Measure($".meas tran v_settled FIND v({n1}) AT={SpiceNumbers.Of(DeckWriter.SettledBefore(end))}",
            new DeckEstimate("v_settled", sharing.Settled.Volts, "V", "shared level V·C1/(C1+C2)"));
        deck.Measure(".meas tran droop PARAM='vdd - v_settled'",
            new DeckEstimate("droop", sharing.Droop.Volts, "V", "droop V·C2/(C1+C2)"));
        return deck.Build();
    }
}
