using System;
using Phaseward;

// Test designs for the compile-time/run-time parity tests. The circuits and figures are invented for these tests.
namespace ParityDesigns
{
    public sealed class StraightLine : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 5.Nanoseconds(), 0.4, 25.Picoseconds());
            var a = c.Input("a");
            var b = c.Input("b");
            var n = c.Nand(a, b, "n1");
            // Split over lines: run time records the line of the call's '(' (C#'s [CallerLineNumber]), as must the elaborator.
            var x = c
                .Inverter(n);
            var latched = c.DynamicLatch(x, clk.High, "lat");
            var held = c.StaticLatch(latched, clk.High.Complement);
            c.SetCapacitance(latched, 3.5.Femtofarads());
            c.SetLeakage(x, 2.Picoamperes());
            c.Output("q",
                held);
        }
    }

    public sealed class Loops : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 4.Nanoseconds());
            var x = c.Input("in");
            for (var i = 0; i < 6; i++)
            {
                if (i == 4) continue;
                x = c.Inverter(x, $"inv{i}");
            }

            var k = 0;
            while (true)
            {
                x = c.TransmissionGate(x, k % 2 == 0 ? clk.High : clk.Low, "tg" + k);
                k += 1;
                if (k >= 3) break;
            }

            var m = 10;
            do
            {
                x = c.Buffer(x);
                m -= 4;
            }
            while (m > 0);

            long total = 0;
            foreach (var weight in new[] { 1, 2, 3 })
                total += weight * 1_000_000_000L;
            x = c.Inverter(x, "total" + total);
            c.Output("out", x);
        }
    }

    public sealed class NestedLoops : Design
    {
        private const int Rows = 3;

        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 2.Nanoseconds());
            for (var row = 0; row < Rows; row++)
            {
                var x = c.Input($"d{row}");
                for (var col = 0; col <= row + 1; col++)
                {
                    x = col % 2 == 0 ? c.DynamicLatch(x, clk.High, $"r{row}c{col}") : c.DynamicLatch(x, clk.Low, $"r{row}c{col:D2}|{row,3}");
                    if (col == 2) break;
                }

                c.Output($"q{row}", x);
            }
        }
    }

    public enum Stage { Fast, Slow, Held }

    public sealed class Switches : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 3.Nanoseconds());
            var x = c.Input("x");
            Stage[] stages = { Stage.Fast, Stage.Slow, Stage.Held, Stage.Fast };
            for (var i = 0; i < stages.Length; i++)
            {
                switch (stages[i])
                {
                    case Stage.Fast:
                        x = c.Inverter(x);
                        break;
                    case Stage.Slow:
                        x = c.Buffer(x);
                        break;
                    default:
                        x = c.StaticLatch(x, clk.High);
                        break;
                }
            }

            for (var width = 1; width <= 12; width += 3)
            {
                var resistance = width switch
                {
                    < 3 => 8.Kiloohms(),
                    >= 3 and < 8 => 5.Kiloohms(),
                    _ => 2.5.Kiloohms(),
                };
                x = c.TransmissionGate(x, clk.Low, $"w{width}", resistance);
            }

            var polarity = clk.High.Polarity == ClockPolarity.High ? "high" : "low";
            c.Output("y_" + polarity, x);
        }
    }

    public sealed class ProcessAndClocks : Design
    {
        protected override void Describe(Circuit c)
        {
            c.UseProcess(new Process
            {
                Name = "demo-process",
                PassGateResistance = 6.Kiloohms(),
                WireCapacitance = 0.5.Femtofarads(),
                StorageLeakage = Math.Max(2, 3).Picoamperes(),
            });
            var root = c.Clock("root", 10.Nanoseconds(), duty: 0.5);
            var enable = c.Input("enable");
            var gated = c.ClockGate(root, enable, ClockStopLevel.High, 200.Nanoseconds(), "gated");
            var late = c.BufferedClock(gated, delay: Math.Sqrt(2500).Picoseconds());
            var d = c.Input("d");
            var q = c.DynamicRegister(d, late, "reg");
            c.Keeper(q);
            c.Output("q", q);
        }
    }

    public sealed class FieldsAndProperties : Design
    {
        private static readonly int Width = 2 + 1;
        private readonly string prefix = "bit";
        private int made;

        public Time Period { get; } = 4.Nanoseconds();

        private double Ratio => 1.5 * Width;

        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", Period);
            for (var i = 0; i < Width; i++)
            {
                var d = c.Input(prefix + i);
                made++;
                c.Output($"{prefix}{i}_q", c.DynamicLatch(d, clk.High, $"{prefix}{i}_l{made}"));
            }

            var n = c.Input("extra");
            c.SetCapacitance(n, (Ratio * 2).Femtofarads());
        }
    }

    // Circuit.Exclusive called in each form a designer writes it: listed nets, an array, a collection made by a loop.
    public sealed class ExclusiveSelects : Design
    {
        protected override void Describe(Circuit c)
        {
            var a0 = c.Input("a0");
            var a1 = c.Input("a1");
            var na0 = c.Inverter(a0, "na0");
            var na1 = c.Inverter(a1, "na1");
            var selects = new[] { c.Nor(a1, a0, "s0"), c.Nor(a1, na0, "s1"), c.Nor(na1, a0, "s2"), c.Nor(na1, na0, "s3") };
            c.Exclusive(selects);
            c.Exclusive(selects[0], selects[3]);
            var arms = new System.Collections.Generic.List<Net>();
            for (var i = 0; i < 2; i++)
                arms.Add(c.Inverter(selects[i], "arm" + i));
            c.Exclusive(arms.ToArray());

            var bit = c.Node("bit");
            for (var i = 0; i < selects.Length; i++)
                c.TransmissionGate(c.Input("d" + i), selects[i], bit);
            c.Output("q", c.Inverter(bit));
        }
    }
}
