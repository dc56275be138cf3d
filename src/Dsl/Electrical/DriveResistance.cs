using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Electrical;

/// <summary>
/// For every net, the resistance from a supply rail to the net along its weakest strong drive path: a primary input's
/// outside driver, a restoring stage, or pass devices in series back to one of those. Keepers (weak stages) do not
/// count: they hold a level, they do not write it. Shared by the rules that weigh one path against another
/// (PW3004 fighting drivers, PW3005 keepers).
/// </summary>
/// <remarks>
/// R(net) = the driver resistance for a primary input; else the largest resistance among its strong restoring
/// stages; else, over its pass drivers, the largest R(pass device) + R(its input). The weakest path is the one that
/// must still win (every arm of a mux must be able to write), so "largest" throughout. A net reached again while
/// its own value is being computed (a pass-gate loop) or with no strong driver has no figure. Computed once per
/// netlist by one depth-first pass: linear in its size. Lumped series resistances, first order (common practice).
/// </remarks>
public sealed class DriveResistance
{
    private const byte Unvisited = 0, Open = 1, Done = 2;

    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<Netlist, DriveResistance> Cache = new();

    private readonly Netlist netlist;
    private readonly double[] ohms;     // NaN: no strong path
    private readonly byte[] state;
    private readonly Stack<Net> stack = new();

    private DriveResistance(Netlist netlist)
    {
        this.netlist = netlist;
        ohms = new double[netlist.Nets.Count];
        state = new byte[netlist.Nets.Count];
    }

    /// <summary>The figures of a netlist (computed on first use and kept for the netlist's lifetime).</summary>
    public static DriveResistance Of(Netlist netlist)
    {
        if (netlist is null) throw new System.ArgumentNullException(nameof(netlist));
        return Cache.GetValue(netlist, n => new DriveResistance(n));
    }

    /// <summary>The resistance from a rail to <paramref name="net"/> along its weakest strong path, or null when it has none.</summary>
    public Resistance? Of(Net net)
    {
        // Index check through the netlist (throws for a foreign net).
        netlist.IsInput(net);
        Compute(net);
        var value = ohms[net.Id];
        return double.IsNaN(value) ? null : new Resistance(value);
    }

    /// <summary>The resistance of the path that writes through <paramref name="driver"/>: the device itself, plus
    /// the drive of its input for a pass device. Null when that input has no strong path.</summary>
    public Resistance? Through(Device driver)
    {
        var own = netlist.ResistanceOf(driver);
        if (!driver.IsPassDevice)
            return own;
        return Of(driver.Inputs[0]) is { } upstream ? own + upstream : null;
    }

    // Iterative post-order: a long pass-gate chain must not overflow the stack.
    private void Compute(Net start)
    {
        if (state[start.Id] == Done)
            return;
        stack.Clear();
        stack.Push(start);
        while (stack.Count > 0)
        {
            var net = stack.Peek();
            var id = net.Id;
            if (state[id] == Done)
            {
                stack.Pop();
                continue;
            }

            if (state[id] == Unvisited)
            {
                state[id] = Open;
                var pending = false;
                if (!netlist.IsInput(net) && !HasStrongRestoringDriver(net))
                {
                    foreach (var driver in netlist.DriverList(net))
                    {
                        if (!driver.IsPassDevice) continue;
                        var input = driver.Inputs[0];
                        if (state[input.Id] == Unvisited)
                        {
                            stack.Push(input);
                            pending = true;
                        }
                    }
                }

                if (pending)
                    continue;
            }

            stack.Pop();
            ohms[id] = Evaluate(net);
            state[id] = Done;
        }
    }

    private double Evaluate(Net net)
    {
        if (netlist.IsInput(net))
            return netlist.Process.DriverResistance.Ohms;
        var weakest = double.NaN;
        var restoring = false;
        foreach (var driver in netlist.DriverList(net))
        {
            if (driver.IsRestoring && !driver.IsWeak)
            {
                var r = netlist.ResistanceOf(driver).Ohms;
                weakest = restoring ? System.Math.Max(weakest, r) : r;
                restoring = true;
            }
        }

        if (restoring)
            return weakest;
        foreach (var driver in netlist.DriverList(net))
        {
            if (!driver.IsPassDevice) continue;
            var input = driver.Inputs[0];
            // A net still open is on the path being computed: a pass-gate loop, which gives that arm no figure.
            if (state[input.Id] != Done || double.IsNaN(ohms[input.Id]))
                continue;
            var r = netlist.ResistanceOf(driver).Ohms + ohms[input.Id];
            weakest = double.IsNaN(weakest) ? r : System.Math.Max(weakest, r);
        }

        return weakest;
    }

    private bool HasStrongRestoringDriver(Net net)
    {
        foreach (var driver in netlist.DriverList(net))
            if (driver.IsRestoring && !driver.IsWeak)
                return true;
        return false;
    }
}
