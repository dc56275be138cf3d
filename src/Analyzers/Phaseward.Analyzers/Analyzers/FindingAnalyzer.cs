using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>
/// Base of a rule family's analyzer: it runs the family's rules (from src/Dsl) on the shared netlist and reports their
/// findings. A family analyzer only lists its rules:
/// <code>
/// [DiagnosticAnalyzer(LanguageNames.CSharp)]
/// public sealed class ClockPhaseAnalyzer : FindingAnalyzer
/// {
///     protected override IReadOnlyList&lt;Rule&gt; Rules { get; } = new Rule[] { new SamePhaseLatchesRule() };
/// }
/// </code>
/// </summary>
public abstract class FindingAnalyzer : PhasewardAnalyzer
{
    private ImmutableArray<DiagnosticDescriptor> supported;

    /// <summary>The rules this analyzer runs.</summary>
    protected abstract IReadOnlyList<Rule> Rules { get; }

    public sealed override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics
    {
        get
        {
            if (supported.IsDefault)
            {
                supported = Rules.SelectMany(r => r.Descriptors)
                    .Select(d => Descriptors.Find(d.Id) ?? throw new InvalidOperationException(
                        $"Rule ID {d.Id} has no DiagnosticDescriptor in Phaseward.Analyzers.Diagnostics.Descriptors; add one there."))
                    .Distinct()
                    .ToImmutableArray();
            }

            return supported;
        }
    }

    internal sealed override void AnalyzeDesign(DesignAnalysisContext context)
    {
        if (context.Elaboration.Netlist is not { } netlist)
            return;
        var report = Checker.Check(netlist, Rules, context.Options.Policy, context.CancellationToken);
        foreach (var finding in report.Findings)
            context.Report(context.Mapper.FromFinding(finding));
    }
}
