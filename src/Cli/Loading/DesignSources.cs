using System;
using System.Collections.Generic;
using System.IO;
using System.Reflection;
using System.Reflection.Metadata;
using System.Reflection.Metadata.Ecma335;
using System.Reflection.PortableExecutable;
using Phaseward.Netlists;

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
                var path = reader.GetString(reader.GetDocument(point.Document).Name);
                return new SourceSpan(path, NameLine(path, point.StartLine, method.Name), 0);
            }
        }
        catch (Exception e) when (e is BadImageFormatException or ArgumentException)
        {
            // A PDB that does not match the assembly: no location.
        }

        return null;
    }

    /// <summary>
    /// The line of the method's name, where the analyzers put a design's own diagnostics: the first sequence point is
    /// the body's opening brace or expression, at most a few lines below it (the source is read when it is there).
    /// </summary>
    private static int NameLine(string path, int bodyLine, string name)
    {
        try
        {
            if (!File.Exists(path))
                return bodyLine;
            var lines = File.ReadAllLines(path);
            for (var line = Math.Min(bodyLine, lines.Length); line >= Math.Max(1, bodyLine - 4); line--)
                if (lines[line - 1].Contains(name + "(", StringComparison.Ordinal))
                    return line;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
        }

        return bodyLine;
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
