using System;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Run-time type tests: 'is T', and the type tests of patterns.
internal sealed partial class Interpreter
{
    private object? VisitIsType(IIsTypeOperation test, Frame frame)
    {
        var value = Evaluate(test.ValueOperand, frame);
        if (Unknown.Is(value)) return value;
        var result = IsOfType(value, test.TypeOperand, frame);
        if (result is null) return Unsupported(test, "this type test", "the type " + test.TypeOperand.ToDisplayString() + " cannot be tested at compile time");
        return test.IsNegated ? !result.Value : result.Value;
    }

    /// <summary>Is the (non-null) value of the given type? Null when that cannot be decided.</summary>
    private bool? IsOfType(object? value, ITypeSymbol type, Frame? frame)
    {
        if (value is null) return false;
        if (type is ITypeParameterSymbol parameter)
        {
            // 'is T' tests what T stands for where the generic code runs; not known, it cannot be decided.
            if (frame?.TypeArgumentOf(parameter) is not { } argument || argument is ITypeParameterSymbol)
                return null;
            type = argument;
        }

        // 'is Slot<T>' tests the construction T stands for; where that is not known, only a definition's test is exact.
        if (frame is not null && MentionsTypeParameter(type))
            type = ResolvedIn(type, frame) ?? type;
        if (type.SpecialType == SpecialType.System_Object) return true;
        if (value is object?[] array) return ArrayIsOfType(array, type);
        if (NullableUnderlying(type) is { } underlying) type = underlying;
        if (value is InterpretedObject instance) return InstanceIsOfType(instance, type);

        if (value is TupleValue tuple)
            return type.IsTupleType ? type is INamedTypeSymbol { TupleElements.Length: var length } && length == tuple.Items.Length
                : type.ToDisplayString() is "System.Runtime.CompilerServices.ITuple" or "System.ValueType" or "System.IComparable" ? true
                : type.TypeKind == TypeKind.Interface ? null : false;
        if (value is EnumValue enumValue)
            return type.TypeKind == TypeKind.Enum ? SymbolEqualityComparer.Default.Equals(type, enumValue.Type)
                : type.SpecialType is SpecialType.System_Enum or SpecialType.System_ValueType
                    || type.ToDisplayString() is "System.IComparable" or "System.IFormattable" or "System.IConvertible" or "System.ISpanFormattable";
        if (value is Closure) return type.TypeKind == TypeKind.Delegate ? true : type.TypeKind == TypeKind.Interface ? null : false;
        if (session.IsInSource(type)) return false;
        if (type.TypeKind == TypeKind.Enum && !ClrTypes.IsDsl(type)) return false;
        // The library holds its generics erased: a test of type arguments is answered by the type the object was made with.
        if (type is INamedTypeSymbol named && HasTypeArguments(named))
            return MentionsTypeParameter(type) ? null : ConstructedIsOfType(value, type);
        var clr = Library.Erase(type);
        return clr?.IsInstanceOfType(value);
    }

    /// <summary>
    /// Is the design's object of the type? Its type is the constructed one (<c>Slot&lt;int&gt;</c>), so type arguments
    /// and variance count. Where a type parameter in either type is not known, a test that the definitions already
    /// answer no is no, and one of a type without type arguments yes; otherwise it cannot be decided.
    /// </summary>
    private bool? InstanceIsOfType(InterpretedObject instance, ITypeSymbol type)
    {
        if (!MentionsTypeParameter(instance.Type) && !MentionsTypeParameter(type))
            return ConvertsByReference(instance.Type, type);
        if (!DefinitionIsOfType(instance.Type, type))
            return false;
        // A type without type arguments is in every construction's ancestry, or in none.
        return type is INamedTypeSymbol named && HasTypeArguments(named) ? null : true;
    }

    // The test by generic definitions alone: false is exact (no construction of an unrelated definition converts).
    private static bool DefinitionIsOfType(INamedTypeSymbol instanceType, ITypeSymbol type)
    {
        if (type.TypeKind == TypeKind.Interface)
            return instanceType.AllInterfaces.Any(i => SymbolEqualityComparer.Default.Equals(i.OriginalDefinition, type.OriginalDefinition));
        for (var current = instanceType; current is not null; current = current.BaseType)
            if (SymbolEqualityComparer.Default.Equals(current.OriginalDefinition, type.OriginalDefinition))
                return true;
        return false;
    }

    private static ITypeSymbol? NullableUnderlying(ITypeSymbol? type)
        => type is INamedTypeSymbol { OriginalDefinition.SpecialType: SpecialType.System_Nullable_T } nullable ? nullable.TypeArguments[0] : null;

    /// <summary>A record's <c>==</c> (or <c>!=</c>): true or false, or Unknown when a member compared is not known.</summary>
    private object RecordEquality(IOperation site, InterpretedObject value, object? other, bool negated)
    {
        try
        {
            return AreEqual(value, other) != negated;
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, site);
        }
    }

    /// <summary>The members of a <see cref="TypeValue"/> that say only what the source says: ToString, Equals (a Type's hash differs from process to process).</summary>
    private object? CallTypeMember(IInvocationOperation invocation, TypeValue type, IMethodSymbol method, Frame frame)
    {
        var (arguments, _) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        try
        {
            return method.Name switch
            {
                "ToString" when arguments.Length == 0 => type.ToString(),
                "Equals" when arguments.Length == 1 => type.Equals(arguments[0]),
                _ => Unsupported(invocation, "the call to " + Describe(method), "of a type only its name, text and equality are read: the rest is reflection"),
            };
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, invocation);
        }
    }
}
