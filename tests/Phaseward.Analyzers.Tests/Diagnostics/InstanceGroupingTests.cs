using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;
using Xunit;

namespace Phaseward.Analyzers.Tests.Diagnostics;

/// <summary>
/// One diagnostic per cause, not per copy: a hazard inside a block placed in a loop is one squiggle at the offending
/// call, whose message counts the instances and names the first few, with the Place call as a related location.
/// </summary>
public class InstanceGroupingTests
{
    private static string Lanes(int count) => $$"""
        using Phaseward;

        public sealed class Lanes : Design
        {
            protected override void Describe(Circuit c)
            {
                var clk = c.Clock("sample", 10.Nanoseconds());
                for (var i = 0; i < {{count}}; i++)
                    c.Output("y" + i, {|#2:c.Place(new Lane(c.Input("a" + i), clk.High), "lane" + i)|}.Output);
            }
        }

        public sealed class Lane : Block
        {
            private readonly Net input;
            private readonly Phase phase;

            public Lane(Net input, Phase phase)
            {
                this.input = input;
                this.phase = phase;
            }

            public Net Output { get; private set; } = null!;

            protected override void Describe(Circuit c)
            {
                var first = {|#1:c.StaticLatch(input, phase, "first")|};
                Output = {|#0:c.StaticLatch(first, phase, "second")|};
            }
        }
        """;

    [Fact]
    public Task ABlockPlacedFiveTimesGivesOneDiagnosticThatCountsTheInstances()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Lanes(5),
            new DiagnosticResult(RuleCatalog.SameWindowLatches.Id, DiagnosticSeverity.Warning)
                .WithLocation(0).WithLocation(1).WithLocation(2)
                .WithMessage("Latch 'lane0.second' takes its data from latch 'lane0.first' and both are transparent in sample.High: "
                    + "data can run through both in one phase; found 5 times at this call in design 'Lanes': "
                    + "lane0.second, lane1.second, lane2.second, ..."))
            .RunAsync();

    [Fact]
    public Task ABlockPlacedOnceKeepsTheRulesOwnMessage()
        => new PhasewardAnalyzerTest<ClockPhaseAnalyzer>(Lanes(1).Replace("{|#2:", "").Replace(")|}.Output", ").Output"),
            new DiagnosticResult(RuleCatalog.SameWindowLatches.Id, DiagnosticSeverity.Warning)
                .WithLocation(0).WithLocation(1)
                .WithMessage("Latch 'lane0.second' takes its data from latch 'lane0.first' and both are transparent in sample.High: "
                    + "data can run through both in one phase"))
            .RunAsync();

    [Theory]
    [InlineData("no holes", 0)]
    [InlineData("{0} and {1}", 2)]
    [InlineData("{2} first, {0} later", 3)]
    [InlineData("escaped {{0}} and {1,8:F2}", 2)]
    [InlineData("{10}", 11)]
    public void HoleCountIsOneMoreThanTheHighestIndex(string format, int expected)
        => Assert.Equal(expected, DescriptorFactory.HoleCount(format));

    [Fact]
    public void EveryRegistryEntryHasAnInstancesVariantWithOneMoreHole()
    {
        foreach (var entry in RuleCatalog.All)
        {
            var single = Descriptors.Of(entry);
            var grouped = Descriptors.ForInstances(entry);
            Assert.Equal(single.Id, grouped.Id);
            Assert.Equal(single.DefaultSeverity, grouped.DefaultSeverity);
            Assert.Equal(DescriptorFactory.HoleCount(entry.MessageFormat) + 1,
                DescriptorFactory.HoleCount(grouped.MessageFormat.ToString(System.Globalization.CultureInfo.InvariantCulture)));
        }
    }
}
