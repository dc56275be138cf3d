using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// An object of a class, struct or record declared in the design's source (the design itself, a block, a stage, a
/// configuration record), built and used only by the interpreter: its concrete type, the values of its fields and
/// auto-properties, and the parameters of a primary constructor (which C# lets the whole class read).
/// </summary>
/// <remarks>
/// Library code run natively (string.Join, a Dictionary key, Distinct, Sort, Max) may call ToString, Equals, GetHashCode or
/// CompareTo on it:
/// those go back to the interpreter (the design's override, or a record's generated member), never to native code.
/// </remarks>
internal sealed class InterpretedObject : System.IComparable
{
    // Serials issued so far, by every interpreter (objects made later have larger serials).
    private static long serials;

    private readonly Dictionary<ISymbol, Variable> members;

    public InterpretedObject(INamedTypeSymbol type, IObjectSemantics semantics)
    {
        Serial = System.Threading.Interlocked.Increment(ref serials);
        Type = type;
        Semantics = semantics;
        members = new Dictionary<ISymbol, Variable>(SymbolEqualityComparer.Default);
    }

    private InterpretedObject(InterpretedObject original)
    {
        Serial = System.Threading.Interlocked.Increment(ref serials);
        Type = original.Type;
        Semantics = original.Semantics;
        members = new Dictionary<ISymbol, Variable>(original.members.Count, SymbolEqualityComparer.Default);
        foreach (var member in original.members)
            members.Add(member.Key, member.Value.Copy());
    }

    /// <summary>The serial last issued: every object made after this moment has a larger <see cref="Serial"/>.</summary>
    public static long LastSerial => System.Threading.Interlocked.Read(ref serials);

    /// <summary>When the object was made, relative to the others (a copy is a new object).</summary>
    public long Serial { get; }

    public INamedTypeSymbol Type { get; }

    public IObjectSemantics Semantics { get; }

    /// <summary>The stored members (fields, auto-properties, primary-constructor parameters) and their variables.</summary>
    public IEnumerable<KeyValuePair<ISymbol, Variable>> Members => members;

    public Variable? Find(ISymbol member) => members.TryGetValue(member.OriginalDefinition, out var variable) ? variable : null;

    public Variable GetOrAdd(ISymbol member)
    {
        if (!members.TryGetValue(member.OriginalDefinition, out var variable))
            members[member.OriginalDefinition] = variable = new Variable(null);
        return variable;
    }

    /// <summary>A member-by-member copy (a struct assigned, a record's <c>with</c>).</summary>
    public InterpretedObject Copy() => new(this);

    public override string ToString() => Semantics.TextOf(this);

    public override bool Equals(object? obj) => Semantics.AreEqual(this, obj);

    public override int GetHashCode() => Semantics.HashOf(this);

    /// <inheritdoc/>
    public int CompareTo(object? obj) => Semantics.CompareOf(this, obj);
}
