using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// A delegate made by the design's code: a lambda with the frame it captures, or a method group (a method or local
/// function of the design, with its receiver). Calling it interprets its body; handed to a library method it becomes a
/// real delegate whose every call comes back to the interpreter (<see cref="Callbacks"/>).
/// </summary>
internal sealed class Closure
{
    private Closure(IMethodSymbol method, IAnonymousFunctionOperation? lambda, Frame captured, object? receiver)
    {
        Method = method;
        Lambda = lambda;
        Captured = captured;
        Receiver = receiver;
    }

    /// <summary>The lambda's or the method group's method.</summary>
    public IMethodSymbol Method { get; }

    /// <summary>The lambda (null for a method group).</summary>
    public IAnonymousFunctionOperation? Lambda { get; }

    /// <summary>The frame the delegate was made in: what a lambda or local function captures.</summary>
    public Frame Captured { get; }

    /// <summary>The object a method group of an instance method was taken from.</summary>
    public object? Receiver { get; }

    public static Closure Of(IAnonymousFunctionOperation lambda, Frame captured) => new(lambda.Symbol, lambda, captured, null);

    public static Closure Of(IMethodSymbol method, object? receiver, Frame captured) => new(method, null, captured, receiver);

    public override string ToString() => "System.Func";

    // C# compares delegates by target and method (two lambdas made in one scope can be equal); the elaborator does not
    // model that: library code comparing or hashing two closures (Distinct, a dictionary key) is PW9001 at the call.
    public override bool Equals(object? obj)
        => ReferenceEquals(this, obj) || obj is not Closure ? ReferenceEquals(this, obj) : throw UnknownValueException.DelegateEquality;

    public override int GetHashCode() => throw UnknownValueException.DelegateEquality;
}
