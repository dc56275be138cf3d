using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.IO;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace Phaseward.Benchmarks;

/// <summary>
/// Reference (b): the .NET SDK's built-in code analyzers (Microsoft.CodeAnalysis.NetAnalyzers and its C# part), loaded
/// from the installed SDK, with every rule they support switched on as a warning (the widest setting, like
/// AnalysisMode=All with every rule raised to warning).
/// </summary>
internal static class SdkAnalyzers
{
    public static string DefaultDirectory() => Path.Combine(DotnetInstall.NewestSdk(), "Sdks", "Microsoft.NET.Sdk", "analyzers");

    public static ImmutableArray<DiagnosticAnalyzer> Load(string directory)
    {
        var files = new[] { "Microsoft.CodeAnalysis.NetAnalyzers.dll", "Microsoft.CodeAnalysis.CSharp.NetAnalyzers.dll" }
            .Select(f => Path.Combine(directory, f)).ToList();
        foreach (var file in files)
            if (!File.Exists(file))
                throw new FileNotFoundException($"SDK analyzer assembly '{file}' not found; pass --sdk-analyzers <directory>.", file);
        var loader = new Loader();
        foreach (var file in files)
            loader.AddDependencyLocation(file);
        var analyzers = files.SelectMany(f => new AnalyzerFileReference(f, loader).GetAnalyzers(LanguageNames.CSharp)).ToImmutableArray();
        if (analyzers.IsEmpty)
            throw new InvalidOperationException($"No C# analyzers found in '{directory}'.");
        return analyzers;
    }

    /// <summary>Every diagnostic the analyzers support, raised to warning.</summary>
    public static ImmutableDictionary<string, ReportDiagnostic> AllAsWarnings(IEnumerable<DiagnosticAnalyzer> analyzers)
        => analyzers.SelectMany(a => a.SupportedDiagnostics).Select(d => d.Id).Distinct()
            .ToImmutableDictionary(id => id, _ => ReportDiagnostic.Warn);

    private sealed class Loader : IAnalyzerAssemblyLoader
    {
        private readonly Dictionary<string, Assembly> loaded = new(StringComparer.OrdinalIgnoreCase);

        public void AddDependencyLocation(string fullPath)
        {
        }

        public Assembly LoadFromPath(string fullPath)
        {
            lock (loaded)
            {
                if (!loaded.TryGetValue(fullPath, out var assembly))
                    loaded[fullPath] = assembly = Assembly.LoadFrom(fullPath);
                return assembly;
            }
        }
    }
}
