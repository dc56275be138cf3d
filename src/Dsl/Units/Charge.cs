using System;

namespace Phaseward;

/// <summary>An electrical charge, stored in SI units (C).</summary>
public readonly partial struct Charge : IEquatable<Charge>, IComparable<Charge>
{
    public Charge(double Coulombs) => this.Coulombs = Coulombs;

    /// <summary>The value in SI units (C).</summary>
    public double Coulombs { get; }

    public static Charge Zero => default;

    public bool IsFinite => !double.IsNaN(Coulombs) && !double.IsInfinity(Coulombs);

    public static Charge operator +(Charge a, Charge b) => new(a.Coulombs + b.Coulombs);
    public static Charge operator -(Charge a, Charge b) => new(a.Coulombs - b.Coulombs);
    public static Charge operator -(Charge a) => new(-a.Coulombs);
    public static Charge operator *(Charge a, double k) => new(a.Coulombs * k);
    public static Charge operator *(double k, Charge a) => new(a.Coulombs * k);
    public static Charge operator /(Charge a, double k) => new(a.Coulombs / k);
    public static double operator /(Charge a, Charge b) => a.Coulombs / b.Coulombs;
    public static bool operator <(Charge a, Charge b) => a.Coulombs < b.Coulombs;
    public static bool operator >(Charge a, Charge b) => a.Coulombs > b.Coulombs;
    public static bool operator <=(Charge a, Charge b) => a.Coulombs <= b.Coulombs;
    public static bool operator >=(Charge a, Charge b) => a.Coulombs >= b.Coulombs;
    public static bool operator ==(Charge a, Charge b) => a.Coulombs.Equals(b.Coulombs);
    public static bool operator !=(Charge a, Charge b) => !a.Coulombs.Equals(b.Coulombs);

    public static Charge Min(Charge a, Charge b) => a.Coulombs <= b.Coulombs ? a : b;
    public static Charge Max(Charge a, Charge b) => a.Coulombs >= b.Coulombs ? a : b;

    public bool Equals(Charge other) => Coulombs.Equals(other.Coulombs);
    public override bool Equals(object? obj) => obj is Charge other && Equals(other);
    public override int GetHashCode() => Coulombs.GetHashCode();
    public int CompareTo(Charge other) => Coulombs.CompareTo(other.Coulombs);
    public override string ToString() => Engineering.Format(Coulombs, "C");
}
