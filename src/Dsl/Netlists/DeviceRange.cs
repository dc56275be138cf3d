using System;
using System.Collections.Generic;

namespace Phaseward.Netlists;

/// <summary>
/// The devices of one net in one of the netlist's flat indexes (a slice of a shared array): iterated with foreach or
/// by position without allocating.
/// </summary>
internal readonly struct DeviceRange
{
    private readonly Device[] items;
    private readonly int start;

    public DeviceRange(Device[] items, int start, int length)
    {
        this.items = items;
        this.start = start;
        Length = length;
    }

    public int Length { get; }

    public Device this[int index]
        => (uint)index < (uint)Length ? items[start + index] : throw new ArgumentOutOfRangeException(nameof(index), index, $"The range holds {Length} devices.");

    public Enumerator GetEnumerator() => new(items, start, start + Length);

    /// <summary>The same devices as a read-only list for the public API (a view, not a copy).</summary>
    public IReadOnlyList<Device> AsReadOnlyList() => Length == 0 ? Array.Empty<Device>() : new ArraySegment<Device>(items, start, Length);

    public struct Enumerator
    {
        private readonly Device[] items;
        private readonly int end;
        private int position;

        internal Enumerator(Device[] items, int start, int end)
        {
            this.items = items;
            this.end = end;
            position = start - 1;
        }

        public Device Current => items[position];

        public bool MoveNext() => ++position < end;
    }
}
