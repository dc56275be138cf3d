using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Checking;
using Phaseward.Rules.Timing;

namespace Phaseward.Analyzers;

/// <summary>PW4xxx: register setup and hold, two-phase latch paths with time borrowing, latch write windows.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class TimingAnalyzer : FindingAnalyzer
{
    protected override IReadOnlyList<Rule> Rules { get; } = new Rule[] { new RegisterTimingRule(), new LatchBorrowingRule(), new LatchWriteWindowRule() };
}
