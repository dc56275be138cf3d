using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.Analyzers;

/// <summary>PW1xxx: latches transparent in the same window in series, overlap races, unsynchronized clock crossings, clock-gate enables, loops with no storage.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ClockPhaseAnalyzer : FindingAnalyzer
{
    protected override IReadOnlyList<Rule> Rules { get; } = new Rule[] { new SameWindowLatchesRule(), new OverlapRaceRule(), new ClockCrossingRule(), new ClockGateEnableRule(), new LoopWithoutStorageRule() };
}
