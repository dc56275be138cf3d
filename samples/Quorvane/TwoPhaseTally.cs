using Phaseward;

namespace Quorvane;

/// <summary>
/// Clean: the wave tally counts crests in a latch pipeline clocked by a non-overlapping two-phase clock, described as
/// two root clocks on the design's time base. Each phase is high for 40 % of the 2 ns period and the second rises half
/// a period after the first, so 200 ps separate the phases — more than the 30 ps complement skew: no two latches of
/// the pipeline are ever transparent together, and no overlap race exists. Figures are invented.
/// </summary>
public sealed class TwoPhaseTally : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var phi1 = c.Clock("phi1", 2.Nanoseconds(), duty: 0.4, complementSkew: 30.Picoseconds());
        var phi2 = c.Clock("phi2", 2.Nanoseconds(), duty: 0.4, complementSkew: 30.Picoseconds(), offset: 1.Nanoseconds());

        var crest = c.StaticLatch(c.Input("crest_seen"), phi1.High, "tally_in");
        var counted = c.StaticLatch(c.Nand(crest, c.Input("tally_enable")), phi2.High, "tally_mid");
        var held = c.StaticLatch(c.Inverter(counted), phi1.High, "tally_out");

        c.Output("tally", held);
    }
}
