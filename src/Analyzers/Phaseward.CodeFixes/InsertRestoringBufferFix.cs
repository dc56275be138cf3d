using System.Collections.Immutable;
using System.Composition;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;

namespace Phaseward.CodeFixes
{
    /// <summary>PW2001: inserts a restoring buffer (keeps the polarity) at each split point of an over-long pass-gate chain.</summary>
    [ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(InsertRestoringBufferFix)), Shared]
    public sealed class InsertRestoringBufferFix : CodeFixProvider
    {
        public const string Title = "Insert a restoring buffer";

        public override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(RuleIds.SeriesPassGates);

        public override FixAllProvider GetFixAllProvider() => new RestoringStageFixAllProvider("Buffer", Title);

        public override async Task RegisterCodeFixesAsync(CodeFixContext context)
        {
            foreach (var diagnostic in context.Diagnostics)
            {
                var edits = await RestoringStageInsertion.PlanAsync(context.Document.Project.Solution, diagnostic, "Buffer", context.CancellationToken).ConfigureAwait(false);
                if (edits is null) continue;
                var solution = context.Document.Project.Solution;
                context.RegisterCodeFix(
                    CodeAction.Create(Title, ct => RestoringStageInsertion.ApplyAsync(solution, edits, ct), EquivalenceKeys.InsertRestoringBuffer),
                    diagnostic);
            }
        }
    }
}
