using System;
using System.Collections.Generic;
using System.CommandLine;
using System.CommandLine.Help;
using System.IO;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Cli.Loading;
using Phaseward.Cli.Model;
using Phaseward.Cli.Output;
using Phaseward.Cli.Policy;
using Phaseward.Cli.Reproduction;

namespace Phaseward.Cli;

/// <summary>The whole command: input to reports, with its exit code.</summary>
internal static class ReportCommand
{
    public const int Clean = 0;
    public const int ErrorFindings = 1;
    public const int BadInput = 2;

    /// <summary>
    /// Parses the command line with System.CommandLine: help (-h, --help, -?) is written to <paramref name="stdout"/>
    /// (exit 0); a parse or validation error is written to <paramref name="stderr"/> (exit 2); otherwise the report runs.
    /// </summary>
    public static int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        var commandLine = new ReportCommandLine();
        var result = commandLine.Command.Parse(args);
        if (result.Action is not HelpAction && result.Errors.Count > 0)
        {
            foreach (var error in result.Errors)
                stderr.WriteLine("phaseward-report: error: " + error.Message);
            stderr.WriteLine("phaseward-report: see --help for the options");
            return BadInput;
        }

        commandLine.Command.SetAction(parsed => Run(commandLine.Read(parsed), stdout, stderr));
        return result.Invoke(new InvocationConfiguration { Output = stdout, Error = stderr });
    }

    /// <summary>The report itself, for options already parsed and checked.</summary>
    public static int Run(ReportOptions line, TextWriter stdout, TextWriter stderr)
    {
        string? tempArtifacts = null;
        string? tempDecks = null;
        try
        {
            var input = Path.GetFullPath(line.Input);
            var (assemblyPath, built) = ResolveAssembly(input, line, stderr, ref tempArtifacts);
            if (built is not null)
                stdout.WriteLine(ProjectBuilder.FindingsKeptFromFailingNote);

            var catalog = DesignCatalog.Load(assemblyPath, line.Designs);
            var elaborated = catalog.Designs.Select(d => (Design: d, Netlist: DesignRunner.Elaborate(d, assemblyPath))).ToList();
            using var sources = DesignSources.Open(assemblyPath);
            var anchors = elaborated.Select(e => DesignRunner.Anchor(e.Design, e.Netlist, sources)).ToList();

            var configuration = ReportConfiguration.None;
            if (line.UseEditorConfig)
            {
                // A project's list is the compiler's own; an assembly's is found above its sources, as the SDK finds it.
                var sourceFolders = DesignSources.FoldersOf(anchors.Select(a => a.Path)
                    .Concat(elaborated.SelectMany(e => e.Netlist.Devices.Select(d => d.Span.Path))));
                configuration = ReportConfiguration.Load(built?.AnalyzerConfigFiles ?? AnalyzerConfigFiles.Above(sourceFolders));
                // An assembly built with PathMap (as CI builds with ContinuousIntegrationBuild do) or on another machine
                // names source folders that are not here: no configuration can be found for them, which must not pass
                // for "the defaults are the policy".
                if (built is null && sourceFolders.Count > 0 && !sourceFolders.Any(Directory.Exists))
                    stderr.WriteLine($"phaseward-report: warning: the design's source folders (such as '{sourceFolders[0]}') are not on this "
                        + "machine (the assembly was built with PathMap, or elsewhere), so no .editorconfig or .globalconfig was read: "
                        + "severities and options are the defaults and the command line's. Pass the project instead of the assembly "
                        + "to read its configuration, or --no-editorconfig to use the defaults without this warning.");
            }

            var policy = new ReportPolicy(configuration, built?.Warnings);
            foreach (var (id, severity) in line.SeverityOverrides)
                policy.SetSeverity(id, severity);
            foreach (var (definition, value, option) in line.PolicyOverrides)
                policy.SetOption(definition, value, option);

            var filesWithOptionsReported = new HashSet<string>(StringComparer.Ordinal);
            var reports = elaborated.Select((e, i) => DesignRunner.Check(e.Design, e.Netlist, anchors[i], policy,
                reportOptionProblems: filesWithOptionsReported.Add(anchors[i].Path))).ToList();
            foreach (var warning in configuration.Warnings())
                stderr.WriteLine("phaseward-report: warning: " + warning);

            TextReport.Write(stdout, reports);
            foreach (var skipped in catalog.Skipped)
                stdout.WriteLine($"Skipped design {skipped.TypeName}: {skipped.Reason}.");
            var errors = reports.Sum(r => r.Findings.Count(f => f.Severity == ReportSeverity.Error));
            var total = reports.Sum(r => r.Findings.Count);
            stdout.WriteLine($"{reports.Count} design(s) checked, {total} finding(s), {errors} at error severity.");

            IReadOnlyList<ExportedDeck> decks = Array.Empty<ExportedDeck>();
            if (line.SpicePath is not null || line.Confirm)
            {
                var spice = line.SpicePath ?? (tempDecks = Path.Combine(Path.GetTempPath(), "phaseward-decks-" + Guid.NewGuid().ToString("N")));
                decks = DeckExport.Write(spice, reports, stdout);
                if (line.SpicePath is not null)
                    stdout.WriteLine($"{decks.Count} SPICE deck(s) written to {Path.GetFullPath(spice)}");
                if (line.Confirm)
                    DeckConfirmation.Run(decks, stdout);
            }

            if (line.HtmlPath is { } html)
            {
                var links = line.SpicePath is null ? null : decks;
                AtomicFile.WriteAllText(html, HtmlReport.Render(input, reports, catalog.Skipped, links, html));
                stdout.WriteLine($"HTML report written to {Path.GetFullPath(html)}");
            }

            return errors > 0 ? ErrorFindings : Clean;
        }
        catch (InputException e)
        {
            stderr.WriteLine("phaseward-report: error: " + e.Message);
            return BadInput;
        }
        finally
        {
            if (tempArtifacts is not null)
                TryDelete(tempArtifacts);
            if (tempDecks is not null)
                TryDelete(tempDecks);
        }
    }

    private static (string AssemblyPath, BuiltProject? Built) ResolveAssembly(string input, ReportOptions line, TextWriter log, ref string? tempArtifacts)
    {
        if (Directory.Exists(input))
        {
            var projects = Directory.GetFiles(input, "*.csproj");
            if (projects.Length != 1)
                throw new InputException($"'{input}' is a folder with {(projects.Length == 0 ? "no" : projects.Length.ToString(System.Globalization.CultureInfo.InvariantCulture))} .csproj files: name the design project or assembly");
            input = projects[0];
        }

        if (!File.Exists(input))
            throw new InputException($"'{input}' does not exist");
        var extension = Path.GetExtension(input).ToLowerInvariant();
        if (extension == ".dll")
            return (input, null);
        if (extension != ".csproj")
            throw new InputException($"'{input}' is not a design project (.csproj) or a built design assembly (.dll)");
        var artifacts = line.ArtifactsPath is { } given
            ? Path.GetFullPath(given)
            : tempArtifacts = Path.Combine(Path.GetTempPath(), "phaseward-report-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(artifacts);
        var built = ProjectBuilder.Build(input, artifacts, log);
        return (built.AssemblyPath, built);
    }

    private static void TryDelete(string directory)
    {
        try
        {
            if (Directory.Exists(directory)) Directory.Delete(directory, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A leftover temporary folder is harmless.
        }
    }
}
