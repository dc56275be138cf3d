using System.Collections;
using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

internal sealed partial class Interpreter
{
    public Completion Execute(IOperation statement, Frame frame)
    {
        Current = statement;
        switch (statement)
        {
            case IBlockOperation block:
                return Block(block, frame);

            case IVariableDeclarationGroupOperation group:
                foreach (var declaration in group.Declarations)
                    foreach (var declarator in declaration.Declarators)
                    {
                        var initializer = declarator.Initializer ?? declaration.Initializer;
                        frame.Declare(declarator.Symbol, initializer is null ? DefaultOf(declarator.Symbol.Type) : CopyIfValue(Evaluate(initializer.Value, frame)));
                    }

                return Completion.Normal;

            case IExpressionStatementOperation expression:
                Evaluate(expression.Operation, frame);
                return Completion.Normal;

            case IReturnOperation { Kind: OperationKind.Return } ret:
                frame.ReturnValue = ret.ReturnedValue is null ? null : CopyIfValue(Evaluate(ret.ReturnedValue, frame));
                return Completion.Return;

            case IReturnOperation { Kind: OperationKind.YieldReturn } yielded:
                return YieldReturn(yielded, frame);

            case IReturnOperation { Kind: OperationKind.YieldBreak }:
                return Completion.Return;

            case ITryOperation tryStatement:
                return Try(tryStatement, frame);

            case IUsingOperation usingStatement:
                return Using(usingStatement, frame);

            case IUsingDeclarationOperation usingDeclaration:
                return UsingDeclaration(usingDeclaration, frame);

            case IConditionalOperation conditional:
                switch (Condition(conditional.Condition, frame))
                {
                    case true:
                        return Execute(conditional.WhenTrue, frame);
                    case false:
                        return conditional.WhenFalse is null ? Completion.Normal : Execute(conditional.WhenFalse, frame);
                    default:
                        Poison(conditional.WhenTrue, frame);
                        if (conditional.WhenFalse is not null) Poison(conditional.WhenFalse, frame);
                        return Completion.Normal;
                }

            case IWhileLoopOperation loop:
                return While(loop, frame);

            case IForLoopOperation loop:
                return For(loop, frame);

            case IForEachLoopOperation loop:
                return ForEach(loop, frame);

            case IBranchOperation { BranchKind: BranchKind.Break }:
                return Completion.Break;

            case IBranchOperation { BranchKind: BranchKind.Continue }:
                return Completion.Continue;

            case ISwitchOperation switchStatement:
                return Switch(switchStatement, frame);

            case IThrowOperation thrown:
                VisitThrow(thrown, frame);
                return Completion.Normal;

            case IEmptyOperation:
            case ILocalFunctionOperation:
                return Completion.Normal;

            case IInvalidOperation:
                Poison(statement, frame);
                return Completion.Normal;

            default:
                Unsupported(statement, StatementName(statement), "this kind of statement is outside the subset the elaborator interprets");
                Poison(statement, frame);
                return Completion.Normal;
        }
    }

    /// <summary>Evaluates a condition: true, false, or null when it is unknown.</summary>
    private bool? Condition(IOperation? condition, Frame frame)
    {
        if (condition is null)
            return true;
        var value = Evaluate(condition, frame);
        return value is bool b ? b : null;
    }

    private Completion While(IWhileLoopOperation loop, Frame frame)
    {
        loops.Push(loop);
        try
        {
            var first = true;
            while (true)
            {
                Step(loop);
                if (loop.ConditionIsTop || !first)
                {
                    var condition = Condition(loop.Condition, frame);
                    if (condition is null)
                    {
                        Poison(loop.Body, frame);
                        return Completion.Normal;
                    }

                    if (condition.Value == loop.ConditionIsUntil)
                        return Completion.Normal;
                }

                first = false;
                var completion = Execute(loop.Body, frame);
                if (completion == Completion.Break)
                    return Completion.Normal;
                if (completion == Completion.Return)
                    return completion;
            }
        }
        finally
        {
            loops.Pop();
        }
    }

    private Completion For(IForLoopOperation loop, Frame frame)
    {
        foreach (var before in loop.Before)
            Execute(before, frame);
        loops.Push(loop);
        try
        {
            while (true)
            {
                Step(loop);
                var condition = Condition(loop.Condition, frame);
                if (condition is null)
                {
                    Poison(loop.Body, frame);
                    foreach (var bottom in loop.AtLoopBottom) Poison(bottom, frame);
                    return Completion.Normal;
                }

                if (!condition.Value)
                    return Completion.Normal;
                var completion = Execute(loop.Body, frame);
                if (completion == Completion.Break)
                    return Completion.Normal;
                if (completion == Completion.Return)
                    return completion;
                foreach (var bottom in loop.AtLoopBottom)
                    Execute(bottom, frame);
            }
        }
        finally
        {
            loops.Pop();
        }
    }

    private Completion ForEach(IForEachLoopOperation loop, Frame frame)
    {
        var collection = Evaluate(StripConversions(loop.Collection), frame);
        if (Unknown.Is(collection))
        {
            Poison(loop.Body, frame);
            return Completion.Normal;
        }

        IEnumerable? items = collection switch
        {
            object?[] array => array,
            List<object?> list => list.ToArray(),
            string text => text,
            InterpretedObject => null,
            IEnumerable enumerable => enumerable,
            _ => null,
        };
        if (items is null)
        {
            Unsupported(loop.Collection, "this foreach collection", "only arrays, strings, the library's collections and sequences, and iterators are enumerated");
            Poison(loop.Body, frame);
            return Completion.Normal;
        }

        var variableType = (loop.LoopControlVariable as IVariableDeclaratorOperation)?.Symbol.Type;
        loops.Push(loop);
        try
        {
            foreach (var raw in items)
            {
                Step(loop);
                var item = FromClr(raw);
                if (variableType is not null && item is not null && !Unknown.Is(item) && IsNumeric(variableType) && IsNumericValue(item))
                    item = Arithmetic.ConvertNumber(item, variableType.SpecialType, isChecked: false) ?? item;
                switch (loop.LoopControlVariable)
                {
                    case IVariableDeclaratorOperation declarator:
                        frame.Declare(declarator.Symbol, item);
                        break;
                    default:
                        Deconstruct(loop.LoopControlVariable, item, frame);
                        break;
                }

                var completion = Execute(loop.Body, frame);
                if (completion == Completion.Break)
                    return Completion.Normal;
                if (completion == Completion.Return)
                    return completion;
            }

            return Completion.Normal;
        }
        finally
        {
            loops.Pop();
        }
    }

    private Completion Switch(ISwitchOperation switchStatement, Frame frame)
    {
        var value = Evaluate(switchStatement.Value, frame);
        if (Unknown.Is(value))
        {
            Poison(switchStatement, frame);
            return Completion.Normal;
        }

        ISwitchCaseOperation? chosen = null;
        ISwitchCaseOperation? fallback = null;
        foreach (var section in switchStatement.Cases)
        {
            foreach (var clause in section.Clauses)
            {
                bool? matches = clause switch
                {
                    IDefaultCaseClauseOperation => null,
                    ISingleValueCaseClauseOperation single => Equal(value, Evaluate(single.Value, frame)),
                    IPatternCaseClauseOperation pattern => Match(pattern.Pattern, value, frame) is { } m
                        ? m && (pattern.Guard is null || Condition(pattern.Guard, frame) == true)
                        : Unsupported(pattern.Pattern, "this pattern", "whether the value matches it cannot be decided at compile time") is null,
                    _ => false,
                };
                if (clause is IDefaultCaseClauseOperation)
                    fallback = section;
                else if (matches == true)
                {
                    chosen = section;
                    break;
                }
            }

            if (chosen is not null)
                break;
        }

        chosen ??= fallback;
        if (chosen is null)
            return Completion.Normal;
        foreach (var statement in chosen.Body)
        {
            var completion = Execute(statement, frame);
            if (completion == Completion.Break)
                return Completion.Normal;
            if (completion != Completion.Normal)
                return completion;
        }

        return Completion.Normal;
    }

    /// <summary>
    /// Code that was skipped because its condition or collection is unknown may have assigned variables: they become
    /// unknown too, so nothing downstream uses a stale value. (Lists and arrays it may have filled become unknown.)
    /// </summary>
    private void Poison(IOperation skipped, Frame frame)
    {
        foreach (var operation in skipped.DescendantsAndSelf())
        {
            // A mutating call or an element store only changes a collection, never the variable that holds it.
            var collectionOnly = operation is IInvocationOperation;
            IOperation? target = operation switch
            {
                IAssignmentOperation assignment => assignment.Target,
                IIncrementOrDecrementOperation increment => increment.Target,
                IInvocationOperation { Instance: { } instance } => instance,
                _ => null,
            };
            while (target is IArrayElementReferenceOperation element)
            {
                target = element.ArrayReference;
                collectionOnly = true;
            }

            if (target is IPropertyReferenceOperation { Instance: { } listInstance, Property.IsIndexer: true })
            {
                target = listInstance;
                collectionOnly = true;
            }

            var variable = target switch
            {
                ILocalReferenceOperation local => frame.Find(local.Local),
                IParameterReferenceOperation parameter => frame.Find(parameter.Parameter) ?? frame.Instance?.Find(parameter.Parameter),
                IFieldReferenceOperation { Field.IsStatic: false } field => frame.Instance?.Find(field.Field),
                IFieldReferenceOperation { Field.IsStatic: true } field when session.IsInSource(field.Field) => StaticVariable(field.Field, frame),
                IPropertyReferenceOperation { Property.IsStatic: true } property when session.IsInSource(property.Property) && IsAutoProperty(property.Property)
                    => StaticVariable(property.Property, frame),
                IPropertyReferenceOperation { Property.IsStatic: false } property => frame.Instance?.Find(property.Property),
                _ => null,
            };
            if (variable is not null && (!collectionOnly || variable.Value is object?[] || variable.Value is List<object?>))
                variable.Value = Unknown.Value;
        }
    }

    private static IOperation StripConversions(IOperation operation)
    {
        while (operation is IConversionOperation { IsImplicit: true } conversion)
            operation = conversion.Operand;
        return operation;
    }

    private static string StatementName(IOperation statement) => statement switch
    {
        ITryOperation => "a try statement",
        IUsingOperation => "a using statement",
        ILockOperation => "a lock statement",
        IBranchOperation => "a goto statement",
        ILabeledOperation => "a labeled statement",
        IReturnOperation => "a yield statement",
        _ => "this statement",
    };
}
