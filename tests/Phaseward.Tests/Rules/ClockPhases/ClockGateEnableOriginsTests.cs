using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>
/// PW1004's search for an enable's origins keeps, per phase, only the latch whose data changes the enable latest, and
/// shares each net's origins between enables. Checked against the definition, worked out by listing every path from
/// each enable back to storage and inputs on random enable logic (the condition itself is common practice, see
/// <see cref="ClockGateEnableRuleTests"/>). Flat test process: every stage 27.6 ps, a pass gate 34.5 ps.
/// </summary>
public class ClockGateEnableOriginsTests
{
    private static readonly ClockGateEnableRule Rule = new();

    // A 400 ps clock: the gates (stopping low) pass it over [0, 200 ps); a latch on clk.Low opens at 200 ps and its
    // change spills into the next pass when its entry and path take longer than 200 ps, about seven stages.
    private static readonly Time Period = 400.Picoseconds();

    [Theory]
    [InlineData(1, false)]
    [InlineData(2, false)]
    [InlineData(3, true)]
    [InlineData(4, false)]
    [InlineData(5, true)]
    [InlineData(6, false)]
    [InlineData(7, true)]
    [InlineData(8, false)]
    public void RandomEnableLogicIsJudgedAsEveryPathWouldJudgeIt(int seed, bool inputsMayChange)
    {
        var random = new Random(seed);
        for (var design = 0; design < 25; design++)
        {
            var (netlist, gates) = RandomDesign(random, $"seed{seed}_{design}");
            var policy = new RulePolicy { EnablesFromInputsMayChange = inputsMayChange };
            var findings = Rule.Check(new RuleContext(netlist, policy)).ToDictionary(f => f.Properties[FindingPropertyKeys.GatedClock]);
            var model = LatchModel.Of(netlist);
            foreach (var gate in gates)
            {
                var expected = Expected(netlist, model, gate, inputsMayChange);
                findings.TryGetValue(gate.Name, out var finding);
                var context = $"design {design} of seed {seed}, gate {gate.Name}";
                if (expected is null)
                {
                    Assert.True(finding is null, $"{context}: reported, but no path breaks the condition: {finding?.Message}");
                    continue;
                }

                Assert.True(finding is not null, $"{context}: not reported, but {expected.Value.Name} breaks the condition");
                if (expected.Value.Latch is { } latch)
                {
                    Assert.Equal(latch.Name, finding!.Properties[FindingPropertyKeys.Storage]);
                    var delay = double.Parse(finding.Properties[FindingPropertyKeys.EnableDelaySeconds], CultureInfo.InvariantCulture);
                    Assert.Equal(expected.Value.EntryAndPathSeconds, delay, 1e-15);
                }
                else
                {
                    Assert.Equal(FindingPropertyValues.EnableFromInput, finding!.Properties[FindingPropertyKeys.Origin]);
                    Assert.Contains($"from primary input '{expected.Value.Name}'", finding.Message);
                }
            }

            Assert.Equal(gates.Count(g => Expected(netlist, model, g, inputsMayChange) is not null), findings.Count);
        }
    }

    [Fact]
    public void GatesSharingADeepStallChainAreEachReportedWithTheChainsLatch()
    {
        // Ten gates, each enabled by its own want input NANDed with one stall signal made by a 12-stage chain from a
        // latch open while the clock is low: 12 × 27.6 ps + the NAND + the latch's output inverter, after its entry gate.
        var c = Figures.NewCircuit("stall");
        var clk = c.Clock("clk", Period);
        var stall = c.StaticLatch(c.Input("stall_request"), clk.Low, "stall_latch");
        for (var stage = 0; stage < 12; stage++)
            stall = c.Inverter(stall);
        for (var i = 0; i < 10; i++)
            c.ClockGate(clk, c.Nand(c.Input($"want{i}"), stall), name: $"lane{i}");

        var findings = Figures.Run(Rule, c);

        Assert.Equal(10, findings.Length);
        Assert.All(findings, f => Assert.Equal("stall_latch", f.Properties[FindingPropertyKeys.Storage]));
        // Entry 34.5 ps, then the latch's inverter, 12 stages and the NAND: 14 × 27.6 ps = 386.4 ps; the change ends at
        // 200 ps + 420.9 ps.
        Assert.All(findings, f => Assert.Equal((Figures.TgPs + 14 * Figures.InvPs) * 1e-12,
            double.Parse(f.Properties[FindingPropertyKeys.EnableDelaySeconds], CultureInfo.InvariantCulture), 1e-15));
        // Shown to three figures: 386.4 ps of path, the change ending at 620.9 ps.
        Assert.Contains("can change during [200 ps, 621 ps) (from latch 'stall_latch', transparent in clk.Low, through a 386 ps path", findings[0].Message);
    }

    [Fact]
    public void ALoopInTheEnableLogicEndsTheSearchAndTheSlowestPathAroundItIsTaken()
    {
        // The enable is a NAND of the latch and its own output inverted twice: a loop with no storage (PW1005's
        // finding). The search cuts the loop where it comes back: the slowest path is latch inverter + NAND.
        var c = Figures.NewCircuit("looped");
        var clk = c.Clock("clk", Period);
        var held = c.StaticLatch(c.Input("request"), clk.High, "request_latch");
        var back = c.Node("back");
        var enable = c.Nand(held, back, "enable");
        c.Inverter(c.Inverter(enable), back);
        c.ClockGate(clk, enable, name: "gated");

        var finding = Assert.Single(Figures.Run(Rule, c));

        Assert.Equal("request_latch", finding.Properties[FindingPropertyKeys.Storage]);
        Assert.Equal((Figures.TgPs + 2 * Figures.InvPs) * 1e-12,
            double.Parse(finding.Properties[FindingPropertyKeys.EnableDelaySeconds], CultureInfo.InvariantCulture), 1e-15);
    }

    private readonly record struct Origin(string Name, Latch? Latch, double EntryAndPathSeconds);

    // The definition: every path from the enable back to storage (a latch's entry gate) or to a primary input, through
    // restoring stages and data-controlled pass gates. A latch breaks the condition when its change interval, from its
    // opening for its entry and slowest path, meets the pass [0, 200 ps) of this or the next period: a latch on
    // clk.High always, one on clk.Low when entry + path > 200 ps. Of each phase the latch with the longest change
    // (lowest index on a tie) stands for the phase; the first of those in latch order that breaks the condition is
    // named; without one, the lowest-numbered input when inputs may change.
    private static Origin? Expected(Netlist netlist, LatchModel model, Clock gate, bool inputsMayChange)
    {
        var slowest = new Dictionary<Latch, double>();
        var inputs = new List<Net>();
        Walk(gate.Enable!, 0, new HashSet<Net>());

        var half = Period.Seconds / 2;
        var standing = slowest
            .Select(pair => new Origin(pair.Key.Name, pair.Key, model.EntryDelay(pair.Key).Seconds + pair.Value))
            .GroupBy(o => o.Latch!.Phase)
            .Select(g => g.OrderByDescending(o => o.EntryAndPathSeconds).ThenBy(o => o.Latch!.Index).First())
            .Where(o => o.Latch!.Phase.Polarity == ClockPolarity.High || o.EntryAndPathSeconds > half)
            .OrderBy(o => o.Latch!.Index)
            .ToList();
        if (standing.Count > 0)
            return standing[0];
        if (inputsMayChange && inputs.Count > 0)
            return new Origin(inputs.OrderBy(n => n.Id).First().Name, null, 0);
        return null;

        void Walk(Net net, double delay, HashSet<Net> onPath)
        {
            if (netlist.IsInput(net))
            {
                inputs.Add(net);
                return;
            }

            if (!onPath.Add(net))
                return;
            foreach (var driver in netlist.DriversOf(net))
            {
                if (driver.IsWeak)
                    continue;
                if (driver.IsPassDevice && driver.ClockControl is not null)
                {
                    if (model.LatchEnteredBy(driver) is { } latch && (!slowest.TryGetValue(latch, out var known) || delay > known))
                        slowest[latch] = delay;
                    continue;
                }

                var next = delay + FirstOrderDelay.Of(netlist, driver).Seconds;
                foreach (var input in driver.Inputs)
                    Walk(input, next, onPath);
                if (driver.DataControl is { } control)
                    Walk(control, next, onPath);
            }

            onPath.Remove(net);
        }
    }

    // Latches on both phases of one clock (data from inputs), and random logic over them: inverters, NANDs, NORs and
    // data-controlled pass gates, each taking nets made before it; then clock gates on random nets of the logic.
    private static (Netlist Netlist, List<Clock> Gates) RandomDesign(Random random, string name)
    {
        var c = Figures.NewCircuit(name);
        var clk = c.Clock("clk", Period);
        var pool = new List<Net>();
        for (var i = 0; i < random.Next(1, 4); i++)
            pool.Add(c.Input($"in{i}"));
        for (var i = 0; i < random.Next(1, 5); i++)
            pool.Add(c.StaticLatch(c.Input($"d{i}"), random.Next(2) == 0 ? clk.High : clk.Low, $"latch{i}"));
        Figures.AddRandomStages(c, pool, random, random.Next(4, 16));

        var gates = new List<Clock>();
        for (var i = 0; i < random.Next(1, 5); i++)
            gates.Add(c.ClockGate(clk, pool[random.Next(pool.Count)], name: $"gate{i}"));
        return (c.ToNetlist(), gates);
    }
}
