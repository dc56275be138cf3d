using System;

namespace Phaseward;

/// <summary>A capacitance, stored in SI units (F).</summary>
public readonly partial struct Capacitance : IEquatable<Capacitance>, IComparable<Capacitance>
{
    public Capacitance(double Farads) => this.Farads = Farads;

    /// <summary>The value in SI units (F).</summary>
    public double Farads { get; }

    public static Capacitance Zero => default;

    public bool IsFinite => !double.IsNaN(Farads) && !double.IsInfinity(Farads);

    public static Capacitance operator +(Capacitance a, Capacitance b) => new(a.Farads + b.Farads);
    public static Capacitance operator -(Capacitance a, Capacitance b) => new(a.Farads - b.Farads);
    public static Capacitance operator -(Capacitance a) => new(-a.Farads);
    public static Capacitance operator *(Capacitance a, double k) => new(a.Farads * k);
    public static Capacitance operator *(double k, Capacitance a) => new(a.Farads * k);
    public static Capacitance operator /(Capacitance a, double k) => new(a.Farads / k);
    public static double operator /(Capacitance a, Capacitance b) => a.Farads / b.Farads;
    public static bool operator <(Capacitance a, Capacitance b) => a.Farads < b.Farads;
    public static bool operator >(Capacitance a, Capacitance b) => a.Farads > b.Farads;
    public static bool operator <=(Capacitance a, Capacitance b) => a.Farads <= b.Farads;
    public static bool operator >=(Capacitance a, Capacitance b) => a.Farads >= b.Farads;
    public static bool operator ==(Capacitance a, Capacitance b) => a.Farads.Equals(b.Farads);
    public static bool operator !=(Capacitance a, Capacitance b) => !a.Farads.Equals(b.Farads);

    public static Capacitance Min(Capacitance a, Capacitance b) => a.Farads <= b.Farads ? a : b;
    public static Capacitance Max(Capacitance a, Capacitance b) => a.Farads >= b.Farads ? a : b;

    public bool Equals(Capacitance other) => Farads.Equals(other.Farads);
    public override bool Equals(object? obj) => obj is Capacitance other && Equals(other);
    public override int GetHashCode() => Farads.GetHashCode();
    public int CompareTo(Capacitance other) => Farads.CompareTo(other.Farads);
    public override string ToString() => Engineering.Format(Farads, "F");
}
