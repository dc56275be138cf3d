using System.Linq;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;
using Phaseward.Tests.Reference;

namespace Phaseward.Tests.Rules.Timing;

/// <summary>
/// PW4004: a latch window too short for its entry gate to charge the storage node. Entry delay 0.69 · R · C, the 50 %
/// point of a single RC step response (Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design
/// Perspective", 2nd ed., ch. 5, t_p = 0.69·R_eq·C_L; from memory); the window must be at least that long (common
/// practice: a latch's minimum pulse width is its setup requirement). Illustrative process: pass gates 5 kΩ nominal,
/// checked at the slow corner (×1.3, the invented default): 6.5 kΩ, so a 60 fF node needs 0.69 · 6.5 kΩ · 60 fF =
/// 269.1 ps.
/// </summary>
public class LatchWriteWindowRuleTests
{
    private static readonly LatchWriteWindowRule Rule = new();

    // A pulse latch: a clock whose high phase lasts pulsePs, a dynamic latch on it, its storage node set to 60 fF.
    private static Circuit PulseLatch(double pulsePs, double skewPs = 0, double periodPs = 1000)
    {
        var c = new Circuit("pulse");
        var clk = c.Clock("pulse", periodPs.Picoseconds(), pulsePs / periodPs, skewPs.Picoseconds());
        c.DynamicLatch(c.Input("d"), clk.High, "pl");
        c.SetCapacitance(c.ToNetlist().Nets.Single(n => n.Name == "pl.x"), 60.Femtofarads());
        return c;
    }

    private static Finding[] Run(Circuit c, RulePolicy? policy = null)
        => Rule.Check(new RuleContext(c.ToNetlist(), policy ?? RulePolicy.Default)).ToArray();

    [Fact]
    public void A_30ps_pulse_latch_charging_60fF_through_a_pass_gate_is_reported_with_its_figures()
    {
        var finding = Assert.Single(Run(PulseLatch(30)));
        Assert.Equal(RuleCatalog.LatchWriteWindow.Id, finding.RuleId);
        Assert.Equal("Latch 'pl' cannot be written in its window: it is open 30 ps, 30 ps of it with both halves of its entry gate on " +
                     "(complement skew 0 s), but the entry gate needs 269 ps to charge storage node 'pl.x' (0.69·R·C with R = 6.5 kΩ, " +
                     "C = 60 fF; margin -239 ps; slow corner, delays ×1.3)", finding.Message);
        Assert.Equal(-239.1e-12, double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], System.Globalization.CultureInfo.InvariantCulture), 1e-18);
        Assert.Equal("pl", finding.Properties[FindingPropertyKeys.TargetLatch]);
    }

    [Fact]
    public void The_entry_delay_against_the_circuit_simulator()
    {
        // One RC section in ngspice-39 (tests/reference/ngspice/netlists/rc_ladder_n01.cir): t50 / (R·C) = ln 2.
        var model = LatchModel.Of(PulseLatch(30).ToNetlist());
        var write = LatchWriteWindow.Of(model, model.Latches[0]);
        var rc = write.Resistance * write.Capacitance;
        var simulated = NgspiceReference.Ladders.Single(l => l.Sections == 1);
        Assert.InRange(write.EntryDelay.Seconds / rc.Seconds / (simulated.T50Seconds / (simulated.Ohms * simulated.Farads)), 0.99, 1.0);
    }

    [Fact]
    public void A_window_long_enough_to_write_the_node_passes()
    {
        Assert.Empty(Run(PulseLatch(270)));
        Assert.Single(Run(PulseLatch(269)));
        // The nominal figure (207 ps) would pass a 230 ps window; the slow corner does not.
        Assert.Single(Run(PulseLatch(230)));
        Assert.Single(Run(PulseLatch(280), new RulePolicy { MinimumTimingSlack = 20.Picoseconds() }));
    }

    [Fact]
    public void Complement_skew_is_taken_off_both_ends_of_the_window()
    {
        // High time 290 ps: the gate is fully on for 290 − skew (the window, 290 + skew, less a skew tail at each end).
        Assert.Empty(Run(PulseLatch(290, skewPs: 15)));  // 275 ps ≥ 269.1 ps
        var finding = Assert.Single(Run(PulseLatch(290, skewPs: 25))); // 265 ps < 269.1 ps
        Assert.Contains("it is open 315 ps, 265 ps of it with both halves of its entry gate on (complement skew 25 ps)", finding.Message);
        Assert.Contains("margin -4.1 ps", finding.Message);
    }

    [Fact]
    public void A_hand_built_latch_on_the_low_phase_is_found_alike()
    {
        var c = new Circuit("handmade");
        var clk = c.Clock("pulse", 1.Nanoseconds(), 0.97, 0.Picoseconds());
        var x = c.TransmissionGate(c.Input("d"), clk.Low, "x");
        c.SetCapacitance(x, 60.Femtofarads());
        c.Inverter(x, "q");

        var finding = Assert.Single(Run(c));
        Assert.StartsWith("Latch 'x' cannot be written in its window: it is open 30 ps", finding.Message);
    }

    [Fact]
    public void Ordinary_latches_on_ordinary_clocks_are_not_reported()
    {
        var c = new Circuit("ordinary");
        var clk = c.Clock("clk", 1.Nanoseconds());
        c.StaticRegister(c.DynamicRegister(c.Input("d"), clk, "r1"), clk, "r2");
        c.StaticLatch(c.Input("e"), clk.Low, "s");
        Assert.Empty(Run(c));
    }
}
