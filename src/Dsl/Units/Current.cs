using System;

namespace Phaseward;

/// <summary>An electrical current, stored in SI units (A).</summary>
public readonly partial struct Current : IEquatable<Current>, IComparable<Current>
{
    public Current(double Amperes) => this.Amperes = Amperes;

    /// <summary>The value in SI units (A).</summary>
    public double Amperes { get; }

    public static Current Zero => default;

    public bool IsFinite => !double.IsNaN(Amperes) && !double.IsInfinity(Amperes);

    public static Current operator +(Current a, Current b) => new(a.Amperes + b.Amperes);
    public static Current operator -(Current a, Current b) => new(a.Amperes - b.Amperes);
    public static Current operator -(Current a) => new(-a.Amperes);
    public static Current operator *(Current a, double k) => new(a.Amperes * k);
    public static Current operator *(double k, Current a) => new(a.Amperes * k);
    public static Current operator /(Current a, double k) => new(a.Amperes / k);
    public static double operator /(Current a, Current b) => a.Amperes / b.Amperes;
    public static bool operator <(Current a, Current b) => a.Amperes < b.Amperes;
    public static bool operator >(Current a, Current b) => a.Amperes > b.Amperes;
    public static bool operator <=(Current a, Current b) => a.Amperes <= b.Amperes;
    public static bool operator >=(Current a, Current b) => a.Amperes >= b.Amperes;
    public static bool operator ==(Current a, Current b) => a.Amperes.Equals(b.Amperes);
    public static bool operator !=(Current a, Current b) => !a.Amperes.Equals(b.Amperes);

    public static Current Min(Current a, Current b) => a.Amperes <= b.Amperes ? a : b;
    public static Current Max(Current a, Current b) => a.Amperes >= b.Amperes ? a : b;

    public bool Equals(Current other) => Amperes.Equals(other.Amperes);
    public override bool Equals(object? obj) => obj is Current other && Equals(other);
    public override int GetHashCode() => Amperes.GetHashCode();
    public int CompareTo(Current other) => Amperes.CompareTo(other.Amperes);
    public override string ToString() => Engineering.Format(Amperes, "A");
}
