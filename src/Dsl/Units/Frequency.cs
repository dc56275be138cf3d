using System;

namespace Phaseward;

/// <summary>A frequency, stored in SI units (Hz).</summary>
public readonly partial struct Frequency : IEquatable<Frequency>, IComparable<Frequency>
{
    /// <summary>A frequency of <paramref name="Hertz"/> Hz (SI units).</summary>
    public Frequency(double Hertz) => this.Hertz = Hertz;

    /// <summary>The value in SI units (Hz).</summary>
    public double Hertz { get; }

    /// <summary>Zero hertz.</summary>
    public static Frequency Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Hertz) && !double.IsInfinity(Hertz);

    /// <summary>The sum of two frequencys.</summary>
    public static Frequency operator +(Frequency a, Frequency b) => new(a.Hertz + b.Hertz);
    /// <summary>The difference of two frequencys.</summary>
    public static Frequency operator -(Frequency a, Frequency b) => new(a.Hertz - b.Hertz);
    /// <summary>The negated frequency.</summary>
    public static Frequency operator -(Frequency a) => new(-a.Hertz);
    /// <summary>The frequency scaled by a factor.</summary>
    public static Frequency operator *(Frequency a, double k) => new(a.Hertz * k);
    /// <summary>The frequency scaled by a factor.</summary>
    public static Frequency operator *(double k, Frequency a) => new(a.Hertz * k);
    /// <summary>The frequency divided by a factor.</summary>
    public static Frequency operator /(Frequency a, double k) => new(a.Hertz / k);
    /// <summary>The ratio of two frequencys (a plain number).</summary>
    public static double operator /(Frequency a, Frequency b) => a.Hertz / b.Hertz;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Frequency a, Frequency b) => a.Hertz < b.Hertz;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Frequency a, Frequency b) => a.Hertz > b.Hertz;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Frequency a, Frequency b) => a.Hertz <= b.Hertz;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Frequency a, Frequency b) => a.Hertz >= b.Hertz;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Frequency a, Frequency b) => a.Hertz.Equals(b.Hertz);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Frequency a, Frequency b) => !a.Hertz.Equals(b.Hertz);

    /// <summary>The smaller of two frequencys.</summary>
    public static Frequency Min(Frequency a, Frequency b) => a.Hertz <= b.Hertz ? a : b;
    /// <summary>The larger of two frequencys.</summary>
    public static Frequency Max(Frequency a, Frequency b) => a.Hertz >= b.Hertz ? a : b;

    /// <inheritdoc/>
    public bool Equals(Frequency other) => Hertz.Equals(other.Hertz);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Frequency other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Hertz.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Frequency other) => Hertz.CompareTo(other.Hertz);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Hertz, "Hz");
}
