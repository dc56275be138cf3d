using System.Collections.Generic;
using System.IO;

namespace Phaseward.Cli.Policy;

/// <summary>Finds the analyzer config files of sources that have no project to ask (a design assembly given directly).</summary>
internal static class AnalyzerConfigFiles
{
    /// <summary>
    /// As the SDK discovers them for a project's sources: <c>.editorconfig</c> and <c>.globalconfig</c> in every folder
    /// above each source folder, nearest first (the compiler itself stops at <c>root = true</c> and orders them).
    /// </summary>
    public static IReadOnlyList<string> Above(IEnumerable<string> sourceFolders)
    {
        var found = new List<string>();
        var seen = new HashSet<string>();
        foreach (var folder in sourceFolders)
        {
            for (var dir = new DirectoryInfo(folder); dir is not null; dir = dir.Parent)
            {
                foreach (var name in new[] { ".editorconfig", ".globalconfig" })
                {
                    var path = Path.Combine(dir.FullName, name);
                    if (seen.Add(path) && File.Exists(path))
                        found.Add(path);
                }
            }
        }

        return found;
    }
}
