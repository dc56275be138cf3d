using Phaseward.Tests.Support;

namespace Phaseward.Tests.BadInput;

public class NullArgumentTests
{
    private readonly Populated p = new();

    private void Refused(System.Action call, string parameter) => Rejection.Null(p.Circuit, call, parameter);

    [Fact]
    public void Null_nets_into_restoring_stages()
    {
        var c = p.Circuit;
        Refused(() => c.Inverter(null!), "input");
        Refused(() => c.Inverter(null!, p.Node), "input");
        Refused(() => c.Inverter(p.A, output: null!), "output");
        Refused(() => c.Buffer(null!), "input");
        Refused(() => c.Buffer(p.A, output: null!), "output");
        Refused(() => c.Nand(null!, p.B), "a");
        Refused(() => c.Nand(p.A, null!), "b");
        Refused(() => c.Nand(p.A, p.B, output: null!), "output");
        Refused(() => c.Nor(null!, p.B), "a");
        Refused(() => c.Nor(p.A, null!), "b");
        Refused(() => c.Nor(p.A, p.B, output: null!), "output");
    }

    [Fact]
    public void Null_nets_and_phases_into_transmission_gates()
    {
        var c = p.Circuit;
        Refused(() => c.TransmissionGate(null!, p.Clk.High), "input");
        Refused(() => c.TransmissionGate(p.A, (Phase)null!), "when");
        Refused(() => c.TransmissionGate(p.A, p.Clk.High, output: null!), "output");
        Refused(() => c.TransmissionGate(null!, p.Clk.High, p.Node), "input");
        Refused(() => c.TransmissionGate(p.A, (Phase)null!, p.Node), "when");
        Refused(() => c.TransmissionGate(null!, p.B), "input");
        Refused(() => c.TransmissionGate(p.A, (Net)null!), "control");
        Refused(() => c.TransmissionGate(p.A, p.B, output: null!), "output");
        Refused(() => c.TransmissionGate(p.A, (Net)null!, p.Node), "control");
    }

    [Fact]
    public void Null_arguments_to_cells()
    {
        var c = p.Circuit;
        Refused(() => c.DynamicLatch(null!, p.Clk.High), "d");
        Refused(() => c.DynamicLatch(p.A, null!), "transparent");
        Refused(() => c.StaticLatch(null!, p.Clk.High), "d");
        Refused(() => c.StaticLatch(p.A, null!), "transparent");
        Refused(() => c.DynamicRegister(null!, p.Clk), "d");
        Refused(() => c.DynamicRegister(p.A, null!), "clock");
        Refused(() => c.StaticRegister(null!, p.Clk), "d");
        Refused(() => c.StaticRegister(p.A, null!), "clock");
        Refused(() => c.Keeper(null!), "node");
    }

    [Fact]
    public void Null_arguments_to_clocks()
    {
        var c = p.Circuit;
        Refused(() => c.Clock(null!, 1.Nanoseconds()), "name");
        Refused(() => c.ClockGate(null!, p.Enable), "clock");
        Refused(() => c.ClockGate(p.Clk, null!), "enable");
        Refused(() => c.BufferedClock(null!), "clock");
    }

    [Fact]
    public void Null_arguments_to_ports_process_and_figures()
    {
        var c = p.Circuit;
        Refused(() => c.Input(null!), "name");
        Refused(() => c.Output(null!, p.A), "name");
        Refused(() => c.Output("other", null!), "net");
        Refused(() => c.UseProcess(null!), "process");
        Refused(() => c.SetCapacitance(null!, 1.Femtofarads()), "net");
        Refused(() => c.SetLeakage(null!, 1.Picoamperes()), "net");
    }

    [Fact]
    public void Null_process_name()
        => Rejection.Null(p.Circuit, () => p.Circuit.UseProcess(new Process { Name = null! }), "Name");

    [Fact]
    public void Null_design_name()
        => Assert.Equal("designName", Assert.Throws<System.ArgumentNullException>(() => new Circuit(null!)).ParamName);
}
