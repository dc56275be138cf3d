using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>A concrete design class and the <c>Describe</c> override it runs (possibly inherited from a base design).</summary>
internal sealed class DesignInfo
{
    public DesignInfo(INamedTypeSymbol type, IMethodSymbol describe, SyntaxNode describeSyntax)
    {
        Type = type;
        Describe = describe;
        DescribeSyntax = describeSyntax;
    }

    public INamedTypeSymbol Type { get; }

    public IMethodSymbol Describe { get; }

    public SyntaxNode DescribeSyntax { get; }

    /// <summary>The document every diagnostic about this design is reported in: the one holding its Describe.</summary>
    public SyntaxTree AnchorTree => DescribeSyntax.SyntaxTree;

    /// <summary>Where design-level diagnostics go when nothing more precise is known: the name of the Describe method.</summary>
    public Location AnchorLocation => Describe.Locations.Length > 0 ? Describe.Locations[0] : DescribeSyntax.GetLocation();
}
