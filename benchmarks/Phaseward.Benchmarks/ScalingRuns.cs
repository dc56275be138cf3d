using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text;
using Phaseward.Checking;
using Phaseward.Sequencing;

namespace Phaseward.Benchmarks;

/// <summary>
/// <c>--scaling</c>: each <see cref="HostileDesign"/> at a small and a ten-times larger size, elaborated at run time
/// and checked with every rule at the default policy; CPU ms (median of the runs), the cost per device at each size,
/// how it grows, and the slowest rule at the larger size. Cost per device growing well beyond 2× for 10× the parts
/// says that something in the analysis grows faster than the design.
/// </summary>
internal static class ScalingRuns
{
    public static int Run(int small, int runs, string? output)
    {
        var large = small * 10;
        var text = new StringBuilder();
        text.AppendLine($"Scaling on designs whose size sits in one place (--scaling {small}; {runs} runs, medians, ms of CPU; default policy)")
            .AppendLine()
            .AppendLine($"| shape | what grows | devices ({small:N0} / {large:N0} parts) | elaborate + check ms | µs per device | growth per device | slowest rule at {large:N0} | latch path search |")
            .AppendLine("|---|---|---:|---:|---:|---:|---|---|");
        Console.Write(text);
        foreach (var (shape, what) in HostileDesign.Shapes)
        {
            Measure(shape, 100, 1); // warm-up: JIT and first-use costs stay out of the figures
            var a = Measure(shape, small, runs);
            var b = Measure(shape, large, runs);
            var perDeviceA = a.Ms * 1000 / a.Devices;
            var perDeviceB = b.Ms * 1000 / b.Devices;
            var row = $"| {shape} | {what} | {a.Devices:N0} / {b.Devices:N0} | {a.Ms:N0} / {b.Ms:N0} | {perDeviceA:F2} / {perDeviceB:F2} | "
                      + $"{perDeviceB / perDeviceA:F2}× | {b.SlowestRule} {b.SlowestMs:N0} ms | {b.Search} |";
            Console.WriteLine(row);
            text.AppendLine(row);
        }

        if (output is not null)
            File.WriteAllText(output, text.ToString());
        return 0;
    }

    private static (int Devices, double Ms, string SlowestRule, double SlowestMs, string Search) Measure(string shape, int n, int runs)
    {
        var totals = new Samples();
        var devices = 0;
        var slowest = (Rule: "", Ms: 0.0);
        var search = "";
        for (var run = 0; run < runs; run++)
        {
            GC.Collect();
            GC.WaitForPendingFinalizers();
            GC.Collect();
            var byRule = new List<(string, double)>();
            var total = Samples.Time(() =>
            {
                var netlist = new HostileDesign(shape, n).Elaborate();
                devices = netlist.Devices.Count;
                foreach (var rule in Checker.Rules)
                    byRule.Add((rule.GetType().Name, Samples.Time(() => Checker.Check(netlist, new[] { rule }))));
                var model = LatchModel.Of(netlist);
                search = model.PathSearchStopped
                    ? $"stopped: {model.LatchesSearched:N0} of {model.Latches.Count:N0} latches, {model.Paths.Count:N0} paths"
                    : $"{model.Paths.Count:N0} paths, {model.PathSearchSteps:N0} steps";
            });
            totals.Add(total);
            var top = byRule.OrderByDescending(r => r.Item2).First();
            if (run == 0 || top.Item2 > slowest.Ms)
                slowest = top;
        }

        return (devices, totals.Median, slowest.Rule, slowest.Ms, search);
    }
}
