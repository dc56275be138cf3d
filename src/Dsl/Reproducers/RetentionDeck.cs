using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Storage;

namespace Phaseward.Reproducers;

/// <summary>
/// PW3001 and PW3002: the storage node with its capacitance, its leakage and every pass device that drives it, each
/// on its own clock drawn on the design's time line; the drivers' inputs hold the stored level (vdd: a 1, which the
/// leak to ground drains). PW3001: the gated clocks run two cycles, then stop at their stop level and stay stopped.
/// PW3002: the clocks run, and the deck watches the longest stretch of a period in which no driver conducts.
/// Measures <c>t_ret</c>: from the moment the last driver stops conducting to the node's level falling by the
/// tolerated droop.
/// </summary>
internal static class RetentionDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var node = DeckInputs.StorageNodeByName(finding, netlist, FindingPropertyKeys.Node);
        var retention = node.Retention;
        var stopped = finding.RuleId == RuleCatalog.DynamicNodeOnGatedClock.Id;
        var deck = new DeckWriter(finding, netlist);
        var dv = retention.ToleratedDroop.Volts;
        deck.Param("dv", SpiceNumbers.Of(dv), "tolerated droop (V), the process figure");

        var clocked = new List<Device>();
        foreach (var driver in node.Drivers)
            if (driver.ClockControl is not null) clocked.Add(driver);
        if (clocked.Count == 0)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: storage node '{node.Net.Name}' has no clocked driver to draw.", nameof(finding));

        Time floatsFrom;
        Time end;
        Func<Clock, (Time At, ClockStopLevel Level)?>? stops = null;
        string watch;
        if (stopped)
        {
            var isolation = StorageIsolation.WhileStopped(node)
                ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: storage node '{node.Net.Name}' does not float while its gated clocks are stopped.", nameof(finding));
            var root = isolation.Gate.Root;
            var stopAfter = root.Period * 2;
            var stopsByClock = new Dictionary<Clock, (Time, ClockStopLevel)>();
            foreach (var driver in clocked)
                if (GateOf(driver.ClockControl!.Clock, isolation.Gates) is { } gate)
                    stopsByClock[driver.ClockControl.Clock] = (NextEdgeTo(driver.ClockControl.Clock, gate.StopLevel, stopAfter), gate.StopLevel);
            stops = c => stopsByClock.TryGetValue(c, out var s) ? s : null;
            floatsFrom = stopAfter + root.Period;
            end = floatsFrom + retention.Time * 1.5;
            watch = "FALL=LAST";
            deck.Describe($"Sub-circuit: storage node '{node.Net.Name}' (C = {retention.Capacitance}) with its leakage {retention.Leakage} and its {node.Drivers.Count} driver(s); gated clock(s) {string.Join(", ", Names(isolation.Gates))} run two cycles of '{root.Name}', then stop and stay stopped.");
            deck.Describe($"Measured: t_ret, from the last moment a driver conducts to '{node.Net.Name}' falling by the tolerated droop dv (Phaseward's estimate C·ΔV/I_leak).");
        }
        else
        {
            var isolation = StorageIsolation.WhileRunning(node)
                ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: storage node '{node.Net.Name}' is refreshed throughout every period.", nameof(finding));
            var period = isolation.Root.Period;
            var arcs = new List<Arc>();
            foreach (var driver in isolation.Drivers)
                arcs.Add(PhaseWindow.ArcOf(driver.ClockControl!));
            var gapStart = LongestGapStart(arcs, period);
            // The second period's longest gap: the node has been refreshed before it.
            floatsFrom = period + gapStart;
            end = floatsFrom + isolation.Longest + period * 0.25;
            watch = "FALL=1 TD=" + SpiceNumbers.Of(floatsFrom - period * 0.01);
            deck.Describe($"Sub-circuit: storage node '{node.Net.Name}' (C = {retention.Capacitance}) with its leakage {retention.Leakage} and its {node.Drivers.Count} driver(s) on clock '{isolation.Root.Name}' (period {period}), running; the node floats for up to {isolation.Longest} per period.");
            deck.Describe($"Measured: t_ret, from the start of the longest floating stretch (second period) to '{node.Net.Name}' falling by the tolerated droop dv (Phaseward's estimate C·ΔV/I_leak), and v_end_of_float, the node's level when the next driver window opens.");
        }

        deck.Describe("The drivers' inputs hold vdd (a stored 1; the leak to ground drains it). Drivers controlled by data nets are held off (the node floats, as the rule assumes).");
        var clocks = new ClockWaveforms(deck, end, stops);
        var storage = deck.Node(node.Net);
        var data = deck.Fresh("stored_level");
        deck.Dc(data, "{vdd}", "the level being stored");
        string? off = null;
        var controls = new List<string>();
        foreach (var driver in node.Drivers)
        {
            if (driver.ClockControl is { } phase)
            {
                var control = clocks.Control(phase);
                controls.Add(control);
                deck.PassGate(driver, data, storage, control);
            }
            else
            {
                if (off is null)
                {
                    off = deck.Fresh("off");
                    deck.Dc(off, "0", "data-controlled drivers held off");
                }

                deck.PassGate(driver, data, storage, off);
            }
        }

        deck.Capacitor(storage, retention.Capacitance, $"'{node.Net.Name}'");
        deck.Leakage(storage, retention.Leakage);
        var anyOn = deck.Fresh("any_driver_on");
        deck.Element($"B_any {anyOn} 0 V = {Max(controls)}   $ high while any clocked driver conducts");

        var maxStep = Time.Min(retention.Time / 400, end / 400);
        deck.Transient(maxStep / 10, end, maxStep);
        deck.Measure($".meas tran t_ret TRIG v({anyOn}) VAL={{vdd/2}} {watch} TARG v({storage}) VAL={{vdd-dv}} {watch}",
            new DeckEstimate("t_ret", retention.Time.Seconds, "s", "retention time C·ΔV/I_leak"));
        if (!stopped)
            deck.Measure($".meas tran v_min MIN v({storage}) FROM={SpiceNumbers.Of(floatsFrom)} TO={SpiceNumbers.Of(end)}", null);
        return deck.Build();
    }

    private static string Max(IReadOnlyList<string> nodes)
    {
        var text = "V(" + nodes[0] + ")";
        for (var i = 1; i < nodes.Count; i++)
            text = $"max({text}, V({nodes[i]}))";
        return text;
    }

    private static IEnumerable<string> Names(IReadOnlyList<Clock> clocks)
    {
        foreach (var c in clocks) yield return c.Name;
    }

    // The gate among the stopped ones that this clock is, or derives from.
    private static Clock? GateOf(Clock clock, IReadOnlyList<Clock> gates)
    {
        for (Clock? c = clock; c is not null; c = c.Source)
            foreach (var gate in gates)
                if (ReferenceEquals(gate, c))
                    return gate;
        return null;
    }

    // The clock's first edge to the given level at or after 'after' (the gate stops it there, without a glitch).
    private static Time NextEdgeTo(Clock clock, ClockStopLevel level, Time after)
    {
        var (rise, high, _, period) = ClockWaveforms.Edges(clock);
        var edge = level == ClockStopLevel.High ? rise : rise + high;
        var k = Math.Ceiling((after - edge) / period);
        return edge + period * k;
    }

    // Start (in [0, T)) of the longest stretch of the period covered by none of the arcs.
    private static Time LongestGapStart(IReadOnlyList<Arc> arcs, Time period)
    {
        var T = period.Seconds;
        var covered = new List<(double Start, double End)>();
        foreach (var arc in arcs)
        {
            var start = arc.Opens.Seconds % T;
            covered.Add((start, start + arc.Length.Seconds));
            covered.Add((start - T, start - T + arc.Length.Seconds));
            covered.Add((start + T, start + T + arc.Length.Seconds));
        }

        covered.Sort((a, b) => a.Start.CompareTo(b.Start));
        var bestStart = 0.0;
        var bestLength = -1.0;
        var reach = double.NegativeInfinity;
        foreach (var (start, endAt) in covered)
        {
            if (reach > double.NegativeInfinity && start > reach && reach >= 0 && reach < T && start - reach > bestLength)
            {
                bestLength = start - reach;
                bestStart = reach;
            }

            reach = Math.Max(reach, endAt);
        }

        return new Time(bestStart);
    }
}
