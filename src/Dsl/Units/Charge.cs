using System;

namespace Phaseward;

/// <summary>An electrical charge, stored in SI units (C).</summary>
public readonly partial struct Charge : IEquatable<Charge>, IComparable<Charge>
{
    /// <summary>A charge of <paramref name="Coulombs"/> C (SI units).</summary>
    public Charge(double Coulombs) => this.Coulombs = Coulombs;

    /// <summary>The value in SI units (C).</summary>
    public double Coulombs { get; }

    /// <summary>Zero coulombs.</summary>
    public static Charge Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Coulombs) && !double.IsInfinity(Coulombs);

    /// <summary>The sum of two charges.</summary>
    public static Charge operator +(Charge a, Charge b) => new(a.Coulombs + b.Coulombs);
    /// <summary>The difference of two charges.</summary>
    public static Charge operator -(Charge a, Charge b) => new(a.Coulombs - b.Coulombs);
    /// <summary>The negated charge.</summary>
    public static Charge operator -(Charge a) => new(-a.Coulombs);
    /// <summary>The charge scaled by a factor.</summary>
    public static Charge operator *(Charge a, double k) => new(a.Coulombs * k);
    /// <summary>The charge scaled by a factor.</summary>
    public static Charge operator *(double k, Charge a) => new(a.Coulombs * k);
    /// <summary>The charge divided by a factor.</summary>
    public static Charge operator /(Charge a, double k) => new(a.Coulombs / k);
    /// <summary>The ratio of two charges (a plain number).</summary>
    public static double operator /(Charge a, Charge b) => a.Coulombs / b.Coulombs;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Charge a, Charge b) => a.Coulombs < b.Coulombs;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Charge a, Charge b) => a.Coulombs > b.Coulombs;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Charge a, Charge b) => a.Coulombs <= b.Coulombs;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Charge a, Charge b) => a.Coulombs >= b.Coulombs;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Charge a, Charge b) => a.Coulombs.Equals(b.Coulombs);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Charge a, Charge b) => !a.Coulombs.Equals(b.Coulombs);

    /// <summary>The smaller of two charges.</summary>
    public static Charge Min(Charge a, Charge b) => a.Coulombs <= b.Coulombs ? a : b;
    /// <summary>The larger of two charges.</summary>
    public static Charge Max(Charge a, Charge b) => a.Coulombs >= b.Coulombs ? a : b;

    /// <inheritdoc/>
    public bool Equals(Charge other) => Coulombs.Equals(other.Coulombs);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Charge other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Coulombs.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Charge other) => Coulombs.CompareTo(other.Coulombs);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Coulombs, "C");
}
