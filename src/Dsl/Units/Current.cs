using System;

namespace Phaseward;

/// <summary>An electrical current, stored in SI units (A).</summary>
public readonly partial struct Current : IEquatable<Current>, IComparable<Current>
{
    /// <summary>A current of <paramref name="Amperes"/> A (SI units).</summary>
    public Current(double Amperes) => this.Amperes = Amperes;

    /// <summary>The value in SI units (A).</summary>
    public double Amperes { get; }

    /// <summary>Zero amperes.</summary>
    public static Current Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Amperes) && !double.IsInfinity(Amperes);

    /// <summary>The sum of two currents.</summary>
    public static Current operator +(Current a, Current b) => new(a.Amperes + b.Amperes);
    /// <summary>The difference of two currents.</summary>
    public static Current operator -(Current a, Current b) => new(a.Amperes - b.Amperes);
    /// <summary>The negated current.</summary>
    public static Current operator -(Current a) => new(-a.Amperes);
    /// <summary>The current scaled by a factor.</summary>
    public static Current operator *(Current a, double k) => new(a.Amperes * k);
    /// <summary>The current scaled by a factor.</summary>
    public static Current operator *(double k, Current a) => new(a.Amperes * k);
    /// <summary>The current divided by a factor.</summary>
    public static Current operator /(Current a, double k) => new(a.Amperes / k);
    /// <summary>The ratio of two currents (a plain number).</summary>
    public static double operator /(Current a, Current b) => a.Amperes / b.Amperes;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Current a, Current b) => a.Amperes < b.Amperes;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Current a, Current b) => a.Amperes > b.Amperes;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Current a, Current b) => a.Amperes <= b.Amperes;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Current a, Current b) => a.Amperes >= b.Amperes;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Current a, Current b) => a.Amperes.Equals(b.Amperes);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Current a, Current b) => !a.Amperes.Equals(b.Amperes);

    /// <summary>The smaller of two currents.</summary>
    public static Current Min(Current a, Current b) => a.Amperes <= b.Amperes ? a : b;
    /// <summary>The larger of two currents.</summary>
    public static Current Max(Current a, Current b) => a.Amperes >= b.Amperes ? a : b;

    /// <inheritdoc/>
    public bool Equals(Current other) => Amperes.Equals(other.Amperes);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Current other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Amperes.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Current other) => Amperes.CompareTo(other.Amperes);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Amperes, "A");
}
