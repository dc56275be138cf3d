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

    public int Id { get; }

    public MacroKind Kind { get; }

    public string Name { get; }

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

    public override string ToString() => $"{Kind} {Name}";
}
