using System;

namespace Phaseward;

/// <summary>An electrical resistance, stored in SI units (Ω).</summary>
public readonly partial struct Resistance : IEquatable<Resistance>, IComparable<Resistance>
{
    public Resistance(double Ohms) => this.Ohms = Ohms;

    /// <summary>The value in SI units (Ω).</summary>
    public double Ohms { get; }

    public static Resistance Zero => default;

    public bool IsFinite => !double.IsNaN(Ohms) && !double.IsInfinity(Ohms);

    public static Resistance operator +(Resistance a, Resistance b) => new(a.Ohms + b.Ohms);
    public static Resistance operator -(Resistance a, Resistance b) => new(a.Ohms - b.Ohms);
    public static Resistance operator -(Resistance a) => new(-a.Ohms);
    public static Resistance operator *(Resistance a, double k) => new(a.Ohms * k);
    public static Resistance operator *(double k, Resistance a) => new(a.Ohms * k);
    public static Resistance operator /(Resistance a, double k) => new(a.Ohms / k);
    public static double operator /(Resistance a, Resistance b) => a.Ohms / b.Ohms;
    public static bool operator <(Resistance a, Resistance b) => a.Ohms < b.Ohms;
    public static bool operator >(Resistance a, Resistance b) => a.Ohms > b.Ohms;
    public static bool operator <=(Resistance a, Resistance b) => a.Ohms <= b.Ohms;
    public static bool operator >=(Resistance a, Resistance b) => a.Ohms >= b.Ohms;
    public static bool operator ==(Resistance a, Resistance b) => a.Ohms.Equals(b.Ohms);
    public static bool operator !=(Resistance a, Resistance b) => !a.Ohms.Equals(b.Ohms);

    public static Resistance Min(Resistance a, Resistance b) => a.Ohms <= b.Ohms ? a : b;
    public static Resistance Max(Resistance a, Resistance b) => a.Ohms >= b.Ohms ? a : b;

    public bool Equals(Resistance other) => Ohms.Equals(other.Ohms);
    public override bool Equals(object? obj) => obj is Resistance other && Equals(other);
    public override int GetHashCode() => Ohms.GetHashCode();
    public int CompareTo(Resistance other) => Ohms.CompareTo(other.Ohms);
    public override string ToString() => Engineering.Format(Ohms, "Ω");
}
