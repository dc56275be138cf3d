using System;
using System.Globalization;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// C#'s built-in operators on the primitive types designs compute with (int, long, double, float, bool, string, char;
/// the other numeric types and every numeric conversion in Arithmetic.Widths.cs),
/// with C#'s overflow rules: checked arithmetic throws <see cref="OverflowException"/>, unchecked wraps.
/// Returns null when the operator/type pair is outside the subset.
/// </summary>
internal static partial class Arithmetic
{
    public static object? Binary(BinaryOperatorKind kind, object left, object right, ITypeSymbol operandType, bool isChecked)
    {
        // In code that does not compile yet an operand can be a value of another type (a net where a number belongs):
        // such an operation is outside the subset, like any other the elaborator does not handle.
        try
        {
            return BinaryOf(kind, left, right, operandType, isChecked);
        }
        catch (InvalidCastException)
        {
            return null;
        }
    }

    private static object? BinaryOf(BinaryOperatorKind kind, object left, object right, ITypeSymbol operandType, bool isChecked)
    {
        if (operandType.TypeKind == TypeKind.Enum)
            return Enum(kind, left, right, isChecked);
        switch (operandType.SpecialType)
        {
            case SpecialType.System_Int32:
                return isChecked ? CheckedInt(kind, Convert.ToInt32(left, CultureInfo.InvariantCulture), Convert.ToInt32(right, CultureInfo.InvariantCulture))
                    : UncheckedInt(kind, Convert.ToInt32(left, CultureInfo.InvariantCulture), Convert.ToInt32(right, CultureInfo.InvariantCulture));
            case SpecialType.System_Int64:
                return Long(kind, Convert.ToInt64(left, CultureInfo.InvariantCulture), Convert.ToInt64(right, CultureInfo.InvariantCulture), isChecked);
            case SpecialType.System_Double:
                return Double(kind, Convert.ToDouble(left, CultureInfo.InvariantCulture), Convert.ToDouble(right, CultureInfo.InvariantCulture));
            case SpecialType.System_Single:
                return Single(kind, Convert.ToSingle(left, CultureInfo.InvariantCulture), Convert.ToSingle(right, CultureInfo.InvariantCulture));
            case SpecialType.System_Boolean:
                return Boolean(kind, (bool)left, (bool)right);
            case SpecialType.System_String:
                return kind switch
                {
                    BinaryOperatorKind.Equals => string.Equals(left as string, right as string, StringComparison.Ordinal),
                    BinaryOperatorKind.NotEquals => !string.Equals(left as string, right as string, StringComparison.Ordinal),
                    _ => null,
                };
            default:
                return Numeric(kind, left, right, operandType.SpecialType, isChecked);
        }
    }

    /// <summary>The text C# would produce for a value in a concatenation or an interpolation hole (see <see cref="ValueText"/>).</summary>
    public static string Text(object? value) => ValueText.Of(value);

    public static object? Unary(UnaryOperatorKind kind, object operand, ITypeSymbol type, bool isChecked)
    {
        try
        {
            return UnaryOf(kind, operand, type, isChecked);
        }
        catch (InvalidCastException)
        {
            return null;
        }
    }

    private static object? UnaryOf(UnaryOperatorKind kind, object operand, ITypeSymbol type, bool isChecked)
    {
        if (type.TypeKind == TypeKind.Enum)
            return kind == UnaryOperatorKind.BitwiseNegation ? EnumValue(operand, ~System.Convert.ToInt64(operand, CultureInfo.InvariantCulture)) : null;
        switch (type.SpecialType)
        {
            case SpecialType.System_Int32:
                var i = Convert.ToInt32(operand, CultureInfo.InvariantCulture);
                return kind switch
                {
                    UnaryOperatorKind.Minus => isChecked ? checked(-i) : unchecked(-i),
                    UnaryOperatorKind.Plus => i,
                    UnaryOperatorKind.BitwiseNegation => ~i,
                    _ => null,
                };
            case SpecialType.System_Int64:
                var l = Convert.ToInt64(operand, CultureInfo.InvariantCulture);
                return kind switch
                {
                    UnaryOperatorKind.Minus => isChecked ? checked(-l) : unchecked(-l),
                    UnaryOperatorKind.Plus => l,
                    UnaryOperatorKind.BitwiseNegation => ~l,
                    _ => null,
                };
            case SpecialType.System_Double:
                var d = Convert.ToDouble(operand, CultureInfo.InvariantCulture);
                return kind switch { UnaryOperatorKind.Minus => -d, UnaryOperatorKind.Plus => d, _ => null };
            case SpecialType.System_Single:
                var f = Convert.ToSingle(operand, CultureInfo.InvariantCulture);
                return kind switch { UnaryOperatorKind.Minus => -f, UnaryOperatorKind.Plus => f, _ => null };
            case SpecialType.System_Boolean:
                return kind == UnaryOperatorKind.Not ? !(bool)operand : null;
            default:
                return NumericUnary(kind, operand, type.SpecialType);
        }
    }

    private static object? CheckedInt(BinaryOperatorKind kind, int a, int b) => kind switch
    {
        BinaryOperatorKind.Add => checked(a + b),
        BinaryOperatorKind.Subtract => checked(a - b),
        BinaryOperatorKind.Multiply => checked(a * b),
        _ => UncheckedInt(kind, a, b),
    };

    private static object? UncheckedInt(BinaryOperatorKind kind, int a, int b) => kind switch
    {
        BinaryOperatorKind.Add => unchecked(a + b),
        BinaryOperatorKind.Subtract => unchecked(a - b),
        BinaryOperatorKind.Multiply => unchecked(a * b),
        BinaryOperatorKind.Divide => a / b,
        BinaryOperatorKind.Remainder => a % b,
        BinaryOperatorKind.And => a & b,
        BinaryOperatorKind.Or => a | b,
        BinaryOperatorKind.ExclusiveOr => a ^ b,
        BinaryOperatorKind.LeftShift => a << b,
        BinaryOperatorKind.RightShift => a >> b,
        BinaryOperatorKind.UnsignedRightShift => (int)((uint)a >> b),
        BinaryOperatorKind.Equals => a == b,
        BinaryOperatorKind.NotEquals => a != b,
        BinaryOperatorKind.LessThan => a < b,
        BinaryOperatorKind.LessThanOrEqual => a <= b,
        BinaryOperatorKind.GreaterThan => a > b,
        BinaryOperatorKind.GreaterThanOrEqual => a >= b,
        _ => null,
    };

    private static object? Long(BinaryOperatorKind kind, long a, long b, bool isChecked) => kind switch
    {
        BinaryOperatorKind.Add => isChecked ? checked(a + b) : unchecked(a + b),
        BinaryOperatorKind.Subtract => isChecked ? checked(a - b) : unchecked(a - b),
        BinaryOperatorKind.Multiply => isChecked ? checked(a * b) : unchecked(a * b),
        BinaryOperatorKind.Divide => a / b,
        BinaryOperatorKind.Remainder => a % b,
        BinaryOperatorKind.And => a & b,
        BinaryOperatorKind.Or => a | b,
        BinaryOperatorKind.ExclusiveOr => a ^ b,
        BinaryOperatorKind.LeftShift => a << (int)b,
        BinaryOperatorKind.RightShift => a >> (int)b,
        BinaryOperatorKind.UnsignedRightShift => (long)((ulong)a >> (int)b),
        BinaryOperatorKind.Equals => a == b,
        BinaryOperatorKind.NotEquals => a != b,
        BinaryOperatorKind.LessThan => a < b,
        BinaryOperatorKind.LessThanOrEqual => a <= b,
        BinaryOperatorKind.GreaterThan => a > b,
        BinaryOperatorKind.GreaterThanOrEqual => a >= b,
        _ => null,
    };

    private static object? Double(BinaryOperatorKind kind, double a, double b) => kind switch
    {
        BinaryOperatorKind.Add => a + b,
        BinaryOperatorKind.Subtract => a - b,
        BinaryOperatorKind.Multiply => a * b,
        BinaryOperatorKind.Divide => a / b,
        BinaryOperatorKind.Remainder => a % b,
        BinaryOperatorKind.Equals => a == b,
        BinaryOperatorKind.NotEquals => a != b,
        BinaryOperatorKind.LessThan => a < b,
        BinaryOperatorKind.LessThanOrEqual => a <= b,
        BinaryOperatorKind.GreaterThan => a > b,
        BinaryOperatorKind.GreaterThanOrEqual => a >= b,
        _ => null,
    };

    private static object? Single(BinaryOperatorKind kind, float a, float b) => kind switch
    {
        BinaryOperatorKind.Add => a + b,
        BinaryOperatorKind.Subtract => a - b,
        BinaryOperatorKind.Multiply => a * b,
        BinaryOperatorKind.Divide => a / b,
        BinaryOperatorKind.Remainder => a % b,
        BinaryOperatorKind.Equals => a == b,
        BinaryOperatorKind.NotEquals => a != b,
        BinaryOperatorKind.LessThan => a < b,
        BinaryOperatorKind.LessThanOrEqual => a <= b,
        BinaryOperatorKind.GreaterThan => a > b,
        BinaryOperatorKind.GreaterThanOrEqual => a >= b,
        _ => null,
    };

    private static object? Boolean(BinaryOperatorKind kind, bool a, bool b) => kind switch
    {
        BinaryOperatorKind.And => a & b,
        BinaryOperatorKind.Or => a | b,
        BinaryOperatorKind.ExclusiveOr => a ^ b,
        BinaryOperatorKind.ConditionalAnd => a && b,
        BinaryOperatorKind.ConditionalOr => a || b,
        BinaryOperatorKind.Equals => a == b,
        BinaryOperatorKind.NotEquals => a != b,
        _ => null,
    };

    private static object? Enum(BinaryOperatorKind kind, object left, object right, bool isChecked)
    {
        var a = System.Convert.ToInt64(left, CultureInfo.InvariantCulture);
        var b = System.Convert.ToInt64(right, CultureInfo.InvariantCulture);
        var leftIsEnum = left is System.Enum or Elaboration.EnumValue;
        var rightIsEnum = right is System.Enum or Elaboration.EnumValue;
        // C#'s enum arithmetic: E + n and n + E give an E; E - n an E; E - E the underlying number.
        if (kind == BinaryOperatorKind.Add && leftIsEnum != rightIsEnum)
            return EnumSum(leftIsEnum ? left : right, a + b, isChecked);
        if (kind == BinaryOperatorKind.Subtract && leftIsEnum)
        {
            var difference = EnumSum(left, a - b, isChecked);
            return rightIsEnum ? (difference is Elaboration.EnumValue designEnum ? designEnum.Number
                : System.Convert.ChangeType(difference, System.Enum.GetUnderlyingType(difference.GetType()), CultureInfo.InvariantCulture)) : difference;
        }

        return kind switch
        {
            BinaryOperatorKind.Equals => a == b,
            BinaryOperatorKind.NotEquals => a != b,
            BinaryOperatorKind.LessThan => a < b,
            BinaryOperatorKind.LessThanOrEqual => a <= b,
            BinaryOperatorKind.GreaterThan => a > b,
            BinaryOperatorKind.GreaterThanOrEqual => a >= b,
            BinaryOperatorKind.And => EnumValue(left, a & b),
            BinaryOperatorKind.Or => EnumValue(left, a | b),
            BinaryOperatorKind.ExclusiveOr => EnumValue(left, a ^ b),
            _ => null,
        };
    }

    // The enum value a + b or a - b gives, wrapped to the underlying type as unchecked C# does; checked, out of range throws.
    private static object EnumSum(object like, long value, bool isChecked)
    {
        var result = EnumValue(like, value);
        if (isChecked && System.Convert.ToInt64(result, CultureInfo.InvariantCulture) != value)
            throw new OverflowException("Arithmetic operation resulted in an overflow.");
        return result;
    }

    // A flags combination keeps the operand's representation: a DSL enum value, or the design's own enum's EnumValue.
    private static object EnumValue(object like, long value)
        => like is System.Enum ? System.Enum.ToObject(like.GetType(), value)
            : like is Elaboration.EnumValue designEnum ? designEnum.With(value)
            : (object)System.Convert.ToInt32(value, CultureInfo.InvariantCulture);
}
