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

    public string Name { get; }

    public Net Net { get; }

    public SourceSpan Span { get; }

    public override string ToString() => $"{Name} = {Net.Name}";
}
