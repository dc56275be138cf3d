using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.Analyzers;

/// <summary>PW3xxx: dynamic nodes on gatable clocks, clocks too slow for dynamic storage, charge sharing, fighting drivers, keepers too strong to write.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class DynamicStorageAnalyzer : FindingAnalyzer
{
    protected override IReadOnlyList<Rule> Rules { get; } = new Rule[]
    {
        new DynamicNodeOnGatedClockRule(),
        new ClockTooSlowForDynamicStorageRule(),
        new ChargeSharingRule(),
        new FightingDriversRule(),
        new KeeperTooStrongRule(),
    };
}
