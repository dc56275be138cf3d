using System;

namespace Phaseward;

/// <summary>A duration or instant, stored in SI units (s).</summary>
public readonly partial struct Time : IEquatable<Time>, IComparable<Time>
{
    public Time(double Seconds) => this.Seconds = Seconds;

    /// <summary>The value in SI units (s).</summary>
    public double Seconds { get; }

    public static Time Zero => default;

    public bool IsFinite => !double.IsNaN(Seconds) && !double.IsInfinity(Seconds);

    public static Time operator +(Time a, Time b) => new(a.Seconds + b.Seconds);
    public static Time operator -(Time a, Time b) => new(a.Seconds - b.Seconds);
    public static Time operator -(Time a) => new(-a.Seconds);
    public static Time operator *(Time a, double k) => new(a.Seconds * k);
    public static Time operator *(double k, Time a) => new(a.Seconds * k);
    public static Time operator /(Time a, double k) => new(a.Seconds / k);
    public static double operator /(Time a, Time b) => a.Seconds / b.Seconds;
    public static bool operator <(Time a, Time b) => a.Seconds < b.Seconds;
    public static bool operator >(Time a, Time b) => a.Seconds > b.Seconds;
    public static bool operator <=(Time a, Time b) => a.Seconds <= b.Seconds;
    public static bool operator >=(Time a, Time b) => a.Seconds >= b.Seconds;
    public static bool operator ==(Time a, Time b) => a.Seconds.Equals(b.Seconds);
    public static bool operator !=(Time a, Time b) => !a.Seconds.Equals(b.Seconds);

    public static Time Min(Time a, Time b) => a.Seconds <= b.Seconds ? a : b;
    public static Time Max(Time a, Time b) => a.Seconds >= b.Seconds ? a : b;

    public bool Equals(Time other) => Seconds.Equals(other.Seconds);
    public override bool Equals(object? obj) => obj is Time other && Equals(other);
    public override int GetHashCode() => Seconds.GetHashCode();
    public int CompareTo(Time other) => Seconds.CompareTo(other.Seconds);
    public override string ToString() => Engineering.Format(Seconds, "s");
}
