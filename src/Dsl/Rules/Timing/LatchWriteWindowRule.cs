using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Rules.Timing;

/// <summary>
/// PW4004: a latch whose transparency window is too short for its entry gate to write the storage node. While the
/// window is open the entry gate must charge the node far enough for the latch's output stage to switch; a window
/// shorter than that delay lets the latch close on the old value whatever the data's timing.
/// </summary>
/// <remarks>
/// <para>Window: the phase's transparency window less the complement skew at each end. The gate conducts fully only
/// while both of its halves are on: from the complement's edge to the true clock's edge, D·T − s for the High phase
/// of a clock with period T, duty D and complement skew s ((1 − D)·T − s for the Low phase); the skew tails on either
/// side conduct through one half only and are not counted (<see cref="PhaseWindow"/> adds them to the window).</para>
/// <para>Entry delay: the latch's entry delay (<see cref="LatchModel.EntryDelay"/>, the figure the latch table and
/// the setup checks use): 0.69 · R · C of its slowest entry gate, R its on-resistance and C the storage node's
/// capacitance, the 50 % point of a single RC step response (t_p = 0.69·R·C: Rabaey, Chandrakasan, Nikolić,
/// "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 5; section from memory). The window must be at
/// least that long: a latch's minimum pulse width is its setup requirement (common practice).</para>
/// <para>At the slow corner: R (hence the delay) times <see cref="Process.SlowDelayFactor"/>, where a write is
/// hardest to complete.</para>
/// <para>Reported at the latch's entry gate, the clock as related location, when window − entry delay is below
/// <see cref="RulePolicy.MinimumTimingSlack"/>. A first-order estimate.</para>
/// </remarks>
public sealed class LatchWriteWindowRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.LatchWriteWindow };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var netlist = context.Netlist;
        var model = context.LatchModel;
        foreach (var latch in model.Latches)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            var write = LatchWriteWindow.Of(model, latch);
            if (write.Margin >= context.Policy.MinimumTimingSlack)
                continue;
            yield return new Finding(RuleCatalog.LatchWriteWindow, latch.Span,
                new object[]
                {
                    latch.Name, write.Window, write.FullyOn, write.Skew, write.EntryDelay, latch.Storage.Name,
                    write.Resistance, write.Capacitance, write.Margin, CornerText.Of(netlist.Process, Corner.Slow),
                },
                new[] { latch.Phase.Clock.Span },
                new Dictionary<string, string>
                {
                    [FindingPropertyKeys.TargetLatch] = latch.Name,
                    [FindingPropertyKeys.Phase] = latch.Phase.Name,
                    [FindingPropertyKeys.MarginSeconds] = write.Margin.Seconds.ToString("R", CultureInfo.InvariantCulture),
                });
        }
    }
}

/// <summary>The write window of a latch against its entry delay (see <see cref="LatchWriteWindowRule"/>).</summary>
public sealed class LatchWriteWindow
{
    private LatchWriteWindow(Time window, Time skew, Time entryDelay, Resistance resistance, Capacitance capacitance)
    {
        Window = window;
        Skew = skew;
        FullyOn = Time.Max(Time.Zero, window - skew - skew);
        EntryDelay = entryDelay;
        Resistance = resistance;
        Capacitance = capacitance;
    }

    /// <summary>The transparency window, skew tails included (<see cref="PhaseWindow.Length"/>).</summary>
    public Time Window { get; }

    /// <summary>The complement skew of the latch's clock.</summary>
    public Time Skew { get; }

    /// <summary>The part of the window in which both halves of the entry gate conduct: window − 2 · skew (at least 0).</summary>
    public Time FullyOn { get; }

    /// <summary>0.69 · R · C of the slowest entry gate charging the storage node, at the slow corner.</summary>
    public Time EntryDelay { get; }

    /// <summary>The slowest entry gate's on-resistance at the slow corner.</summary>
    public Resistance Resistance { get; }

    /// <summary>The storage node's capacitance.</summary>
    public Capacitance Capacitance { get; }

    /// <summary><see cref="FullyOn"/> − <see cref="EntryDelay"/>: negative when the window cannot write the node.</summary>
    public Time Margin => FullyOn - EntryDelay;

    public static LatchWriteWindow Of(LatchModel model, Latch latch)
    {
        if (model is null) throw new System.ArgumentNullException(nameof(model));
        if (latch is null) throw new System.ArgumentNullException(nameof(latch));
        var netlist = model.Netlist;
        var slowest = latch.EntryGates[0];
        foreach (var gate in latch.EntryGates)
            if (model.StageDelay(gate) > model.StageDelay(slowest))
                slowest = gate;
        var slow = netlist.Process.SlowDelayFactor;
        return new LatchWriteWindow(model.WindowOf(latch.Phase).Length, latch.Phase.Clock.ComplementSkew, model.EntryDelay(latch) * slow,
            netlist.ResistanceOf(slowest) * slow, netlist.CapacitanceOf(latch.Storage));
    }
}
