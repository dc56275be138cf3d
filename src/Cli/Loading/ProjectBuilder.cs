using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.IO;
using System.Linq;
using System.Security;
using System.Text;
using System.Text.Json;
using Phaseward.Checking;
using Phaseward.Cli.Policy;

namespace Phaseward.Cli.Loading;

/// <summary>A built design project: its assembly, the analyzer config files its compiler read, its warning switches.</summary>
internal sealed record BuiltProject(string AssemblyPath, IReadOnlyList<string> AnalyzerConfigFiles, BuildWarningOptions Warnings);

/// <summary>
/// Builds a design project with <c>dotnet build</c> into an artifacts folder of its own, so that Phaseward's own
/// diagnostics cannot stop the build (the report is there to show them), and asks MSBuild what the compiler was given.
/// </summary>
internal static class ProjectBuilder
{
    public static readonly TimeSpan Timeout = TimeSpan.FromMinutes(10);

    /// <summary>What the report prints about the build, so that nobody mistakes its success for a clean build.</summary>
    public const string FindingsKeptFromFailingNote =
        "Phaseward's own diagnostics (PW*) were kept from failing this build (added to NoWarn for the report's build only); "
        + "the findings below carry the severities the project's own build gives them.";

    /// <summary>
    /// Builds <paramref name="project"/> (Debug, so that run-time source lines come with it) with every Phaseward rule in
    /// NoWarn, through a targets file MSBuild imports after the project's own settings (the project's NoWarn is kept, and
    /// so is a CustomAfterMicrosoftCommonTargets file of the project's, imported from it).
    /// The user's compile errors still fail it: an input error listing them.
    /// </summary>
    public static BuiltProject Build(string project, string artifactsPath, TextWriter log)
    {
        log.WriteLine($"Building {project} ...");
        var common = $"\"{project}\" -nologo -p:Configuration=Debug -p:UseArtifactsOutput=true \"-p:ArtifactsPath={artifactsPath}\"";
        var keepGoing = Path.Combine(artifactsPath, "phaseward-report.targets");
        // The file goes in through CustomAfterMicrosoftCommonTargets, a global property that replaces the project's own
        // value: a targets file the project (or its Directory.Build.props) puts there is imported from ours, first.
        var (userExit, userQuery) = Run($"msbuild {common} -getProperty:CustomAfterMicrosoftCommonTargets", Path.GetDirectoryName(project)!);
        var userTargets = userExit == 0
            ? userQuery.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).LastOrDefault() ?? string.Empty
            : string.Empty;
        if (userTargets.Length > 0)
            userTargets = Path.GetFullPath(userTargets, Path.GetDirectoryName(project)!);
        var chained = userTargets.Length == 0 ? string.Empty
            : $"<Import Project=\"{SecurityElement.Escape(userTargets)}\" Condition=\"Exists('{SecurityElement.Escape(userTargets)}')\" />";
        File.WriteAllText(keepGoing, $"""
            <Project>
              <!-- Written by phaseward-report for its own build of the design: Phaseward's findings must not stop it. -->
              {chained}
              <PropertyGroup>
                <NoWarn>$(NoWarn);{string.Join(";", RuleCatalog.All.Select(r => r.Id))}</NoWarn>
              </PropertyGroup>
            </Project>
            """);
        var (exitCode, output) = Run($"build {common} \"-p:CustomAfterMicrosoftCommonTargets={keepGoing}\"", Path.GetDirectoryName(project)!);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (exitCode != 0)
        {
            var errors = lines.Where(l => l.Contains(": error ", StringComparison.Ordinal)).Distinct().Take(10).ToList();
            var detail = errors.Count > 0 ? string.Join(Environment.NewLine, errors.Select(e => "  " + e)) : Indent(Tail(lines, 15));
            throw new InputException($"project '{project}' failed to build (dotnet build exit code {exitCode}); "
                + $"its own errors, not Phaseward's findings, stop it:{Environment.NewLine}{detail}");
        }

        // Then ask MSBuild (evaluation only: quick) where the assembly went and what the compiler was given.
        var (queryExit, query) = Run($"msbuild {common} -getProperty:TargetPath -getProperty:TreatWarningsAsErrors -getProperty:NoWarn "
            + "-getProperty:WarningsAsErrors -getProperty:WarningsNotAsErrors -getItem:EditorConfigFiles", Path.GetDirectoryName(project)!);
        var evaluation = queryExit == 0 ? ParseEvaluation(query) : null;
        var targetPath = evaluation?.Property("TargetPath");
        if (evaluation is null || targetPath is null || !File.Exists(targetPath))
            throw new InputException($"project '{project}' built, but its assembly was not found (TargetPath '{targetPath ?? "(none)"}'); "
                + "projects that target several frameworks are not supported: build one and pass its .dll");
        var warnings = new BuildWarningOptions(
            string.Equals(evaluation.Property("TreatWarningsAsErrors"), "true", StringComparison.OrdinalIgnoreCase),
            evaluation.Property("NoWarn"), evaluation.Property("WarningsAsErrors"), evaluation.Property("WarningsNotAsErrors"));
        return new BuiltProject(targetPath, evaluation.Items("EditorConfigFiles"), warnings);
    }

    /// <summary>The JSON MSBuild prints for -getProperty/-getItem (several of them).</summary>
    private static Evaluation? ParseEvaluation(string output)
    {
        var start = output.IndexOf('{');
        if (start < 0) return null;
        try
        {
            return new Evaluation(JsonDocument.Parse(output[start..]).RootElement.Clone());
        }
        catch (JsonException)
        {
            return null;
        }
    }

    private sealed record Evaluation(JsonElement Root)
    {
        public string? Property(string name)
            => Root.TryGetProperty("Properties", out var properties) && properties.TryGetProperty(name, out var value) && value.GetString() is { Length: > 0 } text
                ? text
                : null;

        public IReadOnlyList<string> Items(string type)
            => Root.TryGetProperty("Items", out var items) && items.TryGetProperty(type, out var list)
                ? list.EnumerateArray().Select(i => i.TryGetProperty("FullPath", out var full) ? full.GetString() : i.GetProperty("Identity").GetString())
                    .OfType<string>().ToList()
                : Array.Empty<string>();
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
