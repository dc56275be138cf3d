using System;

namespace Phaseward;

/// <summary>A frequency, stored in SI units (Hz).</summary>
public readonly partial struct Frequency : IEquatable<Frequency>, IComparable<Frequency>
{
    public Frequency(double Hertz) => this.Hertz = Hertz;

    /// <summary>The value in SI units (Hz).</summary>
    public double Hertz { get; }

    public static Frequency Zero => default;

    public bool IsFinite => !double.IsNaN(Hertz) && !double.IsInfinity(Hertz);

    public static Frequency operator +(Frequency a, Frequency b) => new(a.Hertz + b.Hertz);
    public static Frequency operator -(Frequency a, Frequency b) => new(a.Hertz - b.Hertz);
    public static Frequency operator -(Frequency a) => new(-a.Hertz);
    public static Frequency operator *(Frequency a, double k) => new(a.Hertz * k);
    public static Frequency operator *(double k, Frequency a) => new(a.Hertz * k);
    public static Frequency operator /(Frequency a, double k) => new(a.Hertz / k);
    public static double operator /(Frequency a, Frequency b) => a.Hertz / b.Hertz;
    public static bool operator <(Frequency a, Frequency b) => a.Hertz < b.Hertz;
    public static bool operator >(Frequency a, Frequency b) => a.Hertz > b.Hertz;
    public static bool operator <=(Frequency a, Frequency b) => a.Hertz <= b.Hertz;
    public static bool operator >=(Frequency a, Frequency b) => a.Hertz >= b.Hertz;
    public static bool operator ==(Frequency a, Frequency b) => a.Hertz.Equals(b.Hertz);
    public static bool operator !=(Frequency a, Frequency b) => !a.Hertz.Equals(b.Hertz);

    public static Frequency Min(Frequency a, Frequency b) => a.Hertz <= b.Hertz ? a : b;
    public static Frequency Max(Frequency a, Frequency b) => a.Hertz >= b.Hertz ? a : b;

    public bool Equals(Frequency other) => Hertz.Equals(other.Hertz);
    public override bool Equals(object? obj) => obj is Frequency other && Equals(other);
    public override int GetHashCode() => Hertz.GetHashCode();
    public int CompareTo(Frequency other) => Hertz.CompareTo(other.Hertz);
    public override string ToString() => Engineering.Format(Hertz, "Hz");
}
