using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Xml.Linq;
using Phaseward.Cli.Model;
using Phaseward.Cli.Output;
using Phaseward.Cli.Policy;
using Phaseward.Netlists;

namespace Phaseward.Cli.Tests
{
    // The report page's timing diagram on one time base, on a design made here (no build needed): offsets, two related
    // clocks of different periods on their common cycle, an independent clock drawn apart. The expected positions are
    // worked by hand from the clocks' figures (no skew, so a phase's window is exactly where its clock is high or low).
    public class TimingDiagramTests
    {
        private static readonly XNamespace Svg = TimingDiagram.Svg;

        // The diagram spans two common cycles over 860 units from x = 250: x(t) = 250 + 860 · t / (2 · cycle).
        private static double X(double seconds, double cycle) => 250 + 860 * seconds / (2 * cycle);

        [Fact]
        public void RelatedClocksShareOneTimeBaseWithTheirOffsetsAndAnIndependentClockIsDrawnApart()
        {
            var design = new PageDesigns.Clocks.Tide();
            var report = DesignRunner.Check(design, design.Elaborate(), SourceSpan.Unknown, new ReportPolicy());
            var page = XDocument.Parse(HtmlReport.Render("/work/designs.dll", new[] { report }, System.Array.Empty<Loading.SkippedDesign>()));
            var diagrams = page.Descendants(Svg + "svg").Where(s => ((string?)s.Attribute("class")) == "timing-diagram").ToList();

            // 'fast' (1 ns, rising at 250 ps) and 'slow' (2 ns, rising at 0) repeat together every 2 ns: one diagram.
            Assert.Equal(new[] { "fast slow", "crystal" }, diagrams.Select(d => (string?)d.Attribute("data-root-clock")));
            var shared = diagrams[0];
            Assert.Contains(shared.Descendants(Svg + "text"), t => t.Value == "t (cycle 2 ns)");
            const double Cycle = 2e-9;
            // fast.High conducts over [250, 750) ps of every ns: it rises at 0.25, 1.25, 2.25 and 3.25 ns.
            Assert.Equal(new[] { 0.25e-9, 1.25e-9, 2.25e-9, 3.25e-9 }.Select(t => X(t, Cycle)), RisingEdges(shared, "fast.High"), Close);
            // slow.Low conducts over [1, 2) ns of every 2 ns: it rises at 1 and 3 ns; slow.High at 2 ns (and from 0).
            Assert.Equal(new[] { 1e-9, 3e-9 }.Select(t => X(t, Cycle)), RisingEdges(shared, "slow.Low"), Close);
            Assert.Equal(new[] { 2e-9 }.Select(t => X(t, Cycle)), RisingEdges(shared, "slow.High"), Close);

            // 'crystal' (3 ns, declared independent) has a diagram of its own, on its own period.
            var apart = diagrams[1];
            Assert.Contains("(independent)", apart.Element(Svg + "title")!.Value);
            Assert.Contains(apart.Descendants(Svg + "text"), t => t.Value == "t (crystal: 3 ns)");
            Assert.Equal(new[] { 3e-9 }.Select(t => X(t, 3e-9)), RisingEdges(apart, "crystal.High"), Close);
            Assert.DoesNotContain(apart.Descendants(Svg + "g"), g => ((string?)g.Attribute("data-phase"))?.StartsWith("fast", System.StringComparison.Ordinal) == true);
        }

        private static readonly IEqualityComparer<double> Close = new Tolerance();

        // The x of every rising edge of a phase's waveform: two points at one x, the second higher (smaller y).
        private static double[] RisingEdges(XElement diagram, string phase)
        {
            var group = diagram.Descendants(Svg + "g").Single(g => (string?)g.Attribute("class") == "phase" && (string?)g.Attribute("data-phase") == phase);
            var points = ((string)group.Element(Svg + "polyline")!.Attribute("points")!).Split(' ')
                .Select(p => p.Split(',').Select(v => double.Parse(v, CultureInfo.InvariantCulture)).ToArray()).ToList();
            return Enumerable.Range(1, points.Count - 1)
                .Where(i => points[i][0] == points[i - 1][0] && points[i][1] < points[i - 1][1])
                .Select(i => points[i][0]).ToArray();
        }

        private sealed class Tolerance : IEqualityComparer<double>
        {
            // Coordinates are written to two decimals.
            public bool Equals(double a, double b) => System.Math.Abs(a - b) <= 0.006;

            public int GetHashCode(double value) => 0;
        }
    }
}

namespace Phaseward.Cli.Tests.PageDesigns.Clocks
{
    public sealed class Tide : Design
    {
        protected override void Describe(Circuit c)
        {
            var fast = c.Clock("fast", 1.Nanoseconds(), 0.5, 0.Picoseconds(), 250.Picoseconds());
            var slow = c.Clock("slow", 2.Nanoseconds(), 0.5, 0.Picoseconds());
            var crystal = c.Clock("crystal", 3.Nanoseconds(), 0.5, 0.Picoseconds(), independent: true);
            var a = c.DynamicLatch(c.Input("d"), fast.High, "a");
            var b = c.DynamicLatch(a, slow.Low, "b");
            c.Output("q", c.DynamicLatch(b, crystal.High, "x"));
        }
    }
}
