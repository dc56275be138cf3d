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
    private object? VisitAnonymousFunction(IAnonymousFunctionOperation lambda, Frame frame) => Closure.Of(lambda, frame.Snapshot());

    private object? VisitDelegateCreation(IDelegateCreationOperation creation, Frame frame)
    {
        switch (creation.Target)
        {
            case IAnonymousFunctionOperation lambda:
                return Closure.Of(lambda, frame.Snapshot());
            case IMethodReferenceOperation reference:
                var receiver = reference.Instance is null ? null : Evaluate(reference.Instance, frame);
                if (Unknown.Is(receiver)) return receiver;
                if (!session.IsInSource(reference.Method))
                    return Unsupported(creation, "the method group " + Describe(reference.Method), "only methods and local functions of this compilation are passed as delegates; wrap it in a lambda");
                return Closure.Of(reference.Method, receiver ?? (reference.Method.IsStatic ? null : frame.Instance), frame.Snapshot());
            default:
                return Unsupported(creation, "this delegate", "it is not a lambda or a method group");
        }
    }

    /// <summary>Calls a closure with its arguments (a lambda, or a method group of the design's code).</summary>
    private object? CallClosure(Closure closure, object?[] arguments, IOperation site)
    {
        Step(site);
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
                frame.Declare(parameters[i], i < arguments.Length ? CopyIfValue(arguments[i]) : Unknown.Value);
            Execute(lambda.Body, frame);
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
}
