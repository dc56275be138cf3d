using System;
using System.Collections.Concurrent;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Finds the real run-time member (method, constructor, property accessor, operator) behind a method symbol of the
/// DSL or of an allowed library type, by name and parameter types. The mapping is cached per symbol.
/// </summary>
internal static class DslMembers
{
    private const BindingFlags All = BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly;

    private static readonly ConcurrentDictionary<string, MethodBase?> Cache = new(StringComparer.Ordinal);

    /// <summary>The reflected method or constructor, or null when there is none with that shape.</summary>
    public static MethodBase? Find(IMethodSymbol method)
    {
        // The key spells out the containing type, name, type arguments and parameter types, so overloads differ.
        var key = method.ContainingAssembly?.Identity.Name + "|" + method.ContainingType?.ToDisplayString() + "|" + method.MetadataName
            + "<" + string.Join(",", method.TypeArguments.Select(t => t.ToDisplayString())) + ">("
            + string.Join(",", method.Parameters.Select(p => p.RefKind + " " + p.Type.ToDisplayString())) + ")";
        return Cache.GetOrAdd(key, _ => Resolve(method));
    }

    private static MethodBase? Resolve(IMethodSymbol method)
    {
        var containing = method.ContainingType is { } type ? ClrTypes.Resolve(type) : null;
        if (containing is null)
            return null;

        var definition = method.IsGenericMethod ? method.OriginalDefinition : method;
        if (method.MethodKind == MethodKind.Constructor)
            return containing.GetConstructors(All).FirstOrDefault(c => ClrTypes.ParametersMatch(c.GetParameters(), definition));

        var candidates = containing.GetMethods(All).Where(m => m.Name == method.MetadataName && ClrTypes.ParametersMatch(m.GetParameters(), definition));
        var found = candidates.FirstOrDefault(m => m.GetGenericArguments().Length == method.TypeArguments.Length);
        if (found is null)
            return null;
        if (!found.IsGenericMethodDefinition)
            return found;

        var arguments = method.TypeArguments.Select(ClrTypes.Resolve).ToArray();
        return arguments.Any(a => a is null) ? null : found.MakeGenericMethod(arguments!);
    }

}
