using System;
using System.Globalization;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The text .NET gives a value (a concatenation, an interpolation hole, a record's printed member, <c>ToString()</c>),
/// or <see cref="UnknownValueException"/> naming why it cannot be known at compile time.
/// </summary>
/// <remarks>
/// <para>The culture rule: a value is formatted in the current culture of the run, which the compiler does not know.
/// Its text is computed only when no culture can change it, and that is decided by formatting it twice: in the invariant
/// culture and in <see cref="Contrary"/>, a culture whose every number symbol and pattern differs from the invariant's.
/// Equal texts consulted no culture data, so every culture gives them: strings, bools, chars, enum names, non-negative
/// integers (.NET prints them with plain ASCII digits and no group separator in every culture). A fraction, a negative
/// number (several cultures print U+2212 as the minus sign), a group separator (N), a percent sign differ: PW9001.</para>
/// <para>Library collections and arrays print their type (<c>System.Collections.Generic.List`1[System.Int32]</c>); the
/// interpreter holds them with their type arguments erased to object, so their text comes from the static type the
/// source gives them, when that is their exact type, and is PW9001 otherwise.</para>
/// </remarks>
internal static class ValueText
{
    /// <summary>A culture unlike any real one in every number symbol and pattern: what differs under it depends on the culture.</summary>
    public static readonly CultureInfo Contrary = MakeContrary();

    /// <summary>The text of a value in the run's (unknown) current culture, as <c>ToString()</c> or a hole with this format gives it.</summary>
    public static string Of(object? value, ITypeSymbol? staticType = null, string? format = null) => value switch
    {
        null => string.Empty,
        string s => s,
        bool b => b ? "True" : "False",
        char c => c.ToString(),
        IFormattable f => CultureFree(f, format),
        Array or System.Collections.IEnumerable when PrintsItsType(value) => TypeNameOf(value, staticType),
        _ => value.ToString() ?? string.Empty,
    };

    /// <summary>The text of a formattable value when the culture cannot change it; else <see cref="UnknownValueException"/>.</summary>
    public static string CultureFree(IFormattable value, string? format)
    {
        var invariant = value.ToString(format, CultureInfo.InvariantCulture);
        if (invariant != value.ToString(format, Contrary))
            throw UnknownValueException.Unsupported("the text of the " + KindOf(value) + " " + invariant + (string.IsNullOrEmpty(format) ? "" : " formatted \"" + format + "\""),
                "it depends on the culture the design runs under (the decimal separator, the minus sign, group separators); format it with CultureInfo.InvariantCulture");
        return invariant;
    }

    /// <summary>Does the value print its run-time type (a library collection, an array, a LINQ sequence)?</summary>
    public static bool PrintsItsType(object value)
        => value is Array || value.GetType() is { IsGenericType: true } type && type.GetMethod("ToString", Type.EmptyTypes)?.DeclaringType == typeof(object);

    private static string TypeNameOf(object value, ITypeSymbol? staticType)
    {
        var type = value.GetType();
        var exact = staticType switch
        {
            // Arrays are covariant: only an element type nothing derives from fixes the array's own type.
            IArrayTypeSymbol { Rank: 1 } array => value is Array && (array.ElementType.IsValueType || array.ElementType.IsSealed),
            INamedTypeSymbol { IsGenericType: true, TypeKind: TypeKind.Class or TypeKind.Struct } named => type.IsGenericType
                && type.GetGenericTypeDefinition().FullName == ClrTypes.MetadataName(named.OriginalDefinition),
            _ => false,
        };
        if (exact)
        {
            try
            {
                return new TypeValue(staticType!).ToString();
            }
            catch (UnknownValueException)
            {
                // A type parameter in it: the type argument is not known here.
            }
        }

        throw UnknownValueException.Unsupported("the text of a " + (value is Array ? "an array" : type.Name.Split('`')[0]),
            "it prints its type with its type arguments, which are not known here (the elaborator holds library collections with object elements)");
    }

    private static string KindOf(IFormattable value) => value is EnumValue enumValue ? enumValue.Type.Name : value.GetType().Name;

    private static CultureInfo MakeContrary()
    {
        var culture = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        var numbers = culture.NumberFormat;
        // Not a dash: .NET parses a hyphen as the minus sign of the cultures whose sign is a dash, not of all others.
        numbers.NegativeSign = "~";
        numbers.PositiveSign = "\u207A";
        numbers.NumberDecimalSeparator = "\u066B";
        numbers.NumberGroupSeparator = "\u066C";
        numbers.NumberGroupSizes = new[] { 2 };
        numbers.CurrencyDecimalSeparator = ";";
        numbers.CurrencyGroupSeparator = "'";
        numbers.CurrencyGroupSizes = new[] { 4 };
        numbers.CurrencySymbol = "\u00A4\u00A4";
        numbers.PercentDecimalSeparator = "\u00B7";
        numbers.PercentGroupSeparator = "_";
        numbers.PercentGroupSizes = new[] { 1 };
        numbers.PercentSymbol = "pct";
        numbers.PerMilleSymbol = "pm";
        numbers.NaNSymbol = "not-a-number";
        numbers.PositiveInfinitySymbol = "+inf";
        numbers.NegativeInfinitySymbol = "-inf";
        numbers.NumberNegativePattern = 0;
        numbers.CurrencyPositivePattern = 3;
        numbers.CurrencyNegativePattern = 15;
        numbers.PercentPositivePattern = 2;
        numbers.PercentNegativePattern = 5;
        return CultureInfo.ReadOnly(culture);
    }
}
