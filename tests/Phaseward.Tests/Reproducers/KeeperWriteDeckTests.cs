using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;

namespace Phaseward.Tests.Reproducers;

/// <summary>
/// PW3005 decks. Reference: the deck run in ngspice (batch mode); the estimate it is compared with is the divider
/// V·R_w/(R_w+R_k) of the write path against the keeper (Ohm's law). Illustrative process: V = 1.2 V, input drivers
/// 4 kΩ, pass gates 5 kΩ: a write path of 9 kΩ.
/// </summary>
public class KeeperWriteDeckTests
{
    private static (SpiceDeck Deck, MeasuredValues Measured) Run(double keeperKiloohms)
    {
        var c = new Circuit("KeeperTest");
        var x = c.TransmissionGate(c.Input("d"), c.Input("sel"), "x");
        c.Keeper(x, resistance: keeperKiloohms.Kiloohms());
        c.Inverter(x, "q");
        var report = Checker.Check(c.ToNetlist());
        var deck = Reproducer.Deck(report.Findings.Single(f => f.RuleId == RuleCatalog.KeeperTooStrong.Id), report.Netlist);
        return (deck, Ngspice.Run(deck));
    }

    [Theory]
    // 10 kΩ: 1.2 × 9 / 19 = 568 mV, past vdd/2 but short of the margin: reported, and these ideal stages flip.
    [InlineData(10.0, 1)]
    // 5 kΩ: 1.2 × 9 / 14 = 771 mV, short of vdd/2: the keeper holds the node.
    [InlineData(5.0, 0)]
    public void TheHeldCopyReachesTheDividerLevelAndTheClosedLoopFlipsOnlyPastTheSwitchingPoint(double keeperKiloohms, int flips)
    {
        var (deck, measured) = Run(keeperKiloohms);

        var stated = 1.2 * 9 / (9 + keeperKiloohms);
        Assert.Equal(stated, deck.Estimates.Single(e => e.Name == "v_level").Value, 9);
        Assert.Equal(flips, deck.Estimates.Single(e => e.Name == "flipped").Value);
        Assert.InRange(measured.Value("v_level", deck), stated * 0.98, stated * 1.02);
        Assert.Equal(flips, measured.Value("flipped", deck));
        // Held by the keeper, the closed loop sits at the same divider level while the write path pulls; flipped, at 0 V.
        Assert.InRange(measured.Value("v_loop", deck), flips == 1 ? -0.01 : stated * 0.98, flips == 1 ? 0.05 : stated * 1.02);
    }
}
