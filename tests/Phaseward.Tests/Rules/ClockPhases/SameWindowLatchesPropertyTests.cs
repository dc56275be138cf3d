using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1001 against an independent phase-stepped simulation. Random pipelines of latches (library cells, hand-built
/// dynamic, keeper and static latches, registers) on random phases of one or two root clocks and their gated and
/// buffered copies, joined by random logic (inverters, buffers, NANDs, data-controlled pass gates, loops included),
/// are built twice: as a netlist through the DSL, and as an abstract model that knows only "latch on (root, polarity)
/// fed by this gate" and "gate fed by these signals". The simulation works on the abstract model only: it steps
/// through the phases of each root clock (High, then Low); in a step every latch of that root and polarity is
/// transparent, and data that crosses one transparent latch flows through the logic (iterated to a fixed point) to
/// every latch input it reaches; where that latch is transparent too, data has crossed two latches in one phase.
/// PW1001 must report exactly those (source, target) pairs.
/// </summary>
/// <remarks>
/// Gated copies are simulated enabled and buffered copies at their root's level (a buffer delays the window, it does
/// not change which phase it belongs to). Unrelated root clocks run asynchronously, so each root's phases are
/// stepped on their own: PW1001 is about the windows of one clock. Both are the rule's stated scope, not results.
/// </remarks>
public class SameWindowLatchesPropertyTests
{
    private enum Style { DynamicCell, StaticCell, HandDynamic, HandKeeper, HandStatic, DynamicRegister, StaticRegister }

    private enum GateKind { Inverter, Buffer, Nand, DataPass }

    // A signal in the abstract model: a primary input, a latch output or a gate output.
    private readonly record struct Signal(char Kind, int Index);

    private sealed record AbstractLatch(string Name, int Root, ClockPolarity Polarity, Signal Input);

    private sealed record AbstractGate(GateKind Kind, Signal[] Inputs);

    private sealed class Model
    {
        public List<AbstractLatch> Latches { get; } = new();
        public List<AbstractGate> Gates { get; } = new();
        public int Roots { get; set; }
    }

    [Fact]
    public void Pw1001FiresExactlyWhereThePhaseSteppedSimulationSeesDataCrossTwoLatchesInOnePhase()
    {
        var withFindings = 0;
        var clean = 0;
        for (var seed = 1; seed <= 300; seed++)
        {
            var (circuit, model) = Generate(new Random(seed), seed);
            var expected = Simulate(model);
            var findings = new SameWindowLatchesRule().Check(new RuleContext(circuit.ToNetlist(), RulePolicy.Default)).ToArray();
            var actual = findings.Select(f => (f.Properties[FindingProperties.SourceLatch], f.Properties[FindingProperties.TargetLatch])).ToList();

            Assert.True(actual.Count == actual.Distinct().Count(), $"seed {seed}: a pair was reported twice");
            var missing = expected.Except(actual).ToArray();
            var extra = actual.Except(expected).ToArray();
            Assert.True(missing.Length == 0 && extra.Length == 0,
                $"seed {seed}: missing [{string.Join(", ", missing)}], extra [{string.Join(", ", extra)}]\n{circuit.ToNetlist()}");
            if (expected.Count > 0) withFindings++;
            else clean++;
        }

        // Both outcomes must be well represented, or the comparison proves little.
        Assert.True(withFindings >= 50, $"only {withFindings} pipelines with same-phase pairs");
        Assert.True(clean >= 50, $"only {clean} pipelines without");
    }

    private static HashSet<(string, string)> Simulate(Model model)
    {
        var crossings = new HashSet<(string, string)>();
        for (var root = 0; root < model.Roots; root++)
        {
            foreach (var polarity in new[] { ClockPolarity.High, ClockPolarity.Low })
            {
                var open = model.Latches.Select(l => l.Root == root && l.Polarity == polarity).ToArray();
                // Which latches' fresh data is on each gate output, iterated until nothing changes.
                var gateData = model.Gates.Select(_ => new HashSet<int>()).ToArray();
                bool changed;
                do
                {
                    changed = false;
                    for (var g = 0; g < model.Gates.Count; g++)
                        foreach (var input in model.Gates[g].Inputs)
                            foreach (var origin in DataOn(input, open, gateData))
                                changed |= gateData[g].Add(origin);
                }
                while (changed);

                for (var b = 0; b < model.Latches.Count; b++)
                {
                    if (!open[b]) continue;
                    foreach (var a in DataOn(model.Latches[b].Input, open, gateData))
                        crossings.Add((model.Latches[a].Name, model.Latches[b].Name));
                }
            }
        }

        return crossings;
    }

    // Data that crossed a transparent latch in this step: a transparent latch's output carries its own (new) data;
    // a shut latch's output carries nothing new; a primary input nothing.
    private static IEnumerable<int> DataOn(Signal signal, bool[] open, HashSet<int>[] gateData) => signal.Kind switch
    {
        'L' => open[signal.Index] ? new[] { signal.Index } : Array.Empty<int>(),
        'G' => gateData[signal.Index],
        _ => Array.Empty<int>(),
    };

    private static (Circuit, Model) Generate(Random random, int seed)
    {
        var c = new Circuit("pipeline" + seed);
        var model = new Model { Roots = random.Next(4) == 0 ? 2 : 1 };
        var clocks = new List<(Clock Clock, int Root)>();
        for (var r = 0; r < model.Roots; r++)
        {
            var root = c.Clock("clk" + r, (1 + r).Nanoseconds());
            clocks.Add((root, r));
            if (random.Next(2) == 0) clocks.Add((c.ClockGate(root, c.Input("en" + r)), r));
            if (random.Next(2) == 0) clocks.Add((c.BufferedClock(root, 20.Picoseconds()), r));
            if (random.Next(3) == 0) clocks.Add((c.BufferedClock(c.ClockGate(root, c.Input("en" + r + "b")), 35.Picoseconds()), r));
        }

        var inputs = new List<Net>();
        for (var i = 0; i < 3; i++) inputs.Add(c.Input("in" + i));

        // Units: each is a latch or a register, fed from a node driven later (so loops are possible).
        var unitCount = random.Next(1, 7);
        var unitInputs = new List<Net>();
        var unitOutputs = new List<Net>();
        var unitOutputSignals = new List<Signal>();
        var unitFirstLatch = new List<int>();
        var pendingInputs = new List<int>(); // abstract latch index whose Input is set when the unit's logic is built
        for (var u = 0; u < unitCount; u++)
        {
            var d = c.Node("d" + u);
            unitInputs.Add(d);
            var (clock, root) = clocks[random.Next(clocks.Count)];
            var polarity = random.Next(2) == 0 ? ClockPolarity.High : ClockPolarity.Low;
            var phase = clock[polarity];
            var name = "U" + u;
            var style = (Style)random.Next(7);
            Net output;
            switch (style)
            {
                case Style.DynamicCell:
                    output = c.DynamicLatch(d, phase, name);
                    break;
                case Style.StaticCell:
                    output = c.StaticLatch(d, phase, name);
                    break;
                case Style.HandDynamic:
                    output = c.Inverter(c.TransmissionGate(d, phase, name));
                    break;
                case Style.HandKeeper:
                    {
                        var x = c.TransmissionGate(d, phase, name);
                        output = c.Inverter(x);
                        c.Keeper(x);
                        break;
                    }

                case Style.HandStatic:
                    {
                        var x = c.Node(name);
                        c.TransmissionGate(d, phase, x);
                        output = c.Inverter(x);
                        c.TransmissionGate(c.Inverter(output), phase.Complement, x);
                        break;
                    }

                default:
                    output = style == Style.DynamicRegister ? c.DynamicRegister(d, clock, name) : c.StaticRegister(d, clock, name);
                    break;
            }

            unitOutputs.Add(output);
            unitFirstLatch.Add(model.Latches.Count);
            if (style is Style.DynamicRegister or Style.StaticRegister)
            {
                model.Latches.Add(new AbstractLatch(name + ".master", root, ClockPolarity.Low, default));
                model.Latches.Add(new AbstractLatch(name + ".slave", root, ClockPolarity.High, new Signal('L', model.Latches.Count - 1)));
                unitOutputSignals.Add(new Signal('L', model.Latches.Count - 1));
            }
            else
            {
                model.Latches.Add(new AbstractLatch(name, root, polarity, default));
                unitOutputSignals.Add(new Signal('L', model.Latches.Count - 1));
            }

            pendingInputs.Add(unitFirstLatch[u]);
        }

        // The logic in front of each unit: a source, up to three random stages, and a restoring stage into its node.
        for (var u = 0; u < unitCount; u++)
        {
            var (net, signal) = PickSource();
            var stages = random.Next(4);
            for (var s = 0; s < stages; s++)
            {
                switch ((GateKind)random.Next(4))
                {
                    case GateKind.Inverter:
                        net = c.Inverter(net);
                        signal = AddGate(GateKind.Inverter, signal);
                        break;
                    case GateKind.Buffer:
                        net = c.Buffer(net);
                        signal = AddGate(GateKind.Buffer, signal);
                        break;
                    case GateKind.Nand:
                        {
                            var (other, otherSignal) = PickSource();
                            net = c.Nand(net, other);
                            signal = AddGate(GateKind.Nand, signal, otherSignal);
                            break;
                        }

                    default:
                        {
                            var (control, controlSignal) = PickSource();
                            net = c.TransmissionGate(net, control);
                            signal = AddGate(GateKind.DataPass, signal, controlSignal);
                            break;
                        }
                }
            }

            if (random.Next(2) == 0)
            {
                c.Inverter(net, unitInputs[u]);
                signal = AddGate(GateKind.Inverter, signal);
            }
            else
            {
                c.Buffer(net, unitInputs[u]);
                signal = AddGate(GateKind.Buffer, signal);
            }

            var latch = pendingInputs[u];
            model.Latches[latch] = model.Latches[latch] with { Input = signal };
        }

        return (c, model);

        (Net, Signal) PickSource()
        {
            if (random.Next(3) == 0)
            {
                var i = random.Next(inputs.Count);
                return (inputs[i], new Signal('I', i));
            }

            var u = random.Next(unitCount);
            return (unitOutputs[u], unitOutputSignals[u]);
        }

        Signal AddGate(GateKind kind, params Signal[] gateInputs)
        {
            model.Gates.Add(new AbstractGate(kind, gateInputs));
            return new Signal('G', model.Gates.Count - 1);
        }
    }
}
