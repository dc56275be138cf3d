using System.Collections.Generic;
using System.IO;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Cli.Model;
using Phaseward.Cli.Policy;
using Phaseward.Clocking;
using Phaseward.Storage;

namespace Phaseward.Cli.Output;

/// <summary>The console report: per design, its findings and aligned tables of clocks, registers, latches, checked paths,
/// pass-gate chains and storage nodes.</summary>
internal static class TextReport
{
    public static void Write(TextWriter w, IReadOnlyList<DesignReport> reports)
    {
        foreach (var report in reports)
        {
            WriteDesign(w, report);
            w.WriteLine();
        }
    }

    public static void WriteDesign(TextWriter w, DesignReport r)
    {
        var n = r.Netlist;
        w.WriteLine($"== Design '{r.Name}' ({r.TypeName}): {Describe.Count(n.Devices.Count, "device")}, {Describe.Count(n.Nets.Count, "net")}, {Describe.Count(n.Clocks.Count, "clock")}");
        w.WriteLine(EstimateCaution.ProcessLine(n.Process));

        var errors = r.Findings.Count(f => f.Severity == ReportSeverity.Error);
        var warnings = r.Findings.Count(f => f.Severity == ReportSeverity.Warning);
        var infos = r.Findings.Count(f => f.Severity == ReportSeverity.Info);
        w.WriteLine(r.Findings.Count == 0
            ? "Findings: none" + (r.Suppressed > 0 ? $" ({r.Suppressed} left out: severity none)" : string.Empty)
            : $"Findings: {Describe.Count(errors, ReportSeverity.Error)}, {Describe.Count(warnings, ReportSeverity.Warning)}, {Describe.Count(infos, ReportSeverity.Info)}" + (r.Suppressed > 0 ? $" ({r.Suppressed} left out: severity none)" : string.Empty));
        if (r.Findings.Count > 0)
        {
            var findings = new TextTable("severity", "rule", "location", "message");
            foreach (var f in r.Findings)
                findings.Add(SeverityPolicy.Name(f.Severity), f.RuleId, Describe.Location(f.Location), f.Message);
            findings.Write(w);
        }

        w.WriteLine();
        if (n.Clocks.Count == 0)
        {
            w.WriteLine($"Clocks: design '{r.Name}' has no clocks, so there are no phase windows, latches or timing figures to show.");
        }
        else
        {
            w.WriteLine("Clocks and phase windows (time 0 = the root clock's rising edge)");
            var clocks = new TextTable("phase", "clock", "window", ">1-1 overlap", ">0-0 overlap");
            foreach (var clock in n.Clocks)
            {
                var overlaps = ClockOverlaps.Of(clock);
                foreach (var phase in new[] { clock.High, clock.Low })
                    clocks.Add(phase.Name, Describe.ClockKindText(clock), Describe.Window(PhaseWindow.Of(phase)),
                        overlaps.OneOne.Length, overlaps.ZeroZero.Length);
            }

            clocks.Write(w);
        }

        if (r.Timing.Registers.Count > 0)
        {
            w.WriteLine();
            w.WriteLine($"Registers (setup, clk-q: {r.Timing.CornerText}; clk-q min, hold: {r.FastTiming.CornerText})");
            var registers = new TextTable("register", "clock", "edge", ">setup", ">clk-q", ">clk-q min", ">hold", "location");
            foreach (var (t, fast) in r.Timing.Registers.Zip(r.FastTiming.Registers, (slow, fast) => (slow, fast)))
                registers.Add(t.Name, t.Clock.Name, t.Register.IsPositiveEdge ? "rising" : "falling", t.Setup, t.ClockToOutput,
                    fast.ClockToOutputMin, fast.Hold, Describe.ShortLocation(t.Register.Span));
            registers.Write(w);
        }

        if (r.Timing.Latches.Count > 0)
        {
            w.WriteLine();
            w.WriteLine($"Latches ({r.Timing.CornerText})");
            var latches = new TextTable("latch", "phase", "kind", "window", ">setup", ">d-q", ">clk-q", ">hold", "location", "findings");
            foreach (var t in r.Timing.Latches)
                latches.Add(t.Name, t.Phase.Name, Describe.LatchKind(t.Latch), Describe.Window(t.Window), t.Setup, t.DataToOutput,
                    t.ClockToOutput, t.Hold, Describe.ShortLocation(t.Latch.Span), Describe.FindingIds(r, t.Latch));
            latches.Write(w);
        }

        if (r.Paths.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("Checked paths (setup, borrowing: path must not exceed limit; hold, race: path must exceed limit)");
            var paths = new TextTable("check", "from", "to", ">limit", ">path", ">slack", "status", "rule");
            foreach (var p in r.Paths)
                paths.Add(p.Check, p.From, p.To, p.Required, p.Actual, p.Slack, p.Fails ? "FAILS" : "ok", p.RuleId);
            paths.Write(w);
        }

        if (r.Chains.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("Pass-gate chains (two or more pass gates in series with no restoring stage)");
            var chains = new TextTable(">gates", "first", "last", ">Elmore", ">50% delay", ">limit", "status", "location");
            foreach (var c in r.Chains)
                chains.Add(c.Length, c.First.Name, c.Last.Name, c.ElmoreDelay, c.FiftyPercentDelay, c.Limit,
                    c.ExceedsLimit ? "TOO LONG" : "ok", Describe.ShortLocation(c.First.Span));
            chains.Write(w);
        }

        if (r.Storage.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("Storage nodes (t_ret = C·ΔV / I_leak)");
            var storage = new TextTable("node", "kind", "cell", "clocked by", ">retention", ">C", ">ΔV", ">I_leak", ">floats (running)", "while stopped");
            foreach (var s in r.Storage)
            {
                var ret = s.Node.Retention;
                storage.Add(s.Node.Net.Name, s.Node.Kind == StorageKind.Dynamic ? "dynamic" : "clocked feedback", s.Node.Cell?.Name ?? "-",
                    s.Clock.Length == 0 ? "-" : s.Clock, ret.Time, ret.Capacitance, ret.ToleratedDroop, ret.Leakage,
                    s.FloatsWhileRunning?.ToString() ?? "-", s.WhileStopped);
            }

            storage.Write(w);
        }

        w.WriteLine();
        w.WriteLine(Describe.Caution);
    }
}
