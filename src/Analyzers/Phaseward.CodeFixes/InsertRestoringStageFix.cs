using System.Collections.Immutable;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Phaseward.Checking;

namespace Phaseward.CodeFixes;

/// <summary>PW2001: inserts a restoring stage (the DSL method <see cref="StageMethod"/>) at each split point of an over-long pass-gate chain.</summary>
public abstract class InsertRestoringStageFix : CodeFixProvider
{
    /// <summary>The Circuit method that makes the stage ("Buffer" or "Inverter").</summary>
    protected abstract string StageMethod { get; }

    protected abstract string ActionTitle { get; }

    protected abstract string EquivalenceKey { get; }

    public sealed override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(RuleCatalog.SeriesPassGates.Id);

    public sealed override FixAllProvider GetFixAllProvider() => new RestoringStageFixAllProvider(StageMethod, ActionTitle);

    public sealed override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        var solution = context.Document.Project.Solution;
        foreach (var diagnostic in context.Diagnostics)
        {
            var edits = await RestoringStageInsertion.PlanAsync(solution, diagnostic, StageMethod, context.CancellationToken).ConfigureAwait(false);
            if (edits is null) continue;
            context.RegisterCodeFix(
                CodeAction.Create(ActionTitle, ct => RestoringStageInsertion.ApplyAsync(solution, edits, ct), EquivalenceKey),
                diagnostic);
        }
    }
}
