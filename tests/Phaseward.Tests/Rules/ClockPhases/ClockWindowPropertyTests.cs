using System;
using System.Collections.Generic;
using System.Linq;
using CsCheck;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;
using Phaseward.Tests.Properties;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1001, PW1002 and PW1003 against an independent simulation of the clock waveforms. Random pipelines of latches
/// (library cells, hand-built dynamic, keeper and static latches, registers, two-register synchronizers) on random
/// phases of one to three root clocks (periods of 1, 2 or 3 ns, or 1.414 ns, with offsets, complement skews of 0, 30
/// or 80 ps; some declared independent)
/// and their gated and buffered copies, joined by random logic (inverters, buffers, NANDs, data-controlled pass gates,
/// loops included), drawn by CsCheck from a choice sequence (<see cref="ChoiceSequence"/>, so a failure shrinks), are
/// built twice: as a netlist through the DSL, and as an abstract model that knows only "latch on
/// (clock, polarity) fed by this signal", "gate fed by these signals" and each clock's figures.
/// </summary>
/// <remarks>
/// The simulation never calls Phaseward's window code. It samples the waveforms every picosecond over the common
/// cycle: a clock is high while ((t − offset − delay) mod T) &lt; T/2 and its complement is the inverse of the clock
/// delayed by its root's skew, so a transmission gate on High conducts while clk(t) or clk(t − skew) is high (its nMOS on the
/// clock, its pMOS on the late complement) and one on Low while either is low. Clocks are related when neither is
/// declared independent and their periods are both among {1, 2, 3} ns or both 1.414 ns (500/707 is no small ratio);
/// a clock's copies share its root. For every pair of latches joined by logic (no latch between), the expected
/// findings follow from the sampled windows and the rules' stated scope: PW1001 when the two are transparent together
/// without a break for longer than a quarter of the shorter window, except a register's slave feeding a register's
/// master (a register-to-register path); PW1002 (with a required margin of 1 s, so that every race is reported) when
/// they overlap for less than that and the catching latch is open just after an opening of the launching one; PW1003
/// when the clocks are unrelated and the catching latch is not the master of a register followed directly by another
/// register of its clock.
/// </remarks>
public class ClockWindowPropertyTests
{
    // Complement skews a root clock may have (its copies inherit it): none, the common 30 ps, and a late 80 ps.
    private static readonly int[] SkewsPs = { 0, 30, 80 };
    private const int OddPeriodPs = 1414;

    private enum Style { DynamicCell, StaticCell, HandDynamic, HandKeeper, HandStatic, DynamicRegister, StaticRegister, Synchronizer }

    private enum GateKind { Inverter, Buffer, Nand, DataPass }

    private readonly record struct Signal(char Kind, int Index);

    private sealed record AbstractClock(int Root, int PeriodPs, int OffsetPs, int DelayPs, bool Independent, int SkewPs);

    private sealed record AbstractLatch(string Name, int Clock, ClockPolarity Polarity, Signal Input, string? Register, bool IsMaster);

    private sealed record AbstractGate(Signal[] Inputs);

    private sealed class Model
    {
        public List<AbstractClock> Clocks { get; } = new();
        public List<AbstractLatch> Latches { get; } = new();
        public List<AbstractGate> Gates { get; } = new();
    }

    // Sequences long enough for the largest pipelines (about 100 choices); shorter ones make smaller designs.
    private static readonly Gen<int[]> Pipelines = ChoiceSequence.Of(160);

    private static readonly Rule[] Rules = { new SameWindowLatchesRule(), new OverlapRaceRule(), new ClockCrossingRule() };

    [Fact]
    public void Pw1001Pw1002AndPw1003FireExactlyWhereTheSampledWaveformsSayTheyShould()
    {
        var seen = new Dictionary<string, int> { ["PW1001"] = 0, ["PW1002"] = 0, ["PW1003"] = 0 };
        var clean = 0;
        var samples = 0;
        // CsCheck draws the pipelines (a fresh seed each run); a failure is shrunk to a small pipeline and reported
        // with the seed that reproduces it (CsCheck_Seed).
        Pipelines.Sample(choices =>
        {
            var expected = CheckPipeline(choices, Rules);
            lock (seen)
            {
                samples++;
                foreach (var id in expected.Select(e => e.Item1).Distinct()) seen[id]++;
                if (expected.Count == 0) clean++;
            }
        }, iter: 400, print: Describe);

        // Every outcome must be well represented, or the comparison proves little.
        Assert.Equal(400, samples);
        Assert.All(seen, pair => Assert.True(pair.Value >= 30, $"only {pair.Value} pipelines with {pair.Key} ({string.Join(", ", seen)}, {clean} clean)"));
        Assert.True(clean >= 5, $"only {clean} clean pipelines");
    }

    // A test of the test: a PW1001 rule with a planted bug (it drops a latch fed back into itself in its own phase, a
    // case the simulation does report) must make the property fail, and CsCheck must report a shrunk pipeline of a
    // latch or two rather than the large random one it first met, with the seed that reproduces it. The shrink is a
    // random search over the iterations: with 10,000 it stopped at three latches in a fresh-clone CI run, so it has
    // 100,000 (under a second).
    [Fact]
    public void A_broken_rule_fails_the_property_with_a_shrunk_pipeline_and_its_seed()
    {
        var broken = new Rule[] { new SelfLoopBlindSameWindowRule(), new OverlapRaceRule(), new ClockCrossingRule() };

        var failure = Assert.Throws<CsCheckException>(() => Pipelines.Sample(choices => { CheckPipeline(choices, broken); }, iter: 100000, print: Describe));

        Assert.Contains("CsCheck_Seed", failure.Message, StringComparison.Ordinal);
        Assert.Contains("missing [(PW1001,", failure.ToString(), StringComparison.Ordinal);
        var latches = int.Parse(System.Text.RegularExpressions.Regex.Match(failure.Message, @"pipeline of (\d+) latch").Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
        Assert.InRange(latches, 1, 2);
    }

    /// <summary>Builds the pipeline the choices describe and compares the rules' findings with the simulation's.</summary>
    private static HashSet<(string, string, string)> CheckPipeline(int[] choices, IReadOnlyList<Rule> rules)
    {
        var (circuit, model) = Generate(new ChoiceSequence(choices), 0);
        var expected = Expected(model);
        var netlist = circuit.ToNetlist();
        var policy = new RulePolicy { MinimumRaceMargin = 1.Seconds() };
        var actual = new HashSet<(string, string, string)>();
        foreach (var rule in rules)
        {
            foreach (var f in rule.Check(new RuleContext(netlist, policy)))
                Assert.True(actual.Add((f.RuleId, f.Properties[FindingPropertyKeys.SourceLatch], f.Properties[FindingPropertyKeys.TargetLatch])),
                    $"{f.RuleId} reported a pair twice");
        }

        var missing = expected.Except(actual).ToArray();
        var extra = actual.Except(expected).ToArray();
        Assert.True(missing.Length == 0 && extra.Length == 0, $"missing [{string.Join(", ", missing)}], extra [{string.Join(", ", extra)}]");
        return expected;
    }

    /// <summary>What CsCheck prints for a failing case: its size and the netlist, whose text names every part.</summary>
    private static string Describe(int[] choices)
    {
        var sequence = new ChoiceSequence(choices);
        var (circuit, model) = Generate(sequence, 0);
        return $"pipeline of {model.Latches.Count} latch(es), {model.Gates.Count} gate(s), {model.Clocks.Count} clock(s) from {sequence.Used} choice(s):\n"
            + Phaseward.Netlists.NetlistText.Write(circuit.ToNetlist(), includeSpans: false);
    }

    /// <summary>PW1001 with a planted bug: it forgets a latch whose own output comes back to its input.</summary>
    private sealed class SelfLoopBlindSameWindowRule : Rule
    {
        private readonly SameWindowLatchesRule rule = new();

        public override IReadOnlyList<RuleDescriptor> Descriptors => rule.Descriptors;

        public override IEnumerable<Finding> Check(RuleContext context)
            => rule.Check(context).Where(f => f.Properties[FindingPropertyKeys.SourceLatch] != f.Properties[FindingPropertyKeys.TargetLatch]);
    }

    private static HashSet<(string, string, string)> Expected(Model model)
    {
        var expected = new HashSet<(string, string, string)>();
        for (var a = 0; a < model.Latches.Count; a++)
        {
            var reached = Reached(model, a);
            for (var b = 0; b < model.Latches.Count; b++)
            {
                if (!reached.Contains(b)) continue;
                var la = model.Latches[a];
                var lb = model.Latches[b];
                var ca = model.Clocks[la.Clock];
                var cb = model.Clocks[lb.Clock];
                if (CommonCyclePs(ca, cb) is not { } cycle)
                {
                    if (!IsSynchronized(model, b))
                        expected.Add(("PW1003", la.Name, lb.Name));
                    continue;
                }

                var registerToRegister = la.Register is not null && !la.IsMaster && lb.Register is not null && lb.IsMaster;
                if (registerToRegister) continue;
                var openA = Sample(ca, la.Polarity, cycle);
                var openB = Sample(cb, lb.Polarity, cycle);
                var together = LongestRun(openA, openB);
                var allowance = 0.25 * Math.Min(OpenPerPeriod(openA, ca.PeriodPs), OpenPerPeriod(openB, cb.PeriodPs));
                if (together > allowance)
                    expected.Add(("PW1001", la.Name, lb.Name));
                else if (together > 0 && OpenAtAnOpening(openA, openB))
                    expected.Add(("PW1002", la.Name, lb.Name));
            }
        }

        return expected;
    }

    // The latches whose input data from latch a reaches through gates only (no latch between).
    private static HashSet<int> Reached(Model model, int a)
    {
        var gates = new bool[model.Gates.Count];
        bool changed;
        do
        {
            changed = false;
            for (var g = 0; g < model.Gates.Count; g++)
                if (!gates[g] && model.Gates[g].Inputs.Any(Carries))
                    changed = gates[g] = true;
        }
        while (changed);

        var reached = new HashSet<int>();
        for (var b = 0; b < model.Latches.Count; b++)
            if (Carries(model.Latches[b].Input)) reached.Add(b);
        return reached;

        bool Carries(Signal s) => s.Kind == 'L' ? s.Index == a : s.Kind == 'G' && gates[s.Index];
    }

    private static bool IsSynchronized(Model model, int b)
    {
        var latch = model.Latches[b];
        if (latch.Register is null || !latch.IsMaster) return false;
        var slave = model.Latches.FindIndex(l => l.Register == latch.Register && !l.IsMaster);
        return model.Latches.Any(l => l.IsMaster && l.Register is not null && l.Register != latch.Register
                                      && l.Input == new Signal('L', slave)
                                      && model.Clocks[l.Clock].Root == model.Clocks[latch.Clock].Root);
    }

    private static int? CommonCyclePs(AbstractClock a, AbstractClock b)
    {
        if (a.Root == b.Root) return a.PeriodPs;
        if (a.Independent || b.Independent) return null;
        var oddA = a.PeriodPs == OddPeriodPs;
        var oddB = b.PeriodPs == OddPeriodPs;
        if (oddA != oddB) return null;
        return oddA ? OddPeriodPs : Lcm(a.PeriodPs, b.PeriodPs);
    }

    private static int Lcm(int a, int b)
    {
        int x = a, y = b;
        while (y != 0) (x, y) = (y, x % y);
        return a / x * b;
    }

    // Whether the pass gate conducts at t = k + 0.5 ps, k = 0 .. cycle − 1.
    private static bool[] Sample(AbstractClock clock, ClockPolarity polarity, int cycle)
    {
        var open = new bool[cycle];
        for (var k = 0; k < cycle; k++)
        {
            var t = k + 0.5;
            var now = High(clock, t);
            var skewed = High(clock, t - clock.SkewPs);
            open[k] = polarity == ClockPolarity.High ? now || skewed : !now || !skewed;
        }

        return open;
    }

    private static bool High(AbstractClock clock, double t)
    {
        var phase = (t - clock.OffsetPs - clock.DelayPs) % clock.PeriodPs;
        if (phase < 0) phase += clock.PeriodPs;
        return phase < clock.PeriodPs / 2.0;
    }

    private static int OpenPerPeriod(bool[] open, int period) => open.Take(period).Count(o => o);

    // The longest run of samples (cyclic) where both conduct.
    private static int LongestRun(bool[] a, bool[] b)
    {
        var n = a.Length;
        if (Enumerable.Range(0, n).All(k => a[k] && b[k])) return n;
        int longest = 0, run = 0;
        for (var k = 0; k < 2 * n; k++)
        {
            run = a[k % n] && b[k % n] ? run + 1 : 0;
            longest = Math.Max(longest, Math.Min(run, n));
        }

        return longest;
    }

    private static bool OpenAtAnOpening(bool[] a, bool[] b)
    {
        var n = a.Length;
        for (var k = 0; k < n; k++)
            if (a[k] && !a[(k + n - 1) % n] && b[k]) return true;
        return false;
    }

    private static (Circuit, Model) Generate(Random random, int seed)
    {
        var c = new Circuit("pipeline" + seed);
        var model = new Model();
        var clocks = new List<(Clock Clock, int Index)>();
        var roots = random.Next(1, 4);
        for (var r = 0; r < roots; r++)
        {
            var period = random.Next(5) switch { 0 => OddPeriodPs, 1 => 2000, 2 => 3000, _ => 1000 };
            var offset = new[] { 0, 100, 250, 400, 500, 750 }[random.Next(6)];
            var independent = r > 0 && random.Next(5) == 0;
            var skew = SkewsPs[random.Next(SkewsPs.Length)];
            var root = c.Clock("clk" + r, period.Picoseconds(), 0.5, skew.Picoseconds(), offset.Picoseconds(), independent);
            Add(root, new AbstractClock(r, period, offset, 0, independent, skew));
            if (random.Next(2) == 0)
                Add(c.ClockGate(root, c.Input("en" + r)), new AbstractClock(r, period, offset, 0, independent, skew));
            if (random.Next(2) == 0)
            {
                // Delays either side of the overlap allowance: a 1 ns High window (530 ps) and its copy 390 ps later
                // are together for 140 ps (> 132.5 ps), 400 ps later for 130 ps.
                var delay = new[] { 20, 35, 120, 250, 390, 400, 500 }[random.Next(7)];
                Add(c.BufferedClock(root, delay.Picoseconds()), new AbstractClock(r, period, offset, delay, independent, skew));
            }
        }

        var inputs = new List<Net>();
        for (var i = 0; i < 3; i++) inputs.Add(c.Input("in" + i));

        var unitCount = random.Next(1, 7);
        var unitInputs = new List<Net>();
        var unitOutputs = new List<Net>();
        var unitOutputSignals = new List<Signal>();
        var unitFirstLatch = new List<int>();
        for (var u = 0; u < unitCount; u++)
        {
            var d = c.Node("d" + u);
            unitInputs.Add(d);
            var (clock, clockIndex) = clocks[random.Next(clocks.Count)];
            var polarity = random.Next(2) == 0 ? ClockPolarity.High : ClockPolarity.Low;
            var phase = clock[polarity];
            var name = "U" + u;
            var style = (Style)random.Next(8);
            unitFirstLatch.Add(model.Latches.Count);
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

                case Style.Synchronizer:
                    output = c.StaticRegister(c.StaticRegister(d, clock, name), clock, name + "s");
                    break;
                default:
                    output = style == Style.DynamicRegister ? c.DynamicRegister(d, clock, name) : c.StaticRegister(d, clock, name);
                    break;
            }

            if (style is Style.DynamicRegister or Style.StaticRegister or Style.Synchronizer)
            {
                AddRegister(name, clockIndex, default);
                if (style == Style.Synchronizer)
                    AddRegister(name + "s", clockIndex, new Signal('L', model.Latches.Count - 1));
            }
            else
            {
                model.Latches.Add(new AbstractLatch(name, clockIndex, polarity, default, null, false));
            }

            unitOutputs.Add(output);
            unitOutputSignals.Add(new Signal('L', model.Latches.Count - 1));
        }

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
                        signal = AddGate(signal);
                        break;
                    case GateKind.Buffer:
                        net = c.Buffer(net);
                        signal = AddGate(signal);
                        break;
                    case GateKind.Nand:
                        {
                            var (other, otherSignal) = PickSource();
                            net = c.Nand(net, other);
                            signal = AddGate(signal, otherSignal);
                            break;
                        }

                    default:
                        {
                            var (control, controlSignal) = PickSource();
                            net = c.TransmissionGate(net, control);
                            signal = AddGate(signal, controlSignal);
                            break;
                        }
                }
            }

            if (random.Next(2) == 0) c.Inverter(net, unitInputs[u]);
            else c.Buffer(net, unitInputs[u]);
            signal = AddGate(signal);
            var first = unitFirstLatch[u];
            model.Latches[first] = model.Latches[first] with { Input = signal };
        }

        return (c, model);

        void Add(Clock clock, AbstractClock figures)
        {
            clocks.Add((clock, model.Clocks.Count));
            model.Clocks.Add(figures);
        }

        // A rising-edge register: master open while low, slave while high.
        void AddRegister(string name, int clockIndex, Signal input)
        {
            model.Latches.Add(new AbstractLatch(name + ".master", clockIndex, ClockPolarity.Low, input, name, true));
            model.Latches.Add(new AbstractLatch(name + ".slave", clockIndex, ClockPolarity.High, new Signal('L', model.Latches.Count - 1), name, false));
        }

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

        Signal AddGate(params Signal[] gateInputs)
        {
            model.Gates.Add(new AbstractGate(gateInputs));
            return new Signal('G', model.Gates.Count - 1);
        }
    }
}
