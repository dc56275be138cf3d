using System;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

// Boxes of numbers and enums as .NET has them. Unboxing needs the exact type that was boxed (C# specification §10.3.7,
// ECMA-335 §III.4.33 unbox.any): a boxed long is no int, a boxed char no int. Only an enum and its underlying type, or
// two enums of the same underlying type, are taken for one another, and a T? takes only a boxed T (or null). The
// interpreter holds a number boxed from a short, byte or char as that type (its arithmetic wraps to the declared type
// when stored), so the held value's own type is the boxed type.
internal sealed partial class Interpreter
{
    /// <summary>
    /// Whether the boxed value unboxes as <paramref name="target"/> (a value type; <paramref name="toNullable"/> when the
    /// cast is to <c>target?</c>). Null when the value is not a box of a number, bool or enum (a struct of the design's is
    /// type-tested instead).
    /// </summary>
    private bool? UnboxesTo(object value, ITypeSymbol target, bool toNullable)
    {
        if (BoxedTypeOf(value) is not { } boxed)
            return null;
        if (SymbolEqualityComparer.Default.Equals(boxed, target))
            return true;
        return !toNullable && UnboxingKind(boxed) is { } kind && kind == UnboxingKind(target);
    }

    /// <summary>The value a fitting unboxing gives: an enum's number as its underlying type, a number as the enum.</summary>
    private static object UnboxedAs(object value, ITypeSymbol target) => target.TypeKind == TypeKind.Enum
        ? ToEnum(value is EnumValue boxedEnum ? boxedEnum.Number : value, target)
        : value is EnumValue enumValue ? enumValue.Number : value;

    /// <summary>The type of a box of a number, bool or enum; null for other values.</summary>
    private ITypeSymbol? BoxedTypeOf(object value)
    {
        switch (value)
        {
            case EnumValue enumValue:
                return enumValue.Type;
            case Enum:
                return value.GetType().FullName is { } name ? session.Compilation.GetTypeByMetadataName(name) : null;
        }

        var special = value is bool ? SpecialType.System_Boolean : Arithmetic.TypeOf(value);
        return special == SpecialType.None ? null : session.Compilation.GetSpecialType(special);
    }

    // What the run time compares when unboxing as another type: an enum stands for its underlying integer type.
    private static SpecialType? UnboxingKind(ITypeSymbol type)
    {
        var kind = type is INamedTypeSymbol { TypeKind: TypeKind.Enum, EnumUnderlyingType: { } underlying } ? underlying.SpecialType : type.SpecialType;
        return kind is SpecialType.System_SByte or SpecialType.System_Byte or SpecialType.System_Int16 or SpecialType.System_UInt16
            or SpecialType.System_Int32 or SpecialType.System_UInt32 or SpecialType.System_Int64 or SpecialType.System_UInt64 ? kind : null;
    }
}
