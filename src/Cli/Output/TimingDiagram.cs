using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Xml.Linq;
using Phaseward.Cli.Model;
using Phaseward.Clocking;
using Phaseward.Sequencing;

namespace Phaseward.Cli.Output;

/// <summary>
/// The SVG timing diagram of the root clocks that share one time base (see <see cref="TimeBase"/>: related roots
/// together, an independent clock alone): over two common cycles, one row per phase of every clock derived from them
/// (the phase's conduction window drawn as a waveform, at its offset on the time base), one lane per latch under its phase's row with a bar for each
/// transparency window, the 1-1 and 0-0 overlaps of each clock shaded across its rows, latches named by a finding
/// outlined, and a legend. Hovering a bar shows the latch's figures (SVG &lt;title&gt;).
/// </summary>
internal static class TimingDiagram
{
    public static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private const double Left = 250;
    private const double PlotWidth = 860;
    private const double Right = 24;
    private const double Top = 16;
    private const double PhaseRow = 30;
    private const double Lane = 20;
    private const double ClockGap = 12;
    private const double Cycles = 2;

    public static XElement Draw(DesignReport report, IReadOnlyList<Clock> roots)
    {
        var root = roots[0];
        var cycle = CommonCycle(roots);
        var span = cycle * Cycles;
        double X(double seconds) => Left + seconds / span * PlotWidth;

        var clocks = report.Netlist.Clocks.Where(c => roots.Contains(c.Root)).ToList();
        var latches = report.Timing.Latches.Where(t => roots.Contains(t.Phase.Clock.Root)).ToList();
        var plot = new XElement(Svg + "g", new XAttribute("class", "plot"));
        var overlaps = new XElement(Svg + "g", new XAttribute("class", "overlaps"));
        var labels = new XElement(Svg + "g", new XAttribute("class", "labels"));
        var y = Top;

        foreach (var clock in clocks)
        {
            var clockTop = y;
            foreach (var phase in new[] { clock.High, clock.Low })
            {
                var window = PhaseWindow.Of(phase);
                var onPhase = latches.Where(t => ReferenceEquals(t.Phase, phase)).ToList();
                labels.Add(Text(8, y + 19, phase.Name, "phase-label"));
                labels.Add(Text(8 + 7.2 * phase.Name.Length + 8, y + 19, KindTag(clock), "phase-kind"));
                plot.Add(Waveform(window, y, span, X, clock.CanStop));
                y += PhaseRow;
                foreach (var timing in onPhase)
                {
                    labels.Add(Text(22, y + 14, timing.Name, "latch-label"));
                    plot.Add(LatchBars(report, timing, y, span, X));
                    y += Lane;
                }
            }

            var ov = ClockOverlaps.Of(clock);
            foreach (var (interval, cls, name) in new[] { (ov.OneOne, "ov11", "1-1"), (ov.ZeroZero, "ov00", "0-0") })
            {
                var tip = $"{name} overlap of clock {clock.Name}: both phases conduct during [{interval.Start}, {interval.End}) of each period ({interval.Length})";
                foreach (var (s, e) in Segments(interval.Start.Seconds, interval.Length.Seconds, clock.Period.Seconds, span))
                    overlaps.Add(new XElement(Svg + "rect", new XAttribute("class", "overlap " + cls), new XAttribute("data-clock", clock.Name),
                        new XAttribute("data-kind", name), Attr("x", X(s)), Attr("y", clockTop), Attr("width", Math.Max(1, X(e) - X(s))),
                        Attr("height", y - clockTop), new XElement(Svg + "title", tip)));
            }

            y += ClockGap;
        }

        var plotBottom = y - ClockGap;
        var grid = new XElement(Svg + "g", new XAttribute("class", "grid"));
        foreach (var r in roots)
        {
            var period = r.Period.Seconds;
            for (var k = 0; r.Offset.Seconds + k * period <= span * (1 + 1e-9); k++)
            {
                var rise = r.Offset.Seconds + k * period;
                grid.Add(Line(X(rise), Top - 6, X(rise), plotBottom + 4, "edge rise"));
                if (rise + r.Duty * period < span)
                    grid.Add(Line(X(rise + r.Duty * period), Top, X(rise + r.Duty * period), plotBottom, "edge fall"));
            }
        }

        // The time axis.
        var axis = new XElement(Svg + "g", new XAttribute("class", "axis"));
        var axisY = plotBottom + 10;
        axis.Add(Line(X(0), axisY, X(span), axisY, "axis-line"));
        var step = NiceStep(span / 8);
        for (var i = 0; i * step <= span * (1 + 1e-9); i++)
        {
            var t = i * step;
            axis.Add(Line(X(t), axisY, X(t), axisY + 5, "tick"));
            axis.Add(Text(X(t), axisY + 18, Engineering.Format(t, "s"), "tick-label", anchor: "middle"));
        }

        axis.Add(Text(Left - 10, axisY + 18, roots.Count == 1 ? $"t ({root.Name}: {root.Period})" : $"t (cycle {new Time(cycle)})", "axis-title", anchor: "end"));
        var legendY = axisY + 34;
        var legend = Legend(legendY);
        var height = legendY + 44;

        return new XElement(Svg + "svg",
            new XAttribute("xmlns", Svg.NamespaceName),
            new XAttribute("class", "timing-diagram"),
            new XAttribute("data-root-clock", string.Join(" ", roots.Select(r => r.Name))),
            new XAttribute("role", "img"),
            Attr("width", Left + PlotWidth + Right),
            Attr("height", height),
            new XAttribute("viewBox", $"0 0 {F(Left + PlotWidth + Right)} {F(height)}"),
            new XElement(Svg + "title", $"Timing diagram of design {report.Name}, {(roots.Count == 1 ? "root clock " + root.Name : "root clocks " + string.Join(", ", roots.Select(r => r.Name)))}"
                + $"{(root.IsIndependent ? " (independent)" : string.Empty)}: phase windows and latch transparency over two cycles of {new Time(cycle)}"),
            new XElement(Svg + "rect", new XAttribute("class", "plot-bg"), Attr("x", Left), Attr("y", Top - 6), Attr("width", PlotWidth), Attr("height", plotBottom - Top + 10)),
            overlaps, grid, plot, labels, axis, legend);
    }

    private static string KindTag(Clock clock) => clock.Kind switch
    {
        ClockKind.Root => "root",
        ClockKind.Gated => $"gated ← {clock.Source!.Name}, stops {(clock.StopLevel == ClockStopLevel.High ? "high" : "low")}",
        _ => $"buffered ← {clock.Source!.Name}, +{clock.Delay}",
    };

    private static XElement Waveform(PhaseWindow window, double y, double span, Func<double, double> x, bool canStop)
    {
        var period = window.Period.Seconds;
        var high = y + 6;
        var low = y + 22;
        var points = new List<(double X, double Y)> { (x(0), InWindow(0) ? high : low) };
        var edges = new List<(double T, bool Rising)>();
        for (var k = -1; k <= Repeats(period, span); k++)
        {
            var s = window.Opens.Seconds + k * period;
            var e = s + window.Length.Seconds;
            if (s > 0 && s < span) edges.Add((s, true));
            if (e > 0 && e < span) edges.Add((e, false));
        }

        foreach (var (t, rising) in edges.OrderBy(e => e.T))
        {
            points.Add((x(t), rising ? low : high));
            points.Add((x(t), rising ? high : low));
        }

        points.Add((x(span), points[^1].Y));
        var tip = $"{window.Phase.Name} conducts during {Describe.Window(window)} of each {window.Period} period (window {window.Length})"
            + (canStop ? "; this clock can be stopped" : string.Empty);
        return new XElement(Svg + "g", new XAttribute("class", "phase"), new XAttribute("data-phase", window.Phase.Name),
            new XElement(Svg + "title", tip),
            new XElement(Svg + "rect", new XAttribute("class", "phase-hit"), Attr("x", x(0)), Attr("y", y + 2), Attr("width", x(span) - x(0)), Attr("height", 24)),
            new XElement(Svg + "polyline", new XAttribute("class", canStop ? "wave stoppable" : "wave"),
                new XAttribute("points", string.Join(" ", points.Select(p => F(p.X) + "," + F(p.Y))))));

        bool InWindow(double t)
        {
            var offset = ((t - window.Opens.Seconds) % period + period) % period;
            return offset < window.Length.Seconds;
        }
    }

    private static XElement LatchBars(DesignReport report, LatchTiming timing, double y, double span, Func<double, double> x)
    {
        var period = timing.Window.Period.Seconds;
        var latch = timing.Latch;
        var findings = report.FindingsOf(latch);
        var flagged = findings.Count > 0;
        var cls = "latch " + Describe.LatchKind(latch) + (flagged ? " flagged" : string.Empty);
        var tip = $"{timing.Name}: {Describe.LatchKind(latch)} latch on {timing.Phase.Name}\n{Describe.Location(latch.Span)}\n"
            + $"window {Describe.Window(timing.Window)} ({timing.Window.Length})\n"
            + $"setup {timing.Setup}, d-q {timing.DataToOutput}, clk-q {timing.ClockToOutput}, hold {timing.Hold}";
        if (report.Timing.Model.RegisterOf(latch) is { } register)
            tip += $"\n{(ReferenceEquals(register.Master, latch) ? "master" : "slave")} of register {register.Name}";
        foreach (var f in findings)
            tip += $"\n{f.RuleId} ({f.Severity.ToString().ToLowerInvariant()}): {f.Message}";

        var group = new XElement(Svg + "g", new XAttribute("class", cls), new XAttribute("data-latch", timing.Name),
            new XAttribute("data-phase", timing.Phase.Name), new XAttribute("data-line", latch.Span.Line.ToString(CultureInfo.InvariantCulture)),
            new XAttribute("data-setup", timing.Setup.ToString()), new XAttribute("data-hold", timing.Hold.ToString()),
            new XAttribute("data-clk-q", timing.ClockToOutput.ToString()),
            new XAttribute("data-findings", string.Join(" ", findings.Select(f => f.RuleId).Distinct())),
            new XElement(Svg + "title", tip));
        foreach (var (s, e) in Segments(timing.Window.Opens.Seconds, timing.Window.Length.Seconds, period, span))
            group.Add(new XElement(Svg + "rect", new XAttribute("class", "bar"), Attr("x", x(s)), Attr("y", y + 3), Attr("width", Math.Max(1.5, x(e) - x(s))),
                Attr("height", Lane - 6), Attr("rx", 3)));
        if (flagged)
            group.Add(new XElement(Svg + "path", new XAttribute("class", "flag"),
                new XAttribute("d", $"M{F(Left - 12)},{F(y + 4)} l5,5 l-5,5 l-5,-5 z")));
        return group;
    }

    /// <summary>The pieces of a window [start, start + length) repeated every period, clipped to [0, span).</summary>
    public static IEnumerable<(double Start, double End)> Segments(double start, double length, double period, double span)
    {
        for (var k = -1; k <= Repeats(period, span); k++)
        {
            var s = Math.Max(0, start + k * period);
            var e = Math.Min(span, start + k * period + length);
            if (e > s) yield return (s, e);
        }
    }

    private static XElement Legend(double y)
    {
        var g = new XElement(Svg + "g", new XAttribute("class", "legend"));
        var x = Left;
        void Item(XElement swatch, string text, double width)
        {
            g.Add(swatch, Text(x + 26, y + 12, text, "legend-text"));
            x += width;
        }

        Item(new XElement(Svg + "rect", new XAttribute("class", "latch static swatch bar"), Attr("x", x), Attr("y", y + 2), Attr("width", 20), Attr("height", 13), Attr("rx", 3)), "static latch", 118);
        Item(new XElement(Svg + "rect", new XAttribute("class", "latch dynamic swatch bar"), Attr("x", x), Attr("y", y + 2), Attr("width", 20), Attr("height", 13), Attr("rx", 3)), "dynamic latch", 126);
        Item(new XElement(Svg + "rect", new XAttribute("class", "latch flagged swatch bar"), Attr("x", x), Attr("y", y + 2), Attr("width", 20), Attr("height", 13), Attr("rx", 3)), "in a finding", 116);
        Item(new XElement(Svg + "polyline", new XAttribute("class", "wave swatch"), new XAttribute("points", $"{F(x)},{F(y + 15)} {F(x + 6)},{F(y + 15)} {F(x + 6)},{F(y + 2)} {F(x + 20)},{F(y + 2)}")), "phase conducts", 132);
        Item(new XElement(Svg + "polyline", new XAttribute("class", "wave stoppable swatch"), new XAttribute("points", $"{F(x)},{F(y + 15)} {F(x + 6)},{F(y + 15)} {F(x + 6)},{F(y + 2)} {F(x + 20)},{F(y + 2)}")), "can stop", 96);
        Item(new XElement(Svg + "rect", new XAttribute("class", "overlap ov11 swatch"), Attr("x", x), Attr("y", y), Attr("width", 20), Attr("height", 17)), "1-1 overlap", 112);
        Item(new XElement(Svg + "rect", new XAttribute("class", "overlap ov00 swatch"), Attr("x", x), Attr("y", y), Attr("width", 20), Attr("height", 17)), "0-0 overlap", 112);
        return g;
    }

    /// <summary>The hatch patterns the overlaps are filled with: written once per page (ids must be unique in a document).</summary>
    public static XElement Defs() => new(Svg + "svg", new XAttribute("xmlns", Svg.NamespaceName), new XAttribute("class", "shared-defs"),
        Attr("width", 0), Attr("height", 0), new XAttribute("aria-hidden", "true"), new XAttribute("style", "position:absolute"), new XElement(Svg + "defs",
        new XElement(Svg + "pattern", new XAttribute("id", "hatch11"), Attr("width", 6), Attr("height", 6), new XAttribute("patternUnits", "userSpaceOnUse"),
            new XAttribute("patternTransform", "rotate(45)"),
            new XElement(Svg + "rect", Attr("width", 6), Attr("height", 6), new XAttribute("fill", "#f3c9a6")),
            new XElement(Svg + "line", Attr("x1", 0), Attr("y1", 0), Attr("x2", 0), Attr("y2", 6), new XAttribute("stroke", "#d9662b"), Attr("stroke-width", 2.5))),
        new XElement(Svg + "pattern", new XAttribute("id", "hatch00"), Attr("width", 6), Attr("height", 6), new XAttribute("patternUnits", "userSpaceOnUse"),
            new XAttribute("patternTransform", "rotate(-45)"),
            new XElement(Svg + "rect", Attr("width", 6), Attr("height", 6), new XAttribute("fill", "#c9d4f2")),
            new XElement(Svg + "line", Attr("x1", 0), Attr("y1", 0), Attr("x2", 0), Attr("y2", 6), new XAttribute("stroke", "#4a64b8"), Attr("stroke-width", 2.5)))));

    /// <summary>
    /// The root clocks of a design grouped by time base: roots related to one another (periods in a small-integer
    /// ratio, none independent) share a diagram; an independent clock, or one unrelated to all others, is drawn apart.
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<Clock>> TimeBaseGroups(IEnumerable<Clock> roots)
    {
        var groups = new List<List<Clock>>();
        foreach (var root in roots)
        {
            var group = groups.FirstOrDefault(g => g.All(other => TimeBase.Related(root, other)));
            if (group is null) groups.Add(new List<Clock> { root });
            else group.Add(root);
        }

        return groups;
    }

    // The common cycle of related roots, in seconds.
    private static double CommonCycle(IReadOnlyList<Clock> roots)
    {
        var cycle = roots[0].Period;
        for (var i = 1; i < roots.Count; i++)
            cycle = TimeBase.CommonMultiple(cycle, roots[i].Period) ?? cycle;
        return cycle.Seconds;
    }

    private static int Repeats(double period, double span) => (int)Math.Ceiling(span / period - 1e-9);

    private static double NiceStep(double rough)
    {
        var magnitude = Math.Pow(10, Math.Floor(Math.Log10(rough)));
        foreach (var m in new[] { 1.0, 2.0, 2.5, 5.0, 10.0 })
            if (m * magnitude >= rough) return m * magnitude;
        return 10 * magnitude;
    }

    private static XElement Text(double x, double y, string text, string cls, string anchor = "start")
        => new(Svg + "text", new XAttribute("class", cls), Attr("x", x), Attr("y", y),
            anchor == "start" ? null : new XAttribute("text-anchor", anchor), text);

    private static XElement Line(double x1, double y1, double x2, double y2, string cls)
        => new(Svg + "line", new XAttribute("class", cls), Attr("x1", x1), Attr("y1", y1), Attr("x2", x2), Attr("y2", y2));

    private static XAttribute Attr(string name, double value) => new(name, F(value));

    private static string F(double value) => Math.Round(value, 2).ToString("0.##", CultureInfo.InvariantCulture);
}
