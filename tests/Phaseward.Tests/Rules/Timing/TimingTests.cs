using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;
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
        // Rabaey et al., 2nd ed., ch. 7, dynamic transmission-gate edge-triggered register (section from memory):
        // setup = t(T1); clock-to-output = t(T2) + two inverters; the 1-1 overlap is a hold requirement
        // (t_overlap1-1 < t_hold). Expected: setup 34.5 ps, clk-q 34.5 + 2 · 27.6 = 89.7 ps, contamination clk-q
        // 34.5 + 27.6 = 62.1 ps, 1-1 overlap = complement skew = 45 ps; hold with the master gate's own delay credited
        // (the race model shared with PW1002): 45 − 34.5 = 10.5 ps.
        var c = Figures.NewCircuit("figures");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 45.Picoseconds());
        c.DynamicRegister(c.Input("d"), clk, "R");

        var register = TimingFigures.For(c.ToNetlist(), Corner.Nominal).Registers.Single();

        Assert.Equal(34.5, Figures.Ps(register.Setup), 9);
        Assert.Equal(89.7, Figures.Ps(register.ClockToOutput), 9);
        Assert.Equal(62.1, Figures.Ps(register.ClockToOutputMin), 9);
        Assert.Equal(45, Figures.Ps(register.EdgeOverlap), 9);
        Assert.Equal(10.5, Figures.Ps(register.Hold), 9);
    }

    [Fact]
    public void StaticRegisterClockToOutputIsTheSlaveGateAndInverterOnly()
    {
        // Rabaey et al., 2nd ed., ch. 7, static master–slave register built from transmission gates (section from
        // memory): t_setup = t_T1 + t_I + t_I (the master's loop must hold the value), t_c-q = t_T2 + t_I (slave gate and
        // inverter: the master's output inverter has settled within the setup time). Figures: setup 34.5 + 2 · 27.6 =
        // 89.7 ps, t_c-q = 34.5 + 27.6 = 62.1 ps (not 89.7 ps: the master inverter is not counted twice).
        var c = Figures.NewCircuit("static");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        c.StaticRegister(c.Input("d"), clk, "R");

        var register = TimingFigures.For(c.ToNetlist(), Corner.Nominal).Registers.Single();

        Assert.Equal(89.7, Figures.Ps(register.Setup), 9);
        Assert.Equal(62.1, Figures.Ps(register.ClockToOutput), 9);
        Assert.Equal(62.1, Figures.Ps(register.ClockToOutputMin), 9);
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

        var figures = TimingFigures.For(c.ToNetlist(), Corner.Nominal);
        var dyn = figures.Latches.Single(l => l.Name == "dyn");
        var stat = figures.Latches.Single(l => l.Name == "stat");

        Assert.Equal(34.5, Figures.Ps(dyn.Setup), 9);
        Assert.Equal(62.1, Figures.Ps(dyn.DataToOutput), 9);
        Assert.Equal(0, Figures.Ps(dyn.Hold), 9);
        Assert.Equal(89.7, Figures.Ps(stat.Setup), 9);
        Assert.Equal(465.5, Figures.Ps(dyn.BorrowLimit), 9);
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
                     "setup 34.5 ps = 290 ps exceeds the 280 ps available (slack -9.8 ps; slow corner, delays ×1)", finding.Message);
        Assert.Equal(-9.8e-12, double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], System.Globalization.CultureInfo.InvariantCulture), 1e-18);
    }

    [Fact]
    public void WorkedExample_HoldViolationFromALateCaptureClock()
    {
        // Weste & Harris's min-delay constraint t_ccq + t_cd ≥ t_hold + t_skew, with the hold time of the transmission-
        // gate register t_hold = t_overlap1-1 − t_T1 = 30 − 34.5 = −4.5 ps (the 1-1 overlap less the master gate's own
        // delay: the race model PW1002 uses). t_ccq 62.1 ps + one inverter 27.6 ps = 89.7 ps against −4.5 ps + skew:
        // 90 ps → slack +4.2 ps, 110 ps → slack −15.8 ps.
        Assert.Empty(Figures.Run(Rule, Pipeline(1000, 1, 90)));

        var finding = Assert.Single(Figures.Run(Rule, Pipeline(1000, 1, 110)));
        Assert.Equal("PW4002", finding.RuleId);
        Assert.Equal("Register 'R2' can lose its data on the path from register 'R1': minimum clock-to-output 62.1 ps + shortest path 27.6 ps = " +
                     "89.7 ps is less than its hold time -4.5 ps plus clock skew 110 ps (slack -15.8 ps; fast corner, delays ×1)", finding.Message);
    }

    [Fact]
    public void TheHoldCheckAndThePw1002RaceGiveOneMarginForOneRace()
    {
        // The same race seen by PW4002 (register to register) and PW1002 (the same latches built as a latch pair):
        // t_ccq + t_path + t_T1 − (overlap + skew) both ways. Capture 70 ps late: 62.1 + 27.6 + 34.5 − (30 + 70) = +24.2 ps.
        var registers = Pipeline(1000, 1, 70);
        var check = RegisterPathChecks.For(registers.ToNetlist()).Single().Check;
        Assert.Equal(24.2, Figures.Ps(check.HoldSlack), 9);

        var c = Figures.NewCircuit("pair");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
        var late = c.BufferedClock(clk, 70.Picoseconds(), "late");
        var launch = c.DynamicLatch(c.Input("d"), clk.High, "L");
        c.DynamicLatch(c.Inverter(launch), late.Low, "C");
        var race = OverlapRaces.For(LatchModel.Of(c.ToNetlist())).Single(r => r.Path.To.Name == "C");
        Assert.Equal(24.2, Figures.Ps(race.Margin), 9);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void BackToBackRegistersOnOneClockAreCleanWhenTheRaceModelSaysSo(bool dynamic)
    {
        // A scan chain of eight registers on one clock, no logic between. Hold condition of the transmission-gate
        // register (Rabaey et al., 2nd ed., ch. 7, clock overlap, from memory): the new data must not pass the
        // capturing master before the 1-1 overlap ends: t_T2 + t_I (t_ccq) + t_T1 > t_overlap1-1. Here 34.5 + 27.6 +
        // 34.5 = 96.6 ps against 30 ps (slack +66.6 ps) for both the dynamic and the static register.
        var c = Figures.NewCircuit("scan");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
        var net = c.Input("si");
        for (var i = 0; i < 8; i++)
            net = dynamic ? c.DynamicRegister(net, clk, "S" + i) : c.StaticRegister(net, clk, "S" + i);

        var netlist = c.ToNetlist();
        Assert.Empty(Figures.Run(Rule, c));
        Assert.Empty(new OverlapRaceRule().Check(new RuleContext(netlist, RulePolicy.Default)));
        Assert.Empty(new SameWindowLatchesRule().Check(new RuleContext(netlist, RulePolicy.Default)));
        var checks = RegisterPathChecks.For(netlist);
        Assert.Equal(7, checks.Count);
        Assert.All(checks, r => Assert.Equal(66.6, Figures.Ps(r.Check.HoldSlack), 9));
    }

    [Fact]
    public void ARisingEdgeRegisterFeedingAFallingEdgeRegisterIsAHalfCyclePath()
    {
        // The rising register's slave (open while high) feeds the falling register's master (open while high): a
        // register-to-register path with half a period (500 ps) for setup, not a same-phase pair (PW1001).
        // t_c-q 89.7 ps + 14 inverters and the last one's charge of the master's storage node (one pass-gate delay model:
        // 15 · 27.6 = 414 ps) + setup 34.5 ps = 538.2 ps > 500 ps: slack −38.2 ps.
        var c = Figures.NewCircuit("half");
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 30.Picoseconds());
        var net = c.DynamicRegister(c.Input("d"), clk, "R1");
        for (var i = 0; i < 14; i++) net = c.Inverter(net);
        // A falling-edge register built by hand: master open while high, slave while low.
        c.DynamicLatch(c.DynamicLatch(net, clk.High, "R2m"), clk.Low, "R2");

        var netlist = c.ToNetlist();
        Assert.Empty(new SameWindowLatchesRule().Check(new RuleContext(netlist, RulePolicy.Default)));
        var finding = Assert.Single(Figures.Run(Rule, c));
        Assert.Equal("PW4001", finding.RuleId);
        Assert.Contains("exceeds the 500 ps available (slack -38.2 ps; slow corner, delays ×1)", finding.Message);
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
/// PW4001/PW4002 report each capturing register once per check, for its worst path, and count the other launching
/// registers that fail it. Checked against the per-pair figures (<see cref="RegisterPathChecks"/>), grouped by hand.
/// </summary>
public class RegisterTimingPerCaptureTests
{
    [Fact]
    public void A_register_missed_from_many_launching_registers_is_reported_once_for_the_worst()
    {
        // A ripple counter on a 400 ps clock: register k's carry passes the NANDs of every bit before it, so the late bits
        // miss setup from many earlier registers (first-order figures of the flat test process).
        var netlist = Figures.Ripple(12, 400.Picoseconds());

        var failing = RegisterPathChecks.For(netlist).Where(r => r.Check.SetupSlack < Time.Zero).GroupBy(r => r.Capture).ToList();
        Assert.Contains(failing, g => g.Count() > 1);
        var findings = new RegisterTimingRule().Check(new RuleContext(netlist, RulePolicy.Default))
            .Where(f => f.RuleId == RuleCatalog.RegisterSetup.Id).ToList();

        Assert.Equal(failing.Count, findings.Count);
        foreach (var group in failing)
        {
            var finding = Assert.Single(findings, f => f.Properties[FindingPropertyKeys.Register] == group.Key.Name);
            var worst = group.OrderBy(r => r.Check.SetupSlack).First();
            Assert.Equal(worst.Launch.Name, finding.Properties[FindingPropertyKeys.SourceLatch]);
            Assert.Equal(worst.Check.SetupSlack.Seconds, double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], System.Globalization.CultureInfo.InvariantCulture));
            var others = group.Count() - 1;
            Assert.Equal(others.ToString(System.Globalization.CultureInfo.InvariantCulture), finding.Properties[FindingPropertyKeys.OtherFailingLaunches]);
            if (others == 0)
                Assert.EndsWith(")", finding.Message);
            else
                Assert.EndsWith(others == 1 ? "; 1 more launching register fails it too" : $"; {others} more launching registers fail it too", finding.Message);
        }
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
        Assert.Equal("Data from latch 'L2' reaches latch 'L3' 477 ps after 'L3' opens, but its phase (500 ps) less its setup time and clock skew (34.5 ps) " +
                     "allows only 466 ps (slack -11.1 ps; 'L2' had borrowed 142 ps; slow corner, delays ×1)", finding.Message);
        var arrival = LatchBorrowing.Compute(TimingFigures.For(Chain(20, 27).ToNetlist(), Corner.Nominal)).Single(a => a.Path.To.Name == "L3");
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

        // Each path's last stage also charges the next latch's storage node through its open entry gate (+27.6 ps each).
        // P→Q: 34.5 + 42 · 27.6 − 500 = 692.7 ps > 465.5 ps, but the loop takes 1193.7 + 34.5 + 3 · 27.6 = 1311.0 ps
        // > 1 ns: one finding for the one cause, the loop (PW4005), not one more per path round it.
        var finding = Assert.Single(Figures.Run(Rule, c));
        Assert.Equal("PW4005", finding.RuleId);
        Assert.Contains("takes 1.31 ns round but its phases give it only 1 ns", finding.Message);
    }

    // A loop P(High) → n inverters → Q(Low) → Q's output inverter and one more → P, on a 1 ns clock with no overlap.
    private static Circuit Loop(int inverters)
    {
        var c = Figures.NewCircuit("loop" + inverters);
        var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
        var start = c.Node("start");
        var net = c.DynamicLatch(start, clk.High, "P");
        for (var i = 0; i < inverters; i++) net = c.Inverter(net);
        var q = c.DynamicLatch(net, clk.Low, "Q");
        c.Inverter(q, start);
        return c;
    }

    [Fact]
    public void WorkedExample_ALoopWhoseDelaysExceedTheClockPeriodHasNoSteadyState()
    {
        // Steady-state latch-loop constraint (Sakallah, Mudge & Olukotun 1990, from memory): round a loop the delays
        // Σ (t_entry + t_path) may not exceed the time the phases give it (here one period, 1000 ps). Round the loop:
        // P's entry 34.5 + P's inverter 27.6 + n · 27.6 + Q's storage charged by the last of them 27.6 + Q's entry 34.5 +
        // Q's inverter 27.6 + 27.6 + P's storage charged by that one 27.6 = 207.0 + n · 27.6 ps (one pass-gate delay model).
        // n = 29: 1007.4 ps > 1000 ps — every pass round borrows 7.4 ps more, although each stage alone fits its window;
        // n = 28: 979.8 ps: the steady state borrows P→Q 34.5 + 30 · 27.6 − 500 = 362.5 ps at Q (below 465.5 ps) and
        // nothing at P (Q→P arrives 34.5 + 362.5 + 82.8 − 500 = −20.2 ps, before P opens).
        var clean = Figures.Run(Rule, Loop(28));
        Assert.Empty(clean);
        var q = LatchBorrowing.Solve(TimingFigures.For(Loop(28).ToNetlist(), Corner.Nominal)).Arrivals.Single(a => a.Path.To.Name == "Q");
        Assert.Equal(362.5, Figures.Ps(q.Arrival), 6);

        var finding = Assert.Single(Figures.Run(Rule, Loop(29)));
        Assert.Equal("PW4005", finding.RuleId);
        Assert.Equal("The latch loop P → Q → P (2 paths) takes 1.01 ns round but its phases give it only 1 ns: each latch borrows " +
                     "7.4 ps more every time round until one misses its window (slow corner, delays ×1)", finding.Message);
    }
}
