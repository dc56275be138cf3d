using System;
using System.Collections.Concurrent;
using System.Linq;
using System.Reflection;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Makes real delegates (Func, Action, Predicate, Comparison) from interpreted closures, so a library method run natively
/// (LINQ, List.Sort, ...) can call the design's lambdas: every call goes back through the interpreter, the design's code
/// never runs natively.
/// </summary>
internal static class Callbacks
{
    private static readonly ConcurrentDictionary<Type, MethodInfo?> Factories = new();

    /// <summary>A delegate of <paramref name="delegateType"/> that calls <paramref name="call"/>; null when the type is not supported.</summary>
    public static Delegate? Create(Type delegateType, Func<object?[], object?> call)
    {
        var factory = Factories.GetOrAdd(delegateType, FactoryFor);
        return factory?.Invoke(null, new object[] { call }) as Delegate;
    }

    private static MethodInfo? FactoryFor(Type delegateType)
    {
        var invoke = delegateType.GetMethod("Invoke");
        if (invoke is null || !delegateType.IsGenericType && delegateType != typeof(Action))
            return null;
        var parameters = invoke.GetParameters().Select(p => p.ParameterType).ToArray();
        if (parameters.Any(p => p.IsByRef))
            return null;
        var name = delegateType.IsGenericType ? delegateType.GetGenericTypeDefinition().FullName : delegateType.FullName;
        var shape = name switch
        {
            "System.Predicate`1" => "Predicate",
            "System.Comparison`1" => "Comparison",
            "System.Converter`2" => "Converter",
            _ when name!.StartsWith("System.Func`", StringComparison.Ordinal) => "Func" + parameters.Length,
            _ when name!.StartsWith("System.Action", StringComparison.Ordinal) => "Action" + parameters.Length,
            _ => null,
        };
        if (shape is null)
            return null;
        var factory = typeof(Callbacks).GetMethod(shape, BindingFlags.NonPublic | BindingFlags.Static);
        if (factory is null)
            return null;
        var typeArguments = delegateType.IsGenericType ? delegateType.GetGenericArguments() : Type.EmptyTypes;
        return typeArguments.Length == 0 ? factory : factory.MakeGenericMethod(typeArguments);
    }

    /// <summary>The closure's result as the delegate's return type (numbers converted the way C# would implicitly).</summary>
    private static T Result<T>(object? value)
    {
        if (Unknown.Is(value))
            throw new UnknownValueException();
        if (value is T typed)
            return typed;
        if (value is null)
            return default!;
        var target = Nullable.GetUnderlyingType(typeof(T)) ?? typeof(T);
        if (value is IConvertible && target.IsPrimitive)
            return (T)System.Convert.ChangeType(value, target, System.Globalization.CultureInfo.InvariantCulture);
        throw new InvalidCastException($"the lambda gave a {value.GetType().Name} where a {typeof(T).Name} is expected");
    }

    private static Action Action0(Func<object?[], object?> call) => () => call(Array.Empty<object?>());

    private static Action<T1> Action1<T1>(Func<object?[], object?> call) => a => call(new object?[] { a });

    private static Action<T1, T2> Action2<T1, T2>(Func<object?[], object?> call) => (a, b) => call(new object?[] { a, b });

    private static Action<T1, T2, T3> Action3<T1, T2, T3>(Func<object?[], object?> call) => (a, b, d) => call(new object?[] { a, b, d });

    private static Func<TR> Func0<TR>(Func<object?[], object?> call) => () => Result<TR>(call(Array.Empty<object?>()));

    private static Func<T1, TR> Func1<T1, TR>(Func<object?[], object?> call) => a => Result<TR>(call(new object?[] { a }));

    private static Func<T1, T2, TR> Func2<T1, T2, TR>(Func<object?[], object?> call) => (a, b) => Result<TR>(call(new object?[] { a, b }));

    private static Func<T1, T2, T3, TR> Func3<T1, T2, T3, TR>(Func<object?[], object?> call) => (a, b, d) => Result<TR>(call(new object?[] { a, b, d }));

    private static Func<T1, T2, T3, T4, TR> Func4<T1, T2, T3, T4, TR>(Func<object?[], object?> call)
        => (a, b, d, e) => Result<TR>(call(new object?[] { a, b, d, e }));

    private static Predicate<T1> Predicate<T1>(Func<object?[], object?> call) => a => Result<bool>(call(new object?[] { a }));

    private static Comparison<T1> Comparison<T1>(Func<object?[], object?> call) => (a, b) => Result<int>(call(new object?[] { a, b }));

    private static Converter<T1, TR> Converter<T1, TR>(Func<object?[], object?> call) => a => Result<TR>(call(new object?[] { a }));
}
