using System;
using System.Collections.Generic;
using System.Globalization;
using System.Threading;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Rules.Timing;

/// <summary>
/// PW4001 and PW4002: register-to-register paths (from one register's slave to a register's master, on one root
/// clock), with the figures of <see cref="TimingFigures"/>.
/// <list type="bullet">
/// <item>Setup (PW4001): T_avail ≥ t_clk-q(launch) + t_path,max + t_setup(capture), where T_avail is the time from the
/// launching to the capturing edge: one period plus the capture clock's extra delay for registers on the same edge,
/// the distance to the next opposite edge otherwise. t_path is measured from the launching register's output
/// (its output inverter is part of t_clk-q).</item>
/// <item>Hold (PW4002): t_clk-q,min(launch) + t_path,min ≥ t_hold(capture) + (T_avail − T), i.e. the hold time plus the
/// clock skew between the registers.</item>
/// </list>
/// Reported at the capturing register, the launching one as related location, when the slack is below
/// <see cref="RulePolicy.MinimumTimingSlack"/>.
/// </summary>
public sealed class RegisterTimingRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.RegisterSetup, RuleCatalog.RegisterHold };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var figures = TimingFigures.For(context.Netlist);
        foreach (var result in RegisterPathChecks.For(figures, context.CancellationToken))
        {
            var check = result.Check;
            var launch = result.Launch;
            var capture = result.Capture;
            if (check.SetupSlack < context.Policy.MinimumTimingSlack)
                yield return new Finding(RuleCatalog.RegisterSetup, capture.Span,
                    new object[]
                    {
                        capture.Name, launch.Name, check.ClockToOutput, check.PathMax, check.Setup,
                        check.ClockToOutput + check.PathMax + check.Setup, check.Available, check.SetupSlack,
                    },
                    new[] { launch.Span }, Properties(launch, capture, check.SetupSlack));
            if (check.HoldSlack < context.Policy.MinimumTimingSlack)
                yield return new Finding(RuleCatalog.RegisterHold, capture.Span,
                    new object[]
                    {
                        capture.Name, launch.Name, check.ClockToOutputMin, check.PathMin, check.ClockToOutputMin + check.PathMin,
                        check.Hold, check.Skew, check.HoldSlack,
                    },
                    new[] { launch.Span }, Properties(launch, capture, check.HoldSlack));
        }
    }

    private static Dictionary<string, string> Properties(Register launch, Register capture, Time slack) => new()
    {
        [FindingProperties.TargetLatch] = capture.Name,
        [FindingProperties.SourceLatch] = launch.Name,
        [FindingProperties.Register] = capture.Name,
        [FindingProperties.IsRegisterStage] = "true",
        [FindingProperties.MarginSeconds] = slack.Seconds.ToString("R", CultureInfo.InvariantCulture),
    };
}

/// <summary>A checked register-to-register pair: the launching and capturing registers and the worst of their paths.</summary>
public sealed class RegisterPathResult
{
    internal RegisterPathResult(Register launch, Register capture, RegisterPathCheck check)
    {
        Launch = launch;
        Capture = capture;
        Check = check;
    }

    public Register Launch { get; }

    public Register Capture { get; }

    public RegisterPathCheck Check { get; }
}

/// <summary>
/// The setup and hold checks behind PW4001 and PW4002, for every pair of registers on one root clock joined by a
/// path (the worst path of each pair), in the order the rule reports them. For reports: the same figures as the
/// findings' messages, passing checks included.
/// </summary>
public static class RegisterPathChecks
{
    public static IReadOnlyList<RegisterPathResult> For(TimingFigures figures, CancellationToken cancellationToken = default)
    {
        if (figures is null) throw new ArgumentNullException(nameof(figures));
        var model = figures.Model;
        var timingOf = new Dictionary<Register, RegisterTiming>();
        foreach (var timing in figures.Registers)
            timingOf[timing.Register] = timing;

        var checks = new Dictionary<(Register, Register), RegisterPathCheck>();
        var order = new List<(Register, Register)>();
        foreach (var path in model.Paths)
        {
            cancellationToken.ThrowIfCancellationRequested();
            if (!OverlapRaceRule.IsRegisterToRegister(model, path.From, path.To))
                continue;
            var launch = model.RegisterOf(path.From)!;
            var capture = model.RegisterOf(path.To)!;
            if (!ReferenceEquals(launch.Clock.Root, capture.Clock.Root))
                continue;
            var check = RegisterPathCheck.Of(model, timingOf[launch], timingOf[capture], path);
            var key = (launch, capture);
            if (!checks.TryGetValue(key, out var seen))
            {
                order.Add(key);
                checks[key] = check;
            }
            else
            {
                checks[key] = RegisterPathCheck.Worse(seen, check);
            }
        }

        var results = new List<RegisterPathResult>(order.Count);
        foreach (var key in order)
            results.Add(new RegisterPathResult(key.Item1, key.Item2, checks[key]));
        return results;
    }
}

/// <summary>The setup and hold check of one register-to-register path.</summary>
public sealed class RegisterPathCheck
{
    private RegisterPathCheck(Time clockToOutput, Time clockToOutputMin, Time pathMax, Time pathMin, Time setup, Time hold, Time available, Time period)
    {
        ClockToOutput = clockToOutput;
        ClockToOutputMin = clockToOutputMin;
        PathMax = pathMax;
        PathMin = pathMin;
        Setup = setup;
        Hold = hold;
        Available = available;
        Skew = available - period;
    }

    public Time ClockToOutput { get; }

    public Time ClockToOutputMin { get; }

    /// <summary>Slowest path from the launching register's output to the capturing register's input.</summary>
    public Time PathMax { get; }

    /// <summary>Fastest such path.</summary>
    public Time PathMin { get; }

    public Time Setup { get; }

    public Time Hold { get; }

    /// <summary>Time from the launching edge to the capturing edge.</summary>
    public Time Available { get; }

    /// <summary>How much later the capturing edge comes than one period after the launching edge.</summary>
    public Time Skew { get; }

    public Time SetupSlack => Available - (ClockToOutput + PathMax + Setup);

    public Time HoldSlack => ClockToOutputMin + PathMin - (Hold + Skew);

    internal static RegisterPathCheck Of(LatchModel model, RegisterTiming launch, RegisterTiming capture, LatchPath path)
    {
        var output = model.OutputDelay(path.From);
        var pathMax = Time.Max(Time.Zero, path.MaxDelay - output);
        var pathMin = Time.Max(Time.Zero, path.MinDelay - output);
        var period = launch.Clock.Root.Period;
        var launchEdge = PhaseWindow.Of(launch.Register.Slave.Phase).Opens.Seconds;
        var captureEdge = PhaseWindow.Of(capture.Register.Slave.Phase).Opens.Seconds;
        var t = period.Seconds;
        var offset = (captureEdge - launchEdge) % t;
        if (offset < 0) offset += t;
        double available;
        if (launch.Register.IsPositiveEdge == capture.Register.IsPositiveEdge)
            available = t + (offset > t / 2 ? offset - t : offset); // next same edge, shifted by the skew
        else
            available = offset == 0 ? t : offset;
        return new RegisterPathCheck(launch.ClockToOutput, launch.ClockToOutputMin, pathMax, pathMin, capture.Setup, capture.Hold,
            new Time(available), period);
    }

    internal static RegisterPathCheck Worse(RegisterPathCheck a, RegisterPathCheck b)
        => new(a.ClockToOutput, a.ClockToOutputMin, Time.Max(a.PathMax, b.PathMax), Time.Min(a.PathMin, b.PathMin), a.Setup, a.Hold,
            a.Available, a.Available - a.Skew);
}
