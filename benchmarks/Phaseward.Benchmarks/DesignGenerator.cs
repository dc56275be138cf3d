using System;
using System.Globalization;
using System.Text;

namespace Phaseward.Benchmarks;

/// <summary>How a generated design is written.</summary>
public enum DesignShape
{
    /// <summary>One DSL call per device, in helper methods of <see cref="DesignGenerator.LanesPerBlock"/> lanes each.</summary>
    StraightLine,

    /// <summary>A loop over a lane helper: a few lines of source, any number of devices.</summary>
    Loop,

    /// <summary>
    /// Everyday C#: a lane written as a <c>Block</c> class placed once per lane (hierarchical names), its wiring in a
    /// record copied with <c>with</c>, the lanes chained by LINQ's <c>Aggregate</c> over a lambda that closes over locals.
    /// </summary>
    Blocks,
}

/// <summary>
/// Writes Phaseward designs of a chosen size for the benchmark (and the robustness tests). A design is a chain of
/// identical lanes; each lane mixes a static latch on the low phase, a two-input pass-gate tree on data-controlled
/// transmission gates, a pass gate on an enable, a restoring buffer, a dynamic latch on the high phase of a gated clock
/// (one gated clock per block of lanes, with a bounded idle time; it stops low, so its high phase is closed while stopped) and a NAND closing the lane:
/// <see cref="DevicesPerLane"/> primitives. The figures are invented for the benchmark.
/// </summary>
public static class DesignGenerator
{
    /// <summary>Primitives per lane: static latch 4, two inverters, three transmission gates, buffer, dynamic latch 2, NAND.</summary>
    public const int DevicesPerLane = 13;

    /// <summary>Primitives made once per design before the lanes (the select inverter).</summary>
    public const int FixedDevices = 1;

    /// <summary>Lanes per helper method in the straight-line shape, and per gated clock in both shapes.</summary>
    public const int LanesPerBlock = 64;

    /// <summary>The number of lanes that gives at least <paramref name="devices"/> primitives.</summary>
    public static int LanesFor(int devices)
    {
        if (devices < DevicesPerLane + FixedDevices)
            throw new ArgumentOutOfRangeException(nameof(devices), devices, $"A design needs at least {DevicesPerLane + FixedDevices} devices (one lane).");
        return (devices - FixedDevices + DevicesPerLane - 1) / DevicesPerLane;
    }

    /// <summary>The number of primitives a design of <paramref name="lanes"/> lanes elaborates to.</summary>
    public static int DevicesOf(int lanes) => FixedDevices + lanes * DevicesPerLane;

    /// <summary>C# source of one design class named <paramref name="className"/> with about <paramref name="devices"/> primitives.</summary>
    public static string Generate(DesignShape shape, int devices, string className = "Generated")
    {
        var lanes = LanesFor(devices);
        var text = new StringBuilder(shape == DesignShape.Loop ? 2048 : 128 + lanes * 700);
        if (shape == DesignShape.Blocks)
            text.Append("using System;\nusing System.Linq;\n");
        text.Append("using Phaseward;\n\n");
        text.Append("/// <summary>Generated benchmark design: ").Append(lanes.ToString(CultureInfo.InvariantCulture))
            .Append(" lanes, ").Append(DevicesOf(lanes).ToString(CultureInfo.InvariantCulture)).Append(" devices (")
            .Append(shape).Append("). Figures invented for the benchmark.</summary>\n");
        text.Append("public sealed class ").Append(className).Append(" : Design\n{\n");
        switch (shape)
        {
            case DesignShape.Loop:
                WriteLoop(text, lanes);
                break;
            case DesignShape.Blocks:
                WriteBlocks(text, lanes);
                break;
            default:
                WriteStraightLine(text, lanes);
                break;
        }

        text.Append("}\n");
        if (shape == DesignShape.Blocks)
            WriteLaneBlock(text);
        return text.ToString();
    }

    private static void WritePreamble(StringBuilder text)
    {
        text.Append("        var clk = c.Clock(\"clk\", 4.Nanoseconds());\n");
        text.Append("        var sel = c.Input(\"sel\");\n");
        text.Append("        var selb = c.Inverter(sel, \"sel_b\");\n");
        text.Append("        var en = c.Input(\"en\");\n");
        text.Append("        var n = c.Input(\"d\");\n");
    }

    private static void WriteLoop(StringBuilder text, int lanes)
    {
        text.Append("    private const int Lanes = ").Append(lanes.ToString(CultureInfo.InvariantCulture)).Append(";\n\n");
        text.Append("    protected override void Describe(Circuit c)\n    {\n");
        WritePreamble(text);
        text.Append("        var gated = c.ClockGate(clk, en, maxIdle: 1.Nanoseconds());\n");
        text.Append("        for (var i = 0; i < Lanes; i++)\n        {\n");
        text.Append("            if (i > 0 && i % ").Append(LanesPerBlock.ToString(CultureInfo.InvariantCulture))
            .Append(" == 0)\n                gated = c.ClockGate(clk, en, maxIdle: 1.Nanoseconds());\n");
        text.Append("            n = Lane(c, clk, gated, sel, selb, en, n);\n        }\n\n");
        text.Append("        c.Output(\"q\", n);\n    }\n\n");
        text.Append("    private static Net Lane(Circuit c, Clock clk, Clock gated, Net sel, Net selb, Net en, Net d)\n    {\n");
        WriteLaneBody(text, "        ", "", "d", "return ");
        text.Append("    }\n");
    }

    private static void WriteBlocks(StringBuilder text, int lanes)
    {
        text.Append("    private const int Lanes = ").Append(lanes.ToString(CultureInfo.InvariantCulture)).Append(";\n\n");
        text.Append("    protected override void Describe(Circuit c)\n    {\n");
        text.Append("        var clk = c.Clock(\"clk\", 4.Nanoseconds());\n");
        text.Append("        var sel = c.Input(\"sel\");\n");
        text.Append("        var wiring = new LaneWiring(clk, sel, c.Inverter(sel, \"sel_b\"), c.Input(\"en\"));\n");
        text.Append("        Func<int, Net, Net> place = (i, d) =>\n        {\n");
        text.Append("            if (i % ").Append(LanesPerBlock.ToString(CultureInfo.InvariantCulture))
            .Append(" == 0)\n                wiring = wiring with { Gated = c.ClockGate(clk, wiring.Enable, maxIdle: 1.Nanoseconds()) };\n");
        text.Append("            return c.Place(new Lane(wiring, d), $\"lane{i}\").Output;\n        };\n\n");
        text.Append("        var q = Enumerable.Range(0, Lanes).Aggregate(c.Input(\"d\"), (d, i) => place(i, d));\n");
        text.Append("        c.Output(\"q\", q);\n    }\n");
    }

    /// <summary>The lane as a block class and its wiring as a record (the <see cref="DesignShape.Blocks"/> shape).</summary>
    private static void WriteLaneBlock(StringBuilder text)
    {
        text.Append("\npublic sealed record LaneWiring(Clock Clock, Net Select, Net SelectBar, Net Enable, Clock? Gated = null);\n\n");
        text.Append("public sealed class Lane : Block\n{\n");
        text.Append("    private readonly LaneWiring wiring;\n    private readonly Net input;\n\n");
        text.Append("    public Lane(LaneWiring wiring, Net input)\n    {\n        this.wiring = wiring;\n        this.input = input;\n    }\n\n");
        text.Append("    public Net Output { get; private set; } = null!;\n\n");
        text.Append("    protected override void Describe(Circuit c)\n    {\n");
        text.Append("        var (clk, sel, selb, en) = (wiring.Clock, wiring.Select, wiring.SelectBar, wiring.Enable);\n");
        text.Append("        var gated = wiring.Gated!;\n");
        WriteLaneBody(text, "        ", "", "input", "Output = ");
        text.Append("    }\n}\n");
    }

    private static void WriteStraightLine(StringBuilder text, int lanes)
    {
        var blocks = (lanes + LanesPerBlock - 1) / LanesPerBlock;
        text.Append("    protected override void Describe(Circuit c)\n    {\n");
        WritePreamble(text);
        for (var b = 0; b < blocks; b++)
            text.Append("        n = Block").Append(b.ToString(CultureInfo.InvariantCulture)).Append("(c, clk, sel, selb, en, n);\n");
        text.Append("        c.Output(\"q\", n);\n    }\n");
        for (var b = 0; b < blocks; b++)
        {
            text.Append("\n    private static Net Block").Append(b.ToString(CultureInfo.InvariantCulture))
                .Append("(Circuit c, Clock clk, Net sel, Net selb, Net en, Net n0)\n    {\n");
            text.Append("        var gated = c.ClockGate(clk, en, maxIdle: 1.Nanoseconds());\n");
            var inBlock = Math.Min(LanesPerBlock, lanes - b * LanesPerBlock);
            for (var l = 0; l < inBlock; l++)
            {
                var suffix = l.ToString(CultureInfo.InvariantCulture);
                var input = "n" + suffix;
                var output = "var n" + (l + 1).ToString(CultureInfo.InvariantCulture) + " = ";
                WriteLaneBody(text, "        ", "_" + suffix, input, output);
            }

            text.Append("        return n").Append(inBlock.ToString(CultureInfo.InvariantCulture)).Append(";\n    }\n");
        }
    }

    /// <summary>One lane: 13 primitives, one DSL call per device (the static and dynamic latches are one call each).</summary>
    private static void WriteLaneBody(StringBuilder text, string indent, string suffix, string input, string result)
    {
        text.Append(indent).Append("var a").Append(suffix).Append(" = c.StaticLatch(").Append(input).Append(", clk.Low);\n");
        text.Append(indent).Append("var s").Append(suffix).Append(" = c.Inverter(a").Append(suffix).Append(");\n");
        text.Append(indent).Append("var sb").Append(suffix).Append(" = c.Inverter(s").Append(suffix).Append(");\n");
        text.Append(indent).Append("var m").Append(suffix).Append(" = c.Node();\n");
        text.Append(indent).Append("c.TransmissionGate(a").Append(suffix).Append(", sel, m").Append(suffix).Append(");\n");
        text.Append(indent).Append("c.TransmissionGate(sb").Append(suffix).Append(", selb, m").Append(suffix).Append(");\n");
        text.Append(indent).Append("var r").Append(suffix).Append(" = c.TransmissionGate(m").Append(suffix).Append(", en);\n");
        text.Append(indent).Append("var q").Append(suffix).Append(" = c.Buffer(r").Append(suffix).Append(");\n");
        text.Append(indent).Append("var k").Append(suffix).Append(" = c.DynamicLatch(q").Append(suffix).Append(", gated.High);\n");
        text.Append(indent).Append(result).Append("c.Nand(k").Append(suffix).Append(", en);\n");
    }
}
