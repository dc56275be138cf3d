using System.Linq;
using Phaseward.Netlists;

namespace Phaseward.Tests.Support;

/// <summary>Lookups by name in a netlist, so tests read as the DSL calls that made them.</summary>
internal static class Circuits
{
    public static Net Net(this Netlist netlist, string name) => netlist.Nets.Single(n => n.Name == name);

    public static Device Device(this Netlist netlist, string name) => netlist.Devices.Single(d => d.Name == name);

    public static MacroInstance Macro(this Netlist netlist, string name) => netlist.Macros.Single(m => m.Name == name);

    public static Clock Clock(this Netlist netlist, string name) => netlist.Clocks.Single(c => c.Name == name);

    public static string[] Names(this System.Collections.Generic.IEnumerable<Net> nets) => nets.Select(n => n.Name).ToArray();
}
