using System.Runtime.CompilerServices;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace Phaseward.Analyzers.Elaboration;

// Generic library objects as .NET types them. The library runs erased (every List<T> is a List<object?>), so the
// constructed type a collection was made with is kept beside it, as arrays keep their element type: a List<int> is no
// List<string>, and no IReadOnlyList<object> either (variance is for reference types only). A type test that depends
// on type arguments, of an object whose constructed type is not known (a LINQ iterator), is not guessed.
internal sealed partial class Interpreter
{
    /// <summary>The constructed type each generic library object was made with. Weak, as for arrays.</summary>
    private readonly ConditionalWeakTable<object, INamedTypeSymbol> constructedTypes = new();

    /// <summary>
    /// Records the constructed type of a library object just made (<c>new List&lt;int&gt;()</c>, ToList, ToDictionary, a
    /// collection expression), when the static type names its exact run-time type: a class whose erased form is the
    /// object's own type (not an interface or a base, which the object's type only implements or derives from). An
    /// object already recorded keeps its type (a call that returns what it was given).
    /// </summary>
    private object? TypedIfConstructed(object? value, ITypeSymbol? staticType, Frame? frame)
    {
        if (value is null or string or object?[] or InterpretedObject || value.GetType().IsValueType
            || staticType is not INamedTypeSymbol { TypeKind: TypeKind.Class } named || !HasTypeArguments(named))
            return value;
        var constructed = frame is null ? named : ResolvedIn(named, frame) as INamedTypeSymbol;
        if (constructed is null || MentionsTypeParameter(constructed) || Library.Erase(constructed) != value.GetType())
            return value;
        if (!constructedTypes.TryGetValue(value, out _))
            constructedTypes.Add(value, constructed);
        return value;
    }

    /// <summary>Is the library object of a type with type arguments? Null when its constructed type is not known.</summary>
    private bool? ConstructedIsOfType(object value, ITypeSymbol type)
        => constructedTypes.TryGetValue(value, out var constructed) ? ConvertsByReference(constructed, type) : null;

    /// <summary>What a run-time type test of an instance of <paramref name="from"/> answers: an identity, implicit
    /// reference (base, interface, variance) or boxing conversion to <paramref name="to"/>.</summary>
    private bool ConvertsByReference(ITypeSymbol from, ITypeSymbol to)
    {
        if (session.Compilation is CSharpCompilation csharp)
        {
            var conversion = csharp.ClassifyConversion(from, to);
            return conversion.IsIdentity || conversion.IsImplicit && (conversion.IsReference || conversion.IsBoxing);
        }

        var common = session.Compilation.ClassifyCommonConversion(from, to);
        return common.IsIdentity || common.IsImplicit && common.IsReference;
    }

    // A type whose type arguments a type test must compare: generic itself, or nested in a generic type.
    private static bool HasTypeArguments(INamedTypeSymbol type)
        => type.IsGenericType || type.ContainingType is { } containing && HasTypeArguments(containing);
}
