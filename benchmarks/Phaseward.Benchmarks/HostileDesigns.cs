using System;
using System.Collections.Generic;
using System.Linq;

namespace Phaseward.Benchmarks;

/// <summary>
/// Designs whose size sits in one place: one net with a huge fan-out or fan-in, one clock domain cut into thousands
/// of gated clocks, a chain whose latch-to-latch paths grow with the square of its length. Each is made at run time
/// with <c>n</c> repeated parts; <see cref="ScalingRuns"/> checks that the analysis grows in proportion to the design.
/// The scenario and its figures are invented for the benchmark.
/// </summary>
internal sealed class HostileDesign : Design
{
    public static readonly IReadOnlyList<(string Name, string What)> Shapes = new[]
    {
        ("register-file", "n static registers written from one shared data net"),
        ("one-hot-bus", "n pass gates onto one bus, their selects stated exclusive in one group"),
        ("gated-clocks", "n clock gates on one clock, each clocking a dynamic latch from one shared data net"),
        ("shared-stall", "n/2 clock gates whose enables all take one stall signal made by a chain of n/2 stages from one latch"),
        ("mux-tree", "a binary pass-gate mux tree of n inputs, restored every third level"),
        ("shift-chain", "n static latches in series on alternate phases"),
        ("keeper-bus", "n write paths onto one kept node"),
        ("ripple-counter", "n registers whose carry ripples through all later bits: n + n(n - 1)/2 latch paths"),
        ("reduction-chain", "n latched bits folded by a chain of NANDs into one latch: a latch's search grows with the chain"),
    };

    private readonly string shape;
    private readonly int n;

    public HostileDesign(string shape, int n)
    {
        if (Shapes.All(s => s.Name != shape))
            throw new ArgumentException($"No hostile shape '{shape}' (known: {string.Join(", ", Shapes.Select(s => s.Name))}).", nameof(shape));
        this.shape = shape;
        this.n = n;
    }

    public override string Name => shape + "-" + n;

    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 10.Nanoseconds());
        switch (shape)
        {
            case "register-file":
                {
                    var d = c.Input("d");
                    for (var i = 0; i < n; i++) c.Output("q" + i, c.StaticRegister(d, clk, "r" + i));
                    break;
                }
            case "one-hot-bus":
                {
                    var bus = c.Node("bus");
                    var selects = Enumerable.Range(0, n).Select(i => c.Input("sel" + i)).ToArray();
                    c.Exclusive(selects);
                    for (var i = 0; i < n; i++) c.TransmissionGate(c.Input("d" + i), selects[i], bus);
                    c.Output("q", c.Inverter(bus));
                    break;
                }
            case "gated-clocks":
                {
                    var d = c.Input("d");
                    for (var i = 0; i < n; i++)
                    {
                        var gated = c.ClockGate(clk, c.Input("en" + i), maxIdle: 1.Microseconds());
                        c.Output("q" + i, c.DynamicLatch(d, gated.High, "l" + i));
                    }

                    break;
                }
            case "shared-stall":
                {
                    var stall = c.StaticLatch(c.Input("stall_request"), clk.Low, "stall_latch");
                    for (var i = 0; i < n / 2; i++) stall = c.Inverter(stall);
                    var d = c.Input("d");
                    for (var i = 0; i < n / 2; i++)
                    {
                        var gated = c.ClockGate(clk, c.Nand(c.Input("want" + i), stall), maxIdle: 1.Microseconds());
                        c.Output("q" + i, c.DynamicLatch(d, gated.High, "l" + i));
                    }

                    break;
                }
            case "mux-tree":
                {
                    var level = Enumerable.Range(0, n).Select(i => c.Input("d" + i)).ToList();
                    for (var depth = 0; level.Count > 1; depth++)
                    {
                        var select = c.Input("s" + depth);
                        var inverse = c.Inverter(select);
                        var next = new List<Net>();
                        for (var i = 0; i + 1 < level.Count; i += 2)
                        {
                            var o = c.Node();
                            c.TransmissionGate(level[i], select, o);
                            c.TransmissionGate(level[i + 1], inverse, o);
                            next.Add(depth % 3 == 2 ? c.Inverter(c.Inverter(o)) : o);
                        }

                        level = next;
                    }

                    c.Output("q", c.Inverter(level[0]));
                    break;
                }
            case "shift-chain":
                {
                    var x = c.Input("d");
                    for (var i = 0; i < n; i++) x = c.StaticLatch(x, i % 2 == 0 ? clk.High : clk.Low, "s" + i);
                    c.Output("q", x);
                    break;
                }
            case "keeper-bus":
                {
                    var node = c.Node("kept");
                    c.Keeper(node);
                    for (var i = 0; i < n; i++) c.TransmissionGate(c.Inverter(c.Input("d" + i)), c.Input("w" + i), node);
                    c.Output("q", c.Inverter(node));
                    break;
                }
            case "ripple-counter":
                {
                    var carry = c.Input("count_enable");
                    for (var bit = 0; bit < n; bit++) carry = c.Nand(c.DynamicRegister(carry, clk, "count" + bit), carry);
                    c.Output("carry_out", carry);
                    break;
                }
            case "reduction-chain":
                {
                    var folded = c.StaticLatch(c.Input("a0"), clk.High, "s0");
                    for (var i = 1; i < n; i++) folded = c.Nand(folded, c.StaticLatch(c.Input("a" + i), clk.High, "s" + i));
                    c.Output("q", c.DynamicLatch(folded, clk.Low, "sink"));
                    break;
                }
        }
    }
}
