using System;
using System.Collections.Generic;
using System.Globalization;
using System.Threading;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Rules.ClockPhases;
using Phaseward.Sequencing;

namespace Phaseward.Rules.Timing;

/// <summary>
/// PW4001 and PW4002: register-to-register paths (from one register's slave to a register's master, on related
/// clocks of the design's time base), with the figures of <see cref="TimingFigures"/>. A rising-edge register
/// feeding a falling-edge one is a half-cycle path, checked here like any other.
/// <list type="bullet">
/// <item>Setup (PW4001): T_avail ≥ t_clk-q(launch) + t_path,max + t_setup(capture), where T_avail is the time from a
/// launching edge to the next capturing edge after it (a full capture period when they coincide), the shortest over
/// the launching edges of the common cycle. t_path is measured from the launching register's output (its output
/// inverter is part of t_clk-q).</item>
/// <item>Hold (PW4002): t_clk-q,min(launch) + t_path,min ≥ t_hold(capture) + (T_avail − T_capture), i.e. the hold time
/// plus the clock skew between the registers (the capture edge before the one that setup uses). With
/// t_hold = t_overlap − t_T1 this is the race model of PW1002 (<see cref="RaceModel"/>): one race, one model.</item>
/// </list>
/// Setup is checked at the slow corner (every delay times <see cref="Process.SlowDelayFactor"/>), hold at the fast
/// corner (<see cref="Process.FastDelayFactor"/>): each where it is hardest to meet. Reported at the capturing
/// register, the launching one as related location, when the slack is below
/// <see cref="RulePolicy.MinimumTimingSlack"/>; the message names the corner.
/// </summary>
public sealed class RegisterTimingRule : Rule
{
    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.RegisterSetup, RuleCatalog.RegisterHold };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var process = context.Netlist.Process;
        var minimum = context.Policy.MinimumTimingSlack;
        // One finding per capturing register and check, for its worst path: a register at the end of a long carry can be
        // missed by thousands of launching registers, and one fix (a shorter path into it) serves them all.
        var setup = new WorstPaths();
        var hold = new WorstPaths();
        foreach (var result in RegisterPathChecks.For(context.LatchModel, context.CancellationToken))
        {
            if (result.Check.SetupSlack < minimum)
                setup.Add(result, result.Check.SetupSlack);
            if (result.Check.HoldSlack < minimum)
                hold.Add(result, result.Check.HoldSlack);
        }

        foreach (var capture in setup.Captures)
        {
            var (worst, others) = setup.Of(capture);
            var check = worst.Check;
            yield return new Finding(RuleCatalog.RegisterSetup, capture.Span,
                new object[]
                {
                    capture.Name, worst.Launch.Name, check.ClockToOutput, check.PathMax, check.Setup,
                    check.ClockToOutput + check.PathMax + check.Setup, check.Available, check.SetupSlack,
                    CornerText.Of(process, Corner.Slow), Others(others),
                },
                new[] { worst.Launch.Span }, Properties(worst.Launch, capture, check.SetupSlack, others));
        }

        foreach (var capture in hold.Captures)
        {
            var (worst, others) = hold.Of(capture);
            var check = worst.Check;
            yield return new Finding(RuleCatalog.RegisterHold, capture.Span,
                new object[]
                {
                    capture.Name, worst.Launch.Name, check.ClockToOutputMin, check.PathMin, check.ClockToOutputMin + check.PathMin,
                    check.Hold, check.Skew, check.HoldSlack, CornerText.Of(process, Corner.Fast), Others(others),
                },
                new[] { worst.Launch.Span }, Properties(worst.Launch, capture, check.HoldSlack, others));
        }
    }

    private static string Others(int count) => count switch
    {
        0 => "",
        1 => "; 1 more launching register fails it too",
        _ => string.Format(CultureInfo.InvariantCulture, "; {0:N0} more launching registers fail it too", count),
    };

    /// <summary>The worst failing path into each capturing register, and how many other launching registers fail it,
    /// the registers in the order their first failing path was found.</summary>
    private sealed class WorstPaths
    {
        private readonly Dictionary<Register, (RegisterPathResult Worst, Time Slack, int Others)> byCapture = new();

        public List<Register> Captures { get; } = new();

        public void Add(RegisterPathResult result, Time slack)
        {
            if (!byCapture.TryGetValue(result.Capture, out var seen))
            {
                byCapture[result.Capture] = (result, slack, 0);
                Captures.Add(result.Capture);
            }
            else
            {
                byCapture[result.Capture] = slack < seen.Slack ? (result, slack, seen.Others + 1) : (seen.Worst, seen.Slack, seen.Others + 1);
            }
        }

        public (RegisterPathResult Worst, int Others) Of(Register capture)
        {
            var entry = byCapture[capture];
            return (entry.Worst, entry.Others);
        }
    }

    private static Dictionary<string, string> Properties(Register launch, Register capture, Time slack, int others) => new()
    {
        [FindingPropertyKeys.OtherFailingLaunches] = others.ToString(CultureInfo.InvariantCulture),
        [FindingPropertyKeys.TargetLatch] = capture.Name,
        [FindingPropertyKeys.SourceLatch] = launch.Name,
        [FindingPropertyKeys.Register] = capture.Name,
        [FindingPropertyKeys.IsRegisterStage] = "true",
        [FindingPropertyKeys.MarginSeconds] = slack.Seconds.ToString("R", CultureInfo.InvariantCulture),
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
/// The setup and hold checks behind PW4001 and PW4002, for every pair of registers on related clocks joined by a
/// path (the worst path of each pair), in the order the rule reports them: setup figures at the slow corner, hold
/// figures at the fast corner. For reports: the same figures as the findings' messages, passing checks included.
/// </summary>
public static class RegisterPathChecks
{
    public static IReadOnlyList<RegisterPathResult> For(Netlists.Netlist netlist, CancellationToken cancellationToken = default)
    {
        if (netlist is null) throw new ArgumentNullException(nameof(netlist));
        return For(LatchModel.Of(netlist, cancellationToken), cancellationToken);
    }

    /// <summary>The checks of the paths <paramref name="model"/> lists.</summary>
    public static IReadOnlyList<RegisterPathResult> For(LatchModel model, CancellationToken cancellationToken = default)
    {
        if (model is null) throw new ArgumentNullException(nameof(model));
        var slow = TimingFigures.For(model, Corner.Slow);
        var fast = TimingFigures.For(model, Corner.Fast);
        var slowOf = new Dictionary<Register, RegisterTiming>();
        foreach (var timing in slow.Registers)
            slowOf[timing.Register] = timing;
        var fastOf = new Dictionary<Register, RegisterTiming>();
        foreach (var timing in fast.Registers)
            fastOf[timing.Register] = timing;

        // The paths come grouped by source latch, so a pair of registers recurs only within its launching register's
        // group: what depends on the launch, and which captures it has reached, are kept for the group alone, and the
        // time available once per pair of phases (a long chain has a path per pair of registers).
        var results = new List<RegisterPathResult>();
        var resultOfCapture = new Dictionary<Register, int>();
        var available = new Dictionary<(Phase, Phase), Time>();
        Latch? from = null;
        Register? launch = null;
        var output = Time.Zero;
        foreach (var path in model.Paths)
        {
            cancellationToken.ThrowIfCancellationRequested();
            if (!ReferenceEquals(path.From, from))
            {
                from = path.From;
                launch = model.RegisterOf(from) is { } register && ReferenceEquals(register.Slave, from) ? register : null;
                output = launch is null ? Time.Zero : model.OutputDelay(from);
                resultOfCapture.Clear();
            }

            if (launch is null || model.RegisterOf(path.To) is not { } capture || !ReferenceEquals(capture.Master, path.To))
                continue;
            if (!TimeBase.Related(launch.Clock, capture.Clock))
                continue;
            var phases = (launch.Slave.Phase, capture.Slave.Phase);
            if (!available.TryGetValue(phases, out var time))
                available[phases] = time = RegisterPathCheck.AvailableTime(model, launch, capture);
            var check = RegisterPathCheck.Of(slow, fast, (slowOf[launch], slowOf[capture]), (fastOf[launch], fastOf[capture]), path, output, time);
            if (resultOfCapture.TryGetValue(capture, out var index))
            {
                results[index] = new RegisterPathResult(launch, capture, RegisterPathCheck.Worse(results[index].Check, check));
            }
            else
            {
                resultOfCapture[capture] = results.Count;
                results.Add(new RegisterPathResult(launch, capture, check));
            }
        }

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

    // Setup from the slow corner's figures and the slowest path at that corner; hold from the fast corner's. The path's
    // delays run from the launching latch's storage node: its output stage (part of clock-to-output) is taken off.
    internal static RegisterPathCheck Of(TimingFigures slow, TimingFigures fast, (RegisterTiming Launch, RegisterTiming Capture) atSlow,
        (RegisterTiming Launch, RegisterTiming Capture) atFast, LatchPath path, Time output, Time available)
    {
        var pathMax = slow.AtCorner(Time.Max(Time.Zero, path.MaxDelay - output));
        var pathMin = fast.AtCorner(Time.Max(Time.Zero, path.MinDelay - output));
        var period = atSlow.Capture.Clock.Period;
        return new RegisterPathCheck(atSlow.Launch.ClockToOutput, atFast.Launch.ClockToOutputMin, pathMax, pathMin, atSlow.Capture.Setup,
            atFast.Capture.Hold, available, period);
    }

    // From the launching edge to the capturing edge. On copies of one root clock a capture clock's extra delay is skew:
    // registers on the same edge capture one period later, shifted by it (a copy delayed by more than half a period
    // counts as early); on opposite edges the next capturing edge after the launch (a half-cycle path). Between
    // different root clocks the clocks' offsets are deliberate: the next capturing edge after the launch, the
    // shortest over the launching edges of their common cycle.
    internal static Time AvailableTime(LatchModel model, Register launch, Register capture)
    {
        var launchEdges = model.WindowOf(launch.Slave.Phase);
        var captureEdges = model.WindowOf(capture.Slave.Phase);
        if (!ReferenceEquals(launch.Clock.Root, capture.Clock.Root) || launch.IsPositiveEdge != capture.IsPositiveEdge)
            return launchEdges.TimeToNextOpeningOf(captureEdges)!.Value;
        var t = launch.Clock.Period.Seconds;
        var offset = (captureEdges.Opens.Seconds - launchEdges.Opens.Seconds) % t;
        if (offset < 0) offset += t;
        return new Time(t + (offset > t / 2 ? offset - t : offset));
    }

    internal static RegisterPathCheck Worse(RegisterPathCheck a, RegisterPathCheck b)
        => new(a.ClockToOutput, a.ClockToOutputMin, Time.Max(a.PathMax, b.PathMax), Time.Min(a.PathMin, b.PathMin), a.Setup, a.Hold,
            a.Available, a.Available - a.Skew);
}
