using System;
using CsCheck;

namespace Phaseward.Tests.Properties;

/// <summary>
/// A <see cref="Random"/> that replays a generated sequence of choices, so that a random-design generator written
/// against <see cref="Random"/> becomes a CsCheck generator that shrinks. Each call takes the next choice modulo its
/// range; once the sequence is used up every call returns the smallest option. CsCheck shrinks a failing sequence
/// towards shorter ones with smaller elements, which the generator turns into fewer and simpler parts (fewer clocks,
/// latches and gates, the first style of each). The technique is the choice-sequence ("internal") reduction of
/// D. R. MacIver and A. F. Donaldson, "Test-Case Reduction via Test-Case Generation: Insights from the Hypothesis
/// Reducer", ECOOP 2020 (from memory), here driven by CsCheck's own size-based shrinking.
/// </summary>
internal sealed class ChoiceSequence : Random
{
    /// <summary>Choices range over [0, 2^20): far above every range the generators ask for, so the modulo is near uniform.</summary>
    private const int ChoiceRange = 1 << 20;

    private readonly int[] choices;
    private int next;

    public ChoiceSequence(int[] choices)
        : base(0) => this.choices = choices;

    /// <summary>Sequences of up to <paramref name="maxLength"/> choices.</summary>
    public static Gen<int[]> Of(int maxLength) => Gen.Int[0, ChoiceRange - 1].Array[0, maxLength];

    /// <summary>How many choices the generator took (the rest of the sequence, if any, was not needed).</summary>
    public int Used => next;

    public override int Next() => Take(int.MaxValue);

    public override int Next(int maxValue)
    {
        if (maxValue < 0) throw new ArgumentOutOfRangeException(nameof(maxValue), maxValue, "must not be negative");
        return maxValue == 0 ? 0 : Take(maxValue);
    }

    public override int Next(int minValue, int maxValue)
    {
        if (minValue > maxValue) throw new ArgumentOutOfRangeException(nameof(minValue), minValue, $"must not exceed {maxValue}");
        var range = (long)maxValue - minValue;
        return range == 0 ? minValue : (int)(minValue + Take(range));
    }

    public override double NextDouble() => Take(ChoiceRange) / (double)ChoiceRange;

    protected override double Sample() => NextDouble();

    private int Take(long range) => next < choices.Length ? (int)(choices[next++] % range) : 0;
}
