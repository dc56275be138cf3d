namespace Phaseward.Checking;

/// <summary>The caution every output of figures carries: they are first-order estimates, not sign-off.</summary>
public static class EstimateCaution
{
    /// <summary>The caution text itself, shown beside every set of figures.</summary>
    public const string Text = "Figures are first-order estimates (0.69·R·C stages, Elmore delays, linear leakage, nominal clock edges). "
        + "They catch clocking hazards early; they do not replace transistor-level simulation, the foundry's rules or sign-off.";

    /// <summary>The line naming the process whose figures were used, so invented defaults do not pass unnoticed.</summary>
    public static string ProcessLine(Process process) => "Figures from process '" + process.Name + "'.";
}
