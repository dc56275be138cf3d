using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>Per-compilation state the interpreter needs: semantic models, designs, cached method bodies.</summary>
internal sealed class ElaborationSession
{
    private readonly ConcurrentDictionary<ISymbol, IOperation?> bodies = new(SymbolEqualityComparer.Default);
    private readonly ConcurrentDictionary<IMethodSymbol, System.Reflection.MethodBase?> members = new(SymbolEqualityComparer.Default);
    private readonly ConcurrentDictionary<System.Reflection.MethodBase, Type[]> parameterTypes = new();

    public ElaborationSession(Compilation compilation, INamedTypeSymbol designType)
    {
        Compilation = compilation;
        DesignType = designType;
        Models = new SemanticModelProvider(compilation);
        Catalog = new DesignCatalog(compilation, designType, Models);
    }

    public Compilation Compilation { get; }

    public INamedTypeSymbol DesignType { get; }

    public SemanticModelProvider Models { get; }

    public DesignCatalog Catalog { get; }

    /// <summary><c>Phaseward.Block.Describe</c>, which every block overrides (null if the referenced DSL has no Block).</summary>
    public IMethodSymbol? BlockDescribe => blockDescribe ??= Compilation.GetTypeByMetadataName("Phaseward.Block")?.GetMembers("Describe").OfType<IMethodSymbol>().FirstOrDefault();

    private IMethodSymbol? blockDescribe;

    /// <summary>The syntax tree with the given path (null if none).</summary>
    public SyntaxTree? TreeAt(string path)
    {
        var trees = treesByPath ??= BuildTreeIndex();
        return trees.TryGetValue(path, out var tree) ? tree : null;
    }

    private Dictionary<string, SyntaxTree>? treesByPath;

    private Dictionary<string, SyntaxTree> BuildTreeIndex()
    {
        var index = new Dictionary<string, SyntaxTree>(StringComparer.Ordinal);
        foreach (var tree in Compilation.SyntaxTrees)
            if (!index.ContainsKey(tree.FilePath))
                index.Add(tree.FilePath, tree);
        return index;
    }

    public bool IsInSource(ISymbol symbol)
        => SymbolEqualityComparer.Default.Equals(symbol.ContainingAssembly, Compilation.Assembly) && symbol.DeclaringSyntaxReferences.Length > 0;

    /// <summary>The run-time member behind a DSL or library method symbol (cached per symbol of this compilation).</summary>
    public System.Reflection.MethodBase? MemberOf(IMethodSymbol method) => members.GetOrAdd(method, DslMembers.Find);

    /// <summary>The parameter types of a run-time member (MethodBase.GetParameters copies its array on every call).</summary>
    public Type[] ParameterTypesOf(System.Reflection.MethodBase member)
        => parameterTypes.GetOrAdd(member, m => m.GetParameters().Select(p => p.ParameterType).ToArray());

    /// <summary>The run-time member behind a pure library method symbol, on its erased type (see <see cref="Library"/>).</summary>
    public System.Reflection.MethodBase? LibraryMemberOf(IMethodSymbol method) => Library.Find(method);

    public IOperation? BodyOf(ISymbol method, Func<ISymbol, IOperation?> factory) => bodies.GetOrAdd(method.OriginalDefinition, factory);
}
