using System;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Lambdas, local functions and method groups as values. A closure is called by interpreting its body in a frame whose
// lexical parent is the frame it was made in, so it reads and writes the locals it captures.
internal sealed partial class Interpreter
{
    // A closure captures the variables as they are when it is made (Frame.Snapshot): a lambda made in a loop body sees
    // that iteration's variables, not the last iteration's.
    private object? VisitAnonymousFunction(IAnonymousFunctionOperation lambda, Frame frame)
    {
        NoteDelegate(lambda, lambda.Symbol);
        return Closure.Of(lambda, frame.Snapshot());
    }

    private object? VisitDelegateCreation(IDelegateCreationOperation creation, Frame frame)
    {
        switch (creation.Target)
        {
            case IAnonymousFunctionOperation lambda:
                NoteDelegate(lambda, lambda.Symbol);
                return Closure.Of(lambda, frame.Snapshot());
            case IMethodReferenceOperation reference:
                NoteDelegate(null, reference.Method);
                var receiver = reference.Instance is null ? null : Evaluate(reference.Instance, frame);
                if (Unknown.Is(receiver)) return receiver;
                if (!session.IsInSource(reference.Method) && !Library.IsValueOnlyMethod(reference.Method))
                    return Unsupported(creation, "the method group " + Describe(reference.Method),
                        "only methods and local functions of this compilation, and static library methods of values (char.IsDigit, Math.Abs, int.Parse), are passed as delegates; wrap it in a lambda");
                return Closure.Of(reference.Method, receiver ?? (reference.Method.IsStatic ? null : frame.Instance), frame.Snapshot());
            default:
                return Unsupported(creation, "this delegate", "it is not a lambda or a method group");
        }
    }

    /// <summary>Calls a closure with its arguments (a lambda, or a method group of the design's code).</summary>
    private object? CallClosure(Closure closure, object?[] arguments, IOperation site)
    {
        if (closure.Parts is { } parts)
        {
            // A combined delegate calls each part in order; its value is the last part's, as in C#.
            object? last = null;
            foreach (var part in parts)
                last = CallClosure(part, arguments, site);
            return last;
        }

        Step(site);
        if (closure.Lambda is null && !session.IsInSource(closure.Method))
            return CallClr(site, closure.Method, null, (object?[])arguments.Clone(), null, closure.Captured);
        if (closure.Lambda is null)
        {
            var method = closure.Method;
            if (closure.Receiver is InterpretedObject instance && method.IsVirtual | method.IsAbstract | method.IsOverride)
                method = FindOverride(instance.Type, method) ?? method;
            return InvokeUser(method, closure.Receiver as InterpretedObject, arguments, Array.Empty<Variable?>(), site, closure.Captured);
        }

        EnterCall(site);
        try
        {
            var lambda = closure.Lambda;
            var frame = new Frame(lambda.Symbol, closure.Captured, closure.Captured.Instance);
            var parameters = lambda.Symbol.Parameters;
            for (var i = 0; i < parameters.Length; i++)
                frame.Declare(parameters[i], i < arguments.Length ? CopyIfValue(arguments[i], parameters[i].Type, frame) : Unknown.Value);
            LeaveBody(Execute(lambda.Body, frame), frame);
            return frame.ReturnValue;
        }
        finally
        {
            LeaveCall();
        }
    }

    /// <summary>A real delegate for a library parameter: each call comes back here, at the site of the library call.</summary>
    private Delegate? ToDelegate(Closure closure, Type delegateType)
    {
        var site = clrSite ?? Current;
        if (site is null)
            return null;
        return Callbacks.Create(delegateType, arguments => CallClosure(closure, arguments.Select(FromClr).ToArray(), site));
    }

    /// <summary><c>a + b</c> and <c>a - b</c> on delegates (also <c>+=</c>, <c>-=</c> and an event's add and remove).</summary>
    private object? DelegateArithmetic(IOperation site, BinaryOperatorKind kind, object? left, object? right)
    {
        if (left is not (null or Closure) || right is not (null or Closure))
            return Unsupported(site, "operator " + kind + " on delegates", "a delegate not made by the design's code");
        if (kind == BinaryOperatorKind.Add)
            return Closure.Combine((Closure?)left, (Closure?)right);
        if (kind != BinaryOperatorKind.Subtract)
            return Unsupported(site, "operator " + kind + " on delegates", "only + and - combine delegates");
        var rest = Closure.Remove((Closure?)left, (Closure?)right, out var decided);
        if (decided)
            return rest;
        // Which handlers stay is not known: what any of them assigns becomes unknown.
        foreach (var part in ((Closure)left!).InvocationList)
            if (part.Lambda is { } lambda)
                Poison(lambda.Body, part.Captured);
        return Unsupported(site, "removing this delegate",
            "whether it equals one already added cannot be told: C# compares a lambda's target object, which the elaborator does not model");
    }

    private static bool IsDelegate(ITypeSymbol? type) => type?.TypeKind == TypeKind.Delegate;

    // ---- events: an instance field-like event of the design's types is a delegate stored in its object ----

    private object? VisitEventReference(IEventReferenceOperation reference, Frame frame)
    {
        if (EventOwner(reference, reference, frame, out var owner) is { } notRead)
            return notRead;
        return owner!.Find(reference.Event) is { } handlers ? Read(handlers, reference.Event) : null;
    }

    private object? VisitEventAssignment(IEventAssignmentOperation assignment, Frame frame)
    {
        if (assignment.EventReference is not IEventReferenceOperation reference)
            return Unsupported(assignment, "this event assignment", "its event is not named directly");
        if (EventOwner(reference, assignment, frame, out var owner) is { } notRead)
            return notRead;
        var handler = Evaluate(assignment.HandlerValue, frame);
        var handlers = owner!.GetOrAdd(reference.Event);
        NoteStoreInto(owner);
        var current = Read(handlers, reference.Event);
        handlers.Value = Unknown.Is(handler) || Unknown.Is(current)
            ? Unknown.Value
            : DelegateArithmetic(assignment, assignment.Adds ? BinaryOperatorKind.Add : BinaryOperatorKind.Subtract, current, handler);
        return null;
    }

    // The object whose event this is, or (as the value to return) why it is not read: a static event, one with its own
    // add and remove accessors, or one of an object the design did not make; through null, C#'s exception.
    private object? EventOwner(IEventReferenceOperation reference, IOperation site, Frame frame, out InterpretedObject? owner)
    {
        owner = null;
        var declared = reference.Event.DeclaringSyntaxReferences.FirstOrDefault()?.GetSyntax(cancellationToken);
        if (reference.Event.IsStatic || declared is not Microsoft.CodeAnalysis.CSharp.Syntax.VariableDeclaratorSyntax)
        {
            // A handler subscribed here may run later: what it assigns becomes unknown.
            Poison(site, frame);
            return Unsupported(site, "event " + Describe(reference.Event), "only instance events declared as fields (without add and remove accessors) of the design's types are elaborated");
        }

        var value = reference.Instance is null ? frame.Instance : Evaluate(reference.Instance, frame);
        if (Unknown.Is(value))
            return value;
        if (value is null && ThroughReference(reference.Instance) is { } nullOwner)
            return NullReference(site, nullOwner, "event " + Describe(reference.Event)) ?? Unknown.Value;
        owner = value as InterpretedObject;
        return owner is null ? Unsupported(site, "event " + Describe(reference.Event), "only events of objects the design's code made are elaborated") : null;
    }
}
