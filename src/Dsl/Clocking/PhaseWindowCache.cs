using System.Collections.Generic;

namespace Phaseward.Clocking;

/// <summary>
/// The windows of the phases one computation asks about, each made once: <see cref="PhaseWindow.Of"/> makes a new
/// window per call, and a rule asks once per latch path. Kept for one run rather than on the phase or the netlist,
/// because a clock's skew and delay can fall back to its circuit's process figures.
/// </summary>
internal sealed class PhaseWindowCache
{
    // Made on the first window asked for: some owners (one droop budget per storage node) never ask.
    private Dictionary<Phase, PhaseWindow>? windows;

    public PhaseWindow Of(Phase phase)
    {
        windows ??= new Dictionary<Phase, PhaseWindow>();
        if (!windows.TryGetValue(phase, out var window))
            windows.Add(phase, window = PhaseWindow.Of(phase));
        return window;
    }
}
