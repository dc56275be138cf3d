using System.Linq;
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

    private Closure(Closure[] parts)
        : this(parts[parts.Length - 1].Method, parts[parts.Length - 1].Lambda, parts[parts.Length - 1].Captured, parts[parts.Length - 1].Receiver)
        => Parts = parts;

    /// <summary>For a combined delegate (<c>a + b</c>, an event's handlers), the single delegates it calls in order; null
    /// for a single delegate. The combined one's method, lambda and receiver are its last part's, as in C#.</summary>
    public Closure[]? Parts { get; }

    /// <summary>The single delegates this one calls, in order (C#'s invocation list).</summary>
    public Closure[] InvocationList => Parts ?? new[] { this };

    public static Closure Of(IAnonymousFunctionOperation lambda, Frame captured) => new(lambda.Symbol, lambda, captured, null);

    /// <summary><c>a + b</c> on delegates: both invocation lists, a's first; null when both are null.</summary>
    public static Closure? Combine(Closure? a, Closure? b)
        => a is null ? b : b is null ? a : new Closure(a.InvocationList.Concat(b.InvocationList).ToArray());

    /// <summary>
    /// <c>a - b</c> on delegates: a without the last run of its invocation list equal to b's, as C# removes it (null when
    /// nothing is left). Null in <paramref name="decided"/> when equality cannot be told for a part it meets (see
    /// <see cref="SameDelegate"/>).
    /// </summary>
    public static Closure? Remove(Closure? source, Closure? value, out bool decided)
    {
        decided = true;
        if (source is null || value is null)
            return source;
        var list = source.InvocationList;
        var removed = value.InvocationList;
        for (var start = list.Length - removed.Length; start >= 0; start--)
        {
            var match = true;
            for (var i = 0; i < removed.Length && match; i++)
            {
                switch (SameDelegate(list[start + i], removed[i]))
                {
                    case null:
                        decided = false;
                        return source;
                    case false:
                        match = false;
                        break;
                }
            }

            if (!match)
                continue;
            var left = list.Take(start).Concat(list.Skip(start + removed.Length)).ToArray();
            return left.Length == 0 ? null : left.Length == 1 ? left[0] : new Closure(left);
        }

        return source;
    }

    /// <summary>
    /// <c>a == b</c> on delegates (C# specification, §12.12.9): equal invocation lists, part by part. Null when a pair of
    /// parts cannot be told apart (see <see cref="SameDelegate"/>).
    /// </summary>
    public static bool? AreEqual(Closure a, Closure b)
    {
        var left = a.InvocationList;
        var right = b.InvocationList;
        if (left.Length != right.Length)
            return false;
        var decided = true;
        for (var i = 0; i < left.Length; i++)
        {
            switch (SameDelegate(left[i], right[i]))
            {
                case false:
                    return false;
                case null:
                    decided = false;
                    break;
            }
        }

        return decided ? true : null;
    }

    // Delegate equality as far as it can be told: the same delegate object, or the same method group (method and
    // receiver) are equal; different methods are not. Two delegates made from one lambda may or may not share their
    // captured variables' object, which decides equality in C#: not told (null).
    private static bool? SameDelegate(Closure a, Closure b)
    {
        if (ReferenceEquals(a, b))
            return true;
        if (!SymbolEqualityComparer.Default.Equals(a.Method, b.Method))
            return false;
        return a.Lambda is null && b.Lambda is null ? ReferenceEquals(a.Receiver, b.Receiver) : null;
    }

    public static Closure Of(IMethodSymbol method, object? receiver, Frame captured) => new(method, null, captured, receiver);

    public override string ToString() => "System.Func";

    // C# compares delegates by target and method (two lambdas made in one scope can be equal); the elaborator does not
    // model that: library code comparing or hashing two closures (Distinct, a dictionary key) is PW9001 at the call.
    public override bool Equals(object? obj)
        => ReferenceEquals(this, obj) || obj is not Closure ? ReferenceEquals(this, obj) : throw UnknownValueException.DelegateEquality;

    public override int GetHashCode() => throw UnknownValueException.DelegateEquality;
}
