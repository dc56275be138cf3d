using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (clock too slow for dynamic storage). The battery monitor runs from a slow housekeeping clock, yet keeps
/// its count in dynamic registers: each half period is far longer than a dynamic node can hold its charge.
/// Figures are invented for this demo.
/// </summary>
public sealed class Housekeeping : Design
{
    private readonly int counterBits;

    public Housekeeping()
        : this(4)
    {
    }

    public Housekeeping(int counterBits) => this.counterBits = counterBits;

    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var tick = c.Clock("housekeeping", 1.Milliseconds());
        var carry = c.Input("count_enable");
        for (var bit = 0; bit < counterBits; bit++)
        {
            var state = c.DynamicRegister(carry, tick, $"battery_count{bit}");
            carry = c.Nand(state, carry);
        }

        c.Output("battery_carry", carry);
    }
}

/// <summary>The fix: static registers hold their state however slow the clock.</summary>
public sealed class HousekeepingStatic : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var tick = c.Clock("housekeeping", 1.Milliseconds());
        var carry = c.Input("count_enable");
        for (var bit = 0; bit < 4; bit++)
        {
            var state = c.StaticRegister(carry, tick, $"battery_count{bit}");
            carry = c.Nand(state, carry);
        }

        c.Output("battery_carry", carry);
    }
}
