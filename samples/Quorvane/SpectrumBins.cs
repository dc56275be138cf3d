using System;
using System.Linq;
using Phaseward;

namespace Quorvane;

/// <summary>
/// One frequency bin of the buoy's wave spectrum, as a block: a held copy of the band's comparator bit, gated by the
/// bin's enable, captured into the bin's count latch. Placed once per bin, so its nets are named 'swell.held',
/// 'chop.count', ... Figures are invented for this demo.
/// </summary>
public sealed class SpectrumBin : Block
{
    private readonly BinPlan plan;
    private readonly Clock clock;
    private readonly Net band;

    public SpectrumBin(BinPlan plan, Clock clock, Net band)
    {
        this.plan = plan;
        this.clock = clock;
        this.band = band;
    }

    /// <summary>The bin's count bit (restored), read by the telemetry packer.</summary>
    public Net Count { get; private set; } = null!;

    protected override void Describe(Circuit c)
    {
        var held = c.StaticLatch(band, clock.High, "held");
        var steered = c.Nand(held, c.Input("enable"));
        var captured = c.StaticLatch(steered, plan.CapturePhase(clock), "count");
        Count = c.Inverter(captured, "count_b");
    }
}

/// <summary>
/// A bin's name and the phase its count latch captures on: a record, so a variant is a copy made with 'with'.
/// </summary>
public sealed record BinPlan(string Name, bool CapturesOnLowPhase = false)
{
    public Phase CapturePhase(Clock clock) => CapturesOnLowPhase ? clock.Low : clock.High;
}

/// <summary>
/// Hazard (same-phase latches in series), in a design written the way C# code is: block classes, a record, LINQ and
/// lambdas. Every bin's count latch was put on the same phase as its held latch, so while the spectrum clock is high a
/// new comparator bit runs through both. The six bins are one cause: the analyzers report PW1001 once, at the call in
/// the block, saying it was found six times and naming the first bins. Figures and bin names are invented.
/// </summary>
public sealed class SpectrumBins : Design
{
    protected override void Describe(Circuit c) => SpectrumBank.Describe(c, plan => plan);
}

/// <summary>The fix: every bin captures on the complementary phase, one 'with' in the plan.</summary>
public sealed class SpectrumBinsTwoPhase : Design
{
    protected override void Describe(Circuit c) => SpectrumBank.Describe(c, plan => plan with { CapturesOnLowPhase = true });
}

/// <summary>The bank of bins both spectrum designs share; <paramref name="adjust"/> is where they differ.</summary>
internal static class SpectrumBank
{
    private static readonly string[] BinNames = { "swell", "groundswell", "sea", "chop", "ripple", "spray" };

    public static void Describe(Circuit c, Func<BinPlan, BinPlan> adjust)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var spectrum = c.Clock("spectrum", 10.Nanoseconds());

        var bins = BinNames
            .Select(name => adjust(new BinPlan(name)))
            .Select(plan => (plan, block: c.Place(new SpectrumBin(plan, spectrum, c.Input(plan.Name + "_band")), plan.Name)))
            .ToDictionary(bin => bin.plan.Name, bin => bin.block.Count);

        // Telemetry reads the bins in order of rising frequency: the declaration order above.
        foreach (var (name, count) in bins.OrderBy(bin => Array.IndexOf(BinNames, bin.Key)))
            c.Output(name + "_count", count);
    }
}
