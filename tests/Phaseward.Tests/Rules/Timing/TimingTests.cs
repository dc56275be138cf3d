using System;
using System.Linq;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Rules.Timing;

/// <summary>
/// Timing figures (PW4xxx). Test figures (see <see cref="Figures.Flat"/>): t_TG = 34.5 ps, t_inv = 27.6 ps per stage
/// (0.69·R·C: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 5,
/// from memory).
/// </summary>
public class TimingFiguresTests
{
    [Fact]
    public void DynamicRegisterFiguresFollowTheTextbookDecomposition()
    {
        // Rabaey et al., 2nd ed., ch. 7, dynamic transmission-gate edge-triggered register (section 7.4.1 from memory):
        // setup = t(T1); clock-to-output = t(T2) + two inverters; the 1-1 overlap is a hold requirement.
        // Expected: setup 34.5 ps, clk-q 34.5 + 2 · 27.6 = 89.7 ps, contamination clk-q 34.5 + 27.6 = 62.1 ps,
        // hold = 1-1 overlap = complement skew = 45 ps.
        var c = Figures.NewCircuit("figures");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 45.Picoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");

        var register = TimingFigures.For(c.ToNetlist()).Registers.Single();

        Assert.Equal(34.5, Figures.Ps(register.Setup), 9);
        Assert.Equal(89.7, Figures.Ps(register.ClockToOutput), 9);
        Assert.Equal(62.1, Figures.Ps(register.ClockToOutputMin), 9);
        Assert.Equal(45, Figures.Ps(register.Hold), 9);
    }

    [Fact]
    public void LatchFiguresAndTheBorrowingLimit()
    {
        // Dynamic latch: setup = entry gate 34.5 ps; D-to-Q = 34.5 + 27.6 = 62.1 ps; hold after the nominal edge =
        // the complement's lateness (here 0). Static latch: the loop (output and feedback inverters) must also settle:
        // setup = 34.5 + 2 · 27.6 = 89.7 ps (common practice: the loop must hold the value when the feedback gate takes over).
        // Largest borrowing with 50 % duty and no overlap: T/2 − t_setup = 500 − 34.5 = 465.5 ps
        // (Weste & Harris, "CMOS VLSI Design", 4th ed., ch. 10, time borrowing, t_borrow ≤ T_c/2 − (t_setup + t_nonoverlap);
        // section from memory).
        var c = Figures.NewCircuit("latches");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var d = c.Input("d");
        c.DynamicLatch(d, clk.High, "dyn");
        c.StaticLatch(d, clk.Low, "stat");

        var figures = TimingFigures.For(c.ToNetlist());
        var dyn = figures.Latches.Single(l => l.Name == "dyn");
        var stat = figures.Latches.Single(l => l.Name == "stat");

        Assert.Equal(34.5, Figures.Ps(dyn.Setup), 9);
        Assert.Equal(62.1, Figures.Ps(dyn.DataToOutput), 9);
        Assert.Equal(0, Figures.Ps(dyn.Hold), 9);
        Assert.Equal(89.7, Figures.Ps(stat.Setup), 9);
        Assert.Equal(465.5, Figures.Ps(dyn.Window.Length - dyn.Setup), 9);
        var table = figures.ToString();
        Assert.Contains("dyn | clk.High | dynamic", table);
        Assert.Contains("stat | clk.Low | static", table);
    }
}

/// <summary>
/// PW4001 / PW4002. Constraints from Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10 (sections from memory):
/// max-delay T_c ≥ t_pcq + t_pd + t_setup, min-delay t_cd ≥ t_hold − t_ccq, and clock skew tightening both
/// (T_c ≥ t_pcq + t_pd + t_setup + t_skew; t_cd ≥ t_hold − t_ccq + t_skew).
/// </summary>
public class RegisterTimingRuleTests
{
    private static readonly RegisterTimingRule Rule = new();

    private static Circuit Pipeline(double periodPs, int inverters, double captureDelayPs = 0)
    {
        var c = Figures.NewCircuit("ff");
        var clk = c.Clock("clk", periodPs.Picoseconds(), 0.5, 30.Picoseconds());
        var capture = captureDelayPs > 0 ? c.BufferedClock(clk, captureDelayPs.Picoseconds(), "late") : clk;
        var net = c.DynamicRegister(c.Input("d"), clk, "R1");
        for (var i = 0; i < inverters; i++) net = c.Inverter(net);
        c.DynamicRegister(net, capture, "R2");
        return c;
    }

    [Fact]
    public void WorkedExample_SetupViolationCarriesItsSlack()
    {
        // t_clk-q 89.7 ps + 5 inverters 165.6 ps + t_setup 34.5 ps = 289.8 ps: fits in 300 ps (slack 10.2 ps),
        // misses 280 ps (slack −9.8 ps). The last inverter charges its net and, through R2's open master entry gate,
        // the master's storage node (a side branch is a capacitive load where it leaves the path, Elmore 1948):
        // 4 · 27.6 ps + 0.69 · 4 kΩ · (10 + 10) fF = 165.6 ps.
        Assert.Empty(Figures.Run(Rule, Pipeline(300, 5)));

        var finding = Assert.Single(Figures.Run(Rule, Pipeline(280, 5)));
        Assert.Equal("PW4001", finding.RuleId);
        Assert.Equal("Register 'R2' misses its setup time on the path from register 'R1': clock-to-output 89.7 ps + path 166 ps + " +
                     "setup 34.5 ps = 290 ps exceeds the 280 ps available (slack -9.8 ps)", finding.Message);
        Assert.Equal(-9.8e-12, double.Parse(finding.Properties[FindingProperties.MarginSeconds], System.Globalization.CultureInfo.InvariantCulture), 1e-18);
    }

    [Fact]
    public void WorkedExample_HoldViolationFromALateCaptureClock()
    {
        // t_ccq 62.1 ps + one inverter 27.6 ps = 89.7 ps against hold 30 ps (1-1 overlap) + skew: 50 ps → slack +9.7 ps,
        // 70 ps → slack −10.3 ps.
        Assert.Empty(Figures.Run(Rule, Pipeline(1000, 1, 50)));

        var finding = Assert.Single(Figures.Run(Rule, Pipeline(1000, 1, 70)));
        Assert.Equal("PW4002", finding.RuleId);
        Assert.Equal("Register 'R2' can lose its data on the path from register 'R1': minimum clock-to-output 62.1 ps + shortest path 27.6 ps = " +
                     "89.7 ps is less than its hold time 30 ps plus clock skew 70 ps (slack -10.3 ps)", finding.Message);
    }

    [Fact]
    public void ALateCaptureClockAlsoGivesTheSetupPathMoreTime()
    {
        // 5 inverters at 280 ps miss by 9.8 ps; a capture clock 20 ps late gives 300 ps: slack +10.2 ps (hold: 62.1 +
        // 138 ps ≫ 30 + 20 ps).
        Assert.Empty(Figures.Run(Rule, Pipeline(280, 5, 20)));
    }

    [Fact]
    public void PolicySlackRejectsNegativeValues()
    {
        Assert.Single(Figures.Run(Rule, Pipeline(300, 5), new RulePolicy { MinimumTimingSlack = 15.Picoseconds() }));
        var error = Assert.Throws<ArgumentException>(() => new RulePolicy { MinimumTimingSlack = new Time(double.NaN) });
        Assert.Contains("MinimumTimingSlack", error.Message);
    }
}

/// <summary>
/// PW4003: two-phase latch paths with time borrowing (Weste &amp; Harris, "CMOS VLSI Design", 4th ed., ch. 10, time
/// borrowing; section from memory): data arriving after a latch opens passes through and the lateness is borrowed
/// from the next half-cycle; it must arrive before the window closes less the setup time.
/// Clock 1 ns, 50 % duty, no overlap: windows of 500 ps; dynamic latches: setup 34.5 ps, so arrival ≤ 465.5 ps.
/// </summary>
public class LatchBorrowingRuleTests
{
    private static readonly LatchBorrowingRule Rule = new();

    private static Circuit Chain(int first, int second)
    {
        var c = Figures.NewCircuit("twophase");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var net = c.DynamicLatch(c.Input("d"), clk.High, "L1");
        for (var i = 0; i < first; i++) net = c.Inverter(net);
        net = c.DynamicLatch(net, clk.Low, "L2");
        for (var i = 0; i < second; i++) net = c.Inverter(net);
        c.DynamicLatch(net, clk.High, "L3");
        return c;
    }

    [Fact]
    public void WorkedExample_BorrowedTimeIsCarriedToTheNextStage()
    {
        // The last stage before a latch charges its net and, through the latch's open entry gate, the storage node (a side
        // branch is a capacitive load where it leaves the path, Elmore 1948): 2 · 27.6 ps.
        // L1→L2: 34.5 + (20 + 2) · 27.6 − 500 = 141.7 ps after L2 opens: L2 borrows 141.7 ps (within 465.5 ps).
        // L2→L3 with 27 inverters: 34.5 + 141.7 + 29 · 27.6 − 500 = 476.6 ps > 465.5 ps: slack −11.1 ps.
        var finding = Assert.Single(Figures.Run(Rule, Chain(20, 27)));

        Assert.Equal("PW4003", finding.RuleId);
        Assert.Equal("Data from latch 'L2' reaches latch 'L3' 477 ps after 'L3' opens, but its window (500 ps) less its setup time (34.5 ps) " +
                     "allows only 466 ps (slack -11.1 ps; 'L2' had borrowed 142 ps)", finding.Message);
        var arrival = LatchBorrowing.Compute(TimingFigures.For(Chain(20, 27).ToNetlist())).Single(a => a.Path.To.Name == "L3");
        Assert.Equal(476.6, Figures.Ps(arrival.Arrival), 6);
        Assert.Equal(141.7, Figures.Ps(arrival.SourceBorrow), 6);
    }

    [Fact]
    public void WithoutTheEarlierBorrowingTheSameStageFits()
    {
        // L1→L2 with no inverters arrives before L2 opens (no borrowing); L2→L3: 34.5 + 31 · 27.6 − 500 = 390.1 ps ≤ 465.5 ps.
        Assert.Empty(Figures.Run(Rule, Chain(0, 29)));
        // 26 inverters after borrowing 141.7 ps: 34.5 + 141.7 + 28 · 27.6 − 500 = 449.0 ps ≤ 465.5 ps (slack 16.5 ps).
        Assert.Empty(Figures.Run(Rule, Chain(20, 26)));
    }

    [Fact]
    public void ALoopOfLatchesTerminatesAndReportsTheOverlongStage()
    {
        var c = Figures.NewCircuit("loop");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var start = c.Node("start");
        var net = c.DynamicLatch(start, clk.High, "P");
        for (var i = 0; i < 40; i++) net = c.Inverter(net);
        var q = c.DynamicLatch(net, clk.Low, "Q");
        c.Inverter(q, start);

        // P→Q: 34.5 + 41 · 27.6 − 500 = 665.1 ps > 465.5 ps.
        var finding = Assert.Single(Figures.Run(Rule, c));
        Assert.Equal("Q", finding.Properties[FindingProperties.TargetLatch]);
    }
}
