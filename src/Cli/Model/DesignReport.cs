using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Cli.Policy;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;
using Phaseward.Storage;

namespace Phaseward.Cli.Model;

/// <summary>A finding with the severity the report gives it.</summary>
internal sealed record ReportedFinding(Finding Finding, ReportSeverity Severity)
{
    public string RuleId => Finding.RuleId;

    public string Message => Finding.Message;

    public SourceSpan Location => Finding.Location;
}

/// <summary>One checked path with its slack: a register pair's setup or hold, a latch's borrowing, an overlap race.</summary>
internal sealed record CheckedPath(string Check, string RuleId, string From, string To, Time Required, Time Actual, Time Slack, bool Fails);

/// <summary>A storage node with its retention and how long it floats, for the dynamic-node table.</summary>
internal sealed record StorageRow(StorageNode Node, string Clock, Time? FloatsWhileRunning, string WhileStopped);

/// <summary>Everything the text and HTML outputs show for one design, computed once with the tool's Phaseward.</summary>
internal sealed class DesignReport
{
    public DesignReport(Design design, Netlist netlist, CheckReport check, RulePolicy policy, Func<Finding, ReportSeverity> severityOf)
    {
        Design = design;
        Netlist = netlist;
        Policy = policy;
        Findings = check.Findings
            .Select(f => new ReportedFinding(f, severityOf(f)))
            .Where(f => f.Severity != ReportSeverity.None)
            .ToList();
        Suppressed = check.Findings.Count - Findings.Count;
        Timing = TimingFigures.For(netlist, Corner.Slow);
        FastTiming = TimingFigures.For(netlist, Corner.Fast);
        RegisterChecks = RegisterPathChecks.For(netlist);
        Borrowing = LatchBorrowing.Compute(Timing);
        Races = OverlapRaces.For(Timing.Model);
        Chains = PassGateChains.Of(netlist, policy);
        Storage = StorageNodes.Of(netlist).Select(ToRow).ToList();
        Paths = BuildPaths();
        FindingsByLatch = MapFindingsToLatches();
    }

    public Design Design { get; }

    public string Name => Netlist.DesignName;

    public string TypeName => Design.GetType().FullName ?? Design.GetType().Name;

    public Netlist Netlist { get; }

    public RulePolicy Policy { get; }

    public IReadOnlyList<ReportedFinding> Findings { get; }

    /// <summary>Findings left out because their rule's severity is none.</summary>
    public int Suppressed { get; }

    /// <summary>The figures at the slow corner: setup, clock-to-output, borrowing (as the rules check them).</summary>
    public TimingFigures Timing { get; }

    /// <summary>The figures at the fast corner: minimum clock-to-output and hold (as the rules check them).</summary>
    public TimingFigures FastTiming { get; }

    public IReadOnlyList<RegisterPathResult> RegisterChecks { get; }

    public IReadOnlyList<LatchArrival> Borrowing { get; }

    public IReadOnlyList<OverlapRace> Races { get; }

    public IReadOnlyList<PassGateRun> Chains { get; }

    public IReadOnlyList<StorageRow> Storage { get; }

    public IReadOnlyList<CheckedPath> Paths { get; }

    /// <summary>Latch index → the findings that involve it (as the latch reported, the latch feeding it, or its storage node).</summary>
    public IReadOnlyDictionary<int, IReadOnlyList<ReportedFinding>> FindingsByLatch { get; }

    public IReadOnlyList<Clock> RootClocks => Netlist.Clocks.Where(c => c.Kind == ClockKind.Root).ToList();

    public bool HasErrors => Findings.Any(f => f.Severity == ReportSeverity.Error);

    public IReadOnlyList<ReportedFinding> FindingsOf(Latch latch)
        => FindingsByLatch.TryGetValue(latch.Index, out var list) ? list : Array.Empty<ReportedFinding>();

    private StorageRow ToRow(StorageNode node)
    {
        var clocks = node.Drivers.Where(d => d.ClockControl is not null).Select(d => d.ClockControl!.Name).Distinct();
        var running = StorageIsolation.WhileRunning(node);
        var stopped = StorageIsolation.WhileStopped(node);
        var whileStopped = stopped is null
            ? "-"
            : $"floats while {string.Join(", ", stopped.Gates.Select(g => g.Name))} is stopped (idle bound {stopped.IdleBound?.ToString() ?? "none"})";
        return new StorageRow(node, string.Join(", ", clocks), running?.Longest, whileStopped);
    }

    private List<CheckedPath> BuildPaths()
    {
        var paths = new List<CheckedPath>();
        foreach (var r in RegisterChecks)
        {
            var c = r.Check;
            paths.Add(new CheckedPath("setup", RuleCatalog.RegisterSetup.Id, r.Launch.Name, r.Capture.Name,
                c.Available, c.ClockToOutput + c.PathMax + c.Setup, c.SetupSlack, c.SetupSlack < Policy.MinimumTimingSlack));
            paths.Add(new CheckedPath("hold", RuleCatalog.RegisterHold.Id, r.Launch.Name, r.Capture.Name,
                c.Hold + c.Skew, c.ClockToOutputMin + c.PathMin, c.HoldSlack, c.HoldSlack < Policy.MinimumTimingSlack));
        }

        foreach (var a in Borrowing)
        {
            var timing = Timing.Of(a.Path.To);
            paths.Add(new CheckedPath("borrowing", RuleCatalog.LatchBorrowing.Id, a.Path.From.Name, a.Path.To.Name,
                timing.Window.Length - timing.Setup, a.Arrival, a.Slack, a.Slack < Policy.MinimumTimingSlack));
        }

        foreach (var race in Races)
            paths.Add(new CheckedPath(race.OverlapName + " race", RuleCatalog.OverlapRace.Id, race.Path.From.Name, race.Path.To.Name,
                race.Overlap, race.Fastest, race.Margin, race.Margin < Policy.MinimumRaceMargin));
        return paths;
    }

    private Dictionary<int, IReadOnlyList<ReportedFinding>> MapFindingsToLatches()
    {
        var model = Timing.Model;
        var byName = new Dictionary<string, List<Latch>>(StringComparer.Ordinal);
        void Add(string name, Latch latch)
        {
            if (!byName.TryGetValue(name, out var list)) byName[name] = list = new List<Latch>();
            if (!list.Contains(latch)) list.Add(latch);
        }

        foreach (var latch in model.Latches)
        {
            Add(latch.Name, latch);
            Add("net:" + latch.Storage.Name, latch);
            if (model.RegisterOf(latch) is { } register) Add(register.Name, latch);
        }

        var result = new Dictionary<int, List<ReportedFinding>>();
        foreach (var finding in Findings)
        {
            var hits = new HashSet<Latch>();
            var p = finding.Finding.Properties;
            foreach (var key in new[] { FindingPropertyKeys.TargetLatch, FindingPropertyKeys.SourceLatch, FindingPropertyKeys.Register, FindingPropertyKeys.CellName })
                if (p.TryGetValue(key, out var name) && byName.TryGetValue(name, out var latches))
                    hits.UnionWith(latches);
            foreach (var key in new[] { FindingPropertyKeys.Node, FindingPropertyKeys.OtherNode })
                if (p.TryGetValue(key, out var net) && byName.TryGetValue("net:" + net, out var latches))
                    hits.UnionWith(latches);
            // Findings that name no latch (a pass-gate chain): the latches whose entry gate is the reported call.
            if (hits.Count == 0)
                foreach (var latch in model.Latches)
                    if (latch.EntryGates.Any(g => g.Span.Equals(finding.Location)))
                        hits.Add(latch);
            foreach (var latch in hits)
            {
                if (!result.TryGetValue(latch.Index, out var list)) result[latch.Index] = list = new List<ReportedFinding>();
                list.Add(finding);
            }
        }

        return result.ToDictionary(kv => kv.Key, kv => (IReadOnlyList<ReportedFinding>)kv.Value);
    }
}
