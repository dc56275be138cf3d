using System.Collections.Generic;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// A latch found on the primitives: clock-phase-controlled pass gates (its entry gates) into a storage node, a net
/// driven only through pass devices (and perhaps a weak keeper or a feedback pass gate on the other phase). A library
/// cell and the same circuit built by hand are found alike.
/// </summary>
public sealed class Latch
{
    internal Latch(int index, string name, Net storage, Phase phase, IReadOnlyList<Device> entryGates, IReadOnlyList<Device> feedbackGates,
        Device? outputStage, Device? feedbackStage, bool hasKeeper, MacroInstance? cell)
    {
        Index = index;
        Name = name;
        Storage = storage;
        Phase = phase;
        EntryGates = entryGates;
        FeedbackGates = feedbackGates;
        OutputStage = outputStage;
        FeedbackStage = feedbackStage;
        HasKeeper = hasKeeper;
        Cell = cell;
    }

    /// <summary>Position in <see cref="LatchModel.Latches"/>.</summary>
    public int Index { get; }

    /// <summary>The latch cell's name when it came from a cell (a register's halves are "reg.master" and "reg.slave"), else the storage net's name.</summary>
    public string Name { get; }

    /// <summary>The node that holds the latched value.</summary>
    public Net Storage { get; }

    /// <summary>The phase the latch is transparent in (its first entry gate's phase).</summary>
    public Phase Phase { get; }

    /// <summary>The clocked pass gates that let data into the storage node (usually one).</summary>
    public IReadOnlyList<Device> EntryGates { get; }

    /// <summary>Pass gates on the other phase that close the static latch's feedback loop (empty for a dynamic latch).</summary>
    public IReadOnlyList<Device> FeedbackGates { get; }

    /// <summary>The restoring stage that reads the storage node (the latch's output inverter), if any.</summary>
    public Device? OutputStage { get; }

    /// <summary>The restoring stage that drives the feedback gates (static latches), if any.</summary>
    public Device? FeedbackStage { get; }

    /// <summary>A weak keeper drives the storage node.</summary>
    public bool HasKeeper { get; }

    /// <summary>True when the storage node is held between windows (feedback gate or keeper), false for a dynamic latch.</summary>
    public bool IsStatic => FeedbackGates.Count > 0 || HasKeeper;

    /// <summary>The latch cell it came from, or null for a hand-built latch.</summary>
    public MacroInstance? Cell { get; }

    /// <summary>The net the latch drives (its output stage's output), or the storage node when it has no output stage.</summary>
    public Net Output => OutputStage?.Output ?? Storage;

    /// <summary>Where the latch was written: its first entry gate's call.</summary>
    public SourceSpan Span => EntryGates[0].Span;

    /// <summary>When the latch is transparent, within its root clock's period.</summary>
    public PhaseWindow Window => PhaseWindow.Of(Phase);

    /// <inheritdoc/>
    public override string ToString() => $"latch {Name} ({Phase.Name})";
}

/// <summary>A master–slave register: a master latch whose output feeds only a slave latch on the complementary phase of the same clock.</summary>
public sealed class Register
{
    internal Register(string name, Latch master, Latch slave, MacroInstance? cell)
    {
        Name = name;
        Master = master;
        Slave = slave;
        Cell = cell;
    }

    /// <summary>The register cell's name, or the name of the hand-built register's output net.</summary>
    public string Name { get; }

    /// <summary>The first latch of the register.</summary>
    public Latch Master { get; }

    /// <summary>The second latch of the register.</summary>
    public Latch Slave { get; }

    /// <summary>The register cell it came from, or null for a hand-built master–slave pair.</summary>
    public MacroInstance? Cell { get; }

    /// <summary>The clock of the register (the slave's).</summary>
    public Clock Clock => Slave.Phase.Clock;

    /// <summary>True when the slave opens on the rising edge (master transparent while the clock is low).</summary>
    public bool IsPositiveEdge => Slave.Phase.Polarity == ClockPolarity.High;

    /// <summary>Where the register was written (its macro call, or its master latch).</summary>
    public SourceSpan Span => Cell?.Span ?? Master.Span;

    /// <inheritdoc/>
    public override string ToString() => $"register {Name} ({(IsPositiveEdge ? "rising" : "falling")} edge of {Clock.Name})";
}

/// <summary>
/// A data path from one latch's storage node to another latch's entry gate through restoring stages and
/// data-controlled pass gates only (no third latch between), with its first-order delays.
/// </summary>
public sealed class LatchPath
{
    internal LatchPath(Latch from, Latch to, Device entryGate, Time minDelay, Time maxDelay)
    {
        From = from;
        To = to;
        EntryGate = entryGate;
        MinDelay = minDelay;
        MaxDelay = maxDelay;
    }

    /// <summary>The latch the data leaves.</summary>
    public Latch From { get; }

    /// <summary>The latch the data reaches.</summary>
    public Latch To { get; }

    /// <summary>The entry gate of <see cref="To"/> the path arrives at.</summary>
    public Device EntryGate { get; }

    /// <summary>Shortest delay from <see cref="From"/>'s storage node to the entry gate's input (its output stage included).</summary>
    public Time MinDelay { get; }

    /// <summary>Longest delay from <see cref="From"/>'s storage node to the entry gate's input (combinational loops are not followed round).</summary>
    public Time MaxDelay { get; }

    /// <inheritdoc/>
    public override string ToString() => $"{From.Name} -> {To.Name} [{MinDelay}, {MaxDelay}]";
}
