namespace Phaseward.Checking;

/// <summary>A rule family: the first digit of its rules' IDs, and their diagnostic category.</summary>
public enum RuleFamily
{
    /// <summary>PW1xxx: latches transparent together, overlap races, clock crossings and gates.</summary>
    ClockPhases = 1,
    /// <summary>PW2xxx: pass-gate chains with no restoring stage.</summary>
    PassGatePaths = 2,
    /// <summary>PW3xxx: dynamic nodes that lose their charge, share it or are fought over.</summary>
    DynamicStorage = 3,
    /// <summary>PW4xxx: setup, hold and time borrowing of latches and registers.</summary>
    Timing = 4,
    /// <summary>PW9xxx: what could not be elaborated at compile time, budgets of elaboration and analysis, invalid parameters.</summary>
    Elaboration = 9,
}
