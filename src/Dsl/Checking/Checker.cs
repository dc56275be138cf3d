using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Netlists;
using Phaseward.Rules.AnalysisLimits;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Rules.Timing;

namespace Phaseward.Checking;

/// <summary>Runs every rule on a netlist.</summary>
public static class Checker
{
    /// <summary>The rules Phaseward runs, in a fixed order (so reports are deterministic).</summary>
    public static IReadOnlyList<Rule> Rules { get; } = new Rule[]
    {
        new SameWindowLatchesRule(),
        new OverlapRaceRule(),
        new ClockCrossingRule(),
        new ClockGateEnableRule(),
        new LoopWithoutStorageRule(),
        new RegisterTimingRule(),
        new LatchBorrowingRule(),
        new LatchWriteWindowRule(),
        new PassGateChainRule(),
        new DynamicNodeOnGatedClockRule(),
        new ClockTooSlowForDynamicStorageRule(),
        new ChargeSharingRule(),
        new FightingDriversRule(),
        new KeeperTooStrongRule(),
        new LatchPathSearchStoppedRule(),
    };

    /// <summary>Runs every rule of <see cref="Rules"/> on <paramref name="netlist"/> under <paramref name="policy"/> (the defaults when null).</summary>
    public static CheckReport Check(Netlist netlist, RulePolicy? policy = null, CancellationToken cancellationToken = default)
        => Check(netlist, Rules, policy, cancellationToken);

    /// <summary>Runs <paramref name="rules"/>, in order, on <paramref name="netlist"/> under <paramref name="policy"/> (the defaults when null).</summary>
    public static CheckReport Check(Netlist netlist, IReadOnlyList<Rule> rules, RulePolicy? policy = null, CancellationToken cancellationToken = default)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        if (rules is null) throw new ArgumentNullException(nameof(rules));
        var context = new RuleContext(netlist, policy ?? RulePolicy.Default, cancellationToken);
        var findings = new List<Finding>();
        foreach (var rule in rules)
        {
            cancellationToken.ThrowIfCancellationRequested();
            findings.AddRange(rule.Check(context));
        }

        return new CheckReport(netlist, findings);
    }
}
