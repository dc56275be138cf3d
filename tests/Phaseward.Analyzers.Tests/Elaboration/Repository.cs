using System;
using System.IO;

namespace Phaseward.Analyzers.Tests.Elaboration;

internal static class Repository
{
    public static string Root { get; } = Find();

    public static string PathOf(params string[] parts) => Path.Combine(Root, Path.Combine(parts));

    private static string Find()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "Lint.sln")))
                return dir.FullName;
        throw new InvalidOperationException($"Lint.sln not found above {AppContext.BaseDirectory}.");
    }
}
