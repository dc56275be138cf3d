using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>PW3xxx: dynamic nodes on gatable clocks, clocks too slow for dynamic storage, charge sharing, fighting drivers, keepers too strong to write.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class DynamicStorageAnalyzer : FindingAnalyzer
{
    protected override RuleFamily Family => RuleFamily.DynamicStorage;
}
