using System;
using System.Collections.Generic;
using System.Globalization;
using Phaseward.Clocking;

namespace Phaseward.Reproducers;

/// <summary>
/// Draws the clocks a deck needs as PWL sources on the design's time line: each clock and its late complement, with
/// the edges Phaseward's phase windows use (rise, duty, delay from the root, complement skew), over a given time;
/// a gated clock can be stopped at its stop level. Each phase gets a control node that is high exactly while its
/// transmission gates conduct: the clock high or the complement low for a High phase, and the reverse for Low.
/// </summary>
internal sealed class ClockWaveforms
{
    private readonly DeckWriter deck;
    private readonly Time end;
    private readonly Func<Clock, (Time At, ClockStopLevel Level)?> stops;
    private readonly Func<Clock, Time> shifts;
    private readonly Dictionary<Clock, (string Clock, string Complement)> drawn = new();
    private readonly Dictionary<Phase, string> controls = new();

    /// <param name="deck">The deck the sources are written into.</param>
    /// <param name="end">Where the simulation ends.</param>
    /// <param name="stops">When and at which level a gated clock stops (null: never).</param>
    /// <param name="shifts">A shift of a clock's edges against the time line (none by default): for clocks with no
    /// fixed time relation, whose phase to each other drifts, a deck may draw them at the worst one.</param>
    public ClockWaveforms(DeckWriter deck, Time end, Func<Clock, (Time At, ClockStopLevel Level)?>? stops = null, Func<Clock, Time>? shifts = null)
    {
        this.deck = deck;
        this.end = end;
        this.stops = stops ?? (_ => null);
        this.shifts = shifts ?? (_ => Time.Zero);
    }

    /// <summary>The 10 %–90 % edge time used for every clock edge: 1 % of the shorter half period, at most 10 ps.</summary>
    public static Time EdgeTime(Clock clock)
    {
        var (_, high, _, period) = Edges(clock);
        var shorter = Math.Min(high.Seconds, period.Seconds - high.Seconds);
        return new Time(Math.Min(10e-12, shorter / 100));
    }

    /// <summary>Rise time in [0, T), high time, complement skew and period, from the clock's two phase windows.</summary>
    public static (Time Rise, Time High, Time Skew, Time Period) Edges(Clock clock)
    {
        var high = PhaseWindow.Of(clock.High);
        var low = PhaseWindow.Of(clock.Low);
        var period = high.Period;
        var skew = (high.Length + low.Length - period) / 2;
        return (high.Opens, high.Length - skew, skew, period);
    }

    /// <summary>The first instant at or after <paramref name="after"/> at which the phase starts to conduct.</summary>
    public static Time NextOpening(Phase phase, Time after)
    {
        var window = PhaseWindow.Of(phase);
        var k = Math.Ceiling((after - window.Opens) / window.Period - 1e-9);
        return window.Opens + window.Period * Math.Max(k, 0);
    }

    /// <summary>The control node of a phase: above vdd/2 exactly while gates on the phase conduct.</summary>
    public string Control(Phase phase)
    {
        if (controls.TryGetValue(phase, out var node)) return node;
        var (clk, clkb) = Draw(phase.Clock);
        node = deck.Fresh("on_" + DeckWriter.Safe(phase.Name));
        var expression = phase.Polarity == ClockPolarity.High
            ? $"max(V({clk}), {{vdd}} - V({clkb}))"
            : $"max({{vdd}} - V({clk}), V({clkb}))";
        deck.Element($"{deck.NextName("B")}_{node} {node} 0 V = {expression}   $ {phase.Name} conducts: {(phase.Polarity == ClockPolarity.High ? "clock high or complement low" : "clock low or complement high")}");
        controls[phase] = node;
        return node;
    }

    /// <summary>The node of the clock's own waveform (not a phase's conduction).</summary>
    public string ClockNode(Clock clock) => Draw(clock).Clock;

    /// <summary>The node of the clock's late complement.</summary>
    public string ComplementNode(Clock clock) => Draw(clock).Complement;

    private (string Clock, string Complement) Draw(Clock clock)
    {
        if (drawn.TryGetValue(clock, out var nodes)) return nodes;
        var (rise, high, skew, period) = Edges(clock);
        var shift = shifts(clock);
        rise += shift;
        var edge = EdgeTime(clock).Seconds;
        var stop = stops(clock);
        var clk = deck.Fresh("clk_" + DeckWriter.Safe(clock.Name));
        var clkb = deck.Fresh("clkb_" + DeckWriter.Safe(clock.Name));
        var vdd = deck.Supply;
        deck.Comment($"clock '{clock.Name}' ({clock.Kind}{(clock.Kind == ClockKind.Root ? string.Empty : " of root " + clock.Root.Name)}): period {period}, high {high} from {rise} into each period, complement {skew} late"
            + (shift == Time.Zero ? string.Empty : $"; drawn {shift} shifted on the time line")
            + (stop is { } s ? $"; stopped {s.Level.ToString().ToLowerInvariant()} from {new Time(s.At.Seconds)}" : string.Empty));
        deck.Pwl(clk, Points(rise, high, period, Time.Zero, edge, stop, vdd, invert: false), $"clock {clock.Name}");
        deck.Pwl(clkb, Points(rise, high, period, skew, edge, stop, vdd, invert: true), $"its complement, {skew} late");
        nodes = (clk, clkb);
        drawn[clock] = nodes;
        return nodes;
    }

    private List<(double Time, double Volts)> Points(Time rise, Time high, Time period, Time delay, double edge,
        (Time At, ClockStopLevel Level)? stop, double vdd, bool invert)
    {
        double Level(bool isHigh) => isHigh != invert ? vdd : 0;
        var t0 = delay.Seconds;
        var T = period.Seconds;
        // Where in its period the clock is at time 0, and the edges after it.
        var first = Math.Floor((0 - t0 - rise.Seconds) / T) - 1;
        var edges = new List<(double At, bool High)>();
        for (var k = first; ; k++)
        {
            var up = t0 + rise.Seconds + k * T;
            var down = up + high.Seconds;
            if (up > end.Seconds) break;
            edges.Add((up, true));
            edges.Add((down, false));
        }

        var stopAt = stop?.At.Seconds + t0;
        var stopHigh = stop?.Level == ClockStopLevel.High;
        var points = new List<(double, double)>();
        bool current = false;
        foreach (var (at, isHigh) in edges)
            if (at <= 0) current = isHigh;
        points.Add((0, Level(current)));
        foreach (var (at, isHigh) in edges)
        {
            if (at <= 0 || at >= end.Seconds) continue;
            if (stopAt is { } s && at >= s) break;
            if (at - edge / 2 <= points[points.Count - 1].Item1) continue;
            points.Add((at - edge / 2, Level(current)));
            points.Add((at + edge / 2, Level(isHigh)));
            current = isHigh;
        }

        if (stopAt is { } from && current != stopHigh && from < end.Seconds)
        {
            var at = Math.Max(from, points[points.Count - 1].Item1 + edge);
            points.Add((at, Level(current)));
            points.Add((at + edge, Level(stopHigh)));
        }

        points.Add((end.Seconds, points[points.Count - 1].Item2));
        return points;
    }

    public static string Invariant(int value) => value.ToString(CultureInfo.InvariantCulture);
}
