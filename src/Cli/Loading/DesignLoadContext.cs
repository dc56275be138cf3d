using System;
using System.IO;
using System.Reflection;
using System.Runtime.Loader;

namespace Phaseward.Cli.Loading;

/// <summary>
/// Loads a design assembly and its dependencies from its own folder, except Phaseward itself: that resolves to the copy
/// the tool runs on, so the design's classes derive from the very <see cref="Design"/> type the tool knows (type
/// identity), and the report's figures come from the tool's rules.
/// </summary>
internal sealed class DesignLoadContext : AssemblyLoadContext
{
    private static readonly Assembly Phaseward = typeof(Design).Assembly;
    private readonly AssemblyDependencyResolver resolver;
    private readonly string directory;

    public DesignLoadContext(string assemblyPath)
        : base("phaseward-design:" + Path.GetFileName(assemblyPath), isCollectible: false)
    {
        resolver = new AssemblyDependencyResolver(assemblyPath);
        directory = Path.GetDirectoryName(assemblyPath)!;
    }

    protected override Assembly? Load(AssemblyName assemblyName)
    {
        if (string.Equals(assemblyName.Name, Phaseward.GetName().Name, StringComparison.OrdinalIgnoreCase))
            return Phaseward;
        if (resolver.ResolveAssemblyToPath(assemblyName) is { } path)
            return LoadFromAssemblyPath(path);
        // No .deps.json entry (an assembly copied on its own): look beside it; framework assemblies fall through to the default context.
        var candidate = Path.Combine(directory, assemblyName.Name + ".dll");
        return File.Exists(candidate) && !IsFrameworkAssembly(assemblyName) ? LoadFromAssemblyPath(candidate) : null;
    }

    protected override IntPtr LoadUnmanagedDll(string unmanagedDllName)
        => resolver.ResolveUnmanagedDllToPath(unmanagedDllName) is { } path ? LoadUnmanagedDllFromPath(path) : IntPtr.Zero;

    private static bool IsFrameworkAssembly(AssemblyName name)
    {
        foreach (var loaded in Default.Assemblies)
            if (string.Equals(loaded.GetName().Name, name.Name, StringComparison.OrdinalIgnoreCase))
                return true;
        return false;
    }
}
