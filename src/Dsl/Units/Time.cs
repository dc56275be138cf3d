using System;

namespace Phaseward;

/// <summary>A duration or instant, stored in SI units (s).</summary>
public readonly partial struct Time : IEquatable<Time>, IComparable<Time>
{
    /// <summary>A time of <paramref name="Seconds"/> s (SI units).</summary>
    public Time(double Seconds) => this.Seconds = Seconds;

    /// <summary>The value in SI units (s).</summary>
    public double Seconds { get; }

    /// <summary>Zero seconds.</summary>
    public static Time Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Seconds) && !double.IsInfinity(Seconds);

    /// <summary>The sum of two times.</summary>
    public static Time operator +(Time a, Time b) => new(a.Seconds + b.Seconds);
    /// <summary>The difference of two times.</summary>
    public static Time operator -(Time a, Time b) => new(a.Seconds - b.Seconds);
    /// <summary>The negated time.</summary>
    public static Time operator -(Time a) => new(-a.Seconds);
    /// <summary>The time scaled by a factor.</summary>
    public static Time operator *(Time a, double k) => new(a.Seconds * k);
    /// <summary>The time scaled by a factor.</summary>
    public static Time operator *(double k, Time a) => new(a.Seconds * k);
    /// <summary>The time divided by a factor.</summary>
    public static Time operator /(Time a, double k) => new(a.Seconds / k);
    /// <summary>The ratio of two times (a plain number).</summary>
    public static double operator /(Time a, Time b) => a.Seconds / b.Seconds;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Time a, Time b) => a.Seconds < b.Seconds;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Time a, Time b) => a.Seconds > b.Seconds;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Time a, Time b) => a.Seconds <= b.Seconds;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Time a, Time b) => a.Seconds >= b.Seconds;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Time a, Time b) => a.Seconds.Equals(b.Seconds);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Time a, Time b) => !a.Seconds.Equals(b.Seconds);

    /// <summary>The smaller of two times.</summary>
    public static Time Min(Time a, Time b) => a.Seconds <= b.Seconds ? a : b;
    /// <summary>The larger of two times.</summary>
    public static Time Max(Time a, Time b) => a.Seconds >= b.Seconds ? a : b;

    /// <inheritdoc/>
    public bool Equals(Time other) => Seconds.Equals(other.Seconds);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Time other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Seconds.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Time other) => Seconds.CompareTo(other.Seconds);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Seconds, "s");
}
