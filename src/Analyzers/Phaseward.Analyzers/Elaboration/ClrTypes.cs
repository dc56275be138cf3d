using System;
using System.Collections.Generic;
using System.Reflection;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>Matches Roslyn type symbols with the run-time types of the DSL assembly and the .NET library.</summary>
internal static class ClrTypes
{
    public static readonly Assembly Dsl = typeof(Design).Assembly;

    // Assembly.GetName() builds a new AssemblyName on every call; the name is asked for on every DSL call.
    private static readonly string DslName = Dsl.GetName().Name;

    /// <summary>True if the symbol is declared in the Phaseward DSL assembly.</summary>
    public static bool IsDsl(ISymbol? symbol)
        => symbol?.ContainingAssembly is { } assembly && assembly.Identity.Name == DslName;

    /// <summary>The run-time type for a symbol, when it is a DSL type or a well-known library type; else null.</summary>
    public static Type? Resolve(ITypeSymbol type)
    {
        switch (type)
        {
            case IArrayTypeSymbol array:
                var element = Resolve(array.ElementType);
                return element is null ? null : array.Rank == 1 ? element.MakeArrayType() : element.MakeArrayType(array.Rank);
            case INamedTypeSymbol named when named.IsGenericType:
                var definition = FindType(named.ContainingAssembly, MetadataName(named.OriginalDefinition));
                if (definition is null) return null;
                // A type nested in a generic type (Dictionary<K, V>.ValueCollection) takes its containing types' type arguments first.
                var typeArguments = AllTypeArguments(named);
                var arguments = new Type[typeArguments.Count];
                for (var i = 0; i < arguments.Length; i++)
                {
                    var argument = Resolve(typeArguments[i]);
                    if (argument is null) return null;
                    arguments[i] = argument;
                }

                return definition.MakeGenericType(arguments);
            case INamedTypeSymbol named:
                return FindType(named.ContainingAssembly, MetadataName(named));
            default:
                return null;
        }
    }

    /// <summary>A type's type arguments, its containing types' first (the order of the run-time type's generic arguments).</summary>
    public static List<ITypeSymbol> AllTypeArguments(INamedTypeSymbol type)
    {
        var arguments = type.ContainingType is { } containing ? AllTypeArguments(containing) : new List<ITypeSymbol>();
        arguments.AddRange(type.TypeArguments);
        return arguments;
    }

    /// <summary>Does the reflected parameter type match the symbol's type (ignoring by-ref)?</summary>
    public static bool Matches(ITypeSymbol symbol, Type type)
    {
        if (type.IsByRef) type = type.GetElementType()!;
        switch (symbol)
        {
            case IArrayTypeSymbol array:
                return type.IsArray && type.GetArrayRank() == array.Rank && Matches(array.ElementType, type.GetElementType()!);
            case ITypeParameterSymbol parameter:
                return type.IsGenericParameter && type.Name == parameter.Name;
            case INamedTypeSymbol named when named.IsGenericType:
                if (!type.IsGenericType || type.GetGenericTypeDefinition().FullName != MetadataName(named.OriginalDefinition))
                    return false;
                var arguments = type.GetGenericArguments();
                if (arguments.Length != named.TypeArguments.Length) return false;
                for (var i = 0; i < arguments.Length; i++)
                    if (!Matches(named.TypeArguments[i], arguments[i]))
                        return false;
                return true;
            case INamedTypeSymbol named:
                return type.FullName == MetadataName(named);
            default:
                return false;
        }
    }

    /// <summary>"Namespace.Outer+Inner`1", as reflection spells it.</summary>
    public static string MetadataName(INamedTypeSymbol type)
    {
        if (type.ContainingType is { } outer)
            return MetadataName(outer) + "+" + type.MetadataName;
        var ns = type.ContainingNamespace;
        return ns is null || ns.IsGlobalNamespace ? type.MetadataName : ns.ToDisplayString() + "." + type.MetadataName;
    }

    private static Type? FindType(IAssemblySymbol? assembly, string name)
    {
        if (assembly is not null && assembly.Identity.Name == DslName)
            return Dsl.GetType(name, throwOnError: false);
        // Library types: System.Private.CoreLib / netstandard forwarders resolve by name. (Code that does not compile
        // yet can name a type with no name at all.)
        if (string.IsNullOrEmpty(name) || name.StartsWith(".", StringComparison.Ordinal) || name.EndsWith(".", StringComparison.Ordinal))
            return null;
        return Type.GetType(name, throwOnError: false)
            ?? typeof(System.Collections.Generic.List<>).Assembly.GetType(name, throwOnError: false);
    }

    /// <summary>Does a run-time member take exactly the parameter types of the method symbol?</summary>
    public static bool ParametersMatch(ParameterInfo[] parameters, IMethodSymbol method)
    {
        if (parameters.Length != method.Parameters.Length)
            return false;
        for (var i = 0; i < parameters.Length; i++)
            if (!ClrTypes.Matches(method.Parameters[i].Type, parameters[i].ParameterType))
                return false;
        return true;
    }
}
