namespace Phaseward;

// Products and quotients between quantities: the relations the electrical models rely on.
public readonly partial struct Resistance
{
    /// <summary>R·C is a time constant.</summary>
    public static Time operator *(Resistance r, Capacitance c) => new(r.Ohms * c.Farads);
}

public readonly partial struct Capacitance
{
    /// <summary>C·R is a time constant.</summary>
    public static Time operator *(Capacitance c, Resistance r) => new(r.Ohms * c.Farads);

    /// <summary>Q = C·V.</summary>
    public static Charge operator *(Capacitance c, Voltage v) => new(c.Farads * v.Volts);
}

public readonly partial struct Voltage
{
    /// <summary>Q = V·C.</summary>
    public static Charge operator *(Voltage v, Capacitance c) => new(c.Farads * v.Volts);
}

public readonly partial struct Charge
{
    /// <summary>t = Q / I: the time a constant current takes to move a charge.</summary>
    public static Time operator /(Charge q, Current i) => new(q.Coulombs / i.Amperes);
}

public readonly partial struct Time
{
    /// <summary>The frequency whose period is this time.</summary>
    public Frequency ToFrequency() => new(1.0 / Seconds);
}

public readonly partial struct Frequency
{
    /// <summary>The period of this frequency.</summary>
    public Time ToPeriod() => new(1.0 / Hertz);
}
