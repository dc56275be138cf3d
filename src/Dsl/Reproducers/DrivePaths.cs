using System;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Reproducers;

/// <summary>
/// Draws one conducting path from a rail onto a node, as the drive-strength figures take it (<see cref="DriveResistance"/>):
/// the device that drives the node with its own model, and whatever stands behind it (the restoring stage or input
/// that drives a pass gate, and any pass gates before it) lumped as one resistor, so that the path's resistance is
/// the rule's figure. Used by the decks of findings whose figure is a divider of two such paths (PW3004, PW3005).
/// </summary>
internal static class DrivePaths
{
    /// <summary>The strong (not weak) driver of <paramref name="node"/> called <paramref name="name"/>.</summary>
    public static Device Driver(Finding finding, Netlist netlist, Net node, string name)
    {
        foreach (var device in netlist.DriversOf(node))
            if (string.Equals(device.Name, name, StringComparison.Ordinal))
                return device;
        throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location} names driver '{name}', which does not drive '{node.Name}' in design '{netlist.DesignName}'.", nameof(finding));
    }

    /// <summary>
    /// Draws <paramref name="driver"/> pulling <paramref name="node"/> towards <paramref name="level"/> (a node at vdd or 0)
    /// through a total resistance <paramref name="total"/>; a pass device conducts while <paramref name="on"/> is high.
    /// <paramref name="side"/> names the path in the deck's comments.
    /// </summary>
    public static void Draw(DeckWriter deck, Netlist netlist, Device driver, Resistance total, string level, string node, string on, string side)
    {
        var own = netlist.ResistanceOf(driver);
        if (driver.IsRestoring)
        {
            // The stage with its input at the level that makes it drive 'level': an inverting stage's input is the inverse.
            var input = deck.Fresh("in_" + DeckWriter.Safe(driver.Name));
            var inverting = driver.Kind != DeviceKind.Buffer;
            deck.Element($"{deck.NextName("B")}_{input} {input} 0 V = {(inverting ? "{vdd} - " : string.Empty)}V({level})   $ {side}: the input that makes '{driver.Name}' drive this level");
            deck.RestoringStage(driver, input, node);
            return;
        }

        var rest = total - own;
        var from = level;
        if (rest.Ohms > 1e-9 * total.Ohms)
        {
            from = deck.Fresh("behind_" + DeckWriter.Safe(driver.Name));
            deck.Element($"{deck.NextName("R")}_{from} {level} {from} {SpiceNumbers.Of(rest.Ohms)}   $ {side}: the rest of the path behind '{driver.Name}' (its driver and any pass gates before it), lumped: {total} in all");
        }

        deck.PassGate(driver, from, node, on);
    }
}
