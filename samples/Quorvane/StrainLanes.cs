using System;
using System.Linq;
using Phaseward;

namespace Quorvane;

/// <summary>
/// Shows PW9001. The buoy's mooring line carries three strain gauges; each lane's comparator bit is captured by a
/// static latch and restored by an inverter. On the bench the design can be asked, through the environment, to check
/// its own configuration strictly. The environment is outside what compile time can know, so the elaborator reports
/// PW9001 at that read and skips the check, which then only runs at run time (Program.cs), while every lane is still
/// elaborated and checked as you type. Lane names and figures are invented for this demo.
/// </summary>
public sealed class StrainLanes : Design
{
    private static readonly string[] Lanes = { "bow", "stern", "keel" };

    protected override void Describe(Circuit c)
    {
        var strict = Environment.GetEnvironmentVariable("QUORVANE_BENCH_CHECKS") == "strict";
        if (strict && Lanes.Distinct().Count() != Lanes.Length)
            throw new InvalidOperationException("Every strain lane needs its own name.");

        var strobe = c.Clock("strobe", 8.Nanoseconds());
        foreach (var lane in Lanes)
        {
            var captured = c.StaticLatch(c.Input(lane + "_cmp"), strobe.High, lane + "_hold");
            c.Output(lane + "_bit", c.Inverter(captured));
        }
    }
}
