using System.Runtime.CompilerServices;
using Phaseward.Netlists;

namespace Phaseward;

// Library cells. Each expands into primitives that keep the cell's source span, so the rules see a cell and the
// same circuit built by hand alike. Latches return the output of the inverter that follows their storage node, so a
// latch's output is the inverse of its input; a register (two latches) returns its input's polarity.
public sealed partial class Circuit
{
    /// <summary>A transmission gate into a storage node and an inverter: the node holds its charge while the phase is inactive.</summary>
    /// <returns>The latch output, the inverse of <paramref name="d"/>.</returns>
    public Net DynamicLatch(Net d, Phase transparent, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddLatchCell(MacroKind.DynamicLatch, d, transparent, name, Site(callerFile, callerLine));

    /// <summary>A dynamic latch plus a feedback inverter and a pass gate on the complementary phase that keep the node driven.</summary>
    /// <returns>The latch output, the inverse of <paramref name="d"/>.</returns>
    public Net StaticLatch(Net d, Phase transparent, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddLatchCell(MacroKind.StaticLatch, d, transparent, name, Site(callerFile, callerLine));

    /// <summary>A positive-edge master–slave register of two dynamic latches (master open while the clock is low).</summary>
    /// <returns>The register output, with the polarity of <paramref name="d"/>.</returns>
    public Net DynamicRegister(Net d, Clock clock, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddRegisterCell(MacroKind.DynamicRegister, d, clock, name, Site(callerFile, callerLine));

    /// <summary>A positive-edge master–slave register of two static latches.</summary>
    /// <returns>The register output, with the polarity of <paramref name="d"/>.</returns>
    public Net StaticRegister(Net d, Clock clock, string? name = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
        => AddRegisterCell(MacroKind.StaticRegister, d, clock, name, Site(callerFile, callerLine));

    /// <summary>A weak keeper on <paramref name="node"/>: an inverter senses it and a weak inverter feeds it back.</summary>
    /// <param name="node">The node to hold.</param>
    /// <param name="name">The keeper's name (default: an automatic name).</param>
    /// <param name="resistance">The weak inverter's output resistance (default: the process's keeper resistance).</param>
    /// <param name="callerFile">Filled in by the compiler: the calling file, for the source span.</param>
    /// <param name="callerLine">Filled in by the compiler: the calling line.</param>
    /// <returns>The keeper's internal net (the inverse of the node).</returns>
    public Net Keeper(Net node, string? name = null, Resistance? resistance = null, [CallerFilePath] string callerFile = "", [CallerLineNumber] int callerLine = 0)
    {
        CheckNet(node, nameof(node));
        var keeperResistance = CheckResistance(resistance, nameof(resistance));
        var cellName = name is null ? ScopedOnce(node.Name + ".keeper") : Scoped(name);
        CheckNewNetName(cellName, nameof(name));
        var span = Site(callerFile, callerLine);

        var cell = AddMacro(MacroKind.Keeper, cellName, span, null);
        var sensed = NewNet(cellName);
        AddDevice(null, DeviceKind.Inverter, new DeviceInputs(node), sensed, null, null, null, false, span, cell, "sense-inverter", nameInCell: "sense");
        AddDevice(null, DeviceKind.Inverter, new DeviceInputs(sensed), node, null, null, keeperResistance, true, span, cell, "weak-feedback-inverter", nameInCell: "feedback");
        return sensed;
    }

    private Net AddLatchCell(MacroKind kind, Net d, Phase transparent, string? name, SourceSpan span)
    {
        CheckNet(d, nameof(d));
        CheckPhase(transparent, nameof(transparent));
        var isStatic = kind == MacroKind.StaticLatch;
        name = ScopedOrNull(name);
        // An auto name was found free together with its internal nets; only a given name needs checking.
        var cellName = name ?? AutoName(Scoped("latch"), LatchInternalNets(isStatic));
        if (name is not null)
        {
            CheckNewNetName(cellName, nameof(name));
            CheckCellNetsFree(cellName, LatchInternalNets(isStatic), nameof(name));
        }

        return BuildLatch(kind, d, transparent, cellName, cellName, null, span);
    }

    private Net AddRegisterCell(MacroKind kind, Net d, Clock clock, string? name, SourceSpan span)
    {
        CheckNet(d, nameof(d));
        CheckClock(clock, nameof(clock));
        var isStatic = kind == MacroKind.StaticRegister;
        name = ScopedOrNull(name);
        var cellName = name ?? AutoName(Scoped("reg"), RegisterInternalNets(isStatic));
        if (name is not null)
        {
            CheckNewNetName(cellName, nameof(name));
            CheckCellNetsFree(cellName + ".master", LatchInternalNets(isStatic), nameof(name));
            CheckNewNetName(cellName + ".master", nameof(name));
            CheckCellNetsFree(cellName + ".slave", LatchInternalNets(isStatic), nameof(name));
        }

        var latchKind = isStatic ? MacroKind.StaticLatch : MacroKind.DynamicLatch;

        var register = AddMacro(kind, cellName, span, null);
        var master = BuildLatch(latchKind, d, clock.Low, cellName + ".master", cellName + ".master", register, span);
        return BuildLatch(latchKind, master, clock.High, cellName + ".slave", cellName, register, span);
    }

    private static readonly string[] StaticLatchNets = { ".x", ".fb" };
    private static readonly string[] DynamicLatchNets = { ".x" };
    private static readonly string[] StaticRegisterNets = { ".master", ".master.x", ".master.fb", ".slave.x", ".slave.fb" };
    private static readonly string[] DynamicRegisterNets = { ".master", ".master.x", ".slave.x" };

    private static string[] LatchInternalNets(bool isStatic) => isStatic ? StaticLatchNets : DynamicLatchNets;

    private static string[] RegisterInternalNets(bool isStatic) => isStatic ? StaticRegisterNets : DynamicRegisterNets;

    private void CheckCellNetsFree(string cellName, string[] suffixes, string parameter)
    {
        foreach (var suffix in suffixes)
            CheckNewNetName(cellName + suffix, parameter);
    }

    private Net BuildLatch(MacroKind kind, Net d, Phase transparent, string cellName, string outputName, MacroInstance? parent, SourceSpan span)
    {
        var cell = AddMacro(kind, cellName, span, parent);
        var storage = NewNet(cellName + ".x");
        var output = NewNet(outputName);
        AddDevice(null, DeviceKind.TransmissionGate, new DeviceInputs(d), storage, transparent, null, null, false, span, cell, "pass", nameInCell: "pass");
        AddDevice(null, DeviceKind.Inverter, new DeviceInputs(storage), output, null, null, null, false, span, cell, "inverter", nameInCell: "inverter");
        if (kind == MacroKind.StaticLatch)
        {
            var feedback = NewNet(cellName + ".fb");
            AddDevice(null, DeviceKind.Inverter, new DeviceInputs(output), feedback, null, null, null, false, span, cell, "feedback-inverter", nameInCell: "feedback-inverter");
            AddDevice(null, DeviceKind.TransmissionGate, new DeviceInputs(feedback), storage, transparent.Complement, null, null, false, span, cell, "feedback-pass", nameInCell: "feedback-pass");
        }

        return output;
    }

    private MacroInstance AddMacro(MacroKind kind, string name, SourceSpan span, MacroInstance? parent)
    {
        var macro = new MacroInstance(macros.Count, kind, name, span, parent);
        macros.Add(macro);
        return macro;
    }
}
