using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;
using Phaseward.Rules.PassGatePaths;

namespace Phaseward.Analyzers;

/// <summary>PW2xxx: pass gates in series without a restoring stage.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class PassGatePathAnalyzer : FindingAnalyzer
{
    protected override IReadOnlyList<Rule> Rules { get; } = new Rule[] { new PassGateChainRule() };
}
