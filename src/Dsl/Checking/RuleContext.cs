using System.Threading;
using Phaseward.Netlists;
using Phaseward.Sequencing;

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

    /// <summary>The latches, registers and latch-to-latch paths, searched within the policy's
    /// <see cref="RulePolicy.LatchPathSearchBudget"/> (made once per netlist and budget, shared by the rules).</summary>
    public LatchModel LatchModel => LatchModel.Of(Netlist, Policy.LatchPathSearchBudget, CancellationToken);

    /// <summary>Cancelled when the caller (the editor, the compiler) no longer needs the result.</summary>
    public CancellationToken CancellationToken { get; }
}
