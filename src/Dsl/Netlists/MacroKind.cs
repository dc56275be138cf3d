namespace Phaseward.Netlists;

/// <summary>The library cells that expand into primitives.</summary>
public enum MacroKind
{
    /// <summary>A transmission gate and an inverter, no feedback.</summary>
    DynamicLatch,
    /// <summary>A latch whose storage node has feedback.</summary>
    StaticLatch,
    /// <summary>Two dynamic latches on complementary phases.</summary>
    DynamicRegister,
    /// <summary>Two static latches on complementary phases.</summary>
    StaticRegister,
    /// <summary>A weak feedback inverter that holds a node's level.</summary>
    Keeper,
}
