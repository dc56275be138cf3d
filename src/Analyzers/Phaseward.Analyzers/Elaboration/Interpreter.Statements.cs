using System.Collections;
using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

// Statements other than loops and exception handling: blocks (disposing their 'using var' resources), declarations,
// return and 'yield' (iterators run to completion, their values kept in a list), break/continue, switch. Code skipped
// because its condition is unknown has what it assigns made unknown (Poison).
internal sealed partial class Interpreter
{
    private Completion VisitVariableDeclarationGroup(IVariableDeclarationGroupOperation group, Frame frame)
    {
        foreach (var declaration in group.Declarations)
            foreach (var declarator in declaration.Declarators)
            {
                var initializer = declarator.Initializer ?? declaration.Initializer;
                if (declarator.Symbol.IsRef && initializer is not null)
                    BindRefLocal(declarator.Symbol, initializer.Value, frame);
                else
                    frame.Declare(declarator.Symbol, initializer is null ? DefaultOf(declarator.Symbol.Type, frame) : CopyIfValue(Evaluate(initializer.Value, frame)));
            }

        return Completion.Normal;
    }

    /// <summary>
    /// <c>ref var r = ref x;</c> (or <c>r = ref x;</c>): r becomes another name for x's variable, so writes through either
    /// are seen by both. A ref to something that is not a variable of the design (an array element, a ref return) is PW9001,
    /// never a copy that would silently lose the writes.
    /// </summary>
    private void BindRefLocal(ILocalSymbol local, IOperation target, Frame frame)
    {
        if (VariableOf(target, frame) is { } variable)
        {
            frame.Bind(local, variable);
            return;
        }

        var unknown = Unsupported(target, "the ref local " + Describe(local), "only a ref to a local, parameter or field of the design is elaborated (not to an array element or a ref return)");
        frame.Declare(local, unknown);
        // What it refers to may be written through it: the arrays and objects it was taken from become unknown.
        PoisonMutables(target, frame);
    }

    private Completion VisitExpressionStatement(IExpressionStatementOperation statement, Frame frame)
    {
        Evaluate(statement.Operation, frame);
        return Completion.Normal;
    }

    private Completion VisitReturn(IReturnOperation ret, Frame frame)
    {
        frame.ReturnValue = ret.ReturnedValue is null ? null : CopyIfValue(Evaluate(ret.ReturnedValue, frame));
        return Completion.Return;
    }

    private Completion VisitYieldBreak(IReturnOperation yieldBreak, Frame frame) => Completion.Return;

    /// <summary><c>break</c> and <c>continue</c>; <c>goto</c> is not interpreted.</summary>
    private object? VisitBranch(IBranchOperation branch, Frame frame) => branch.BranchKind switch
    {
        BranchKind.Break => Completion.Break,
        BranchKind.Continue => Completion.Continue,
        _ => NotInterpreted(branch, frame),
    };

    private Completion VisitEmpty(IEmptyOperation empty, Frame frame) => Completion.Normal;

    // A local function is called where it is used (see InvokeUser); its declaration does nothing.
    private Completion VisitLocalFunction(ILocalFunctionOperation localFunction, Frame frame) => Completion.Normal;

    /// <summary>Evaluates a condition: true, false, or null when it is unknown.</summary>
    private bool? Condition(IOperation? condition, Frame frame)
    {
        if (condition is null)
            return true;
        var value = Evaluate(condition, frame);
        if (value is bool b)
            return b;
        // Unknown was reported where it arose; anything else (a null the library left) must not skip the code silently.
        if (!Unknown.Is(value))
            Unsupported(condition, "this condition", "its value is " + (value is null ? "null" : "a " + value.GetType().Name) + ", not true or false");
        return null;
    }

    private Completion VisitSwitch(ISwitchOperation switchStatement, Frame frame)
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
                    IDefaultCaseClauseOperation => false,
                    ISingleValueCaseClauseOperation single => Equal(value, Evaluate(single.Value, frame)),
                    IPatternCaseClauseOperation pattern => Decide(pattern.Pattern, value, frame) is { } m
                        ? m && pattern.Guard is not null ? Condition(pattern.Guard, frame) : m
                        : null,
                    _ => false,
                };
                if (clause is IDefaultCaseClauseOperation)
                    fallback = section;
                else if (matches is null)
                {
                    // Which section runs is not known (reported where that arose): none is guessed, and what the
                    // sections assign becomes unknown.
                    Poison(switchStatement, frame);
                    return Completion.Normal;
                }
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

            var variable = target is null ? null : VariableNamed(target, frame);
            if (variable is not null && (!collectionOnly || variable.Value is object?[] || variable.Value is List<object?>))
                variable.Value = Unknown.Value;
        }
    }

    /// <summary>
    /// A library call (or a ref) that could not be evaluated may have changed the collections and objects it was given:
    /// the variables its arguments and receiver name that hold one become unknown, never read as they were before.
    /// </summary>
    private void PoisonMutables(IOperation skipped, Frame frame)
    {
        foreach (var operation in skipped.DescendantsAndSelf())
            if (VariableNamed(operation, frame) is { Value: { } value } variable && MayChange(value))
                variable.Value = Unknown.Value;
    }

    private static bool MayChange(object value)
        => value is object?[] or ICollection or System.Text.StringBuilder or InterpretedObject { Type.IsValueType: false };

    /// <summary>The variable a local, parameter, field or auto-property reference names in this frame (null for anything else).</summary>
    private Variable? VariableNamed(IOperation reference, Frame frame) => reference switch
    {
        ILocalReferenceOperation local => frame.Find(local.Local),
        IParameterReferenceOperation parameter => frame.Find(parameter.Parameter) ?? frame.Instance?.Find(parameter.Parameter),
        IFieldReferenceOperation { Field.IsStatic: false, Instance: null or IInstanceReferenceOperation } field => frame.Instance?.Find(field.Field),
        IFieldReferenceOperation { Field.IsStatic: true } field when session.IsInSource(field.Field) => StaticVariable(field.Field, frame, field.Syntax),
        IPropertyReferenceOperation { Property.IsStatic: true } property when session.IsInSource(property.Property) && IsAutoProperty(property.Property)
            => StaticVariable(property.Property, frame, property.Syntax),
        IPropertyReferenceOperation { Property.IsStatic: false, Instance: null or IInstanceReferenceOperation } property => frame.Instance?.Find(property.Property),
        _ => null,
    };

    private Completion VisitBlock(IBlockOperation block, Frame frame)
    {
        var hasUsing = false;
        foreach (var inner in block.Operations)
            hasUsing |= inner is IUsingDeclarationOperation;
        if (hasUsing)
            usingScopes.Push(new List<object?>());
        var disposed = false;
        try
        {
            foreach (var inner in block.Operations)
            {
                var completion = Execute(inner, frame);
                if (completion != Completion.Normal)
                    return completion;
            }

            return Completion.Normal;
        }
        catch (DesignException) when (hasUsing)
        {
            disposed = true;
            DisposeAll(usingScopes.Pop(), block);
            throw;
        }
        finally
        {
            if (hasUsing && !disposed && usingScopes.Count > 0)
                DisposeAll(usingScopes.Pop(), block);
        }
    }

    private Completion VisitYieldReturn(IReturnOperation yielded, Frame frame)
    {
        Step(yielded);
        var value = yielded.ReturnedValue is null ? null : CopyIfValue(Evaluate(yielded.ReturnedValue, frame));
        var owner = frame;
        while (owner.Yielded is null && owner.Consumer is null && owner.LexicalParent is not null)
            owner = owner.LexicalParent;
        if (owner.Consumer is { } consume)
            return consume(value) ? Completion.Normal : Completion.Return; // the loop stopped: so does the iterator
        if (owner.Yielded is null)
        {
            Unsupported(yielded, "this yield return", "its iterator is not running");
            return Completion.Return;
        }

        owner.Yielded.Add(value);
        ChargeMemory(yielded, 8);
        return Completion.Normal;
    }
}
