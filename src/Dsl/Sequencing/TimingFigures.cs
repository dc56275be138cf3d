using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using System.Threading;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>First-order timing figures of one latch, derived from its devices (see <see cref="TimingFigures"/>).</summary>
public sealed class LatchTiming
{
    internal LatchTiming(Latch latch, PhaseWindow window, Time entry, Time fastestEntry, Time output, Time feedback)
    {
        Latch = latch;
        EntryDelay = entry;
        FastestEntryDelay = fastestEntry;
        OutputDelay = output;
        Setup = entry + (latch.FeedbackGates.Count > 0 ? output + feedback : Time.Zero);
        DataToOutput = entry + output;
        Window = window;
        Hold = Window.Length - (latch.Phase.Polarity == ClockPolarity.High
            ? latch.Phase.Clock.Period * latch.Phase.Clock.Duty
            : latch.Phase.Clock.Period * (1 - latch.Phase.Clock.Duty));
    }

    /// <summary>The latch these figures are for.</summary>
    public Latch Latch { get; }

    /// <summary>The latch's name.</summary>
    public string Name => Latch.Name;

    /// <summary>The phase in which the latch is transparent.</summary>
    public Phase Phase => Latch.Phase;

    /// <summary>When the latch is transparent (made once, with the other figures).</summary>
    public PhaseWindow Window { get; }

    /// <summary>t of the entry gate charging the storage node.</summary>
    public Time EntryDelay { get; }

    /// <summary>t of the fastest entry gate (the race and hold checks).</summary>
    public Time FastestEntryDelay { get; }

    /// <summary>
    /// The most a latch may borrow: its nominal window less the complement skew and its setup time,
    /// t_borrow ≤ T_phase − (t_setup + t_skew) (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10, time borrowing;
    /// equation number from memory). Skew shrinks what may be borrowed; it never widens it.
    /// </summary>
    public Time BorrowLimit => Window.NominalLength - Latch.Phase.Clock.ComplementSkew - Setup;

    /// <summary>t of the output stage.</summary>
    public Time OutputDelay { get; }

    /// <summary>
    /// How long before the window closes the input must be settled: the entry gate's delay, plus (static latch) the
    /// output and feedback stages, so that the feedback loop holds the new value when the feedback gate takes over.
    /// </summary>
    public Time Setup { get; }

    /// <summary>Delay from the input (while transparent) to the output: entry gate + output stage.</summary>
    public Time DataToOutput { get; }

    /// <summary>Delay from the window opening (data waiting) to the output: entry gate + output stage.</summary>
    public Time ClockToOutput => DataToOutput;

    /// <summary>How long after the nominal closing edge the input must stay stable: the gate conducts until the late complement arrives (the complement skew).</summary>
    public Time Hold { get; }
}

/// <summary>First-order timing figures of one master–slave register (see <see cref="TimingFigures"/>).</summary>
public sealed class RegisterTiming
{
    internal RegisterTiming(Register register, LatchTiming master, LatchTiming slave)
    {
        Register = register;
        Setup = master.Setup;
        // A static master's setup already waits for its output inverter (the feedback loop must hold the value), so
        // the edge finds that inverter settled; a dynamic master's setup is its pass gate alone, so t_c-q adds it.
        var masterOutputInSetup = master.Latch.FeedbackGates.Count > 0;
        ClockToOutput = slave.EntryDelay + slave.OutputDelay + (masterOutputInSetup ? Time.Zero : master.OutputDelay);
        ClockToOutputMin = slave.FastestEntryDelay + slave.OutputDelay;
        EdgeOverlap = slave.Window.StillOpenAfterOpening(master.Window);
        Hold = EdgeOverlap - master.FastestEntryDelay;
        MasterSlaveRace = master.EntryDelay + master.OutputDelay + slave.EntryDelay;
    }

    /// <summary>The register these figures are for.</summary>
    public Register Register { get; }

    /// <summary>The register's name.</summary>
    public string Name => Register.Name;

    /// <summary>The register's clock.</summary>
    public Clock Clock => Register.Clock;

    /// <summary>Setup time before the capturing edge: the master latch's setup (dynamic: its input pass gate's delay).</summary>
    public Time Setup { get; }

    /// <summary>
    /// Clock-to-output (propagation). Static register: slave pass gate + slave inverter, t_c-q = t_T2 + t_I; dynamic
    /// register: slave pass gate + the master's and the slave's inverters, t_c-q = t_I1 + t_T2 + t_I2 (Rabaey,
    /// Chandrakasan, Nikolić, "Digital Integrated Circuits", 2nd ed., ch. 7, static and dynamic transmission-gate
    /// master–slave registers; section numbers from memory).
    /// </summary>
    public Time ClockToOutput { get; }

    /// <summary>Clock-to-output (contamination, data settled early): slave pass gate + the slave's inverter.</summary>
    public Time ClockToOutputMin { get; }

    /// <summary>How long the master still conducts after the capturing edge (the 1-1 overlap for a rising-edge register).</summary>
    public Time EdgeOverlap { get; }

    /// <summary>
    /// Hold time: the overlap after the capturing edge during which the master still conducts, less the master pass
    /// gate's own delay (new data must charge the master's node before the gate shuts): t_hold = t_overlap − t_T1.
    /// The textbook condition is t_overlap1-1 &lt; t_hold for the input (Rabaey et al., 2nd ed., ch. 7, clock overlap,
    /// from memory); crediting t_T1 is the first-order race model PW1002 uses for the same race (<see cref="RaceModel"/>).
    /// Zero or negative: data may change at the edge.
    /// </summary>
    public Time Hold { get; }

    /// <summary>t(TG1) + t(I1) + t(TG2): how long data entering the master takes to reach the slave's storage node (must exceed the other overlap).</summary>
    public Time MasterSlaveRace { get; }
}

/// <summary>
/// Setup, hold and clock-to-output of every latch and register of a netlist at one process corner, derived from their
/// devices with the first-order stage delay 0.69·R·C, every delay times the corner's factor
/// (<see cref="Process.DelayFactor"/>). For a report or the command line:
/// <c>TimingFigures.For(netlist, Corner.Slow).ToString()</c> prints a table. First-order estimates: they do not
/// replace transistor-level simulation or sign-off.
/// </summary>
public sealed class TimingFigures
{
    private readonly LatchTiming[] byLatch;

    private TimingFigures(LatchModel model, Corner corner)
    {
        Model = model;
        Corner = corner;
        DelayFactor = model.Netlist.Process.DelayFactor(corner);
        byLatch = new LatchTiming[model.Latches.Count];
        foreach (var latch in model.Latches)
        {
            var feedback = latch.FeedbackStage is { } stage ? model.StageDelay(stage) : Time.Zero;
            byLatch[latch.Index] = new LatchTiming(latch, model.WindowOf(latch.Phase), AtCorner(model.EntryDelay(latch)), AtCorner(model.FastestEntryDelay(latch)),
                AtCorner(model.OutputDelay(latch)), AtCorner(feedback));
        }

        var registers = new List<RegisterTiming>();
        foreach (var register in model.Registers)
            registers.Add(new RegisterTiming(register, byLatch[register.Master.Index], byLatch[register.Slave.Index]));
        Registers = registers;
    }

    /// <summary>The latches and registers the figures are for.</summary>
    public LatchModel Model { get; }

    /// <summary>The corner these figures are at.</summary>
    public Corner Corner { get; }

    /// <summary>The factor every nominal delay takes at <see cref="Corner"/>.</summary>
    public double DelayFactor { get; }

    /// <summary>"slow corner, delays ×1.3": the words a message uses for <see cref="Corner"/>.</summary>
    public string CornerText => Electrical.CornerText.Of(Model.Netlist.Process, Corner);

    /// <summary>A nominal delay (a path's, from <see cref="LatchModel"/>) at this corner.</summary>
    public Time AtCorner(Time nominal) => nominal * DelayFactor;

    /// <summary>Every latch, register halves included, in the order of <see cref="LatchModel.Latches"/>.</summary>
    public IReadOnlyList<LatchTiming> Latches => byLatch;

    /// <summary>The figures of every register.</summary>
    public IReadOnlyList<RegisterTiming> Registers { get; }

    /// <summary>The figures of <paramref name="netlist"/> at <paramref name="corner"/>.</summary>
    public static TimingFigures For(Netlist netlist, Corner corner) => For(netlist, corner, CancellationToken.None);

    /// <summary>The figures of <paramref name="netlist"/> at <paramref name="corner"/>; <paramref name="cancellationToken"/>
    /// stops the making of the latch model if it is not made yet (<see cref="LatchModel.Of(Netlist, CancellationToken)"/>).</summary>
    public static TimingFigures For(Netlist netlist, Corner corner, CancellationToken cancellationToken)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        RequireCorner(corner);
        return For(LatchModel.Of(netlist, cancellationToken), corner);
    }

    /// <summary>The figures of the latches of <paramref name="model"/> at <paramref name="corner"/>.</summary>
    public static TimingFigures For(LatchModel model, Corner corner)
    {
        if (model is null) throw new ArgumentNullException(nameof(model));
        RequireCorner(corner);
        return new(model, corner);
    }

    // Checked before a latch model is made for the netlist: a wrong corner costs nothing.
    private static void RequireCorner(Corner corner)
    {
        if (corner is not (Corner.Nominal or Corner.Slow or Corner.Fast))
            throw new ArgumentException($"'{nameof(corner)}' must be Nominal, Slow or Fast (was {(int)corner}).", nameof(corner));
    }

    /// <summary>The figures of <paramref name="latch"/>.</summary>
    public LatchTiming Of(Latch latch)
    {
        if (latch is null) throw new ArgumentNullException(nameof(latch));
        if (latch.Index >= byLatch.Length || !ReferenceEquals(byLatch[latch.Index].Latch, latch))
            throw new ArgumentException($"Latch '{latch.Name}' does not belong to the netlist of design '{Model.Netlist.DesignName}'.", nameof(latch));
        return byLatch[latch.Index];
    }

    /// <summary>A plain-text table: one line per register, then one per latch.</summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        text.Append("Timing figures of design '").Append(Model.Netlist.DesignName).Append("' at the ").Append(CornerText)
            .AppendLine(" (first-order estimates, 0.69·R·C per stage)");
        text.AppendLine("register | clock | edge | setup | clk-q | clk-q min | hold");
        foreach (var r in Registers)
            text.Append(string.Join(" | ", r.Name, r.Clock.Name, r.Register.IsPositiveEdge ? "rising" : "falling",
                r.Setup, r.ClockToOutput, r.ClockToOutputMin, r.Hold)).AppendLine();
        text.AppendLine("latch | phase | kind | window | setup | d-q | clk-q | hold");
        foreach (var l in byLatch)
            text.Append(string.Join(" | ", l.Name, l.Phase.Name, l.Latch.IsStatic ? "static" : "dynamic",
                string.Format(CultureInfo.InvariantCulture, "[{0}, {1})", l.Window.Opens, l.Window.Closes),
                l.Setup, l.DataToOutput, l.ClockToOutput, l.Hold)).AppendLine();
        return text.ToString();
    }
}
