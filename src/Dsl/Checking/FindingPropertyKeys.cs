namespace Phaseward.Checking;

/// <summary>
/// The keys of the machine-readable properties findings carry (<see cref="Finding.Properties"/>), for code fixes,
/// reports and SARIF consumers: one home, one casing (PascalCase; figures in SI units, the unit in the key's name).
/// Values are formatted by <see cref="FindingPropertyValues"/>.
/// </summary>
public static class FindingPropertyKeys
{
    // ---- Every finding the analyzers group (one diagnostic per cause)

    /// <summary>How many instances of the cause the diagnostic stands for (present when more than one).</summary>
    public const string InstanceCount = "InstanceCount";

    /// <summary>Every instance's name, separated by ";".</summary>
    public const string Instances = "Instances";

    /// <summary>The name of the process whose figures the estimates used: every diagnostic of a checking rule carries
    /// it, so a SARIF result says where its figures came from (invented defaults included).</summary>
    public const string Process = "Process";

    // ---- Latch pairs, overlap races and timing (PW1001–PW1003, PW4001–PW4005)
    /// <summary>Name of the latch (or register) the finding is reported at.</summary>
    public const string TargetLatch = "TargetLatch";

    /// <summary>Name of the latch (or register) that feeds it.</summary>
    public const string SourceLatch = "SourceLatch";

    /// <summary>The phase the reported latch is transparent in ("clk.High").</summary>
    public const string Phase = "Phase";

    /// <summary>The complementary phase of the same clock ("clk.Low"): what the PW1001 fix switches the latch to.</summary>
    public const string ComplementPhase = "ComplementPhase";

    /// <summary>The clock of the reported latch's phase (PW1003: the receiving clock).</summary>
    public const string Clock = "Clock";

    /// <summary>PW1003: the clock of the latch that sends the data.</summary>
    public const string SendingClock = "SendingClock";

    /// <summary>"High" or "Low": the reported latch's polarity.</summary>
    public const string Polarity = "Polarity";

    /// <summary>"High" or "Low": the other polarity.</summary>
    public const string ComplementPolarity = "ComplementPolarity";

    /// <summary>"true" when the reported latch is a register's master or slave (the fix inserts a latch instead of switching the phase).</summary>
    public const string IsRegisterStage = "IsRegisterStage";

    /// <summary>The register the reported latch belongs to, when it is a register stage.</summary>
    public const string Register = "Register";

    /// <summary>
    /// "true" when every clocked gate of the reported latch (entry and feedback) comes from its one call: a library
    /// latch or register, or a hand-built latch of a single clocked pass gate. Then changing the phase at that call
    /// switches the whole latch; otherwise ("false", e.g. a hand-built static latch whose feedback gate is another call)
    /// it would break the latch, and the PW1001 fix is not offered.
    /// </summary>
    public const string PhaseSetByOneCall = "PhaseSetByOneCall";

    /// <summary>A race margin or a timing slack, in seconds (invariant culture, round-trip format).</summary>
    public const string MarginSeconds = "MarginSeconds";

    // ---- Clock gates (PW1004)
    /// <summary>PW1004: the gated clock; PW3001: the gated clock whose stop isolates the node.</summary>
    public const string GatedClock = "GatedClock";

    /// <summary>PW1004: the clock the gate passes.</summary>
    public const string SourceClock = "SourceClock";

    /// <summary>PW1004: the gate's enable net.</summary>
    public const string Enable = "Enable";

    /// <summary>The latch the enable comes from (absent for a primary input).</summary>
    public const string Storage = "Storage";

    /// <summary>The phase in which the gate blocks the clock ("clk.Low" for a gate that stops low): what to latch the enable on.</summary>
    public const string BlockingPhase = "BlockingPhase";

    /// <summary>"High" or "Low": the blocking phase's polarity.</summary>
    public const string BlockingPolarity = "BlockingPolarity";

    /// <summary>Where the enable comes from: <see cref="FindingPropertyValues.EnableFromLatch"/>, <see cref="FindingPropertyValues.EnableFromUnrelatedClock"/> (a latch whose clock
    /// has no fixed time relation to the gate's: a synchronizer's business, not a latch's) or <see cref="FindingPropertyValues.EnableFromInput"/>.</summary>
    public const string Origin = "Origin";

    /// <summary>For an enable from a latch: "true" when the latch opens while the gate passes the clock (it is on the
    /// wrong phase: latching the enable on the blocking phase fixes it), "false" when only the path after it is too slow.</summary>
    public const string OpensWhilePassing = "OpensWhilePassing";

    /// <summary>For an enable from a latch: its entry delay plus the slowest path from its storage node to the enable, at the slow corner (s).</summary>
    public const string EnableDelaySeconds = "EnableDelaySeconds";

    /// <summary>PW1004: when the gate starts passing the clock, in the design's time base (s).</summary>
    public const string PassStartSeconds = "PassStartSeconds";

    /// <summary>PW1004: when the gate stops passing the clock (s).</summary>
    public const string PassEndSeconds = "PassEndSeconds";

    /// <summary>PW1004: the start of the window in which the enable may change (s).</summary>
    public const string ChangeStartSeconds = "ChangeStartSeconds";

    /// <summary>PW1004: the end of the window in which the enable may change (s).</summary>
    public const string ChangeEndSeconds = "ChangeEndSeconds";

    // ---- Loops without storage (PW1005)
    /// <summary>How many devices the loop holds.</summary>
    public const string LoopDevices = "LoopDevices";

    /// <summary>The device the finding is reported at.</summary>
    public const string FirstDevice = "FirstDevice";

    /// <summary>Inverting stages round a simple loop (absent for loops that share nets).</summary>
    public const string Inversions = "Inversions";

    /// <summary>Sum of the loop's first-order stage delays, in seconds (simple loops only).</summary>
    public const string LoopDelaySeconds = "LoopDelaySeconds";

    /// <summary>About twice the loop's delay, in seconds, for an odd loop.</summary>
    public const string OscillationPeriodSeconds = "OscillationPeriodSeconds";

    // ---- Pass-gate chains (PW2001)
    /// <summary>PW2001: pass gates in the chain.</summary>
    public const string ChainLength = "ChainLength";

    /// <summary>PW2001: the configured limit of pass gates in series.</summary>
    public const string Limit = "Limit";

    /// <summary>PW2001: the optimum whole number of gates between restoring stages, or "none" when the process gives nodes no capacitance.</summary>
    public const string OptimalSpacing = "OptimalSpacing";

    /// <summary>PW2001: the spacing the fix uses between restoring stages.</summary>
    public const string SplitSpacing = "SplitSpacing";

    /// <summary>PW2001: the chain's first gate (device id in the netlist).</summary>
    public const string FirstGateId = "FirstGateId";

    /// <summary>PW2001: the chain's first gate (name).</summary>
    public const string FirstGate = "FirstGate";

    /// <summary>PW2001: the gate reported, the first past the limit (device id).</summary>
    public const string ReportedGateId = "ReportedGateId";

    /// <summary>PW2001: the chain's Elmore delay (s).</summary>
    public const string ElmoreDelaySeconds = "ElmoreDelaySeconds";

    /// <summary>PW2001: the chain's 50 % delay (s).</summary>
    public const string FiftyPercentDelaySeconds = "FiftyPercentDelaySeconds";

    /// <summary>PW2001: the delay with restoring stages at the split spacing (s).</summary>
    public const string RestoredDelaySeconds = "RestoredDelaySeconds";

    /// <summary>PW2001: "true" when the worst case counts mux branches whose controls are not known exclusive as conducting together.</summary>
    public const string AssumesUnknownBranchesConduct = "AssumesUnknownBranchesConduct";

    /// <summary>PW2001: the device ids after which a restoring stage goes, comma-separated.</summary>
    public const string SplitAfterDeviceIds = "SplitAfterDeviceIds";

    /// <summary>PW2001: the names of those devices, one per line.</summary>
    public const string SplitAfterDevices = "SplitAfterDevices";

    /// <summary>PW2001: how many split points the whole chain needs.</summary>
    public const string SplitPointCount = "SplitPointCount";

    /// <summary>PW2001: "true" when more split points are needed than are listed.</summary>
    public const string SplitPointsTruncated = "SplitPointsTruncated";

    /// <summary>
    /// PW2001: where each listed split point can be fixed in the source, one <see cref="Rules.PassGatePaths.SplitSite"/>
    /// per line in the order of <see cref="SplitAfterDeviceIds"/>, written and read with its Format/TryParse pair.
    /// </summary>
    public const string SplitSites = "SplitSites";

    // ---- Dynamic storage (PW3001–PW3003)
    /// <summary>The node the finding is about (PW3001–PW3005).</summary>
    public const string Node = "Node";

    /// <summary>The library cell that made the node ("DynamicLatch", "DynamicRegister", ...); absent for a hand-built node.</summary>
    public const string Cell = "Cell";

    /// <summary>The cell's instance name (absent for a hand-built node).</summary>
    public const string CellName = "CellName";

    /// <summary>The static cell that replaces the dynamic one with the same arguments ("StaticLatch" or "StaticRegister"); absent otherwise.</summary>
    public const string StaticReplacement = "StaticReplacement";

    /// <summary>PW3001: the nearest clock upstream of that gate that cannot stop (the clock to use instead).</summary>
    public const string UngatedClock = "UngatedClock";

    /// <summary>The root clock (PW3001: of the gate; PW3002: whose period is too long).</summary>
    public const string RootClock = "RootClock";

    /// <summary>The node's retention time in seconds (round-trip "R" format).</summary>
    public const string RetentionSeconds = "RetentionSeconds";

    /// <summary>PW3001: the declared maximum idle time in seconds, or "unbounded".</summary>
    public const string IdleSeconds = "IdleSeconds";

    /// <summary>PW3002: the longest isolation per period, in seconds.</summary>
    public const string IsolationSeconds = "IsolationSeconds";

    /// <summary>PW3002: the lowest safe root-clock frequency, in hertz.</summary>
    public const string MinimumFrequencyHertz = "MinimumFrequencyHertz";

    /// <summary>PW3003: the floating node the charge is shared with.</summary>
    public const string OtherNode = "OtherNode";

    /// <summary>PW3003: the droop in volts.</summary>
    public const string DroopVolts = "DroopVolts";

    // ---- Fighting drivers (PW3004)
    /// <summary>PW3004: the first driver of the fight (pulling up in the level figure).</summary>
    public const string Driver = "Driver";

    /// <summary>PW3004: the second driver of the fight.</summary>
    public const string OtherDriver = "OtherDriver";

    /// <summary>PW3004: the first driver's path resistance (Ω).</summary>
    public const string DriverOhms = "DriverOhms";

    /// <summary>PW3004: the second driver's path resistance (Ω).</summary>
    public const string OtherDriverOhms = "OtherDriverOhms";

    /// <summary>PW3004: the node's level with Driver pulling up and OtherDriver pulling down; PW3005: the level a write against the keeper reaches (V).</summary>
    public const string LevelVolts = "LevelVolts";

    /// <summary>The rail-to-rail current while they disagree.</summary>
    public const string CurrentAmperes = "CurrentAmperes";

    /// <summary>How long per period two clocked gates (or a stage and a clocked gate) conduct together (absent otherwise).</summary>
    public const string OverlapSeconds = "OverlapSeconds";

    // ---- Keepers (PW3005)
    /// <summary>PW3005: the keeper.</summary>
    public const string Keeper = "Keeper";

    /// <summary>PW3005: the pass gate that writes the node.</summary>
    public const string Writer = "Writer";

    /// <summary>PW3005: the keeper's resistance (Ω).</summary>
    public const string KeeperOhms = "KeeperOhms";

    /// <summary>PW3005: the write path's resistance, driver plus pass gates (Ω).</summary>
    public const string WriteOhms = "WriteOhms";

    /// <summary>PW3005: the level the write must reach to flip the node (V).</summary>
    public const string RequiredVolts = "RequiredVolts";

    /// <summary>PW3005: the supply (V).</summary>
    public const string SupplyVolts = "SupplyVolts";

    // ---- Analysis limits (PW9005)
    /// <summary>PW9005: the first latch whose paths were not listed.</summary>
    public const string FirstLatchNotSearched = "FirstLatchNotSearched";

    /// <summary>PW9005: the latch path search's budget of steps.</summary>
    public const string SearchBudget = "SearchBudget";

    /// <summary>PW4001, PW4002: how many launching registers other than the reported (worst) one fail the same check into the register.</summary>
    public const string OtherFailingLaunches = "OtherFailingLaunches";
}
