using System.Threading;
using Phaseward.Netlists;

namespace Phaseward.Checking;

/// <summary>What a rule is given: the netlist, the lint policy and a cancellation token to honour in long loops.</summary>
public sealed class RuleContext
{
    /// <summary>The context of one check of <paramref name="netlist"/> under <paramref name="policy"/>.</summary>
    public RuleContext(Netlist netlist, RulePolicy policy, CancellationToken cancellationToken = default)
    {
        Netlist = netlist;
        Policy = policy;
        CancellationToken = cancellationToken;
    }

    /// <summary>The netlist being checked.</summary>
    public Netlist Netlist { get; }

    /// <summary>The thresholds and switches the rules apply.</summary>
    public RulePolicy Policy { get; }

    /// <summary>Cancelled when the caller (the editor, the compiler) no longer needs the result.</summary>
    public CancellationToken CancellationToken { get; }
}
