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
        text.Append("using Phaseward;\n\n");
        text.Append("/// <summary>Generated benchmark design: ").Append(lanes.ToString(CultureInfo.InvariantCulture))
            .Append(" lanes, ").Append(DevicesOf(lanes).ToString(CultureInfo.InvariantCulture)).Append(" devices (")
            .Append(shape).Append("). Figures invented for the benchmark.</summary>\n");
        text.Append("public sealed class ").Append(className).Append(" : Design\n{\n");
        if (shape == DesignShape.Loop)
            WriteLoop(text, lanes);
        else
            WriteStraightLine(text, lanes);
        text.Append("}\n");
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
