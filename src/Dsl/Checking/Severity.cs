namespace Phaseward.Checking;

/// <summary>How serious a finding is by default (configurable per rule in .editorconfig for the analyzers).</summary>
public enum Severity
{
    Info,
    Warning,
    Error,
}
