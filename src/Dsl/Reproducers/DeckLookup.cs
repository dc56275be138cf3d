using System.Collections.Generic;
using System.Runtime.CompilerServices;
using Phaseward.Electrical;
using Phaseward.Netlists;
using Phaseward.Rules.Timing;
using Phaseward.Sequencing;

namespace Phaseward.Reproducers;

/// <summary>
/// What the decks look up by the names a finding carries: nets, clocks, latches, latch paths, the borrowing solution
/// and the register paths, each indexed once per netlist on first use. A report with thousands of findings then costs
/// one lookup per finding, not a scan of the design (or a whole-design timing solution) per finding.
/// </summary>
/// <remarks>Where a name is not unique the index keeps what the scans it replaced found: the first net of a name, the
/// last clock, latch, loop, arrival and register path.</remarks>
internal sealed class DeckLookup
{
    private static readonly ConditionalWeakTable<Netlist, DeckLookup> Cache = new();

    private readonly Netlist netlist;
    private readonly object gate = new();
    private Dictionary<string, Net>? nets;
    private Dictionary<string, Clock>? clocks;
    private Dictionary<string, Latch>? latches;
    private Dictionary<(string From, string To), List<LatchPath>>? paths;
    private BorrowingSolution? borrowing;
    private Dictionary<(string From, string To), LatchArrival>? arrivals;
    private Dictionary<(string From, string To), LatchLoop>? loops;
    private Dictionary<(string Launch, string Capture), RegisterPathResult>? registerPaths;

    private DeckLookup(Netlist netlist) => this.netlist = netlist;

    public static DeckLookup Of(Netlist netlist) => Cache.GetValue(netlist, n => new DeckLookup(n));

    public Net? Net(string name) => Find(Index(ref nets, () =>
    {
        var index = new Dictionary<string, Net>(netlist.Nets.Count, System.StringComparer.Ordinal);
        foreach (var net in netlist.Nets)
            if (!index.ContainsKey(net.Name))
                index.Add(net.Name, net);
        return index;
    }), name);

    public Clock? Clock(string name) => Find(Index(ref clocks, () =>
    {
        var index = new Dictionary<string, Clock>(System.StringComparer.Ordinal);
        foreach (var clock in netlist.Clocks)
            index[clock.Name] = clock;
        return index;
    }), name);

    public Latch? Latch(string name) => Find(Index(ref latches, () =>
    {
        var index = new Dictionary<string, Latch>(System.StringComparer.Ordinal);
        foreach (var latch in LatchModel.Of(netlist).Latches)
            index[latch.Name] = latch;
        return index;
    }), name);

    /// <summary>The latch paths from the latch named <paramref name="from"/> to the one named <paramref name="to"/>, in
    /// the model's order (empty when there are none).</summary>
    public IReadOnlyList<LatchPath> Paths(string from, string to) => Find(Index(ref paths, () =>
    {
        var index = new Dictionary<(string, string), List<LatchPath>>();
        foreach (var path in LatchModel.Of(netlist).Paths)
        {
            var key = (path.From.Name, path.To.Name);
            if (!index.TryGetValue(key, out var list))
                index.Add(key, list = new List<LatchPath>(1));
            list.Add(path);
        }

        return index;
    }), (from, to)) ?? (IReadOnlyList<LatchPath>)System.Array.Empty<LatchPath>();

    /// <summary>The borrowing arrival over the path from <paramref name="from"/> to <paramref name="to"/> (slow corner).</summary>
    public LatchArrival? Arrival(string from, string to) => Find(Index(ref arrivals, () =>
    {
        var index = new Dictionary<(string, string), LatchArrival>();
        foreach (var arrival in Borrowing().Arrivals)
            index[(arrival.Path.From.Name, arrival.Path.To.Name)] = arrival;
        return index;
    }), (from, to));

    /// <summary>The latch loop that gains time, keyed by its first path's latches (slow corner).</summary>
    public LatchLoop? DivergentLoop(string from, string to) => Find(Index(ref loops, () =>
    {
        var index = new Dictionary<(string, string), LatchLoop>();
        foreach (var loop in Borrowing().DivergentLoops)
            index[(loop.Paths[0].From.Name, loop.Paths[0].To.Name)] = loop;
        return index;
    }), (from, to));

    public RegisterPathResult? RegisterPath(string launch, string capture) => Find(Index(ref registerPaths, () =>
    {
        var index = new Dictionary<(string, string), RegisterPathResult>();
        foreach (var result in RegisterPathChecks.For(netlist))
            index[(result.Launch.Name, result.Capture.Name)] = result;
        return index;
    }), (launch, capture));

    private BorrowingSolution Borrowing()
    {
        lock (gate)
            return borrowing ??= LatchBorrowing.Solve(TimingFigures.For(netlist, Corner.Slow));
    }

    private Dictionary<TKey, TValue> Index<TKey, TValue>(ref Dictionary<TKey, TValue>? field, System.Func<Dictionary<TKey, TValue>> build)
        where TKey : notnull
    {
        lock (gate)
            return field ??= build();
    }

    private static TValue? Find<TKey, TValue>(Dictionary<TKey, TValue> index, TKey key)
        where TKey : notnull
        where TValue : class
        => index.TryGetValue(key, out var value) ? value : null;
}
