using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using Phaseward;

namespace CSharpStyles;

// expect: PW1001
public sealed class LinqInputs : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var inputs = Enumerable.Range(0, 4).Select(i => c.Input($"d{i}")).ToArray();
        var latched = inputs.Where((n, i) => i % 2 == 0).Select(n => c.DynamicLatch(n, clk.High)).ToList();
        var chained = latched.Aggregate((a, b) => c.Nand(a, b));
        var second = c.DynamicLatch(chained, clk.High, "second");
        var names = inputs.Select(n => n.Name).OrderByDescending(n => n).ThenBy(n => n.Length).Skip(1).Take(2).Concat(new[] { "z" }).Reverse();
        c.Output(string.Join("_", names), second);
        var groups = inputs.GroupBy(n => n.Name.Length).ToDictionary(g => g.Key, g => g.Count());
        var sum = inputs.Select(n => n.Id).Sum() + inputs.Max(n => n.Id) + inputs.Min(n => n.Id) + groups[2];
        var chunks = inputs.Chunk(2).Select(chunk => chunk.Length).Distinct().Single();
        var zipped = inputs.Zip(latched, (a, b) => a.Name + b.Name).First();
        var repeated = Enumerable.Repeat("r", 2).SelectMany(s => new[] { s, s }).Count();
        var any = inputs.Any(n => n.Name == "d3") && inputs.All(n => n.Name.StartsWith("d")) && inputs.ToHashSet().Count == 4;
        c.Output("tally" + sum + chunks + zipped + repeated + any + inputs.Last().Name + inputs.FirstOrDefault(n => n.Name == "x")?.Name, c.Inverter(second));
    }
}

// expect: PW2001
public sealed class LambdasAndClosures : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var made = 0;
        Func<Net, string, Net> pass = (n, name) =>
        {
            made++;
            return c.TransmissionGate(n, clk.High, name);
        };
        Func<int, string> nameOf = Label;
        var x = c.Input("d");
        for (var i = 0; i < 5; i++)
            x = pass(x, nameOf(i));
        Action<Net> output = n => c.Output("q" + made, n);
        output(c.Inverter(x));

        static string Label(int i) => "p" + i;
    }
}

// expect: PW2001
public sealed class CollectionsOfNets : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var nets = new Dictionary<string, Net> { ["in"] = c.Input("d") };
        var queue = new Queue<string>(new[] { "g1", "g2", "g3", "g4", "g5", "g1" });
        var stack = new Stack<Net>();
        var seen = new HashSet<string>();
        var current = nets["in"];
        while (queue.Count > 0)
        {
            var name = queue.Dequeue();
            if (!seen.Add(name)) continue;
            current = c.TransmissionGate(current, clk.Low, name);
            nets[name] = current;
            stack.Push(current);
        }

        foreach (var (key, value) in nets)
            if (key == "g5" && nets.TryGetValue(key, out var last) && last == value)
                c.Output("q", c.Inverter(stack.Pop()));
        var list = new List<Net>(nets.Values);
        list.Sort((a, b) => string.CompareOrdinal(b.Name, a.Name));
        c.Output("first" + list.Count + list[0].Name + list.IndexOf(nets["in"]), list[^1]);
    }
}

// expect: PW1001
public sealed class StringsAndBuilders : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var builder = new StringBuilder();
        builder.Append("lane").Append('_', 2).Append(3);
        var prefix = builder.ToString().Replace("__", "-").ToUpper().Substring(0, 6).PadRight(8, 'x').Trim('x');
        var parts = "a,b,c".Split(',');
        var spec = string.Concat(parts) + string.Format("{0:D2}", 7) + new string('x', 2) + $"{3.5.ToString("F1", System.Globalization.CultureInfo.InvariantCulture),6}|{parts.Length,-3}|";
        var x = c.Input(prefix.ToLowerInvariant());
        for (var i = 0; i < Convert.ToInt32("2") + (int)Math.Round(Math.Sqrt(1.0)); i++)
            x = c.DynamicLatch(x, clk.Low, $"{prefix}.{i:D2}");
        c.Output(spec.Replace(" ", "_").Replace(".", "p").Replace("|", "I"), x);
        c.Output("bits" + System.Numerics.BitOperations.PopCount(7u) + int.Parse("12") + double.Parse("1.5", System.Globalization.CultureInfo.InvariantCulture).ToString(System.Globalization.CultureInfo.InvariantCulture), c.Inverter(x));
    }
}

// expect: PW1001
public sealed class PatternsAndSwitches : Design
{
    private static Phase Choose(object key, Clock clk) => key switch
    {
        int n and > 2 => clk.Low,
        int => clk.High,
        string { Length: > 3 } text when text.StartsWith("l") => clk.Low,
        LaneConfig { SamePhase: true, Stages: var s } when s > 0 => clk.High,
        LaneConfig(_, false, _) => clk.Low,
        (int a, int b) when a == b => clk.High,
        int[] and [1, .., var last] when last == 3 => clk.High,
        null => clk.Low,
        _ => clk.Low,
    };

    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var x = c.Input("d");
        object[] keys = { 1, new LaneConfig(1, true), (2, 2), new[] { 1, 2, 3 } };
        var i = 0;
        foreach (var key in keys)
            x = c.DynamicLatch(x, Choose(key, clk), "k" + i++);
        if (keys[1] is LaneConfig { Prefix: "st" } config && config is not null)
            c.Output(config.Prefix, x);
    }
}

public static class Sequences
{
    public static IEnumerable<string> Names(string prefix, int count)
    {
        for (var i = 0; i < count; i++)
        {
            if (i == 10) yield break;
            yield return prefix + i;
        }
    }
}

// expect: PW2001
public sealed class IteratorsAndTuples : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var (first, rest) = (c.Input("d"), Sequences.Names("g", 5).ToList());
        var x = first;
        foreach (var name in rest)
            x = c.TransmissionGate(x, clk.High, name);
        (int Count, string Label) summary = (rest.Count, "q");
        c.Output(summary.Label + summary.Count, c.Inverter(x));
    }
}
