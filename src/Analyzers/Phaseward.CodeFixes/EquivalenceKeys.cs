namespace Phaseward.CodeFixes;

/// <summary>Public equivalence keys of Phaseward's code actions (FixAll groups actions by these).</summary>
public static class EquivalenceKeys
{
    public const string Prefix = "Phaseward.";

    // PW1001
    public const string SwitchLatchPhase = Prefix + "PW1001.SwitchLatchPhase";
    public const string InsertLatchBeforeRegister = Prefix + "PW1001.InsertLatchBeforeRegister";

    // PW1003
    public const string InsertSynchronizer = Prefix + "PW1003.InsertSynchronizer";

    // PW1004
    public const string LatchClockGateEnable = Prefix + "PW1004.LatchClockGateEnable";

    // PW2001
    public const string InsertRestoringBuffer = Prefix + "PW2001.InsertRestoringBuffer";
    public const string InsertRestoringInverter = Prefix + "PW2001.InsertRestoringInverter";

    // PW3001, PW3002
    public const string UseStaticLatch = Prefix + "PW3001.PW3002.UseStaticLatch";
    public const string UseStaticRegister = Prefix + "PW3001.PW3002.UseStaticRegister";

    // PW3001
    public const string ClockFromUngatedClock = Prefix + "PW3001.ClockFromUngatedClock";
}
