using System;
using System.Collections.Generic;

namespace Phaseward;

// What the designer knows about the circuit's signals and states in the design, for the rules to rely on.
public sealed partial class Circuit
{
    private readonly List<Net[]> exclusiveGroups = new();

    /// <summary>
    /// States that at most one of <paramref name="controls"/> is high at any time (the one-hot selects of a decoder,
    /// the arms of a mux). The rules then take pass gates controlled by two of these nets as never conducting
    /// together: the delay model counts their branches as off, the fighting-driver and charge-sharing checks do not
    /// pair them. A net and its inverse (an inverter's input and output) are exclusive without being stated.
    /// </summary>
    /// <remarks>Phaseward takes the statement as given; it does not prove it. Stating it more than once, or in
    /// overlapping groups, is allowed: each statement adds its pairs.</remarks>
    /// <exception cref="ArgumentNullException"><paramref name="controls"/> or one of its nets is null.</exception>
    /// <exception cref="ArgumentException">fewer than two nets, a net given twice, or a net of another circuit.</exception>
    public void Exclusive(params Net[] controls)
    {
        if (controls is null)
            throw new ArgumentNullException(nameof(controls), $"'{nameof(controls)}' must not be null.");
        if (controls.Length < 2)
            throw new ArgumentException(
                $"'{nameof(controls)}' must name at least two nets (was {controls.Length}{(controls.Length == 1 && controls[0] is { } only ? ": '" + only.Name + "'" : "")}); a single net is exclusive with nothing.",
                nameof(controls));
        var firstIndexOf = new Dictionary<Net, int>(controls.Length); // a one-hot group may hold thousands of nets
        for (var i = 0; i < controls.Length; i++)
        {
            var net = controls[i];
            if (net is null)
                throw new ArgumentNullException(nameof(controls), $"'{nameof(controls)}' must not contain null (element {i} was null).");
            if (!ReferenceEquals(net.Owner, this))
                throw new ArgumentException(
                    $"'{nameof(controls)}' element {i} is net '{net.Name}' of another circuit ('{net.Owner.DesignName}'); nets cannot be shared between circuits.",
                    nameof(controls));
            if (firstIndexOf.TryGetValue(net, out var j))
                throw new ArgumentException(
                    $"'{nameof(controls)}' names net '{net.Name}' twice (elements {j} and {i}); each net may appear once.", nameof(controls));
            firstIndexOf.Add(net, i);
        }

        exclusiveGroups.Add((Net[])controls.Clone());
    }
}
