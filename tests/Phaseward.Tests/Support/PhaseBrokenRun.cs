namespace Phaseward.Tests.Support;

/// <summary>
/// The five-gate run the rule, report and deck tests of a phase-broken run share, and whose conducting sub-run is the
/// ladder of tests/reference/ngspice/netlists/rc_tree_phase_break.cir: 'hop' on sample.High, 'mux1' and 'mux2' on the
/// data control 'route', 'leg1' and 'leg2' on sample.Low (or, for the unbroken comparison, on sample.High too).
/// </summary>
internal static class PhaseBrokenRun
{
    public static Circuit Circuit(bool legsOnLowPhase = true)
    {
        var c = new Circuit("Buoy");
        var clock = c.Clock("sample", 10.Nanoseconds());
        var route = c.Input("route");
        var legs = legsOnLowPhase ? clock.Low : clock.High;
        var hop = c.TransmissionGate(c.Input("sensor"), clock.High, "hop");
        var mux = c.TransmissionGate(c.TransmissionGate(hop, route, "mux1"), route, "mux2");
        c.TransmissionGate(c.TransmissionGate(mux, legs, "leg1"), legs, "leg2");
        return c;
    }
}
