using System.Collections.Generic;
using System.Text;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;
using Phaseward.Sequencing;

namespace Phaseward.Rules.ClockPhases;

/// <summary>
/// PW1005: a feedback loop through restoring stages and data-controlled pass gates with no latch (no clocked pass
/// gate) on it (<see cref="CombinationalLoops"/>). Reported once per loop (a strongly connected component: loops
/// that share nets are one finding) at its first device in netlist order, naming its first devices and its length.
/// </summary>
/// <remarks>
/// Recognised as storage cells and not reported (common practice): a loop with a keeper on it (a weak stage: the
/// cross-coupled pair a writer overpowers); a cross-coupled pair of two inverting stages (two inverters, or a
/// set–reset pair of NANDs or NORs); a loop that enters a node through a data-controlled pass gate while another
/// pass gate on the control's inverse drives the same node (a latch's own feedback, opened whenever it is written).
/// For a loop that is one simple cycle the message also gives its inversions: an odd count oscillates when the
/// loop is enabled, with a period of about twice the loop's delay (the ring-oscillator estimate T = 2·Σ t_p, each
/// t_p = 0.69·R·C: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed.,
/// ch. 5, from memory); an even count settles at a level nothing writes.
/// </remarks>
public sealed class LoopWithoutStorageRule : Rule
{
    private const string OddLoop = "{0} inversions (odd): enabled, it oscillates with a period of about {1} (twice the loop's delay {2})";
    private const string EvenLoop = "{0} inversions (even): it settles at a level nothing writes";
    private const string TangledLoops = "loops that share nets, whose behaviour depends on their other inputs";

    /// <summary>How many of a loop's devices the message names.</summary>
    public const int NamedDevices = 4;

    public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { RuleCatalog.LoopWithoutStorage };

    public override IEnumerable<Finding> Check(RuleContext context)
    {
        var netlist = context.Netlist;
        foreach (var loop in CombinationalLoops.Of(netlist, context.CancellationToken))
        {
            if (StorageCell(netlist, loop) is not null)
                continue;

            var first = loop[0];
            var names = new StringBuilder();
            for (var i = 0; i < loop.Count && i < NamedDevices; i++)
                names.Append(i == 0 ? "'" : ", '").Append(loop[i].Name).Append('\'');
            if (loop.Count > NamedDevices)
                names.Append(", ...");

            var properties = new Dictionary<string, string>
            {
                [FindingPropertyKeys.LoopDevices] = loop.Count.ToString(System.Globalization.CultureInfo.InvariantCulture),
                [FindingPropertyKeys.FirstDevice] = first.Name,
            };
            string behaviour;
            if (IsSimpleCycle(loop))
            {
                var inversions = 0;
                var delay = Time.Zero;
                foreach (var device in loop)
                {
                    if (device.Kind.IsInverting()) inversions++;
                    delay += FirstOrderDelay.Of(netlist, device);
                }

                properties[FindingPropertyKeys.Inversions] = inversions.ToString(System.Globalization.CultureInfo.InvariantCulture);
                properties[FindingPropertyKeys.LoopDelaySeconds] = FindingPropertyValues.Number(delay.Seconds);
                if (inversions % 2 == 1)
                {
                    properties[FindingPropertyKeys.OscillationPeriodSeconds] = FindingPropertyValues.Number((delay * 2).Seconds);
                    behaviour = string.Format(System.Globalization.CultureInfo.InvariantCulture, OddLoop, inversions, delay * 2, delay);
                }
                else
                {
                    behaviour = string.Format(System.Globalization.CultureInfo.InvariantCulture, EvenLoop, inversions);
                }
            }
            else
            {
                behaviour = TangledLoops;
            }

            var related = new List<SourceSpan>(NamedDevices);
            for (var i = 1; i < loop.Count && related.Count < NamedDevices - 1; i++)
                if (!loop[i].Span.Equals(first.Span) && !related.Contains(loop[i].Span))
                    related.Add(loop[i].Span);

            yield return new Finding(RuleCatalog.LoopWithoutStorage, first.Span,
                new object[] { loop.Count, names.ToString(), behaviour }, related, properties);
        }
    }

    /// <summary>What makes the loop a storage cell ("keeper", "cross-coupled pair", "latch feedback"), or null.</summary>
    internal static string? StorageCell(Netlist netlist, IReadOnlyList<Device> loop)
    {
        foreach (var device in loop)
            if (device.IsWeak)
                return "keeper";
        if (loop.Count == 2 && loop[0].Kind.IsInverting() && loop[1].Kind.IsInverting()
            && !ReferenceEquals(loop[0].Output, loop[1].Output) && Feeds(loop[0], loop[1]) && Feeds(loop[1], loop[0]))
            return "cross-coupled pair";
        foreach (var device in loop)
            if (device.DataControl is { } control && HasArmOnInverse(netlist, device, control))
                return "latch feedback";
        return null;
    }

    private static bool Feeds(Device from, Device to)
    {
        foreach (var input in to.Inputs)
            if (ReferenceEquals(input, from.Output))
                return true;
        return false;
    }

    // Another pass gate drives the same node on the inverse of this gate's control: the node is written through it
    // whenever this (feedback) gate is off.
    private static bool HasArmOnInverse(Netlist netlist, Device gate, Net control)
    {
        foreach (var other in netlist.DriverList(gate.Output))
        {
            if (ReferenceEquals(other, gate) || other.DataControl is not { } otherControl)
                continue;
            if (netlist.AreComplementary(otherControl, control))
                return true;
        }

        return false;
    }

    // One cycle: every device has exactly one input in the loop and each loop net is driven by exactly one of them.
    // The devices are a cycle when there are as many of them as distinct outputs and each has one in-loop input.
    private static bool IsSimpleCycle(IReadOnlyList<Device> loop)
    {
        var outputs = new HashSet<Net>();
        foreach (var device in loop)
            if (!outputs.Add(device.Output))
                return false;
        foreach (var device in loop)
        {
            var inLoop = 0;
            foreach (var input in device.Inputs)
                if (outputs.Contains(input)) inLoop++;
            if (device.DataControl is { } control && outputs.Contains(control)) inLoop++;
            if (inLoop != 1) return false;
        }

        return true;
    }
}
