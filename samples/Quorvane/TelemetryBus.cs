using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (drivers fighting on one node, PW3004). The telemetry packer's input is a shared node that the wave-height
/// converter and the battery monitor both drive through pass gates, each on its own request line: nothing stops the
/// two requests from being high together, and then the two drivers fight. Figures are invented for this demo.
/// </summary>
public sealed class TelemetryBus : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var bus = c.Node("telemetry_bus");
        c.TransmissionGate(c.Input("wave_height"), c.Input("wave_request"), bus);
        c.TransmissionGate(c.Input("battery_level"), c.Input("battery_request"), bus);
        c.Output("packer_in", c.Inverter(bus, "packer_in"));
    }
}

/// <summary>The fix: one select line and its inverse pick the source, so exactly one gate conducts at a time.</summary>
public sealed class TelemetryBusSelected : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var bus = c.Node("telemetry_bus");
        var pickWave = c.Input("pick_wave");
        c.TransmissionGate(c.Input("wave_height"), pickWave, bus);
        c.TransmissionGate(c.Input("battery_level"), c.Inverter(pickWave, "pick_battery"), bus);
        c.Output("packer_in", c.Inverter(bus, "packer_in"));
    }
}
