using System.Linq;
using Phaseward.Netlists;
using Phaseward.Tests.Support;

namespace Phaseward.Tests.SourceSpans;

// At run time every device, clock and port records the file and line of the DSL call that made it.
// Each expected line is captured by Here.Line() written on the same line as the call.
public class RunTimeSourceSpanTests
{
    private static void AssertAt(SourceSpan span, int line)
    {
        Assert.Equal(Here.File(), span.Path);
        Assert.EndsWith("RunTimeSourceSpanTests.cs", span.Path.Replace('\\', '/'), System.StringComparison.Ordinal);
        Assert.Equal(line, span.Line);
        Assert.Equal(0, span.Column);
        Assert.True(span.IsKnown);
    }

    [Fact]
    public void Clocks_record_their_call()
    {
        var c = new Circuit("spans");
        var clk = c.Clock("clk", 1.Nanoseconds()); var clockLine = Here.Line();
        var en = c.Input("en");
        var gated = c.ClockGate(clk, en); var gateLine = Here.Line();
        var buffered = c.BufferedClock(clk); var bufferLine = Here.Line();

        AssertAt(clk.Span, clockLine);
        AssertAt(gated.Span, gateLine);
        AssertAt(buffered.Span, bufferLine);
    }

    [Fact]
    public void Ports_record_their_call()
    {
        var c = new Circuit("spans");
        var a = c.Input("a"); var inputLine = Here.Line();
        c.Output("y", a); var outputLine = Here.Line();

        var netlist = c.ToNetlist();
        AssertAt(Assert.Single(netlist.Inputs).Span, inputLine);
        AssertAt(Assert.Single(netlist.Outputs).Span, outputLine);
    }

    [Fact]
    public void Primitives_record_their_call_in_both_forms()
    {
        var c = new Circuit("spans");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var a = c.Input("a");
        var b = c.Input("b");
        var n = c.Node("n");
        var expected = new System.Collections.Generic.List<int>();

        c.Inverter(a); expected.Add(Here.Line());
        c.Inverter(a, n); expected.Add(Here.Line());
        c.Buffer(a); expected.Add(Here.Line());
        c.Buffer(a, c.Node()); expected.Add(Here.Line());
        c.Nand(a, b); expected.Add(Here.Line());
        c.Nand(a, b, c.Node()); expected.Add(Here.Line());
        c.Nor(a, b); expected.Add(Here.Line());
        c.Nor(a, b, c.Node()); expected.Add(Here.Line());
        c.TransmissionGate(a, clk.High); expected.Add(Here.Line());
        c.TransmissionGate(a, clk.High, n); expected.Add(Here.Line());
        c.TransmissionGate(a, b); expected.Add(Here.Line());
        c.TransmissionGate(a, b, n); expected.Add(Here.Line());

        var devices = c.ToNetlist().Devices;
        Assert.Equal(expected.Count, devices.Count);
        for (var i = 0; i < devices.Count; i++)
            AssertAt(devices[i].Span, expected[i]);
        Assert.Equal(expected.Distinct().Count(), expected.Count);
    }

    [Fact]
    public void Every_device_of_a_cell_carries_the_cell_call()
    {
        var c = new Circuit("spans");
        var clk = c.Clock("clk", 1.Nanoseconds());
        var d = c.Input("d");

        c.DynamicLatch(d, clk.High, "dl"); var dynamicLatchLine = Here.Line();
        c.StaticLatch(d, clk.High, "sl"); var staticLatchLine = Here.Line();
        c.DynamicRegister(d, clk, "dr"); var dynamicRegisterLine = Here.Line();
        c.StaticRegister(d, clk, "sr"); var staticRegisterLine = Here.Line();
        c.Keeper(d, "k"); var keeperLine = Here.Line();

        var netlist = c.ToNetlist();
        var expected = new (string Cell, int Line, int Devices)[]
        {
            ("dl", dynamicLatchLine, 2), ("sl", staticLatchLine, 4), ("dr", dynamicRegisterLine, 4), ("sr", staticRegisterLine, 8), ("k", keeperLine, 2),
        };
        foreach (var (cell, line, count) in expected)
        {
            var macro = netlist.Macro(cell);
            AssertAt(macro.Span, line);
            Assert.Equal(count, macro.Devices.Count);
            Assert.All(macro.Devices, device => AssertAt(device.Span, line));
            Assert.All(macro.Parts, part => AssertAt(part.Span, line));
        }
    }

    [Fact]
    public void The_text_form_shows_file_name_and_line()
    {
        var c = new Circuit("spans");
        c.Inverter(c.Input("a")); var line = Here.Line();

        var text = NetlistText.Write(c.ToNetlist(), includeSpans: true);

        Assert.Contains("@RunTimeSourceSpanTests.cs:" + line, text, System.StringComparison.Ordinal);
        Assert.DoesNotContain("@", NetlistText.Write(c.ToNetlist(), includeSpans: false), System.StringComparison.Ordinal);
    }

    [Fact]
    public void A_source_site_provider_replaces_the_caller_information()
    {
        var c = new Circuit("spans");
        var site = new SourceSpan("Elaborated.cs", 42, column: 9, start: 1200, length: 17);
        c.SourceSiteProvider = () => site;

        var clk = c.Clock("clk", 1.Nanoseconds());
        var gated = c.ClockGate(clk, c.Input("en"));
        var buffered = c.BufferedClock(clk);
        var a = c.Input("a");
        c.Output("y", c.Inverter(a));
        c.TransmissionGate(a, clk.High);
        c.StaticRegister(a, clk, "r");
        c.Keeper(a);

        var netlist = c.ToNetlist();
        Assert.All(new[] { clk.Span, gated.Span, buffered.Span }, span => Assert.Same(site, span));
        Assert.All(netlist.Inputs, port => Assert.Same(site, port.Span));
        Assert.All(netlist.Outputs, port => Assert.Same(site, port.Span));
        Assert.All(netlist.Devices, device => Assert.Same(site, device.Span));
        Assert.All(netlist.Macros, macro => Assert.Same(site, macro.Span));
    }

    [Fact]
    public void Unknown_span_reads_as_unknown()
    {
        Assert.False(SourceSpan.Unknown.IsKnown);
        Assert.Equal("(unknown location)", SourceSpan.Unknown.ToString());
        Assert.Equal("Design.cs(12)", new SourceSpan("Design.cs", 12).ToString());
        Assert.Equal("Design.cs(12,5)", new SourceSpan("Design.cs", 12, 5).ToString());
    }
}
