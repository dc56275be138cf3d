namespace Phaseward.Checking;

/// <summary>Diagnostic categories, one per rule family.</summary>
public static class RuleCategories
{
    public const string ClockPhases = "Phaseward.ClockPhases";
    public const string PassGatePaths = "Phaseward.PassGatePaths";
    public const string DynamicStorage = "Phaseward.DynamicStorage";
    public const string Timing = "Phaseward.Timing";
    public const string Elaboration = "Phaseward.Elaboration";
}
