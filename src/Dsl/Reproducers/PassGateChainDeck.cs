using System;
using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.PassGatePaths;

namespace Phaseward.Reproducers;

/// <summary>
/// PW2001: the chain as the RC ladder the estimate takes it to be. A step through the driving stage's output
/// resistance, every gate of the chain conducting, each net with its capacitance; capacitance that a net's side
/// branches add (other pass gates fanning out) is lumped on the net they leave, which keeps the Elmore delay at the
/// chain's end unchanged. Measures <c>t50</c>, the 50 % delay from the step to the chain's last net.
/// </summary>
internal static class PassGateChainDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var reported = DeckInputs.DeviceById(finding, netlist, FindingPropertyKeys.ReportedGateId);
        var network = PassGateNetwork.Of(netlist);
        var chains = new SeriesChains(network);
        var gates = chains.ChainGates(reported);
        var chain = chains.ChainThrough(reported);
        var fifty = FiftyPercentDelay.FromElmore(chain.Elmore);

        var deck = new DeckWriter(finding, netlist);
        deck.Describe($"Sub-circuit: the chain of {gates.Count} pass gates from '{gates[0].Name}' to '{gates[gates.Count - 1].Name}', every gate conducting, driven by a step through the driving stage's output resistance. Side branches' capacitance is lumped on the net they leave.");
        deck.Describe($"Stimulus: a 0 -> vdd step. Measured: t50, from the step's 50 % point to the chain's last net at 50 % (Phaseward's estimate: 0.69 (~ ln 2) x the Elmore delay {chain.Elmore}).");

        var input = gates[0].Inputs[0];
        var step = deck.Fresh("step");
        var stepAt = chain.Elmore * 0.1;
        var rise = chain.Elmore * 1e-3;
        deck.Pwl(step, new[] { (0.0, 0.0), (stepAt.Seconds, 0.0), ((stepAt + rise).Seconds, deck.Supply) }, "the driving stage switches");
        var inputNode = deck.Node(input);
        deck.Element($"R_drive {step} {inputNode} {SpiceNumbers.Of(network.RootResistanceOf(input).Ohms)}   $ output resistance of the stage driving '{input.Name}'");
        // What the driver charges while the chain's first gate conducts (the root load of the estimate), less what that
        // gate charges, so that the deck's ladder has the estimate's Elmore delay exactly.
        deck.Capacitor(inputNode, network.RootLoad(gates[0]) - network.ChargedThrough(gates[0]), $"'{input.Name}' and the branches it feeds besides the chain that may conduct with it");

        var on = deck.Fresh("on_always");
        deck.Dc(on, "{vdd}", "every gate of the chain conducting (the chain's delay, as the estimate takes it)");
        for (var i = 0; i < gates.Count; i++)
        {
            var gate = gates[i];
            var from = deck.Node(gate.Inputs[0]);
            var to = deck.Node(gate.Output);
            deck.PassGate(gate, from, to, on);
            var lumped = i + 1 < gates.Count ? network.ChargedThrough(gate) - network.ChargedThrough(gates[i + 1]) : network.ChargedThrough(gate);
            deck.Capacitor(to, lumped, $"'{gate.Output.Name}'" + (i + 1 < gates.Count ? " (with its side branches)" : " and all it feeds"));
        }

        var last = deck.Node(gates[gates.Count - 1].Output);
        deck.Transient(chain.Elmore / 500, stepAt + chain.Elmore * 6, chain.Elmore / 200);
        deck.Measure($".meas tran t50 TRIG v({step}) VAL={{vdd/2}} RISE=1 TARG v({last}) VAL={{vdd/2}} RISE=1",
            new DeckEstimate("t50", fifty.Seconds, "s", "50 % delay of the chain, 0.69 x Elmore"));
        deck.Measure($".meas tran t_elmore_point TRIG v({step}) VAL={{vdd/2}} RISE=1 TARG v({last}) VAL={{vdd*0.632}} RISE=1", null);
        return deck.Build();
    }
}
