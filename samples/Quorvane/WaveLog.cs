using Phaseward;

namespace Quorvane;

/// <summary>
/// Hazard (charge sharing on a read bit line, PW3003; drivers fighting, PW3004). The buoy keeps its last four wave
/// heights (one bit shown) in dynamic cells and reads them onto one bit line through pass gates, each opened by its
/// own read request from the packer. Nothing stops two requests from being high together: the two cells then fight
/// on the bit line, and a cell that opens onto it can find every other cell joined to it, sharing its charge with
/// all of them. Figures (the 40 fF cells included) are invented for this demo.
/// </summary>
public sealed class WaveLog : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var readRequests = new Net[Entries];
        for (var i = 0; i < readRequests.Length; i++)
            readRequests[i] = c.Input($"read_request{i}");
        ReadPort(c, readRequests);
    }

    internal const int Entries = 4;

    /// <summary>The four cells, written on the log clock, and the read port onto one bit line, sensed by an inverter.</summary>
    internal static void ReadPort(Circuit c, Net[] readSelects)
    {
        var log = c.Clock("log", 2.Nanoseconds());
        var bitLine = c.Node("log_bit_line");
        for (var i = 0; i < readSelects.Length; i++)
        {
            var cell = c.TransmissionGate(c.Input($"wave_bit{i}"), log.High, $"log_cell{i}");
            c.SetCapacitance(cell, 40.Femtofarads());
            c.TransmissionGate(cell, readSelects[i], bitLine);
        }

        c.Output("log_out", c.Inverter(bitLine, "log_sense"));
    }
}

/// <summary>
/// The fix: a 2-to-4 decoder of the read address drives the selects, so exactly one read gate conducts at a time,
/// and the design says so with <c>c.Exclusive</c>. A cell then shares its charge with the bit line alone.
/// </summary>
public sealed class WaveLogDecoded : Design
{
    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var a0 = c.Input("read_address0");
        var a1 = c.Input("read_address1");
        var a0Bar = c.Inverter(a0, "read_address0_b");
        var a1Bar = c.Inverter(a1, "read_address1_b");
        var selects = new[]
        {
            c.Nor(a0, a1, "read_select0"),
            c.Nor(a0Bar, a1, "read_select1"),
            c.Nor(a0, a1Bar, "read_select2"),
            c.Nor(a0Bar, a1Bar, "read_select3"),
        };
        c.Exclusive(selects);
        WaveLog.ReadPort(c, selects);
    }
}
