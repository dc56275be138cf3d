using System;
using System.Collections.Generic;
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

    public static int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr)
    {
        string? tempArtifacts = null;
        string? tempDecks = null;
        try
        {
            var line = CommandLine.Parse(args);
            if (line.Help)
            {
                stdout.WriteLine(CommandLine.Usage);
                return Clean;
            }

            var input = Path.GetFullPath(line.Input!);
            var assemblyPath = ResolveAssembly(input, line, stderr, ref tempArtifacts);

            var severities = new SeverityPolicy();
            var policy = new PolicyValues();
            if (line.UseEditorConfig)
            {
                // Farthest file first, so that nearer files win; within a file, later sections win.
                foreach (var file in EditorConfig.FilesAbove(Path.GetDirectoryName(input)!).Reverse())
                {
                    var keys = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
                    foreach (var (key, value) in EditorConfig.Parse(File.ReadAllLines(file)))
                        keys[key] = value;
                    severities.Apply(keys, file);
                    foreach (var (key, value) in keys)
                        policy.TrySet(key, value, $"'{key}' in {file}");
                }
            }

            foreach (var (ids, severity) in line.SeverityOverrides)
                foreach (var id in ids.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
                {
                    if (id == "*")
                        foreach (var rule in RuleCatalog.All) severities.Set(rule.Id, severity, "command line");
                    else
                        severities.Set(id, severity, "command line");
                }

            foreach (var (key, value, option) in line.PolicyOverrides)
                policy.TrySet(key, value, $"option {option}");

            RulePolicy rulePolicy;
            try
            {
                rulePolicy = policy.ToRulePolicy();
            }
            catch (ArgumentException e)
            {
                throw new InputException(e.Message);
            }

            var catalog = DesignCatalog.Load(assemblyPath, line.Designs);
            var reports = catalog.Designs.Select(d => DesignRunner.Run(d, assemblyPath, rulePolicy, severities)).ToList();

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

    private static string ResolveAssembly(string input, CommandLine line, TextWriter log, ref string? tempArtifacts)
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
            return input;
        if (extension != ".csproj")
            throw new InputException($"'{input}' is not a design project (.csproj) or a built design assembly (.dll)");
        var artifacts = line.ArtifactsPath is { } given
            ? Path.GetFullPath(given)
            : tempArtifacts = Path.Combine(Path.GetTempPath(), "phaseward-report-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(artifacts);
        return ProjectBuilder.Build(input, artifacts, log);
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
