using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>PW2xxx: pass gates in series without a restoring stage.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class PassGatePathAnalyzer : FindingAnalyzer
{
    protected override RuleFamily Family => RuleFamily.PassGatePaths;
}
