namespace Phaseward.Checking;

/// <summary>How serious a finding is by default (configurable per rule in .editorconfig for the analyzers).</summary>
public enum Severity
{
    /// <summary>Shown, never fails a build.</summary>
    Info,
    /// <summary>A hazard to look at; fails a build only under warnings-as-errors.</summary>
    Warning,
    /// <summary>A hazard that fails the build.</summary>
    Error,
}
