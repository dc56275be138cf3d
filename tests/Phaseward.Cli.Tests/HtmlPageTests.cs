using System.Linq;
using System.Xml.Linq;
using Phaseward.Cli.Model;
using Phaseward.Cli.Output;
using Phaseward.Cli.Policy;
using Phaseward.Netlists;

namespace Phaseward.Cli.Tests
{
    // The page's wording and links, on designs made here (no build needed).
    public class HtmlPageTests
    {
        private static DesignReport Report(Design design)
            => DesignRunner.Check(design, design.Elaborate(), SourceSpan.Unknown, new ReportPolicy());

        private static XDocument Page(params Design[] designs)
            => XDocument.Parse(HtmlReport.Render("/work/designs.dll", designs.Select(Report).ToList(), System.Array.Empty<Loading.SkippedDesign>()));

        [Fact]
        public void TwoDesignsOfOneClassNameInDifferentNamespacesGetTwoDifferentLinksNamedByTheirFullTypeNames()
        {
            var page = Page(new PageDesigns.North.Relay(), new PageDesigns.South.Relay());
            var links = page.Descendants("a").Where(a => ((string?)a.Attribute("href"))?.StartsWith('#') == true).ToList();
            Assert.Equal(new[] { "Phaseward.Cli.Tests.PageDesigns.North.Relay", "Phaseward.Cli.Tests.PageDesigns.South.Relay" }, links.Select(a => a.Value));
            Assert.Equal(2, links.Select(a => (string?)a.Attribute("href")).Distinct().Count());
            var sections = page.Descendants("section").Select(s => "#" + (string?)s.Attribute("id"));
            Assert.Equal(links.Select(a => (string?)a.Attribute("href")), sections);
        }

        [Fact]
        public void CountsAreWrittenInTheRightNumber()
        {
            // Three same-window latch pairs: three PW1001 warnings (a structural check: every latch fed by a latch of
            // its own phase is reported, common practice).
            var page = Page(new PageDesigns.North.Relay());
            var counts = page.Descendants("span").Where(s => ((string?)s.Attribute("class"))?.StartsWith("count", System.StringComparison.Ordinal) == true)
                .Select(s => s.Value).ToList();
            Assert.Contains("3 warnings", counts);
            Assert.DoesNotContain(counts, c => c.EndsWith(" warning", System.StringComparison.Ordinal) && !c.StartsWith("1 ", System.StringComparison.Ordinal));

            var text = new System.IO.StringWriter();
            TextReport.WriteDesign(text, Report(new PageDesigns.North.Relay()));
            Assert.Contains("Findings: 0 errors, 3 warnings, 0 info", text.ToString());
        }

        [Fact]
        public void EveryDesignNamesTheProcessItsFiguresCameFrom()
        {
            // No process stated: the invented illustrative defaults, named as such on the page and in the text.
            var page = Page(new PageDesigns.North.Relay());
            var process = Assert.Single(page.Descendants("p"), p => (string?)p.Attribute("class") == "process");
            Assert.Equal("Figures from process 'illustrative (invented defaults)'.", process.Value);

            var text = new System.IO.StringWriter();
            TextReport.WriteDesign(text, Report(new PageDesigns.North.Relay()));
            Assert.Contains("Figures from process 'illustrative (invented defaults)'.", text.ToString());
        }
    }
}

namespace Phaseward.Cli.Tests.PageDesigns.North
{
    public sealed class Relay : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 2.Nanoseconds());
            var d = c.Input("d");
            for (var i = 0; i < 4; i++)
                d = c.DynamicLatch(d, clk.High, $"stage{i}");
            c.Output("q", d);
        }
    }
}

namespace Phaseward.Cli.Tests.PageDesigns.South
{
    public sealed class Relay : Design
    {
        protected override void Describe(Circuit c)
        {
            var clk = c.Clock("clk", 2.Nanoseconds());
            c.Output("q", c.StaticLatch(c.DynamicLatch(c.Input("d"), clk.High, "first"), clk.Low, "second"));
        }
    }
}
