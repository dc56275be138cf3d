using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>PW4xxx: register setup and hold, two-phase latch paths with time borrowing, latch write windows.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class TimingAnalyzer : FindingAnalyzer
{
    protected override RuleFamily Family => RuleFamily.Timing;
}
