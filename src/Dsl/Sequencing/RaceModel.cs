namespace Phaseward.Sequencing;

/// <summary>
/// The one model of a race through overlapping windows, shared by PW1002 (latch pairs) and PW4002 (register hold):
/// data that enters launching latch A when A opens must not reach catching latch B's storage node while B still
/// conducts. margin = t_entry,min(A) + t_path,min (A's output stage included) + t_entry(B's gate) − t_open, where
/// t_open is how long B still conducts after A opens (the overlap of their windows on the design's time base). The
/// delays are taken at the fast corner (<see cref="Process.FastDelayFactor"/>), where a race is hardest to avoid.
/// </summary>
/// <remarks>
/// Reference: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 7
/// (master–slave registers and non-ideal clocks, section numbers from memory): with clock overlap the transmission-
/// gate register is race-free only while t_overlap0-0 &lt; t_T1 + t_I1 + t_T2, and the 1-1 overlap becomes a hold
/// requirement on the input. The same condition, applied to a register's slave feeding another register's master,
/// is the hold check: the catching pass gate's own delay is credited in both (first-order: new data must charge the
/// catching storage node before the gate shuts).
/// </remarks>
internal static class RaceModel
{
    /// <summary>Fastest data from A's opening to B's storage node at the fast corner: A's fastest entry gate, the shortest path, B's entry gate.</summary>
    public static Time Fastest(LatchModel model, LatchPath path)
        => (model.FastestEntryDelay(path.From) + path.MinDelay + model.StageDelay(path.EntryGate)) * model.Netlist.Process.FastDelayFactor;

    /// <summary>How long a gate on <paramref name="catching"/> still conducts after one on <paramref name="launching"/> opens.</summary>
    public static Time Overlap(LatchModel model, Phase launching, Phase catching)
        => model.WindowOf(launching).StillOpenAfterOpening(model.WindowOf(catching));
}
