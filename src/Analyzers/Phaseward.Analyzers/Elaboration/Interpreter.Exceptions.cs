using System;
using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

// Exceptions the design throws and catches itself (try/catch/finally, throw) and resources it disposes (using
// statements and declarations). An exception inside a try is a DesignException carried to the design's catch clauses; one that no clause
// catches is PW9003 at the throw, as an exception outside any try is.
internal sealed partial class Interpreter
{
    private object? VisitThrow(IThrowOperation thrown, Frame frame)
    {
        var value = thrown.Exception is null ? (caught.Count > 0 ? caught.Peek() : null) : Evaluate(thrown.Exception, frame);
        if (tryDepth > 0 && value is not null && !Unknown.Is(value))
            throw new DesignException(value, thrown.Syntax);
        Throws(thrown.Syntax, thrown.Exception is null || Unknown.Is(value) || value is null
            ? (value as Exception)?.GetType().Name + ": " + (value as Exception)?.Message
            : DescribeThrow(thrown, value));
        throw new ElaborationStopped();
    }

    private Completion VisitTry(ITryOperation statement, Frame frame)
    {
        var completion = Completion.Normal;
        DesignException? uncaught = null;
        tryDepth++;
        activeTries.Add((statement, frame, callers));
        try
        {
            completion = Execute(statement.Body, frame);
        }
        catch (DesignException e)
        {
            uncaught = e;
            // The innermost try the exception reaches seeks its handler, outer filters included, before this finally runs.
            if (!e.HandlerSought)
                FindHandler(e);
        }
        finally
        {
            activeTries.RemoveAt(activeTries.Count - 1);
            tryDepth--;
        }

        if (uncaught is not null)
        {
            var handler = uncaught.Handler is var (clause, handlerFrame) && ReferenceEquals(handlerFrame, frame) && clause.Parent == statement ? clause : null;
            if (handler is not null)
            {
                // 'throw;' rethrows the exception caught, whether or not the clause names it (and whatever its variable now holds).
                caught.Push(uncaught.Thrown);
                uncaught = null;
                try
                {
                    completion = Execute(handler.Handler, frame);
                }
                catch (DesignException e) when (statement.Finally is not null)
                {
                    uncaught = e;
                }
                finally
                {
                    caught.Pop();
                }
            }
        }

        // The body may have thrown in code that was skipped: a catch clause may then have run, and what it does is not
        // known either; after it, the code runs on as after any catch.
        if (completion.MayThrow && statement.Catches.Length > 0)
        {
            mayHaveThrown = false;
            completion = completion == Completion.MaybeReturnOrThrow ? Completion.MaybeReturn : Completion.Normal;
            foreach (var clause in statement.Catches)
                completion = Completion.Farther(completion, SkipStatement(clause.Handler, frame));
        }

        if (statement.Finally is not null)
        {
            var afterFinally = Execute(statement.Finally, frame);
            if (afterFinally != Completion.Normal)
                completion = afterFinally;
        }

        if (uncaught is not null)
        {
            if (tryDepth > 0)
                throw uncaught;
            Throws(uncaught.Site, uncaught.Describe());
            throw new ElaborationStopped();
        }

        return completion;
    }

    /// <summary>
    /// The first pass, as .NET makes it: the catch clauses of the running try statements, innermost first, are tried
    /// (their filters run) before any finally block runs; the one that takes the exception is kept on it.
    /// </summary>
    private void FindHandler(DesignException exception)
    {
        exception.HandlerSought = true;
        for (var i = activeTries.Count - 1; i >= 0; i--)
        {
            var (statement, frame, tryCallers) = activeTries[i];
            foreach (var clause in statement.Catches)
            {
                if (Catches(clause, exception.Thrown, frame, tryCallers))
                {
                    exception.Handler = (clause, frame);
                    return;
                }
            }
        }
    }

    /// <summary>Does the catch clause take this exception? (Declares its variable and evaluates its filter.)</summary>
    private bool Catches(ICatchClauseOperation clause, object thrown, Frame frame, SourceSpan[] tryCallers)
    {
        var type = clause.ExceptionType;
        if (type.SpecialType != SpecialType.System_Object && type.ToDisplayString() != "System.Exception" && IsOfType(thrown, type, frame) != true)
            return false;
        if (clause.ExceptionDeclarationOrExpression is IVariableDeclaratorOperation declarator)
            frame.Declare(declarator.Symbol, thrown);
        return clause.Filter is null || FilterAccepts(clause.Filter, frame, tryCallers);
    }

    /// <summary>A filter runs where its try statement is; an exception it throws makes it false (the original goes on).</summary>
    private bool FilterAccepts(IOperation filter, Frame frame, SourceSpan[] tryCallers)
    {
        var (outerTries, outerCallers) = (activeTries, callers);
        activeTries = new();
        callers = tryCallers;
        tryDepth++;
        try
        {
            return Condition(filter, frame) == true;
        }
        catch (DesignException)
        {
            return false;
        }
        finally
        {
            tryDepth--;
            (activeTries, callers) = (outerTries, outerCallers);
        }
    }

    private Completion VisitUsing(IUsingOperation statement, Frame frame)
    {
        var resources = new List<object?>();
        switch (statement.Resources)
        {
            case IVariableDeclarationGroupOperation group:
                Execute(group, frame);
                foreach (var declarator in group.Declarations.SelectMany(d => d.Declarators))
                    resources.Add(frame.Find(declarator.Symbol)?.Value);
                break;
            default:
                // 'using (s)' disposes a copy of a struct held in a variable, as C# does.
                resources.Add(CopyIfValue(Evaluate(statement.Resources, frame), statement.Resources.Type, frame));
                break;
        }

        try
        {
            return Execute(statement.Body, frame);
        }
        finally
        {
            DisposeAll(resources, statement);
        }
    }

    private Completion VisitUsingDeclaration(IUsingDeclarationOperation statement, Frame frame)
    {
        Execute(statement.DeclarationGroup, frame);
        if (usingScopes.Count > 0)
            foreach (var declarator in statement.DeclarationGroup.Declarations.SelectMany(d => d.Declarators))
                usingScopes.Peek().Add(frame.Find(declarator.Symbol)?.Value);
        return Completion.Normal;
    }

    /// <summary>Disposes resources in reverse order: the design's Dispose is interpreted; library resources have nothing to release.</summary>
    private void DisposeAll(List<object?> resources, IOperation site)
    {
        for (var i = resources.Count - 1; i >= 0; i--)
        {
            if (resources[i] is not InterpretedObject resource)
                continue;
            var dispose = resource.Type.GetMembers("Dispose").OfType<IMethodSymbol>().FirstOrDefault(m => m.Parameters.Length == 0)
                ?? resource.Type.AllInterfaces.SelectMany(t => t.GetMembers("Dispose")).OfType<IMethodSymbol>()
                    .Select(m => resource.Type.FindImplementationForInterfaceMember(m)).OfType<IMethodSymbol>().FirstOrDefault();
            if (dispose is not null && session.IsInSource(dispose))
                InvokeUser(dispose, resource, Array.Empty<object?>(), Array.Empty<Variable?>(), site, new Frame(null, null, resource));
        }
    }

    /// <summary>A .NET exception for a message "TypeName: text" (as the interpreter words what a run would throw).</summary>
    private static Exception ExceptionNamed(string message)
    {
        var colon = message.IndexOf(':');
        if (colon > 0)
        {
            var name = message.Substring(0, colon);
            var text = message.Substring(colon + 1).Trim();
            var type = Type.GetType("System." + name, throwOnError: false) ?? typeof(List<>).Assembly.GetType("System.Collections.Generic." + name, throwOnError: false);
            if (type is not null && typeof(Exception).IsAssignableFrom(type)
                && type.GetConstructor(new[] { typeof(string) }) is { } constructor)
                return (Exception)constructor.Invoke(new object[] { text });
        }

        return new InvalidOperationException(message);
    }

    /// <summary>
    /// An exception thrown for the design by a library member or by the runtime (a null dereference, a type whose
    /// initialization failed): inside a try the design may catch it; outside, it is PW9003 and the value is unknown.
    /// </summary>
    private object? Raise(SyntaxNode site, Exception exception)
    {
        if (tryDepth > 0)
            throw new DesignException(exception, site);
        Throws(site, exception.Message);
        return Unknown.Value;
    }

    /// <summary>
    /// An exception a library member threw for the design. One that wraps what the design's callback threw (List.Sort:
    /// "Failed to compare two elements", the comparer's exception inside) gets the design's exception as its
    /// InnerException, as in .NET, not the elaborator's carrier of it.
    /// </summary>
    private object? RaiseFromLibrary(IOperation site, Exception exception)
    {
        switch (exception.InnerException)
        {
            case ElaborationStopped stopped:
                // The callback's exception was uncaught (PW9003 at its throw): the design ends there.
                System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(stopped).Throw();
                return null;
            case DesignException { Thrown: Exception thrown }:
                var wrapper = exception.GetType().GetConstructor(new[] { typeof(string), typeof(Exception) });
                if (wrapper is null)
                    return Unsupported(site, "the " + exception.GetType().Name + " the library throws around an exception of the design", "it cannot be made with the design's exception inside");
                return Raise(site.Syntax, (Exception)wrapper.Invoke(new object[] { exception.Message, thrown }));
            case DesignException:
                return Unsupported(site, "the " + exception.GetType().Name + " the library throws around an exception of the design",
                    "the design's exception is of its own class, which a .NET exception cannot hold as its InnerException at compile time");
            default:
                return Raise(site.Syntax, exception);
        }
    }

    /// <summary>
    /// A member reached through an expression that is null: C# throws a NullReferenceException there. Inside a try the
    /// design may catch it; outside it is PW9003 naming the expression and the member. Never a read of some other
    /// object, nor a guessed value.
    /// </summary>
    private object? NullReference(IOperation site, IOperation receiver, string member)
        => Raise(site.Syntax, new NullReferenceException($"'{receiver.Syntax}' is null, so {member} cannot be reached through it"));

    // The receiver when null there is a null reference: written out (not the implicit 'this') and not of a value type
    // (a null Nullable<T> is a value: x.HasValue, x.GetValueOrDefault()); else null.
    private static IOperation? ThroughReference(IOperation? receiver)
        => receiver is not null and not IInstanceReferenceOperation && receiver.Type is not { IsValueType: true } ? receiver : null;

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
}
