using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Rules.DynamicStorage;

/// <summary>
/// PW3005: a node with a keeper whose write path cannot overpower it. Writing a 0 against a keeper that holds a 1
/// (and, mirrored, a 1 against a 0) is a divider of the keeper's resistance against the write path's (the driver's
/// plus the pass gates' in series, <see cref="DriveResistance"/>): the node reaches V·R_w/(R_w + R_k) (Ohm's law).
/// It must get past the switching point V/2 by the margin (<see cref="RulePolicy.KeeperWriteMargin"/>, a fraction
/// of the supply; default 10 %: common practice), i.e. down to V·(1/2 − margin). The weakest write path of the
/// node is checked (every one of them must win); several keepers on one node act in parallel.
/// </summary>
/// <remarks>
/// First order: one resistance per device for both edges and a switching point at half the supply (a symmetric
/// inverter reads the node). Linear: one look at each net's drivers; the write paths come from one shared pass.
/// </remarks>
public sealed class KeeperTooStrongRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.KeeperTooStrong };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var netlist = context.Netlist;
        DriveResistance? paths = null;
        foreach (var net in netlist.Nets)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            var drivers = netlist.DriverList(net);
            if (drivers.Length < 2)
                continue;

            Device? keeper = null;
            var keeperConductance = 0.0;
            foreach (var driver in drivers)
            {
                if (!driver.IsWeak) continue;
                keeper ??= driver;
                keeperConductance += 1 / netlist.ResistanceOf(driver).Ohms;
            }

            if (keeper is null)
                continue;

            paths ??= DriveResistance.Of(netlist);
            Device? writer = null;
            var write = Resistance.Zero;
            foreach (var driver in drivers)
            {
                if (driver.IsWeak || paths.Through(driver) is not { } through || (writer is not null && through <= write))
                    continue;
                writer = driver;
                write = through;
            }

            if (writer is null)
                continue;

            var check = KeeperWrite.Of(new Resistance(1 / keeperConductance), write, netlist.Process.Supply, context.Policy.KeeperWriteMargin);
            if (check.Overpowers)
                continue;

            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.Node] = net.Name,
                [FindingPropertyKeys.Keeper] = keeper.Macro?.Name ?? keeper.Name,
                [FindingPropertyKeys.Writer] = writer.Name,
                [FindingPropertyKeys.KeeperOhms] = FindingPropertyValues.Number(check.Keeper.Ohms),
                [FindingPropertyKeys.WriteOhms] = FindingPropertyValues.Number(check.Write.Ohms),
                [FindingPropertyKeys.LevelVolts] = FindingPropertyValues.Number(check.Level.Volts),
                [FindingPropertyKeys.RequiredVolts] = FindingPropertyValues.Number(check.Required.Volts),
                [FindingPropertyKeys.SupplyVolts] = FindingPropertyValues.Number(check.Supply.Volts),
            };

            yield return new Finding(
                RuleCatalog.KeeperTooStrong,
                keeper.Span,
                new object[]
                {
                    keeper.Macro?.Name ?? keeper.Name, check.Keeper, writer.Name, check.Write, net.Name, check.Level, check.Required,
                    check.Supply / 2, check.Supply * check.Margin,
                },
                new[] { writer.Span },
                properties);
        }
    }
}

/// <summary>The divider of a write against a keeper (see <see cref="KeeperTooStrongRule"/>).</summary>
public readonly struct KeeperWrite
{
    private KeeperWrite(Resistance keeper, Resistance write, Voltage supply, double margin)
    {
        Keeper = keeper;
        Write = write;
        Supply = supply;
        Margin = margin;
        Level = supply * (write / (write + keeper));
        Required = supply * (0.5 - margin);
    }

    public Resistance Keeper { get; }

    public Resistance Write { get; }

    public Voltage Supply { get; }

    /// <summary>The margin past the switching point, as a fraction of the supply.</summary>
    public double Margin { get; }

    /// <summary>The level a 0 written against a keeper holding 1 reaches: V·R_w/(R_w + R_k).</summary>
    public Voltage Level { get; }

    /// <summary>The level it must reach: V·(1/2 − margin).</summary>
    public Voltage Required { get; }

    public bool Overpowers => Level <= Required;

    public static KeeperWrite Of(Resistance keeper, Resistance write, Voltage supply, double margin)
    {
        Internal.Guard.Positive(keeper.Ohms, nameof(keeper), "Ω");
        Internal.Guard.Positive(write.Ohms, nameof(write), "Ω");
        Internal.Guard.Positive(supply.Volts, nameof(supply), "V");
        if (double.IsNaN(margin) || margin < 0 || margin >= 0.5)
            throw new System.ArgumentException($"'{nameof(margin)}' must be at least 0 and below 0.5 of the supply (was {margin.ToString("R", System.Globalization.CultureInfo.InvariantCulture)}).", nameof(margin));
        return new KeeperWrite(keeper, write, supply, margin);
    }
}
