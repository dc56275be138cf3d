using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Storage;

namespace Phaseward.Rules.DynamicStorage;

/// <summary>
/// PW3004: two conducting paths drive one net at the same time. Counted: two restoring stages on one net (always);
/// a restoring stage and a pass gate (while the gate conducts); two clocked pass gates whose windows overlap; a
/// clocked and a data-controlled gate (they can conduct together); two data-controlled gates whose controls are not
/// provably exclusive (<see cref="Netlist.AreExclusive"/>: a stated <see cref="Circuit.Exclusive"/> group, or a
/// control and its inverse). Not counted: keepers (weak stages, PW3005's subject), a static latch's feedback gate
/// against its entry gate (the latch is built so), two gates passing the same net (they never disagree).
/// </summary>
/// <remarks>
/// The figure is the level the node is pulled to when the two disagree: a divider of the two paths' resistances
/// (driver plus pass gates in series, <see cref="DriveResistance"/>), V·R2/(R1 + R2) with the first path pulling up,
/// and the current V/(R1 + R2) that flows from rail to rail meanwhile (Ohm's law; first order). One finding per net:
/// the first fighting pair in the order written, reported at the later driver's call.
/// </remarks>
public sealed class FightingDriversRule : Rule
{
    private const string Always = "all the time (two restoring stages)";
    private const string WhilePhase = "while {0} conducts ({1} per period)";
    private const string WhileControl = "whenever '{0}' is high";
    private const string WhileBothControls = "whenever '{0}' and '{1}' are both high (not stated exclusive)";
    private const string Overlap = "for {0} per period ({1} and {2} overlap)";
    private const string UnrelatedClocks = "whenever {0} and {1} conduct together (unrelated clocks)";
    private const string PhaseAndControl = "whenever '{1}' is high while {0} conducts";

    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.FightingDrivers };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var netlist = context.Netlist;
        DriveResistance? paths = null;
        var windows = new PhaseWindowCache();
        var strong = new List<Device>(4);
        foreach (var net in netlist.Nets)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            var drivers = netlist.DriverList(net);
            if (drivers.Length < 2)
                continue;

            strong.Clear();
            StorageNode? storage = null;
            var storageLooked = false;
            foreach (var driver in drivers)
            {
                if (driver.IsWeak) continue;
                if (driver.IsPassDevice && driver.ClockControl is not null)
                {
                    if (!storageLooked)
                    {
                        storage = StorageNodes.Find(netlist, net);
                        storageLooked = true;
                    }

                    if (storage is not null && storage.IsFeedback(driver))
                        continue;
                }

                strong.Add(driver);
            }

            if (strong.Count < 2 || FirstFight(netlist, strong, windows) is not { } fight)
                continue;

            paths ??= DriveResistance.Of(netlist);
            var (first, second, when, overlap) = fight;
            var r1 = paths.Through(first) ?? netlist.ResistanceOf(first);
            var r2 = paths.Through(second) ?? netlist.ResistanceOf(second);
            var supply = netlist.Process.Supply;
            var level = supply * (r2 / (r1 + r2));
            var current = new Current(supply.Volts / (r1 + r2).Ohms);

            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.Node] = net.Name,
                [FindingPropertyKeys.Driver] = first.Name,
                [FindingPropertyKeys.OtherDriver] = second.Name,
                [FindingPropertyKeys.DriverOhms] = FindingPropertyValues.Number(r1.Ohms),
                [FindingPropertyKeys.OtherDriverOhms] = FindingPropertyValues.Number(r2.Ohms),
                [FindingPropertyKeys.LevelVolts] = FindingPropertyValues.Number(level.Volts),
                [FindingPropertyKeys.CurrentAmperes] = FindingPropertyValues.Number(current.Amperes),
            };
            if (overlap is { } o)
                properties[FindingPropertyKeys.OverlapSeconds] = FindingPropertyValues.Number(o.Seconds);

            yield return new Finding(RuleCatalog.FightingDrivers, second.Span,
                new object[] { first.Name, r1, second.Name, r2, net.Name, when, level, current },
                new[] { first.Span }, properties);
        }
    }

    // The first pair (in the order written) whose conduction can overlap, with when it does and, for clocked gates
    // of one root clock, for how long per period.
    private static (Device First, Device Second, string When, Time? Overlap)? FirstFight(Netlist netlist, List<Device> drivers, PhaseWindowCache windows)
    {
        if (IsOneHotBus(netlist, drivers))
            return null;
        for (var j = 1; j < drivers.Count; j++)
        {
            for (var i = 0; i < j; i++)
            {
                var a = drivers[i];
                var b = drivers[j];
                if (a.IsPassDevice && b.IsPassDevice && ReferenceEquals(a.Inputs[0], b.Inputs[0]))
                    continue;
                if (Together(netlist, a, b, windows) is { } together)
                    return (a, b, together.When, together.Overlap);
            }
        }

        return null;
    }

    // A bus whose gates are all on distinct data controls of one stated exclusive group (a register file's read bus):
    // no two conduct together. Known in one pass, where comparing every pair would cost the square of a wide bus.
    private static bool IsOneHotBus(Netlist netlist, List<Device> drivers)
    {
        // Only a stated group proves it: with none (most designs) nothing is allocated on this per-net path.
        if (drivers.Count < 3 || netlist.ExclusiveGroups.Count == 0)
            return false;
        var controls = new List<Net>(drivers.Count);
        var distinct = new HashSet<Net>();
        foreach (var driver in drivers)
        {
            if (!driver.IsPassDevice || driver.ClockControl is not null || driver.DataControl is not { } control || !distinct.Add(control))
                return false;
            controls.Add(control);
        }

        return netlist.OneExclusiveGroupHolds(controls);
    }

    private static (string When, Time? Overlap)? Together(Netlist netlist, Device a, Device b, PhaseWindowCache windows)
    {
        if (!a.IsPassDevice && !b.IsPassDevice)
            return (Always, null);
        if (!a.IsPassDevice || !b.IsPassDevice)
        {
            var gate = a.IsPassDevice ? a : b;
            return gate.ClockControl is { } phase
                ? (Format(WhilePhase, phase.Name, windows.Of(phase).Length), windows.Of(phase).Length)
                : (Format(WhileControl, gate.DataControl!.Name), null);
        }

        if (!ConductionOverlap.MayConductTogether(netlist, a, b, windows, SkewOverlapCounts.Yes))
            return null;
        if (a.ClockControl is { } pa && b.ClockControl is { } pb)
        {
            var wa = windows.Of(pa);
            var wb = windows.Of(pb);
            if (wa.CommonCycleWith(wb) is null)
                return (Format(UnrelatedClocks, pa.Name, pb.Name), null);
            var overlap = wa.TotalOverlapWith(wb);
            return (Format(Overlap, overlap, pa.Name, pb.Name), overlap);
        }

        if (a.DataControl is { } ca && b.DataControl is { } cb)
            return ReferenceEquals(ca, cb) ? (Format(WhileControl, ca.Name), null) : (Format(WhileBothControls, ca.Name, cb.Name), null);

        var clocked = a.ClockControl is not null ? a : b;
        var controlled = ReferenceEquals(clocked, a) ? b : a;
        return (Format(PhaseAndControl, clocked.ClockControl!.Name, controlled.DataControl!.Name), null);
    }

    private static string Format(string format, params object[] arguments) => string.Format(CultureInfo.InvariantCulture, format, arguments);
}
