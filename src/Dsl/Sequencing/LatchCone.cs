using Phaseward.Electrical;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// The graph a latch's path searches walk: nets joined by the stages that carry data onwards, ending at the entry
/// gates of the next latches. The one place that says what a step costs (<see cref="DelaySeconds"/> at least,
/// <see cref="MaxDelaySeconds"/> at most).
/// </summary>
/// <remarks>
/// From a net the data goes on through restoring stages (strong ones: keepers only hold) and data-controlled pass
/// gates (through their data input or their control net). A clocked pass gate ends the step: an entry gate of a
/// latch, reached through its data input, ends a path there; any other clocked gate ends the search. Data entering
/// another latch's storage node other than through its entry gate is not followed.
/// </remarks>
internal sealed class LatchCone
{
    private readonly Netlist netlist;
    private readonly Latch?[] entryLatchOfDevice;
    private readonly bool[] isLatchStorage;
    private PassGateNetwork? network;

    public LatchCone(Netlist netlist, Latch?[] entryLatchOfDevice, bool[] isLatchStorage)
    {
        this.netlist = netlist;
        this.entryLatchOfDevice = entryLatchOfDevice;
        this.isLatchStorage = isLatchStorage;
    }

    public int NetCount => netlist.Nets.Count;

    /// <summary>The latch an entry gate enters.</summary>
    public Latch EnteredBy(Device entryGate) => entryLatchOfDevice[entryGate.Id]!;

    /// <summary>How many devices a net feeds (data loads, then control loads): the candidate edges out of it.</summary>
    public int EdgeCount(Net net) => netlist.DataLoadList(net).Length + netlist.ControlLoadList(net).Length;

    /// <summary>
    /// Edge <paramref name="i"/> out of a net: a stage to its output net, or (<paramref name="next"/> = null) an entry
    /// gate where another latch begins. False when the device carries no data onwards.
    /// </summary>
    public bool TryEdge(Net net, int i, out Device device, out Net? next)
    {
        var data = netlist.DataLoadList(net);
        device = i < data.Length ? data[i] : netlist.ControlLoadList(net)[i - data.Length];
        next = null;
        if (device.IsWeak)
            return false;
        if (device.IsPassDevice && device.ClockControl is not null)
            return entryLatchOfDevice[device.Id] is not null && i < data.Length;
        if (isLatchStorage[device.Output.Id])
            return false;
        next = device.Output;
        return true;
    }

    /// <summary>The shortest delay of one step through <paramref name="device"/>, in seconds: it charges its own output
    /// net only (no side branch conducts), a lower bound of the pass-gate delay model.</summary>
    public double DelaySeconds(Device device) => FirstOrderDelay.Of(netlist, device).Seconds;

    /// <summary>
    /// The longest delay of one step through <paramref name="device"/>, in seconds: the pass-gate delay model's worst
    /// case (<see cref="PassGateNetwork.ElmoreTerm"/>), the stage charging everything that may conduct from its output
    /// (a latch's storage node behind its open entry gate included), so that along a path the steps add up to 0.69 ×
    /// the conducting path's Elmore delay with its side loads: the Elmore delay PW2001 reports, with the stage factor of
    /// <see cref="FirstOrderDelay"/>.
    /// </summary>
    public double MaxDelaySeconds(Device device)
        => (network ??= PassGateNetwork.Of(netlist)).ElmoreTerm(device).Seconds * FiftyPercentDelay.SinglePoleFactor;
}
