using System;
using System.Collections.Generic;
using System.IO;
using System.Reflection;
using System.Reflection.Metadata;
using System.Reflection.Metadata.Ecma335;
using System.Reflection.PortableExecutable;

namespace Phaseward.Cli.Loading;

/// <summary>
/// Where each design's <c>Describe</c> was written, read from the assembly's portable PDB (beside it or embedded):
/// the analyzers read a design's <c>phaseward.</c> options from that file's configuration, so the report does too.
/// </summary>
internal sealed class DesignSources : IDisposable
{
    private readonly MetadataReaderProvider? pdb;
    private readonly MetadataReader? reader;

    private DesignSources(MetadataReaderProvider? pdb)
    {
        this.pdb = pdb;
        reader = pdb?.GetMetadataReader();
    }

    /// <summary>False when the assembly has no readable portable PDB (then no <c>Describe</c> location is known).</summary>
    public bool HasSymbols => reader is not null;

    public static DesignSources Open(string assemblyPath)
    {
        try
        {
            using var stream = File.OpenRead(assemblyPath);
            using var pe = new PEReader(stream);
            return pe.TryOpenAssociatedPortablePdb(assemblyPath, path => File.Exists(path) ? File.OpenRead(path) : null, out var provider, out _)
                ? new DesignSources(provider)
                : new DesignSources(null);
        }
        catch (Exception e) when (e is BadImageFormatException or IOException or InvalidOperationException)
        {
            return new DesignSources(null);
        }
    }

    /// <summary>The file and first line of the <c>Describe</c> the design runs (its own, or the nearest base class's in the same assembly).</summary>
    public SourceSpan? DescribeOf(Type designType)
    {
        if (reader is null)
            return null;
        for (var type = designType; type is not null && type.Assembly == designType.Assembly; type = type.BaseType)
        {
            var describe = type.GetMethod("Describe", BindingFlags.Instance | BindingFlags.NonPublic | BindingFlags.Public | BindingFlags.DeclaredOnly);
            if (describe is not null && FirstLine(describe) is { } span)
                return span;
        }

        return null;
    }

    public void Dispose() => pdb?.Dispose();

    private SourceSpan? FirstLine(MethodInfo method)
    {
        try
        {
            var handle = MetadataTokens.MethodDefinitionHandle(method.MetadataToken);
            var info = reader!.GetMethodDebugInformation(handle.ToDebugInformationHandle());
            foreach (var point in info.GetSequencePoints())
            {
                if (point.IsHidden || point.Document.IsNil)
                    continue;
                var document = reader.GetDocument(point.Document);
                return new SourceSpan(reader.GetString(document.Name), point.StartLine, point.StartColumn);
            }
        }
        catch (Exception e) when (e is BadImageFormatException or ArgumentException)
        {
            // A PDB that does not match the assembly: no location.
        }

        return null;
    }

    /// <summary>The distinct folders of the given source paths.</summary>
    public static IReadOnlyList<string> FoldersOf(IEnumerable<string> paths)
    {
        var folders = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var path in paths)
            if (Path.IsPathRooted(path) && Path.GetDirectoryName(path) is { } folder)
                folders.Add(folder);
        return new List<string>(folders);
    }
}
