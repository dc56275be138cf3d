using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// The feedback loops that no latch breaks: the strongly connected components of the graph whose nodes are nets and
/// whose edges run from a device's data inputs, and from a data-controlled pass gate's control, to its output, over
/// restoring stages (keepers included) and data-controlled pass gates. Clocked pass gates make no edge: a latch
/// breaks a loop. One pass of Tarjan's algorithm (Tarjan, "Depth-first search and linear graph algorithms", SIAM J.
/// Computing 1(2), 1972), iterative, so linear in the netlist's size and safe on deep designs.
/// </summary>
public static class CombinationalLoops
{
    /// <summary>Every component that holds a loop (two or more nets, or one net that feeds itself), in the order
    /// Tarjan's algorithm closes them; each as the devices on it (output and some input in the component), in
    /// netlist order.</summary>
    public static IReadOnlyList<IReadOnlyList<Device>> Of(Netlist netlist, System.Threading.CancellationToken cancellationToken = default)
    {
        if (netlist is null) throw new System.ArgumentNullException(nameof(netlist));
        var count = netlist.Nets.Count;
        var index = new int[count];      // 0: not visited; else visit order + 1
        var lowLink = new int[count];
        var onStack = new bool[count];
        var component = new int[count];  // component number + 1, once closed
        var sccStack = new Stack<int>();
        var callStack = new Stack<(int Net, int Edge)>();
        var loops = new List<IReadOnlyList<Device>>();
        var members = new List<int>();
        var next = 0;
        var components = 0;

        for (var root = 0; root < count; root++)
        {
            if (index[root] != 0) continue;
            cancellationToken.ThrowIfCancellationRequested();
            callStack.Push((root, 0));
            index[root] = lowLink[root] = ++next;
            sccStack.Push(root);
            onStack[root] = true;

            while (callStack.Count > 0)
            {
                var (v, edge) = callStack.Pop();
                var descended = false;
                var net = netlist.Nets[v];
                var data = netlist.DataLoadList(net);
                var controls = netlist.ControlLoadList(net);
                var edges = data.Length + controls.Length;
                for (; edge < edges; edge++)
                {
                    var device = edge < data.Length ? data[edge] : controls[edge - data.Length];
                    if (!IsLoopEdge(device)) continue;
                    var w = device.Output.Id;
                    if (index[w] == 0)
                    {
                        callStack.Push((v, edge + 1));
                        index[w] = lowLink[w] = ++next;
                        sccStack.Push(w);
                        onStack[w] = true;
                        callStack.Push((w, 0));
                        descended = true;
                        break;
                    }

                    if (onStack[w] && index[w] < lowLink[v])
                        lowLink[v] = index[w];
                }

                if (descended) continue;

                if (lowLink[v] == index[v])
                {
                    components++;
                    members.Clear();
                    int w;
                    do
                    {
                        w = sccStack.Pop();
                        onStack[w] = false;
                        component[w] = components;
                        members.Add(w);
                    }
                    while (w != v);

                    if (DevicesOn(netlist, members, component, components) is { } devices)
                        loops.Add(devices);
                }

                if (callStack.Count > 0)
                {
                    var parent = callStack.Peek().Net;
                    if (lowLink[v] < lowLink[parent])
                        lowLink[parent] = lowLink[v];
                }
            }
        }

        return loops;
    }

    /// <summary>Restoring stages (keepers included) and data-controlled pass gates carry a value round a loop; a
    /// clocked pass gate is a latch and breaks it.</summary>
    internal static bool IsLoopEdge(Device device) => !device.IsPassDevice || device.DataControl is not null;

    // The devices whose output and one of whose inputs (or control) lie in the component; null when there is no loop
    // (a single net that does not feed itself).
    private static List<Device>? DevicesOn(Netlist netlist, List<int> members, int[] component, int number)
    {
        List<Device>? devices = null;
        foreach (var id in members)
        {
            foreach (var device in netlist.DriverList(netlist.Nets[id]))
            {
                if (!IsLoopEdge(device)) continue;
                var inside = device.DataControl is { } control && component[control.Id] == number;
                var inputs = device.Inputs;
                for (var i = 0; i < inputs.Count && !inside; i++)
                    inside = component[inputs[i].Id] == number;
                if (inside)
                    (devices ??= new List<Device>(members.Count)).Add(device);
            }
        }

        devices?.Sort((a, b) => a.Id.CompareTo(b.Id));
        return devices;
    }
}
