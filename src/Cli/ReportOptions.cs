using System.Collections.Generic;
using Phaseward.Cli.Policy;
using Phaseward.Configuration;

namespace Phaseward.Cli;

/// <summary>What the command line asks for, once System.CommandLine has parsed and checked it (<see cref="ReportCommandLine"/>).</summary>
internal sealed class ReportOptions
{
    public required string Input { get; init; }

    public string? HtmlPath { get; init; }

    public string? SpicePath { get; init; }

    public bool Confirm { get; init; }

    public IReadOnlyList<string> Designs { get; init; } = [];

    /// <summary>Rule IDs (or <c>*</c>) with the severity given to them, in command-line order: a later one wins.</summary>
    public IReadOnlyList<(string Id, ReportSeverity Severity)> SeverityOverrides { get; init; } = [];

    /// <summary><c>phaseward.</c> options given on the command line, already checked against their definition.</summary>
    public IReadOnlyList<(PhasewardOption Definition, string Value, string Option)> PolicyOverrides { get; init; } = [];

    public bool UseEditorConfig { get; init; } = true;

    public string? ArtifactsPath { get; init; }
}
