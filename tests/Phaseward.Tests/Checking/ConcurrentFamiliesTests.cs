using System;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Tests.Checking;

/// <summary>
/// In the compiler the analyzers of each rule family run concurrently on one shared netlist, and the clock-phase and
/// timing rules share one latch model, the pass-gate rule and the latch paths one pass-gate network. Checked here the
/// same way: every family on its own thread at once, many times over fresh netlists, must give exactly the findings
/// of a sequential check (a memo table written by two threads at once throws or loses entries).
/// </summary>
public sealed class ConcurrentFamiliesTests
{
    [Fact]
    public async Task FamiliesCheckedConcurrentlyOnOneNetlistFindWhatASequentialCheckFinds()
    {
        var families = Checker.Rules.GroupBy(r => r.Descriptors[0].Family).Select(g => g.ToArray()).ToArray();
        Assert.True(families.Length >= 4);
        var expected = Describe(Checker.Check(Design(), Checker.Rules));
        Assert.NotEmpty(expected); // the design has findings of several families, so a lost or doubled one shows

        for (var round = 0; round < 200; round++)
        {
            var netlist = Design();
            using var start = new Barrier(families.Length);
            var reports = families.Select(rules => Task.Factory.StartNew(() =>
            {
                start.SignalAndWait();
                return Checker.Check(netlist, rules);
            }, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default)).ToArray();
            var found = (await Task.WhenAll(reports)).SelectMany(Describe).OrderBy(s => s, StringComparer.Ordinal).ToArray();
            Assert.Equal(expected, found);
        }
    }

    private static string[] Describe(CheckReport report)
        => report.Findings.Select(f => f.RuleId + " " + f.Message).OrderBy(s => s, StringComparer.Ordinal).ToArray();

    private static Netlist Design() => new ManyWindows().Elaborate();

    // Many latches on four phases of two related clocks (many window pairs to memoise), pass-gate chains between them,
    // and a same-phase pair so that the rules have something to report. Figures invented for the test.
    private sealed class ManyWindows : Design
    {
        protected override void Describe(Circuit c)
        {
            var fast = c.Clock("fast", 2.Nanoseconds());
            var slow = c.Clock("slow", 4.Nanoseconds(), offset: 500.Picoseconds());
            var phases = new[] { fast.High, fast.Low, slow.High, slow.Low };
            var sel = c.Input("sel");
            var n = c.Input("d");
            for (var i = 0; i < 64; i++)
            {
                n = c.StaticLatch(n, phases[i % phases.Length]);
                for (var g = 0; g < i % 6; g++)
                    n = c.TransmissionGate(n, sel);
                n = c.Inverter(n);
            }

            c.Output("q", c.StaticLatch(c.StaticLatch(n, fast.High), fast.High));
        }
    }
}
