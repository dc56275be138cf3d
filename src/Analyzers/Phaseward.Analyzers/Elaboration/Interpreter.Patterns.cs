using System;
using System.Globalization;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Patterns: Match pushes the value being matched (PatternInput) and dispatches the pattern; each pattern's visit gives
// true, false, or null when whether it matches cannot be known.
internal sealed partial class Interpreter
{
    // Boxed once: a pattern's visit gives true, false or null (cannot be known) through the dispatch's object?.
    private static readonly object MatchedTrue = true;
    private static readonly object MatchedFalse = false;

    private static object? Matched(bool? result) => result is null ? null : result.Value ? MatchedTrue : MatchedFalse;

    /// <summary>The value the pattern being visited is matched against.</summary>
    private object? PatternInput => patternInputs.Peek();

    /// <summary>Does the value match the pattern? Null when that cannot be known.</summary>
    private bool? Match(IPatternOperation pattern, object? value, Frame frame)
    {
        if (Unknown.Is(value))
        {
            patternMetUnknown = true;
            return null;
        }

        patternInputs.Push(value);
        try
        {
            return Visit(pattern, frame) is bool matched ? matched : null;
        }
        finally
        {
            patternInputs.Pop();
        }
    }

    /// <summary>
    /// Matches the pattern of an <c>is</c>, a switch arm or a case label: true, false, or null when that cannot be known,
    /// then reported as PW9001 at the pattern, unless a value it met was unknown (reported where it arose).
    /// </summary>
    private bool? Decide(IPatternOperation pattern, object? value, Frame frame)
    {
        var outer = patternMetUnknown;
        patternMetUnknown = false;
        var matches = Match(pattern, value, frame);
        var metUnknown = patternMetUnknown;
        patternMetUnknown = outer;
        if (matches is null && !metUnknown)
            Unsupported(pattern, "this pattern", "whether the value matches it cannot be decided at compile time");
        return matches;
    }

    private object? VisitIsPattern(IIsPatternOperation isPattern, Frame frame)
    {
        var subject = Evaluate(isPattern.Value, frame);
        return Unknown.Is(subject) ? subject : Matched(Decide(isPattern.Pattern, subject, frame)) ?? Unknown.Value;
    }

    private object? VisitConstantPattern(IConstantPatternOperation constant, Frame frame)
    {
        var expected = Evaluate(constant.Value, frame);
        return Unknown.Is(expected) ? null : Matched(Equal(PatternInput, expected));
    }

    private object? VisitRelationalPattern(IRelationalPatternOperation relational, Frame frame)
    {
        var value = PatternInput;
        var bound = Evaluate(relational.Value, frame);
        if (Unknown.Is(bound) || value is null || bound is null || !IsComparable(value) || !IsComparable(bound)) return null;
        var order = Compare(value, bound);
        return Matched(relational.OperatorKind switch
        {
            BinaryOperatorKind.LessThan => order < 0,
            BinaryOperatorKind.LessThanOrEqual => order <= 0,
            BinaryOperatorKind.GreaterThan => order > 0,
            BinaryOperatorKind.GreaterThanOrEqual => order >= 0,
            _ => null,
        });
    }

    private object? VisitDiscardPattern(IDiscardPatternOperation discard, Frame frame) => MatchedTrue;

    private object? VisitDeclarationPattern(IDeclarationPatternOperation declaration, Frame frame)
    {
        var value = PatternInput;
        bool? matches = declaration.MatchesNull ? true
            : declaration.MatchedType is { } declared && !SymbolEqualityComparer.Default.Equals(declared, declaration.InputType) ? IsOfType(value, declared, frame)
            : value is not null;
        if (matches == true && declaration.DeclaredSymbol is { } symbol)
            frame.Declare(symbol, value);
        return Matched(matches);
    }

    private object? VisitTypePattern(ITypePatternOperation typePattern, Frame frame) => Matched(IsOfType(PatternInput, typePattern.MatchedType, frame));

    private object? VisitNegatedPattern(INegatedPatternOperation negated, Frame frame)
        => Matched(Match(negated.Pattern, PatternInput, frame) is { } inner ? !inner : null);

    private object? VisitBinaryPattern(IBinaryPatternOperation binary, Frame frame)
    {
        var value = PatternInput;
        var left = Match(binary.LeftPattern, value, frame);
        if (binary.OperatorKind == BinaryOperatorKind.Or && left == true) return MatchedTrue;
        if (binary.OperatorKind == BinaryOperatorKind.And && left == false) return MatchedFalse;
        var right = Match(binary.RightPattern, value, frame);
        return left is null || right is null ? null : Matched(binary.OperatorKind == BinaryOperatorKind.Or ? left.Value || right.Value : left.Value && right.Value);
    }

    private object? VisitRecursivePattern(IRecursivePatternOperation pattern, Frame frame) => Matched(MatchRecursive(pattern, PatternInput, frame));

    private bool? MatchRecursive(IRecursivePatternOperation pattern, object? value, Frame frame)
    {
        if (value is null) return false;
        if (!SymbolEqualityComparer.Default.Equals(pattern.MatchedType, pattern.InputType) && IsOfType(value, pattern.MatchedType, frame) is not true)
            return IsOfType(value, pattern.MatchedType, frame) is null ? null : false;
        if (!pattern.DeconstructionSubpatterns.IsEmpty)
        {
            var parts = value as TupleValue ?? DeconstructedParts(value);
            // Without a Deconstruct method C# tests for ITuple: only tuples have it among the values the elaborator makes.
            if (parts is null) return value is InterpretedObject ? null : false;
            if (parts.Items.Length != pattern.DeconstructionSubpatterns.Length) return false;
            for (var i = 0; i < parts.Items.Length; i++)
                if (Match(pattern.DeconstructionSubpatterns[i], parts.Items[i], frame) is not true and var result)
                    return result;
        }

        foreach (var property in pattern.PropertySubpatterns)
        {
            // The member is read from the pattern's input (PatternInput, on top of patternInputs while this pattern is matched).
            var member = Evaluate(property.Member, frame);
            if (Match(property.Pattern, member, frame) is not true and var result)
                return result;
        }

        if (pattern.DeclaredSymbol is { } symbol)
            frame.Declare(symbol, value);
        return true;
    }

    private object? VisitListPattern(IListPatternOperation pattern, Frame frame) => Matched(MatchList(pattern, PatternInput, frame));

    private bool? MatchList(IListPatternOperation pattern, object? value, Frame frame)
    {
        System.Collections.IList? items = value switch
        {
            object?[] array => array,
            System.Collections.Generic.List<object?> list => list,
            string text => text.ToCharArray(),
            _ => null,
        };
        if (items is null) return value is null ? false : null;
        var slice = -1;
        for (var i = 0; i < pattern.Patterns.Length; i++)
            if (pattern.Patterns[i] is ISlicePatternOperation) slice = i;
        var fixedCount = pattern.Patterns.Length - (slice >= 0 ? 1 : 0);
        if (slice < 0 ? items.Count != fixedCount : items.Count < fixedCount) return false;
        for (var i = 0; i < pattern.Patterns.Length; i++)
        {
            if (i == slice)
            {
                if (((ISlicePatternOperation)pattern.Patterns[i]).Pattern is { } inner)
                {
                    // The slice has the type of what it slices, as C#'s range indexer or Slice gives it.
                    var length = items.Count - fixedCount;
                    var elements = new object?[length];
                    for (var k = 0; k < length; k++) elements[k] = items[i + k];
                    object part = value switch
                    {
                        string text => text.Substring(i, length),
                        System.Collections.Generic.List<object?> => new System.Collections.Generic.List<object?>(elements),
                        _ => elements,
                    };
                    if (Match(inner, part, frame) is not true and var sliceResult) return sliceResult;
                }

                continue;
            }

            var index = slice >= 0 && i > slice ? items.Count - (pattern.Patterns.Length - i) : i;
            if (Match(pattern.Patterns[i], items[index], frame) is not true and var result)
                return result;
        }

        if (pattern.DeclaredSymbol is { } symbol)
            frame.Declare(symbol, value);
        return true;
    }

    /// <summary>C# equality for the values the elaborator meets: numbers by value, strings ordinally, objects by reference.</summary>
    private static bool? Equal(object? a, object? b)
    {
        if (Unknown.Is(a) || Unknown.Is(b)) return null;
        if (a is null || b is null) return a is null && b is null;
        // A design's enum equals only a value of the same enum (a boxed Color.Blue is not the int 4).
        if (a is EnumValue || b is EnumValue) return a.Equals(b);
        if (IsComparable(a) && IsComparable(b))
            return Compare(a, b) == 0;

        if (a is string s) return b is string t && string.Equals(s, t, StringComparison.Ordinal);
        if (a is bool x) return b is bool y && x == y;
        return a.GetType().IsValueType ? a.Equals(b) : ReferenceEquals(a, b);
    }

    private static bool IsComparable(object value) => IsNumericValue(value) || value is Enum or EnumValue;

    /// <summary>
    /// Orders two numbers exactly: whole numbers as whole numbers (a long above 2^53 or a ulong above long.MaxValue is
    /// not rounded through double), anything with a fraction as double (NaN compares unequal, as in C#).
    /// </summary>
    private static int? Compare(object a, object b)
    {
        if (a is double or float || b is double or float)
        {
            var x = System.Convert.ToDouble(a, CultureInfo.InvariantCulture);
            var y = System.Convert.ToDouble(b, CultureInfo.InvariantCulture);
            return x < y ? -1 : x > y ? 1 : x == y ? 0 : null;
        }

        if (a is ulong || b is ulong)
            return System.Convert.ToDecimal(a, CultureInfo.InvariantCulture).CompareTo(System.Convert.ToDecimal(b, CultureInfo.InvariantCulture));
        return System.Convert.ToInt64(a, CultureInfo.InvariantCulture).CompareTo(System.Convert.ToInt64(b, CultureInfo.InvariantCulture));
    }
}
