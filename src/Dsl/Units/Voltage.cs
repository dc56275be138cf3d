using System;

namespace Phaseward;

/// <summary>A voltage, stored in SI units (V).</summary>
public readonly partial struct Voltage : IEquatable<Voltage>, IComparable<Voltage>
{
    /// <summary>A voltage of <paramref name="Volts"/> V (SI units).</summary>
    public Voltage(double Volts) => this.Volts = Volts;

    /// <summary>The value in SI units (V).</summary>
    public double Volts { get; }

    /// <summary>Zero volts.</summary>
    public static Voltage Zero => default;

    /// <summary>False for NaN and the infinities.</summary>
    public bool IsFinite => !double.IsNaN(Volts) && !double.IsInfinity(Volts);

    /// <summary>The sum of two voltages.</summary>
    public static Voltage operator +(Voltage a, Voltage b) => new(a.Volts + b.Volts);
    /// <summary>The difference of two voltages.</summary>
    public static Voltage operator -(Voltage a, Voltage b) => new(a.Volts - b.Volts);
    /// <summary>The negated voltage.</summary>
    public static Voltage operator -(Voltage a) => new(-a.Volts);
    /// <summary>The voltage scaled by a factor.</summary>
    public static Voltage operator *(Voltage a, double k) => new(a.Volts * k);
    /// <summary>The voltage scaled by a factor.</summary>
    public static Voltage operator *(double k, Voltage a) => new(a.Volts * k);
    /// <summary>The voltage divided by a factor.</summary>
    public static Voltage operator /(Voltage a, double k) => new(a.Volts / k);
    /// <summary>The ratio of two voltages (a plain number).</summary>
    public static double operator /(Voltage a, Voltage b) => a.Volts / b.Volts;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <(Voltage a, Voltage b) => a.Volts < b.Volts;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >(Voltage a, Voltage b) => a.Volts > b.Volts;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator <=(Voltage a, Voltage b) => a.Volts <= b.Volts;
    /// <summary>Compares the values in SI units.</summary>
    public static bool operator >=(Voltage a, Voltage b) => a.Volts >= b.Volts;
    /// <summary>True when the values in SI units are equal.</summary>
    public static bool operator ==(Voltage a, Voltage b) => a.Volts.Equals(b.Volts);
    /// <summary>True when the values in SI units differ.</summary>
    public static bool operator !=(Voltage a, Voltage b) => !a.Volts.Equals(b.Volts);

    /// <summary>The smaller of two voltages.</summary>
    public static Voltage Min(Voltage a, Voltage b) => a.Volts <= b.Volts ? a : b;
    /// <summary>The larger of two voltages.</summary>
    public static Voltage Max(Voltage a, Voltage b) => a.Volts >= b.Volts ? a : b;

    /// <inheritdoc/>
    public bool Equals(Voltage other) => Volts.Equals(other.Volts);
    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is Voltage other && Equals(other);
    /// <inheritdoc/>
    public override int GetHashCode() => Volts.GetHashCode();
    /// <inheritdoc/>
    public int CompareTo(Voltage other) => Volts.CompareTo(other.Volts);
    /// <inheritdoc/>
    public override string ToString() => Engineering.Format(Volts, "V");
}
