using System;
using System.Collections.Generic;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// PW1001 and PW1002: the two latches (entry gate and storage node each) and the shortest path of restoring stages
/// and data-controlled pass gates between them, on their clocks drawn on the design's time line. The data at the
/// first latch's input changes just after that latch opens in the second period (the worst moment: the most time
/// to race). Measures <c>t_through</c> (data change to the second latch's storage node switching), the second
/// node's level when the window closes, and <c>race_through</c> (1 when the data reached the second node inside the
/// window, 0 when it did not). PW1001 decks have a <c>fix_phase</c> switch: 1 puts the second latch on the
/// complementary phase, as the code fix does.
/// </summary>
internal static class LatchPairDeck
{
    public static SpiceDeck Build(Finding finding, Netlist netlist)
    {
        var model = LatchModel.Of(netlist);
        var path = DeckInputs.LatchPathOf(finding, netlist, model);

        var a = path.From;
        var b = path.To;
        var entryA = a.EntryGates[0];
        var entryB = path.EntryGate;
        var phaseA = a.Phase;
        var phaseB = entryB.ClockControl!;
        var stages = StageRoute.Between(netlist, a.Storage, entryB.Inputs[0])
            ?? throw new ArgumentException($"The {finding.RuleId} finding at {finding.Location}: no path of stages from '{a.Storage.Name}' to '{entryB.Inputs[0].Name}'.", nameof(finding));

        var sameWindow = finding.RuleId == RuleCatalog.SameWindowLatches.Id;
        var windowA = PhaseWindow.Of(phaseA);
        var period = windowA.Period;
        var edge = ClockWaveforms.EdgeTime(phaseA.Clock);
        var dataAt = ClockWaveforms.NextOpening(phaseA, period) + edge * 2;
        var fastest = RaceModel.Fastest(model, path);
        // The window the race must beat: for PW1001 the shared window (until the second latch closes); for PW1002 the
        // overlap, until the second latch (open before the first) closes.
        // PW1001: the phase ends where its complement opens (the window's tail is the complement skew, which a fixed
        // second latch shares); PW1002: the second latch (open before the first) closes at the end of the overlap.
        var closes = sameWindow ? ClockWaveforms.NextOpening(phaseB.Complement, dataAt) - edge : ClosingAfter(phaseB, dataAt);
        var end = dataAt + period * 2;

        var deck = new DeckWriter(finding, netlist);
        deck.AtCorner(Corner.Fast); // the race model's corner
        deck.Describe($"Sub-circuit: latch '{a.Name}' (entry '{entryA.Name}' on {phaseA.Name}, storage '{a.Storage.Name}'), the path of {stages.Count} stage(s) to latch '{b.Name}' (entry '{entryB.Name}' on {phaseB.Name}, storage '{b.Storage.Name}'). Latch feedback and keepers are left out: they are off or weak while a latch is transparent.");
        deck.Describe($"Stimulus: the data at '{entryA.Inputs[0].Name}' rises just after '{a.Name}' opens in the second period (t = {dataAt}); '{b.Name}' closes at {closes}.");
        deck.Describe("Measured: t_through (data change to '" + b.Storage.Name + "' at vdd/2), b_before and b_at_close (its level before the change and when its window closes), and race_through = 1 if it switched inside the window.");
        if (sameWindow)
        {
            deck.Param("fix_phase", "0", $"1: latch '{b.Name}' on {phaseB.Complement.Name} instead (the PW1001 fix); the data then waits for that window");
            deck.Describe($"fix_phase = 1 puts '{b.Name}' on the complementary phase {phaseB.Complement.Name}: then race_through measures 0.");
        }

        var clocks = new ClockWaveforms(deck, end);
        var controlA = clocks.Control(phaseA);
        string controlB;
        if (sameWindow)
        {
            var normal = clocks.Control(phaseB);
            var fixedPhase = clocks.Control(phaseB.Complement);
            controlB = deck.Fresh("on_latch_b");
            deck.Element($"B_phase_b {controlB} 0 V = {{fix_phase}} > 0.5 ? V({fixedPhase}) : V({normal})   $ latch '{b.Name}''s phase, or its complement when fixed");
        }
        else
        {
            controlB = clocks.Control(phaseB);
        }

        var data = deck.Fresh("data");
        deck.Pwl(data, new[] { (0.0, 0.0), (dataAt.Seconds, 0.0), ((dataAt + edge).Seconds, deck.Supply) }, "data changes just after the first latch opens");
        var input = deck.Node(entryA.Inputs[0]);
        deck.Element($"R_data {data} {input} {SpiceNumbers.Of(deck.AtCorner(netlist.Process.DriverResistance).Ohms)}   $ the data driven through the process's driver resistance");
        deck.Capacitor(input, netlist.CapacitanceOf(entryA.Inputs[0]), $"'{entryA.Inputs[0].Name}'");
        var storageA = deck.Node(a.Storage);
        deck.PassGate(entryA, input, storageA, controlA);
        deck.Capacitor(storageA, netlist.CapacitanceOf(a.Storage), $"'{a.Storage.Name}', storage of '{a.Name}'");

        DrawStages(deck, netlist, stages);

        var storageB = deck.Node(b.Storage);
        deck.PassGate(entryB, deck.Node(entryB.Inputs[0]), storageB, controlB);
        deck.Capacitor(storageB, netlist.CapacitanceOf(b.Storage), $"'{b.Storage.Name}', storage of '{b.Name}'");

        var step = Time.Min(edge, fastest / 50);
        deck.Transient(step, end, Time.Min(period / 200, fastest / 10));
        var dataTime = SpiceNumbers.Of((dataAt + edge / 2).Seconds);
        deck.Measure($".meas tran b_before FIND v({storageB}) AT={dataTime}", null);
        deck.Measure($".meas tran b_at_close FIND v({storageB}) AT={SpiceNumbers.Of(closes)}", null);
        deck.Measure($".meas tran t_through TRIG AT={dataTime} TARG v({storageB}) VAL={{vdd/2}} CROSS=1 TD={dataTime}",
            new DeckEstimate("t_through", fastest.Seconds, "s", "fastest path: first latch's entry + path + second latch's entry, 0.69·R·C per stage"));
        var expected = sameWindow ? 1.0 : (fastest < RaceModel.Overlap(model, phaseA, phaseB) ? 1.0 : 0.0);
        deck.Measure(".meas tran race_through PARAM='abs(b_at_close - b_before) > vdd/2 ? 1 : 0'",
            new DeckEstimate("race_through", expected, string.Empty, sameWindow
                ? "1: data passes both latches in one window"
                : "1 when the fastest path is shorter than the overlap"));
        return deck.Build();
    }

    /// <summary>The path's stages as the deck draws them: restoring stages as models, data-controlled pass gates held on.</summary>
    internal static void DrawStages(DeckWriter deck, Netlist netlist, IReadOnlyList<Stage> stages)
    {
        string? on = null;
        foreach (var stage in stages)
        {
            var output = deck.Node(stage.Device.Output);
            var from = deck.Node(stage.From);
            if (stage.Device.IsRestoring)
            {
                deck.RestoringStage(stage.Device, from, output);
            }
            else
            {
                if (on is null)
                {
                    on = deck.Fresh("on_data_gates");
                    deck.Dc(on, "{vdd}", "data-controlled pass gates on the path held conducting");
                }

                deck.PassGate(stage.Device, from, output, on);
            }

            deck.Capacitor(output, netlist.CapacitanceOf(stage.Device.Output), $"'{stage.Device.Output.Name}'");
        }
    }

    // The first moment after 'after' at which the phase stops conducting.
    private static Time ClosingAfter(Phase phase, Time after)
    {
        var window = PhaseWindow.Of(phase);
        var k = Math.Ceiling((after - window.Closes) / window.Period);
        return window.Closes + window.Period * k;
    }

    internal readonly struct Stage
    {
        public Stage(Device device, Net from)
        {
            Device = device;
            From = from;
        }

        public Device Device { get; }

        public Net From { get; }
    }
}
