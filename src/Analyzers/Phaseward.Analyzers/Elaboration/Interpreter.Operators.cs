using System;
using System.Globalization;
using System.Linq;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Operators: arithmetic, comparison and logic (C#'s rules, checked or not, lifted over nullable values), conversions,
// string concatenation and interpolation, and user-defined operators (interpreted when the design declares them).
internal sealed partial class Interpreter
{

    private object? VisitBinary(IBinaryOperation binary, Frame frame)
    {
        var left = Evaluate(binary.LeftOperand, frame);
        if (Unknown.Is(left)) return Skipped(binary.OperatorMethod is null ? binary.RightOperand : binary, frame);

        if (binary.OperatorKind is BinaryOperatorKind.ConditionalAnd or BinaryOperatorKind.ConditionalOr && binary.OperatorMethod is { } userOperator)
        {
            // A user-defined && or ||: C# asks the type's operator false (for &&) or true (for ||) whether the left
            // operand decides, and only then evaluates the right one and calls & or |.
            var decidesName = binary.OperatorKind == BinaryOperatorKind.ConditionalAnd ? "op_False" : "op_True";
            if (userOperator.ContainingType?.GetMembers(decidesName).OfType<IMethodSymbol>().FirstOrDefault() is not { } decides)
                return Unsupported(binary, "this logical operator", "its type's operator true or false was not found");
            var decided = CallOperator(binary, decides, new[] { left }, frame);
            if (decided is true) return left;
            if (decided is not false) return Skipped(binary, frame);
            var rightOperand = Evaluate(binary.RightOperand, frame);
            return Unknown.Is(rightOperand) ? Skipped(binary, frame) : CallOperator(binary, userOperator, new[] { left, rightOperand }, frame);
        }

        if (binary.OperatorKind is BinaryOperatorKind.ConditionalAnd or BinaryOperatorKind.ConditionalOr && binary.OperatorMethod is null)
        {
            if (left is not bool l) return Unsupported(binary, "this logical operator", "its operands are not bool");
            if (binary.OperatorKind == BinaryOperatorKind.ConditionalAnd ? !l : l) return l;
            var rightValue = Evaluate(binary.RightOperand, frame);
            return Unknown.Is(rightValue) || rightValue is bool ? rightValue : Unsupported(binary, "this logical operator", "its operands are not bool");
        }

        var right = Evaluate(binary.RightOperand, frame);
        if (Unknown.Is(right)) return binary.OperatorMethod is null ? right : Skipped(binary, frame);

        if (binary.OperatorMethod is { } method)
            return CallOperator(binary, method, new[] { left, right }, frame);
        if (binary.IsLifted && (left is null || right is null))
            return binary.OperatorKind switch
            {
                BinaryOperatorKind.Equals => left is null && right is null,
                BinaryOperatorKind.NotEquals => !(left is null && right is null),
                BinaryOperatorKind.LessThan or BinaryOperatorKind.LessThanOrEqual or BinaryOperatorKind.GreaterThan or BinaryOperatorKind.GreaterThanOrEqual => false,
                // bool? & and | are three-valued (C# specification, §12.13.5): false & null is false, true | null is true.
                BinaryOperatorKind.And when left is false || right is false => false,
                BinaryOperatorKind.Or when left is true || right is true => true,
                _ => null,
            };
        if (binary.IsLifted && binary.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals)
        {
            var same = Equal(left, right);
            return same is null ? Unknown.Value : binary.OperatorKind == BinaryOperatorKind.Equals ? same.Value : !same.Value;
        }

        if (NullableUnderlying(binary.LeftOperand.Type) is { } liftedType && binary.IsLifted)
        {
            try
            {
                return Arithmetic.Binary(binary.OperatorKind, left!, right!, liftedType, binary.IsChecked)
                    ?? Unsupported(binary, "operator " + binary.OperatorKind + " on " + liftedType.ToDisplayString(), "it is outside the subset");
            }
            catch (ArithmeticException e)
            {
                return Raise(binary.Syntax, e);
            }
        }

        var leftType = binary.LeftOperand.Type;
        var rightType = binary.RightOperand.Type;
        if (IsDelegate(binary.Type) && binary.OperatorKind is BinaryOperatorKind.Add or BinaryOperatorKind.Subtract)
            return DelegateArithmetic(binary, binary.OperatorKind, left, right);
        if (binary.OperatorKind == BinaryOperatorKind.Add
            && (leftType?.SpecialType == SpecialType.System_String || rightType?.SpecialType == SpecialType.System_String))
        {
            return Concatenate(binary, left, right, SourceType(binary.LeftOperand), SourceType(binary.RightOperand));
        }

        if (binary.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals && left is InterpretedObject { Type.IsRecord: true } record
            && leftType is { IsRecord: true })
        {
            return RecordEquality(binary, record, right, negated: binary.OperatorKind == BinaryOperatorKind.NotEquals);
        }

        if (binary.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals && left is Closure leftDelegate && right is Closure rightDelegate
            && IsDelegate(leftType) && IsDelegate(rightType))
        {
            if (Closure.AreEqual(leftDelegate, rightDelegate) is not { } equal)
                return Unsupported(binary, "the equality of two delegates made from one lambda",
                    "C# compares the objects their captured variables live in, which the elaborator does not model");
            return binary.OperatorKind == BinaryOperatorKind.Equals ? equal : !equal;
        }

        if (binary.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals
            && (left is null || right is null || (leftType?.IsReferenceType == true && leftType.SpecialType != SpecialType.System_String)))
        {
            var same = SameObject(binary, left, right);
            return same is bool b ? (binary.OperatorKind == BinaryOperatorKind.Equals ? b : !b) : same;
        }

        if (leftType is null || left is null || right is null)
            return Unsupported(binary, "this operator", "its operand types are not known");
        // n + E is enum arithmetic, though its left operand is the number.
        var operandType = rightType is { TypeKind: TypeKind.Enum } && leftType.TypeKind != TypeKind.Enum ? rightType : leftType;
        return BinaryValue(binary, binary.OperatorKind, left, right, operandType, binary.IsChecked,
            "the elaborator handles arithmetic, comparisons and logic on int, long, float, double, bool, string and enums");
    }

    /// <summary>
    /// <c>t1 == t2</c> and <c>!=</c> on tuples: element by element, when the elements are of the types whose built-in
    /// equality the elaborator knows (numbers, bool, char, string, enums, and tuples of them).
    /// </summary>
    private object? VisitTupleBinary(ITupleBinaryOperation binary, Frame frame)
    {
        var left = Evaluate(binary.LeftOperand, frame);
        if (Unknown.Is(left)) return left;
        var right = Evaluate(binary.RightOperand, frame);
        if (Unknown.Is(right)) return right;
        if (binary.OperatorKind is not (BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals)
            || !HasBuiltInEquality(binary.LeftOperand.Type) || !HasBuiltInEquality(binary.RightOperand.Type))
            return Unsupported(binary, "this tuple comparison", "the elaborator compares tuples of numbers, bools, chars, strings and enums");
        var same = TuplesEqual(left, right);
        return same is null ? Unsupported(binary, "this tuple comparison", "its operands are not tuples of the same length")
            : binary.OperatorKind == BinaryOperatorKind.Equals ? same.Value : !same.Value;
    }

    /// <summary><c>ToString()</c> and <c>Equals(other)</c> of a tuple, as ValueTuple defines them (elements' own Equals).</summary>
    private object? CallTupleMember(IInvocationOperation invocation, TupleValue tuple, IMethodSymbol method, Frame frame)
    {
        var (arguments, _) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        try
        {
            return arguments.Length switch
            {
                0 when method.Name == "ToString" => tuple.ToString(),
                1 when method.Name == "Equals" => tuple.Equals(arguments[0]),
                _ => Unsupported(invocation, "the call to " + Describe(method), "of a tuple the elaborator answers ToString() and Equals(other)"),
            };
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, invocation);
        }
    }

    private static bool? TuplesEqual(object? left, object? right)
    {
        if (left is not TupleValue a || right is not TupleValue b || a.Items.Length != b.Items.Length)
            return null;
        for (var i = 0; i < a.Items.Length; i++)
        {
            var same = a.Items[i] is TupleValue || b.Items[i] is TupleValue ? TuplesEqual(a.Items[i], b.Items[i]) : Equal(a.Items[i], b.Items[i]);
            if (same is not true)
                return same;
        }

        return true;
    }

    private static bool HasBuiltInEquality(ITypeSymbol? type)
    {
        if (NullableUnderlying(type) is { } underlying)
            type = underlying;
        return type switch
        {
            INamedTypeSymbol { IsTupleType: true } tuple => tuple.TupleElements.All(e => HasBuiltInEquality(e.Type)),
            { TypeKind: TypeKind.Enum } => true,
            { } known => IsNumeric(known) || known.SpecialType is SpecialType.System_Boolean or SpecialType.System_String,
            null => false,
        };
    }

    /// <summary>
    /// Reference equality (<c>==</c> on operands typed object or an interface, <c>ReferenceEquals</c>): true or false when
    /// the identity is known, PW9001 when it is not. A value boxed into an object is a new object at each boxing, and which
    /// box a value is held in is not modelled; two equal strings are one object or two depending on interning.
    /// </summary>
    private object SameObject(IOperation site, object? left, object? right)
    {
        if (left is null || right is null)
            return left is null && right is null;
        // Each type has one Type object.
        if (left is TypeValue || right is TypeValue)
            return Equals(left, right);
        if (IsBoxedValue(left) || IsBoxedValue(right))
            return Unsupported(site, "the reference equality of boxed values", "each boxing makes a new object, and which box holds a value is not modelled at compile time");
        if (left is string a && right is string b && !ReferenceEquals(a, b) && string.Equals(a, b, StringComparison.Ordinal))
            return Unsupported(site, "the reference equality of two equal strings", "whether they are one object depends on interning, which is not modelled at compile time");
        return ReferenceEquals(left, right);
    }

    private static bool IsBoxedValue(object value)
        => value is InterpretedObject instance ? instance.Type.IsValueType : value is not Closure && value.GetType().IsValueType || value is EnumValue or TupleValue;

    private object? VisitUnary(IUnaryOperation unary, Frame frame)
    {
        var operand = Evaluate(unary.Operand, frame);
        if (Unknown.Is(operand)) return unary.OperatorMethod is null ? operand : Skipped(unary, frame);
        if (unary.OperatorKind == UnaryOperatorKind.Hat && operand is int fromEnd)
            return new IndexValue(fromEnd, fromEnd: true);
        if (unary.OperatorMethod is { } method)
            return CallOperator(unary, method, new[] { operand }, frame);
        if (operand is null || unary.Operand.Type is null || unary.IsLifted)
            return Unsupported(unary, "this operator", "operators on nullable values are outside the subset");
        try
        {
            return Arithmetic.Unary(unary.OperatorKind, operand, unary.Operand.Type, unary.IsChecked)
                ?? Unsupported(unary, "operator " + unary.OperatorKind + " on " + unary.Operand.Type.ToDisplayString(), "it is outside the subset");
        }
        catch (ArithmeticException e)
        {
            Throws(unary.Syntax, e.GetType().Name + ": " + e.Message);
            return Unknown.Value;
        }
    }

    private object? VisitConversion(IConversionOperation conversion, Frame frame)
    {
        var value = Evaluate(conversion.Operand, frame);
        if (Unknown.Is(value))
            return conversion.OperatorMethod is null ? value : Skipped(conversion, frame);
        // Boxing a struct makes a box of its own (later copies of the box share it); unboxing copies the value out.
        if (value is InterpretedObject { Type.IsValueType: true } structValue
            && (conversion.Operand.Type?.IsReferenceType == true) != (conversion.Type?.IsReferenceType == true))
            value = structValue.Copy();
        // Code that does not compile (half-typed, or a type that does not convert) is never given a meaning.
        if (!conversion.Conversion.Exists)
            return Unsupported(conversion, "this conversion", "it does not compile");
        if (conversion.Type?.ToDisplayString() == "System.Index" && value is int index)
            return new IndexValue(index, fromEnd: false);
        if (conversion.OperatorMethod is { } method)
            return CallOperator(conversion, method, new[] { value }, frame);
        var target = conversion.Type;
        if (value is null && target is { IsValueType: true } && NullableUnderlying(Resolved(target, frame)) is null && target is not ITypeParameterSymbol
            && Microsoft.CodeAnalysis.CSharp.CSharpExtensions.GetConversion(conversion) is { IsUnboxing: true })
            return Raise(conversion.Syntax, new NullReferenceException("Object reference not set to an instance of an object."));
        if (target is null || value is null)
            return value;
        if (conversion.IsTryCast || !conversion.Conversion.IsImplicit && !conversion.Conversion.IsNumeric
            && Microsoft.CodeAnalysis.CSharp.CSharpExtensions.GetConversion(conversion) is { IsUnboxing: true } or { IsReference: true })
            return CheckedCast(conversion, value, target, frame);
        if (target is INamedTypeSymbol { OriginalDefinition.SpecialType: SpecialType.System_Nullable_T } nullable)
            target = nullable.TypeArguments[0];
        if (target.TypeKind == TypeKind.Enum)
            return ToEnum(value, target);
        if (IsNumeric(target) && (IsNumericValue(value) || value is Enum or EnumValue))
        {
            var number = value is Enum or EnumValue ? System.Convert.ToInt64(value, CultureInfo.InvariantCulture) : value;
            return NumericConversion(conversion, number, target);
        }

        // A design's enum cast to another underlying type (byte, uint...): its number, never the enum value itself.
        if (value is EnumValue enumValue && target.IsValueType && target.SpecialType != SpecialType.None)
            return SameType(enumValue.Number, target) ? enumValue.Number
                : Unsupported(conversion, "this conversion of an enum to " + Describe(target), "the elaborator converts an enum to its own underlying type, int, long, float, double and char");

        return value;
    }

    /// <summary>A numeric conversion as C# makes it: out of range, a checked one (and any from decimal) throws.</summary>
    private object? NumericConversion(IConversionOperation conversion, object number, ITypeSymbol target)
    {
        try
        {
            return Arithmetic.ConvertNumber(number, target.SpecialType, conversion.IsChecked)
                ?? Unsupported(conversion, "this numeric conversion", "its value is not a number");
        }
        catch (OverflowException e)
        {
            Throws(conversion.Syntax, "OverflowException: " + e.Message);
            return Unknown.Value;
        }
    }

    /// <summary>
    /// A cast that tests the value's type at run time (a downcast, an unboxing, <c>as</c>): the value when it is of the
    /// type; for <c>as</c> null when not, for a cast the InvalidCastException the run throws. Never the value unchanged.
    /// </summary>
    private object? CheckedCast(IConversionOperation conversion, object value, ITypeSymbol target, Frame frame)
    {
        var toNullable = NullableUnderlying(target) is not null;
        var underlying = NullableUnderlying(target) ?? target;
        if (underlying is ITypeParameterSymbol parameter && frame.TypeArgumentOf(parameter) is { } argument and not ITypeParameterSymbol)
        {
            toNullable |= NullableUnderlying(argument) is not null;
            underlying = NullableUnderlying(argument) ?? argument;
        }

        // Unboxing a number or an enum needs its exact type; other values (the design's structs, tuples) are type-tested.
        var unboxes = underlying.IsValueType ? UnboxesTo(value, underlying, toNullable) : null;
        var unboxing = unboxes is not null;
        var fits = unboxes ?? IsOfType(value, underlying, frame);
        if (fits is null)
            return Unsupported(conversion, "this cast to " + Describe(target), "whether the value is of that type cannot be decided at compile time");
        if (fits.Value && unboxing)
            return UnboxedAs(value, underlying);
        if (fits.Value)
            return value;
        if (conversion.IsTryCast)
            return null;
        Throws(conversion.Syntax, "InvalidCastException: the value cannot be cast to " + Describe(target));
        return Unknown.Value;
    }

    private object? VisitInterpolatedString(IInterpolatedStringOperation interpolated, Frame frame)
    {
        try
        {
            return InterpolateParts(interpolated, frame);
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, interpolated);
        }
    }

    private object? InterpolateParts(IInterpolatedStringOperation interpolated, Frame frame)
    {
        var text = new StringBuilder();
        foreach (var part in interpolated.Parts)
        {
            switch (part)
            {
                case IInterpolatedStringTextOperation literal:
                    text.Append(literal.Text.ConstantValue.Value as string);
                    break;
                case IInterpolationOperation hole:
                    if (!AppendHole(text, hole.Expression, hole.Alignment, hole.FormatString, frame))
                        return Skipped(interpolated, frame);
                    break;
                // The parts of a $"..." handed to an interpolated string handler (StringBuilder.Append): the handler's
                // AppendLiteral and AppendFormatted calls, which make the same text.
                case IInterpolatedStringAppendOperation { Kind: OperationKind.InterpolatedStringAppendLiteral, AppendCall: IInvocationOperation { Arguments.Length: 1 } literalCall }:
                    text.Append(literalCall.Arguments[0].Value.ConstantValue.Value as string);
                    break;
                case IInterpolatedStringAppendOperation { Kind: OperationKind.InterpolatedStringAppendFormatted, AppendCall: IInvocationOperation formattedCall }
                    when ArgumentNamed(formattedCall, "value") is { } formatted:
                    if (!AppendHole(text, formatted, ArgumentNamed(formattedCall, "alignment"), ArgumentNamed(formattedCall, "format"), frame))
                        return Skipped(interpolated, frame);
                    break;
                default:
                    return Unsupported(part, "this interpolated string", "interpolated string handlers are outside the subset");
            }
        }

        ChargeMemory(interpolated, 2L * text.Length);
        return text.ToString();
    }

    /// <summary>One hole of an interpolated string, aligned and formatted; false when its value or alignment is not known.</summary>
    private bool AppendHole(StringBuilder text, IOperation expression, IOperation? alignmentOperation, IOperation? formatOperation, Frame frame)
    {
        var value = Evaluate(expression, frame);
        if (Unknown.Is(value)) return false;
        var alignment = alignmentOperation is null ? null : Evaluate(alignmentOperation, frame);
        var format = formatOperation is null ? null : Evaluate(formatOperation, frame) as string;
        if (Unknown.Is(alignment)) return false;
        var composite = "{0" + (alignment is null ? "" : "," + System.Convert.ToInt32(alignment, CultureInfo.InvariantCulture).ToString(CultureInfo.InvariantCulture)) + "}";
        // A design's IFormattable is asked ToString(format, null), as the hole's formatting does; anything else is
        // formatted in the run's current culture: ValueText gives its text when no culture changes it.
        var holeText = value is InterpretedObject formattable && FormattableToString(formattable) is { } formatMethod
            ? InvokeForLibrary(formatMethod, formattable, new object?[] { format, null }) as string ?? throw new UnknownValueException()
            : ValueText.Of(value, SourceType(expression), format);
        text.Append(string.Format(CultureInfo.InvariantCulture, composite, holeText));
        return true;
    }

    private static IOperation? ArgumentNamed(IInvocationOperation call, string name)
    {
        foreach (var argument in call.Arguments)
            if (argument.Parameter?.Name == name)
                return argument.Value;
        return null;
    }

    /// <summary>
    /// <c>builder.Append($"...")</c> and <c>AppendLine($"...")</c>: C# hands the string to the builder's interpolated
    /// string handler, part by part; the text is the same as the interpolated string's, so it is made here and appended.
    /// Null for any other call.
    /// </summary>
    private object? AppendInterpolated(IInvocationOperation invocation, StringBuilder builder, Frame frame)
    {
        if (invocation.TargetMethod is not { Name: "Append" or "AppendLine", Parameters.Length: 1 } method
            || invocation.Arguments[0].Value is not IInterpolatedStringHandlerCreationOperation { Content: IInterpolatedStringOperation content })
            return null;
        NoteStoreThrough(invocation.Instance, frame);
        if (Evaluate(content, frame) is not string text)
        {
            PoisonMutables(invocation, frame);
            return Unknown.Value;
        }

        return method.Name == "Append" ? builder.Append(text) : builder.AppendLine(text);
    }

    /// <summary>
    /// String concatenation (an interpreted ToString may be called), charged to the memory budget. The operands' types in
    /// the source say how a collection prints its type.
    /// </summary>
    private object? Concatenate(IOperation site, object? left, object? right, ITypeSymbol? leftType, ITypeSymbol? rightType)
    {
        string joined;
        try
        {
            joined = ValueText.Of(left, leftType) + ValueText.Of(right, rightType);
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, site);
        }

        ChargeMemory(site, 2L * joined.Length);
        return joined;
    }

    /// <summary>A built-in binary operator on known operands; an overflow or a division by zero is what the run would throw.</summary>
    private object? BinaryValue(IOperation site, BinaryOperatorKind kind, object left, object right, ITypeSymbol type, bool isChecked,
        string whyUnsupported = "it is outside the subset")
    {
        try
        {
            return Arithmetic.Binary(kind, left, right, type, isChecked)
                ?? Unsupported(site, "operator " + kind + " on " + type.ToDisplayString(), whyUnsupported);
        }
        catch (ArithmeticException e)
        {
            Throws(site.Syntax, e.GetType().Name + ": " + e.Message);
            return Unknown.Value;
        }
        catch (Exception e) when (e is FormatException or InvalidCastException)
        {
            // Only code that does not compile yet gets here ('bit < "text"' while it is typed): never given a value.
            return Unsupported(site, "operator " + kind + " on " + type.ToDisplayString(), "its operands are not numbers");
        }
    }

    private object? CallOperator(IOperation site, IMethodSymbol method, object?[] operands, Frame frame)
    {
        if (operands.Any(Unknown.Is)) return Unknown.Value;
        Step(site);
        if (method.IsImplicitlyDeclared && operands.Length == 2 && operands[0] is InterpretedObject { Type.IsRecord: true } record
            && method.Name is "op_Equality" or "op_Inequality")
        {
            return RecordEquality(site, record, operands[1], negated: method.Name == "op_Inequality");
        }

        if (method.Name is "op_Equality" or "op_Inequality" && operands.Length == 2 && ClrTypes.MetadataName(method.ContainingType) == "System.Type"
            && operands.All(o => o is null or TypeValue))
            return Equals(operands[0], operands[1]) == (method.Name == "op_Equality");

        if (session.IsInSource(method))
            return InvokeUser(method, null, operands, new Variable?[operands.Length], site, frame);
        if (Library.IsPure(method))
            return CallClr(site, method, null, operands);
        if (ClrTypes.IsDsl(method))
            return CallClr(site, method, null, operands);
        return Unsupported(site, "operator " + Describe(method), "only operators of the Phaseward DSL and of this compilation are elaborated");
    }

    private static bool IsNumeric(ITypeSymbol type) => type.SpecialType is SpecialType.System_SByte or SpecialType.System_Byte
        or SpecialType.System_Int16 or SpecialType.System_UInt16 or SpecialType.System_Char or SpecialType.System_Int32 or SpecialType.System_UInt32
        or SpecialType.System_Int64 or SpecialType.System_UInt64 or SpecialType.System_Single or SpecialType.System_Double or SpecialType.System_Decimal;

    /// <summary>The type an expression has in the source, under the implicit conversion (to object, to string) C# adds.</summary>
    private static ITypeSymbol? SourceType(IOperation operation)
        => operation is IConversionOperation { IsImplicit: true } conversion ? conversion.Operand.Type : operation.Type;

    private static bool SameType(object value, ITypeSymbol type) => ClrTypes.Resolve(type) == value.GetType();

    private static bool IsNumericValue(object value) => value is int or long or double or float or char or short or byte or uint or ulong or sbyte or ushort or decimal;
}
