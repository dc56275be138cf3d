using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Options;
using Phaseward.Checking;

namespace Phaseward.Analyzers;

/// <summary>
/// Reports what the compile-time elaborator met in each design: code it could not interpret (PW9001), budgets used up
/// (PW9002), the design throwing (PW9003), and unusable <c>phaseward.</c> options (PW9004); and, as the family's rule,
/// a latch path search stopped at its budget (PW9005).
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ElaborationAnalyzer : FindingAnalyzer
{
    protected override RuleFamily Family => RuleFamily.Elaboration;

    private protected override IEnumerable<RuleDescriptor> OtherDescriptors { get; } = new[]
    {
        RuleCatalog.NotElaborated, RuleCatalog.ElaborationBudgetExceeded, RuleCatalog.DesignThrows, RuleCatalog.InvalidOption,
    };

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
        base.AnalyzeDesign(context);
    }
}
