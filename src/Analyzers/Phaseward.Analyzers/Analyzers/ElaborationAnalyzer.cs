using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>
/// Reports what the compile-time elaborator met in each design: code it could not interpret (PW9001), budgets used up
/// (PW9002), the design throwing (PW9003), and unusable <c>phaseward.</c> options (PW9004).
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ElaborationAnalyzer : PhasewardAnalyzer
{
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(
        Descriptors.Of(RuleCatalog.NotElaborated), Descriptors.Of(RuleCatalog.ElaborationBudgetExceeded),
        Descriptors.Of(RuleCatalog.DesignThrows), Descriptors.Of(RuleCatalog.InvalidOption));

    internal override void AnalyzeDesign(DesignAnalysisContext context)
    {
        foreach (var problem in context.Options.Problems)
            context.Report(Diagnostic.Create(Descriptors.Of(RuleCatalog.InvalidOption), context.Design.AnchorLocation,
                problem.Key, problem.Value, problem.Expected, problem.DefaultValue));

        foreach (var issue in context.Elaboration.Issues)
            context.Report(context.Mapper.FromIssue(issue));
    }
}
