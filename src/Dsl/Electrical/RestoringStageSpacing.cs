using System;
using Phaseward.Internal;

namespace Phaseward.Electrical;

/// <summary>
/// How often a chain of pass gates should be broken by a restoring stage (an inverter or buffer), and how fast the
/// restored chain is. First-order model: every gate has on-resistance R, every node capacitance C, a restoring stage
/// costs its intrinsic delay t_buf, and each unrestored segment of m gates is a uniform RC ladder whose 50 % delay is
/// 0.69 · R·C · m(m+1)/2 (its Elmore delay m(m+1)/2·RC scaled by the single-pole factor 0.69 ≈ ln 2,
/// <see cref="FiftyPercentDelay.SinglePoleFactor"/>).
/// </summary>
/// <remarks>
/// Where the 1.7 comes from. A chain of N gates restored every m gates has N/m segments, each an m-section ladder
/// followed by a restoring stage:
/// <code>
///   t(m) = (N/m) · (k·R·C·m(m+1)/2 + t_buf),           k = 0.69 ≈ ln 2
///        = N · (k·R·C·(m+1)/2 + t_buf/m)
///   dt/dm = N · (k·R·C/2 − t_buf/m²) = 0
///   m_opt = sqrt(2·t_buf / (k·R·C)) = sqrt(2/k) · sqrt(t_buf/(R·C))
/// </code>
/// and sqrt(2/0.69) = 1.703 (sqrt(2/ln 2) = 1.699), hence m_opt ≈ 1.7·sqrt(t_buf/(R·C)). d²t/dm² = 2·N·t_buf/m³ &gt; 0,
/// so this is the minimum, and t(m_opt) = N·(k·R·C/2 + sqrt(2·k·R·C·t_buf)): linear in N, where the unrestored
/// chain grows as N². The same derivation, with m_opt = 1.7·sqrt(t_buf/(C·R_eq)), is in J. M. Rabaey,
/// A. Chandrakasan, B. Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 6 (transmission-gate
/// chains with buffers, section 6.3.2 from memory), which counts n/m − 1 buffers where this model counts n/m.
/// </remarks>
public static class RestoringStageSpacing
{
    /// <summary>sqrt(2 / 0.69) ≈ 1.70, the coefficient of sqrt(t_buf/(R·C)) in the optimum spacing.</summary>
    public static readonly double Coefficient = Math.Sqrt(2.0 / FiftyPercentDelay.SinglePoleFactor);

    /// <summary>The continuous optimum m_opt = sqrt(2·t_buf/(0.69·R·C)) ≈ 1.7·sqrt(t_buf/(R·C)).</summary>
    public static double OptimalSpacing(Time stageDelay, Resistance resistance, Capacitance capacitance)
    {
        Check(stageDelay, resistance, capacitance);
        return Coefficient * Math.Sqrt(stageDelay.Seconds / (resistance * capacitance).Seconds);
    }

    /// <summary>
    /// The best whole number of gates between restoring stages: the neighbour of <see cref="OptimalSpacing"/> with the
    /// smaller delay per gate (t(m) is convex, so one of the two is the integer optimum); at least 1.
    /// </summary>
    public static int OptimalIntegerSpacing(Time stageDelay, Resistance resistance, Capacitance capacitance)
    {
        var optimum = OptimalSpacing(stageDelay, resistance, capacitance);
        if (optimum >= int.MaxValue / 2) return int.MaxValue / 2;
        var below = Math.Max(1, (int)Math.Floor(optimum));
        var above = below + 1;
        return PerGateDelay(above, stageDelay, resistance, capacitance) < PerGateDelay(below, stageDelay, resistance, capacitance) ? above : below;
    }

    /// <summary>
    /// t(m) = (N/m)·(0.69·R·C·m(m+1)/2 + t_buf): the 50 % delay of <paramref name="gates"/> gates restored every
    /// <paramref name="spacing"/> gates (the model's continuous form; <paramref name="spacing"/> need not divide N).
    /// </summary>
    public static Time BufferedChainDelay(int gates, double spacing, Resistance resistance, Capacitance capacitance, Time stageDelay)
    {
        if (gates < 1)
            throw new ArgumentOutOfRangeException(nameof(gates), gates, $"'{nameof(gates)}' must be at least 1 (was {gates}).");
        if (double.IsNaN(spacing) || double.IsInfinity(spacing) || spacing <= 0)
            throw new ArgumentOutOfRangeException(nameof(spacing), spacing, $"'{nameof(spacing)}' must be a positive, finite number of gates (was {spacing}).");
        Guard.Positive(stageDelay.Seconds, nameof(stageDelay), "s");
        Guard.Positive(resistance.Ohms, nameof(resistance), "Ω");
        Guard.NonNegative(capacitance.Farads, nameof(capacitance), "F");
        return new Time(gates * PerGateDelay(spacing, stageDelay, resistance, capacitance));
    }

    /// <summary>
    /// The 50 % delay of an actual chain of <paramref name="gates"/> gates with a restoring stage after every
    /// <paramref name="spacing"/> gates, counted as the unrestored chain's figure is: the same driver
    /// (<paramref name="driver"/> charging the input net <paramref name="inputNet"/> and the first segment), whole
    /// segments (⌈N/m⌉ of them, the last one the remainder) and one restoring stage between segments (⌈N/m⌉ − 1 of
    /// them: the unrestored chain has none at its end either):
    /// <code>
    ///   t = k·R_drv·(C_in + m₁·C) + Σ_segments k·R·C·m_j(m_j + 1)/2 + (⌈N/m⌉ − 1)·t_buf,     k = 0.69
    /// </code>
    /// First order: a restoring stage costs its intrinsic delay t_buf (its input and output loads are in it).
    /// </summary>
    public static Time RestoredChainDelay(int gates, int spacing, Resistance resistance, Capacitance capacitance, Time stageDelay,
        Resistance driver, Capacitance inputNet)
    {
        if (gates < 1)
            throw new ArgumentOutOfRangeException(nameof(gates), gates, $"'{nameof(gates)}' must be at least 1 (was {gates}).");
        if (spacing < 1)
            throw new ArgumentOutOfRangeException(nameof(spacing), spacing, $"'{nameof(spacing)}' must be at least 1 (was {spacing}).");
        Guard.Positive(stageDelay.Seconds, nameof(stageDelay), "s");
        Guard.Positive(resistance.Ohms, nameof(resistance), "Ω");
        Guard.NonNegative(capacitance.Farads, nameof(capacitance), "F");
        Guard.NonNegative(driver.Ohms, nameof(driver), "Ω");
        Guard.NonNegative(inputNet.Farads, nameof(inputNet), "F");
        var k = FiftyPercentDelay.SinglePoleFactor;
        var rc = (resistance * capacitance).Seconds;
        var segments = (gates + spacing - 1) / spacing;
        var first = Math.Min(spacing, gates);
        var seconds = k * driver.Ohms * (inputNet.Farads + first * capacitance.Farads) + (segments - 1) * stageDelay.Seconds;
        for (var left = gates; left > 0; left -= spacing)
        {
            var m = Math.Min(spacing, left);
            seconds += k * rc * m * (m + 1) / 2.0;
        }

        return new Time(seconds);
    }

    /// <summary>
    /// The delay of <paramref name="gates"/> gates restored at the best whole spacing (never more than the chain's
    /// length: a chain no longer than the optimum is best left as one segment).
    /// </summary>
    public static Time OptimalRestoredDelay(int gates, Resistance resistance, Capacitance capacitance, Time stageDelay)
    {
        var spacing = Math.Min(gates, OptimalIntegerSpacing(stageDelay, resistance, capacitance));
        return BufferedChainDelay(gates, Math.Max(1, spacing), resistance, capacitance, stageDelay);
    }

    // t(m)/N = k·R·C·(m+1)/2 + t_buf/m, in seconds.
    private static double PerGateDelay(double spacing, Time stageDelay, Resistance resistance, Capacitance capacitance)
        => FiftyPercentDelay.SinglePoleFactor * (resistance * capacitance).Seconds * (spacing + 1) / 2 + stageDelay.Seconds / spacing;

    private static void Check(Time stageDelay, Resistance resistance, Capacitance capacitance)
    {
        Guard.Positive(stageDelay.Seconds, nameof(stageDelay), "s");
        Guard.Positive(resistance.Ohms, nameof(resistance), "Ω");
        Guard.Positive(capacitance.Farads, nameof(capacitance), "F");
    }
}
