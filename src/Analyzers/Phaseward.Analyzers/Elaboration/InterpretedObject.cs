using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// An object of a class, struct or record declared in the design's source (the design itself, a block, a stage, a
/// configuration record), built and used only by the interpreter: its concrete type, the values of its fields and
/// auto-properties, and the parameters of a primary constructor (which C# lets the whole class read).
/// </summary>
internal sealed class InterpretedObject
{
    private readonly Dictionary<ISymbol, Variable> members = new(SymbolEqualityComparer.Default);

    public InterpretedObject(INamedTypeSymbol type) => Type = type;

    public INamedTypeSymbol Type { get; }

    public Variable? Find(ISymbol member) => members.TryGetValue(member.OriginalDefinition, out var variable) ? variable : null;

    public Variable GetOrAdd(ISymbol member)
    {
        if (!members.TryGetValue(member.OriginalDefinition, out var variable))
            members[member.OriginalDefinition] = variable = new Variable(null);
        return variable;
    }

    public override string ToString() => Type.Name;
}
