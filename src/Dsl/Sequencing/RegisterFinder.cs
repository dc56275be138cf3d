using System.Collections.Generic;
using Phaseward.Netlists;

namespace Phaseward.Sequencing;

/// <summary>
/// Pairs latches into master–slave registers: register cells by their parts' names, hand-built pairs by their
/// structure (the master's output stage feeds only the slave's entry gate, the slave on the other phase of the same clock).
/// </summary>
internal static class RegisterFinder
{
    public static IReadOnlyList<Register> Find(LatchModel model, out Register?[] registerOfLatch)
    {
        var latches = model.Latches;
        var netlist = model.Netlist;
        var registers = new List<Register>();
        var byLatch = new Register?[latches.Count];

        // Register cells: their two latches are parts named "<reg>.master" and "<reg>.slave". One pass over the latches,
        // keyed by the register cell they are part of (a pass per cell would cost cells × latches).
        var halvesOf = new Dictionary<MacroInstance, (Latch? Master, Latch? Slave)>();
        foreach (var latch in latches)
        {
            if (latch.Cell?.Parent is not { Kind: MacroKind.DynamicRegister or MacroKind.StaticRegister } macro)
                continue;
            halvesOf.TryGetValue(macro, out var halves);
            if (latch.Cell.Name == macro.Name + ".master") halves.Master = latch;
            else if (latch.Cell.Name == macro.Name + ".slave") halves.Slave = latch;
            halvesOf[macro] = halves;
        }

        foreach (var macro in netlist.Macros)
            if (halvesOf.TryGetValue(macro, out var halves) && halves.Master is { } master && halves.Slave is { } slave)
                Add(new Register(macro.Name, master, slave, macro));

        foreach (var master in latches)
            if (byLatch[master.Index] is null && HandBuiltSlaveOf(model, master) is { } slave && byLatch[slave.Index] is null)
                Add(new Register(slave.Output.Name, master, slave, null));

        registerOfLatch = byLatch;
        return registers;

        void Add(Register register)
        {
            registers.Add(register);
            byLatch[register.Master.Index] = register;
            byLatch[register.Slave.Index] = register;
        }
    }

    // The slave of a hand-built master–slave pair whose master this is: the master's output stage feeds only that
    // slave's single entry gate (and the master's own feedback stage), on the other phase of the same clock.
    private static Latch? HandBuiltSlaveOf(LatchModel model, Latch master)
    {
        if (master.OutputStage is not { } stage)
            return null;
        var netlist = model.Netlist;
        Latch? slave = null;
        foreach (var load in netlist.DataLoadList(stage.Output))
        {
            if (master.FeedbackStage is { } fb && ReferenceEquals(load, fb))
                continue;
            var entered = model.LatchEnteredBy(load);
            if (entered is null || entered == master || (slave is not null && entered != slave))
                return null;
            slave = entered;
        }

        if (slave is null || !ReferenceEquals(slave.Phase.Clock, master.Phase.Clock) || slave.Phase.Polarity == master.Phase.Polarity
            || slave.EntryGates.Count != 1 || netlist.ControlLoadsOf(stage.Output).Count > 0)
            return null;
        return slave;
    }
}
