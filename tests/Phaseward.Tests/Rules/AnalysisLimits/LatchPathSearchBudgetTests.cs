using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.AnalysisLimits;
using Phaseward.Sequencing;
using Phaseward.Tests.Rules.ClockPhases;
using Xunit;

namespace Phaseward.Tests.Rules.AnalysisLimits;

/// <summary>
/// The latch-to-latch path search stops at its budget of steps (<see cref="RulePolicy.LatchPathSearchBudget"/>) after a
/// whole source latch, lists every path of the latches searched and none of the rest, and says so (PW9005). The
/// oracles: the paths of a ripple chain counted on its structure, and the same netlist searched without a limit.
/// </summary>
public class LatchPathSearchBudgetTests
{
    private const long Unlimited = long.MaxValue / 2;

    private static Netlist Ripple(int n, double periodNs = 1000) => Figures.Ripple(n, periodNs.Nanoseconds());

    // The paths from one latch of the chain, from its structure: a master reaches its own slave; the slave of bit k
    // reaches the masters of bits k + 1 … n − 1.
    private static int PathsFrom(Latch latch, int n)
    {
        if (latch.Name.EndsWith(".master", StringComparison.Ordinal))
            return 1;
        Assert.EndsWith(".slave", latch.Name);
        var bit = int.Parse(latch.Name.Substring("count".Length, latch.Name.IndexOf('.') - "count".Length), System.Globalization.CultureInfo.InvariantCulture);
        return n - 1 - bit;
    }

    [Fact]
    public void A_stopped_search_lists_every_path_of_the_latches_it_searched_and_none_of_the_others()
    {
        const int n = 30;
        var whole = LatchModel.Of(Ripple(n), Unlimited);
        Assert.False(whole.PathSearchStopped);
        Assert.Equal(2 * n, whole.LatchesSearched);
        Assert.Equal(n + n * (n - 1) / 2, whole.Paths.Count);

        var searchedBefore = 0;
        var budgets = new long[] { 1, 2, 10, 50, 100, 300, 1_000 };
        Assert.All(budgets, b => Assert.True(b < whole.PathSearchSteps));
        foreach (var budget in budgets)
        {
            var model = LatchModel.Of(Ripple(n), budget);
            Assert.True(model.PathSearchStopped, $"budget {budget}");
            Assert.Equal(budget, model.PathSearchBudget);
            // It stops only once the budget is spent, and never inside a latch's search ...
            Assert.True(model.PathSearchSteps >= budget, $"budget {budget}: {model.PathSearchSteps} steps");
            Assert.InRange(model.LatchesSearched, Math.Max(1, searchedBefore), 2 * n - 1);
            searchedBefore = model.LatchesSearched;
            // ... so its paths are the whole search's paths from the latches it searched, in the same order.
            var expected = whole.Paths.Where(p => p.From.Index < model.LatchesSearched).ToList();
            Assert.Equal(expected.Select(Describe), model.Paths.Select(Describe));
            Assert.Equal(model.Latches.Take(model.LatchesSearched).Sum(l => PathsFrom(l, n)), model.Paths.Count);
        }

        // A budget of one step still searches the first latch whole (the search stops between latches only).
        var first = LatchModel.Of(Ripple(n), 1);
        Assert.Equal(1, first.LatchesSearched);
        Assert.Equal(PathsFrom(first.Latches[0], n), first.Paths.Count);

        // The whole search's own count of steps is enough for it.
        var exact = LatchModel.Of(Ripple(n), whole.PathSearchSteps);
        Assert.False(exact.PathSearchStopped);
        Assert.Equal(whole.Paths.Select(Describe), exact.Paths.Select(Describe));
    }

    private static string Describe(LatchPath p) => $"{p.From.Name} -> {p.To.Name} via {p.EntryGate.Name}: {p.MinDelay} … {p.MaxDelay}";

    [Fact]
    public void The_model_kept_for_a_netlist_is_reused_only_when_it_is_what_the_budget_gives()
    {
        var netlist = Ripple(12);
        var small = LatchModel.Of(netlist, 20);
        Assert.True(small.PathSearchStopped);
        Assert.Same(small, LatchModel.Of(netlist, 20));
        Assert.Same(small, LatchModel.Of(netlist)); // the kept model, whatever its budget

        var whole = LatchModel.Of(netlist, Unlimited);
        Assert.NotSame(small, whole);
        Assert.False(whole.PathSearchStopped);
        Assert.Same(whole, LatchModel.Of(netlist, whole.PathSearchSteps)); // complete within this budget too
        Assert.Same(whole, LatchModel.Of(netlist));

        var again = LatchModel.Of(netlist, 20); // a smaller budget than the kept model used: searched again
        Assert.True(again.PathSearchStopped);
        Assert.Equal(small.LatchesSearched, again.LatchesSearched);
        Assert.Equal(small.Paths.Count, again.Paths.Count);
    }

    [Fact]
    public void The_rules_check_the_paths_searched_and_PW9005_names_where_the_search_stopped()
    {
        // A 1 ns clock is far too fast for a 20-stage ripple: setup fails on the long paths (PW4001). With a budget the
        // failures reported are exactly those of the latches searched, and PW9005 says where the search stopped.
        const int n = 20;
        var whole = Checker.Check(Ripple(n, 1), new RulePolicy { LatchPathSearchBudget = Unlimited });
        Assert.DoesNotContain(whole.Findings, f => f.RuleId == RuleCatalog.LatchPathSearchStopped.Id);
        Assert.Contains(whole.Findings, f => f.RuleId == RuleCatalog.RegisterSetup.Id);

        var netlist = Ripple(n, 1);
        var policy = new RulePolicy { LatchPathSearchBudget = 200 };
        var stopped = Checker.Check(netlist, policy);
        var model = LatchModel.Of(netlist, 200);
        Assert.True(model.PathSearchStopped);
        var searched = model.Latches.Take(model.LatchesSearched).Select(l => l.Name).ToHashSet();
        // PW4001 by its definition on the whole search's register paths, kept to the launching registers whose slave
        // was searched: for each capturing register with a failing path, the worst slack among them.
        var expected = Phaseward.Rules.Timing.RegisterPathChecks.For(LatchModel.Of(Ripple(n, 1), Unlimited))
            .Where(r => searched.Contains(r.Launch.Slave.Name) && r.Check.SetupSlack < Time.Zero)
            .GroupBy(r => r.Capture.Name)
            .ToDictionary(g => g.Key, g => (Worst: g.Min(r => r.Check.SetupSlack), Count: g.Count()));
        var setupWhole = whole.Findings.Where(f => f.RuleId == RuleCatalog.RegisterSetup.Id).ToList();
        var setupStopped = stopped.Findings.Where(f => f.RuleId == RuleCatalog.RegisterSetup.Id).ToList();
        Assert.Equal(expected.Keys.OrderBy(k => k, StringComparer.Ordinal),
            setupStopped.Select(f => f.Properties[FindingPropertyKeys.Register]).OrderBy(k => k, StringComparer.Ordinal));
        foreach (var finding in setupStopped)
        {
            var (worst, count) = expected[finding.Properties[FindingPropertyKeys.Register]];
            Assert.Contains(finding.Properties[FindingPropertyKeys.SourceLatch] + ".slave", searched);
            Assert.Equal(worst.Seconds, double.Parse(finding.Properties[FindingPropertyKeys.MarginSeconds], System.Globalization.CultureInfo.InvariantCulture));
            Assert.Equal(count - 1, int.Parse(finding.Properties[FindingPropertyKeys.OtherFailingLaunches], System.Globalization.CultureInfo.InvariantCulture));
        }

        Assert.True(setupStopped.Sum(f => 1 + int.Parse(f.Properties[FindingPropertyKeys.OtherFailingLaunches], System.Globalization.CultureInfo.InvariantCulture))
            < setupWhole.Sum(f => 1 + int.Parse(f.Properties[FindingPropertyKeys.OtherFailingLaunches], System.Globalization.CultureInfo.InvariantCulture)));

        var notice = Assert.Single(stopped.Findings, f => f.RuleId == RuleCatalog.LatchPathSearchStopped.Id);
        var firstNotSearched = model.Latches[model.LatchesSearched];
        Assert.Equal(firstNotSearched.Span, notice.Location);
        Assert.Equal(firstNotSearched.Name, notice.Properties[FindingPropertyKeys.FirstLatchNotSearched]);
        Assert.Equal("200", notice.Properties[FindingPropertyKeys.SearchBudget]);
        Assert.Equal(
            $"Phaseward stopped listing the latch-to-latch paths of design 'ripple' at latch '{firstNotSearched.Name}' after "
            + $"{model.PathSearchSteps:N0} search steps (budget 200): the {model.Paths.Count:N0} paths from the first "
            + $"{model.LatchesSearched} of {2 * n} latches are checked, the paths from '{firstNotSearched.Name}' and the "
            + $"{2 * n - model.LatchesSearched - 1} latches after it are not",
            notice.Message);
    }

    [Fact]
    public void A_design_whose_paths_grow_with_the_square_of_its_length_stops_at_the_default_budget()
    {
        // 2,000 registers in a ripple chain: 2,001,000 paths (n + n(n − 1)/2), far past the default budget. The search
        // stops, and the paths it lists stay within about a third of the budget (three steps a path in such a chain).
        const int n = 2_000;
        var netlist = Ripple(n);
        var report = Checker.Check(netlist);
        var model = LatchModel.Of(netlist);
        Assert.Equal(RulePolicy.DefaultLatchPathSearchBudget, model.PathSearchBudget);
        Assert.True(model.PathSearchStopped);
        Assert.InRange(model.Paths.Count, 1, RulePolicy.DefaultLatchPathSearchBudget);
        Assert.Equal(model.Latches.Take(model.LatchesSearched).Sum(l => PathsFrom(l, n)), model.Paths.Count);
        Assert.Single(report.Findings, f => f.RuleId == RuleCatalog.LatchPathSearchStopped.Id);
    }

    [Theory]
    [InlineData(0L)]
    [InlineData(-5L)]
    public void A_budget_below_one_step_is_refused_with_its_value(long budget)
    {
        var policy = Assert.Throws<ArgumentException>(() => new RulePolicy { LatchPathSearchBudget = budget });
        Assert.Contains($"was {budget}", policy.Message);
        Assert.Contains(nameof(RulePolicy.LatchPathSearchBudget), policy.Message);
        var model = Assert.Throws<ArgumentOutOfRangeException>(() => LatchModel.Of(Ripple(2), budget));
        Assert.Contains($"was {budget}", model.Message);
    }

    [Fact]
    public void The_rule_is_quiet_when_the_search_is_whole()
        => Assert.Empty(new LatchPathSearchStoppedRule().Check(new RuleContext(Ripple(5), RulePolicy.Default)));
}
