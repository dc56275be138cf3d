using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Rules.PassGatePaths;

/// <summary>
/// PW2001: pass gates in series without a restoring stage. A run of pass gates (clock- or data-controlled; a latch
/// cell's transmission gate counts, its inverter restores) in which each gate's output net feeds the next gate's
/// input and no restoring stage drives the nets between them. Fan-out to other loads does not restore; a weak keeper
/// on a node does not either.
/// </summary>
/// <remarks>
/// <para>A run is reported when it is longer than the limit: <see cref="RulePolicy.MaxSeriesPassGates"/> if set, else
/// the optimum restoring-stage spacing of the design's process (<see cref="RestoringStageSpacing"/>, with R the
/// process's pass-gate resistance and C an interior chain node: wire plus two diffusion terminals), never below 2.</para>
/// <para>Once per over-long run, at its first gate beyond the limit: the gates whose longest incoming run is exactly
/// limit + 1 long. Where runs branch out (a shared trunk feeding several branches) the trunk's gate is reported once;
/// where they branch in (a mux tree) each gate at that depth is reported once, with the longest run through it. A
/// shorter branch that joins a run already beyond the limit is reported with that run, not again. A run holds only
/// gates that can all conduct together (<see cref="SeriesChains"/>): where a gate cannot conduct with an earlier one,
/// the run is broken after that one, and the conducting sub-run that remains, if it is already beyond the limit at
/// that gate, is reported there.</para>
/// <para>O(devices + nets) for the analysis; each finding then lists at most <see cref="MaxListedSplitPoints"/> split
/// points, walking at most its depth + <see cref="MaxListedSplitPoints"/> × spacing gates.</para>
/// </remarks>
public sealed class PassGateChainRule : Rule
{
    /// <summary>PW2001's {6} when its worst case counts branches not known to be exclusive as conducting together.</summary>
    internal const string ExclusivityAssumption = "; this worst case assumes that mux branches whose controls are not known to be exclusive conduct together (state Circuit.Exclusive to count them off)";

    /// <summary>At most this many split points are listed in a finding's properties.</summary>
    public const int MaxListedSplitPoints = 32;

    private static readonly IReadOnlyList<RuleDescriptor> Supported = new[] { RuleCatalog.SeriesPassGates };

    public override IReadOnlyList<RuleDescriptor> Descriptors => Supported;

    /// <summary>The process's optimum whole number of pass gates between restoring stages (null when the process gives
    /// chain nodes no capacitance, so that nothing favours restoring).</summary>
    public static int? OptimalSpacing(Process process)
    {
        if (process is null) throw new ArgumentNullException(nameof(process));
        var node = ChainNodeCapacitance(process);
        return node.Farads > 0 ? RestoringStageSpacing.OptimalIntegerSpacing(process.StageDelay, process.PassGateResistance, node) : null;
    }

    /// <summary>The limit in force: the policy's, else the process optimum but at least 2.</summary>
    public static int LimitFor(Process process, RulePolicy policy)
    {
        if (policy is null) throw new ArgumentNullException(nameof(policy));
        if (policy.MaxSeriesPassGates is { } set) return set;
        return OptimalSpacing(process) is { } optimum ? Math.Max(2, optimum) : int.MaxValue - 1;
    }

    /// <summary>An interior node of a pass-gate chain: its wire and two diffusion terminals (one gate's output, the next one's input).</summary>
    public static Capacitance ChainNodeCapacitance(Process process) => process.WireCapacitance + process.DiffusionCapacitance * 2;

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        if (context is null) throw new ArgumentNullException(nameof(context));
        var netlist = context.Netlist;
        var process = netlist.Process;
        var limit = LimitFor(process, context.Policy);
        var optimum = OptimalSpacing(process);
        var spacing = Math.Min(limit, optimum ?? limit);

        var findings = new List<Finding>();
        var hasPassGates = false;
        foreach (var device in netlist.Devices)
            if (device.IsPassDevice) { hasPassGates = true; break; }
        if (!hasPassGates) return findings;

        var network = PassGateNetwork.Of(netlist, context.CancellationToken);
        var chains = new SeriesChains(network, context.CancellationToken);
        Dictionary<SiteKey, (int Gates, bool HasCallers)>? siteGates = null;
        foreach (var gate in netlist.Devices)
        {
            if (!chains.IsFirstBeyond(gate, limit)) continue;
            context.CancellationToken.ThrowIfCancellationRequested();
            findings.Add(Report(netlist, chains, gate, limit, optimum, spacing, ref siteGates));
        }

        return findings;
    }

    private static Finding Report(Netlist netlist, SeriesChains chains, Device gate, int limit, int? optimum, int spacing,
        ref Dictionary<SiteKey, (int Gates, bool HasCallers)>? siteGates)
    {
        var chain = chains.ChainThrough(gate);
        var process = netlist.Process;
        var fifty = FiftyPercentDelay.FromElmore(chain.Elmore);
        var meanResistance = chain.TotalResistance / chain.Length;
        var meanCapacitance = chain.TotalNodeCapacitance / chain.Length;
        // The same driver and the actual stages as the Elmore figure it is compared with (RestoredChainDelay).
        var input = chain.First.Inputs[0];
        var restored = RestoringStageSpacing.RestoredChainDelay(chain.Length, spacing, meanResistance, meanCapacitance, process.StageDelay,
            chains.Network.RootResistanceOf(input), netlist.CapacitanceOf(input));

        var window = ChainWindow(chains, gate, chain.Length, spacing);
        var splitCount = (chain.Length - 1) / spacing;
        var listed = Math.Min(splitCount, MaxListedSplitPoints);
        var ids = new StringBuilder();
        var names = new StringBuilder();
        var sites = new List<SplitSite>();
        for (var k = 1; k <= listed; k++)
        {
            // Split after position k·spacing (window index k·spacing - 1); the next gate is at index k·spacing.
            var split = window[k * spacing - 1];
            if (ids.Length > 0) { ids.Append(','); names.Append('\n'); }
            ids.Append(split.Id.ToString(CultureInfo.InvariantCulture));
            names.Append(split.Name);
            sites.Add(SiteOf(window, k * spacing, siteGates ??= CountPassGatesBySite(netlist)));
        }

        var properties = new Dictionary<string, string>
        {
            [FindingPropertyKeys.ChainLength] = Invariant(chain.Length),
            [FindingPropertyKeys.Limit] = Invariant(limit),
            [FindingPropertyKeys.OptimalSpacing] = optimum is { } m ? Invariant(m) : "none",
            [FindingPropertyKeys.SplitSpacing] = Invariant(spacing),
            [FindingPropertyKeys.FirstGateId] = Invariant(chain.First.Id),
            [FindingPropertyKeys.FirstGate] = chain.First.Name,
            [FindingPropertyKeys.ReportedGateId] = Invariant(gate.Id),
            [FindingPropertyKeys.ElmoreDelaySeconds] = chain.Elmore.Seconds.ToString("R", CultureInfo.InvariantCulture),
            [FindingPropertyKeys.FiftyPercentDelaySeconds] = fifty.Seconds.ToString("R", CultureInfo.InvariantCulture),
            [FindingPropertyKeys.RestoredDelaySeconds] = restored.Seconds.ToString("R", CultureInfo.InvariantCulture),
            [FindingPropertyKeys.SplitAfterDeviceIds] = ids.ToString(),
            [FindingPropertyKeys.SplitAfterDevices] = names.ToString(),
            [FindingPropertyKeys.SplitPointCount] = Invariant(splitCount),
            [FindingPropertyKeys.SplitPointsTruncated] = splitCount > listed ? "true" : "false",
            [FindingPropertyKeys.SplitSites] = SplitSite.FormatAll(sites),
            [FindingPropertyKeys.AssumesUnknownBranchesConduct] = chain.AssumesUnknownBranchesConduct ? "true" : "false",
        };

        return new Finding(
            RuleCatalog.SeriesPassGates,
            gate.Span,
            new object[]
            {
                chain.Length, limit, chain.Elmore, fifty, spacing, restored, chain.AssumesUnknownBranchesConduct ? ExclusivityAssumption : "",
                chain.First.Name, gate.Name, netlist.DesignName,
            },
            new[] { chain.First.Span },
            properties);
    }

    // The chain through the reported gate from its first gate (index 0 = position 1), as far as the listed split points
    // and the run of gates at the last one's call need: the gate sits at its depth (limit + 1, or beyond where a broken
    // run begins late); later gates follow the longest continuation. At most that depth + (MaxListedSplitPoints + 1) ·
    // spacing gates, whatever the chain's length.
    private static List<Device> ChainWindow(SeriesChains chains, Device gate, int length, int spacing)
        => chains.ChainGates(gate, (int)Math.Min(length, (long)chains.DepthIn(gate) + (long)(MaxListedSplitPoints + 1) * spacing));

    // The split site of the gate at window[index] (chain position index + 1).
    private static SplitSite SiteOf(List<Device> window, int index, Dictionary<SiteKey, (int Gates, bool HasCallers)> siteGates)
    {
        var next = window[index];
        var span = next.Span;
        var key = new SiteKey(span);
        var first = index;
        var last = index;
        var hasCallers = span.Callers.Count > 0;
        if (span.Start >= 0)
        {
            while (first > 0 && new SiteKey(window[first - 1].Span).Equals(key) && window[first - 1].Id < window[first].Id)
                first--;
            while (last + 1 < window.Count && new SiteKey(window[last + 1].Span).Equals(key) && window[last + 1].Id > window[last].Id)
                last++;
        }

        var gates = siteGates.TryGetValue(key, out var site) ? site.Gates : 1;
        hasCallers |= site.HasCallers;
        return new SplitSite(index + 1, first + 1, last - first + 1, gates, hasCallers, span.Start, span.Length, span.Path);
    }

    // How many pass devices the netlist makes at each call (innermost source span), and whether any came through a helper.
    private static Dictionary<SiteKey, (int Gates, bool HasCallers)> CountPassGatesBySite(Netlist netlist)
    {
        var counts = new Dictionary<SiteKey, (int Gates, bool HasCallers)>();
        foreach (var device in netlist.Devices)
        {
            if (!device.IsPassDevice || device.Span.Start < 0) continue;
            var key = new SiteKey(device.Span);
            counts.TryGetValue(key, out var site);
            counts[key] = (site.Gates + 1, site.HasCallers || device.Span.Callers.Count > 0);
        }

        return counts;
    }

    /// <summary>A call in the source: path, start and length of a span (its callers aside).</summary>
    private readonly struct SiteKey : IEquatable<SiteKey>
    {
        private readonly string path;
        private readonly int start;
        private readonly int length;

        public SiteKey(SourceSpan span)
        {
            path = span.Path;
            start = span.Start;
            length = span.Length;
        }

        public bool Equals(SiteKey other) => start == other.start && length == other.length && string.Equals(path, other.path, StringComparison.Ordinal);

        public override bool Equals(object? obj) => obj is SiteKey other && Equals(other);

        public override int GetHashCode() => (StringComparer.Ordinal.GetHashCode(path) * 397) ^ (start * 31) ^ length;
    }

    private static string Invariant(int value) => value.ToString(CultureInfo.InvariantCulture);
}
