using System;
using System.Collections;
using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Library code runs with its type arguments erased to object (see Library), so where .NET fills in default(T) -- what
// FirstOrDefault gives for an empty List<int>, the slots Array.Resize adds, what Array.Clear leaves, the out value of a
// missing TryGetValue -- it fills in null. Where the static type says the value is a non-nullable value type, such a
// null can only be that default: it is replaced by the default of the static type, as .NET has it.
internal sealed partial class Interpreter
{
    /// <summary>A value from the library seen with its static type: an erased default (null) made the type's default.</summary>
    private object? WithErasedDefaults(object? value, ITypeSymbol? staticType)
    {
        // Most values (nets, numbers, strings, the design's objects) are not collections: they return at once.
        if (staticType is null || value is not null and (not IEnumerable or string))
            return value;
        if (value is null)
            return HoldsAValue(staticType) ? DefaultOf(staticType) : null;
        if (ElementTypeOf(staticType) is not { } element || !HoldsAValue(element))
            return value;
        switch (value)
        {
            case object?[] array:
                for (var i = 0; i < array.Length; i++)
                    array[i] ??= DefaultOf(element);
                return array;
            case List<object?> list:
                for (var i = 0; i < list.Count; i++)
                    list[i] ??= DefaultOf(element);
                return list;
            case IEnumerable sequence when !IsMaterialized(value) && IsPlainSequence(staticType):
                // A lazy sequence (DefaultIfEmpty) yields its erased defaults later, to whoever enumerates it.
                return WithDefaults(sequence, element);
            default:
                return value;
        }
    }

    /// <summary>What an argument passed by value refers to after the call (Array.Clear empties the array it is given).</summary>
    private void RestoreErasedDefaults(IOperation site, object?[] arguments)
    {
        if (site is not IInvocationOperation invocation)
            return;
        foreach (var argument in invocation.Arguments)
        {
            var ordinal = argument.Parameter?.Ordinal ?? -1;
            if (ordinal >= 0 && ordinal < arguments.Length && arguments[ordinal] is object?[] or List<object?>)
                WithErasedDefaults(arguments[ordinal], StripConversions(argument.Value).Type);
        }
    }

    private IEnumerable<object?> WithDefaults(IEnumerable sequence, ITypeSymbol element)
    {
        foreach (var item in sequence)
            yield return item ?? DefaultOf(element);
    }

    /// <summary>A non-nullable value type (not a type parameter, whose argument is not known here).</summary>
    private static bool HoldsAValue(ITypeSymbol type)
        => type.IsValueType && type is not ITypeParameterSymbol && type.SpecialType != SpecialType.System_Void
            && type.OriginalDefinition.SpecialType != SpecialType.System_Nullable_T;

    private static bool IsPlainSequence(ITypeSymbol type) => type.OriginalDefinition.SpecialType == SpecialType.System_Collections_Generic_IEnumerable_T;

    /// <summary>The element type of an array or of what the type enumerates as IEnumerable&lt;T&gt;.</summary>
    private static ITypeSymbol? ElementTypeOf(ITypeSymbol type)
    {
        if (type is IArrayTypeSymbol array)
            return array.ElementType;
        if (type is not INamedTypeSymbol named)
            return null;
        if (IsPlainSequence(named))
            return named.TypeArguments[0];
        foreach (var implemented in named.AllInterfaces)
            if (IsPlainSequence(implemented))
                return implemented.TypeArguments[0];
        return null;
    }
}
