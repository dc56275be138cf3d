namespace Phaseward.Netlists;

/// <summary>A named primary input or output of a design.</summary>
public sealed class Port
{
    internal Port(string name, Net net, SourceSpan span)
    {
        Name = name;
        Net = net;
        Span = span;
    }

    /// <summary>The port's name.</summary>
    public string Name { get; }

    /// <summary>The net behind the port.</summary>
    public Net Net { get; }

    /// <summary>Where the port was declared.</summary>
    public SourceSpan Span { get; }

    /// <inheritdoc/>
    public override string ToString() => $"{Name} = {Net.Name}";
}
