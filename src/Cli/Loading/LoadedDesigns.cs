using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Reflection;

namespace Phaseward.Cli.Loading;

/// <summary>A design class found in the assembly that could not be instantiated, and why.</summary>
internal sealed record SkippedDesign(string TypeName, string Reason);

/// <summary>The designs of one assembly: the instances made, and the classes skipped.</summary>
internal sealed record LoadedDesigns(string AssemblyPath, IReadOnlyList<Design> Designs, IReadOnlyList<SkippedDesign> Skipped)
{
    /// <summary>Loads <paramref name="assemblyPath"/> and instantiates each concrete <see cref="Design"/> with a public parameterless constructor.</summary>
    public static LoadedDesigns Load(string assemblyPath, IReadOnlyList<string> nameFilters)
    {
        Assembly assembly;
        try
        {
            assembly = new DesignLoadContext(assemblyPath).LoadFromAssemblyPath(assemblyPath);
        }
        catch (BadImageFormatException)
        {
            throw new InputException($"'{assemblyPath}' is not a .NET assembly");
        }
        catch (Exception e) when (e is FileLoadException or FileNotFoundException)
        {
            throw new InputException($"'{assemblyPath}' could not be loaded: {e.Message}");
        }

        var phaseward = typeof(Design).Assembly.GetName();
        var reference = assembly.GetReferencedAssemblies().FirstOrDefault(r => r.Name == phaseward.Name);
        if (reference is null && assembly.GetName().Name != phaseward.Name)
            throw new InputException($"'{assemblyPath}' does not reference Phaseward, so it holds no designs");

        Type[] types;
        try
        {
            types = assembly.GetTypes();
        }
        catch (ReflectionTypeLoadException e)
        {
            var first = e.LoaderExceptions.FirstOrDefault(x => x is not null)?.Message ?? "unknown reason";
            var version = reference?.Version is { } v && v > phaseward.Version! ? $" (it was built against Phaseward {v}, this tool runs {phaseward.Version})" : string.Empty;
            throw new InputException($"the types of '{assemblyPath}' could not be loaded{version}: {first}");
        }

        var designs = new List<Design>();
        var skipped = new List<SkippedDesign>();
        var matched = 0;
        foreach (var type in types.Where(t => typeof(Design).IsAssignableFrom(t) && t != typeof(Design)).OrderBy(t => t.FullName, StringComparer.Ordinal))
        {
            if (nameFilters.Count > 0 && !nameFilters.Any(f => Matches(type, f)))
                continue;
            matched++;
            var name = type.FullName ?? type.Name;
            if (type.IsAbstract) { skipped.Add(new SkippedDesign(name, "abstract")); continue; }
            if (type.ContainsGenericParameters) { skipped.Add(new SkippedDesign(name, "generic type definition")); continue; }
            if (!type.IsPublic && !type.IsNestedPublic) { skipped.Add(new SkippedDesign(name, "not public")); continue; }
            var constructor = type.GetConstructor(BindingFlags.Public | BindingFlags.Instance, Type.EmptyTypes);
            if (constructor is null) { skipped.Add(new SkippedDesign(name, ConstructorReason(type))); continue; }
            try
            {
                designs.Add((Design)constructor.Invoke(null));
            }
            catch (TargetInvocationException e) when (e.InnerException is not null)
            {
                throw new InputException($"design '{name}' in '{assemblyPath}' throws in its constructor: "
                    + $"{e.InnerException.GetType().Name}: {e.InnerException.Message}{Model.DesignRunner.WhereThrown(e.InnerException, assembly)}");
            }
        }

        var unmatched = nameFilters.FirstOrDefault(f => !types.Any(t => typeof(Design).IsAssignableFrom(t) && Matches(t, f)));
        if (unmatched is not null)
        {
            var available = types.Where(t => typeof(Design).IsAssignableFrom(t) && !t.IsAbstract).Select(t => t.Name).OrderBy(n => n, StringComparer.Ordinal);
            throw new InputException($"no design named '{unmatched}' in '{assemblyPath}' (designs: {string.Join(", ", available)})");
        }

        if (matched == 0)
            throw new InputException($"'{assemblyPath}' holds no class deriving from Phaseward.Design");
        return new LoadedDesigns(assemblyPath, designs, skipped);
    }

    private static bool Matches(Type type, string filter)
        => string.Equals(type.Name, filter, StringComparison.OrdinalIgnoreCase)
           || string.Equals(type.FullName, filter, StringComparison.OrdinalIgnoreCase);

    // Why a design with no public parameterless constructor is not reported, and what to do about it. The analyzers
    // elaborate it at each `new X(...)` in the source, with that call's arguments; the tool only has the assembly, and
    // choosing argument values itself would report a design nobody wrote.
    private static string ConstructorReason(Type type)
    {
        var parameters = type.GetConstructors(BindingFlags.Public | BindingFlags.Instance)
            .OrderBy(c => c.GetParameters().Length).FirstOrDefault()?.GetParameters();
        if (parameters is null)
            return "no public constructor, so the report tool cannot make one";
        var list = string.Join(", ", parameters.Select(p => p.ParameterType.Name + " " + p.Name));
        return $"its constructor takes parameters ({list}) and the report tool cannot choose their values; the analyzers check it "
            + "at each 'new " + type.Name + "(...)' in the source. To report it here, add a design with a parameterless constructor "
            + "that passes the values";
    }
}
