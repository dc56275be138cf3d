using Phaseward.Tests.Support;

namespace Phaseward.Tests.BadInput;

// A net, phase or clock belongs to the circuit that made it; handing it to another circuit is refused, naming the
// thing and its own design.
public class ForeignCircuitTests
{
    private readonly Populated p = new();
    private readonly Elsewhere other = new();

    private void RefusedNet(System.Action call, string parameter)
        => Rejection.Argument(p.Circuit, call, parameter, "'foreignnet'", "'elsewhere-design'");

    private void RefusedClock(System.Action call, string parameter)
        => Rejection.Argument(p.Circuit, call, parameter, "'foreignclk'", "'elsewhere-design'");

    [Fact]
    public void Foreign_nets_into_restoring_stages()
    {
        var c = p.Circuit;
        RefusedNet(() => c.Inverter(other.Net), "input");
        RefusedNet(() => c.Inverter(p.A, other.Net), "output");
        RefusedNet(() => c.Buffer(other.Net), "input");
        RefusedNet(() => c.Buffer(p.A, other.Net), "output");
        RefusedNet(() => c.Nand(other.Net, p.B), "a");
        RefusedNet(() => c.Nand(p.A, other.Net), "b");
        RefusedNet(() => c.Nand(p.A, p.B, other.Net), "output");
        RefusedNet(() => c.Nor(other.Net, p.B), "a");
        RefusedNet(() => c.Nor(p.A, other.Net), "b");
        RefusedNet(() => c.Nor(p.A, p.B, other.Net), "output");
    }

    [Fact]
    public void Foreign_nets_and_phases_into_transmission_gates()
    {
        var c = p.Circuit;
        RefusedNet(() => c.TransmissionGate(other.Net, p.Clk.High), "input");
        RefusedClock(() => c.TransmissionGate(p.A, other.Clock.High), "when");
        RefusedClock(() => c.TransmissionGate(p.A, other.Clock.Low, p.Node), "when");
        RefusedNet(() => c.TransmissionGate(p.A, p.Clk.High, other.Net), "output");
        RefusedNet(() => c.TransmissionGate(p.A, other.Net), "control");
        RefusedNet(() => c.TransmissionGate(other.Net, p.B), "input");
        RefusedNet(() => c.TransmissionGate(p.A, other.Net, p.Node), "control");
        RefusedNet(() => c.TransmissionGate(p.A, p.B, other.Net), "output");
    }

    [Fact]
    public void Foreign_nets_phases_and_clocks_into_cells()
    {
        var c = p.Circuit;
        RefusedNet(() => c.DynamicLatch(other.Net, p.Clk.High), "d");
        RefusedClock(() => c.DynamicLatch(p.A, other.Clock.High), "transparent");
        RefusedNet(() => c.StaticLatch(other.Net, p.Clk.High), "d");
        RefusedClock(() => c.StaticLatch(p.A, other.Clock.Low), "transparent");
        RefusedNet(() => c.DynamicRegister(other.Net, p.Clk), "d");
        RefusedClock(() => c.DynamicRegister(p.A, other.Clock), "clock");
        RefusedNet(() => c.StaticRegister(other.Net, p.Clk), "d");
        RefusedClock(() => c.StaticRegister(p.A, other.Clock), "clock");
        RefusedNet(() => c.Keeper(other.Net), "node");
    }

    [Fact]
    public void Foreign_clocks_and_enables_into_derived_clocks()
    {
        var c = p.Circuit;
        RefusedClock(() => c.ClockGate(other.Clock, p.Enable), "clock");
        RefusedNet(() => c.ClockGate(p.Clk, other.Net), "enable");
        RefusedClock(() => c.BufferedClock(other.Clock), "clock");
    }

    [Fact]
    public void Foreign_nets_into_ports_and_figures()
    {
        var c = p.Circuit;
        RefusedNet(() => c.Output("stolen", other.Net), "net");
        RefusedNet(() => c.SetCapacitance(other.Net, 1.Femtofarads()), "net");
        RefusedNet(() => c.SetLeakage(other.Net, 1.Picoamperes()), "net");
    }

    [Fact]
    public void A_foreign_net_with_a_local_name_is_still_foreign()
    {
        var twin = new Circuit("twin").Input("a");

        Rejection.Argument(p.Circuit, () => p.Circuit.Inverter(twin), "input", "'a'", "'twin'");
    }
}
