using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The .NET library members the elaborator may run natively: pure, deterministic types (strings, numbers, Math, LINQ,
/// the generic collections, StringBuilder...). Anything else -- files, environment, time, randomness, reflection,
/// threads, network -- is not run: PW9001 names the member. Generic library types are run with their type arguments
/// erased to <c>object</c> (the interpreter's values are objects of the design's own types, which do not exist as .NET
/// types), except where a struct constraint needs the real type.
/// </summary>
internal static class Library
{
    /// <summary>Types (by metadata name) whose members are pure and may run natively.</summary>
    private static readonly HashSet<string> PureTypes = new(StringComparer.Ordinal)
    {
        "System.Object", "System.String", "System.Char", "System.Boolean", "System.Byte", "System.SByte", "System.Int16", "System.UInt16",
        "System.Int32", "System.UInt32", "System.Int64", "System.UInt64", "System.Single", "System.Double", "System.Decimal",
        "System.Math", "System.MathF", "System.Convert", "System.Numerics.BitOperations", "System.Nullable`1", "System.Enum",
        "System.Array", "System.ValueTuple", "System.Tuple", "System.StringComparer", "System.StringComparison", "System.StringSplitOptions",
        "System.Text.StringBuilder", "System.Globalization.CultureInfo", "System.Globalization.NumberStyles", "System.MidpointRounding",
        "System.Linq.Enumerable", "System.Linq.IGrouping`2", "System.Linq.ILookup`2", "System.Linq.IOrderedEnumerable`1",
        "System.Collections.Generic.List`1", "System.Collections.Generic.Dictionary`2", "System.Collections.Generic.HashSet`1",
        "System.Collections.Generic.SortedSet`1", "System.Collections.Generic.SortedDictionary`2",
        "System.Collections.Generic.Queue`1", "System.Collections.Generic.Stack`1", "System.Collections.Generic.KeyValuePair`2",
        "System.Collections.Generic.KeyValuePair", "System.Collections.Generic.IEnumerable`1", "System.Collections.Generic.ICollection`1",
        "System.Collections.Generic.IList`1", "System.Collections.Generic.IReadOnlyList`1", "System.Collections.Generic.IReadOnlyCollection`1",
        "System.Collections.Generic.IDictionary`2", "System.Collections.Generic.IReadOnlyDictionary`2", "System.Collections.Generic.ISet`1",
        "System.Collections.Generic.CollectionExtensions", "System.Collections.Generic.Dictionary`2+KeyCollection",
        "System.Collections.Generic.Dictionary`2+ValueCollection", "System.Collections.IEnumerable", "System.IComparable", "System.IComparable`1",
        "System.IEquatable`1", "System.IFormattable", "System.Text.StringBuilder+AppendInterpolatedStringHandler",
        "System.Exception", "System.SystemException", "System.ArgumentException", "System.ArgumentNullException", "System.ArgumentOutOfRangeException",
        "System.InvalidOperationException", "System.NotSupportedException", "System.NotImplementedException", "System.FormatException",
        "System.OverflowException", "System.IndexOutOfRangeException", "System.DivideByZeroException", "System.ArithmeticException",
        "System.Collections.Generic.KeyNotFoundException",
    };

    /// <summary>Members of pure types that are still outside: they read the machine's state or are non-deterministic.</summary>
    private static readonly HashSet<string> ImpureMembers = new(StringComparer.Ordinal)
    {
        "System.Object.GetType", "System.Object.GetHashCode", "System.String.GetHashCode", "System.Globalization.CultureInfo.CurrentCulture",
        "System.Globalization.CultureInfo.CurrentUICulture", "System.Globalization.CultureInfo.get_CurrentCulture",
        "System.Globalization.CultureInfo.get_CurrentUICulture", "System.Globalization.CultureInfo.GetCultureInfo",
    };

    public static bool IsPure(ISymbol member)
    {
        if (member.ContainingType is not { } type)
            return false;
        var name = ClrTypes.MetadataName(type.OriginalDefinition);
        return PureTypes.Contains(name) && !ImpureMembers.Contains(name + "." + member.MetadataName);
    }

    /// <summary>
    /// A static pure library method whose parameters are all values or strings (<c>char.IsDigit</c>, <c>Math.Abs</c>,
    /// <c>int.Parse</c>): called through a delegate it can change nothing the design holds.
    /// </summary>
    public static bool IsValueOnlyMethod(IMethodSymbol method)
        => method.IsStatic && !ClrTypes.IsDsl(method) && IsPure(method)
           && method.Parameters.All(p => p.RefKind == RefKind.None && (p.Type.IsValueType || p.Type.SpecialType == SpecialType.System_String));

    public static bool IsPureType(ITypeSymbol type) => type is INamedTypeSymbol named && PureTypes.Contains(ClrTypes.MetadataName(named.OriginalDefinition));

    private static readonly ConcurrentDictionary<string, MethodBase?> Members = new(StringComparer.Ordinal);

    /// <summary>The run-time member behind a library method symbol, on the erased type (null when there is none).</summary>
    public static MethodBase? Find(IMethodSymbol method)
    {
        var key = method.ContainingType?.OriginalDefinition.ToDisplayString() + "|" + method.OriginalDefinition.ToDisplayString()
            + "|" + string.Join(",", method.TypeArguments.Select(ErasedKey));
        return Members.GetOrAdd(key, _ => Resolve(method));
    }

    private static string ErasedKey(ITypeSymbol type) => Erase(type)?.FullName ?? "?";

    private static MethodBase? Resolve(IMethodSymbol method)
    {
        if (method.ContainingType is not { } containing)
            return null;
        var openType = Open(containing.OriginalDefinition);
        if (openType is null)
            return null;
        var definition = method.OriginalDefinition;
        const BindingFlags all = BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly;
        MethodBase? open = method.MethodKind == MethodKind.Constructor
            ? openType.GetConstructors(all).FirstOrDefault(c => ClrTypes.ParametersMatch(c.GetParameters(), definition))
            : openType.GetMethods(all).FirstOrDefault(m => m.Name == method.MetadataName
                && m.GetGenericArguments().Length == method.TypeArguments.Length && ClrTypes.ParametersMatch(m.GetParameters(), definition));
        if (open is null)
            return null;

        var closedType = openType.IsGenericTypeDefinition ? Close(openType, containing) : openType;
        if (closedType is null)
            return null;
        var member = closedType == openType ? open : MethodBase.GetMethodFromHandle(open.MethodHandle, closedType.TypeHandle);
        if (member is MethodInfo { IsGenericMethodDefinition: true } generic)
        {
            var arguments = new Type[method.TypeArguments.Length];
            var parameters = generic.GetGenericArguments();
            for (var i = 0; i < arguments.Length; i++)
            {
                var argument = ErasedFor(parameters[i], method.TypeArguments[i]);
                if (argument is null) return null;
                arguments[i] = argument;
            }

            try
            {
                return generic.MakeGenericMethod(arguments);
            }
            catch (ArgumentException)
            {
                return null; // a constraint the erased type does not meet
            }
        }

        return member;
    }

    /// <summary>
    /// A generic interface's member called on a library value whose interface is not the erased one (generic code of
    /// the design calls <c>IComparable&lt;T&gt;.CompareTo</c> with T = int, and an int is no <c>IComparable&lt;object&gt;</c>):
    /// the same member of the interface the value implements, when there is exactly one; else the member itself.
    /// </summary>
    public static MethodBase ForReceiver(MethodBase member, object receiver)
    {
        if (member.DeclaringType is not { IsInterface: true, IsGenericType: true } erased || erased.IsInstanceOfType(receiver))
            return member;
        var definition = erased.GetGenericTypeDefinition();
        var implemented = receiver.GetType().GetInterfaces().Where(i => i.IsGenericType && i.GetGenericTypeDefinition() == definition).ToList();
        if (implemented.Count != 1)
            return member;
        var arity = member.GetParameters().Length;
        return implemented[0].GetMethods().FirstOrDefault(m => m.Name == member.Name && m.GetParameters().Length == arity) ?? member;
    }

    private static Type? Open(INamedTypeSymbol definition)
        => ClrTypes.Resolve(definition.IsGenericType ? definition : definition) is { } resolved
            ? resolved
            : FindOpen(definition);

    private static Type? FindOpen(INamedTypeSymbol definition)
    {
        var name = ClrTypes.MetadataName(definition);
        if (string.IsNullOrEmpty(name) || name.EndsWith(".", StringComparison.Ordinal) || definition.TypeKind == TypeKind.Error)
            return null;
        return Type.GetType(name, throwOnError: false)
            ?? typeof(List<>).Assembly.GetType(name, throwOnError: false)
            ?? typeof(Enumerable).Assembly.GetType(name, throwOnError: false)
            ?? typeof(HashSet<>).Assembly.GetType(name, throwOnError: false)
            ?? typeof(SortedSet<>).Assembly.GetType(name, throwOnError: false);
    }

    /// <summary>The erased closed type for a generic library type symbol (every type argument object, unless constrained).</summary>
    private static Type? Close(Type open, INamedTypeSymbol symbol)
    {
        var parameters = open.GetGenericArguments();
        var symbolArguments = ClrTypes.AllTypeArguments(symbol);
        var arguments = new Type[parameters.Length];
        for (var i = 0; i < parameters.Length; i++)
        {
            var argument = ErasedFor(parameters[i], i < symbolArguments.Count ? symbolArguments[i] : null);
            if (argument is null) return null;
            arguments[i] = argument;
        }

        try
        {
            return open.MakeGenericType(arguments);
        }
        catch (ArgumentException)
        {
            return null;
        }
    }

    /// <summary>object for a type argument, unless the parameter needs a value type (then the real type, if known).</summary>
    private static Type? ErasedFor(Type parameter, ITypeSymbol? argument)
    {
        var needsStruct = (parameter.GenericParameterAttributes & GenericParameterAttributes.NotNullableValueTypeConstraint) != 0;
        if (!needsStruct)
            return typeof(object);
        return argument is null ? null : ClrTypes.Resolve(argument);
    }

    /// <summary>The erased run-time type of a symbol: its own type when not generic, else its generic definition over object.</summary>
    public static Type? Erase(ITypeSymbol type)
    {
        switch (type)
        {
            case IArrayTypeSymbol:
                return typeof(object[]);
            case ITypeParameterSymbol:
                return typeof(object);
            case INamedTypeSymbol { IsGenericType: true } named:
                var open = Open(named.OriginalDefinition);
                return open is null ? null : Close(open, named);
            default:
                return ClrTypes.Resolve(type);
        }
    }

}
