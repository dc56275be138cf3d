using System.Collections.Immutable;
using System.Composition;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Editing;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.CodeFixes;

/// <summary>
/// PW3001, PW3002: replaces the dynamic cell that made the node by its static counterpart with the same arguments
/// (<c>DynamicLatch</c> → <c>StaticLatch</c>, <c>DynamicRegister</c> → <c>StaticRegister</c>). The static cell's
/// clocked feedback keeps the node driven whether the clock runs slowly or is stopped at either level.
/// </summary>
/// <remarks>
/// Offered when the finding names the cell and its static replacement (properties <c>Cell</c>,
/// <c>StaticReplacement</c>) and the diagnostic sits on that very call, written where the rewrite is local (see
/// <see cref="DesignCallSite"/>). Only the method name changes; arguments, comments and layout stay.
/// </remarks>
[ExportCodeFixProvider(Microsoft.CodeAnalysis.LanguageNames.CSharp, Name = nameof(UseStaticCellCodeFix)), Shared]
public sealed class UseStaticCellCodeFix : CodeFixProvider
{
    public override ImmutableArray<string> FixableDiagnosticIds { get; } =
        ImmutableArray.Create(RuleCatalog.DynamicNodeOnGatedClock.Id, RuleCatalog.ClockTooSlowForDynamicStorage.Id);

    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        foreach (var diagnostic in context.Diagnostics)
        {
            if (!diagnostic.Properties.TryGetValue(FindingPropertyKeys.Cell, out var cell) || cell is null
                || !diagnostic.Properties.TryGetValue(FindingPropertyKeys.StaticReplacement, out var replacement) || replacement is null)
                continue;
            var (title, key) = replacement switch
            {
                nameof(MacroKind.StaticLatch) when cell == nameof(MacroKind.DynamicLatch) => ("Use a static latch", EquivalenceKeys.UseStaticLatch),
                nameof(MacroKind.StaticRegister) when cell == nameof(MacroKind.DynamicRegister) => ("Use a static register", EquivalenceKeys.UseStaticRegister),
                _ => (null, null),
            };
            if (title is null || key is null)
                continue;

            var site = await DesignCallSite.FindAsync(context.Document, diagnostic, cell, context.CancellationToken).ConfigureAwait(false);
            if (site is not { } found
                || MethodName(found.Call) is null
                || !await DesignCallSite.IsLocalAsync(context.Document, found.Model, found.Call, context.CancellationToken).ConfigureAwait(false))
                continue;

            var document = context.Document;
            var span = found.Call.Span;
            context.RegisterCodeFix(
                CodeAction.Create(title, ct => RenameAsync(document, span, replacement, ct), key),
                diagnostic);
        }
    }

    private static SimpleNameSyntax? MethodName(InvocationExpressionSyntax call) => call.Expression switch
    {
        MemberAccessExpressionSyntax access => access.Name,
        SimpleNameSyntax name => name,
        _ => null,
    };

    private static async Task<Document> RenameAsync(Document document, Microsoft.CodeAnalysis.Text.TextSpan span, string replacement, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        var call = editor.OriginalRoot.FindNode(span, getInnermostNodeForTie: true) as InvocationExpressionSyntax
            ?? editor.OriginalRoot.FindNode(span).FirstAncestorOrSelf<InvocationExpressionSyntax>();
        if (call is null || MethodName(call) is not { } name)
            return document;
        editor.ReplaceNode(name, editor.Generator.IdentifierName(replacement).WithTriviaFrom(name));
        return editor.GetChangedDocument();
    }
}
