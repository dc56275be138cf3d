using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The designs of a compilation (non-abstract, non-generic classes deriving from <c>Phaseward.Design</c> that run a
/// <c>Describe</c> written in source), and the places where they are created with <c>new</c>.
/// </summary>
internal sealed class DesignCatalog
{
    private readonly Compilation compilation;
    private readonly INamedTypeSymbol designType;
    private readonly SemanticModelProvider models;
    private readonly object gate = new();
    private ImmutableArray<DesignInfo>? designs;
    private Dictionary<INamedTypeSymbol, List<IObjectCreationOperation>>? creations;

    public DesignCatalog(Compilation compilation, INamedTypeSymbol designType, SemanticModelProvider models)
    {
        this.compilation = compilation;
        this.designType = designType;
        this.models = models;
    }

    public ImmutableArray<DesignInfo> Designs
    {
        get
        {
            lock (gate)
                return designs ??= FindDesigns();
        }
    }

    public IEnumerable<DesignInfo> AnchoredIn(SyntaxTree tree) => Designs.Where(d => d.AnchorTree == tree);

    public DesignInfo? Find(INamedTypeSymbol type) => Designs.FirstOrDefault(d => SymbolEqualityComparer.Default.Equals(d.Type, type));

    /// <summary>Every <c>new T(...)</c> of the design type in the compilation, in file order then source order.</summary>
    public IReadOnlyList<IObjectCreationOperation> CreationsOf(INamedTypeSymbol type, CancellationToken cancellationToken)
    {
        Dictionary<INamedTypeSymbol, List<IObjectCreationOperation>> found;
        lock (gate)
            found = creations ??= FindCreations(cancellationToken);
        return found.TryGetValue(type, out var list) ? list : (IReadOnlyList<IObjectCreationOperation>)System.Array.Empty<IObjectCreationOperation>();
    }

    public bool IsDesign(INamedTypeSymbol type)
    {
        for (var current = type.BaseType; current is not null; current = current.BaseType)
            if (SymbolEqualityComparer.Default.Equals(current, designType))
                return true;
        return false;
    }

    private ImmutableArray<DesignInfo> FindDesigns()
    {
        var result = ImmutableArray.CreateBuilder<DesignInfo>();
        var pending = new Stack<INamespaceOrTypeSymbol>();
        pending.Push(compilation.Assembly.GlobalNamespace);
        while (pending.Count > 0)
        {
            var container = pending.Pop();
            foreach (var member in container.GetMembers())
            {
                if (member is INamespaceOrTypeSymbol nested)
                    pending.Push(nested);
                if (member is INamedTypeSymbol type && type.TypeKind == TypeKind.Class && !type.IsAbstract && !type.IsGenericType
                    && IsDesign(type) && FindDescribe(type) is { } describe
                    && describe.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax() is { } syntax)
                    result.Add(new DesignInfo(type, describe, syntax));
            }
        }

        return result.OrderBy(d => d.Type.ToDisplayString(), System.StringComparer.Ordinal).ToImmutableArray();
    }

    private IMethodSymbol? FindDescribe(INamedTypeSymbol type)
    {
        for (var current = type; current is not null && !SymbolEqualityComparer.Default.Equals(current, designType); current = current.BaseType)
            foreach (var member in current.GetMembers("Describe"))
                if (member is IMethodSymbol { IsOverride: true, Parameters.Length: 1 } method)
                    return method;
        return null;
    }

    private Dictionary<INamedTypeSymbol, List<IObjectCreationOperation>> FindCreations(CancellationToken cancellationToken)
    {
        var names = new HashSet<string>(Designs.Select(d => d.Type.Name), System.StringComparer.Ordinal);
        var result = new Dictionary<INamedTypeSymbol, List<IObjectCreationOperation>>(SymbolEqualityComparer.Default);
        foreach (var tree in compilation.SyntaxTrees)
        {
            cancellationToken.ThrowIfCancellationRequested();
            foreach (var node in tree.GetRoot(cancellationToken).DescendantNodes())
            {
                // Bind only creations that can name a design: 'new X(...)' with a design's name, or a target-typed 'new(...)'.
                if (node is ObjectCreationExpressionSyntax explicitCreation)
                {
                    var name = explicitCreation.Type switch
                    {
                        QualifiedNameSyntax q => q.Right.Identifier.ValueText,
                        SimpleNameSyntax s => s.Identifier.ValueText,
                        AliasQualifiedNameSyntax a => a.Name.Identifier.ValueText,
                        _ => null,
                    };
                    if (name is null || !names.Contains(name))
                        continue;
                }
                else if (node is not ImplicitObjectCreationExpressionSyntax)
                {
                    continue;
                }

                if (models.Get(tree).GetOperation(node, cancellationToken) is IObjectCreationOperation { Type: INamedTypeSymbol type } creation
                    && IsDesign(type))
                {
                    if (!result.TryGetValue(type, out var list))
                        result[type] = list = new List<IObjectCreationOperation>();
                    list.Add(creation);
                }
            }
        }

        return result;
    }
}
