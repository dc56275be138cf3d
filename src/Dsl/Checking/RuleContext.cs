using System.Threading;
using Phaseward.Netlists;

namespace Phaseward.Checking;

/// <summary>What a rule is given: the netlist, the lint policy and a cancellation token to honour in long loops.</summary>
public sealed class RuleContext
{
    public RuleContext(Netlist netlist, RulePolicy policy, CancellationToken cancellationToken = default)
    {
        Netlist = netlist;
        Policy = policy;
        CancellationToken = cancellationToken;
    }

    public Netlist Netlist { get; }

    public RulePolicy Policy { get; }

    public CancellationToken CancellationToken { get; }
}
