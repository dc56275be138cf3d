using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Net;
using System.Text;
using Phaseward.Checking;
using Phaseward.Cli.Loading;
using Phaseward.Cli.Model;
using Phaseward.Cli.Policy;
using Phaseward.Cli.Reproduction;
using Phaseward.Clocking;
using Phaseward.Storage;

namespace Phaseward.Cli.Output;

/// <summary>
/// The HTML page: self-contained (inline CSS and SVG, no script, no external font, image or link target), and
/// well-formed XML as well as HTML, so tests can read it with an XML parser.
/// </summary>
internal static class HtmlReport
{
    /// <param name="decks">The decks written with --spice (each finding links its deck, and shows what ngspice measured
    /// with --confirm); null when none were written.</param>
    public static string Render(string input, IReadOnlyList<DesignReport> reports, IReadOnlyList<SkippedDesign> skipped,
        IReadOnlyList<ExportedDeck>? decks = null, string? pagePath = null)
    {
        var h = new StringBuilder();
        h.AppendLine("<!DOCTYPE html>");
        h.AppendLine("<html lang=\"en\">");
        h.AppendLine("<head>");
        h.AppendLine("<meta charset=\"utf-8\" />");
        h.AppendLine("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />");
        h.Append("<title>Phaseward design report: ").Append(E(Path.GetFileName(input))).AppendLine("</title>");
        h.Append("<style>").Append(Css).AppendLine("</style>");
        h.AppendLine("</head>");
        h.AppendLine("<body>");
        h.AppendLine(TimingDiagram.Defs().ToString(System.Xml.Linq.SaveOptions.DisableFormatting));
        h.Append("<header><h1>Phaseward design report</h1><p class=\"input\">").Append(E(Describe.DisplayPath(input))).AppendLine("</p>");
        h.AppendLine("<nav><ul class=\"designs\">");
        var shared = SharedNames(reports);
        foreach (var r in reports)
        {
            var counts = Counts(r);
            h.Append("<li><a href=\"#").Append(E(Anchor(r, shared))).Append("\">").Append(E(Label(r, shared))).Append("</a> ").Append(counts).AppendLine("</li>");
        }

        h.AppendLine("</ul></nav>");
        if (skipped.Count > 0)
        {
            h.AppendLine("<p class=\"skipped\">Skipped: ");
            h.Append(string.Join("; ", skipped.Select(s => E(s.TypeName) + " (" + E(s.Reason) + ")")));
            h.AppendLine("</p>");
        }

        h.Append("<p class=\"caution\">").Append(E(Describe.Caution)).AppendLine("</p></header>");
        foreach (var r in reports)
            Design(h, r, shared, decks, pagePath);
        h.AppendLine("</body>");
        h.AppendLine("</html>");
        return h.ToString();
    }

    private static void Design(StringBuilder h, DesignReport r, ISet<string> shared, IReadOnlyList<ExportedDeck>? decks, string? pagePath)
    {
        var n = r.Netlist;
        h.Append("<section class=\"design\" id=\"").Append(E(Anchor(r, shared))).Append("\" data-design=\"").Append(E(r.Name)).AppendLine("\">");
        h.Append("<h2>").Append(E(r.Name)).Append(" <small>").Append(E(r.TypeName)).Append(" · ")
            .Append(Describe.Count(n.Devices.Count, "device")).Append(", ").Append(Describe.Count(n.Nets.Count, "net")).Append(", ")
            .Append(Describe.Count(n.Clocks.Count, "clock")).AppendLine("</small></h2>");
        h.Append("<p class=\"process\">").Append(E(EstimateCaution.ProcessLine(n.Process))).AppendLine("</p>");

        h.AppendLine("<h3>Findings</h3>");
        if (r.Findings.Count == 0)
            h.Append("<p class=\"clean\">No findings.").Append(r.Suppressed > 0 ? $" ({r.Suppressed} left out: severity none)" : string.Empty).AppendLine("</p>");
        else if (decks is null)
            Table(h, "findings", new[] { "severity", "rule", "location", "message" }, r.Findings.Select(f => new[]
            {
                Chip(f.Severity), E(f.RuleId), E(Describe.Location(f.Location)), E(f.Message),
            }), rowClass: r.Findings.Select(f => "sev-" + SeverityPolicy.Name(f.Severity)).ToList());
        else
            Table(h, "findings", new[] { "severity", "rule", "location", "message", "SPICE deck" }, r.Findings.Select(f => new[]
            {
                Chip(f.Severity), E(f.RuleId), E(Describe.Location(f.Location)), E(f.Message), DeckCell(decks.FirstOrDefault(d => ReferenceEquals(d.Finding, f)), pagePath),
            }), rowClass: r.Findings.Select(f => "sev-" + SeverityPolicy.Name(f.Severity)).ToList());

        h.AppendLine("<h3>Clock phases and latch windows</h3>");
        if (n.Clocks.Count == 0)
        {
            h.Append("<p class=\"no-clocks\">Design '").Append(E(r.Name)).AppendLine("' has no clocks: there are no phase windows, latches or timing figures to draw.</p>");
        }
        else
        {
            foreach (var group in TimingDiagram.TimeBaseGroups(r.RootClocks))
            {
                h.Append("<figure class=\"diagram\">");
                h.Append(TimingDiagram.Draw(r, group).ToString(System.Xml.Linq.SaveOptions.DisableFormatting));
                var names = string.Join(", ", group.Select(root => "<b>" + E(root.Name) + "</b> (" + E(Describe.ClockKindText(root)) + ")"));
                var independent = group[0].IsIndependent ? " It is declared independent: its own crystal, with no fixed time relation to the other clocks, so it is drawn apart." : string.Empty;
                h.Append("<figcaption>").Append(group.Count == 1 ? "Root clock " : "Root clocks on one time base: ").Append(names)
                    .Append(", two cycles; time 0 is the design's time base (each root rises at its offset).").Append(independent)
                    .AppendLine(" Hover a bar or a waveform for its figures.</figcaption></figure>");
            }

            Table(h, "clocks", new[] { "phase", "clock", "window", "1-1 overlap", "0-0 overlap" }, n.Clocks.SelectMany(c =>
            {
                var ov = ClockOverlaps.Of(c);
                return new[] { c.High, c.Low }.Select(p => new[]
                {
                    E(p.Name), E(Describe.ClockKindText(c)), E(Describe.Window(PhaseWindow.Of(p))), E(ov.OneOne.Length.ToString()), E(ov.ZeroZero.Length.ToString()),
                });
            }), numeric: new[] { 3, 4 });
        }

        if (r.Timing.Registers.Count > 0)
        {
            h.AppendLine("<h3>Registers</h3><p class=\"note\">Setup and clk-q at the " + E(r.Timing.CornerText) + "; clk-q min and hold at the "
                + E(r.FastTiming.CornerText) + ".</p>");
            Table(h, "registers", new[] { "register", "clock", "edge", "setup", "clk-q", "clk-q min", "hold", "location" },
                r.Timing.Registers.Zip(r.FastTiming.Registers, (t, fast) => new[]
                {
                    E(t.Name), E(t.Clock.Name), t.Register.IsPositiveEdge ? "rising" : "falling", E(t.Setup.ToString()), E(t.ClockToOutput.ToString()),
                    E(fast.ClockToOutputMin.ToString()), E(fast.Hold.ToString()), E(Describe.ShortLocation(t.Register.Span)),
                }), numeric: new[] { 3, 4, 5, 6 });
        }

        if (r.Timing.Latches.Count > 0)
        {
            h.AppendLine("<h3>Latches</h3><p class=\"note\">At the " + E(r.Timing.CornerText) + ".</p>");
            Table(h, "latches", new[] { "latch", "phase", "kind", "window", "setup", "d-q", "clk-q", "hold", "location", "findings" },
                r.Timing.Latches.Select(t => new[]
                {
                    E(t.Name), E(t.Phase.Name), Describe.LatchKind(t.Latch), E(Describe.Window(t.Window)), E(t.Setup.ToString()), E(t.DataToOutput.ToString()),
                    E(t.ClockToOutput.ToString()), E(t.Hold.ToString()), E(Describe.ShortLocation(t.Latch.Span)), E(Describe.FindingIds(r, t.Latch)),
                }), numeric: new[] { 4, 5, 6, 7 });
        }

        if (r.Paths.Count > 0)
        {
            h.AppendLine("<h3>Checked paths</h3><p class=\"note\">Setup and borrowing: the path must not exceed the limit. Hold and race: the path must exceed it.</p>");
            Table(h, "paths", new[] { "check", "from", "to", "limit", "path", "slack", "status", "rule" },
                r.Paths.Select(p => new[]
                {
                    E(p.Check), E(p.From), E(p.To), E(p.Required.ToString()), E(p.Actual.ToString()), E(p.Slack.ToString()),
                    p.Fails ? "<b class=\"fails\">fails</b>" : "ok", E(p.RuleId),
                }), numeric: new[] { 3, 4, 5 });
        }

        if (r.Chains.Count > 0)
        {
            h.AppendLine("<h3>Pass-gate chains</h3>");
            Table(h, "chains", new[] { "gates", "first", "last", "Elmore", "50% delay", "limit", "status", "location" },
                r.Chains.Select(c => new[]
                {
                    c.Length.ToString(CultureInfo.InvariantCulture), E(c.First.Name), E(c.Last.Name), E(c.ElmoreDelay.ToString()), E(c.FiftyPercentDelay.ToString()),
                    c.Limit.ToString(CultureInfo.InvariantCulture), c.ExceedsLimit ? "<b class=\"fails\">too long</b>" : "ok", E(Describe.ShortLocation(c.First.Span)),
                }), numeric: new[] { 0, 3, 4, 5 });
        }

        if (r.Storage.Count > 0)
        {
            h.AppendLine("<h3>Storage nodes</h3><p class=\"note\">Retention t_ret = C·ΔV / I_leak.</p>");
            Table(h, "storage", new[] { "node", "kind", "cell", "clocked by", "retention", "C", "ΔV", "I_leak", "floats (running)", "while stopped" },
                r.Storage.Select(s => new[]
                {
                    E(s.Node.Net.Name), s.Node.Kind == StorageKind.Dynamic ? "dynamic" : "clocked feedback", E(s.Node.Cell?.Name ?? "-"), E(s.Clock),
                    E(s.Node.Retention.Time.ToString()), E(s.Node.Retention.Capacitance.ToString()), E(s.Node.Retention.ToleratedDroop.ToString()),
                    E(s.Node.Retention.Leakage.ToString()), E(s.FloatsWhileRunning?.ToString() ?? "-"), E(s.WhileStopped),
                }), numeric: new[] { 4, 5, 6, 7, 8 });
        }

        h.AppendLine("</section>");
    }

    // The finding's deck as a link relative to the page, with the simulated figures when --confirm ran it.
    private static string DeckCell(ExportedDeck? deck, string? pagePath)
    {
        if (deck is null) return "<span class=\"no-deck\">none</span>";
        var folder = pagePath is null ? null : Path.GetDirectoryName(Path.GetFullPath(pagePath));
        var href = (folder is null ? deck.Path : Path.GetRelativePath(folder, deck.Path)).Replace('\\', '/');
        var link = "<a class=\"deck\" href=\"" + E(string.Join("/", href.Split('/').Select(System.Uri.EscapeDataString))) + "\">" + E(Path.GetFileName(deck.Path)) + "</a>";
        var simulated = DeckConfirmation.Summary(deck);
        return simulated.Length == 0 ? link : link + "<br /><span class=\"simulated\">simulated: " + E(simulated) + "</span>";
    }

    private static void Table(StringBuilder h, string cls, string[] headers, IEnumerable<string[]> rows, int[]? numeric = null, IReadOnlyList<string>? rowClass = null)
    {
        numeric ??= System.Array.Empty<int>();
        h.Append("<table class=\"").Append(cls).Append("\"><thead><tr>");
        foreach (var header in headers)
            h.Append("<th>").Append(E(header)).Append("</th>");
        h.AppendLine("</tr></thead><tbody>");
        var i = 0;
        foreach (var row in rows)
        {
            h.Append(rowClass is null ? "<tr>" : $"<tr class=\"{rowClass[i]}\">");
            for (var c = 0; c < row.Length; c++)
                h.Append(numeric.Contains(c) ? "<td class=\"num\">" : "<td>").Append(row[c]).Append("</td>");
            h.AppendLine("</tr>");
            i++;
        }

        h.AppendLine("</tbody></table>");
    }

    private static string Counts(DesignReport r)
    {
        if (r.Findings.Count == 0) return "<span class=\"count clean\">clean</span>";
        var parts = new[] { ReportSeverity.Error, ReportSeverity.Warning, ReportSeverity.Info }
            .Select(s => (s, r.Findings.Count(f => f.Severity == s))).Where(x => x.Item2 > 0)
            .Select(x => $"<span class=\"count sev-{SeverityPolicy.Name(x.s)}\">{Describe.Count(x.Item2, x.s)}</span>");
        return string.Join(" ", parts);
    }

    private static string Chip(ReportSeverity severity) => $"<span class=\"chip sev-{SeverityPolicy.Name(severity)}\">{SeverityPolicy.Name(severity)}</span>";

    // Design names that more than one report carries (classes of one name in different namespaces): those are shown,
    // and linked, by their full type name, so the two links differ.
    private static ISet<string> SharedNames(IReadOnlyList<DesignReport> reports)
        => new HashSet<string>(reports.GroupBy(r => r.Name, StringComparer.Ordinal).Where(g => g.Count() > 1).Select(g => g.Key), StringComparer.Ordinal);

    private static string Label(DesignReport r, ISet<string> shared) => shared.Contains(r.Name) ? r.TypeName : r.Name;

    private static string Anchor(DesignReport r, ISet<string> shared) => "design-" + Label(r, shared);

    private static string E(string text) => WebUtility.HtmlEncode(text);

    private const string Css = @"
:root { --ink:#1d2433; --muted:#5b6478; --paper:#fbfaf7; --rule:#d9d4c7; --static:#2a8c82; --dynamic:#d98e04; --flag:#b0003a; }
* { box-sizing: border-box; }
body { margin: 0; padding: 20px 28px 40px; background: var(--paper); color: var(--ink); font: 14px/1.45 system-ui, -apple-system, 'Segoe UI', sans-serif; }
h1 { font-size: 22px; margin: 0 0 2px; letter-spacing: .2px; }
h2 { font-size: 19px; margin: 28px 0 6px; padding-top: 14px; border-top: 2px solid var(--rule); }
h2 small { font-size: 13px; font-weight: normal; color: var(--muted); }
h3 { font-size: 15px; margin: 16px 0 6px; }
.input, .note, figcaption, .skipped { color: var(--muted); font-size: 13px; }
.caution { font-size: 12.5px; color: var(--muted); border-left: 3px solid var(--dynamic); padding-left: 8px; max-width: 980px; }
ul.designs { list-style: none; padding: 0; margin: 8px 0; display: flex; flex-wrap: wrap; gap: 6px 18px; }
a { color: #1f5fa8; }
table { border-collapse: collapse; margin: 4px 0 10px; font-size: 13px; }
th, td { border-bottom: 1px solid var(--rule); padding: 3px 10px 3px 0; text-align: left; vertical-align: top; }
th { font-weight: 600; color: var(--muted); }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
.chip, .count { display: inline-block; border-radius: 9px; padding: 0 7px; font-size: 12px; font-weight: 600; color: #fff; background: var(--muted); }
.sev-error.chip, .count.sev-error { background: var(--flag); }
.sev-warning.chip, .count.sev-warning { background: #b86e00; }
.sev-info.chip, .count.sev-info { background: #4a64b8; }
.count.clean { background: var(--static); }
.fails { color: var(--flag); }
.no-clocks { font-style: italic; }
figure.diagram { margin: 6px 0 12px; }
svg.timing-diagram { background: #fff; border: 1px solid var(--rule); border-radius: 6px; max-width: 100%; height: auto; }
svg .plot-bg { fill: #fdfcf9; }
svg text { font: 12px system-ui, -apple-system, 'Segoe UI', sans-serif; fill: var(--ink); }
svg .phase-label { font-weight: 600; }
svg .phase-kind, svg .tick-label, svg .axis-title { fill: var(--muted); font-size: 11px; }
svg .latch-label { font-size: 11.5px; }
svg .wave { fill: none; stroke: var(--ink); stroke-width: 1.6; }
svg .wave.stoppable { stroke-dasharray: 5 3; }
svg .phase-hit { fill: transparent; }
svg .edge.rise { stroke: #8a93a6; stroke-width: 1; stroke-dasharray: 4 3; }
svg .edge.fall { stroke: #b9bfcc; stroke-width: 1; stroke-dasharray: 1 3; }
svg .axis-line, svg .tick { stroke: var(--muted); stroke-width: 1; }
svg .latch.static .bar { fill: var(--static); }
svg .latch.dynamic .bar { fill: var(--dynamic); }
svg .latch.flagged .bar { stroke: var(--flag); stroke-width: 2.5; }
svg .latch.flagged.swatch { fill: #fff; stroke: var(--flag); stroke-width: 2.5; }
svg .latch.static.swatch { fill: var(--static); }
svg .latch.dynamic.swatch { fill: var(--dynamic); }
svg .latch:hover .bar { filter: brightness(1.15); }
svg .flag { fill: var(--flag); }
svg .overlap { opacity: .75; }
svg .overlap.ov11 { fill: url(#hatch11); }
svg .overlap.ov00 { fill: url(#hatch00); }
";
}
