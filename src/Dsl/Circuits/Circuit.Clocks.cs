using System;
using System.Runtime.CompilerServices;
using Phaseward.Internal;
using Phaseward.Netlists;

namespace Phaseward;

public sealed partial class Circuit
{
    /// <summary>A free-running root clock.</summary>
    /// <param name="name">Unique clock name.</param>
    /// <param name="period">Clock period (positive).</param>
    /// <param name="duty">Fraction of the period the clock is high, strictly between 0 and 1.</param>
    /// <param name="complementSkew">How late the complement arrives (default: the process figure).</param>
    /// <param name="offset">Where the rising edge lies on the design's time base, in [0, period) (default 0). Root
    /// clocks of a design share that time base: two clocks of one period offset by half a period are two phases.</param>
    /// <param name="independent">True for a clock unrelated to all others (its own crystal): data crossing from or to
    /// it needs a synchronizer (PW1003).</param>
    /// <param name="callerFile">Filled in by the compiler: the calling file, for the source span.</param>
    /// <param name="callerLine">Filled in by the compiler: the calling line.</param>
    public Clock Clock(string name, Time period, double duty = 0.5, Time? complementSkew = null, Time? offset = null,
        bool independent = false,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        Guard.Name(name, nameof(name));
        name = Scoped(name);
        CheckNewClockName(name, nameof(name));
        Guard.Positive(period.Seconds, nameof(period), "s");
        Guard.Fraction(duty, nameof(duty));
        if (complementSkew is { } skew)
        {
            Guard.NonNegative(skew.Seconds, nameof(complementSkew), "s");
            if (skew >= period * Math.Min(duty, 1 - duty))
                throw new ArgumentException($"'{nameof(complementSkew)}' ({skew}) must be shorter than the clock's shorter phase ({period * Math.Min(duty, 1 - duty)}).", nameof(complementSkew));
        }

        if (offset is { } o)
        {
            Guard.NonNegative(o.Seconds, nameof(offset), "s");
            if (o >= period)
                throw new ArgumentException($"'{nameof(offset)}' ({o}) must be shorter than the clock's period ({period}).", nameof(offset));
        }

        return AddClock(name, ClockKind.Root, null, period, duty, complementSkew, Time.Zero, null, ClockStopLevel.Low, null, Site(callerFile, callerLine),
            offset ?? Time.Zero, independent);
    }

    /// <summary>
    /// A clock gate: a copy of <paramref name="clock"/> that runs while <paramref name="enable"/> is high and is held at
    /// <paramref name="stopsAt"/> while it is low.
    /// </summary>
    /// <param name="clock">The clock to gate.</param>
    /// <param name="enable">The net that lets the clock through while high.</param>
    /// <param name="stopsAt">The level the gated clock holds while stopped.</param>
    /// <param name="maxIdle">The longest the gate is guaranteed to stay disabled (null: unbounded).</param>
    /// <param name="name">The gated clock's name (default: the clock's name and <c>.gated</c>).</param>
    /// <param name="callerFile">Filled in by the compiler: the calling file, for the source span.</param>
    /// <param name="callerLine">Filled in by the compiler: the calling line.</param>
    public Clock ClockGate(Clock clock, Net enable, ClockStopLevel stopsAt = ClockStopLevel.Low, Time? maxIdle = null, string? name = null,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckClock(clock, nameof(clock));
        CheckNet(enable, nameof(enable));
        if (stopsAt is not (ClockStopLevel.Low or ClockStopLevel.High))
            throw new ArgumentException($"'{nameof(stopsAt)}' must be ClockStopLevel.Low or ClockStopLevel.High (was {(int)stopsAt}).", nameof(stopsAt));
        if (maxIdle is { } idle)
            Guard.Positive(idle.Seconds, nameof(maxIdle), "s");
        name = ScopedOrNull(name);
        if (name is not null)
            CheckNewClockName(name, nameof(name));

        return AddClock(name ?? AutoClockName(ScopedOnce(clock.Name + ".gated")), ClockKind.Gated, clock, clock.Period, clock.Duty, null, Time.Zero,
            enable, stopsAt, maxIdle, Site(callerFile, callerLine));
    }

    /// <summary>A copy of <paramref name="clock"/> delayed by a clock buffer.</summary>
    /// <param name="clock">The clock to delay.</param>
    /// <param name="delay">The buffer's delay (default: the process's stage delay).</param>
    /// <param name="name">The delayed clock's name (default: an automatic name).</param>
    /// <param name="callerFile">Filled in by the compiler: the calling file, for the source span.</param>
    /// <param name="callerLine">Filled in by the compiler: the calling line.</param>
    public Clock BufferedClock(Clock clock, Time? delay = null, string? name = null,
        [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckClock(clock, nameof(clock));
        if (delay is { } d)
            Guard.NonNegative(d.Seconds, nameof(delay), "s");
        name = ScopedOrNull(name);
        if (name is not null)
            CheckNewClockName(name, nameof(name));

        return AddClock(name ?? AutoClockName(ScopedOnce(clock.Name + ".buf")), ClockKind.Buffered, clock, clock.Period, clock.Duty, null,
            delay, null, ClockStopLevel.Low, null, Site(callerFile, callerLine));
    }

    private void CheckNewClockName(string? name, string parameter)
    {
        Guard.Name(name, parameter);
        if (clockNames.Contains(name!))
            throw new ArgumentException($"'{parameter}': a clock named \"{name}\" already exists in design '{DesignName}'.", parameter);
    }

    // A clock name no other clock has.
    private string AutoClockName(string prefix)
        => NextFreeName(autoClockCounters, prefix, Array.Empty<string>(), static (circuit, _, candidate) => circuit.clockNames.Contains(candidate));

    private Clock AddClock(string name, ClockKind kind, Clock? source, Time period, double duty, Time? skew, Time? delay, Net? enable,
        ClockStopLevel stopLevel, Time? maxIdle, SourceSpan span, Time offset = default, bool independent = false)
    {
        var clock = new Clock(this, clocks.Count, name, kind, source, period, duty, skew, delay, enable, stopLevel, maxIdle, span, offset, independent);
        clocks.Add(clock);
        clockNames.Add(name);
        return clock;
    }
}
