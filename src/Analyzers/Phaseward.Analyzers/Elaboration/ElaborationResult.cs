using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>What elaborating one design gave: the netlist built (possibly partial) and the issues met on the way.</summary>
internal sealed class ElaborationResult
{
    public ElaborationResult(string designName, Netlist? netlist, IReadOnlyList<ElaborationIssue> issues, long steps)
    {
        DesignName = designName;
        Netlist = netlist;
        Issues = issues;
        Steps = steps;
    }

    public string DesignName { get; }

    /// <summary>The netlist; null only when no circuit could be made at all (for example an unusable design name).</summary>
    public Netlist? Netlist { get; }

    public IReadOnlyList<ElaborationIssue> Issues { get; }

    /// <summary>Steps used (see <see cref="ElaborationLimits"/>).</summary>
    public long Steps { get; }
}
