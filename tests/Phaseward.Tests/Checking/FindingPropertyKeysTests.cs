using System.Collections.Generic;
using System.Linq;
using System.Reflection;
using Phaseward;
using Phaseward.Checking;
using Phaseward.Rules.PassGatePaths;

namespace Phaseward.Tests.Checking;

// One home and one casing for finding property keys, and the split-site format shared by PW2001 and its code fix.
public class FindingPropertyKeysTests
{
    private static IReadOnlyList<string> DeclaredKeys() => typeof(FindingPropertyKeys)
        .GetFields(BindingFlags.Public | BindingFlags.Static)
        .Where(f => f.IsLiteral)
        .Select(f => (string)f.GetRawConstantValue()!)
        .ToList();

    [Fact]
    public void EveryKeyIsPascalCaseAndDeclaredOnce()
    {
        var keys = DeclaredKeys();
        Assert.NotEmpty(keys);
        Assert.Equal(keys.Count, keys.Distinct().Count());
        Assert.All(keys, key => Assert.Matches("^[A-Z][A-Za-z0-9]*$", key));
    }

    [Fact]
    public void EveryPropertyAFindingCarriesIsADeclaredKey()
    {
        // One circuit with a hazard for each of most rules (the structures of the rules' own tests).
        var c = new Circuit("everything");
        var clk = c.Clock("clk", 2.Nanoseconds());
        c.Output("same_phase", c.DynamicLatch(c.DynamicLatch(c.Input("d0"), clk.High, "first"), clk.High, "second"));
        var a = c.TransmissionGate(c.Input("d1"), clk.Low, "a");
        c.Output("shared", c.Inverter(c.TransmissionGate(a, clk.High, "b")));
        var chain = c.Input("d2");
        var enable = c.Input("route");
        for (var i = 0; i < 8; i++)
            chain = c.TransmissionGate(chain, enable, $"route{i}");
        c.Output("routed", c.Inverter(chain));
        var bus = c.Node("bus");
        c.TransmissionGate(c.Input("d3"), c.Input("request0"), bus);
        c.TransmissionGate(c.Input("d4"), c.Input("request1"), bus);
        c.Output("bus_out", c.Inverter(bus));
        var gated = c.ClockGate(clk, c.StaticRegister(c.Input("arm"), clk, "armed"), ClockStopLevel.Low, name: "burst");
        c.Output("held", c.DynamicLatch(c.DynamicLatch(c.Input("d5"), gated.High, "hold"), gated.Low, "pass"));
        var loop = c.Node("loop");
        var nand = c.Nand(c.Input("go"), loop, "nand");
        c.Inverter(c.Inverter(nand, "loop_inverter"), loop);
        var kept = c.TransmissionGate(c.Input("d6"), clk.High, "kept");
        c.Keeper(kept, "strong_keeper", 1.Kiloohms());
        c.Output("kept_out", c.Inverter(kept));

        var report = Checker.Check(c.ToNetlist());
        var rules = report.Findings.Select(f => f.RuleId).Distinct().ToList();
        Assert.True(rules.Count >= 7, "rules reported: " + string.Join(", ", rules));
        var used = report.Findings.SelectMany(f => f.Properties.Keys).ToHashSet();
        Assert.Empty(used.Except(DeclaredKeys()));
    }

    [Theory]
    [InlineData(3, 1, 4, 4, true, 120, 38, "/src/Lanes.cs")]
    [InlineData(1, 1, 1, 1, false, -1, 0, "")]
    [InlineData(7, 5, 2, 16, false, 0, 12, "/odd|path|with bars.cs")]
    public void ASplitSiteReadsBackAsWritten(int position, int runFirst, int runCount, int siteGates, bool hasCallers, int start, int length, string path)
    {
        var site = new SplitSite(position, runFirst, runCount, siteGates, hasCallers, start, length, path);
        Assert.True(SplitSite.TryParse(site.Format(), out var read));
        Assert.Equal((position, runFirst, runCount, siteGates, hasCallers, start, length, path),
            (read!.Position, read.RunFirst, read.RunCount, read.SiteGates, read.HasCallers, read.Start, read.Length, read.Path));
    }

    [Theory]
    [InlineData("")]
    [InlineData("1|1|1|1|true|0|5")]            // seven fields
    [InlineData("x|1|1|1|true|0|5|a.cs")]       // not a number
    [InlineData("1|1|1|1|yes|0|5|a.cs")]        // not a flag
    [InlineData("-1|1|1|1|true|0|5|a.cs")]      // negative position
    public void AnythingElseIsRefused(string line)
    {
        Assert.False(SplitSite.TryParse(line, out var site));
        Assert.Null(site);
    }

    [Fact]
    public void SeveralSitesTravelOnePerLine()
    {
        var sites = new[] { new SplitSite(3, 1, 4, 4, true, 10, 5, "/a.cs"), new SplitSite(6, 5, 4, 4, true, 10, 5, "/a.cs") };
        Assert.True(SplitSite.TryParseAll(SplitSite.FormatAll(sites), out var read));
        Assert.Equal(new[] { 3, 6 }, read.Select(s => s.Position));
        Assert.False(SplitSite.TryParseAll("3|1|4|4|true|10|5|/a.cs\nbroken", out _));
    }
}
