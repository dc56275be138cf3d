using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>A net driven only through pass devices (no restoring stage, keeper included, drives it; not a primary input).</summary>
public sealed class StorageNode
{
    private readonly Netlist netlist;
    private DroopBudget? budget;

    internal StorageNode(Netlist netlist, Net net, StorageKind kind, IReadOnlyList<Device> drivers, IReadOnlyList<Device> feedbackDrivers)
    {
        this.netlist = netlist;
        Net = net;
        Kind = kind;
        Drivers = drivers;
        FeedbackDrivers = feedbackDrivers;
    }

    /// <summary>The stored net.</summary>
    public Net Net { get; }

    /// <summary>Dynamic (charge only) or static (with feedback).</summary>
    public StorageKind Kind { get; }

    /// <summary>Every pass device that drives the node, feedback gates included, in netlist order.</summary>
    public IReadOnlyList<Device> Drivers { get; }

    /// <summary>The drivers that feed the node a restored copy of itself (empty for a dynamic node).</summary>
    public IReadOnlyList<Device> FeedbackDrivers { get; }

    /// <summary>The node's droop allowance, shared by charge sharing and leakage (computed once, on first use: it needs
    /// the other storage nodes).</summary>
    public DroopBudget Budget => budget ??= DroopBudget.Of(netlist, this);

    /// <summary>t_ret = C·ΔV / I_leak for this node, ΔV being what charge sharing leaves of the allowance (<see cref="Budget"/>).</summary>
    public Retention Retention => Budget.Retention;

    /// <summary>True if at least one driver is controlled by a clock phase.</summary>
    public bool IsClocked
    {
        get
        {
            foreach (var driver in Drivers)
                if (driver.ClockControl is not null)
                    return true;
            return false;
        }
    }

    /// <summary>The first clock-controlled driver (the call that made the node, for reports), else the first driver.</summary>
    public Device PrimaryDriver
    {
        get
        {
            foreach (var driver in Drivers)
                if (driver.ClockControl is not null && !IsFeedback(driver))
                    return driver;
            return Drivers[0];
        }
    }

    /// <summary>The outermost library cell the node was made by (a register rather than its latch), or null.</summary>
    public MacroInstance? Cell
    {
        get
        {
            var macro = PrimaryDriver.Macro;
            while (macro?.Parent is { } parent)
                macro = parent;
            return macro;
        }
    }

    /// <summary>True when <paramref name="driver"/> is one of the node's feedback drivers.</summary>
    public bool IsFeedback(Device driver)
    {
        foreach (var feedback in FeedbackDrivers)
            if (ReferenceEquals(feedback, driver))
                return true;
        return false;
    }

    /// <inheritdoc/>
    public override string ToString() => $"{Kind} storage node {Net.Name}";
}
