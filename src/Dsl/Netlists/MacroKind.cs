namespace Phaseward.Netlists;

/// <summary>The library cells that expand into primitives.</summary>
public enum MacroKind
{
    DynamicLatch,
    StaticLatch,
    DynamicRegister,
    StaticRegister,
    Keeper,
}
