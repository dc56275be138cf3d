using System;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// PW4001 and PW4002: the launching register's slave latch (entry gate, storage, output stage), the path to the
/// capturing register and its master latch's entry gate and storage node, on their clocks. PW4001: at the launching
/// edge the launching master's output stage drives new data into the opening slave (the latest case). PW4002: the new
/// data is already settled at the slave's input and leaves when the slave opens (the earliest case). Measures
/// <c>t_arrival</c> from the launching edge (setup: to the capturing master's storage node at vdd/2; hold: to its
/// input) and <c>slack</c>: for setup, the time available less t_arrival; for hold, t_arrival less hold time and skew.
/// </summary>
internal static class RegisterPathDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var captureName = DeckInputs.Property(finding, FindingPropertyKeys.TargetLatch);
        var launchName = DeckInputs.Property(finding, FindingPropertyKeys.SourceLatch);
        if (DeckLookup.Of(netlist).RegisterPath(launchName, captureName) is not { } result)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: design '{netlist.DesignName}' has no register path from '{launchName}' to '{captureName}'.", nameof(finding));

        var setup = finding.RuleId == RuleCatalog.RegisterSetup.Id;
        var check = result.Check;
        var a = result.Launch.Slave;
        var b = result.Capture.Master;
        var model = LatchModel.Of(netlist);
        var entryA = a.EntryGates[0];
        LatchPath? path = null;
        foreach (var p in DeckLookup.Of(netlist).Paths(a.Name, b.Name))
            if (ReferenceEquals(p.From, a) && ReferenceEquals(p.To, b)) path = p;
        if (path is null)
            throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path from '{a.Name}' to '{b.Name}'.", nameof(finding));
        var entryB = path.EntryGate;
        var stages = StageRoute.Between(netlist, a.Storage, entryB.Inputs[0])
            ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path of stages from '{a.Storage.Name}' to '{entryB.Inputs[0].Name}'.", nameof(finding));

        var period = PhaseWindow.Of(a.Phase).Period;
        var edge = ClockWaveforms.EdgeTime(a.Phase.Clock);
        var launchAt = ClockWaveforms.NextOpening(a.Phase, period);
        var end = launchAt + period * 2;
        var arrival = setup ? check.ClockToOutput + check.PathMax + check.Setup : check.ClockToOutputMin + check.PathMin;
        var slack = setup ? check.SetupSlack : check.HoldSlack;

        var deck = new DeckWriter(finding, netlist);
        deck.AtCorner(setup ? Corner.Slow : Corner.Fast);
        deck.Describe($"Sub-circuit: register '{result.Launch.Name}''s slave '{a.Name}' (entry '{entryA.Name}' on {a.Phase.Name}), the path of {stages.Count} stage(s) to register '{result.Capture.Name}''s master '{b.Name}' (entry '{entryB.Name}' on {entryB.ClockControl!.Name}).");
        deck.Describe(setup
            ? $"Stimulus: at the launching edge (t = {launchAt}) the launching master's output stage drives new data into the opening slave."
            : $"Stimulus: new data settles at the launching master's output while the slave is closed, and leaves when the slave opens at the launching edge (t = {launchAt}): the earliest case a hold check is about.");
        deck.Describe(setup
            ? $"Measured: t_arrival, from the launching edge to '{b.Storage.Name}' at vdd/2, and slack = {check.Available} available - t_arrival."
            : $"Measured: t_arrival, from the launching edge to '{entryB.Inputs[0].Name}' (the master's input) at vdd/2, and slack = t_arrival - hold {check.Hold} - skew {check.Skew}.");
        deck.Param("t_required", SpiceNumbers.Of(setup ? check.Available.Seconds : (check.Hold + check.Skew).Seconds),
            setup ? "time from the launching to the capturing edge (s)" : "hold time plus clock skew (s)");

        var clocks = new ClockWaveforms(deck, end);
        var controlA = clocks.Control(a.Phase);
        var controlB = clocks.Control(entryB.ClockControl!);
        var data = deck.Fresh("data");
        // Setup: the slowest case, the launching master's output changing at the edge (the dynamic register's t_c-q counts
        // the master's output stage). Hold: the earliest case, the master's output settled while the slave was closed, so
        // the new data leaves as soon as the slave opens (t_ccq = slave gate + slave stage, as the estimate takes it).
        var dataAt = setup ? launchAt : launchAt - (period - PhaseWindow.Of(a.Phase).Length) / 2;
        deck.Pwl(data, new[] { (0.0, 0.0), ((dataAt - edge / 2).Seconds, 0.0), ((dataAt + edge / 2).Seconds, deck.Supply) },
            setup ? "new data from the launching master at the launching edge" : "new data settled at the launching master's output while the slave is closed");
        var input = deck.Node(entryA.Inputs[0]);
        var outputR = result.Launch.Master.OutputStage is { } stage ? netlist.ResistanceOf(stage) : netlist.Process.DriverResistance;
        deck.Element($"R_data {data} {input} {SpiceNumbers.Of(deck.AtCorner(outputR).Ohms)}   $ the launching master's output stage");
        deck.Capacitor(input, netlist.CapacitanceOf(entryA.Inputs[0]), $"'{entryA.Inputs[0].Name}'");
        var storageA = deck.Node(a.Storage);
        deck.PassGate(entryA, input, storageA, controlA);
        deck.Capacitor(storageA, netlist.CapacitanceOf(a.Storage), $"'{a.Storage.Name}', storage of '{a.Name}'");
        LatchPairDeck.DrawStages(deck, netlist, stages);

        var masterInput = deck.Node(entryB.Inputs[0]);
        var storageB = deck.Node(b.Storage);
        deck.PassGate(entryB, masterInput, storageB, controlB);
        deck.Capacitor(storageB, netlist.CapacitanceOf(b.Storage), $"'{b.Storage.Name}', storage of '{b.Name}'");

        var watched = setup ? storageB : masterInput;
        var step = Time.Min(edge, arrival / 50);
        deck.Transient(step, end, Time.Min(period / 200, arrival / 10));
        var launch = SpiceNumbers.Of(launchAt);
        deck.Measure($".meas tran t_arrival TRIG AT={launch} TARG v({watched}) VAL={{vdd/2}} CROSS=1 TD={launch}",
            new DeckEstimate("t_arrival", arrival.Seconds, "s", setup ? "clock-to-output + longest path + setup" : "minimum clock-to-output + shortest path"));
        deck.Measure(setup ? ".meas tran slack PARAM='t_required - t_arrival'" : ".meas tran slack PARAM='t_arrival - t_required'",
            new DeckEstimate("slack", slack.Seconds, "s", setup ? "setup slack" : "hold slack"));
        return deck.Build();
    }
}
