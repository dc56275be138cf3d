using System.Collections.Generic;

namespace Phaseward
{
    /// <summary>One use of a library cell: which primitives it expanded into and where it was written.</summary>
    public sealed class MacroInstance
    {
        private readonly List<Device> devices = new();
        private readonly List<MacroInstance> parts = new();

        internal MacroInstance(int id, MacroKind kind, string name, SourceSpan span, MacroInstance? parent)
        {
            Id = id;
            Kind = kind;
            Name = name;
            Span = span;
            Parent = parent;
            parent?.parts.Add(this);
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
        public IReadOnlyList<MacroInstance> Parts => parts;

        internal void Add(Device device)
        {
            devices.Add(device);
            Parent?.Add(device);
        }

        public override string ToString() => $"{Kind} {Name}";
    }
}
