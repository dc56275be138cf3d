using System.Collections.Generic;
using Phaseward;
using Phaseward.Sequencing;

namespace ParityDesigns
{
    public sealed class Helpers : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 4.Nanoseconds());
            var x = c.Input("x");
            x = Stage(c, x, clk.High, "s0");
            x = Cells.InverterChain(c, x, 3, "chain");
            x = c.Restore(x, "restored");
            c.Output("y", Stage(c, x, clk.Low, "s1"));
        }

        private Net Stage(Circuit c, Net input, Phase phase, string name)
        {
            var stored = c.DynamicLatch(input, phase, name);
            return Restore(c, stored, name + ".r");
        }

        private static Net Restore(Circuit c, Net input, string name) => c.Inverter(input, name);
    }

    public sealed class LocalFunctions : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 4.Nanoseconds());
            var count = 0;
            var x = c.Input("x");
            for (var i = 0; i < 3; i++)
                x = Latch(x, i % 2 == 0);
            c.Output("y", x);
            c.Output("count", Named(c.Inverter(x), count));

            Net Latch(Net d, bool high)
            {
                count++;
                return c.DynamicLatch(d, high ? clk.High : clk.Low, "l" + count);
            }

            static Net Named(Net n, int k) => k > 2 ? n : n;
        }
    }

    public sealed class Recursion : Design
    {
        protected override void Describe(Circuit c)
        {
            var root = c.Input("root");
            c.Output("tree", Tree(c, root, 3, "t"));
        }

        private static Net Tree(Circuit c, Net input, int depth, string path)
        {
            if (depth == 0)
                return c.Inverter(input, path);
            var left = Tree(c, c.Buffer(input, path + "L"), depth - 1, path + "l");
            var right = Tree(c, c.Buffer(input, path + "R"), depth - 1, path + "r");
            return c.Nand(left, right, path + "n");
        }
    }

    public sealed class Collections : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 4.Nanoseconds());
            var inputs = new Net[4];
            for (var i = 0; i < inputs.Length; i++)
                inputs[i] = c.Input("in" + i);

            var latched = new List<Net>();
            foreach (var input in inputs)
                latched.Add(c.DynamicLatch(input, clk.High));

            var pairs = new List<Net> { latched[0], latched[1] };
            List<Net> more = [latched[2], latched[3]];
            Net[] both = [.. pairs, .. more];
            var outputs = new List<Net>();
            for (var i = 0; i + 1 < both.Length; i += 2)
                outputs.Add(c.Nor(both[i], both[i + 1]));
            outputs[outputs.Count - 1] = c.Inverter(outputs[outputs.Count - 1]);
            for (var i = 0; i < outputs.Count; i++)
                c.Output("o" + i, outputs[i]);
        }
    }

    public sealed class Tuples : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 4.Nanoseconds());
            var (q, qb) = Complementary(c, c.Input("d"), clk);
            var pair = Complementary(c, q, clk);
            c.Output("q", pair.True);
            c.Output("qb", pair.Item2);
            c.Output("first_qb", qb);
        }

        private static (Net True, Net Inverted) Complementary(Circuit c, Net d, Clock clk)
        {
            var q = c.DynamicRegister(d, clk);
            return (q, c.Inverter(q));
        }
    }

    public sealed class Constructed : Design
    {
        private readonly int stages;
        private readonly Time period;

        public Constructed(int stages)
            : this(stages, 3.Nanoseconds())
        {
        }

        public Constructed(int stages, Time period)
        {
            this.stages = stages;
            this.period = period;
        }

        public override string Name => "constructed-" + stages;

        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", period);
            var x = c.Input("x");
            for (var i = 0; i < stages; i++)
                x = c.DynamicLatch(x, i % 2 == 0 ? clk.High : clk.Low);
            c.Output("y", x);
        }
    }

    public sealed class Primary(int width) : Design
    {
        private readonly int doubled = width * 2;

        protected override void Describe(Circuit c)
        {
            for (var i = 0; i < doubled; i++)
                c.Output("o" + i, c.Inverter(c.Input("i" + i)));
        }
    }

    public sealed class RefAndOut : Design
    {
        protected override void Describe(Circuit c)
        {
            var count = 0;
            var x = c.Input("x");
            Grow(c, ref x, ref count);
            Grow(c, ref x, ref count);
            if (TryMake(c, x, out var made))
                c.Output("y", made);
            checked
            {
                var big = int.MaxValue - count;
                c.Output("z" + big, c.Inverter(x));
            }
        }

        private static void Grow(Circuit c, ref Net x, ref int count)
        {
            count++;
            x = c.Buffer(x, "grow" + count);
        }

        private static bool TryMake(Circuit c, Net x, out Net made)
        {
            made = c.Inverter(x, "made");
            return true;
        }
    }
}
