using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

internal sealed partial class Interpreter
{
    public object? Evaluate(IOperation operation, Frame frame)
    {
        if (MayBeConstant(operation) && operation.ConstantValue is { HasValue: true } constant)
            return FromConstant(constant.Value, operation.Type);

        // By kind, not by type test: one jump instead of a chain of interface casts for every operation evaluated.
        switch (operation.Kind)
        {
            case OperationKind.Invalid:
                // Code that does not compile: the compiler reports it; the elaborator only skips what depends on it.
                return Unknown.Value;

            case OperationKind.Conversion:
                var conversion = (IConversionOperation)operation;
                return Convert(conversion, Evaluate(conversion.Operand, frame), frame);

            case OperationKind.LocalReference:
                var local = (ILocalReferenceOperation)operation;
                return frame.Find(local.Local) is { } variable
                    ? variable.Value
                    : Unsupported(operation, "local " + Describe(local.Local), "it is read before the elaborator saw it assigned");

            case OperationKind.ParameterReference:
                var parameter = (IParameterReferenceOperation)operation;
                return (frame.Find(parameter.Parameter) ?? frame.Instance?.Find(parameter.Parameter)) is { } argument
                    ? argument.Value
                    : Unsupported(operation, "parameter " + Describe(parameter.Parameter), "its value is not known here");

            case OperationKind.FieldReference:
                var field = (IFieldReferenceOperation)operation;
                return ReadField(field, frame);

            case OperationKind.PropertyReference:
                var property = (IPropertyReferenceOperation)operation;
                return ReadProperty(property, frame);

            case OperationKind.Invocation:
                var invocation = (IInvocationOperation)operation;
                return Invoke(invocation, frame);

            case OperationKind.ObjectCreation:
                var creation = (IObjectCreationOperation)operation;
                return Create(creation, frame);

            case OperationKind.ArrayCreation:
                var array = (IArrayCreationOperation)operation;
                return CreateArray(array, frame);

            case OperationKind.ArrayElementReference:
                var element = (IArrayElementReferenceOperation)operation;
                return ReadElement(element, frame);

            case OperationKind.CollectionExpression:
                var collection = (ICollectionExpressionOperation)operation;
                return CreateCollection(collection, frame);

            case OperationKind.Tuple:
                var tuple = (ITupleOperation)operation;
                return CreateTuple(tuple, frame);

            case OperationKind.InterpolatedString:
                var interpolated = (IInterpolatedStringOperation)operation;
                return Interpolate(interpolated, frame);

            case OperationKind.Binary:
                var binary = (IBinaryOperation)operation;
                return Binary(binary, frame);

            case OperationKind.Unary:
                var unary = (IUnaryOperation)operation;
                return Unary(unary, frame);

            case OperationKind.Range:
                return VisitRange((IRangeOperation)operation, frame);

            case OperationKind.ImplicitIndexerReference:
                return VisitImplicitIndexer((IImplicitIndexerReferenceOperation)operation, frame);

            case OperationKind.Conditional:
                var conditional = (IConditionalOperation)operation;
                return Condition(conditional.Condition, frame) switch
                {
                    true => Evaluate(conditional.WhenTrue, frame),
                    false => conditional.WhenFalse is null ? null : Evaluate(conditional.WhenFalse, frame),
                    _ => Unknown.Value,
                };

            case OperationKind.Coalesce:
                var coalesce = (ICoalesceOperation)operation;
                var tested = Evaluate(coalesce.Value, frame);
                return Unknown.Is(tested) ? tested : tested ?? Evaluate(coalesce.WhenNull, frame);

            case OperationKind.SimpleAssignment:
                var assignment = (ISimpleAssignmentOperation)operation;
                return Assign(assignment, frame);

            case OperationKind.CompoundAssignment:
                var compound = (ICompoundAssignmentOperation)operation;
                return CompoundAssign(compound, frame);

            case OperationKind.CoalesceAssignment:
                var coalesceAssignment = (ICoalesceAssignmentOperation)operation;
                return CoalesceAssign(coalesceAssignment, frame);

            case OperationKind.Increment:
            case OperationKind.Decrement:
                var increment = (IIncrementOrDecrementOperation)operation;
                return IncrementOrDecrement(increment, frame);

            case OperationKind.DeconstructionAssignment:
                var deconstruction = (IDeconstructionAssignmentOperation)operation;
                var value = Evaluate(deconstruction.Value, frame);
                Deconstruct(deconstruction.Target, value, frame);
                return value;

            case OperationKind.InstanceReference when ((IInstanceReferenceOperation)operation).ReferenceKind == InstanceReferenceKind.ImplicitReceiver:
                return implicitReceivers.Count > 0 ? implicitReceivers.Peek() : Unsupported(operation, "this receiver", "it has no value here");

            case OperationKind.InstanceReference when ((IInstanceReferenceOperation)operation).ReferenceKind == InstanceReferenceKind.PatternInput:
                return patternInputs.Count > 0 ? patternInputs.Peek() : Unsupported(operation, "this pattern input", "it has no value here");

            case OperationKind.InstanceReference:
                return (object?)frame.Instance ?? Unsupported(operation, "'this'", "it is only known inside the design being elaborated");

            case OperationKind.DefaultValue:
                return operation.Type is null ? null : DefaultOf(operation.Type);

            case OperationKind.SwitchExpression:
                var switchExpression = (ISwitchExpressionOperation)operation;
                return SwitchExpression(switchExpression, frame);

            case OperationKind.IsPattern:
                var isPattern = (IIsPatternOperation)operation;
                var subject = Evaluate(isPattern.Value, frame);
                return Unknown.Is(subject) ? subject : (object?)Match(isPattern.Pattern, subject, frame)
                    ?? Unsupported(isPattern.Pattern, "this pattern", "whether the value matches it cannot be decided at compile time");

            case OperationKind.DeclarationExpression:
                var declaration = (IDeclarationExpressionOperation)operation;
                return Evaluate(declaration.Expression, frame);

            case OperationKind.Throw:
                return VisitThrow((IThrowOperation)operation, frame);

            case OperationKind.Parenthesized:
                var parenthesized = (IParenthesizedOperation)operation;
                return Evaluate(parenthesized.Operand, frame);

            case OperationKind.AnonymousFunction:
                return VisitAnonymousFunction((IAnonymousFunctionOperation)operation, frame);

            case OperationKind.DelegateCreation:
                return VisitDelegateCreation((IDelegateCreationOperation)operation, frame);

            case OperationKind.ConditionalAccess:
                return VisitConditionalAccess((IConditionalAccessOperation)operation, frame);

            case OperationKind.ConditionalAccessInstance:
                return conditionalReceivers.Count > 0 ? conditionalReceivers.Peek() : Unsupported(operation, "this '?.' receiver", "it has no value here");

            case OperationKind.With:
                return VisitWith((IWithOperation)operation, frame);

            case OperationKind.ObjectOrCollectionInitializer:
                return Unsupported(operation, "this initializer", "it is only interpreted as part of an object creation");


            case OperationKind.AnonymousObjectCreation:
                return Unsupported(operation, "an anonymous object", "anonymous types are outside the subset the elaborator interprets");

            case OperationKind.IsType:
                return VisitIsType((IIsTypeOperation)operation, frame);

            case OperationKind.TypeOf:
                return Unsupported(operation, "typeof", "reflection is outside what compile-time elaboration runs");

            case OperationKind.Await:
                return Unsupported(operation, "an await", "asynchronous code is outside the subset the elaborator interprets");

            default:
                return Unsupported(operation, "this " + KindName(operation), "it is outside the subset the elaborator interprets");
        }
    }

    /// <summary>
    /// False for the kinds of operation that never carry a compile-time constant: reading ConstantValue allocates, and
    /// these (calls, creations, parameters, assignments, non-const locals) are most of what a design evaluates.
    /// </summary>
    private static bool MayBeConstant(IOperation operation) => operation.Kind switch
    {
        OperationKind.Invocation or OperationKind.ObjectCreation or OperationKind.ParameterReference or OperationKind.PropertyReference
            or OperationKind.SimpleAssignment or OperationKind.CompoundAssignment or OperationKind.Increment or OperationKind.Decrement
            or OperationKind.InstanceReference or OperationKind.ArrayElementReference or OperationKind.ArrayCreation => false,
        OperationKind.LocalReference => ((ILocalReferenceOperation)operation).Local.IsConst,
        _ => true,
    };

    private object? Convert(IConversionOperation conversion, object? value, Frame frame)
    {
        if (Unknown.Is(value))
            return value;
        // Code that does not compile (half-typed, or a type that does not convert) is never given a meaning.
        if (!conversion.Conversion.Exists)
            return Unsupported(conversion, "this conversion", "it does not compile");
        if (conversion.Type?.ToDisplayString() == "System.Index" && value is int index)
            return new IndexValue(index, fromEnd: false);
        if (conversion.OperatorMethod is { } method)
            return CallOperator(conversion, method, new[] { value }, frame);
        var target = conversion.Type;
        if (target is null || value is null)
            return value;
        if (target is INamedTypeSymbol { OriginalDefinition.SpecialType: SpecialType.System_Nullable_T } nullable)
            target = nullable.TypeArguments[0];
        if (target.TypeKind == TypeKind.Enum)
            return ToEnum(value, target);
        if (IsNumeric(target) && (IsNumericValue(value) || value is Enum))
        {
            var number = value is Enum ? System.Convert.ToInt64(value, CultureInfo.InvariantCulture) : value;
            return Arithmetic.ConvertNumber(number, target.SpecialType, conversion.IsChecked)
                ?? Unsupported(conversion, "this numeric conversion", "the elaborator handles int, long, float, double and char");
        }

        return value;
    }

    private object? ReadField(IFieldReferenceOperation field, Frame frame)
    {
        var symbol = field.Field;
        if (symbol.ContainingType?.IsTupleType == true)
        {
            var tuple = field.Instance is null ? null : Evaluate(field.Instance, frame);
            if (Unknown.Is(tuple)) return tuple;
            return tuple is TupleValue t && TupleIndex(symbol) is { } index && index < t.Items.Length
                ? t.Items[index]
                : Unsupported(field, "tuple element " + Describe(symbol), "tuples of more than seven elements are outside the subset");
        }

        if (!ClrTypes.IsDsl(symbol) && !session.IsInSource(symbol) && Library.IsPure(symbol))
            return ReadLibraryField(field, symbol, frame);

        if (ClrTypes.IsDsl(symbol) && symbol.IsStatic)
        {
            var type = symbol.ContainingType is null ? null : ClrTypes.Resolve(symbol.ContainingType);
            var info = type?.GetField(symbol.Name, System.Reflection.BindingFlags.Public | System.Reflection.BindingFlags.NonPublic | System.Reflection.BindingFlags.Static);
            return info is null ? Unsupported(field, "field " + Describe(symbol), "it was not found in the Phaseward assembly") : FromClr(info.GetValue(null));
        }

        if (!session.IsInSource(symbol))
            return Unsupported(field, "field " + Describe(symbol), "only fields declared in this compilation or the Phaseward DSL are read");

        if (symbol.IsStatic)
            return StaticVariable(symbol, frame).Value;

        var owner = field.Instance is null ? frame.Instance : Evaluate(field.Instance, frame);
        if (Unknown.Is(owner)) return owner;
        if (owner is InterpretedObject instance && instance.Find(symbol) is { } stored)
            return stored.Value;
        return Unsupported(field, "field " + Describe(symbol), owner is InterpretedObject
            ? "it was not initialized by the elaborator"
            : "only fields of objects the design's code made are read");
    }

    private static int? TupleIndex(IFieldSymbol field)
    {
        var name = (field.CorrespondingTupleField ?? field).Name;
        return name.StartsWith("Item", StringComparison.Ordinal) && int.TryParse(name.Substring(4), NumberStyles.None, CultureInfo.InvariantCulture, out var n)
            ? n - 1
            : null;
    }

    private object? ReadElement(IArrayElementReferenceOperation element, Frame frame)
    {
        var array = Evaluate(element.ArrayReference, frame);
        if (Unknown.Is(array)) return array;
        if (element.Indices.Length != 1)
            return Unsupported(element, "a multi-dimensional array", "only one-dimensional arrays are elaborated");
        var index = Evaluate(element.Indices[0], frame);
        if (Unknown.Is(index)) return index;
        if (array is not object?[] items)
            return Unsupported(element, "this array", "it does not come from the design's code");
        if (index is IndexValue or RangeValue)
            return Indexed(element, items, index);
        // In code that does not compile yet the index can be a value of another type (a net, a string).
        if (index is not (int or long or short or byte or sbyte or ushort or uint or ulong or char))
            return Unsupported(element, "this array index", "it is not a whole number");
        var i = System.Convert.ToInt32(index, CultureInfo.InvariantCulture);
        if (i < 0 || i >= items.Length)
        {
            Throws(element.Syntax, $"IndexOutOfRangeException: index {i} is outside the bounds of an array of length {items.Length}");
            return Unknown.Value;
        }

        return items[i];
    }

    /// <summary>String concatenation (an interpreted ToString may be called), charged to the memory budget.</summary>
    private object? Concatenate(IOperation site, object? left, object? right)
    {
        string joined;
        try
        {
            joined = Arithmetic.Concatenate(left, right);
        }
        catch (UnknownValueException)
        {
            return Unknown.Value;
        }

        ChargeMemory(site, 2L * joined.Length);
        return joined;
    }

    private object? Interpolate(IInterpolatedStringOperation interpolated, Frame frame)
    {
        try
        {
            return InterpolateParts(interpolated, frame);
        }
        catch (UnknownValueException)
        {
            return Unknown.Value;
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
                    var value = Evaluate(hole.Expression, frame);
                    if (Unknown.Is(value)) return value;
                    var alignment = hole.Alignment is null ? null : Evaluate(hole.Alignment, frame);
                    var format = hole.FormatString is null ? null : Evaluate(hole.FormatString, frame) as string;
                    if (Unknown.Is(alignment)) return alignment;
                    var composite = "{0" + (alignment is null ? "" : "," + System.Convert.ToInt32(alignment, CultureInfo.InvariantCulture).ToString(CultureInfo.InvariantCulture))
                        + (format is null ? "" : ":" + format) + "}";
                    text.Append(string.Format(CultureInfo.InvariantCulture, composite, value is bool b ? (b ? "True" : "False") : value));
                    break;
                default:
                    return Unsupported(part, "this interpolated string", "interpolated string handlers are outside the subset");
            }
        }

        ChargeMemory(interpolated, 2L * text.Length);
        return text.ToString();
    }

    private object? Binary(IBinaryOperation binary, Frame frame)
    {
        var left = Evaluate(binary.LeftOperand, frame);
        if (Unknown.Is(left)) return left;

        if (binary.OperatorKind is BinaryOperatorKind.ConditionalAnd or BinaryOperatorKind.ConditionalOr && binary.OperatorMethod is null)
        {
            if (left is not bool l) return Unsupported(binary, "this logical operator", "its operands are not bool");
            if (binary.OperatorKind == BinaryOperatorKind.ConditionalAnd ? !l : l) return l;
            var rightValue = Evaluate(binary.RightOperand, frame);
            return Unknown.Is(rightValue) || rightValue is bool ? rightValue : Unsupported(binary, "this logical operator", "its operands are not bool");
        }

        var right = Evaluate(binary.RightOperand, frame);
        if (Unknown.Is(right)) return right;

        if (binary.OperatorMethod is { } method)
            return CallOperator(binary, method, new[] { left, right }, frame);
        if (binary.IsLifted && (left is null || right is null))
            return binary.OperatorKind switch
            {
                BinaryOperatorKind.Equals => left is null && right is null,
                BinaryOperatorKind.NotEquals => !(left is null && right is null),
                BinaryOperatorKind.LessThan or BinaryOperatorKind.LessThanOrEqual or BinaryOperatorKind.GreaterThan or BinaryOperatorKind.GreaterThanOrEqual => false,
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
                return RaiseLibraryException(binary, e);
            }
        }

        var leftType = binary.LeftOperand.Type;
        var rightType = binary.RightOperand.Type;
        if (binary.OperatorKind == BinaryOperatorKind.Add
            && (leftType?.SpecialType == SpecialType.System_String || rightType?.SpecialType == SpecialType.System_String))
        {
            return Concatenate(binary, left, right);
        }

        if (binary.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals && left is InterpretedObject { Type.IsRecord: true } record)
        {
            var equal = AreEqualOrUnknown(record, right);
            return equal is null ? Unknown.Value : binary.OperatorKind == BinaryOperatorKind.Equals ? equal.Value : !equal.Value;
        }

        if (binary.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals
            && (left is null || right is null || (leftType?.IsReferenceType == true && leftType.SpecialType != SpecialType.System_String)))
        {
            var same = left is null || right is null ? left is null && right is null : ReferenceEquals(left, right);
            return binary.OperatorKind == BinaryOperatorKind.Equals ? same : !same;
        }

        if (leftType is null || left is null || right is null)
            return Unsupported(binary, "this operator", "its operand types are not known");
        try
        {
            return Arithmetic.Binary(binary.OperatorKind, left, right, leftType, binary.IsChecked)
                ?? Unsupported(binary, "operator " + binary.OperatorKind + " on " + leftType.ToDisplayString(), "the elaborator handles arithmetic, comparisons and logic on int, long, float, double, bool, string and enums");
        }
        catch (ArithmeticException e)
        {
            Throws(binary.Syntax, e.GetType().Name + ": " + e.Message);
            return Unknown.Value;
        }
    }

    private object? Unary(IUnaryOperation unary, Frame frame)
    {
        var operand = Evaluate(unary.Operand, frame);
        if (Unknown.Is(operand)) return operand;
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

    private object? SwitchExpression(ISwitchExpressionOperation switchExpression, Frame frame)
    {
        var value = Evaluate(switchExpression.Value, frame);
        if (Unknown.Is(value)) return value;
        foreach (var arm in switchExpression.Arms)
        {
            var matches = Match(arm.Pattern, value, frame);
            if (matches is null) return Unsupported(arm.Pattern, "this pattern", "whether the value matches it cannot be decided at compile time");
            if (!matches.Value) continue;
            if (arm.Guard is not null)
            {
                var guard = Condition(arm.Guard, frame);
                if (guard is null) return Unknown.Value;
                if (!guard.Value) continue;
            }

            return Evaluate(arm.Value, frame);
        }

        Throws(switchExpression.Syntax, "SwitchExpressionException: no arm of the switch expression matches the value " + Arithmetic.Text(value));
        return Unknown.Value;
    }

    private static string DescribeThrow(IThrowOperation thrown, object? value)
    {
        if (value is Exception exception)
        {
            // The message as written (ArgumentException's Message adds the parameter name).
            var creation = thrown.Exception is IConversionOperation { Operand: IObjectCreationOperation c } ? c : thrown.Exception as IObjectCreationOperation;
            var written = creation?.Arguments.FirstOrDefault(a => a.Parameter?.Name == "message")?.Value.ConstantValue;
            return exception.GetType().Name + ": " + (written is { HasValue: true, Value: string text } ? text : exception.Message);
        }

        return value is InterpretedObject instance ? instance.Type.Name : "the design's code throws an exception";
    }

    private object? FromConstant(object? value, ITypeSymbol? type)
    {
        if (value is null || type is null)
            return value;
        return type.TypeKind == TypeKind.Enum ? ToEnum(value, type) : value;
    }

    /// <summary>DSL enums become real enum values (the DSL's methods need them); the design's own enums stay integers.</summary>
    private static object ToEnum(object value, ITypeSymbol type)
    {
        var clr = ClrTypes.IsDsl(type) ? ClrTypes.Resolve(type) : null;
        var number = System.Convert.ToInt64(value, CultureInfo.InvariantCulture);
        return clr is { IsEnum: true } ? Enum.ToObject(clr, number) : System.Convert.ToInt32(number, CultureInfo.InvariantCulture);
    }

    private object? DefaultOf(ITypeSymbol type)
    {
        switch (type.SpecialType)
        {
            case SpecialType.System_Int32: return 0;
            case SpecialType.System_Int64: return 0L;
            case SpecialType.System_Double: return 0.0;
            case SpecialType.System_Single: return 0f;
            case SpecialType.System_Boolean: return false;
            case SpecialType.System_Char: return '\0';
        }

        if (type.TypeKind == TypeKind.Enum)
            return ToEnum(0, type);
        if (type.IsTupleType && type is INamedTypeSymbol tuple)
            return new TupleValue(tuple.TupleElements.Select(e => DefaultOf(e.Type)).ToArray());
        if (!type.IsValueType || type.OriginalDefinition.SpecialType == SpecialType.System_Nullable_T)
            return null;
        if (ClrTypes.IsDsl(type) && ClrTypes.Resolve(type) is { } clr)
            return Activator.CreateInstance(clr);
        return Unknown.Value;
    }

    private static bool IsNumeric(ITypeSymbol type) => type.SpecialType is SpecialType.System_Int32 or SpecialType.System_Int64
        or SpecialType.System_Double or SpecialType.System_Single or SpecialType.System_Char;

    private static bool IsNumericValue(object value) => value is int or long or double or float or char or short or byte or uint or ulong;

    private static string KindName(IOperation operation)
    {
        var kind = operation.Kind.ToString();
        var text = new StringBuilder();
        foreach (var c in kind)
        {
            if (char.IsUpper(c) && text.Length > 0) text.Append(' ');
            text.Append(char.ToLowerInvariant(c));
        }

        return text.ToString();
    }
}
