using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Tests.Dsl;

public class DesignTests
{
    // An invented front end: two clocks, a gated sampling clock and a register (demo circuit, not from any source).
    private sealed class TideSampler : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 10.Nanoseconds());
            c.Clock("slow", 1.Microseconds());
            var level = c.Input("level");
            var armed = c.Input("armed");
            c.ClockGate(clk, armed, name: "sample");
            var held = c.DynamicRegister(level, clk, "held");
            c.Output("held", held);
        }
    }

    private sealed class Renamed : Design
    {
        public override string Name => "buoy front end";

        protected override void Describe(Circuit c) => c.Input("x");
    }

    [Fact]
    public void Elaborate_runs_Describe_and_returns_the_netlist_named_after_the_class()
    {
        var netlist = new TideSampler().Elaborate();

        Assert.Equal("TideSampler", netlist.DesignName);
        Assert.Equal(new[] { "clk", "slow", "sample" }, netlist.Clocks.Select(k => k.Name).ToArray());
        Assert.Equal(new[] { "level", "armed" }, netlist.Inputs.Select(p => p.Name).ToArray());
        Assert.Equal("held", Assert.Single(netlist.Outputs).Name);
        Assert.Equal(4, netlist.Devices.Count);
        Assert.Equal(6, netlist.Nets.Count); // level, armed, held.master.x, held.master, held.slave.x, held
    }

    [Fact]
    public void Elaborate_builds_a_fresh_circuit_each_time_with_the_same_text()
    {
        var design = new TideSampler();
        var first = design.Elaborate();
        var second = design.Elaborate();

        Assert.NotSame(first, second);
        Assert.NotSame(first.Nets[0], second.Nets[0]);
        Assert.Equal(NetlistText.Write(first, includeSpans: true), NetlistText.Write(second, includeSpans: true));
    }

    [Fact]
    public void A_design_may_override_its_name()
    {
        Assert.Equal("buoy front end", new Renamed().Elaborate().DesignName);
    }

    [Fact]
    public void Check_with_no_rules_yet_reports_a_clean_design_with_its_size()
    {
        var report = new TideSampler().Check();

        Assert.True(report.IsClean);
        Assert.Empty(report.Findings);
        Assert.Equal("TideSampler", report.Netlist.DesignName);
        var lines = report.ToString().Split(Environment.NewLine);
        Assert.Equal("Phaseward: design 'TideSampler': 4 devices, 6 nets, 3 clocks — clean, no findings.", lines[0]);
        // Every run-time report names the process its figures came from and says they are estimates.
        Assert.Equal("  Figures from process '" + report.Netlist.Process.Name + "'. " + EstimateCaution.Text, lines[1]);
    }
}
