using System;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using System.Threading;
using Phaseward.Clocking;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// The latches, registers and latch-to-latch data paths of a netlist, found on its primitives. Shared by the
/// clock-phase (PW1xxx) and timing (PW4xxx) rules and by <see cref="TimingFigures"/>; built once per netlist.
/// </summary>
/// <remarks>
/// Three steps, each in its own class: <see cref="LatchFinder"/> finds the latches on the storage nodes,
/// <see cref="RegisterFinder"/> pairs masters with slaves, and <see cref="LatchPathFinder"/> searches each latch's
/// fan-out cone (<see cref="LatchCone"/>) for the shortest and longest delays to the next latches.
/// </remarks>
public sealed class LatchModel
{
    private static readonly ConditionalWeakTable<Netlist, LatchModel> Cache = new();

    private readonly Latch?[] entryLatchOfDevice;
    private readonly Register?[] registerOfLatch;
    private readonly LatchPathSearch search;
    // Asked by the rules of two families at once (the clock-phase and timing analyzers run concurrently on one
    // netlist): both memo tables are locked.
    private readonly PhaseWindowCache windows = new();
    private readonly Dictionary<(Phase, Phase), WindowRelation> relations = new();

    private LatchModel(Netlist netlist, long pathSearchBudget, CancellationToken cancellationToken)
    {
        Netlist = netlist;
        var found = LatchFinder.Find(netlist);
        Latches = found.Latches;
        entryLatchOfDevice = found.EntryLatchOfDevice;
        Registers = RegisterFinder.Find(this, out registerOfLatch);
        var cone = new LatchCone(netlist, found.EntryLatchOfDevice, found.IsLatchStorage);
        search = LatchPathFinder.Find(cone, found.Latches, pathSearchBudget, cancellationToken);
    }

    /// <summary>The netlist the latches were found in.</summary>
    public Netlist Netlist { get; }

    /// <summary>Every latch, library or hand-built.</summary>
    public IReadOnlyList<Latch> Latches { get; }

    /// <summary>Every master-slave pair of latches.</summary>
    public IReadOnlyList<Register> Registers { get; }

    /// <summary>
    /// Every latch-to-latch path, grouped by source latch (in latch order), then by entry gate. When the search stopped
    /// at its budget (<see cref="PathSearchStopped"/>), the paths from the first <see cref="LatchesSearched"/> latches only.
    /// </summary>
    public IReadOnlyList<LatchPath> Paths => search.Paths;

    /// <summary>True when the path search used up its budget before every latch was searched: the paths from
    /// <c>Latches[LatchesSearched]</c> on are not listed (reported as PW9005).</summary>
    public bool PathSearchStopped => search.LatchesSearched < Latches.Count;

    /// <summary>How many latches, in the order of <see cref="Latches"/>, had their paths listed (all of them unless
    /// <see cref="PathSearchStopped"/>).</summary>
    public int LatchesSearched => search.LatchesSearched;

    /// <summary>The steps the path search spent: the nets its searches reached, plus the paths it listed.</summary>
    public long PathSearchSteps => search.Steps;

    /// <summary>The budget of steps the path search was given (<see cref="Checking.RulePolicy.LatchPathSearchBudget"/>).</summary>
    public long PathSearchBudget => search.Budget;

    /// <summary>The model of a netlist: the one already made for it, whatever its budget, or else one made with the
    /// default budget (<see cref="Of(Netlist, long, CancellationToken)"/>).</summary>
    public static LatchModel Of(Netlist netlist) => Of(netlist, CancellationToken.None);

    /// <summary>
    /// The model of a netlist: the one already made for it, whatever its budget, or else one made with the default
    /// budget. Listing the latch-to-latch paths can take seconds on a large design (a long chain of logic through many
    /// latches has a path per pair): <paramref name="cancellationToken"/> stops it, and a model whose making was
    /// cancelled is not kept.
    /// </summary>
    public static LatchModel Of(Netlist netlist, CancellationToken cancellationToken)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        return Cache.TryGetValue(netlist, out var model)
            ? model
            : Of(netlist, Checking.RulePolicy.Default.LatchPathSearchBudget, cancellationToken);
    }

    /// <summary>
    /// The model of a netlist whose path search is given <paramref name="pathSearchBudget"/> steps (the rules pass
    /// their policy's). The model kept for the netlist is reused when it is what this budget gives: made with the same
    /// budget, or complete within it; otherwise a model is made and kept in its place.
    /// </summary>
    public static LatchModel Of(Netlist netlist, long pathSearchBudget, CancellationToken cancellationToken = default)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        if (pathSearchBudget < 1)
            throw new ArgumentOutOfRangeException(nameof(pathSearchBudget), pathSearchBudget,
                $"The latch path search budget must be at least 1 step (was {pathSearchBudget}).");
        if (Cache.TryGetValue(netlist, out var kept) && kept.Answers(pathSearchBudget))
            return kept;
        var model = new LatchModel(netlist, pathSearchBudget, cancellationToken);
        // Two analyzers may make it at once (the clock-phase and timing families run concurrently): with one budget
        // both are equal, and every caller then reads the one kept.
        lock (Cache)
        {
            if (Cache.TryGetValue(netlist, out kept))
            {
                if (kept.Answers(pathSearchBudget))
                    return kept;
                Cache.Remove(netlist);
            }

            Cache.Add(netlist, model);
        }

        return model;
    }

    // Whether this model is the one a search with 'budget' makes: same budget, or finished within it.
    private bool Answers(long budget) => budget == PathSearchBudget || (!PathSearchStopped && PathSearchSteps <= budget);

    /// <summary>The register a latch is the master or slave of, or null.</summary>
    public Register? RegisterOf(Latch latch) => registerOfLatch[latch.Index];

    /// <summary>The latch whose entry gate this device is, or null.</summary>
    public Latch? LatchEnteredBy(Device device) => entryLatchOfDevice[device.Id];

    /// <summary>First-order delay of one stage (0.69·R·C, see <see cref="FirstOrderDelay"/>).</summary>
    public Time StageDelay(Device device) => FirstOrderDelay.Of(Netlist, device);

    /// <summary>Delay of the latch's entry: its (slowest) entry gate charging the storage node.</summary>
    public Time EntryDelay(Latch latch)
    {
        var worst = Time.Zero;
        var gates = latch.EntryGates;
        for (var i = 0; i < gates.Count; i++)
            worst = Time.Max(worst, StageDelay(gates[i]));
        return worst;
    }

    /// <summary>Delay of the latch's fastest entry gate.</summary>
    public Time FastestEntryDelay(Latch latch)
    {
        var gates = latch.EntryGates;
        var fastest = StageDelay(gates[0]);
        for (var i = 1; i < gates.Count; i++)
            fastest = Time.Min(fastest, StageDelay(gates[i]));
        return fastest;
    }

    /// <summary>The window of a latch's phase, or of any phase (made once per model).</summary>
    public PhaseWindow WindowOf(Phase phase)
    {
        lock (windows)
            return windows.Of(phase);
    }

    /// <summary>How the windows of two phases lie (see <see cref="WindowRelation"/>), computed once per pair of phases.</summary>
    public WindowRelation Relation(Phase a, Phase b)
    {
        lock (relations)
        {
            if (!relations.TryGetValue((a, b), out var relation))
                relations[(a, b)] = relation = WindowRelations.Of(WindowOf(a), WindowOf(b));
            return relation;
        }
    }

    /// <summary>A path from a register's slave to a register's master: a register-to-register path (setup and hold, PW4001/PW4002).</summary>
    public bool IsRegisterToRegister(Latch from, Latch to)
        => RegisterOf(from) is { } launch && ReferenceEquals(launch.Slave, from)
           && RegisterOf(to) is { } capture && ReferenceEquals(capture.Master, to);

    /// <summary>Delay of the latch's output stage (zero when it has none).</summary>
    public Time OutputDelay(Latch latch) => latch.OutputStage is { } stage ? StageDelay(stage) : Time.Zero;
}
