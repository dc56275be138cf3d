using System;
using System.Collections.Generic;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Storage;

/// <summary>
/// When a storage node is isolated: every pass device that drives it is off, so it holds its level only as charge.
/// </summary>
/// <remarks>
/// <para>Model (first order, nominal edges):</para>
/// <list type="bullet">
/// <item>A driver on a clock phase conducts during that phase's <see cref="PhaseWindow"/> while its clock runs.
/// Feedback gates count like any other driver: a static latch's input gate and feedback gate are on complementary
/// phases, whose windows cover the whole period, so its node is never isolated while the clock runs.</item>
/// <item>A driver controlled by a data net is treated as possibly off at every instant: nothing guarantees when
/// the data opens it, so it never counts as a refresh (it cannot make a node safe, and a node driven only by such
/// gates has no clock to blame and is not a clocked storage node).</item>
/// <item>A conducting driver restores the node. Where the driver's input is itself a floating node, the two share
/// charge instead; that is the charge-sharing check's business (PW3003), not the isolation model's.</item>
/// <item>Running clocks: the drivers' windows are combined per root clock (windows of different roots cannot be
/// compared); the node is isolated for the longest gap in the union of one root's windows, and where the node has
/// drivers on several roots, for the shortest such gap (each root refreshes it on its own).</item>
/// <item>Stopped clocks: a gated clock whose enable is low is held at its stop level, and so is every clock
/// derived from it (a clock gate further down is taken as enabled, passing that level on). A clock held low keeps
/// its Low phase conducting and its High phase off; held high, the reverse. For each clock driver, the gate that
/// can hold it off is the one nearest to it in its clock's derivation chain whose stop level turns that phase
/// off. The node is isolated while stopped only if every clock driver has such a gate; it then floats while all
/// those gates are stopped together, which lasts at most the shortest of their declared maximum idle times (or an
/// unbounded time if none declares one).</item>
/// </list>
/// </remarks>
public static class StorageIsolation
{
    /// <summary>The phase polarity that conducts while a gated clock is held at <paramref name="level"/>.</summary>
    public static ClockPolarity HeldOpen(ClockStopLevel level) => level == ClockStopLevel.High ? ClockPolarity.High : ClockPolarity.Low;

    /// <summary>
    /// The gated clock, nearest to <paramref name="phase"/>'s clock in its derivation chain, whose stop level turns
    /// the phase off (null if no gate can: the phase's clock is free-running, or every gate holds it open).
    /// </summary>
    public static Clock? GateHoldingOff(Phase phase)
    {
        if (phase is null) throw new ArgumentNullException(nameof(phase));
        for (var clock = phase.Clock; clock is not null; clock = clock.Source)
            if (clock.Kind == ClockKind.Gated && HeldOpen(clock.StopLevel) != phase.Polarity)
                return clock;
        return null;
    }

    /// <summary>
    /// The node's isolation while every clock runs, or null if no clock phase drives it.
    /// </summary>
    public static RunningIsolation? WhileRunning(StorageNode node)
    {
        if (node is null) throw new ArgumentNullException(nameof(node));
        return WhileRunning(node, new ArcBuffers());
    }

    /// <summary><see cref="WhileRunning(StorageNode)"/> working in <paramref name="buffers"/>: per root clock (in order of
    /// first appearance among the drivers) the longest gap between its drivers' windows; the shortest such gap wins.</summary>
    internal static RunningIsolation? WhileRunning(StorageNode node, ArcBuffers buffers)
    {
        var drivers = node.Drivers;
        var roots = buffers.Roots;
        roots.Clear();
        for (var i = 0; i < drivers.Count; i++)
            if (drivers[i].ClockControl is { } phase && !roots.Contains(phase.Clock.Root))
                roots.Add(phase.Clock.Root);

        Clock? bestRoot = null;
        var bestGap = Time.Zero;
        var arcs = buffers.Arcs;
        foreach (var root in roots)
        {
            arcs.Clear();
            for (var i = 0; i < drivers.Count; i++)
                if (drivers[i].ClockControl is { } phase && ReferenceEquals(phase.Clock.Root, root))
                    arcs.Add(PhaseWindow.ArcOf(phase));
            var gap = Arc.LongestGap(arcs, root.Period, buffers);
            if (bestRoot is null || gap < bestGap)
            {
                bestRoot = root;
                bestGap = gap;
            }
        }

        return bestRoot is null ? null : new RunningIsolation(node, bestRoot, bestGap, DriversOn(bestRoot, drivers));
    }

    /// <summary>
    /// The node's isolation while the gated clocks that can turn all its drivers off are stopped, or null if none
    /// can (some clock driver keeps conducting or keeps running, or no clock phase drives the node).
    /// </summary>
    public static StoppedIsolation? WhileStopped(StorageNode node)
    {
        if (node is null) throw new ArgumentNullException(nameof(node));
        var gates = new List<Clock>(1);
        var drivers = node.Drivers;
        for (var i = 0; i < drivers.Count; i++)
        {
            if (drivers[i].ClockControl is not { } phase) continue; // data-controlled: possibly off anyway
            var gate = GateHoldingOff(phase);
            if (gate is null) return null;
            if (!gates.Contains(gate)) gates.Add(gate);
        }

        if (gates.Count == 0) return null;
        var binding = gates[0];
        foreach (var gate in gates)
            if (gate.MaxIdle is { } idle && (binding.MaxIdle is not { } current || idle < current))
                binding = gate;
        gates.Remove(binding);
        gates.Insert(0, binding);
        var running = WhileRunning(node);
        return new StoppedIsolation(node, gates, binding.MaxIdle, running?.Longest ?? Time.Zero);
    }

    /// <summary>
    /// True if <paramref name="node"/> may be isolated at some instant while <paramref name="device"/> conducts:
    /// its drivers other than <paramref name="except"/> do not cover the device's whole conduction window. A
    /// data-controlled device may conduct at any instant, so the drivers must then cover the whole period.
    /// Overlap at the window's edges (clock skew) is no protection: the drivers must cover all of it.
    /// </summary>
    public static bool MayFloatWhile(StorageNode node, Device device, Device? except = null)
    {
        if (node is null) throw new ArgumentNullException(nameof(node));
        if (device is null) throw new ArgumentNullException(nameof(device));
        var others = new List<Device>(node.Drivers.Count);
        foreach (var driver in node.Drivers)
            if (!ReferenceEquals(driver, except))
                others.Add(driver);

        // A driver switched by the same control net as the device conducts whenever the device does.
        if (device.DataControl is { } control)
            foreach (var driver in others)
                if (ReferenceEquals(driver.DataControl, control))
                    return false;

        if (device.ClockControl is { } phase)
        {
            var window = PhaseWindow.Of(phase);
            var cover = new List<Arc>();
            foreach (var driver in others)
                if (driver.ClockControl is { } other && ReferenceEquals(other.Clock.Root, phase.Clock.Root))
                    cover.Add(PhaseWindow.ArcOf(other));
            return !Arc.IsCovered(Arc.Of(window), cover, window.Period);
        }

        foreach (var group in ByRoot(others))
        {
            var arcs = new List<Arc>(group.Count);
            foreach (var driver in group)
                arcs.Add(PhaseWindow.ArcOf(driver.ClockControl!));
            if (Arc.LongestGap(arcs, group[0].ClockControl!.Clock.Root.Period) == Time.Zero)
                return false;
        }

        return true;
    }

    /// <summary>
    /// The window of <paramref name="phase"/> if its root clock ran at <paramref name="period"/> (same duty,
    /// complement skew and delays): the <see cref="PhaseWindow"/> formula at another period.
    /// </summary>
    public static Arc WindowAtPeriod(Phase phase, Time period)
    {
        if (phase is null) throw new ArgumentNullException(nameof(phase));
        var clock = phase.Clock;
        var highTime = period * clock.Duty;
        var opens = phase.Polarity == ClockPolarity.High ? clock.DelayFromRoot : clock.DelayFromRoot + highTime;
        var length = (phase.Polarity == ClockPolarity.High ? highTime : period - highTime) + clock.ComplementSkew;
        return new Arc(opens, length);
    }

    // The clock-controlled drivers on one root clock, in order.
    private static List<Device> DriversOn(Clock root, IReadOnlyList<Device> drivers)
    {
        var on = new List<Device>(2);
        for (var i = 0; i < drivers.Count; i++)
            if (drivers[i].ClockControl is { } phase && ReferenceEquals(phase.Clock.Root, root))
                on.Add(drivers[i]);
        return on;
    }

    // Clock-controlled drivers grouped by root clock, groups in order of first appearance.
    private static List<List<Device>> ByRoot(IReadOnlyList<Device> drivers)
    {
        var groups = new List<List<Device>>(1);
        foreach (var driver in drivers)
        {
            if (driver.ClockControl is not { } phase) continue;
            List<Device>? group = null;
            foreach (var candidate in groups)
                if (ReferenceEquals(candidate[0].ClockControl!.Clock.Root, phase.Clock.Root))
                    group = candidate;
            if (group is null) groups.Add(group = new List<Device>(2));
            group.Add(driver);
        }

        return groups;
    }
}

/// <summary>How long a storage node floats in each period of a running root clock.</summary>
public sealed class RunningIsolation
{
    internal RunningIsolation(StorageNode node, Clock root, Time longest, IReadOnlyList<Device> drivers)
    {
        Node = node;
        Root = root;
        Longest = longest;
        Drivers = drivers;
    }

    /// <summary>The storage node.</summary>
    public StorageNode Node { get; }

    /// <summary>The root clock whose drivers bound the isolation.</summary>
    public Clock Root { get; }

    /// <summary>The longest stretch of a period during which every driver on <see cref="Root"/> is off.</summary>
    public Time Longest { get; }

    /// <summary>The node's drivers on <see cref="Root"/> (or clocks derived from it).</summary>
    public IReadOnlyList<Device> Drivers { get; }

    /// <summary>The longest isolation if the root clock ran at <paramref name="period"/> (duty, skews and delays kept).</summary>
    public Time LongestAtPeriod(Time period)
    {
        if (!(period.Seconds > 0)) throw new ArgumentException($"'{nameof(period)}' must be positive (was {period}).", nameof(period));
        var arcs = new List<Arc>(Drivers.Count);
        foreach (var driver in Drivers)
            arcs.Add(StorageIsolation.WindowAtPeriod(driver.ClockControl!, period));
        return Arc.LongestGap(arcs, period);
    }

    /// <summary>
    /// The lowest root-clock frequency at which the longest isolation is no longer than <paramref name="retention"/>,
    /// rounded up to three significant digits (found by bisection on the period: the isolation grows with the
    /// period). Null if even the current frequency is safe.
    /// </summary>
    public Frequency? LowestSafeFrequency(Time retention)
    {
        if (Longest <= retention) return null;
        var safe = 0.0;
        var unsafePeriod = Root.Period.Seconds;
        for (var i = 0; i < 200 && unsafePeriod - safe > unsafePeriod * 1e-12; i++)
        {
            var mid = 0.5 * (safe + unsafePeriod);
            if (LongestAtPeriod(new Time(mid)) <= retention) safe = mid;
            else unsafePeriod = mid;
        }

        return safe > 0 ? new Frequency(RoundUp(1.0 / safe)) : new Frequency(double.PositiveInfinity);
    }

    private static double RoundUp(double value)
    {
        var magnitude = Math.Pow(10, Math.Floor(Math.Log10(value)) - 2);
        // Guard against representation noise turning an exact three-digit value into the next step up.
        return Math.Ceiling(value / magnitude * (1 - 1e-12)) * magnitude;
    }
}

/// <summary>How a storage node floats while gated clocks are stopped.</summary>
public sealed class StoppedIsolation
{
    internal StoppedIsolation(StorageNode node, IReadOnlyList<Clock> gates, Time? idleBound, Time runningGap)
    {
        Node = node;
        Gates = gates;
        IdleBound = idleBound;
        AroundStopAndRestart = runningGap * 2;
    }

    /// <summary>The storage node.</summary>
    public StorageNode Node { get; }

    /// <summary>The gated clocks that must all be stopped for the node to float, the one with the shortest declared
    /// maximum idle time first.</summary>
    public IReadOnlyList<Clock> Gates { get; }

    /// <summary>The gate whose declared idle time bounds the isolation (the first of <see cref="Gates"/>).</summary>
    public Clock Gate => Gates[0];

    /// <summary>The shortest declared maximum idle time of the gates (null: unbounded).</summary>
    public Time? IdleBound { get; }

    /// <summary>
    /// What the node floats on top of the idle time: before the stop it has floated since its last refresh, and after
    /// the restart it floats until its window next opens — each up to the longest gap between its drivers' windows
    /// while the clocks run (<see cref="RunningIsolation.Longest"/>, L), so 2·L (first order: the stop and the restart
    /// may fall anywhere in the cycle).
    /// </summary>
    public Time AroundStopAndRestart { get; }

    /// <summary>The longest the node can float: the idle bound plus <see cref="AroundStopAndRestart"/> (null: unbounded).</summary>
    public Time? FloatBound => IdleBound is { } idle ? idle + AroundStopAndRestart : null;
}
