using System.Threading;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward;

/// <summary>
/// A circuit design. Derive from it and describe the circuit in <see cref="Describe"/>; Phaseward's analyzers check the
/// description as you write it, and <see cref="Check"/> checks it at run time.
/// </summary>
public abstract class Design
{
    /// <summary>The name used in reports (the class name unless overridden).</summary>
    public virtual string Name => GetType().Name;

    /// <summary>Runs <see cref="Describe"/> and returns the netlist it built.</summary>
    public Netlist Elaborate()
    {
        var circuit = new Circuit(Name);
        Describe(circuit);
        return circuit.ToNetlist();
    }

    /// <summary>Elaborates the design and runs every rule on it.</summary>
    public CheckReport Check(RulePolicy? policy = null, CancellationToken cancellationToken = default)
        => Checker.Check(Elaborate(), policy ?? RulePolicy.Default, cancellationToken);

    /// <summary>Describes the circuit: clocks, inputs, devices, outputs.</summary>
    protected abstract void Describe(Circuit c);
}
