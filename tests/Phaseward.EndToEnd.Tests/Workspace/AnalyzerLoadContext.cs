using System.Collections.Concurrent;
using System.IO;
using System.Reflection;
using System.Runtime.Loader;
using Microsoft.CodeAnalysis;

namespace Phaseward.EndToEnd.Tests.Workspace;

/// <summary>
/// Loads the analyzer assemblies of one folder (the package's analyzers/dotnet/cs) in their own load context, as an
/// editor's host does: the folder's assemblies (Phaseward.Analyzers, Phaseward.CodeFixes and their copy of
/// Phaseward.dll) come from the folder, Roslyn and the runtime from the host.
/// </summary>
internal sealed class AnalyzerLoadContext : AssemblyLoadContext, IAnalyzerAssemblyLoader
{
    private readonly string directory;
    private readonly ConcurrentDictionary<string, Assembly> loaded = new(System.StringComparer.OrdinalIgnoreCase);

    public AnalyzerLoadContext(string directory)
        : base("phaseward-analyzers:" + directory)
    {
        this.directory = directory;
    }

    public void AddDependencyLocation(string fullPath)
    {
        // Every dependency the package needs sits in the same folder, which Load looks in.
    }

    public Assembly LoadFromPath(string fullPath)
        => loaded.GetOrAdd(AssemblyName.GetAssemblyName(fullPath).Name!, _ => LoadFromAssemblyPath(fullPath));

    protected override Assembly? Load(AssemblyName assemblyName)
    {
        var candidate = Path.Combine(directory, assemblyName.Name + ".dll");
        return File.Exists(candidate) ? LoadFromPath(candidate) : null; // null: the host's copy (Roslyn, the runtime)
    }
}
