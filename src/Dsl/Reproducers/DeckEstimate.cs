namespace Phaseward.Reproducers;

/// <summary>One figure a deck measures with <c>.meas</c>, with Phaseward's own estimate of it.</summary>
public sealed class DeckEstimate
{
    /// <summary>A figure the deck measures as <paramref name="name"/>, with Phaseward's estimate <paramref name="value"/> in <paramref name="unit"/>, and what it means.</summary>
    public DeckEstimate(string name, double value, string unit, string meaning)
    {
        Name = name;
        Value = value;
        Unit = unit;
        Meaning = meaning;
    }

    /// <summary>The <c>.meas</c> name in the deck (<c>t50</c>, <c>t_ret</c>, <c>v_settled</c>, ...).</summary>
    public string Name { get; }

    /// <summary>Phaseward's estimate in SI units (seconds, volts; 1 or 0 for a yes/no figure).</summary>
    public double Value { get; }

    /// <summary>The SI unit ("s", "V"), empty for a yes/no figure.</summary>
    public string Unit { get; }

    /// <summary>What the figure is, in words.</summary>
    public string Meaning { get; }

    /// <inheritdoc/>
    public override string ToString() => $"{Name} = {Engineering.Format(Value, Unit)} ({Meaning})";
}
