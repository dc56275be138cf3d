using System;
using Phaseward;

namespace Quorvane;

/// <summary>Checks every Quorvane design at run time and prints Phaseward's report for each.</summary>
public static class Program
{
    public static int Main()
    {
        Design[] designs =
        {
            new PressureSampler(),
            new BurstCapture(),
            new BurstCaptureStatic(),
            new ChannelSelect(),
            new ChannelSelectBuffered(),
            new TideAverager(),
            new TideAveragerTwoPhase(),
            new Housekeeping(),
            new HousekeepingStatic(),
            new StrainLanes(),
            new TwoPhaseTally(),
            new RadioHandoff(),
            new RadioHandoffSynchronized(),
            new WakeLogic(),
            new WakeLogicRegistered(),
            new MooringHold(),
            new MooringHoldWeakKeeper(),
            new TelemetryBus(),
            new TelemetryBusSelected(),
            new BurstGate(),
            new BurstGateLatched(),
            new WaveLog(),
            new WaveLogDecoded(),
            new SpectrumBins(),
            new SpectrumBinsTwoPhase(),
        };

        var findings = 0;
        foreach (var design in designs)
        {
            var report = design.Check();
            Console.Write(report);
            findings += report.Findings.Count;
        }

        Console.WriteLine(findings == 0 ? "All Quorvane designs are clean." : $"{findings} finding(s) in the Quorvane designs.");
        return 0;
    }
}
