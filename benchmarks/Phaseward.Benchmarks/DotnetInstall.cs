using System;
using System.IO;
using System.Linq;
using System.Runtime.InteropServices;

namespace Phaseward.Benchmarks;

/// <summary>Where the running .NET installation keeps its newest SDK and reference packs.</summary>
internal static class DotnetInstall
{
    /// <summary>The installation root: .../dotnet/shared/Microsoft.NETCore.App/&lt;version&gt;/ -> .../dotnet.</summary>
    public static string Root => Path.GetFullPath(Path.Combine(RuntimeEnvironment.GetRuntimeDirectory(), "..", "..", ".."));

    /// <summary>The newest SDK's directory (.../dotnet/sdk/&lt;version&gt;).</summary>
    public static string NewestSdk() => Newest(Path.Combine(Root, "sdk"), "a .NET SDK");

    /// <summary>The reference assemblies of the running runtime's major version (.../packs/Microsoft.NETCore.App.Ref/&lt;v&gt;/ref/net&lt;major&gt;.0).</summary>
    public static string ReferenceAssemblies()
    {
        var major = Environment.Version.Major;
        var pack = Newest(Path.Combine(Root, "packs", "Microsoft.NETCore.App.Ref"), "the reference pack Microsoft.NETCore.App.Ref",
            v => v.Major == major);
        var directory = Path.Combine(pack, "ref", $"net{major}.0");
        return Directory.Exists(directory) ? directory : throw new DirectoryNotFoundException($"Reference assemblies '{directory}' not found.");
    }

    private static string Newest(string parent, string what, Func<Version, bool>? accept = null)
    {
        var found = Directory.Exists(parent)
            ? Directory.GetDirectories(parent)
                .Select(d => (Directory: d, Version: Version.TryParse(Path.GetFileName(d).Split('-')[0], out var v) ? v : null))
                .Where(d => d.Version is not null && (accept is null || accept(d.Version)))
                .OrderBy(d => d.Version)
                .Select(d => d.Directory)
                .LastOrDefault()
            : null;
        return found ?? throw new InvalidOperationException($"No {what} found under '{parent}'.");
    }
}
