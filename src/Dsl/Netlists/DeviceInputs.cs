using System;
using System.Collections;
using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>
/// A device's data inputs: one (inverter, buffer, pass gate) or two (NAND, NOR), held in the device itself. A netlist
/// of a million devices then has no array per device for the collector to copy; index it or use foreach, neither
/// allocates.
/// </summary>
public readonly struct DeviceInputs : IReadOnlyList<Net>
{
    private readonly Net first;
    private readonly Net? second;

    internal DeviceInputs(Net first, Net? second = null)
    {
        this.first = first ?? throw new ArgumentNullException(nameof(first), "A device's first input is null.");
        this.second = second;
    }

    /// <summary>How many inputs the device has (1 or 2; 0 only for <c>default(DeviceInputs)</c>, which no device has).</summary>
    public int Count => first is null ? 0 : second is null ? 1 : 2;

    /// <summary>Input <paramref name="index"/> (0 or 1).</summary>
    public Net this[int index] => index switch
    {
        0 when first is not null => first,
        1 when second is not null => second,
        _ => throw new ArgumentOutOfRangeException(nameof(index), index, $"The device has {Count} input(s)."),
    };

    /// <summary>Enumerates the inputs without allocating.</summary>
    public Enumerator GetEnumerator() => new(this);

    IEnumerator<Net> IEnumerable<Net>.GetEnumerator() => GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>Enumerator over a device's inputs.</summary>
    public struct Enumerator : IEnumerator<Net>
    {
        private readonly DeviceInputs inputs;
        private int position;

        internal Enumerator(DeviceInputs inputs)
        {
            this.inputs = inputs;
            position = -1;
        }

        /// <inheritdoc/>
        public Net Current => inputs[position];

        object IEnumerator.Current => Current;

        /// <inheritdoc/>
        public bool MoveNext() => ++position < inputs.Count;

        /// <inheritdoc/>
        public void Reset() => position = -1;

        /// <inheritdoc/>
        public void Dispose()
        {
        }
    }
}
