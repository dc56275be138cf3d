using System;
using System.Collections;
using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Library generics run with their type arguments erased to object (see Library). Where the result depends on the type
// argument, the interpreter applies it with its own type test: OfType keeps only the elements of that type, Cast checks
// each element, Min and Max of no values throw, and a default(T) in generic code is the default of what T stands for.
internal sealed partial class Interpreter
{
    /// <summary>A type with the type parameters it names replaced by what they stand for where the code runs.</summary>
    private ITypeSymbol? Resolved(ITypeSymbol? type, Frame? frame)
    {
        switch (type)
        {
            case null:
                return null;
            case ITypeParameterSymbol parameter:
                return frame?.TypeArgumentOf(parameter) is { } argument and not ITypeParameterSymbol ? argument : type;
            case IArrayTypeSymbol array when array.Rank == 1 && Resolved(array.ElementType, frame) is { } element && !SymbolEqualityComparer.Default.Equals(element, array.ElementType):
                return session.Compilation.CreateArrayTypeSymbol(element);
            case INamedTypeSymbol { IsGenericType: true, IsTupleType: false } named when named.TypeArguments.Any(a => a is ITypeParameterSymbol):
                var arguments = named.TypeArguments.Select(a => Resolved(a, frame)!).ToArray();
                return named.ContainingType is null ? named.OriginalDefinition.Construct(arguments) : type;
            default:
                return type;
        }
    }

    private static bool IsEnumerableMethod(IMethodSymbol method, string name)
        => method.Name == name && method.IsGenericMethod && method.ContainingType is { } owner && ClrTypes.MetadataName(owner.OriginalDefinition) == "System.Linq.Enumerable";

    /// <summary>
    /// The type argument a library call's result depends on, honoured: OfType and Cast over what the erased call gave.
    /// Unknown (reported) when the type argument is not known where the code runs.
    /// </summary>
    private object? WithTypeArgument(IInvocationOperation invocation, IMethodSymbol method, object?[] arguments, object? result, Frame frame)
    {
        var ofType = IsEnumerableMethod(method, "OfType");
        if (!ofType && !IsEnumerableMethod(method, "Cast") || Unknown.Is(result) || result is not IEnumerable sequence)
            return result;
        var type = Resolved(method.TypeArguments[0], frame)!;
        if (type is ITypeParameterSymbol)
            return Unsupported(invocation, "the call to " + Describe(method), "its type argument " + type.Name + " is not known here");
        if (ofType)
            return OfTypeElements(sequence, type, invocation);
        // Over a collection .NET casts lazily but may count without casting: the erased result is kept when every
        // element is already of the type; else its elements are checked when enumerated, and it still counts cheaply.
        if (arguments.Length > 0 && arguments[0] is ICollection collection && IsMaterialized(collection))
            return collection.Cast<object?>().All(item => CastsTo(item, type) == true) ? result : new CheckedCastView(this, collection, type, invocation);
        return CastElements(sequence, type, invocation);
    }

    private IEnumerable<object?> OfTypeElements(IEnumerable sequence, ITypeSymbol type, IOperation site)
    {
        foreach (var item in sequence)
        {
            var matches = IsOfType(item, type, null) ?? throw UnknownValueException.Unsupported(
                "the call to 'OfType<" + type.ToDisplayString() + ">'", "whether an element is of its type cannot be decided at compile time");
            if (matches)
                yield return item;
        }
    }

    private IEnumerable<object?> CastElements(IEnumerable sequence, ITypeSymbol type, IOperation site)
    {
        foreach (var item in sequence)
            yield return Cast(item, type, site);
    }

    /// <summary>An element cast as Cast&lt;T&gt; casts it: the exception .NET throws when it is not a T.</summary>
    private object? Cast(object? item, ITypeSymbol type, IOperation site)
    {
        switch (CastsTo(item, type))
        {
            case true:
                return item;
            case null:
                throw UnknownValueException.Unsupported("the call to 'Cast<" + type.ToDisplayString() + ">'", "whether an element is of its type cannot be decided at compile time");
        }

        if (Unboxed(item, type) is { } unboxed)
            return unboxed;
        Raise(site.Syntax, item is null
            ? new NullReferenceException("Object reference not set to an instance of an object.")
            : new InvalidCastException($"Unable to cast object of type '{(item is InterpretedObject o ? ClrTypes.MetadataName(o.Type) : item.GetType().FullName)}' to type '{(type is INamedTypeSymbol named ? ClrTypes.MetadataName(named) : type.ToDisplayString())}'."));
        throw new UnknownValueException(); // reported where it was thrown
    }

    // null casts to every type but a non-nullable value type.
    private bool? CastsTo(object? item, ITypeSymbol type) => item is null ? !HoldsAValue(type) : IsOfType(item, type, null);

    /// <summary>Unboxing also takes a boxed enum as its underlying type or another enum of it, and a boxed number as the enum.</summary>
    private object? Unboxed(object? item, ITypeSymbol type)
    {
        var target = NullableUnderlying(type) ?? type;
        return item is not null && target.IsValueType && UnboxesTo(item, target, toNullable: NullableUnderlying(type) is not null) == true ? UnboxedAs(item, target) : null;
    }

    /// <summary>Min and Max of no values, where the result's type is a non-nullable value type: .NET throws.</summary>
    private static bool IsExtremeOfNothing(IMethodSymbol method, object? result, ITypeSymbol? resultType)
        => result is null && resultType is not null && HoldsAValue(resultType) && method.OriginalDefinition.ReturnType is ITypeParameterSymbol
            && (IsEnumerableMethod(method, "Min") || IsEnumerableMethod(method, "Max") || IsEnumerableMethod(method, "MinBy") || IsEnumerableMethod(method, "MaxBy"));

    /// <summary>Cast&lt;T&gt; over a collection with an element that is no T: counts as the collection, throws when enumerated there.</summary>
    private sealed class CheckedCastView : ICollection, IEnumerable<object?>
    {
        private readonly Interpreter interpreter;
        private readonly ICollection source;
        private readonly ITypeSymbol type;
        private readonly IOperation site;

        public CheckedCastView(Interpreter interpreter, ICollection source, ITypeSymbol type, IOperation site)
            => (this.interpreter, this.source, this.type, this.site) = (interpreter, source, type, site);

        public int Count => source.Count;

        public bool IsSynchronized => false;

        public object SyncRoot => this;

        public void CopyTo(Array array, int index)
        {
            foreach (var item in this)
                array.SetValue(item, index++);
        }

        public IEnumerator<object?> GetEnumerator() => interpreter.CastElements(source, type, site).GetEnumerator();

        IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
    }
}
