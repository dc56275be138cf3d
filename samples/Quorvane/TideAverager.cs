using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (same-phase latches in series). The tide averager's two pipeline latches were both put on the high phase
/// of the averaging clock, so while it is high a new sample runs straight through both. Figures are invented.
/// </summary>
public sealed class TideAverager : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var average = c.Clock("average", 8.Nanoseconds());
        var tide = c.Input("tide_bit");

        var first = c.StaticLatch(tide, average.High, "tide_stage1");
        var second = c.StaticLatch(c.Nand(first, c.Input("valid")), average.High, "tide_stage2");

        c.Output("tide_avg", second);
    }
}

/// <summary>The fix: the second stage is transparent on the complementary phase.</summary>
public sealed class TideAveragerTwoPhase : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var average = c.Clock("average", 8.Nanoseconds());
        var tide = c.Input("tide_bit");

        var first = c.StaticLatch(tide, average.High, "tide_stage1");
        var second = c.StaticLatch(c.Nand(first, c.Input("valid")), average.Low, "tide_stage2");

        c.Output("tide_avg", second);
    }
}
