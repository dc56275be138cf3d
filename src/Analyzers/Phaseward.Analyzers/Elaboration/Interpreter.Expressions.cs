using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Names and values: locals, parameters, 'this', default, constants, '?:' and 'if' (one kind), '??', '?.', switch
// expressions; and the expressions that are PW9001 at once (typeof, await).
internal sealed partial class Interpreter
{
    private object? VisitInvalid(IInvalidOperation invalid, Frame frame)
    {
        // Code that does not compile: the compiler reports it; the elaborator only skips what depends on it (and makes
        // unknown what a broken statement may have assigned).
        if (!IsStatement(invalid))
            return Unknown.Value;
        return SkipStatement(invalid, frame);
    }

    /// <summary>An <c>if</c> statement, or a <c>?:</c> expression.</summary>
    private object? VisitConditional(IConditionalOperation conditional, Frame frame)
    {
        var condition = Condition(conditional.Condition, frame);
        if (!IsStatement(conditional))
            return condition switch
            {
                true => Evaluate(conditional.WhenTrue, frame),
                false => conditional.WhenFalse is null ? null : Evaluate(conditional.WhenFalse, frame),
                _ => Skipped(conditional.WhenFalse, frame, Skipped(conditional.WhenTrue, frame)),
            };

        switch (condition)
        {
            case true:
                return Execute(conditional.WhenTrue, frame);
            case false:
                return conditional.WhenFalse is null ? Completion.Normal : Execute(conditional.WhenFalse, frame);
            default:
                var escape = SkipStatement(conditional.WhenTrue, frame);
                return conditional.WhenFalse is null ? escape : Completion.Farther(escape, SkipStatement(conditional.WhenFalse, frame));
        }
    }

    private object? VisitLocalReference(ILocalReferenceOperation local, Frame frame)
        => frame.Find(local.Local) is { } variable
            ? Read(variable, local.Local)
            : Unsupported(local, "local " + Describe(local.Local), "it is read before the elaborator saw it assigned");

    private object? VisitParameterReference(IParameterReferenceOperation parameter, Frame frame)
        => (frame.Find(parameter.Parameter) ?? frame.Instance?.Find(parameter.Parameter)) is { } argument
            ? Read(argument, parameter.Parameter)
            : Unsupported(parameter, "parameter " + Describe(parameter.Parameter), "its value is not known here");

    /// <summary><c>this</c>, the object an initializer fills in, or the value a property pattern reads from.</summary>
    private object? VisitInstanceReference(IInstanceReferenceOperation reference, Frame frame) => reference.ReferenceKind switch
    {
        InstanceReferenceKind.ImplicitReceiver => implicitReceivers.Count > 0 ? implicitReceivers.Peek() : Unsupported(reference, "this receiver", "it has no value here"),
        InstanceReferenceKind.PatternInput => patternInputs.Count > 0 ? patternInputs.Peek() : Unsupported(reference, "this pattern input", "it has no value here"),
        _ => (object?)frame.Instance ?? Unsupported(reference, "'this'", "it is only known inside the design being elaborated"),
    };

    private object? VisitDefaultValue(IDefaultValueOperation defaultValue, Frame frame)
    {
        if (defaultValue.Type is null)
            return null;
        var value = DefaultOf(defaultValue.Type, frame);
        return value is UnmadeDefault unmade
            ? Unsupported(defaultValue, "the default value of " + Describe(defaultValue.Type), unmade.Type is ITypeParameterSymbol
                ? "the type argument it stands for is not known where the generic code is interpreted"
                : "it is a library struct outside the pure library")
            : value;
    }

    private object? VisitParenthesized(IParenthesizedOperation parenthesized, Frame frame) => Evaluate(parenthesized.Operand, frame);

    private object? VisitDeclarationExpression(IDeclarationExpressionOperation declaration, Frame frame) => Evaluate(declaration.Expression, frame);

    private object? VisitCoalesce(ICoalesceOperation coalesce, Frame frame)
    {
        var tested = Evaluate(coalesce.Value, frame);
        return Unknown.Is(tested) ? Skipped(coalesce.WhenNull, frame) : tested ?? Evaluate(coalesce.WhenNull, frame);
    }

    private object? VisitConditionalAccessInstance(IConditionalAccessInstanceOperation receiver, Frame frame)
        => conditionalReceivers.Count > 0 ? conditionalReceivers.Peek() : Unsupported(receiver, "this '?.' receiver", "it has no value here");

    /// <summary><c>typeof(T)</c>, with what a type parameter stands for here (see <see cref="TypeValue"/>).</summary>
    private object? VisitTypeOf(ITypeOfOperation typeOf, Frame frame)
        => typeOf.TypeOperand is INamedTypeSymbol { IsUnboundGenericType: true } || ResolvedIn(typeOf.TypeOperand, frame) is not { } type
            ? Unsupported(typeOf, "typeof(" + typeOf.TypeOperand.ToDisplayString() + ")", "an open generic type, or one whose type argument is not known where the generic code is interpreted")
            : new TypeValue(type);

    private object? VisitAwait(IAwaitOperation await, Frame frame)
        => Unsupported(await, "an await", "asynchronous code is outside the subset the elaborator interprets");

    private object? VisitSwitchExpression(ISwitchExpressionOperation switchExpression, Frame frame)
    {
        var value = Evaluate(switchExpression.Value, frame);
        if (Unknown.Is(value)) return Skipped(switchExpression, frame);
        foreach (var arm in switchExpression.Arms)
        {
            var matches = Decide(arm.Pattern, value, frame);
            if (matches is null) return Skipped(switchExpression, frame);
            if (!matches.Value) continue;
            if (arm.Guard is not null)
            {
                var guard = Condition(arm.Guard, frame);
                if (guard is null) return Skipped(switchExpression, frame);
                if (!guard.Value) continue;
            }

            return Evaluate(arm.Value, frame);
        }

        Throws(switchExpression.Syntax, "SwitchExpressionException: no arm of the switch expression matches the value " + MessageText(value));
        return Unknown.Value;
    }

    /// <summary>A value's text for a message (not a value of the design): in the invariant culture when no other is known.</summary>
    private static string MessageText(object? value)
    {
        try
        {
            return ValueText.Of(value);
        }
        catch (UnknownValueException)
        {
            return value is IFormattable formattable ? formattable.ToString(null, CultureInfo.InvariantCulture) : "(a value whose text is not known)";
        }
    }

    private object? FromConstant(object? value, ITypeSymbol? type)
    {
        if (value is null || type is null)
            return value;
        return type.TypeKind == TypeKind.Enum ? ToEnum(value, type) : value;
    }

    /// <summary>
    /// DSL and library enums become real enum values (the methods that take them need them); the design's own enums become
    /// <see cref="EnumValue"/>s, which keep their type (to print their names, and to tell a boxed enum from an int).
    /// </summary>
    private static object ToEnum(object value, ITypeSymbol type)
    {
        var number = value is ulong huge ? unchecked((long)huge) : System.Convert.ToInt64(value, CultureInfo.InvariantCulture);
        if (type is INamedTypeSymbol { DeclaringSyntaxReferences.Length: > 0 } declared)
            return new EnumValue(declared, number);
        // The DSL's and the library's enums (StringSplitOptions, MidpointRounding) are real .NET enums.
        return ClrTypes.Resolve(type) is { IsEnum: true } clr ? Enum.ToObject(clr, number) : System.Convert.ToInt32(number, CultureInfo.InvariantCulture);
    }

    private object? DefaultOf(ITypeSymbol type, Frame? frame = null)
    {
        if (type is ITypeParameterSymbol parameter)
        {
            // default(T) is what T stands for where the generic code runs; unknown, it is reported where it is read.
            if (frame?.TypeArgumentOf(parameter) is { } argument and not ITypeParameterSymbol)
                return DefaultOf(argument);
            return parameter.HasReferenceTypeConstraint ? null : new UnmadeDefault(parameter);
        }

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
            return new TupleValue(tuple.TupleElements.Select(e => DefaultOf(e.Type, frame)).ToArray());
        if (!type.IsValueType || type.OriginalDefinition.SpecialType == SpecialType.System_Nullable_T)
            return null;
        if (ClrTypes.IsDsl(type) && ClrTypes.Resolve(type) is { } clr)
            return Activator.CreateInstance(clr);
        if (type is INamedTypeSymbol structType && session.IsInSource(structType))
            return DefaultStruct(structType);
        // A struct of the pure library that is not generic (byte, short, decimal...): its real default. Any other library
        // struct is not made (making one may run its code; a generic one would be erased to object): reading it is PW9001.
        if (type is INamedTypeSymbol { IsGenericType: false, IsRefLikeType: false, SpecialType: not SpecialType.System_Void } && Library.IsPureType(type)
            && ClrTypes.Resolve(type) is { IsValueType: true } libraryStruct)
            return Activator.CreateInstance(libraryStruct);
        // Code that does not compile yet (a type not found): the compiler reports it; what depends on it is skipped.
        return type.TypeKind == TypeKind.Error ? Unknown.Value : new UnmadeDefault(type);
    }

    /// <summary>The default of a struct of the design's source: every field and auto-property at its default.</summary>
    private object? DefaultStruct(INamedTypeSymbol type)
    {
        // A struct that contains itself does not compile: its default is unknown (the compiler reports it), not a stack overflow.
        if (!structsBeingDefaulted.Add(type))
            return Unknown.Value;
        try
        {
            return NewObject(type);
        }
        finally
        {
            structsBeingDefaulted.Remove(type);
        }
    }

    private object? VisitConditionalAccess(IConditionalAccessOperation access, Frame frame)
    {
        var receiver = Evaluate(access.Operation, frame);
        if (Unknown.Is(receiver))
            return Skipped(access.WhenNotNull, frame);
        if (receiver is null)
            return null;
        conditionalReceivers.Push(receiver);
        try
        {
            return Evaluate(access.WhenNotNull, frame);
        }
        finally
        {
            conditionalReceivers.Pop();
        }
    }
}
