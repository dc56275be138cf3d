using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>PW1xxx: latches transparent in the same window in series, overlap races, unsynchronized clock crossings, clock-gate enables, loops with no storage.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ClockPhaseAnalyzer : FindingAnalyzer
{
    protected override RuleFamily Family => RuleFamily.ClockPhases;
}
