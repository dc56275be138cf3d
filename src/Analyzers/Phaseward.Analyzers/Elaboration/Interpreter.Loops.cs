using System;
using System.Collections;
using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;
using Microsoft.CodeAnalysis.Text;

namespace Phaseward.Analyzers.Elaboration;

// Loops: every iteration is a step (against the step budget), and a loop whose condition or collection is unknown is
// skipped with what its body assigns made unknown (Poison).
internal sealed partial class Interpreter
{
    /// <summary>All loops share one OperationKind; their LoopKind says which.</summary>
    private object? VisitLoop(ILoopOperation loop, Frame frame) => loop.LoopKind switch
    {
        LoopKind.While => VisitWhileLoop((IWhileLoopOperation)loop, frame),
        LoopKind.For => VisitForLoop((IForLoopOperation)loop, frame),
        LoopKind.ForEach => VisitForEachLoop((IForEachLoopOperation)loop, frame),
        _ => NotInterpreted(loop, frame),
    };

    private Completion VisitWhileLoop(IWhileLoopOperation loop, Frame frame)
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
                        return SkipStatement(loop, frame);

                    if (condition.Value == loop.ConditionIsUntil)
                        return Completion.Normal;
                }

                first = false;
                if (AfterIteration(Execute(loop.Body, frame), loop, frame) is { } after)
                    return after;
            }
        }
        finally
        {
            loops.Pop();
        }
    }

    private Completion VisitForLoop(IForLoopOperation loop, Frame frame)
    {
        // A header the compiler rejects (a stray ';' where the condition goes, a half-typed increment) means nothing to
        // run, and while it is being typed it would run to the step or device budget: the loop is skipped, like any
        // code that does not compile (the compiler reports it), with what it assigns made unknown.
        if (HeaderDoesNotCompile(loop))
            return SkipStatement(loop, frame);

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
                    return SkipStatement(loop, frame);

                if (!condition.Value)
                    return Completion.Normal;
                if (AfterIteration(Execute(loop.Body, frame), loop, frame) is { } after)
                    return after;
                foreach (var bottom in loop.AtLoopBottom)
                    Execute(bottom, frame);
            }
        }
        finally
        {
            loops.Pop();
        }
    }

    private bool HeaderDoesNotCompile(IForLoopOperation loop)
    {
        if (brokenLoopHeaders.TryGetValue(loop, out var broken))
            return broken;
        // A compiler error proper, not a warning the project treats as an error: a header with a nullable warning under
        // TreatWarningsAsErrors still means what it says.
        broken = false;
        if (loop.Syntax is ForStatementSyntax header && loop.SemanticModel is { } model)
        {
            foreach (var diagnostic in model.GetDiagnostics(TextSpan.FromBounds(header.SpanStart, header.Statement.SpanStart), cancellationToken))
                broken |= diagnostic.DefaultSeverity == DiagnosticSeverity.Error;
        }

        brokenLoopHeaders[loop] = broken;
        return broken;
    }

    private Completion VisitForEachLoop(IForEachLoopOperation loop, Frame frame)
    {
        // A foreach straight over a call of the design's iterator runs its body at each 'yield return', as C# does: the
        // iterator stops where the loop breaks, and what each side does happens in C#'s order (see streamTo).
        var source = StripConversions(loop.Collection);
        var variableType = (loop.LoopControlVariable as IVariableDeclaratorOperation)?.Symbol.Type;
        var castsElements = variableType is not null && CastsElements(loop);
        var streamed = false;
        var outcome = Completion.Normal;
        var consumerCallers = callers;
        var consumerTryDepth = tryDepth;
        bool Consume(object? value)
        {
            streamed = true;
            var iteratorCallers = callers;
            var iteratorTryDepth = tryDepth;
            callers = consumerCallers;
            tryDepth = consumerTryDepth;
            loops.Push(loop);
            try
            {
                Step(loop);
                var completion = RunForEachBody(loop, frame, value, variableType, castsElements);
                if (AfterIteration(completion, loop, frame) is not { } after)
                    return true;
                outcome = after;
                // The iterator stops here; if the loop only may have stopped, what the iterator would do next is not known.
                if (completion.IsMaybe)
                    Poison(source, frame);
                return false;
            }
            finally
            {
                loops.Pop();
                callers = iteratorCallers;
                tryDepth = iteratorTryDepth;
            }
        }

        var outerStream = streamTo;
        streamTo = source is IInvocationOperation ? (source, Consume) : null;
        object? collection;
        try
        {
            collection = Evaluate(source, frame);
        }
        finally
        {
            streamTo = outerStream;
        }

        if (streamed || collection is StreamedIterator)
            return outcome;

        // A call of the design's iterator made earlier and enumerated here: its values stream into the loop body.
        if (collection is DeferredIterator deferred)
        {
            streamTo = (deferred.Site, Consume);
            try
            {
                collection = deferred.RunNow();
            }
            finally
            {
                streamTo = outerStream;
            }

            if (streamed || collection is StreamedIterator)
                return outcome;
        }

        // A sequence of the design's own type (a bus that is IEnumerable<Net>): its GetEnumerator, an iterator streamed
        // into the loop like any other, or one that hands out a library enumerator.
        if (collection is InterpretedObject sequence)
        {
            if (GetEnumeratorOf(sequence.Type) is not { } getEnumerator)
            {
                Unsupported(loop.Collection, "this foreach collection", "its type has no GetEnumerator method of this compilation");
                return SkipStatement(loop, frame);
            }

            streamTo = (loop.Collection, Consume);
            try
            {
                collection = InvokeUser(getEnumerator, sequence, Array.Empty<object?>(), Array.Empty<Variable?>(), loop.Collection, frame);
            }
            finally
            {
                streamTo = outerStream;
            }

            if (streamed || collection is StreamedIterator)
                return outcome;
            if (collection is IEnumerator enumerator)
            {
                try
                {
                    collection = Drained(enumerator);
                }
                catch (UnknownValueException e)
                {
                    UnknownFrom(e, loop.Collection);
                    return SkipStatement(loop, frame);
                }
            }
            else if (collection is InterpretedObject)
            {
                Unsupported(loop.Collection, "this foreach collection", "an enumerator written in the design (its own MoveNext and Current) is not run");
                return SkipStatement(loop, frame);
            }
        }

        if (Unknown.Is(collection))
            return SkipStatement(loop, frame);

        if (collection is null && ThroughReference(source) is { } nullSource)
        {
            NullReference(loop.Collection, nullSource, "its elements");
            return SkipStatement(loop, frame);
        }

        IEnumerable? items = collection switch
        {
            object?[] array => array,
            string text => text,
            InterpretedObject => null,
            IEnumerable enumerable => enumerable,
            _ => null,
        };
        if (items is null)
        {
            Unsupported(loop.Collection, "this foreach collection", "only arrays, strings, the library's collections and sequences, and iterators are enumerated");
            return SkipStatement(loop, frame);
        }

        loops.Push(loop);
        // The collection's own enumerator, as C# takes it: a list, set or dictionary the body changes makes the next
        // MoveNext throw (whichever changes the running .NET counts), and the design may catch that.
        var itemEnumerator = items.GetEnumerator();
        try
        {
            while (NextItem(itemEnumerator, loop))
            {
                Step(loop);
                if (AfterIteration(RunForEachBody(loop, frame, itemEnumerator.Current, variableType, castsElements), loop, frame) is { } after)
                    return after;
            }

            return Completion.Normal;
        }
        catch (UnknownValueException e)
        {
            // A lazy library sequence (OrderBy, Select...) called back a lambda whose value is not known: the iterations
            // left are skipped, and what the body assigns made unknown.
            UnknownFrom(e, loop.Collection);
            return SkipStatement(loop, frame);
        }
        finally
        {
            loops.Pop();
            (itemEnumerator as IDisposable)?.Dispose();
        }
    }

    /// <summary>
    /// The enumerator's MoveNext: the InvalidOperationException a library collection throws when it was changed since
    /// the loop began is the design's (PW9003 when no catch takes it).
    /// </summary>
    private bool NextItem(IEnumerator enumerator, IForEachLoopOperation loop)
    {
        try
        {
            return enumerator.MoveNext();
        }
        catch (InvalidOperationException e)
        {
            if (tryDepth > 0)
                throw new DesignException(e, loop.Collection.Syntax);
            Throws(loop.Collection.Syntax, e.GetType().Name + ": " + e.Message);
            throw new ElaborationStopped();
        }
    }

    /// <summary>The GetEnumerator a foreach calls on an object of the design's type: a public one, as C# looks first, else
    /// its implementation of IEnumerable&lt;T&gt; or IEnumerable.</summary>
    private static IMethodSymbol? GetEnumeratorOf(INamedTypeSymbol type)
    {
        for (var current = type; current is not null; current = current.BaseType)
            foreach (var member in current.GetMembers("GetEnumerator"))
                if (member is IMethodSymbol { Parameters.Length: 0, IsStatic: false, DeclaredAccessibility: Accessibility.Public } method)
                    return method;
        foreach (var contract in type.AllInterfaces.OrderBy(i => i.IsGenericType ? 0 : 1))
            if (contract.Name == "IEnumerable" && contract.ContainingNamespace?.ToDisplayString() is "System.Collections.Generic" or "System.Collections"
                && contract.GetMembers("GetEnumerator").FirstOrDefault() is { } declared
                && type.FindImplementationForInterfaceMember(declared) is IMethodSymbol implementation)
                return implementation;
        return null;
    }

    /// <summary>
    /// A sequence of the design's own type handed to the library (LINQ, string.Join, a list's constructor): its
    /// GetEnumerator run once, as the library would, and its values in order. The design's iterators run to the end when
    /// called (as everywhere in the elaborator), so the values are all made here, before the library reads the first one.
    /// Null when they are not known (reported where they are made) or the enumerator is the design's own.
    /// </summary>
    private List<object?>? EnumeratedForLibrary(InterpretedObject sequence, IMethodSymbol getEnumerator)
    {
        var site = clrSite ?? Current;
        if (site is null)
            return null;
        var outerStream = streamTo;
        streamTo = null;
        object? enumerated;
        try
        {
            enumerated = InvokeUser(getEnumerator, sequence, Array.Empty<object?>(), Array.Empty<Variable?>(), site, new Frame(null, null, sequence));
        }
        finally
        {
            streamTo = outerStream;
        }

        // An iterator GetEnumerator (yield return) runs when the library enumerates, which is now.
        if (enumerated is DeferredIterator deferred)
            enumerated = deferred.RunNow();
        switch (enumerated)
        {
            case List<object?> yielded:
                return yielded;
            case IEnumerator enumerator:
                try
                {
                    return Drained(enumerator);
                }
                catch (UnknownValueException e)
                {
                    UnknownFrom(e, site);
                    return null;
                }

            case InterpretedObject:
                Unsupported(site, "this sequence of " + Describe(sequence.Type), "an enumerator written in the design (its own MoveNext and Current) is not run");
                return null;
            default:
                return null;
        }
    }

    // The values a library enumerator the design's GetEnumerator returned hands out, in order.
    private static List<object?> Drained(IEnumerator enumerator)
    {
        var values = new List<object?>();
        while (enumerator.MoveNext())
            values.Add(enumerator.Current);
        return values;
    }

    /// <summary>One iteration of a foreach: the loop variable (or deconstruction) set to the item, then the body.</summary>
    private Completion RunForEachBody(IForEachLoopOperation loop, Frame frame, object? raw, ITypeSymbol? variableType, bool castsElements)
    {
        var item = FromClr(raw);
        if (castsElements && !Unknown.Is(item))
            item = CastElement(loop, item, variableType!, frame);
        else if (variableType is not null && item is not null && !Unknown.Is(item) && IsNumeric(variableType) && IsNumericValue(item))
            item = Arithmetic.ConvertNumber(item, variableType.SpecialType, isChecked: false) ?? item;
        switch (loop.LoopControlVariable)
        {
            case IVariableDeclaratorOperation declarator:
                // The loop variable is a copy of a struct element: what the body does to it leaves the element as it was.
                frame.Declare(declarator.Symbol, CopyIfValue(item, declarator.Symbol.Type, frame));
                break;
            default:
                Deconstruct(loop.LoopControlVariable, item, frame);
                break;
        }

        return Execute(loop.Body, frame);
    }

    private static IOperation StripConversions(IOperation operation)
    {
        while (operation is IConversionOperation { IsImplicit: true } conversion)
            operation = conversion.Operand;
        return operation;
    }
}
