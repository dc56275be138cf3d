using Phaseward.Rules.ClockPhases;

namespace Phaseward.Checking;

/// <summary>
/// The one list of Phaseward rule IDs. The first digit is the family: 1 clock phases, 2 pass-gate paths,
/// 3 dynamic storage, 4 timing, 9 elaboration.
/// </summary>
public static class RuleIds
{

    /// <summary>Two latches transparent in the same window in series (or a latch feeding itself in its own phase).</summary>
    public const string SameWindowLatches = "PW1001";

    /// <summary>A latch pair on complementary phases races through the clock overlap.</summary>
    public const string OverlapRace = "PW1002";

    /// <summary>Data crosses between clocks with no fixed time relation without a synchronizer.</summary>
    public const string ClockCrossing = "PW1003";

    /// <summary>A clock gate's enable can change while the gate passes the clock.</summary>
    public const string ClockGateEnable = "PW1004";

    /// <summary>A feedback loop through restoring stages and data-controlled pass gates with no latch on it.</summary>
    public const string LoopWithoutStorage = "PW1005";

    /// <summary>A register-to-register path misses the capturing register's setup time.</summary>
    public const string RegisterSetup = "PW4001";

    /// <summary>A register-to-register path is shorter than the capturing register's hold time (plus clock skew).</summary>
    public const string RegisterHold = "PW4002";

    /// <summary>A two-phase latch path arrives after the capturing latch closes, even with time borrowing.</summary>
    public const string LatchBorrowing = "PW4003";
    /// <summary>A latch's window is too short for its entry gate to write the storage node.</summary>
    public const string LatchWriteWindow = "PW4004";

    /// <summary>A loop of latches whose delays exceed the time its phases give it: borrowing grows every cycle.</summary>
    public const string LatchLoop = "PW4005";
    /// <summary>Pass gates in series without a restoring stage.</summary>
    public const string SeriesPassGates = "PW2001";
    /// <summary>A dynamic storage node floats while its gated clock is stopped, for longer than it retains its level.</summary>
    public const string DynamicNodeOnGatedClock = "PW3001";

    /// <summary>A running clock leaves a dynamic storage node floating for longer than it retains its level.</summary>
    public const string ClockTooSlowForDynamicStorage = "PW3002";

    /// <summary>A pass device joins a charged floating node to another floating node and the shared level droops too far.</summary>
    public const string ChargeSharing = "PW3003";

    /// <summary>Two or more conducting paths drive one net at the same time.</summary>
    public const string FightingDrivers = "PW3004";

    /// <summary>A keeper stronger than the write path of its node: a write cannot flip it.</summary>
    public const string KeeperTooStrong = "PW3005";
    /// <summary>Part of a design could not be elaborated at compile time (outside the supported subset).</summary>
    public const string NotElaborated = "PW9001";

    /// <summary>Compile-time elaboration stopped: the step budget or the call-depth limit was reached.</summary>
    public const string ElaborationBudgetExceeded = "PW9002";

    /// <summary>The design throws while it is elaborated (a DSL call rejected its arguments, or the code throws).</summary>
    public const string DesignThrows = "PW9003";

    /// <summary>A <c>phaseward.</c> option in .editorconfig has a value that cannot be used.</summary>
    public const string InvalidOption = "PW9004";
}
