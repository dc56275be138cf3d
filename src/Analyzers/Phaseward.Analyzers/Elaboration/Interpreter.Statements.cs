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
                    frame.Declare(declarator.Symbol, initializer is null ? DefaultOf(declarator.Symbol.Type, frame) : CopyIfValue(Evaluate(initializer.Value, frame), declarator.Symbol.Type, frame));
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
        frame.ReturnValue = ret.ReturnedValue is null ? null : CopyIfValue(Evaluate(ret.ReturnedValue, frame), ret.ReturnedValue.Type, frame);
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

    // A switch section's break (or one it may have made) ends the switch only.
    private static Completion AfterSwitch(Completion completion) => completion == Completion.MaybeBreak ? Completion.Normal : completion;

    private Completion VisitSwitch(ISwitchOperation switchStatement, Frame frame)
    {
        var value = Evaluate(switchStatement.Value, frame);
        if (Unknown.Is(value))
            return AfterSwitch(SkipStatement(switchStatement, frame));

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
                    return AfterSwitch(SkipStatement(switchStatement, frame));
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
        for (var i = 0; i < chosen.Body.Length; i++)
        {
            var completion = AfterStatement(Execute(chosen.Body[i], frame), chosen.Body[i], frame);
            if (completion.IsMaybe)
                return AfterSwitch(SkipRest(chosen.Body, i + 1, completion, frame));
            if (completion == Completion.Break)
                return Completion.Normal;
            if (completion != Completion.Normal)
                return completion;
        }

        return Completion.Normal;
    }

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
            for (var i = 0; i < block.Operations.Length; i++)
            {
                var completion = AfterStatement(Execute(block.Operations[i], frame), block.Operations[i], frame);
                if (completion.IsMaybe)
                    return SkipRest(block.Operations, i + 1, completion, frame);
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
        var value = yielded.ReturnedValue is null ? null : CopyIfValue(Evaluate(yielded.ReturnedValue, frame), yielded.ReturnedValue.Type, frame);
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
