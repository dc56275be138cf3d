using System;
using System.Globalization;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

internal sealed partial class Interpreter
{
    /// <summary>Does the value match the pattern? Null when that cannot be known.</summary>
    private bool? Match(IPatternOperation pattern, object? value, Frame frame)
    {
        switch (pattern)
        {
            case IConstantPatternOperation constant:
                var expected = Evaluate(constant.Value, frame);
                return Unknown.Is(expected) ? null : Equal(value, expected);

            case IRelationalPatternOperation relational:
                var bound = Evaluate(relational.Value, frame);
                if (Unknown.Is(bound) || value is null || bound is null || !IsComparable(value) || !IsComparable(bound)) return null;
                var a = System.Convert.ToDouble(value, CultureInfo.InvariantCulture);
                var b = System.Convert.ToDouble(bound, CultureInfo.InvariantCulture);
                return relational.OperatorKind switch
                {
                    BinaryOperatorKind.LessThan => a < b,
                    BinaryOperatorKind.LessThanOrEqual => a <= b,
                    BinaryOperatorKind.GreaterThan => a > b,
                    BinaryOperatorKind.GreaterThanOrEqual => a >= b,
                    _ => null,
                };

            case IDiscardPatternOperation:
                return true;

            case IDeclarationPatternOperation declaration:
                var matches = declaration.MatchesNull || value is not null;
                if (matches && declaration.DeclaredSymbol is { } symbol)
                    frame.Declare(symbol, value);
                return matches;

            case ITypePatternOperation:
                return value is not null;

            case INegatedPatternOperation negated:
                return Match(negated.Pattern, value, frame) is { } inner ? !inner : null;

            case IBinaryPatternOperation binary:
                var left = Match(binary.LeftPattern, value, frame);
                if (binary.OperatorKind == BinaryOperatorKind.Or && left == true) return true;
                if (binary.OperatorKind == BinaryOperatorKind.And && left == false) return false;
                var right = Match(binary.RightPattern, value, frame);
                return left is null || right is null ? null : binary.OperatorKind == BinaryOperatorKind.Or ? left.Value || right.Value : left.Value && right.Value;

            default:
                Unsupported(pattern, "this pattern", "the elaborator matches constant, relational, declaration, discard, 'not', 'and' and 'or' patterns");
                return null;
        }
    }

    /// <summary>C# equality for the values the elaborator meets: numbers by value, strings ordinally, objects by reference.</summary>
    private static bool? Equal(object? a, object? b)
    {
        if (Unknown.Is(a) || Unknown.Is(b)) return null;
        if (a is null || b is null) return a is null && b is null;
        if (IsComparable(a) && IsComparable(b))
        {
            if (a is double or float || b is double or float)
                return System.Convert.ToDouble(a, CultureInfo.InvariantCulture) == System.Convert.ToDouble(b, CultureInfo.InvariantCulture);
            return System.Convert.ToInt64(a, CultureInfo.InvariantCulture) == System.Convert.ToInt64(b, CultureInfo.InvariantCulture);
        }

        if (a is string s) return b is string t && string.Equals(s, t, StringComparison.Ordinal);
        if (a is bool x) return b is bool y && x == y;
        return a.GetType().IsValueType ? a.Equals(b) : ReferenceEquals(a, b);
    }

    private static bool IsComparable(object value) => IsNumericValue(value) || value is Enum;
}
