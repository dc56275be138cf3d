namespace Phaseward.Electrical;

/// <summary>
/// The 50 % delay estimated from an Elmore delay. A single RC pole reaches half its final value at t = ln 2 · RC
/// (ln 2 = 0.693) and its Elmore delay is RC, so 0.69 × Elmore is the single-pole figure; for RC trees it is a
/// first-order estimate (for a long uniform ladder the true 50 % point is nearer 0.76 × Elmore), while Elmore itself
/// bounds the 50 % delay of an RC tree's step response from above.
/// </summary>
/// <remarks>
/// One value of the factor everywhere: <see cref="SinglePoleFactor"/> = 0.69, ln 2 rounded as the textbooks write
/// t_p = 0.69·R·C (Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 5,
/// from memory). Every first-order stage delay, every 50 % estimate and every text that says "0.69" use it.
/// </remarks>
public static class FiftyPercentDelay
{
    /// <summary>0.69 ≈ ln 2 (0.693): the single-pole 50 % factor, the one value Phaseward uses.</summary>
    public static readonly double SinglePoleFactor = 0.69;

    /// <summary>0.69 (≈ ln 2) × the Elmore delay.</summary>
    public static Time FromElmore(Time elmore) => elmore * SinglePoleFactor;
}
