using System.Collections.Generic;

namespace Phaseward.Checking;

/// <summary>
/// A rule: a pure function from a netlist and a policy to findings. Rules know nothing of Roslyn; the analyzers only
/// turn their findings into diagnostics. Each rule must run in time linear in the netlist's size.
/// </summary>
public abstract class Rule
{
    /// <summary>The descriptors of every finding this rule can produce.</summary>
    public abstract IReadOnlyList<RuleDescriptor> Descriptors { get; }

    /// <summary>The rule's findings on the context's netlist under its policy.</summary>
    public abstract IEnumerable<Finding> Check(RuleContext context);
}
