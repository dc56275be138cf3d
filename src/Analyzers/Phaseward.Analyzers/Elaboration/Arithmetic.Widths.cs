using System;
using System.Globalization;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// The numeric types beyond int, long, float and double: uint, ulong and decimal in their own arithmetic; byte, sbyte,
// short, ushort and char, which C# widens to int before it computes (b += 100 is b = (byte)(b + 100)); and every
// numeric conversion between them, checked (OverflowException) or unchecked (wraps) as C# does it.
internal static partial class Arithmetic
{
    /// <summary>
    /// An operator on a value of <paramref name="type"/>: a compound assignment or an increment of a byte, sbyte, short,
    /// ushort or char computes in the type C# widens both sides to and converts the result back; uint, ulong and decimal
    /// compute in their own arithmetic. Null when the pair is outside the subset.
    /// </summary>
    private static object? Numeric(BinaryOperatorKind kind, object left, object right, SpecialType type, bool isChecked)
    {
        var shift = kind is BinaryOperatorKind.LeftShift or BinaryOperatorKind.RightShift or BinaryOperatorKind.UnsignedRightShift;
        var computedIn = shift ? Widened(type) : Promoted(type, TypeOf(right));
        if (computedIn == type || computedIn == SpecialType.None)
            return InOwnType(kind, left, right, type, isChecked);
        var wide = ConvertNumber(left, computedIn, isChecked);
        var other = shift ? right : ConvertNumber(right, computedIn, isChecked);
        if (wide is null || other is null)
            return null;
        var result = computedIn switch
        {
            SpecialType.System_Int32 => isChecked ? CheckedInt(kind, (int)wide, Convert.ToInt32(other, CultureInfo.InvariantCulture))
                : UncheckedInt(kind, (int)wide, Convert.ToInt32(other, CultureInfo.InvariantCulture)),
            SpecialType.System_Int64 => Long(kind, (long)wide, Convert.ToInt64(other, CultureInfo.InvariantCulture), isChecked),
            SpecialType.System_Double => Double(kind, (double)wide, (double)other),
            SpecialType.System_Single => Single(kind, (float)wide, (float)other),
            _ => InOwnType(kind, wide, other, computedIn, isChecked),
        };

        // A comparison gives a bool; an arithmetic result goes back to the type of the variable it is stored in.
        return result is null or bool ? result : ConvertNumber(result, type, isChecked);
    }

    private static object? InOwnType(BinaryOperatorKind kind, object left, object right, SpecialType type, bool isChecked) => type switch
    {
        SpecialType.System_UInt32 => UInt(kind, Convert.ToUInt32(left, CultureInfo.InvariantCulture), right, isChecked),
        SpecialType.System_UInt64 => ULong(kind, Convert.ToUInt64(left, CultureInfo.InvariantCulture), right, isChecked),
        SpecialType.System_Decimal => Decimal(kind, Convert.ToDecimal(left, CultureInfo.InvariantCulture), Convert.ToDecimal(right, CultureInfo.InvariantCulture)),
        _ => null,
    };

    // C#'s binary numeric promotion (ECMA-334, 12.4.7.3): the type both operands are converted to.
    private static SpecialType Promoted(SpecialType a, SpecialType b)
    {
        if (a == SpecialType.None || b == SpecialType.None)
            return SpecialType.None;
        if (a == SpecialType.System_Decimal || b == SpecialType.System_Decimal)
            return SpecialType.System_Decimal;
        if (a == SpecialType.System_Double || b == SpecialType.System_Double)
            return SpecialType.System_Double;
        if (a == SpecialType.System_Single || b == SpecialType.System_Single)
            return SpecialType.System_Single;
        if (a == SpecialType.System_UInt64 || b == SpecialType.System_UInt64)
            return SpecialType.System_UInt64;
        if (a == SpecialType.System_Int64 || b == SpecialType.System_Int64)
            return SpecialType.System_Int64;
        if (a == SpecialType.System_UInt32 || b == SpecialType.System_UInt32)
            return IsSigned(a) || IsSigned(b) ? SpecialType.System_Int64 : SpecialType.System_UInt32;
        return SpecialType.System_Int32;
    }

    // The type a shift computes in: the left operand's, widened to int if narrower.
    private static SpecialType Widened(SpecialType type) => type is SpecialType.System_SByte or SpecialType.System_Byte or SpecialType.System_Int16
        or SpecialType.System_UInt16 or SpecialType.System_Char ? SpecialType.System_Int32 : type;

    private static bool IsSigned(SpecialType type) => type is SpecialType.System_SByte or SpecialType.System_Int16 or SpecialType.System_Int32;

    /// <summary>The numeric type a held number is of (None for anything else).</summary>
    internal static SpecialType TypeOf(object value) => value switch
    {
        sbyte => SpecialType.System_SByte,
        byte => SpecialType.System_Byte,
        short => SpecialType.System_Int16,
        ushort => SpecialType.System_UInt16,
        char => SpecialType.System_Char,
        int => SpecialType.System_Int32,
        uint => SpecialType.System_UInt32,
        long => SpecialType.System_Int64,
        ulong => SpecialType.System_UInt64,
        float => SpecialType.System_Single,
        double => SpecialType.System_Double,
        decimal => SpecialType.System_Decimal,
        _ => SpecialType.None,
    };

    private static object? UInt(BinaryOperatorKind kind, uint a, object right, bool isChecked)
    {
        if (kind is BinaryOperatorKind.LeftShift or BinaryOperatorKind.RightShift or BinaryOperatorKind.UnsignedRightShift)
        {
            var count = Convert.ToInt32(right, CultureInfo.InvariantCulture);
            return kind == BinaryOperatorKind.LeftShift ? a << count : a >> count;
        }

        var b = Convert.ToUInt32(right, CultureInfo.InvariantCulture);
        return kind switch
        {
            BinaryOperatorKind.Add => isChecked ? checked(a + b) : unchecked(a + b),
            BinaryOperatorKind.Subtract => isChecked ? checked(a - b) : unchecked(a - b),
            BinaryOperatorKind.Multiply => isChecked ? checked(a * b) : unchecked(a * b),
            BinaryOperatorKind.Divide => a / b,
            BinaryOperatorKind.Remainder => a % b,
            BinaryOperatorKind.And => a & b,
            BinaryOperatorKind.Or => a | b,
            BinaryOperatorKind.ExclusiveOr => a ^ b,
            _ => Compare(kind, a.CompareTo(b)),
        };
    }

    private static object? ULong(BinaryOperatorKind kind, ulong a, object right, bool isChecked)
    {
        if (kind is BinaryOperatorKind.LeftShift or BinaryOperatorKind.RightShift or BinaryOperatorKind.UnsignedRightShift)
        {
            var count = Convert.ToInt32(right, CultureInfo.InvariantCulture);
            return kind == BinaryOperatorKind.LeftShift ? a << count : a >> count;
        }

        var b = Convert.ToUInt64(right, CultureInfo.InvariantCulture);
        return kind switch
        {
            BinaryOperatorKind.Add => isChecked ? checked(a + b) : unchecked(a + b),
            BinaryOperatorKind.Subtract => isChecked ? checked(a - b) : unchecked(a - b),
            BinaryOperatorKind.Multiply => isChecked ? checked(a * b) : unchecked(a * b),
            BinaryOperatorKind.Divide => a / b,
            BinaryOperatorKind.Remainder => a % b,
            BinaryOperatorKind.And => a & b,
            BinaryOperatorKind.Or => a | b,
            BinaryOperatorKind.ExclusiveOr => a ^ b,
            _ => Compare(kind, a.CompareTo(b)),
        };
    }

    // decimal arithmetic always throws on overflow, checked or not.
    private static object? Decimal(BinaryOperatorKind kind, decimal a, decimal b) => kind switch
    {
        BinaryOperatorKind.Add => a + b,
        BinaryOperatorKind.Subtract => a - b,
        BinaryOperatorKind.Multiply => a * b,
        BinaryOperatorKind.Divide => a / b,
        BinaryOperatorKind.Remainder => a % b,
        _ => Compare(kind, a.CompareTo(b)),
    };

    private static object? Compare(BinaryOperatorKind kind, int order) => kind switch
    {
        BinaryOperatorKind.Equals => order == 0,
        BinaryOperatorKind.NotEquals => order != 0,
        BinaryOperatorKind.LessThan => order < 0,
        BinaryOperatorKind.LessThanOrEqual => order <= 0,
        BinaryOperatorKind.GreaterThan => order > 0,
        BinaryOperatorKind.GreaterThanOrEqual => order >= 0,
        _ => null,
    };

    // Unary operators on uint, ulong and decimal (C# widens the narrower types, and -uint, to int or long first).
    private static object? NumericUnary(UnaryOperatorKind kind, object operand, SpecialType type) => type switch
    {
        SpecialType.System_UInt32 => kind switch
        {
            UnaryOperatorKind.Plus => Convert.ToUInt32(operand, CultureInfo.InvariantCulture),
            UnaryOperatorKind.BitwiseNegation => ~Convert.ToUInt32(operand, CultureInfo.InvariantCulture),
            _ => null,
        },
        SpecialType.System_UInt64 => kind switch
        {
            UnaryOperatorKind.Plus => Convert.ToUInt64(operand, CultureInfo.InvariantCulture),
            UnaryOperatorKind.BitwiseNegation => ~Convert.ToUInt64(operand, CultureInfo.InvariantCulture),
            _ => null,
        },
        SpecialType.System_Decimal => kind switch
        {
            UnaryOperatorKind.Plus => Convert.ToDecimal(operand, CultureInfo.InvariantCulture),
            UnaryOperatorKind.Minus => -Convert.ToDecimal(operand, CultureInfo.InvariantCulture),
            _ => null,
        },
        _ => null,
    };

    /// <summary>A numeric conversion to the given special type, as C# does it (checked or not).</summary>
    public static object? ConvertNumber(object value, SpecialType target, bool isChecked)
    {
        if (value is bool || value is string)
            return null;
        try
        {
            return value switch
            {
                double d => FromDouble(d, target, isChecked),
                float f => target == SpecialType.System_Single ? f : FromDouble(f, target, isChecked),
                decimal m => FromDecimal(m, target),
                ulong u => FromUnsigned(u, target, isChecked),
                _ => FromSigned(Convert.ToInt64(value, CultureInfo.InvariantCulture), target, isChecked),
            };
        }
        catch (InvalidCastException)
        {
            return null;
        }
    }

    private static object? FromSigned(long l, SpecialType target, bool isChecked) => isChecked
        ? target switch
        {
            SpecialType.System_SByte => checked((sbyte)l),
            SpecialType.System_Byte => checked((byte)l),
            SpecialType.System_Int16 => checked((short)l),
            SpecialType.System_UInt16 => checked((ushort)l),
            SpecialType.System_Char => checked((char)l),
            SpecialType.System_Int32 => checked((int)l),
            SpecialType.System_UInt32 => checked((uint)l),
            SpecialType.System_Int64 => l,
            SpecialType.System_UInt64 => checked((ulong)l),
            _ => ToFloating(l, target),
        }
        : target switch
        {
            SpecialType.System_SByte => unchecked((sbyte)l),
            SpecialType.System_Byte => unchecked((byte)l),
            SpecialType.System_Int16 => unchecked((short)l),
            SpecialType.System_UInt16 => unchecked((ushort)l),
            SpecialType.System_Char => unchecked((char)l),
            SpecialType.System_Int32 => unchecked((int)l),
            SpecialType.System_UInt32 => unchecked((uint)l),
            SpecialType.System_Int64 => l,
            SpecialType.System_UInt64 => unchecked((ulong)l),
            _ => ToFloating(l, target),
        };

    private static object? ToFloating(long l, SpecialType target) => target switch
    {
        SpecialType.System_Single => (float)l,
        SpecialType.System_Double => (double)l,
        SpecialType.System_Decimal => (decimal)l,
        _ => null,
    };

    private static object? FromUnsigned(ulong u, SpecialType target, bool isChecked) => target switch
    {
        SpecialType.System_UInt64 => u,
        SpecialType.System_Single => (float)u,
        SpecialType.System_Double => (double)u,
        SpecialType.System_Decimal => (decimal)u,
        _ when u <= long.MaxValue => FromSigned((long)u, target, isChecked),
        SpecialType.System_Int64 => isChecked ? checked((long)u) : unchecked((long)u),
        // Above long's range, the low bits are what an unchecked conversion keeps, as from the same bits as a long.
        _ => isChecked ? throw new OverflowException("Arithmetic operation resulted in an overflow.") : FromSigned(unchecked((long)u), target, isChecked: false),
    };

    private static object? FromDouble(double d, SpecialType target, bool isChecked) => isChecked
        ? target switch
        {
            SpecialType.System_SByte => checked((sbyte)d),
            SpecialType.System_Byte => checked((byte)d),
            SpecialType.System_Int16 => checked((short)d),
            SpecialType.System_UInt16 => checked((ushort)d),
            SpecialType.System_Char => checked((char)d),
            SpecialType.System_Int32 => checked((int)d),
            SpecialType.System_UInt32 => checked((uint)d),
            SpecialType.System_Int64 => checked((long)d),
            SpecialType.System_UInt64 => checked((ulong)d),
            SpecialType.System_Single => (float)d,
            SpecialType.System_Double => d,
            SpecialType.System_Decimal => (decimal)d,
            _ => null,
        }
        : target switch
        {
            SpecialType.System_SByte => unchecked((sbyte)d),
            SpecialType.System_Byte => unchecked((byte)d),
            SpecialType.System_Int16 => unchecked((short)d),
            SpecialType.System_UInt16 => unchecked((ushort)d),
            SpecialType.System_Char => unchecked((char)d),
            SpecialType.System_Int32 => unchecked((int)d),
            SpecialType.System_UInt32 => unchecked((uint)d),
            SpecialType.System_Int64 => unchecked((long)d),
            SpecialType.System_UInt64 => unchecked((ulong)d),
            SpecialType.System_Single => (float)d,
            SpecialType.System_Double => d,
            SpecialType.System_Decimal => (decimal)d,
            _ => null,
        };

    // From decimal every conversion to an integer throws when out of range, checked or not, as in C#.
    private static object? FromDecimal(decimal m, SpecialType target) => target switch
    {
        SpecialType.System_SByte => (sbyte)m,
        SpecialType.System_Byte => (byte)m,
        SpecialType.System_Int16 => (short)m,
        SpecialType.System_UInt16 => (ushort)m,
        SpecialType.System_Char => (char)m,
        SpecialType.System_Int32 => (int)m,
        SpecialType.System_UInt32 => (uint)m,
        SpecialType.System_Int64 => (long)m,
        SpecialType.System_UInt64 => (ulong)m,
        SpecialType.System_Single => (float)m,
        SpecialType.System_Double => (double)m,
        SpecialType.System_Decimal => m,
        _ => null,
    };
}
