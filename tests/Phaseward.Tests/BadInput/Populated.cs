namespace Phaseward.Tests.BadInput;

/// <summary>A circuit with something of every kind in it, so that "unchanged after a refused call" means something.</summary>
internal sealed class Populated
{
    public Populated()
    {
        Circuit = new Circuit("populated");
        Clk = Circuit.Clock("clk", 2.Nanoseconds());
        A = Circuit.Input("a");
        B = Circuit.Input("b");
        Enable = Circuit.Input("en");
        Gated = Circuit.ClockGate(Clk, Enable, name: "gclk");
        Node = Circuit.Node("n");
        Driven = Circuit.Inverter(A, "y");
        Latch = Circuit.StaticLatch(B, Clk.High, "q");
        Circuit.Output("out", Latch);
        Circuit.SetCapacitance(A, 5.Femtofarads());
    }

    public Circuit Circuit { get; }

    public Clock Clk { get; }

    public Clock Gated { get; }

    public Net A { get; }

    public Net B { get; }

    public Net Enable { get; }

    /// <summary>Declared with Node() and not driven yet.</summary>
    public Net Node { get; }

    /// <summary>Driven by an inverter.</summary>
    public Net Driven { get; }

    /// <summary>A static latch's output: nets "q.x", "q" and "q.fb" exist.</summary>
    public Net Latch { get; }
}

/// <summary>Things that belong to a different circuit.</summary>
internal sealed class Elsewhere
{
    public Elsewhere()
    {
        var other = new Circuit("elsewhere-design");
        Clock = other.Clock("foreignclk", 1.Nanoseconds());
        Net = other.Input("foreignnet");
    }

    public Clock Clock { get; }

    public Net Net { get; }
}
