using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>
/// Base of a rule family's analyzer: it runs the family's rules (those of <see cref="Checker.Rules"/> whose registry
/// entries are in its family) on the shared netlist and reports their findings. A family analyzer only names its family:
/// <code>
/// [DiagnosticAnalyzer(LanguageNames.CSharp)]
/// public sealed class ClockPhaseAnalyzer : FindingAnalyzer
/// {
///     protected override RuleFamily Family => RuleFamily.ClockPhases;
/// }
/// </code>
/// </summary>
public abstract class FindingAnalyzer : PhasewardAnalyzer
{
    private ImmutableArray<DiagnosticDescriptor> supported;

    private IReadOnlyList<Rule>? rules;

    /// <summary>The family whose rules this analyzer runs.</summary>
    protected abstract RuleFamily Family { get; }

    /// <summary>Diagnostics the analyzer reports besides its rules' findings (none unless overridden).</summary>
    private protected virtual IEnumerable<RuleDescriptor> OtherDescriptors => Array.Empty<RuleDescriptor>();

    /// <summary>The rules this analyzer runs (virtual for test-only analyzers).</summary>
    internal virtual IReadOnlyList<Rule> Rules => rules ??= Checker.Rules.Where(r => r.Descriptors.Any(d => d.Family == Family)).ToArray();

    public sealed override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics
    {
        get
        {
            if (supported.IsDefault)
            {
                supported = Rules.SelectMany(r => r.Descriptors)
                    .Concat(OtherDescriptors)
                    .Select(Descriptors.Of)
                    .Distinct()
                    .ToImmutableArray();
            }

            return supported;
        }
    }

    internal override void AnalyzeDesign(DesignAnalysisContext context)
    {
        if (context.Elaboration.Netlist is not { } netlist)
            return;
        var report = Checker.Check(netlist, RulesReportableIn(context), context.Options.Policy, context.CancellationToken);
        var mapped = new List<(Finding, Diagnostic)>(report.Findings.Count);
        foreach (var finding in report.Findings)
        {
            if (context.Mapper.FromFinding(finding, netlist.Process) is { } diagnostic)
                mapped.Add((finding, diagnostic));
        }

        foreach (var diagnostic in InstanceGrouping.Group(mapped, netlist.DesignName, context.Mapper.Exact))
            context.Report(diagnostic);
    }

    /// <summary>The rules with at least one diagnostic the build has not switched off for the document.</summary>
    private IReadOnlyList<Rule> RulesReportableIn(DesignAnalysisContext context)
    {
        List<Rule>? reportable = null;
        for (var i = 0; i < Rules.Count; i++)
        {
            var rule = Rules[i];
            var allOff = rule.Descriptors.All(d => SwitchedOffDiagnostics.IsOff(d.Id, context.Tree, context.CompilationOptions, context.CancellationToken));
            if (allOff)
                reportable ??= Rules.Take(i).ToList();
            else
                reportable?.Add(rule);
        }

        return reportable ?? Rules;
    }
}
