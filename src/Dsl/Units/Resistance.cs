using System;

namespace Phaseward;

/// <summary>An electrical resistance, stored in SI units (Ω).</summary>
public readonly partial struct Resistance : IEquatable<Resistance>, IComparable<Resistance>
{
    /// <summary>A resistance of <paramref name="Ohms"/> Ω (SI units).</summary>
    public Resistance(double Ohms) => this.Ohms = Ohms;

    /// <summary>The value in SI units (Ω).</summary>
    public double Ohms { get; }

    /// <summary>Zero ohms.</summary>
    public static Resistance Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Ohms) && !double.IsInfinity(Ohms);

    /// <summary>The sum of two resistances.</summary>
    public static Resistance operator +(Resistance a, Resistance b) => new(a.Ohms + b.Ohms);
    /// <summary>The difference of two resistances.</summary>
    public static Resistance operator -(Resistance a, Resistance b) => new(a.Ohms - b.Ohms);
    /// <summary>The negated resistance.</summary>
    public static Resistance operator -(Resistance a) => new(-a.Ohms);
    /// <summary>The resistance scaled by a factor.</summary>
    public static Resistance operator *(Resistance a, double k) => new(a.Ohms * k);
    /// <summary>The resistance scaled by a factor.</summary>
    public static Resistance operator *(double k, Resistance a) => new(a.Ohms * k);
    /// <summary>The resistance divided by a factor.</summary>
    public static Resistance operator /(Resistance a, double k) => new(a.Ohms / k);
    /// <summary>The ratio of two resistances (a plain number).</summary>
    public static double operator /(Resistance a, Resistance b) => a.Ohms / b.Ohms;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Resistance a, Resistance b) => a.Ohms < b.Ohms;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Resistance a, Resistance b) => a.Ohms > b.Ohms;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Resistance a, Resistance b) => a.Ohms <= b.Ohms;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Resistance a, Resistance b) => a.Ohms >= b.Ohms;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Resistance a, Resistance b) => a.Ohms.Equals(b.Ohms);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Resistance a, Resistance b) => !a.Ohms.Equals(b.Ohms);

    /// <summary>The smaller of two resistances.</summary>
    public static Resistance Min(Resistance a, Resistance b) => a.Ohms <= b.Ohms ? a : b;
    /// <summary>The larger of two resistances.</summary>
    public static Resistance Max(Resistance a, Resistance b) => a.Ohms >= b.Ohms ? a : b;

    /// <inheritdoc/>
    public bool Equals(Resistance other) => Ohms.Equals(other.Ohms);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Resistance other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Ohms.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Resistance other) => Ohms.CompareTo(other.Ohms);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Ohms, "Ω");
}
