namespace Phaseward;

/// <summary>
/// A reusable piece of a design written as a class: a stage, a lane, a mux. Give it what it needs through its
/// constructor, describe its devices in <see cref="Describe"/>, and hand its outputs back through its own properties or
/// fields. Place it with <see cref="Circuit.Place{T}(T, string)"/>: everything it makes is named under the instance
/// name (<c>lane3.mux.n2</c>), so two placed blocks can use the same local names.
/// </summary>
public abstract class Block
{
    /// <summary>Describes the block's devices on <paramref name="c"/> (called by <see cref="Circuit.Place{T}(T, string)"/>).</summary>
    protected abstract void Describe(Circuit c);

    internal void DescribeOn(Circuit c) => Describe(c);
}
