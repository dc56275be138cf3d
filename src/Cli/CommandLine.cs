using System;
using System.Collections.Generic;
using Phaseward.Cli.Policy;
using Phaseward.Configuration;

namespace Phaseward.Cli;

/// <summary>The parsed command line.</summary>
internal sealed class CommandLine
{
    public const string Usage = @"Usage: phaseward-report <design.csproj | design.dll> [options]

Builds the project (or loads the assembly), checks every design in it (each concrete Phaseward.Design with a public
parameterless constructor) and prints the findings, the latch and register timing, the checked paths, the pass-gate
chains and the storage nodes.

Options:
  --html <path>               also write a self-contained HTML page with a timing diagram per root clock
  --spice <dir>               also write a SPICE deck per finding that reproduces it, <dir>/<Design>/<RuleId>-<n>.cir
                              (first-order switch-level decks for ngspice: ngspice -b <deck>)
  --confirm                   run every deck in ngspice (on the PATH) and print each estimate beside the simulated
                              value; without --spice the decks go to a temporary folder
  --design <name>             only this design (class name or full name); may be repeated
  --error <IDs>               report these rules (comma-separated PWxxxx, or * for all) as errors
  --warning <IDs>, --info <IDs>, --none <IDs>
                              likewise; none leaves a rule's findings out
  --max-series-pass-gates <n> PW2001 limit (phaseward.max_series_pass_gates)
  --min-race-margin <time>    PW1002 threshold, e.g. 20ps (phaseward.min_race_margin)
  --min-timing-slack <time>   PW4001-PW4004 threshold, e.g. 0.1ns (phaseward.min_timing_slack)
  --no-editorconfig           ignore the analyzer config files (.editorconfig, .globalconfig)
  --artifacts <dir>           where a project is built (default: a new temporary folder, deleted afterwards)
  -h, --help                  this text

Configuration is read as the compiler reads it: the project's .editorconfig and .globalconfig files (for a .dll, those
above its sources), asked per source file; severities from dotnet_diagnostic.PWxxxx.severity (and the bulk
dotnet_analyzer_diagnostic keys), then the project's NoWarn / WarningsAsErrors / TreatWarningsAsErrors, then the options
above. A project is built with Phaseward's own diagnostics kept from failing the build, so that the report can show them.
Exit code: 0 no error-severity findings, 1 findings at error severity, 2 bad input (the message names the file).";

    public string? Input { get; private set; }

    public string? HtmlPath { get; private set; }

    public string? SpicePath { get; private set; }

    public bool Confirm { get; private set; }

    public List<string> Designs { get; } = new();

    public List<(string Ids, ReportSeverity Severity)> SeverityOverrides { get; } = new();

    public List<(PhasewardOption Definition, string Value, string Option)> PolicyOverrides { get; } = new();

    public bool UseEditorConfig { get; private set; } = true;

    public string? ArtifactsPath { get; private set; }

    public bool Help { get; private set; }

    public static CommandLine Parse(IReadOnlyList<string> args)
    {
        var line = new CommandLine();
        for (var i = 0; i < args.Count; i++)
        {
            var arg = args[i];
            string Value()
            {
                if (i + 1 >= args.Count || args[i + 1].StartsWith("--", StringComparison.Ordinal))
                    throw new InputException($"option '{arg}' needs a value");
                return args[++i];
            }

            switch (arg)
            {
                case "-h" or "--help" or "-?": line.Help = true; break;
                case "--html": line.HtmlPath = Value(); break;
                case "--design": line.Designs.Add(Value()); break;
                case "--spice": line.SpicePath = Value(); break;
                case "--confirm": line.Confirm = true; break;
                case "--error": line.SeverityOverrides.Add((Value(), ReportSeverity.Error)); break;
                case "--warning": line.SeverityOverrides.Add((Value(), ReportSeverity.Warning)); break;
                case "--info": line.SeverityOverrides.Add((Value(), ReportSeverity.Info)); break;
                case "--none": line.SeverityOverrides.Add((Value(), ReportSeverity.None)); break;
                case "--max-series-pass-gates": line.PolicyOverrides.Add((OptionCatalog.MaxSeriesPassGates, Value(), arg)); break;
                case "--min-race-margin": line.PolicyOverrides.Add((OptionCatalog.MinimumRaceMargin, Value(), arg)); break;
                case "--min-timing-slack": line.PolicyOverrides.Add((OptionCatalog.MinimumTimingSlack, Value(), arg)); break;
                case "--no-editorconfig": line.UseEditorConfig = false; break;
                case "--artifacts": line.ArtifactsPath = Value(); break;
                default:
                    if (arg.StartsWith('-'))
                        throw new InputException($"unknown option '{arg}' (see --help)");
                    if (line.Input is not null)
                        throw new InputException($"one input only: got '{line.Input}' and '{arg}'");
                    line.Input = arg;
                    break;
            }
        }

        if (!line.Help && line.Input is null)
            throw new InputException("no input: give a design project (.csproj) or a built design assembly (.dll)");
        return line;
    }
}
