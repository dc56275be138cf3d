using System;

namespace Phaseward.Electrical;

/// <summary>
/// The 50 % delay estimated from an Elmore delay. A single RC pole reaches half its final value at t = ln 2 · RC
/// (≈ 0.69 RC) and its Elmore delay is RC, so ln 2 × Elmore is exact for one pole; for RC trees it is a first-order
/// estimate (for a long uniform ladder the true 50 % point is nearer 0.76 × Elmore), while Elmore itself bounds the
/// 50 % delay of an RC tree's step response from above.
/// </summary>
public static class FiftyPercentDelay
{
    /// <summary>ln 2 ≈ 0.693: the single-pole 50 % factor.</summary>
    public static readonly double SinglePoleFactor = Math.Log(2.0);

    /// <summary>ln 2 × the Elmore delay.</summary>
    public static Time FromElmore(Time elmore) => elmore * SinglePoleFactor;
}
