using System;
using System.Collections.Generic;
using Phaseward;

namespace CSharpStyles;

public sealed record LaneConfig(int Stages, bool SamePhase, string Prefix = "st")
{
    public string NameOf(int i) => $"{Prefix}{i}";
}

public readonly record struct Pin(string Name, int Index);

public struct Counter
{
    public int Value;

    public void Bump() => Value++;
}

public interface IStage
{
    Net Build(Circuit c, Net input, Phase phase, string name);
}

public abstract class StageBase : IStage
{
    protected StageBase(string kind) => Kind = kind;

    protected StageBase()
        : this("plain")
    {
    }

    public string Kind { get; }

    public abstract Net Build(Circuit c, Net input, Phase phase, string name);
}

public sealed class LatchStage : StageBase
{
    public LatchStage()
        : base("latch")
    {
    }

    public override Net Build(Circuit c, Net input, Phase phase, string name) => c.DynamicLatch(input, phase, name + "." + Kind);
}

// expect: PW1001
public sealed class RecordConfiguration : Design
{
    private static readonly LaneConfig Default = new(2, false);

    protected override void Describe(Circuit c)
    {
        var config = Default with { SamePhase = true, Stages = 3 };
        var (stages, samePhase, _) = config;
        var clk = c.Clock("clk", 4.Nanoseconds());
        var x = c.Input("d");
        for (var i = 0; i < stages; i++)
            x = c.DynamicLatch(x, samePhase || i % 2 == 0 ? clk.High : clk.Low, config.NameOf(i));
        var same = config == new LaneConfig(3, true);
        c.Output(same ? "q_" + config.ToString().Length : "other", x);
    }
}

// expect: PW1001
public sealed class InterfacesAndStructs : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        IStage stage = new LatchStage();
        var counter = new Counter();
        var copy = counter;
        counter.Bump();
        counter.Bump();
        copy.Bump();
        var pins = new[] { new Pin("a", 0), new Pin("b", 1) };
        var x = c.Input(pins[0].Name + pins[1].Index);
        for (var i = 0; i < counter.Value + copy.Value; i++)
            x = stage.Build(c, x, clk.Low, "s" + i);
        c.Output("q", x);
    }
}

public static class NetExtensions
{
    public static Net Latched(this Net input, Circuit c, Phase phase, string name, params string[] tags)
        => c.DynamicLatch(input, phase, tags.Length == 0 ? name : name + "_" + string.Join("_", tags));

    public static T Pick<T>(T first, T second, bool useSecond = false) => useSecond ? second : first;
}

[Flags]
public enum Options
{
    None = 0,
    Latch = 1,
    SamePhase = 2,
    Both = Latch | SamePhase,
}

// expect: PW1001
public sealed class ExtensionsGenericsAndEnums : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var options = Options.Both;
        int? limit = null;
        limit ??= checked(1 + 1);
        var phase = NetExtensions.Pick(clk.High, clk.Low, useSecond: (options & Options.SamePhase) == 0);
        var x = c.Input("d");
        for (var i = 0; i < limit.Value; i++)
            x = options.HasFlag(Options.Latch) ? x.Latched(c, phase, "l" + i, "hot", unchecked(i * 2).ToString()) : x;
        var label = default(string);
        c.Output(label?.ToUpper() ?? "Q".ToLowerInvariant(), x);
    }
}

public sealed class Resource : IDisposable
{
    public static int Disposed;

    public void Dispose() => Disposed++;
}

// expect: PW1001
public sealed class ExceptionsCaughtByTheDesign : Design
{
    protected override void Describe(Circuit c)
    {
        var clk = c.Clock("clk", 4.Nanoseconds());
        var x = c.Input("d");
        var stages = 0;
        try
        {
            stages = int.Parse("3");
            throw new InvalidOperationException("retry");
        }
        catch (InvalidOperationException e) when (e.Message == "retry")
        {
            stages += 0;
        }
        finally
        {
            stages += 0;
        }

        try
        {
            var table = new Dictionary<string, int>();
            stages += table["missing"];
        }
        catch (KeyNotFoundException)
        {
        }

        using (var resource = new Resource())
        {
            using var inner = new Resource();
        }

        for (var i = 0; i < stages + Resource.Disposed - 2; i++)
            x = c.DynamicLatch(x, clk.High, "l" + i);
        c.Output("q", x);
    }
}
