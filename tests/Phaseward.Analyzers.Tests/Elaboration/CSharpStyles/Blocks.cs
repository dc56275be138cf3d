using System.Collections.Generic;
using Phaseward;

namespace CSharpStyles;

/// <summary>A half-cycle stage: a latch on the given phase and the inverter that restores its output.</summary>
public sealed class HalfStage : Block
{
    private readonly Net input;
    private readonly Phase phase;

    public HalfStage(Net input, Phase phase)
    {
        this.input = input;
        this.phase = phase;
    }

    public Net Output { get; private set; } = null!;

    protected override void Describe(Circuit c)
    {
        var stored = c.DynamicLatch(input, phase, "l");
        Output = c.Inverter(stored, "r");
    }
}

/// <summary>A lane: two half stages in series, both (wrongly) on the same phase.</summary>
public sealed class Lane : Block
{
    private readonly Net input;
    private readonly Clock clock;

    public Lane(Net input, Clock clock)
    {
        this.input = input;
        this.clock = clock;
    }

    public Net Output { get; private set; } = null!;

    protected override void Describe(Circuit c)
    {
        var first = c.Place(new HalfStage(input, clock.High), "a");
        Output = c.Place(new HalfStage(first.Output, clock.High), "b").Output;
    }
}

// expect: PW1001
public sealed class BlocksInALoop : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var outputs = new List<Net>();
        for (var i = 0; i < 4; i++)
        {
            var lane = c.Place(new Lane(c.Input("d" + i), clk), "lane" + i);
            outputs.Add(lane.Output);
        }

        for (var i = 0; i < outputs.Count; i++)
            c.Output("q" + i, outputs[i]);
    }
}

/// <summary>A block given its configuration by a primary constructor, with a virtual step.</summary>
public abstract class Stage(Phase phase) : Block
{
    public Net In { get; init; } = null!;

    public Net Out { get; protected set; } = null!;

    protected Phase Phase => phase;

    protected virtual Net Restore(Circuit c, Net n) => c.Inverter(n, "r");

    protected override void Describe(Circuit c) => Out = Restore(c, c.StaticLatch(In, Phase, "l"));
}

public sealed class BufferedStage(Phase phase) : Stage(phase)
{
    protected override Net Restore(Circuit c, Net n) => c.Buffer(base.Restore(c, n), "b");
}

// expect: PW1001
public sealed class InheritedBlocks : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var first = c.Place(new BufferedStage(clk.Low) { In = c.Input("d") }, "first");
        var second = c.Place(new BufferedStage(clk.Low) { In = first.Out }, "second");
        c.Output("q", second.Out);
    }
}
