using System;

namespace Phaseward;

/// <summary>A capacitance, stored in SI units (F).</summary>
public readonly partial struct Capacitance : IEquatable<Capacitance>, IComparable<Capacitance>
{
    /// <summary>A capacitance of <paramref name="Farads"/> F (SI units).</summary>
    public Capacitance(double Farads) => this.Farads = Farads;

    /// <summary>The value in SI units (F).</summary>
    public double Farads { get; }

    /// <summary>Zero farads.</summary>
    public static Capacitance Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Farads) && !double.IsInfinity(Farads);

    /// <summary>The sum of two capacitances.</summary>
    public static Capacitance operator +(Capacitance a, Capacitance b) => new(a.Farads + b.Farads);
    /// <summary>The difference of two capacitances.</summary>
    public static Capacitance operator -(Capacitance a, Capacitance b) => new(a.Farads - b.Farads);
    /// <summary>The negated capacitance.</summary>
    public static Capacitance operator -(Capacitance a) => new(-a.Farads);
    /// <summary>The capacitance scaled by a factor.</summary>
    public static Capacitance operator *(Capacitance a, double k) => new(a.Farads * k);
    /// <summary>The capacitance scaled by a factor.</summary>
    public static Capacitance operator *(double k, Capacitance a) => new(a.Farads * k);
    /// <summary>The capacitance divided by a factor.</summary>
    public static Capacitance operator /(Capacitance a, double k) => new(a.Farads / k);
    /// <summary>The ratio of two capacitances (a plain number).</summary>
    public static double operator /(Capacitance a, Capacitance b) => a.Farads / b.Farads;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Capacitance a, Capacitance b) => a.Farads < b.Farads;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Capacitance a, Capacitance b) => a.Farads > b.Farads;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Capacitance a, Capacitance b) => a.Farads <= b.Farads;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Capacitance a, Capacitance b) => a.Farads >= b.Farads;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Capacitance a, Capacitance b) => a.Farads.Equals(b.Farads);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Capacitance a, Capacitance b) => !a.Farads.Equals(b.Farads);

    /// <summary>The smaller of two capacitances.</summary>
    public static Capacitance Min(Capacitance a, Capacitance b) => a.Farads <= b.Farads ? a : b;
    /// <summary>The larger of two capacitances.</summary>
    public static Capacitance Max(Capacitance a, Capacitance b) => a.Farads >= b.Farads ? a : b;

    /// <inheritdoc/>
    public bool Equals(Capacitance other) => Farads.Equals(other.Farads);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Capacitance other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Farads.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Capacitance other) => Farads.CompareTo(other.Farads);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Farads, "F");
}
