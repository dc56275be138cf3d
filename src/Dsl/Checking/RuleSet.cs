using System.Collections.Generic;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Rules.PassGatePaths;
using Phaseward.Rules.Timing;

namespace Phaseward.Checking;

/// <summary>The rules Phaseward runs, in a fixed order (so reports are deterministic).</summary>
public static class RuleSet
{
    public static IReadOnlyList<Rule> All { get; } = new Rule[]
    {
        new SameWindowLatchesRule(),
        new OverlapRaceRule(),
        new ClockCrossingRule(),
        new ClockGateEnableRule(),
        new LoopWithoutStorageRule(),
        new RegisterTimingRule(),
        new LatchBorrowingRule(),
        new LatchWriteWindowRule(),
        new PassGateChainRule(),
        new DynamicNodeOnGatedClockRule(),
        new ClockTooSlowForDynamicStorageRule(),
        new ChargeSharingRule(),
        new FightingDriversRule(),
        new KeeperTooStrongRule(),
    };
}
