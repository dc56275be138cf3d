using System.Linq;
using System.Text;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// A <c>System.Type</c> the design asks for (<c>typeof(Adder)</c>, <c>block.GetType()</c>), most often to name what it
/// makes by its type. Only what the source already says is answered: the type's Name, Namespace, FullName, its text
/// and equality with another type. Everything else about it is reflection, outside what is elaborated (PW9001).
/// </summary>
internal sealed class TypeValue
{
    public TypeValue(ITypeSymbol symbol) => Symbol = symbol;

    public ITypeSymbol Symbol { get; }

    /// <summary><c>Type.Name</c>: <c>Adder</c>, <c>Box`1</c>, <c>Int32[]</c>.</summary>
    public string Name => Symbol is IArrayTypeSymbol array ? new TypeValue(array.ElementType).Name + "[]" : Symbol.MetadataName;

    /// <summary><c>Type.Namespace</c> (null for the global namespace).</summary>
    public string? Namespace => (Symbol is IArrayTypeSymbol array ? array.ElementType : Symbol).ContainingNamespace is { IsGlobalNamespace: false } ns
        ? ns.ToDisplayString()
        : null;

    /// <summary>True when <c>Type.FullName</c> is the type's text: not generic (a constructed generic type's FullName
    /// names its arguments' assemblies, which the source does not say).</summary>
    public bool HasPlainFullName => IsClosedAndNonGeneric(Symbol);

    public override bool Equals(object? obj) => obj is TypeValue other && SymbolEqualityComparer.Default.Equals(Symbol, other.Symbol);

    public override int GetHashCode() => SymbolEqualityComparer.Default.GetHashCode(Symbol);

    /// <summary>As <c>Type.ToString()</c> prints it: <c>Ns.Outer+Inner</c>, <c>Ns.Box`1[System.Int32]</c>, <c>System.Int32[]</c>.</summary>
    public override string ToString() => Text(Symbol);

    private static bool IsClosedAndNonGeneric(ITypeSymbol type)
        => type switch
        {
            IArrayTypeSymbol array => IsClosedAndNonGeneric(array.ElementType),
            INamedTypeSymbol named => !named.IsGenericType,
            _ => false,
        };

    private static string Text(ITypeSymbol type)
    {
        switch (type)
        {
            case IArrayTypeSymbol array when array.Rank == 1:
                return Text(array.ElementType) + "[]";
            case INamedTypeSymbol named:
                var text = new StringBuilder();
                if (named.ContainingType is { } containing)
                    text.Append(Text(containing.OriginalDefinition)).Append('+');
                else if (named.ContainingNamespace is { IsGlobalNamespace: false } ns)
                    text.Append(ns.ToDisplayString()).Append('.');
                text.Append(named.MetadataName);
                var arguments = AllTypeArguments(named);
                if (arguments.Length > 0 && !SymbolEqualityComparer.Default.Equals(named, named.OriginalDefinition))
                    text.Append('[').Append(string.Join(",", arguments.Select(Text))).Append(']');
                return text.ToString();
            default:
                // A type parameter not known here, a pointer: not something the design can print.
                throw new UnknownValueException();
        }
    }

    // Type.ToString lists the containing types' type arguments first, then the type's own.
    private static ITypeSymbol[] AllTypeArguments(INamedTypeSymbol type)
        => (type.ContainingType is { } containing ? AllTypeArguments(containing) : System.Array.Empty<ITypeSymbol>()).Concat(type.TypeArguments).ToArray();
}
