using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.IO;
using System.Text;

namespace Phaseward.EndToEnd.Tests;

/// <summary>Runs the dotnet CLI as a user would, with a bound on how long it may take.</summary>
internal static class DotnetCli
{
    public static string RepositoryRoot { get; } = FindRepositoryRoot();

    public static (int ExitCode, string Output) Run(string arguments, string workingDirectory, TimeSpan timeout)
        => Run(arguments, workingDirectory, timeout, environment: null);

    /// <summary>As <see cref="Run(string, string, TimeSpan)"/>, with environment variables set (or removed, when null).</summary>
    public static (int ExitCode, string Output) Run(string arguments, string workingDirectory, TimeSpan timeout, IReadOnlyDictionary<string, string?>? environment)
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
        // The test host's own MSBuild settings must not leak into the child build.
        start.Environment.Remove("MSBuildExtensionsPath");
        start.Environment.Remove("MSBuildSDKsPath");
        start.Environment.Remove("MSBUILD_EXE_PATH");
        foreach (var (name, value) in environment ?? new Dictionary<string, string?>())
        {
            if (value is null) start.Environment.Remove(name);
            else start.Environment[name] = value;
        }

        var output = new StringBuilder();
        using var process = new System.Diagnostics.Process { StartInfo = start };
        process.OutputDataReceived += (_, e) => { if (e.Data is not null) lock (output) output.AppendLine(e.Data); };
        process.ErrorDataReceived += (_, e) => { if (e.Data is not null) lock (output) output.AppendLine(e.Data); };
        process.Start();
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        if (!process.WaitForExit((int)timeout.TotalMilliseconds))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"'dotnet {arguments}' did not finish within {timeout}. Output so far:\n{output}");
        }

        process.WaitForExit();
        return (process.ExitCode, output.ToString());
    }

    public static string NewTempDirectory()
    {
        var path = Path.Combine(Path.GetTempPath(), "phaseward-e2e-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(path);
        return path;
    }

    private static string FindRepositoryRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "Lint.sln")))
                return dir.FullName;
        throw new InvalidOperationException($"Lint.sln not found above {AppContext.BaseDirectory}.");
    }
}
