using System;
using System.Collections.Generic;
using System.CommandLine;
using System.CommandLine.Help;
using System.CommandLine.Parsing;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Cli.Policy;
using Phaseward.Configuration;

namespace Phaseward.Cli;

/// <summary>
/// The command line of phaseward-report, declared for System.CommandLine: it writes the help (-h, --help, -?), reads
/// response files (<c>@file</c>), and checks every value (rule IDs, the <c>phaseward.</c> thresholds through their one
/// definition) before anything is built.
/// </summary>
internal sealed class ReportCommandLine
{
    private const string Description = """
        Builds the project (or loads the assembly), checks every design in it (each concrete Phaseward.Design with a public
        parameterless constructor) and prints the findings, the latch and register timing, the checked paths, the pass-gate
        chains and the storage nodes. Figures are first-order estimates.

        Configuration is read as the compiler reads it: the project's .editorconfig and .globalconfig files (for a .dll,
        those above its sources), asked per source file; severities from dotnet_diagnostic.PWxxxx.severity (and the bulk
        dotnet_analyzer_diagnostic keys), then the project's NoWarn / WarningsAsErrors / TreatWarningsAsErrors, then the
        options below. A project is built with Phaseward's own diagnostics kept from failing the build, so that the report
        can show them. Arguments can also come from a response file: phaseward-report @args.rsp

        Exit code: 0 no error-severity findings, 1 findings at error severity, 2 bad input or options (the message names them).
        """;

    private readonly Argument<string> input = new("input")
    {
        Description = "The design project (.csproj, or a folder holding one) or a built design assembly (.dll)",
        HelpName = "design.csproj | design.dll",
    };

    private readonly Option<string?> html = new("--html") { Description = "Also write a self-contained HTML page with a timing diagram per root clock", HelpName = "path" };

    private readonly Option<string?> spice = new("--spice")
    {
        Description = "Also write a SPICE deck per finding that reproduces it, <dir>/<Design>/<RuleId>-<n>.cir (first-order switch-level decks for ngspice)",
        HelpName = "dir",
    };

    private readonly Option<bool> confirm = new("--confirm")
    {
        Description = "Run every deck in ngspice (on the PATH) and print each estimate beside the simulated value; without --spice the decks go to a temporary folder",
    };

    private readonly Option<string[]> design = new("--design") { Description = "Only this design (class name or full name); may be repeated", HelpName = "name" };

    private readonly Option<bool> noEditorConfig = new("--no-editorconfig") { Description = "Ignore the analyzer config files (.editorconfig, .globalconfig)" };

    private readonly Option<string?> artifacts = new("--artifacts") { Description = "Where a project is built (default: a new temporary folder, deleted afterwards)", HelpName = "dir" };

    private readonly List<(Option<string[]> Option, ReportSeverity Severity)> severities = [];

    private readonly List<(Option<string?> Option, PhasewardOption Definition)> thresholds = [];

    public ReportCommandLine()
    {
        // Named as installed (the tool's command name), whatever the host process is called.
        Command = new Command("phaseward-report", Description) { input, html, spice, confirm, design, new HelpOption(), new VersionOption() };
        AddSeverity("--error", ReportSeverity.Error, "Report these rules (comma-separated PWxxxx, or * for all) as errors");
        AddSeverity("--warning", ReportSeverity.Warning, "Likewise, as warnings");
        AddSeverity("--info", ReportSeverity.Info, "Likewise, as info");
        AddSeverity("--none", ReportSeverity.None, "Likewise: leave these rules' findings out");
        AddThreshold("--max-series-pass-gates", OptionCatalog.MaxSeriesPassGates, "n", "PW2001 limit");
        AddThreshold("--min-race-margin", OptionCatalog.MinimumRaceMargin, "time", "PW1002 threshold, e.g. 20ps");
        AddThreshold("--min-timing-slack", OptionCatalog.MinimumTimingSlack, "time", "PW4001-PW4004 threshold, e.g. 0.1ns");
        Command.Options.Add(noEditorConfig);
        Command.Options.Add(artifacts);
    }

    public Command Command { get; }

    /// <summary>The options of a parse without errors.</summary>
    public ReportOptions Read(ParseResult result) => new()
    {
        Input = result.GetValue(input)!,
        HtmlPath = result.GetValue(html),
        SpicePath = result.GetValue(spice),
        Confirm = result.GetValue(confirm),
        Designs = result.GetValue(design) ?? [],
        SeverityOverrides = SeveritiesInOrder(result),
        PolicyOverrides = thresholds.Where(t => result.GetResult(t.Option) is { Implicit: false })
            .Select(t => (t.Definition, result.GetValue(t.Option)!, t.Option.Name)).ToList(),
        UseEditorConfig = !result.GetValue(noEditorConfig),
        ArtifactsPath = result.GetValue(artifacts),
    };

    private void AddSeverity(string name, ReportSeverity severity, string description)
    {
        var option = new Option<string[]>(name) { Description = description, HelpName = "IDs" };
        option.Validators.Add(result =>
        {
            foreach (var id in result.Tokens.SelectMany(t => Ids(t.Value)))
                if (id != "*" && RuleCatalog.Find(id.ToUpperInvariant()) is null)
                    result.AddError($"unknown rule ID '{id}' in {name} (known: {string.Join(", ", RuleCatalog.All.Select(r => r.Id))})");
        });
        severities.Add((option, severity));
        Command.Options.Add(option);
    }

    private void AddThreshold(string name, PhasewardOption definition, string helpName, string description)
    {
        var option = new Option<string?>(name) { Description = $"{description} ({definition.Key})", HelpName = helpName };
        option.Validators.Add(result =>
        {
            foreach (var token in result.Tokens)
                if (definition.Check(token.Value) is { } problem)
                    result.AddError($"the value '{token.Value}' of option {name} is not valid: expected {problem.Expected}");
        });
        thresholds.Add((option, definition));
        Command.Options.Add(option);
    }

    /// <summary>--error/--warning/--info/--none in the order written, so that a later one wins for the same rule.</summary>
    private List<(string Id, ReportSeverity Severity)> SeveritiesInOrder(ParseResult result)
    {
        var ordered = new List<(int Position, string Id, ReportSeverity Severity)>();
        foreach (var (option, severity) in severities)
        {
            if (result.GetResult(option) is not { } given)
                continue;
            foreach (var token in given.Tokens)
                foreach (var id in Ids(token.Value))
                    ordered.Add((IndexOf(result, token), id, severity));
        }

        return ordered.OrderBy(o => o.Position).Select(o => (o.Id, o.Severity)).ToList();
    }

    private static int IndexOf(ParseResult result, Token token)
    {
        for (var i = 0; i < result.Tokens.Count; i++)
            if (ReferenceEquals(result.Tokens[i], token))
                return i;
        return int.MaxValue;
    }

    private static IEnumerable<string> Ids(string list)
        => list.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
}
