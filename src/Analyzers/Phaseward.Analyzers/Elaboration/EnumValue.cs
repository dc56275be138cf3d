using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// A value of an enum declared in the design's source (the type exists only as a symbol, so it cannot be a .NET enum):
/// its type and underlying value. It prints, compares, hashes and converts as the .NET enum would, so a name built from
/// it, a dictionary keyed by it and a boxed one tested with <c>is int</c> all behave as at run time. What .NET would
/// decide by something the source does not fix (the name of a value two members share) is not guessed: it throws
/// <see cref="UnknownValueException"/>, reported where it is asked for.
/// </summary>
internal sealed class EnumValue : IFormattable, IComparable, IConvertible
{
    public EnumValue(INamedTypeSymbol type, long value)
    {
        Type = type;
        Value = Truncated(value, type.EnumUnderlyingType?.SpecialType ?? SpecialType.System_Int32);
    }

    public INamedTypeSymbol Type { get; }

    /// <summary>The underlying value, widened to long (a ulong above long.MaxValue wraps, as its bits).</summary>
    public long Value { get; }

    private SpecialType Underlying => Type.EnumUnderlyingType?.SpecialType ?? SpecialType.System_Int32;

    /// <summary>The same enum type with another value (the result of <c>&amp;</c>, <c>|</c>, <c>^</c>, <c>~</c>).</summary>
    public EnumValue With(long value) => new(Type, value);

    /// <summary>The underlying value as its own .NET type (what a cast to the underlying type gives).</summary>
    public object Number => Underlying switch
    {
        SpecialType.System_Byte => (byte)Value,
        SpecialType.System_SByte => (sbyte)Value,
        SpecialType.System_Int16 => (short)Value,
        SpecialType.System_UInt16 => (ushort)Value,
        SpecialType.System_UInt32 => (uint)Value,
        SpecialType.System_Int64 => Value,
        SpecialType.System_UInt64 => unchecked((ulong)Value),
        _ => (object)(int)Value,
    };

    /// <summary>The members of the enum with their values, in declaration order.</summary>
    public static IReadOnlyList<(string Name, long Value)> MembersOf(INamedTypeSymbol type)
    {
        var underlying = type.EnumUnderlyingType?.SpecialType ?? SpecialType.System_Int32;
        return type.GetMembers().OfType<IFieldSymbol>().Where(f => f.HasConstantValue && f.ConstantValue is not null)
            .Select(f => (f.Name, Truncated(System.Convert.ToInt64(f.ConstantValue, CultureInfo.InvariantCulture), underlying))).ToList();
    }

    /// <summary>The members ordered as .NET lists them (<c>Enum.GetNames</c>, <c>GetValues</c>): by unsigned value.</summary>
    public static IReadOnlyList<(string Name, long Value)> SortedMembersOf(INamedTypeSymbol type)
        => MembersOf(type).OrderBy(m => unchecked((ulong)m.Value)).ToList();

    public static bool IsFlags(INamedTypeSymbol type)
        => type.GetAttributes().Any(a => a.AttributeClass?.ToDisplayString() == "System.FlagsAttribute");

    public override bool Equals(object? obj) => obj is EnumValue other && other.Value == Value && SymbolEqualityComparer.Default.Equals(other.Type, Type);

    // Enum.GetHashCode is the underlying value's hash: the same in every process.
    public override int GetHashCode() => Number.GetHashCode();

    // Called by library code (string.Join of enums), which runs under the invariant culture or, to tell whether the
    // culture matters, a contrary one: the thread's culture is the one the library call is made in.
    public override string ToString() => ToString(null, System.Threading.Thread.CurrentThread.CurrentCulture);

    /// <summary>As <c>Enum.ToString(format)</c>: G (names; flags as "A, B"), D (the number), X (hex digits), F (flags).</summary>
    public string ToString(string? format, IFormatProvider? formatProvider)
    {
        switch (string.IsNullOrEmpty(format) ? "G" : format)
        {
            case "G" or "g":
                return IsFlags(Type) ? FlagsText(formatProvider) : NameOf(Value) ?? NumberText(formatProvider);
            case "F" or "f":
                return FlagsText(formatProvider);
            case "D" or "d":
                return NumberText(formatProvider);
            case "X" or "x":
                return unchecked((ulong)Value & Mask).ToString("X" + (2 * SizeOf(Underlying)).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            default:
                throw UnknownValueException.Unsupported("the format \"" + format + "\" of the enum " + Type.Name, "only G, D, X and F format an enum");
        }
    }

    // As the underlying type's CompareTo: sbyte, byte, short and ushort give the difference (Sgn.Neg vs Sgn.Pos is -2),
    // the wider types -1, 0 or 1.
    public int CompareTo(object? obj) => obj is EnumValue other && SymbolEqualityComparer.Default.Equals(other.Type, Type)
        ? (SizeOf(Underlying) < 4 ? (int)(Value - other.Value)
            : IsUnsigned(Underlying) ? unchecked((ulong)Value).CompareTo(unchecked((ulong)other.Value)) : Value.CompareTo(other.Value))
        : obj is null ? 1 : throw new ArgumentException("Object must be the same type as the enum. The type passed in was '" + obj.GetType() + "'; the enum type was '" + Type.Name + "'.");

    private ulong Mask => SizeOf(Underlying) == 8 ? ulong.MaxValue : (1UL << (8 * SizeOf(Underlying))) - 1;

    // The number is printed by its own type with the culture asked for: a negative one takes that culture's minus sign.
    private string NumberText(IFormatProvider? provider) => ((IFormattable)Number).ToString(null, provider);

    private string? NameOf(long value)
    {
        var named = MembersOf(Type).Where(m => m.Value == value).Select(m => m.Name).Distinct().ToList();
        if (named.Count > 1)
            throw UnknownValueException.Unsupported("the name of the value " + value.ToString(CultureInfo.InvariantCulture) + " of the enum " + Type.Name,
                "several members have that value, and which name .NET prints is not specified");
        return named.Count == 1 ? named[0] : null;
    }

    // .NET's flags format: an exact member first; else the members whose bits are all set, taken from the largest value
    // down, printed in ascending order; bits no member covers give the number instead.
    private string FlagsText(IFormatProvider? provider)
    {
        if (NameOf(Value) is { } exact)
            return exact;
        if (Value == 0)
            return NumberText(provider);
        var members = SortedMembersOf(Type);
        if (members.GroupBy(m => m.Value).Any(g => g.Count() > 1))
            throw UnknownValueException.Unsupported("the flags of the enum " + Type.Name, "several members share a value, and which name .NET prints is not specified");
        var rest = unchecked((ulong)Value);
        var taken = new List<string>();
        for (var i = members.Count - 1; i >= 0; i--)
        {
            var bits = unchecked((ulong)members[i].Value);
            if (bits != 0 && (rest & bits) == bits)
            {
                rest -= bits;
                taken.Insert(0, members[i].Name);
            }
        }

        return rest != 0 ? NumberText(provider) : string.Join(", ", taken);
    }

    private static long Truncated(long value, SpecialType underlying) => underlying switch
    {
        SpecialType.System_Byte => (byte)value,
        SpecialType.System_SByte => (sbyte)value,
        SpecialType.System_Int16 => (short)value,
        SpecialType.System_UInt16 => (ushort)value,
        SpecialType.System_Int32 => (int)value,
        SpecialType.System_UInt32 => (uint)value,
        _ => value,
    };

    private static int SizeOf(SpecialType underlying) => underlying switch
    {
        SpecialType.System_Byte or SpecialType.System_SByte => 1,
        SpecialType.System_Int16 or SpecialType.System_UInt16 => 2,
        SpecialType.System_Int64 or SpecialType.System_UInt64 => 8,
        _ => 4,
    };

    private static bool IsUnsigned(SpecialType underlying)
        => underlying is SpecialType.System_Byte or SpecialType.System_UInt16 or SpecialType.System_UInt32 or SpecialType.System_UInt64;

    // ---- IConvertible: what Convert.ToInt32(value) and the interpreter's numeric conversions read ----

    public TypeCode GetTypeCode() => ((IConvertible)Number).GetTypeCode();

    public bool ToBoolean(IFormatProvider? provider) => ((IConvertible)Number).ToBoolean(provider);

    public byte ToByte(IFormatProvider? provider) => ((IConvertible)Number).ToByte(provider);

    public char ToChar(IFormatProvider? provider) => ((IConvertible)Number).ToChar(provider);

    public DateTime ToDateTime(IFormatProvider? provider) => ((IConvertible)Number).ToDateTime(provider);

    public decimal ToDecimal(IFormatProvider? provider) => ((IConvertible)Number).ToDecimal(provider);

    public double ToDouble(IFormatProvider? provider) => ((IConvertible)Number).ToDouble(provider);

    public short ToInt16(IFormatProvider? provider) => ((IConvertible)Number).ToInt16(provider);

    public int ToInt32(IFormatProvider? provider) => ((IConvertible)Number).ToInt32(provider);

    public long ToInt64(IFormatProvider? provider) => ((IConvertible)Number).ToInt64(provider);

    public sbyte ToSByte(IFormatProvider? provider) => ((IConvertible)Number).ToSByte(provider);

    public float ToSingle(IFormatProvider? provider) => ((IConvertible)Number).ToSingle(provider);

    public string ToString(IFormatProvider? provider) => ToString(null, provider);

    public object ToType(Type conversionType, IFormatProvider? provider) => ((IConvertible)Number).ToType(conversionType, provider);

    public ushort ToUInt16(IFormatProvider? provider) => ((IConvertible)Number).ToUInt16(provider);

    public uint ToUInt32(IFormatProvider? provider) => ((IConvertible)Number).ToUInt32(provider);

    public ulong ToUInt64(IFormatProvider? provider) => ((IConvertible)Number).ToUInt64(provider);
}
