using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>One use of a library cell: which primitives it expanded into and where it was written.</summary>
public sealed class MacroInstance
{
    private static readonly IReadOnlyList<MacroInstance> NoParts = new MacroInstance[0];

    private readonly List<Device> devices = new(4);
    private List<MacroInstance>? parts;   // only registers have parts: made on the first one

    internal MacroInstance(int id, MacroKind kind, string name, SourceSpan span, MacroInstance? parent)
    {
        Id = id;
        Kind = kind;
        Name = name;
        Span = span;
        Parent = parent;
        if (parent is not null)
            (parent.parts ??= new List<MacroInstance>(2)).Add(this);
    }

    /// <summary>The macro's number in the netlist, in order of creation.</summary>
    public int Id { get; }

    /// <summary>Which macro this is.</summary>
    public MacroKind Kind { get; }

    /// <summary>The name given at the call (with its block scope).</summary>
    public string Name { get; }

    /// <summary>Where the macro was called.</summary>
    public SourceSpan Span { get; }

    /// <summary>The enclosing cell (a register for its master and slave latches), or null.</summary>
    public MacroInstance? Parent { get; }

    /// <summary>The primitives this cell expanded into, its parts' included.</summary>
    public IReadOnlyList<Device> Devices => devices;

    /// <summary>Cells nested in this one (a register's master and slave latches).</summary>
    public IReadOnlyList<MacroInstance> Parts => (IReadOnlyList<MacroInstance>?)parts ?? NoParts;

    internal void Add(Device device)
    {
        devices.Add(device);
        Parent?.Add(device);
    }

    /// <inheritdoc/>
    public override string ToString() => $"{Kind} {Name}";
}
