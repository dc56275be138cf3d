using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;

namespace Phaseward
{
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
    /// shorter branch that joins a run already beyond the limit is reported with that run, not again.</para>
    /// <para>O(devices + nets) for the analysis; each finding then lists at most <see cref="MaxListedSplitPoints"/> split
    /// points, walking at most limit + 1 + <see cref="MaxListedSplitPoints"/> × spacing gates.</para>
    /// </remarks>
    public sealed class PassGateChainRule : Rule
    {
        /// <summary>At most this many split points are listed in a finding's properties.</summary>
        public const int MaxListedSplitPoints = 32;

        public const string ChainLengthProperty = "chainLength";
        public const string LimitProperty = "limit";
        public const string OptimalSpacingProperty = "optimalSpacing";
        public const string SplitSpacingProperty = "splitSpacing";
        public const string FirstGateIdProperty = "firstGateId";
        public const string FirstGateProperty = "firstGate";
        public const string ReportedGateIdProperty = "reportedGateId";
        public const string ElmoreDelayProperty = "elmoreDelaySeconds";
        public const string FiftyPercentDelayProperty = "fiftyPercentDelaySeconds";
        public const string RestoredDelayProperty = "restoredDelaySeconds";
        public const string SplitAfterDeviceIdsProperty = "splitAfterDeviceIds";
        public const string SplitAfterDevicesProperty = "splitAfterDevices";
        public const string SplitPointCountProperty = "splitPointCount";
        public const string SplitPointsTruncatedProperty = "splitPointsTruncated";

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

            var network = new PassGateNetwork(netlist, context.CancellationToken);
            var chains = new SeriesChains(network, context.CancellationToken);
            foreach (var gate in netlist.Devices)
            {
                if (!gate.IsPassDevice || chains.DepthIn(gate) != limit + 1) continue;
                context.CancellationToken.ThrowIfCancellationRequested();
                findings.Add(Report(netlist, chains, gate, limit, optimum, spacing));
            }

            return findings;
        }

        private static Finding Report(Netlist netlist, SeriesChains chains, Device gate, int limit, int? optimum, int spacing)
        {
            var chain = chains.ChainThrough(gate);
            var process = netlist.Process;
            var fifty = FiftyPercentDelay.FromElmore(chain.Elmore);
            var meanResistance = chain.TotalResistance / chain.Length;
            var meanCapacitance = chain.TotalNodeCapacitance / chain.Length;
            var restored = RestoringStageSpacing.BufferedChainDelay(chain.Length, spacing, meanResistance, meanCapacitance, process.StageDelay);

            var splits = SplitPoints(chains, gate, chain.Length, limit, spacing, out var splitCount);
            var ids = new StringBuilder();
            var names = new StringBuilder();
            foreach (var split in splits)
            {
                if (ids.Length > 0) { ids.Append(','); names.Append('\n'); }
                ids.Append(split.Id.ToString(CultureInfo.InvariantCulture));
                names.Append(split.Name);
            }

            var properties = new Dictionary<string, string>
            {
                [ChainLengthProperty] = Invariant(chain.Length),
                [LimitProperty] = Invariant(limit),
                [OptimalSpacingProperty] = optimum is { } m ? Invariant(m) : "none",
                [SplitSpacingProperty] = Invariant(spacing),
                [FirstGateIdProperty] = Invariant(chain.First.Id),
                [FirstGateProperty] = chain.First.Name,
                [ReportedGateIdProperty] = Invariant(gate.Id),
                [ElmoreDelayProperty] = chain.Elmore.Seconds.ToString("R", CultureInfo.InvariantCulture),
                [FiftyPercentDelayProperty] = fifty.Seconds.ToString("R", CultureInfo.InvariantCulture),
                [RestoredDelayProperty] = restored.Seconds.ToString("R", CultureInfo.InvariantCulture),
                [SplitAfterDeviceIdsProperty] = ids.ToString(),
                [SplitAfterDevicesProperty] = names.ToString(),
                [SplitPointCountProperty] = Invariant(splitCount),
                [SplitPointsTruncatedProperty] = splitCount > splits.Count ? "true" : "false",
            };

            return new Finding(
                RuleCatalog.SeriesPassGates,
                gate.Span,
                new object[] { chain.Length, limit, chain.Elmore, fifty, spacing, restored },
                new[] { chain.First.Span },
                properties);
        }

        // The gates after which a restoring stage goes: positions spacing, 2·spacing, ... (counted from the run's first
        // gate) short of the run's end. Walks back from the reported gate (it sits at position limit + 1) and forward
        // along the longest continuation, listing at most MaxListedSplitPoints.
        private static List<Device> SplitPoints(SeriesChains chains, Device gate, int length, int limit, int spacing, out int count)
        {
            count = (length - 1) / spacing;
            var listed = Math.Min(count, MaxListedSplitPoints);
            var result = new List<Device>(listed);
            var position = limit + 1;
            var backward = new List<Device>();
            for (Device? g = chains.Previous(gate); g is not null; g = chains.Previous(g))
            {
                position--;
                if (position % spacing == 0) backward.Add(g);
            }

            for (var i = backward.Count - 1; i >= 0 && result.Count < listed; i--)
                result.Add(backward[i]);
            position = limit + 1;
            for (Device? g = gate; g is not null && result.Count < listed && position < length; g = chains.Next(g), position++)
                if (position % spacing == 0) result.Add(g);
            return result;
        }

        private static string Invariant(int value) => value.ToString(CultureInfo.InvariantCulture);
    }
}
