using System;
using System.Diagnostics;
using System.IO;
using System.Linq;
using System.Text;

namespace Phaseward.Cli.Loading;

/// <summary>Builds a design project with <c>dotnet build</c> into an artifacts folder of its own and returns the built assembly.</summary>
internal static class ProjectBuilder
{
    public static readonly TimeSpan Timeout = TimeSpan.FromMinutes(10);

    /// <summary>Builds <paramref name="project"/> (Debug, so that run-time source lines come with it) and returns its assembly's path.</summary>
    public static string Build(string project, string artifactsPath, TextWriter log)
    {
        log.WriteLine($"Building {project} ...");
        var common = $"\"{project}\" -nologo -p:Configuration=Debug -p:UseArtifactsOutput=true \"-p:ArtifactsPath={artifactsPath}\"";
        var (exitCode, output) = Run($"build {common}", Path.GetDirectoryName(project)!);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (exitCode != 0)
        {
            var errors = lines.Where(l => l.Contains(": error ", StringComparison.Ordinal)).Distinct().Take(10).ToList();
            var detail = errors.Count > 0 ? string.Join(Environment.NewLine, errors.Select(e => "  " + e)) : Indent(Tail(lines, 15));
            throw new InputException($"project '{project}' failed to build (dotnet build exit code {exitCode}):{Environment.NewLine}{detail}");
        }

        // Then ask MSBuild where the assembly went (evaluation only: quick).
        var (queryExit, query) = Run($"msbuild {common} -getProperty:TargetPath", Path.GetDirectoryName(project)!);
        var targetPath = queryExit != 0 ? null : query.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .LastOrDefault(l => l.EndsWith(".dll", StringComparison.OrdinalIgnoreCase) && Path.IsPathRooted(l));
        if (targetPath is null || !File.Exists(targetPath))
            throw new InputException($"project '{project}' built, but its assembly was not found (TargetPath '{targetPath ?? "(none)"}'); "
                + "projects that target several frameworks are not supported: build one and pass its .dll");
        return targetPath;
    }

    private static (int ExitCode, string Output) Run(string arguments, string workingDirectory)
    {
        var start = new ProcessStartInfo("dotnet", arguments)
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        // A host's own MSBuild settings (a test runner's) must not leak into the child build.
        start.Environment.Remove("MSBuildExtensionsPath");
        start.Environment.Remove("MSBuildSDKsPath");
        start.Environment.Remove("MSBUILD_EXE_PATH");
        var output = new StringBuilder();
        using var process = new System.Diagnostics.Process { StartInfo = start };
        process.OutputDataReceived += (_, e) => { if (e.Data is not null) lock (output) output.AppendLine(e.Data); };
        process.ErrorDataReceived += (_, e) => { if (e.Data is not null) lock (output) output.AppendLine(e.Data); };
        try
        {
            process.Start();
        }
        catch (Exception e) when (e is System.ComponentModel.Win32Exception or InvalidOperationException)
        {
            throw new InputException($"could not start 'dotnet' to build the project: {e.Message}");
        }

        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        if (!process.WaitForExit((int)Timeout.TotalMilliseconds))
        {
            process.Kill(entireProcessTree: true);
            throw new InputException($"'dotnet {arguments}' did not finish within {Timeout.TotalMinutes} minutes");
        }

        process.WaitForExit();
        lock (output) return (process.ExitCode, output.ToString());
    }

    private static string[] Tail(string[] lines, int count) => lines.Skip(Math.Max(0, lines.Length - count)).ToArray();

    private static string Indent(string[] lines) => string.Join(Environment.NewLine, lines.Select(l => "  " + l));
}
