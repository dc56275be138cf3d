using System;
using System.Collections.Generic;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Tests.Rules.ClockPhases;

/// <summary>Shared set-up for the clock-phase and timing tests.</summary>
internal static class Figures
{
    /// <summary>
    /// A process in which every net is exactly 10 fF (wire only, no gate or diffusion share), pass gates are 5 kΩ and
    /// restoring stages 4 kΩ. Test-only figures chosen so that stage delays are round by hand:
    /// t_TG = 0.69 · 5 kΩ · 10 fF = 34.5 ps, t_inv = 0.69 · 4 kΩ · 10 fF = 27.6 ps. Both corners are the nominal
    /// figures (delay factors 1), so that the textbook figures come out as computed by hand; the corner tests set
    /// their own factors.
    /// </summary>
    public static Process Flat { get; } = new()
    {
        Name = "flat 10 fF (test figures)",
        WireCapacitance = 10.Femtofarads(),
        GateCapacitance = 0.Femtofarads(),
        DiffusionCapacitance = 0.Femtofarads(),
        PassGateResistance = 5.Kiloohms(),
        DriverResistance = 4.Kiloohms(),
        SlowDelayFactor = 1,
        FastDelayFactor = 1,
    };

    public const double TgPs = 34.5;
    public const double InvPs = 27.6;

    public static Circuit NewCircuit(string name, bool flat = true)
    {
        var circuit = new Circuit(name);
        if (flat) circuit.UseProcess(Flat);
        return circuit;
    }

    /// <summary>
    /// A ripple counter of <paramref name="bits"/> dynamic registers on the flat figures: each register takes the
    /// previous stage's NAND, which also feeds the next NAND, so register k's slave reaches the master of every later
    /// register and each master its own slave: bits + bits(bits − 1)/2 latch-to-latch paths.
    /// </summary>
    public static Netlist Ripple(int bits, Time period)
    {
        var c = NewCircuit("ripple");
        var tick = c.Clock("tick", period);
        var carry = c.Input("count_enable");
        for (var bit = 0; bit < bits; bit++)
            carry = c.Nand(c.DynamicRegister(carry, tick, "count" + bit), carry);
        c.Output("carry_out", carry);
        return c.ToNetlist();
    }

    /// <summary>
    /// Adds <paramref name="stages"/> random stages to <paramref name="pool"/>, each taking nets already in it:
    /// inverters, NANDs, NORs, buffers and data-controlled pass gates, and, given <paramref name="clocked"/>, pass gates
    /// on its phases and keepers too. For the property tests that check a search against its definition.
    /// </summary>
    public static void AddRandomStages(Circuit c, List<Net> pool, Random random, int stages, Clock? clocked = null)
    {
        for (var i = 0; i < stages; i++)
        {
            Net Pick() => pool[random.Next(pool.Count)];
            pool.Add(random.Next(clocked is null ? 5 : 7) switch
            {
                0 => c.Inverter(Pick()),
                1 => c.Nand(Pick(), Pick()),
                2 => c.Nor(Pick(), Pick()),
                3 => c.TransmissionGate(Pick(), Pick()),
                4 => c.Buffer(Pick()),
                5 => c.TransmissionGate(Pick(), random.Next(2) == 0 ? clocked!.High : clocked!.Low),
                _ => c.Keeper(c.Inverter(Pick())),
            });
        }
    }

    public static Finding[] Run(Rule rule, Circuit circuit, RulePolicy? policy = null)
        => rule.Check(new RuleContext(circuit.ToNetlist(), policy ?? RulePolicy.Default)).ToArray();

    public static double Ps(Time t) => t.Seconds * 1e12;
}
