using System.Collections.Generic;

namespace Phaseward.Sequencing;

/// <summary>A binary min-heap of nets keyed by a delay (duplicates allowed; the reader skips stale entries).</summary>
internal sealed class NetMinHeap
{
    private readonly List<(Net Net, double Key)> items = new();

    public void Push(Net net, double key)
    {
        items.Add((net, key));
        var i = items.Count - 1;
        while (i > 0)
        {
            var parent = (i - 1) / 2;
            if (items[parent].Key <= key) break;
            items[i] = items[parent];
            i = parent;
        }

        items[i] = (net, key);
    }

    public bool TryPop(out Net net, out double key)
    {
        if (items.Count == 0)
        {
            net = null!;
            key = 0;
            return false;
        }

        (net, key) = items[0];
        var last = items[items.Count - 1];
        items.RemoveAt(items.Count - 1);
        if (items.Count > 0)
        {
            var i = 0;
            while (true)
            {
                var child = 2 * i + 1;
                if (child >= items.Count) break;
                if (child + 1 < items.Count && items[child + 1].Key < items[child].Key) child++;
                if (items[child].Key >= last.Key) break;
                items[i] = items[child];
                i = child;
            }

            items[i] = last;
        }

        return true;
    }
}
