using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Options;
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

    internal override void AnalyzeDocumentOptions(SemanticModelAnalysisContext context, PhasewardOptions options, DesignInfo firstDesign)
    {
        foreach (var problem in options.Problems)
            context.ReportDiagnostic(Diagnostic.Create(Descriptors.Of(RuleCatalog.InvalidOption), firstDesign.AnchorLocation,
                problem.Key, problem.Value, problem.Expected, problem.DefaultValue));
    }

    internal override void AnalyzeDesign(DesignAnalysisContext context)
    {
        foreach (var issue in context.Elaboration.Issues)
            context.Report(context.Mapper.FromIssue(issue));
    }
}
