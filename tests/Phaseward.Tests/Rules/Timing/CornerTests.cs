using System;
using System.Globalization;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Electrical;
using Phaseward.Rules.ClockPhases;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;
using Phaseward.Tests.Rules.ClockPhases;

namespace Phaseward.Tests.Rules.Timing;

/// <summary>
/// Process corners: late-arrival checks at the slow corner, early-arrival checks at the fast corner (common practice:
/// a setup check is made with the slowest delays, a hold or race check with the fastest). The constraints are the
/// textbook ones — T_c ≥ t_pcq + t_pd + t_setup and t_ccq + t_cd ≥ t_hold + t_skew (Weste &amp; Harris, "CMOS VLSI
/// Design", 4th ed., ch. 10, from memory), the overlap race t_T1 + t_I1 + t_T2 &gt; t_overlap (Rabaey, Chandrakasan,
/// Nikolić, "Digital Integrated Circuits", 2nd ed., ch. 7, from memory) — with every first-order delay
/// (0.69·R·C, R scaled by the corner's factor) times the factor. Test figures: the flat 10 fF process
/// (<see cref="Figures.Flat"/>: t_TG = 34.5 ps, t_inv = 27.6 ps nominal) with the corner factors each test sets.
/// </summary>
public class CornerTests
{
    private static Process Flat(double slow, double fast) => new()
    {
        Name = "flat 10 fF with corners (test figures)",
        WireCapacitance = 10.Femtofarads(),
        GateCapacitance = 0.Femtofarads(),
        DiffusionCapacitance = 0.Femtofarads(),
        PassGateResistance = 5.Kiloohms(),
        DriverResistance = 4.Kiloohms(),
        SlowDelayFactor = slow,
        FastDelayFactor = fast,
    };

    private static Circuit Pipeline(Process process, double periodPs, int inverters, double captureDelayPs = 0)
    {
        var c = new Circuit("corners");
        c.UseProcess(process);
        var clk = c.Clock("clk", periodPs.Picoseconds(), 0.5, 30.Picoseconds());
        var capture = captureDelayPs > 0 ? c.BufferedClock(clk, captureDelayPs.Picoseconds(), "late") : clk;
        var net = c.DynamicRegister(c.Input("d"), clk, "R1");
        for (var i = 0; i < inverters; i++) net = c.Inverter(net);
        c.DynamicRegister(net, capture, "R2");
        return c;
    }

    private static double Slack(Finding finding) => double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], CultureInfo.InvariantCulture);

    [Fact]
    public void TheDefaultsAreInventedButOfARecentProcesssOrder()
    {
        // Invented defaults (labelled so on Process): slow ×1.3, fast ×0.75, hot leakage 1 nA (minimum devices of a
        // recent process leak of the order of 0.1 to a few nA hot; from memory).
        var process = Process.Illustrative;
        Assert.Equal(1.3, process.SlowDelayFactor);
        Assert.Equal(0.75, process.FastDelayFactor);
        Assert.Equal(1e-9, process.StorageLeakage.Amperes, 1e-24);
        Assert.Equal(1.0, process.DelayFactor(Corner.Nominal));
        Assert.Equal(1.3, process.DelayFactor(Corner.Slow));
        Assert.Equal(0.75, process.DelayFactor(Corner.Fast));
    }

    [Theory]
    [InlineData(nameof(Process.SlowDelayFactor), -1.3, "-1.3")]
    [InlineData(nameof(Process.SlowDelayFactor), 0.9, "0.9")]
    [InlineData(nameof(Process.SlowDelayFactor), double.NaN, "NaN")]
    [InlineData(nameof(Process.SlowDelayFactor), double.PositiveInfinity, "Infinity")]
    [InlineData(nameof(Process.FastDelayFactor), 0.0, "0")]
    [InlineData(nameof(Process.FastDelayFactor), -0.5, "-0.5")]
    [InlineData(nameof(Process.FastDelayFactor), 1.2, "1.2")]
    public void BadFactorsAreRejectedNamingThePropertyAndTheValue(string property, double value, string shown)
    {
        var error = Assert.Throws<ArgumentException>(() => property == nameof(Process.SlowDelayFactor)
            ? new Process { SlowDelayFactor = value }
            : new Process { FastDelayFactor = value });
        Assert.Equal(property, error.ParamName);
        Assert.Contains($"(was {shown})", error.Message);
    }

    [Fact]
    public void TheFastCornerCanNeverBeSlowerThanTheSlowOne()
    {
        // Nominal lies between the corners: each factor is checked on its own, in either initializer order.
        Assert.Throws<ArgumentException>(() => new Process { SlowDelayFactor = 1, FastDelayFactor = 1.01 });
        Assert.Throws<ArgumentException>(() => new Process { FastDelayFactor = 0.8, SlowDelayFactor = 0.79 });
        var both = new Process { FastDelayFactor = 1, SlowDelayFactor = 1 };
        Assert.Equal(both.FastDelayFactor, both.SlowDelayFactor);
    }

    [Fact]
    public void SetupIsCheckedAtTheSlowCorner()
    {
        // Nominal 89.7 + 165.6 + 34.5 = 289.8 ps fits 300 ps (slack +10.2 ps, see TimingTests); at ×1.2 it is
        // 347.76 ps: slack −47.76 ps. The fast factor plays no part.
        Assert.Empty(Figures.Run(new RegisterTimingRule(), Pipeline(Flat(1, 0.5), 300, 5)));
        var finding = Assert.Single(Figures.Run(new RegisterTimingRule(), Pipeline(Flat(1.2, 0.5), 300, 5)));
        Assert.Equal("PW4001", finding.RuleId);
        Assert.Equal(-47.76e-12, Slack(finding), 1e-18);
        Assert.Equal("Register 'R2' misses its setup time on the path from register 'R1': clock-to-output 108 ps + path 199 ps + " +
                     "setup 41.4 ps = 348 ps exceeds the 300 ps available (slack -47.8 ps; slow corner, delays ×1.2)", finding.Message);
    }

    [Fact]
    public void HoldIsCheckedAtTheFastCorner()
    {
        // Capture 70 ps late. Nominal: 62.1 + 27.6 + 34.5 − (30 + 70) = +24.2 ps (TimingTests). At ×0.75 every delay
        // shrinks, the overlap and skew do not: 0.75 · 124.2 − 100 = −6.85 ps. The slow factor plays no part.
        Assert.Empty(Figures.Run(new RegisterTimingRule(), Pipeline(Flat(2, 1), 1000, 1, 70)));
        var finding = Assert.Single(Figures.Run(new RegisterTimingRule(), Pipeline(Flat(2, 0.75), 1000, 1, 70)));
        Assert.Equal("PW4002", finding.RuleId);
        Assert.Equal(-6.85e-12, Slack(finding), 1e-18);
        Assert.EndsWith("(slack -6.85 ps; fast corner, delays ×0.75)", finding.Message);
        var check = RegisterPathChecks.For(Pipeline(Flat(2, 0.75), 1000, 1, 70).ToNetlist()).Single().Check;
        Assert.Equal(30 - 0.75 * 34.5, Figures.Ps(check.Hold), 9);
        Assert.Equal(0.75 * 62.1, Figures.Ps(check.ClockToOutputMin), 9);
    }

    [Fact]
    public void TheOverlapRaceIsCheckedAtTheFastCorner()
    {
        // A skew of 90 ps: nominal t_T1 + t_I1 + t_T2 = 96.6 ps beats the 0-0 overlap (margin +6.6 ps); at ×0.75,
        // 72.45 ps does not (margin −17.55 ps).
        Circuit Register(Process process)
        {
            var c = new Circuit("race");
            c.UseProcess(process);
            c.DynamicRegister(c.Input("d"), c.Clock("clk", 1.Nanoseconds(), 0.5, 90.Picoseconds()), "R");
            return c;
        }

        Assert.Empty(Figures.Run(new OverlapRaceRule(), Register(Flat(3, 1))));
        var finding = Assert.Single(Figures.Run(new OverlapRaceRule(), Register(Flat(3, 0.75))));
        Assert.Equal(-17.55e-12, Slack(finding), 1e-18);
        Assert.EndsWith("a margin of -17.6 ps, below the required 0 s (fast corner, delays ×0.75)", finding.Message);
    }

    [Fact]
    public void BorrowingIsCarriedAtTheSlowCorner()
    {
        // Two-phase chain L1 (High) → 20 inverters → L2 (Low) → 22 inverters → L3 (High), 1 ns, no skew. Nominal
        // (TimingTests): L2 borrows 141.7 ps, L3's arrival 34.5 + 141.7 + 24 · 27.6 − 500 = 338.6 ps ≤ 465.5 ps. At ×1.1:
        // L2 borrows 1.1 · 641.7 − 500 = 205.87 ps; L3: 37.95 + 205.87 + 1.1 · 662.4 − 500 = 472.46 ps against
        // 500 − 37.95 = 462.05 ps: slack −10.41 ps.
        Circuit Chain(Process process)
        {
            var c = new Circuit("twophase");
            c.UseProcess(process);
            var clk = c.Clock("clk", 1.Nanoseconds(), 0.5, 0.Picoseconds());
            var net = c.DynamicLatch(c.Input("d"), clk.High, "L1");
            for (var i = 0; i < 20; i++) net = c.Inverter(net);
            net = c.DynamicLatch(net, clk.Low, "L2");
            for (var i = 0; i < 22; i++) net = c.Inverter(net);
            c.DynamicLatch(net, clk.High, "L3");
            return c;
        }

        Assert.Empty(Figures.Run(new LatchBorrowingRule(), Chain(Flat(1, 0.5))));
        var finding = Assert.Single(Figures.Run(new LatchBorrowingRule(), Chain(Flat(1.1, 0.5))));
        Assert.Equal("PW4003", finding.RuleId);
        Assert.Equal(-10.41e-12, Slack(finding), 1e-17);
        Assert.EndsWith("; slow corner, delays ×1.1)", finding.Message);
        var slow = TimingFigures.For(Chain(Flat(1.1, 0.5)).ToNetlist(), Corner.Slow);
        Assert.Equal(Corner.Slow, slow.Corner);
        Assert.Equal(1.1 * 34.5, Figures.Ps(slow.Latches[0].EntryDelay), 9);
    }

    [Fact]
    public void TheWriteWindowIsCheckedAtTheSlowCorner()
    {
        // A 60 fF node behind a 5 kΩ gate: 207 ps nominal, 0.69 · 7.5 kΩ · 60 fF = 310.5 ps at ×1.5, against a
        // 250 ps pulse with no skew.
        Circuit Pulse(Process process)
        {
            var c = new Circuit("pulse");
            c.UseProcess(process);
            c.DynamicLatch(c.Input("d"), c.Clock("pulse", 1.Nanoseconds(), 0.25, 0.Picoseconds()).High, "pl");
            c.SetCapacitance(c.ToNetlist().Nets.Single(n => n.Name == "pl.x"), 60.Femtofarads());
            return c;
        }

        Assert.Empty(Figures.Run(new LatchWriteWindowRule(), Pulse(Flat(1, 0.5))));
        var finding = Assert.Single(Figures.Run(new LatchWriteWindowRule(), Pulse(Flat(1.5, 0.5))));
        Assert.Contains("needs 310 ps", finding.Message); // 310.5 ps to three digits
        Assert.Contains("R = 7.5 kΩ", finding.Message);
        Assert.EndsWith("margin -60.5 ps; slow corner, delays ×1.5)", finding.Message);
    }

    [Fact]
    public void RetentionUsesTheHotLeakageAndSaysSo()
    {
        var c = new Circuit("hot");
        c.UseProcess(new Process { StorageLeakage = 2.Nanoamperes() });
        var gated = c.ClockGate(c.Clock("clk", 10.Nanoseconds()), c.Input("en"), ClockStopLevel.Low, 1.Microseconds());
        c.DynamicLatch(c.Input("d"), gated.High, "l");
        // 4.5 fF × 0.3 V / 2 nA = 675 ns < 1 µs (common practice: t = C·ΔV/I).
        var finding = Assert.Single(Checker.Check(c.ToNetlist()).Findings, f => f.RuleId == "PW3001");
        Assert.Contains("keeps its level only 675 ns (C·ΔV/I_leak with C = 4.5 fF, ΔV = 300 mV, I_leak = 2 nA at the hot corner)", finding.Message);
    }
}
