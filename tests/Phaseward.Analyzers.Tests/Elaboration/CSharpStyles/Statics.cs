using Phaseward;

namespace CSharpStyles;

/// <summary>Stage count and phase choice from a static constructor (they were once read as defaults: 0 and false).</summary>
public static class PipelinePlan
{
    public static readonly int Stages;
    public static readonly bool SamePhase;
    public static int Assigned { get; private set; }
    public static readonly string Prefix = "st";

    static PipelinePlan()
    {
        Stages = 3;
        SamePhase = Stages > 2;
        Assigned = Stages * 2;
    }
}

// expect: PW1001
public sealed class StaticConstructorPlan : Design
{
    private static readonly int Twice;

    static StaticConstructorPlan() => Twice = PipelinePlan.Assigned;

    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var x = c.Input("d");
        for (var i = 0; i < PipelinePlan.Stages; i++)
            x = c.DynamicLatch(x, PipelinePlan.SamePhase || i % 2 == 0 ? clk.High : clk.Low, PipelinePlan.Prefix + i);
        for (var i = 0; i < Twice; i++)
            x = c.Inverter(x);
        c.Output("q", x);
    }
}
