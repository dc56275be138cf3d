using System;

namespace Phaseward;

/// <summary>A voltage, stored in SI units (V).</summary>
public readonly partial struct Voltage : IEquatable<Voltage>, IComparable<Voltage>
{
    public Voltage(double Volts) => this.Volts = Volts;

    /// <summary>The value in SI units (V).</summary>
    public double Volts { get; }

    public static Voltage Zero => default;

    public bool IsFinite => !double.IsNaN(Volts) && !double.IsInfinity(Volts);

    public static Voltage operator +(Voltage a, Voltage b) => new(a.Volts + b.Volts);
    public static Voltage operator -(Voltage a, Voltage b) => new(a.Volts - b.Volts);
    public static Voltage operator -(Voltage a) => new(-a.Volts);
    public static Voltage operator *(Voltage a, double k) => new(a.Volts * k);
    public static Voltage operator *(double k, Voltage a) => new(a.Volts * k);
    public static Voltage operator /(Voltage a, double k) => new(a.Volts / k);
    public static double operator /(Voltage a, Voltage b) => a.Volts / b.Volts;
    public static bool operator <(Voltage a, Voltage b) => a.Volts < b.Volts;
    public static bool operator >(Voltage a, Voltage b) => a.Volts > b.Volts;
    public static bool operator <=(Voltage a, Voltage b) => a.Volts <= b.Volts;
    public static bool operator >=(Voltage a, Voltage b) => a.Volts >= b.Volts;
    public static bool operator ==(Voltage a, Voltage b) => a.Volts.Equals(b.Volts);
    public static bool operator !=(Voltage a, Voltage b) => !a.Volts.Equals(b.Volts);

    public static Voltage Min(Voltage a, Voltage b) => a.Volts <= b.Volts ? a : b;
    public static Voltage Max(Voltage a, Voltage b) => a.Volts >= b.Volts ? a : b;

    public bool Equals(Voltage other) => Volts.Equals(other.Volts);
    public override bool Equals(object? obj) => obj is Voltage other && Equals(other);
    public override int GetHashCode() => Volts.GetHashCode();
    public int CompareTo(Voltage other) => Volts.CompareTo(other.Volts);
    public override string ToString() => Engineering.Format(Volts, "V");
}
