using System;
using System.Linq;
using Phaseward.Checking;
using Phaseward.Reproducers;
using Xunit;

namespace Phaseward.Tests.Reproducers;

/// <summary>Every rule with electrical figures can hand its findings over as a deck; elaboration findings cannot.</summary>
public class ReproducerCoverageTests
{
    [Fact]
    public void EveryCheckingRuleHasADeckAndNoElaborationRuleDoes()
    {
        var checking = RuleCatalog.All.Where(r => r.Family != RuleFamily.Elaboration).Select(r => r.Id);
        Assert.Equal(checking, Reproducer.SupportedRuleIds.Order(StringComparer.Ordinal));
        Assert.All(RuleCatalog.All.Where(r => r.Family == RuleFamily.Elaboration), r => Assert.False(Reproducer.Supports(r.Id)));
    }
}
