namespace Phaseward;

/// <summary>A node of the circuit. Nets are made by the <see cref="Circuit"/> that owns them.</summary>
public sealed class Net
{
    internal Net(Circuit owner, int id, string name)
    {
        Owner = owner;
        Id = id;
        Name = name;
    }

    internal Circuit Owner { get; }

    /// <summary>Position of the net in its netlist (0-based, in order of creation).</summary>
    public int Id { get; }

    /// <summary>The net's name (with the scope of the block it was made in).</summary>
    public string Name { get; }

    /// <inheritdoc/>
    public override string ToString() => Name;
}
