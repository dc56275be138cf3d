using System.Collections.Generic;
using System.Globalization;
using Phaseward.Checking;
using Phaseward.Clocking;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// PW1004: a clock gate's enable can change while the gate passes the clock. A gate that stops low passes its source
/// clock while that clock is high, so its enable may change only while the clock is low (the mirror for a gate that
/// stops high). The enable is traced back through restoring stages and data-controlled pass gates to the storage it
/// comes from (latches, registers' slaves) and to primary inputs. From a latch it can change from the moment the
/// latch opens until its data has passed (the latest arrival after opening, <see cref="LatchBorrowing"/>) plus the
/// latch's entry delay and the slowest path to the enable; that interval must lie inside the phase in which the gate
/// blocks the clock. Primary inputs are taken as stable unless <see cref="RulePolicy.EnablesFromInputsMayChange"/>.
/// Storage on a clock with no fixed time relation to the gate's (see <see cref="TimeBase"/>) can change at any time.
/// </summary>
/// <remarks>
/// The condition — latch a clock gate's enable on the phase in which the gate blocks the clock, so the enable is
/// steady while the clock passes — is common practice for glitch-free clock gating. Windows are nominal edges on the
/// design's time base, compared over the two clocks' common cycle; delays are first-order 0.69·R·C stages at the slow
/// corner (<see cref="Process.SlowDelayFactor"/>: the latest change is the one that reaches into the passing phase). One
/// finding per gate, at the gate's call: of each phase's latches the one whose data changes the enable latest
/// (<see cref="EnableOrigins"/>), the first in latch order that breaks the condition, else the first primary input.
/// Each net's origins are found once for all the enables that share it: the cost is the enables' fan-in logic.
/// </remarks>
public sealed class ClockGateEnableRule : Rule
{
    private const string FromLatch = "during {0} (from latch '{1}', transparent in {2}, through a {3} path; {4})";
    private const string Unrelated = "at any time (from latch '{0}', transparent in {1}, whose clock has no fixed time relation to '{2}')";
    private const string FromInput = "at any time (from primary input '{0}', taken as changing at any time by phaseward.clock_gate_inputs_may_change)";

    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.ClockGateEnable };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var netlist = context.Netlist;
        LatchModel? model = null;
        Dictionary<int, Time>? borrow = null;
        EnableOrigins? origins = null;
        foreach (var gate in netlist.Clocks)
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            if (gate.Kind != ClockKind.Gated || gate.Enable is not { } enable || gate.Source is not { } source)
                continue;

            model ??= context.LatchModel;
            // The latches' timing for the whole design: computed only once an enable comes from a latch.
            origins ??= new EnableOrigins(netlist, model, latch => (borrow ??= BorrowByLatch(model)).TryGetValue(latch.Index, out var late) ? late : Time.Zero);
            var passes = PassInterval(gate, source);
            foreach (var origin in origins.Of(enable))
            {
                string changes;
                TimeInterval? change = null;
                var opensWhilePassing = false;
                if (origin.Latch is { } latch)
                {
                    var phase = latch.Phase;
                    if (TimeBase.CommonCycle(phase.Clock, source) is not { } cycle)
                    {
                        changes = Format(Unrelated, latch.Name, phase.Name, source.Name);
                    }
                    else
                    {
                        var opens = PhaseWindow.Of(phase).Opens;
                        borrow!.TryGetValue(latch.Index, out var late);
                        var slow = netlist.Process.SlowDelayFactor;
                        var until = opens + late + (model.EntryDelay(latch) + origin.Delay) * slow;
                        change = new TimeInterval(opens, until);
                        if (!Overlaps(change.Value, phase.Clock.Period, passes, source.Period, cycle))
                            continue;
                        // Data already waiting when the latch opens passes within its entry delay: if that falls while the
                        // gate passes the clock, the storage is on the wrong phase (not merely slow to reach the gate).
                        opensWhilePassing = Overlaps(new TimeInterval(opens, opens + model.EntryDelay(latch) * slow), phase.Clock.Period, passes, source.Period, cycle);
                        changes = Format(FromLatch, Interval(change.Value), latch.Name, phase.Name, origin.Delay * slow, CornerText.Of(netlist.Process, Corner.Slow));
                    }
                }
                else
                {
                    if (!context.Policy.EnablesFromInputsMayChange)
                        continue;
                    changes = Format(FromInput, origin.Input!.Name);
                }

                var blocks = gate.StopLevel == ClockStopLevel.Low ? source.Low : source.High;
                var properties = new Dictionary<string, string>
                {
                    [FindingPropertyKeys.GatedClock] = gate.Name,
                    [FindingPropertyKeys.SourceClock] = source.Name,
                    [FindingPropertyKeys.Enable] = enable.Name,
                    [FindingPropertyKeys.BlockingPhase] = blocks.Name,
                    [FindingPropertyKeys.BlockingPolarity] = blocks.Polarity.ToString(),
                    [FindingPropertyKeys.PassStartSeconds] = FindingPropertyValues.Number(passes.Start.Seconds),
                    [FindingPropertyKeys.PassEndSeconds] = FindingPropertyValues.Number(passes.End.Seconds),
                };
                if (origin.Latch is { } storage)
                    properties[FindingPropertyKeys.Storage] = storage.Name;
                properties[FindingPropertyKeys.Origin] = origin.Latch is null ? FindingPropertyValues.EnableFromInput
                    : change is null ? FindingPropertyValues.EnableFromUnrelatedClock : FindingPropertyValues.EnableFromLatch;
                if (change is not null)
                {
                    properties[FindingPropertyKeys.OpensWhilePassing] = opensWhilePassing ? "true" : "false";
                    properties[FindingPropertyKeys.EnableDelaySeconds] = FindingPropertyValues.Number(((model.EntryDelay(origin.Latch!) + origin.Delay) * netlist.Process.SlowDelayFactor).Seconds);
                }
                if (change is { } c)
                {
                    properties[FindingPropertyKeys.ChangeStartSeconds] = FindingPropertyValues.Number(c.Start.Seconds);
                    properties[FindingPropertyKeys.ChangeEndSeconds] = FindingPropertyValues.Number(c.End.Seconds);
                }

                var related = origin.Latch is { } l ? new[] { l.Span } : new[] { origin.InputSpan! };
                yield return new Finding(RuleCatalog.ClockGateEnable, gate.Span,
                    new object[] { gate.Name, source.Name, Interval(passes), gate.StopLevel == ClockStopLevel.Low ? "high" : "low", enable.Name, changes },
                    related, properties);
                break;
            }
        }
    }

    /// <summary>When the gate passes its source clock, on the design's time base (start within the source's period):
    /// the source's high time for a gate that stops low, its low time for one that stops high.</summary>
    internal static TimeInterval PassInterval(Clock gate, Clock source)
    {
        var high = source.Period * source.Duty;
        var start = gate.StopLevel == ClockStopLevel.Low ? source.RisingEdge : source.RisingEdge + high;
        var length = gate.StopLevel == ClockStopLevel.Low ? high : source.Period - high;
        var wrapped = start.Seconds % source.Period.Seconds;
        var opens = new Time(wrapped < 0 ? wrapped + source.Period.Seconds : wrapped);
        return new TimeInterval(opens, opens + length);
    }

    /// <summary>
    /// True when interval <paramref name="a"/>, repeating every <paramref name="periodA"/>, meets <paramref name="b"/>,
    /// repeating every <paramref name="periodB"/>, anywhere in their common <paramref name="cycle"/>. Intervals that
    /// only touch do not meet (edges entered as decimal figures are compared with a small tolerance).
    /// </summary>
    internal static bool Overlaps(TimeInterval a, Time periodA, TimeInterval b, Time periodB, Time cycle)
    {
        if (a.Length >= periodA || b.Length >= periodB)
            return true;
        var tolerance = 1e-9 * cycle.Seconds;
        var repeatsA = System.Math.Max(1, (int)System.Math.Round(cycle.Seconds / periodA.Seconds));
        var repeatsB = System.Math.Max(1, (int)System.Math.Round(cycle.Seconds / periodB.Seconds));
        for (var i = -1; i <= repeatsA; i++)
        {
            var startA = a.Start.Seconds + i * periodA.Seconds;
            var endA = startA + a.Length.Seconds;
            for (var j = -1; j <= repeatsB; j++)
            {
                var startB = b.Start.Seconds + j * periodB.Seconds;
                if (System.Math.Min(endA, startB + b.Length.Seconds) - System.Math.Max(startA, startB) > tolerance)
                    return true;
            }
        }

        return false;
    }

    private static Dictionary<int, Time> BorrowByLatch(LatchModel model)
    {
        var borrow = new Dictionary<int, Time>();
        foreach (var arrival in LatchBorrowing.Compute(TimingFigures.For(model, Corner.Slow)))
        {
            var index = arrival.Path.To.Index;
            if (!borrow.TryGetValue(index, out var seen) || arrival.Borrow > seen)
                borrow[index] = arrival.Borrow;
        }

        return borrow;
    }

    private static string Interval(TimeInterval interval) => $"[{interval.Start}, {interval.End})";

    private static string Format(string format, params object[] arguments) => string.Format(CultureInfo.InvariantCulture, format, arguments);
}
