using System.Collections.Generic;

namespace Phaseward;

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
