using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Code the elaborator does not run (a branch whose condition is unknown, a call on an object or delegate that is not
// known, a loop whose collection is unknown): what it may have written becomes unknown, never read as it was before.
// The variables it names here are made unknown at once; what it may write elsewhere is noted (SkippedWrites) and every
// read of a variable goes through Read.
internal sealed partial class Interpreter
{
    /// <summary>A variable's value, or unknown when code the elaborator skipped may have written it since.</summary>
    private object? Read(Variable variable, ISymbol? symbol)
        => skippedWrites.Any && skippedWrites.MayHaveChanged(variable, symbol) ? Unknown.Value : variable.Value;

    /// <summary>A place to store into a variable, read through <see cref="Read"/>.</summary>
    private StoragePlace PlaceOf(Variable variable, ISymbol? symbol) => new(() => Read(variable, symbol), v => variable.Value = v);

    /// <summary>
    /// Skips a statement the elaborator cannot run (its condition or collection unknown): what it may have written becomes
    /// unknown, and if it can jump out of itself (return, throw, break, continue), the way it may have jumped is returned
    /// so that the code it would then have skipped is skipped too.
    /// </summary>
    private Completion SkipStatement(IOperation skipped, Frame frame)
    {
        Poison(skipped, frame);
        var (escape, unlessThrown) = EscapeOf(skipped);
        // A throw that no try around could catch would end the design at run time: the netlist is that of the run that
        // does not throw (a design's own check of its parameters, say), so such a throw is not taken as a jump.
        return tryDepth > 0 ? escape : unlessThrown;
    }

    /// <summary>After a statement that may have jumped (<paramref name="completion"/>), the statements after it in the same
    /// list are skipped too; the farther jump any of them may make wins.</summary>
    private Completion SkipRest(IEnumerable<IOperation> statements, int from, Completion completion, Frame frame)
    {
        var index = 0;
        foreach (var statement in statements)
            if (index++ >= from)
                completion = Completion.Farther(completion, SkipStatement(statement, frame));
        return completion;
    }

    /// <summary>What a loop does after its body ended with <paramref name="completion"/>: null to go on with the next
    /// iteration, else the loop's own completion. A body that may have left the loop skips the iterations left.</summary>
    private Completion? AfterIteration(Completion completion, IOperation loop, Frame frame)
    {
        if (completion == Completion.Break)
            return Completion.Normal;
        if (completion == Completion.Return)
            return completion;
        if (completion == Completion.MaybeBreak || completion.MayThrow || completion == Completion.MaybeReturn)
        {
            Poison(loop, frame);
            return completion == Completion.MaybeBreak ? Completion.Normal : completion;
        }

        return null; // Normal, Continue, MaybeContinue: the next iteration
    }

    /// <summary>How a method's body that ended with <paramref name="completion"/> leaves its frame: when it may have
    /// returned or thrown in code that was skipped, what it returns is not known.</summary>
    private void LeaveBody(Completion completion, Frame frame)
    {
        if (completion == Completion.MaybeReturn || completion.MayThrow)
            frame.ReturnValue = Unknown.Value;
        mayHaveThrown |= completion.MayThrow;
    }

    /// <summary>How a statement of a list ended, counting a method it called that may have thrown: then the statement may
    /// have stopped there (what it wrote becomes unknown) and the exception goes on to the enclosing catch.</summary>
    private Completion AfterStatement(Completion completion, IOperation statement, Frame frame)
    {
        if (!mayHaveThrown || !(completion == Completion.Normal || completion.IsMaybe))
            return completion;
        mayHaveThrown = false;
        Poison(statement, frame);
        return Completion.Farther(completion, Completion.MaybeThrow);
    }

    /// <summary>How skipped code can leave itself, the farthest way (Normal when it cannot): a return or yield break, a
    /// throw no catch inside it handles, a break or continue of a loop or switch around it, a goto; and the farthest way
    /// other than a throw.</summary>
    private (Completion Escape, Completion UnlessThrown) EscapeOf(IOperation skipped)
    {
        if (escapes.TryGetValue(skipped, out var known))
            return known;
        var escape = Completion.Normal;
        var unlessThrown = Completion.Normal;
        var pending = new Stack<IOperation>();
        pending.Push(skipped);
        while (pending.Count > 0)
        {
            var operation = pending.Pop();
            var jump = JumpOutOf(skipped, operation);
            escape = Completion.Farther(escape, jump);
            if (!jump.MayThrow)
                unlessThrown = Completion.Farther(unlessThrown, jump);
            foreach (var child in operation.ChildOperations)
                if (child is not (IAnonymousFunctionOperation or ILocalFunctionOperation)) // their jumps leave only them
                    pending.Push(child);
        }

        escapes[skipped] = (escape, unlessThrown);
        return (escape, unlessThrown);
    }

    private static Completion JumpOutOf(IOperation skipped, IOperation operation)
    {
        switch (operation)
        {
            case IReturnOperation { Kind: OperationKind.YieldReturn }:
                return Completion.Normal;
            case IReturnOperation:
                return Completion.MaybeReturn;
            case IThrowOperation:
                return CaughtInside(skipped, operation) ? Completion.Normal : Completion.MaybeThrow;
            case IBranchOperation { BranchKind: BranchKind.Break or BranchKind.Continue } branch:
                if (TargetInside(skipped, branch))
                    return Completion.Normal;
                return branch.BranchKind == BranchKind.Break ? Completion.MaybeBreak : Completion.MaybeContinue;
            case IBranchOperation:
                return Completion.MaybeReturn; // goto: anywhere
            default:
                return Completion.Normal;
        }
    }

    // A break or continue whose loop or switch is the skipped code or inside it.
    private static bool TargetInside(IOperation skipped, IBranchOperation branch)
    {
        for (IOperation? current = branch; current is not null; current = current.Parent)
        {
            var targeted = current switch
            {
                ILoopOperation loop => SymbolEqualityComparer.Default.Equals(loop.ExitLabel, branch.Target) || SymbolEqualityComparer.Default.Equals(loop.ContinueLabel, branch.Target),
                ISwitchOperation choice => SymbolEqualityComparer.Default.Equals(choice.ExitLabel, branch.Target),
                _ => false,
            };
            if (targeted)
                return true;
            if (ReferenceEquals(current, skipped))
                return false;
        }

        return false;
    }

    // A throw inside the body of a try with a catch clause, both inside the skipped code.
    private static bool CaughtInside(IOperation skipped, IOperation thrown)
    {
        if (ReferenceEquals(thrown, skipped))
            return false;
        var inner = thrown;
        for (var current = thrown.Parent; current is not null; inner = current, current = current.Parent)
        {
            if (current is ITryOperation { Catches.Length: > 0 } guarded && ReferenceEquals(guarded.Body, inner))
                return true;
            if (ReferenceEquals(current, skipped))
                return false;
        }

        return false;
    }

    /// <summary>Makes what <paramref name="skipped"/> may have written unknown (<see cref="Poison"/>) and returns
    /// <paramref name="value"/> (by default unknown): for an expression left unevaluated.</summary>
    private object? Skipped(IOperation? skipped, Frame frame, object? value = null)
    {
        if (skipped is not null)
            Poison(skipped, frame);
        return value ?? Unknown.Value;
    }

    /// <summary>The local, parameter, field or property a reference names (null for anything else).</summary>
    private static ISymbol? ReferencedSymbol(IOperation reference) => reference switch
    {
        ILocalReferenceOperation local => local.Local,
        IParameterReferenceOperation parameter => parameter.Parameter,
        IFieldReferenceOperation field => field.Field,
        IPropertyReferenceOperation property => property.Property,
        _ => null,
    };

    /// <summary>
    /// The variable a write to <paramref name="member"/> of an object that is not known goes to: none that is read. Which
    /// object it would change is not known, so that member reads as unknown in every object from now on.
    /// </summary>
    private Variable WriteToUnknownOwner(ISymbol member)
    {
        var written = new HashSet<ISymbol>(SymbolEqualityComparer.Default) { member.OriginalDefinition };
        skippedWrites.Add(new SkippedEffects.Effects(written, changesCollections: false, callsDelegates: false, new List<INamedTypeSymbol>()));
        return new Variable(Unknown.Value);
    }

    /// <summary>Notes a lambda or method made into a delegate: a delegate call skipped later may run it.</summary>
    private void NoteDelegate(IAnonymousFunctionOperation? lambda, IMethodSymbol method)
        => (skippedEffects ??= new SkippedEffects(session, cancellationToken)).NoteDelegate(lambda, method);

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

        // What it may have written elsewhere (in the methods it calls, through other names, in other objects) reads as
        // unknown from now on.
        var effects = (skippedEffects ??= new SkippedEffects(session, cancellationToken)).Of(skipped);
        // The skipped code may have been the first use of a type: its statics are made now, so that what the code may
        // have written into them after reads as unknown rather than as their initial values.
        foreach (var type in effects.StaticallyInitialized)
        {
            if (type.IsGenericType || initializedTypes.Contains(type))
                continue;
            try
            {
                InitializeStatics(type);
            }
            catch (DesignException)
            {
                // The type is marked failed: its next use throws again, where the design may catch it.
            }
        }

        skippedWrites.Add(effects);
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
        => value is System.Collections.IEnumerable and not string or System.Text.StringBuilder or InterpretedObject { Type.IsValueType: false };

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
}
