using System;
using System.Linq;
using System.Threading.Tasks;
using Phaseward.Analyzers.Tests.Robustness;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Samples;

/// <summary>
/// The Quorvane sample written with blocks, a record, LINQ and lambdas, analysed at compile time as the editor does:
/// nothing in it gives PW9001, and its six placed bins with the same-phase latch pair are one diagnostic at the call in
/// the block, with the instance count, the first bins' hierarchical names and the Place call as a related location.
/// Same-phase latches in series are transparent together (Weste &amp; Harris, CMOS VLSI Design, 4th ed., section 10.2,
/// from memory). The run-time Check() keeps every instance (SampleReportTests).
/// </summary>
public sealed class SpectrumBinsSampleTests
{
    [Fact]
    public async Task TheSixPlacedBinsAreOneDiagnosticAndTheTwoPhaseFixIsClean()
    {
        var trees = BoundedAnalysis.Samples.Select(s => BoundedAnalysis.Parse(s.Path, s.Text)).ToList();
        var tree = trees.Single(t => t.FilePath.EndsWith("/SpectrumBins.cs", StringComparison.Ordinal));
        var diagnostics = await BoundedAnalysis.DocumentAsync(BoundedAnalysis.Compile(trees), tree, "SpectrumBins.cs");

        Assert.DoesNotContain(diagnostics, d => d.Id == RuleCatalog.NotElaborated.Id);
        var found = Assert.Single(diagnostics, d => d.Id.StartsWith("PW", StringComparison.Ordinal));
        Assert.Equal(RuleCatalog.SameWindowLatches.Id, found.Id);

        var lines = tree.GetText().Lines;
        var capture = lines.Single(l => l.ToString().Contains("\"count\")", StringComparison.Ordinal)).LineNumber;
        Assert.Equal(capture, found.Location.GetLineSpan().StartLinePosition.Line);

        var message = found.GetMessage();
        Assert.Contains("'swell.count'", message);
        Assert.Contains("'swell.held'", message);
        Assert.Contains("found 6 times at this call in design 'SpectrumBins': swell.count, groundswell.count, sea.count", message);
        var place = lines.Single(l => l.ToString().Contains("c.Place(", StringComparison.Ordinal)).LineNumber;
        Assert.Contains(found.AdditionalLocations, l => l.GetLineSpan().StartLinePosition.Line == place);
    }
}
