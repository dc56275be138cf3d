namespace Phaseward.Checking;

/// <summary>A rule family: the first digit of its rules' IDs, and their diagnostic category.</summary>
public enum RuleFamily
{
    ClockPhases = 1,
    PassGatePaths = 2,
    DynamicStorage = 3,
    Timing = 4,
    Elaboration = 9,
}
