using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Checking;

namespace Phaseward.EndToEnd.Tests.Packaging;

/// <summary>
/// The design files of the fresh design project the end-to-end tests create: Frostline, an invented orchard
/// frost-warning station (a scenario of our own; every figure is invented for this demo). Three designs each carry one
/// hazard, one is clean.
/// </summary>
internal static class FrostlineDesigns
{
    /// <summary>Two pipeline latches both transparent while <c>tick</c> is high (PW1001).</summary>
    public static readonly DesignFile FrostCounter = new(
        "FrostCounter.cs",
        RuleCatalog.SameWindowLatches.Id,
        Marker: "c.StaticLatch(c.Inverter(early), tick.High",
        Source: """
            using Phaseward;

            namespace Frostline
            {
                /// <summary>Demo design, invented figures: the frost counter's two pipeline latches.</summary>
                public sealed class FrostCounter : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var tick = c.Clock("tick", 10.Nanoseconds());
                        var probe = c.Input("probe_bit");
                        var early = c.StaticLatch(probe, tick.High, "early");
                        var late = c.StaticLatch(c.Inverter(early), tick.High, "late"); // second pipeline stage
                        c.Output("frost_bit", late);
                    }
                }
            }

            """);

    /// <summary>Six pass gates in series on one valve enable, no restoring stage (PW2001; the computed limit is 2).</summary>
    public static readonly DesignFile SprinklerRoute = new(
        "SprinklerRoute.cs",
        RuleCatalog.SeriesPassGates.Id,
        Marker: "c.TransmissionGate(line, open",
        Source: """
            using Phaseward;

            namespace Frostline
            {
                /// <summary>Demo design, invented figures: the pump bit routed through six valve switches.</summary>
                public sealed class SprinklerRoute : Design
                {
                    private const int Valves = 6;

                    protected override void Describe(Circuit c)
                    {
                        var open = c.Input("valve_open");
                        var line = c.Input("pump_bit");
                        for (var valve = 0; valve < Valves; valve++)
                            line = c.TransmissionGate(line, open, $"valve{valve}");
                        c.Output("sprinkler_bit", c.Inverter(line));
                    }
                }
            }

            """);

    /// <summary>A dynamic latch on a clock the heater enable can stop, with no bound on how long (PW3001).</summary>
    public static readonly DesignFile HeaterHold = new(
        "HeaterHold.cs",
        RuleCatalog.DynamicNodeOnGatedClock.Id,
        Marker: "c.DynamicLatch(c.Input(\"leaf_wet\")",
        Source: """
            using Phaseward;

            namespace Frostline
            {
                /// <summary>Demo design, invented figures: the leaf-wetness bit held while the heater runs.</summary>
                public sealed class HeaterHold : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var sense = c.Clock("sense", 4.Nanoseconds());
                        var gated = c.ClockGate(sense, c.Input("heater_on"), ClockStopLevel.Low, name: "heater_sense");
                        var held = c.DynamicLatch(c.Input("leaf_wet"), gated.High, "wet_hold");
                        c.Output("wet_bit", c.StaticLatch(held, gated.Low, "wet_out"));
                    }
                }
            }

            """);

    /// <summary>Two static latches on complementary phases: nothing to report.</summary>
    public static readonly DesignFile DewSampler = new(
        "DewSampler.cs",
        RuleId: null,
        Marker: null,
        Source: """
            using Phaseward;

            namespace Frostline
            {
                /// <summary>Demo design, invented figures: the dew-point bit captured on one phase, held on the other.</summary>
                public sealed class DewSampler : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var dew = c.Clock("dew", 5.Nanoseconds());
                        var first = c.StaticLatch(c.Input("dew_bit"), dew.High, "dew_capture");
                        c.Output("dew_out", c.StaticLatch(first, dew.Low, "dew_hold"));
                    }
                }
            }

            """);

    public static IReadOnlyList<DesignFile> All { get; } = new[] { FrostCounter, SprinklerRoute, HeaterHold, DewSampler };

    public static IEnumerable<DesignFile> WithHazards => All.Where(d => d.RuleId is not null);
}

/// <summary>One design file: its text, the rule it should trigger and the text at which the diagnostic starts.</summary>
internal sealed record DesignFile(string FileName, string? RuleId, string? Marker, string Source)
{
    /// <summary>1-based line and column of <see cref="Marker"/> (where the compiler should point).</summary>
    public (int Line, int Column) ExpectedPosition
    {
        get
        {
            if (Marker is null) throw new InvalidOperationException($"{FileName} has no hazard.");
            var lines = Source.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n');
            var hits = lines.Select((text, index) => (text, index)).Where(l => l.text.Contains(Marker, StringComparison.Ordinal)).ToList();
            if (hits.Count != 1) throw new InvalidOperationException($"Marker '{Marker}' occurs {hits.Count} times in {FileName}.");
            return (hits[0].index + 1, hits[0].text.IndexOf(Marker, StringComparison.Ordinal) + 1);
        }
    }
}
