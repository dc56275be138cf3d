using System;
using System.Collections.Generic;
using System.Threading;
using Phaseward.Netlists;

namespace Phaseward.Checking;

/// <summary>Runs every rule on a netlist.</summary>
public static class Checker
{
    public static CheckReport Check(Netlist netlist, RulePolicy? policy = null, CancellationToken cancellationToken = default)
        => Check(netlist, RuleSet.All, policy, cancellationToken);

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
