using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Rules.PassGatePaths;

/// <summary>One run of pass gates in series with no restoring stage between them (see <see cref="PassGateChains"/>).</summary>
public sealed class PassGateRun
{
    internal PassGateRun(IReadOnlyList<Device> gates, Time elmore, int limit)
    {
        Gates = gates;
        ElmoreDelay = elmore;
        Limit = limit;
    }

    /// <summary>The gates in order, from the one the driving stage feeds to the last.</summary>
    public IReadOnlyList<Device> Gates { get; }

    public int Length => Gates.Count;

    public Device First => Gates[0];

    public Device Last => Gates[Gates.Count - 1];

    /// <summary>Elmore delay from the driving stage to the last gate's output (the figure PW2001 reports).</summary>
    public Time ElmoreDelay { get; }

    /// <summary>The 50 % delay of a single-pole response with that Elmore time constant (0.69 ≈ ln 2, times τ).</summary>
    public Time FiftyPercentDelay => Electrical.FiftyPercentDelay.FromElmore(ElmoreDelay);

    /// <summary>The most gates in series PW2001 allows under the policy it was computed with.</summary>
    public int Limit { get; }

    /// <summary>True when the run is longer than <see cref="Limit"/> (PW2001 reports it).</summary>
    public bool ExceedsLimit => Length > Limit;

    /// <inheritdoc/>
    public override string ToString() => $"{Length} pass gates {First.Name} .. {Last.Name}: Elmore {ElmoreDelay}";
}

/// <summary>
/// The runs of pass gates in series of a netlist, for reports: one run per gate where the longest run through it ends
/// (it feeds no further pass gate that can conduct with the run), traced back along the longest run that ends there
/// (the same runs and Elmore delays as PW2001 uses).
/// </summary>
public static class PassGateChains
{
    /// <summary>Every run of at least <paramref name="minimumLength"/> gates, in the order of their last gates.</summary>
    public static IReadOnlyList<PassGateRun> Of(Netlist netlist, RulePolicy? policy = null, int minimumLength = 2, CancellationToken cancellationToken = default)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        if (minimumLength < 1)
            throw new ArgumentException($"'{nameof(minimumLength)}' must be at least 1 (was {minimumLength}).", nameof(minimumLength));
        var runs = new List<PassGateRun>();
        var hasPassGates = false;
        foreach (var device in netlist.Devices)
            if (device.IsPassDevice) { hasPassGates = true; break; }
        if (!hasPassGates) return runs;

        var limit = PassGateChainRule.LimitFor(netlist.Process, policy ?? RulePolicy.Default);
        var chains = new SeriesChains(PassGateNetwork.Of(netlist, cancellationToken), cancellationToken);
        foreach (var gate in netlist.Devices)
        {
            if (!gate.IsPassDevice || chains.DepthIn(gate) < minimumLength)
                continue;
            var chain = chains.ChainThrough(gate);
            if (chain.Length != chains.DepthIn(gate))
                continue;
            cancellationToken.ThrowIfCancellationRequested();
            runs.Add(new PassGateRun(chains.ChainGates(gate), chain.Elmore, limit));
        }

        return runs;
    }
}
