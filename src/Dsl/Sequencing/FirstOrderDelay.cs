using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// The first-order delay of one stage, used by the clock-phase and timing rules: t = 0.69 · R · C, with R the
/// device's effective resistance (<see cref="Netlist.ResistanceOf"/>) and C the total capacitance of the net it
/// drives (<see cref="Netlist.CapacitanceOf"/>).
/// </summary>
/// <remarks>
/// 0.69·R·C is the 50 % point of a lumped RC step response (0.69 ≈ ln 2: <see cref="FiftyPercentDelay.SinglePoleFactor"/>,
/// the one value of the factor), the usual first-order propagation delay of
/// a switch-resistor stage (Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd
/// ed., ch. 5, t_p = 0.69·R_eq·C_L; section from memory). Each stage is taken on its own: the driver of the
/// stage's input is not added to its RC (that is the Elmore model's job for pass-gate chains, rule PW2001), a
/// buffer counts as one stage driving its load, and rise and fall are not told apart. A first-order estimate only.
/// </remarks>
internal static class FirstOrderDelay
{
    public static Time Of(Netlist netlist, Device device)
        => netlist.ResistanceOf(device) * netlist.CapacitanceOf(device.Output) * FiftyPercentDelay.SinglePoleFactor;
}
