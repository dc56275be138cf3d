using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using System.Xml.Linq;

namespace Phaseward.EndToEnd.Tests.Packaging;

/// <summary>
/// Shared by every test of the collection: packs the one <c>Phaseward</c> package into a temporary folder feed, and
/// creates and restores one fresh design project (outside the repository) that references it, as a user would.
/// Packages restore into a temporary packages folder from the local feed plus the package sources configured on the
/// machine. Nothing is written under the repository.
/// </summary>
public sealed class PackagedPhaseward : IDisposable
{
    private static readonly TimeSpan BuildTimeout = TimeSpan.FromMinutes(5);
    private readonly Lazy<BuildResult> baseline;

    public PackagedPhaseward()
    {
        Root = DotnetCli.NewTempDirectory();
        Feed = Path.Combine(Root, "feed");
        PackagesFolder = Path.Combine(Root, "packages");

        var clock = System.Diagnostics.Stopwatch.StartNew();
        var package = Path.Combine(DotnetCli.RepositoryRoot, "src", "Package", "Phaseward.Package.csproj");
        var (exitCode, output) = DotnetCli.Run(
            $"pack \"{package}\" -c Release -o \"{Feed}\" --artifacts-path \"{Path.Combine(Root, "pack-artifacts")}\" -nodeReuse:false",
            DotnetCli.RepositoryRoot, BuildTimeout);
        if (exitCode != 0) throw new InvalidOperationException("dotnet pack failed:\n" + output);
        var nupkg = Directory.GetFiles(Feed, "Phaseward.*.nupkg").Single();
        PackageVersion = Path.GetFileNameWithoutExtension(nupkg).Substring("Phaseward.".Length);
        PackDuration = clock.Elapsed;
        clock.Restart();

        // The temp root isolates the design project from whatever lies above /tmp: its own NuGet.config (local feed added
        // to the machine's sources, temporary packages folder), empty Directory.Build.* and a root .editorconfig.
        File.WriteAllText(Path.Combine(Root, "NuGet.config"), $"""
            <?xml version="1.0" encoding="utf-8"?>
            <configuration>
              <config>
                <add key="globalPackagesFolder" value="{PackagesFolder}" />
              </config>
              <packageSources>
                <add key="phaseward-local" value="{Feed}" />
              </packageSources>
            </configuration>
            """);
        File.WriteAllText(Path.Combine(Root, "Directory.Build.props"), "<Project />\n");
        File.WriteAllText(Path.Combine(Root, "Directory.Build.targets"), "<Project />\n");
        File.WriteAllText(Path.Combine(Root, ".editorconfig"), "root = true\n");

        DesignProject = CreateDesignProject("design");
        (exitCode, output) = Dotnet($"restore \"{DesignProject}\"", DesignProject);
        if (exitCode != 0) throw new InvalidOperationException("dotnet restore of the design project failed:\n" + output);
        RestoreDuration = clock.Elapsed;

        baseline = new Lazy<BuildResult>(() => Build(DesignProject, "baseline"));
    }

    public string Root { get; }

    /// <summary>How long packing and the first restore took (printed by a test: most of the collection's time).</summary>
    public TimeSpan PackDuration { get; }

    public TimeSpan RestoreDuration { get; }

    public string Feed { get; }

    public string PackagesFolder { get; }

    public string PackageVersion { get; }

    /// <summary>The restored design project shared by the tests that do not change its files.</summary>
    public string DesignProject { get; }

    /// <summary>Where the restored package put the analyzers, code fixes and their copy of Phaseward.dll.</summary>
    public string AnalyzerDirectory => Path.Combine(PackagesFolder, "phaseward", PackageVersion.ToLowerInvariant(), "analyzers", "dotnet", "cs");

    /// <summary>The library a design compiles against, as the package delivers it.</summary>
    public string LibraryPath => Path.Combine(PackagesFolder, "phaseward", PackageVersion.ToLowerInvariant(), "lib", "netstandard2.0", "Phaseward.dll");

    /// <summary>The build of the unchanged design project (with its SARIF log), made once.</summary>
    public BuildResult Baseline => baseline.Value;

    /// <summary>A new design project next to the shared one (a copy of its sources and project file, not of obj/).</summary>
    public string CreateDesignProject(string name)
    {
        var directory = Path.Combine(Root, name);
        Directory.CreateDirectory(directory);
        new XDocument(
            new XElement("Project", new XAttribute("Sdk", "Microsoft.NET.Sdk"),
                new XElement("PropertyGroup",
                    new XElement("TargetFramework", "net10.0"),
                    new XElement("Nullable", "enable")),
                new XElement("ItemGroup",
                    new XElement("PackageReference", new XAttribute("Include", "Phaseward"), new XAttribute("Version", PackageVersion)))))
            .Save(Path.Combine(directory, "Frostline.csproj"));
        foreach (var design in FrostlineDesigns.All)
            File.WriteAllText(Path.Combine(directory, design.FileName), design.Source);
        return directory;
    }

    /// <summary>
    /// Builds a design project (restoring it first if needed), with a SARIF 2.1 error log. Never incremental: a build
    /// that only changes a property (such as -warnaserror) would otherwise skip the compiler and report nothing.
    /// </summary>
    public BuildResult Build(string projectDirectory, string label, string extraArguments = "")
    {
        var sarif = Path.Combine(Root, $"{label}-{Guid.NewGuid():N}.sarif");
        var (exitCode, output) = Dotnet(
            $"build \"{projectDirectory}\" --no-incremental -nodeReuse:false -p:ErrorLog=\"{sarif}%2Cversion=2.1\" {extraArguments}", projectDirectory);
        return new BuildResult(exitCode, output, sarif);
    }

    /// <summary>
    /// Runs phaseward-report (the tool's assembly beside the tests) on a design project, as a user would: it builds the
    /// project itself, restoring from the same feed and packages folder.
    /// </summary>
    public (int ExitCode, string Output) Report(string projectDirectory, string extraArguments = "")
    {
        var tool = Path.Combine(AppContext.BaseDirectory, "Phaseward.Cli.dll");
        var project = Directory.GetFiles(projectDirectory, "*.csproj").Single();
        return Dotnet($"\"{tool}\" \"{project}\" {extraArguments}", projectDirectory);
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Root, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A language server may still hold a file for a moment; the folder is in the temp directory either way.
        }
    }

    private (int ExitCode, string Output) Dotnet(string arguments, string workingDirectory)
        => DotnetCli.Run(arguments, workingDirectory, BuildTimeout,
            new Dictionary<string, string?> { ["NUGET_PACKAGES"] = PackagesFolder });
}

[CollectionDefinition(Name)]
public sealed class PackagedPhasewardCollection : ICollectionFixture<PackagedPhaseward>
{
    public const string Name = "Packaged Phaseward";
}

/// <summary>What one <c>dotnet build</c> did: its exit code, its console output and the path of its SARIF log.</summary>
public sealed record BuildResult(int ExitCode, string Output, string SarifPath)
{
    // file(line,col): warning PW1001: message (help link) [project]
    private static readonly Regex CompilerMessage = new(
        @"^[ \t]*(?<file>[^\s(][^(\r\n]*)\((?<line>\d+),(?<column>\d+)\): (?<severity>warning|error|info) (?<id>PW\d{4}): (?<message>.*?)(?: \((?<help>https?://[^)\s]+)\))?(?: \[[^\]\r\n]+\])?[ \t\r]*$",
        RegexOptions.Multiline);

    /// <summary>Phaseward's messages in the console output, each once (MSBuild repeats them in its summary).</summary>
    public IReadOnlyList<CompilerMessageLine> PhasewardMessages => CompilerMessage.Matches(Output)
        .Select(m => new CompilerMessageLine(m.Groups["file"].Value.Trim(), int.Parse(m.Groups["line"].Value, System.Globalization.CultureInfo.InvariantCulture),
            int.Parse(m.Groups["column"].Value, System.Globalization.CultureInfo.InvariantCulture), m.Groups["severity"].Value, m.Groups["id"].Value,
            m.Groups["message"].Value, m.Groups["help"].Value))
        .Distinct()
        .ToList();
}

/// <summary>One <c>file(line,col): severity id: message (help)</c> line of a build.</summary>
public sealed record CompilerMessageLine(string File, int Line, int Column, string Severity, string Id, string Message, string HelpLink);
