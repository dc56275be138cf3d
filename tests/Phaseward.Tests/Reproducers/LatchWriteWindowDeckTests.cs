using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW4004 decks. Reference: the deck run in ngspice (batch mode); the estimates it is compared with are the entry
/// delay 0.69·R·C, the 50 % point of a single RC step response (Rabaey, Chandrakasan, Nikolić, "Digital Integrated
/// Circuits: A Design Perspective", 2nd ed., ch. 5, from memory), and the RC charging law V·(1 − e^(−t/RC)).
/// Illustrative process: pass gates 5 kΩ, at the slow corner the rule uses (×1.3, the invented default) 6.5 kΩ, and
/// the deck simulates that corner; the storage node set to 60 fF: RC = 390 ps, 0.69 · 6.5 kΩ · 60 fF = 269.1 ps.
/// </summary>
public class LatchWriteWindowDeckTests
{
    [Theory]
    // A 30 ps pulse, no skew: the node reaches 1.2 × (1 − e^(−30/390)) = 89 mV; not written.
    [InlineData(30.0, 0.0)]
    // A 100 ps pulse with 20 ps of complement skew: both halves on for 60 ps: 1.2 × (1 − e^(−60/390)) = 171 mV.
    [InlineData(100.0, 20.0)]
    public void TheWindowLeavesTheNodeShortOfTheSwitchingPointWhileTheHeldGateNeedsTheEntryDelay(double pulsePs, double skewPs)
    {
        var c = new Circuit("PulseTest");
        var clk = c.Clock("pulse", 1.Nanoseconds(), pulsePs / 1000, skewPs.Picoseconds());
        c.DynamicLatch(c.Input("d"), clk.High, "pl");
        c.SetCapacitance(c.ToNetlist().Nets.Single(n => n.Name == "pl.x"), 60.Femtofarads());
        var report = Checker.Check(c.ToNetlist());
        var deck = Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.LatchWriteWindow.Id), report.Netlist);
        var measured = Ngspice.Run(deck);

        var fullyOn = (pulsePs - skewPs) * 1e-12; // the window (pulse + skew) less the skew at each end
        var level = 1.2 * (1 - System.Math.Exp(-fullyOn / 390e-12));
        Assert.Equal(level, deck.Estimates.Single(e => e.Name == "v_close").Value, 9);
        Assert.InRange(measured.Value("v_close", deck), level * 0.95, level * 1.05);
        Assert.Equal(0, measured.Value("written", deck));
        Assert.Equal(269.1e-12, deck.Estimates.Single(e => e.Name == "t_write").Value, 15);
        Assert.InRange(measured.Value("t_write", deck), 269.1e-12 * 0.95, 269.1e-12 * 1.05);
    }
}
