using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// The one dispatch: every statement, expression and pattern goes through Visit, which calls the one Visit<Kind> method
// for its OperationKind (see DEVELOPERS.md, "Where an operation kind is interpreted"). By kind, not by type test: one
// jump instead of a chain of interface casts for every operation interpreted. A kind not listed gives PW9001 naming it.
internal sealed partial class Interpreter
{
    /// <summary>The value of an expression (<see cref="Unknown"/> when it cannot be known).</summary>
    public object? Evaluate(IOperation operation, Frame frame)
    {
        if (MayBeConstant(operation) && operation.ConstantValue is { HasValue: true } constant)
            return FromConstant(constant.Value, operation.Type);
        var value = Visit(operation, frame);
        // A library struct's default the elaborator does not make is reported where it is read, never used.
        return value is UnmadeDefault unread ? ReadOfUnmadeDefault(operation, unread) : value;
    }

    /// <summary>Runs a statement; says how it ended.</summary>
    public Completion Execute(IOperation statement, Frame frame)
    {
        Current = statement;
        return Visit(statement, frame) as Completion ?? Completion.Normal;
    }

    /// <summary>
    /// Interprets one operation: a statement gives its <see cref="Completion"/>, an expression its value, a pattern
    /// whether <see cref="PatternInput"/> matches it (true, false, or null when that cannot be known).
    /// </summary>
    private object? Visit(IOperation operation, Frame frame)
    {
        switch (operation.Kind)
        {
            // ---- statements (Interpreter.Statements, .Loops, .Exceptions) ----
            case OperationKind.Block:
                return VisitBlock((IBlockOperation)operation, frame);
            case OperationKind.VariableDeclarationGroup:
                return VisitVariableDeclarationGroup((IVariableDeclarationGroupOperation)operation, frame);
            case OperationKind.ExpressionStatement:
                return VisitExpressionStatement((IExpressionStatementOperation)operation, frame);
            case OperationKind.Return:
                return VisitReturn((IReturnOperation)operation, frame);
            case OperationKind.YieldReturn:
                return VisitYieldReturn((IReturnOperation)operation, frame);
            case OperationKind.YieldBreak:
                return VisitYieldBreak((IReturnOperation)operation, frame);
            case OperationKind.Branch:
                return VisitBranch((IBranchOperation)operation, frame);
            case OperationKind.Switch:
                return VisitSwitch((ISwitchOperation)operation, frame);
            case OperationKind.Empty:
                return VisitEmpty((IEmptyOperation)operation, frame);
            case OperationKind.LocalFunction:
                return VisitLocalFunction((ILocalFunctionOperation)operation, frame);
            case OperationKind.Loop:
                return VisitLoop((ILoopOperation)operation, frame);
            case OperationKind.Try:
                return VisitTry((ITryOperation)operation, frame);
            case OperationKind.Using:
                return VisitUsing((IUsingOperation)operation, frame);
            case OperationKind.UsingDeclaration:
                return VisitUsingDeclaration((IUsingDeclarationOperation)operation, frame);
            case OperationKind.Throw:
                return VisitThrow((IThrowOperation)operation, frame);

            // ---- statement or expression (Interpreter.Expressions) ----
            case OperationKind.Conditional:
                return VisitConditional((IConditionalOperation)operation, frame);
            case OperationKind.Invalid:
                return VisitInvalid((IInvalidOperation)operation, frame);

            // ---- names and values (Interpreter.Expressions) ----
            case OperationKind.LocalReference:
                return VisitLocalReference((ILocalReferenceOperation)operation, frame);
            case OperationKind.ParameterReference:
                return VisitParameterReference((IParameterReferenceOperation)operation, frame);
            case OperationKind.InstanceReference:
                return VisitInstanceReference((IInstanceReferenceOperation)operation, frame);
            case OperationKind.DefaultValue:
                return VisitDefaultValue((IDefaultValueOperation)operation, frame);
            case OperationKind.Parenthesized:
                return VisitParenthesized((IParenthesizedOperation)operation, frame);
            case OperationKind.DeclarationExpression:
                return VisitDeclarationExpression((IDeclarationExpressionOperation)operation, frame);
            case OperationKind.Coalesce:
                return VisitCoalesce((ICoalesceOperation)operation, frame);
            case OperationKind.ConditionalAccess:
                return VisitConditionalAccess((IConditionalAccessOperation)operation, frame);
            case OperationKind.ConditionalAccessInstance:
                return VisitConditionalAccessInstance((IConditionalAccessInstanceOperation)operation, frame);
            case OperationKind.SwitchExpression:
                return VisitSwitchExpression((ISwitchExpressionOperation)operation, frame);
            case OperationKind.TypeOf:
                return VisitTypeOf((ITypeOfOperation)operation, frame);
            case OperationKind.Await:
                return VisitAwait((IAwaitOperation)operation, frame);

            // ---- operators (Interpreter.Operators) ----
            case OperationKind.Binary:
                return VisitBinary((IBinaryOperation)operation, frame);
            case OperationKind.TupleBinary:
                return VisitTupleBinary((ITupleBinaryOperation)operation, frame);
            case OperationKind.Unary:
                return VisitUnary((IUnaryOperation)operation, frame);
            case OperationKind.Conversion:
                return VisitConversion((IConversionOperation)operation, frame);
            case OperationKind.InterpolatedString:
                return VisitInterpolatedString((IInterpolatedStringOperation)operation, frame);

            // ---- members, elements and indices (Interpreter.Members) ----
            case OperationKind.FieldReference:
                return VisitFieldReference((IFieldReferenceOperation)operation, frame);
            case OperationKind.EventReference:
                return VisitEventReference((IEventReferenceOperation)operation, frame);
            case OperationKind.PropertyReference:
                return VisitPropertyReference((IPropertyReferenceOperation)operation, frame);
            case OperationKind.ArrayElementReference:
                return VisitArrayElementReference((IArrayElementReferenceOperation)operation, frame);
            case OperationKind.ImplicitIndexerReference:
                return VisitImplicitIndexerReference((IImplicitIndexerReferenceOperation)operation, frame);
            case OperationKind.Range:
                return VisitRange((IRangeOperation)operation, frame);

            // ---- calls (Interpreter.Calls) ----
            case OperationKind.Invocation:
                return VisitInvocation((IInvocationOperation)operation, frame);

            // ---- creation (Interpreter.Creation) ----
            case OperationKind.ObjectCreation:
                return VisitObjectCreation((IObjectCreationOperation)operation, frame);
            case OperationKind.TypeParameterObjectCreation:
                return VisitTypeParameterObjectCreation((ITypeParameterObjectCreationOperation)operation, frame);
            case OperationKind.ArrayCreation:
                return VisitArrayCreation((IArrayCreationOperation)operation, frame);
            case OperationKind.CollectionExpression:
                return VisitCollectionExpression((ICollectionExpressionOperation)operation, frame);
            case OperationKind.Tuple:
                return VisitTuple((ITupleOperation)operation, frame);
            case OperationKind.ObjectOrCollectionInitializer:
                return VisitObjectOrCollectionInitializer((IObjectOrCollectionInitializerOperation)operation, frame);
            case OperationKind.MemberInitializer:
                return VisitMemberInitializer((IMemberInitializerOperation)operation, frame);
            case OperationKind.AnonymousObjectCreation:
                return VisitAnonymousObjectCreation((IAnonymousObjectCreationOperation)operation, frame);
            case OperationKind.With:
                return VisitWith((IWithOperation)operation, frame);

            // ---- assignments (Interpreter.Assignments) ----
            case OperationKind.SimpleAssignment:
                return VisitSimpleAssignment((ISimpleAssignmentOperation)operation, frame);
            case OperationKind.EventAssignment:
                return VisitEventAssignment((IEventAssignmentOperation)operation, frame);
            case OperationKind.CompoundAssignment:
                return VisitCompoundAssignment((ICompoundAssignmentOperation)operation, frame);
            case OperationKind.CoalesceAssignment:
                return VisitCoalesceAssignment((ICoalesceAssignmentOperation)operation, frame);
            case OperationKind.Increment:
                return VisitIncrement((IIncrementOrDecrementOperation)operation, frame);
            case OperationKind.Decrement:
                return VisitDecrement((IIncrementOrDecrementOperation)operation, frame);
            case OperationKind.DeconstructionAssignment:
                return VisitDeconstructionAssignment((IDeconstructionAssignmentOperation)operation, frame);

            // ---- lambdas and delegates (Interpreter.Delegates) ----
            case OperationKind.AnonymousFunction:
                return VisitAnonymousFunction((IAnonymousFunctionOperation)operation, frame);
            case OperationKind.DelegateCreation:
                return VisitDelegateCreation((IDelegateCreationOperation)operation, frame);

            // ---- type tests (Interpreter.Types) ----
            case OperationKind.IsType:
                return VisitIsType((IIsTypeOperation)operation, frame);

            // ---- patterns (Interpreter.Patterns) ----
            case OperationKind.IsPattern:
                return VisitIsPattern((IIsPatternOperation)operation, frame);
            case OperationKind.ConstantPattern:
                return VisitConstantPattern((IConstantPatternOperation)operation, frame);
            case OperationKind.RelationalPattern:
                return VisitRelationalPattern((IRelationalPatternOperation)operation, frame);
            case OperationKind.DiscardPattern:
                return VisitDiscardPattern((IDiscardPatternOperation)operation, frame);
            case OperationKind.DeclarationPattern:
                return VisitDeclarationPattern((IDeclarationPatternOperation)operation, frame);
            case OperationKind.TypePattern:
                return VisitTypePattern((ITypePatternOperation)operation, frame);
            case OperationKind.RecursivePattern:
                return VisitRecursivePattern((IRecursivePatternOperation)operation, frame);
            case OperationKind.ListPattern:
                return VisitListPattern((IListPatternOperation)operation, frame);
            case OperationKind.NegatedPattern:
                return VisitNegatedPattern((INegatedPatternOperation)operation, frame);
            case OperationKind.BinaryPattern:
                return VisitBinaryPattern((IBinaryPatternOperation)operation, frame);

            default:
                return NotInterpreted(operation, frame);
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

    /// <summary>A kind of operation the elaborator does not interpret: PW9001 naming it, never a default value.</summary>
    private object? NotInterpreted(IOperation operation, Frame frame)
    {
        if (!IsStatement(operation))
        {
            // What the skipped expression may have assigned (an event handler it subscribes, say) becomes unknown too.
            Poison(operation, frame);
            return Unsupported(operation, "this " + KindName(operation), "it is outside the subset the elaborator interprets");
        }

        Unsupported(operation, StatementName(operation), "this kind of statement is outside the subset the elaborator interprets");
        // What the skipped statement may have assigned becomes unknown, and where it may have jumped is skipped too.
        return SkipStatement(operation, frame);
    }

    /// <summary>A statement rather than an expression (an <c>if</c> rather than <c>?:</c>, a broken statement rather than a broken expression).</summary>
    private static bool IsStatement(IOperation operation) => operation.Syntax is StatementSyntax;

    private static string StatementName(IOperation statement) => statement.Kind switch
    {
        OperationKind.Lock => "a lock statement",
        OperationKind.Branch => "a goto statement",
        OperationKind.Labeled => "a labeled statement",
        _ => "this statement",
    };

    private static string KindName(IOperation operation)
    {
        var kind = operation.Kind.ToString();
        var text = new System.Text.StringBuilder();
        foreach (var c in kind)
        {
            if (char.IsUpper(c) && text.Length > 0) text.Append(' ');
            text.Append(char.ToLowerInvariant(c));
        }

        return text.ToString();
    }
}
