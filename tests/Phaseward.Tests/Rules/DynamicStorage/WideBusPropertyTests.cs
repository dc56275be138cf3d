using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Tests.Rules.DynamicStorage;

/// <summary>
/// PW3004 on buses of data-controlled pass gates, wide ones included, against its definition checked pair by pair:
/// the first pair (in the order written) of gates on different inputs whose controls are the same or not stated
/// exclusive (<see cref="Netlist.AreExclusive"/>) fights; with none, the bus is clean. The rule decides a bus on one
/// stated group in a single pass; this checks that the shortcut and the pairs agree on random buses and groups.
/// </summary>
public class WideBusPropertyTests
{
    [Fact]
    public void A_random_bus_fights_exactly_when_a_pair_of_its_controls_is_not_known_exclusive()
    {
        for (var seed = 1; seed <= 200; seed++)
        {
            var random = new Random(seed);
            var width = random.Next(3, 100);
            var c = new Circuit("bus" + seed);
            var controls = Enumerable.Range(0, width).Select(i => c.Input("sel" + i)).ToArray();
            var gateControls = new Net[width];
            for (var i = 0; i < width; i++)
                gateControls[i] = random.Next(20) == 0 ? controls[random.Next(width)] : controls[i]; // now and then a shared control
            switch (random.Next(4))
            {
                case 0: // one group holds them all
                    c.Exclusive(controls);
                    break;
                case 1: // one group holds all but one
                    var left = random.Next(width);
                    c.Exclusive(controls.Where((_, i) => i != left).ToArray());
                    break;
                case 2: // two overlapping groups
                    var cut = random.Next(1, width - 1);
                    c.Exclusive(controls.Take(cut + 1).ToArray());
                    c.Exclusive(controls.Skip(cut).ToArray());
                    break;
                default: // nothing stated
                    break;
            }

            var bus = c.Node("bus");
            for (var i = 0; i < width; i++)
                c.TransmissionGate(c.Input("d" + i), gateControls[i], bus);
            c.Output("q", c.Inverter(bus));
            var netlist = c.ToNetlist();

            var expected = FirstFightByPairs(netlist, gateControls);
            var findings = Checker.Check(netlist, new Rule[] { new FightingDriversRule() }).Findings;
            if (expected is not { } pair)
            {
                Assert.True(findings.Count == 0, $"seed {seed}: {string.Join("; ", findings.Select(f => f.Message))}");
                continue;
            }

            var finding = Assert.Single(findings);
            Assert.True(finding.Properties[FindingPropertyKeys.Driver] == $"bus.tg{pair.First + 1}"
                    && finding.Properties[FindingPropertyKeys.OtherDriver] == $"bus.tg{pair.Second + 1}",
                $"seed {seed}: expected tg{pair.First + 1} and tg{pair.Second + 1}: {finding.Message}");
        }
    }

    private static (int First, int Second)? FirstFightByPairs(Netlist netlist, IReadOnlyList<Net> controls)
    {
        for (var j = 1; j < controls.Count; j++)
            for (var i = 0; i < j; i++)
                if (ReferenceEquals(controls[i], controls[j]) || !netlist.AreExclusive(controls[i], controls[j]))
                    return (i, j);
        return null;
    }
}
