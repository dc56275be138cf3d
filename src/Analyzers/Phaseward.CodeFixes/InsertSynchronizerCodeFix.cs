using System.Collections.Immutable;
using System.Composition;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Editing;
using Microsoft.CodeAnalysis.Operations;
using Microsoft.CodeAnalysis.Text;
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.CodeFixes;

/// <summary>
/// PW1003: puts a two-register synchronizer on the receiving clock in front of the stage that receives the crossing
/// data: <c>c.DynamicRegister(x, rx, "R")</c> becomes <c>c.DynamicRegister(c.StaticRegister(c.StaticRegister(x, rx), rx), rx, "R")</c>,
/// and <c>c.DynamicLatch(x, rx.Low, "L")</c> becomes <c>c.DynamicLatch(c.StaticRegister(c.StaticRegister(x, rx), rx), rx.Low, "L")</c>.
/// The first new register samples the crossing data and the second gives its metastability a period to resolve.
/// </summary>
/// <remarks>
/// Offered when the diagnostic sits on a latch or register cell call (<c>DynamicLatch</c>, <c>StaticLatch</c>,
/// <c>DynamicRegister</c>, <c>StaticRegister</c>) written where the rewrite is local (see <see cref="DesignCallSite"/>),
/// whose clock argument is a local or parameter (<c>rx</c>) or its Low phase (<c>rx.Low</c>): repeating anything else
/// could make a second clock or repeat a side effect. Not for a latch on <c>rx.High</c>: the rising-edge registers'
/// slave is open in that window too, so the latch would pass their data in the same phase (PW1001). The data argument keeps its comments and layout;
/// the rest of the call is untouched. Static registers, so the synchronizer also holds its value if the clock stops.
/// </remarks>
[ExportCodeFixProvider(Microsoft.CodeAnalysis.LanguageNames.CSharp, Name = nameof(InsertSynchronizerCodeFix)), Shared]
public sealed class InsertSynchronizerCodeFix : CodeFixProvider
{
    private static readonly string[] Cells = { "DynamicLatch", "StaticLatch", "DynamicRegister", "StaticRegister" };

    public override ImmutableArray<string> FixableDiagnosticIds { get; } = ImmutableArray.Create(RuleCatalog.ClockCrossing.Id);

    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        foreach (var diagnostic in context.Diagnostics)
        {
            if (!diagnostic.Properties.TryGetValue(FindingPropertyKeys.Clock, out var clock) || clock is null)
                continue;
            foreach (var cell in Cells)
            {
                var site = await DesignCallSite.FindAsync(context.Document, diagnostic, cell, context.CancellationToken).ConfigureAwait(false);
                if (site is not { } found
                    || Parts(found.Operation, found.Model, context.CancellationToken) is null
                    || !await DesignCallSite.IsLocalAsync(context.Document, found.Model, found.Call, context.CancellationToken).ConfigureAwait(false))
                    continue;

                var document = context.Document;
                var span = found.Call.Span;
                context.RegisterCodeFix(
                    CodeAction.Create($"Insert a two-register synchronizer on clock '{clock}'",
                        ct => InsertAsync(document, span, ct), EquivalenceKeys.InsertSynchronizer),
                    diagnostic);
                break;
            }
        }
    }

    // The call's receiver (the circuit), its data argument and the expression naming the receiving clock; null when
    // the call is not of the accepted shape.
    private static (ExpressionSyntax Circuit, ExpressionSyntax Data, ExpressionSyntax Clock)? Parts(IInvocationOperation call, SemanticModel model,
        CancellationToken cancellationToken)
    {
        if (call.Syntax is not InvocationExpressionSyntax { Expression: MemberAccessExpressionSyntax { Expression: var circuit } }
            || !IsPlainName(circuit, model, cancellationToken)
            || call.Arguments.FirstOrDefault(a => a.Parameter?.Name == "d")?.Syntax is not ArgumentSyntax { Expression: var data })
            return null;
        var timing = call.Arguments.FirstOrDefault(a => a.Parameter?.Name is "transparent" or "clock");
        if (timing?.Syntax is not ArgumentSyntax { Expression: var expression })
            return null;
        if (timing.Parameter!.Name == "clock")
            return IsPlainName(expression, model, cancellationToken) ? (circuit, data, expression) : null;
        return expression is MemberAccessExpressionSyntax { Expression: var clock, Name.Identifier.ValueText: "Low" }
               && IsPlainName(clock, model, cancellationToken)
            ? (circuit, data, clock)
            : null;
    }

    // A local or a parameter: reading it twice reads the same object and does nothing else.
    private static bool IsPlainName(ExpressionSyntax expression, SemanticModel model, CancellationToken cancellationToken)
        => expression is IdentifierNameSyntax name
           && model.GetSymbolInfo(name, cancellationToken).Symbol is ILocalSymbol or IParameterSymbol;

    private static async Task<Document> InsertAsync(Document document, TextSpan span, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        var call = editor.OriginalRoot.FindNode(span, getInnermostNodeForTie: true).AncestorsAndSelf()
            .OfType<InvocationExpressionSyntax>().FirstOrDefault(i => i.Span == span);
        if (call is null || editor.SemanticModel.GetOperation(call, cancellationToken) is not IInvocationOperation operation
            || Parts(operation, editor.SemanticModel, cancellationToken) is not { } parts)
            return document;

        var g = editor.Generator;
        SyntaxNode Register(SyntaxNode input) => g.InvocationExpression(
            g.MemberAccessExpression(parts.Circuit.WithoutTrivia(), "StaticRegister"), input, parts.Clock.WithoutTrivia());
        var synchronized = Register(Register(parts.Data.WithoutTrivia()));
        editor.ReplaceNode(parts.Data, synchronized.WithTriviaFrom(parts.Data));
        return editor.GetChangedDocument();
    }
}
