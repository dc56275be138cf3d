using System.Collections.Generic;
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
/// PW1004: latches the clock gate's enable on the phase in which the gate blocks the clock:
/// <c>c.ClockGate(clk, en, name: "g")</c> becomes <c>c.ClockGate(clk, c.Inverter(c.StaticLatch(en, clk.Low)), name: "g")</c>
/// for a gate that stops low (<c>clk.High</c> for one that stops high). The latch is shut while the gate passes the
/// clock, so the enable holds still then; the inverter restores the polarity (library latches invert). A static latch,
/// so the enable holds while the clock is stopped. No names are given to the new cells, so a gate made in a loop
/// does not make two cells of one name.
/// </summary>
/// <remarks>
/// Offered only where this is the fix, and the rewrite is local:
/// <list type="bullet">
/// <item>the enable comes from a primary input taken as changing at any time, or from a latch that opens while the
/// gate passes the clock (property <c>OpensWhilePassing</c>). Not when the latch is on the right phase and only the
/// logic after it is slow (shorten that path), nor from a clock with no fixed time relation (that needs a
/// synchronizer);</item>
/// <item>the diagnostic sits on the <c>ClockGate</c> call, written where the rewrite is local (see
/// <see cref="DesignCallSite"/>);</item>
/// <item>its receiver and clock argument are locals or parameters: repeating anything else could make a second
/// clock or repeat a side effect.</item>
/// </list>
/// Several diagnostics on one call (a gate made in a loop) are fixed by one rewrite; FixAll rewrites each call once.
/// </remarks>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(LatchClockGateEnableCodeFix)), Shared]
public sealed class LatchClockGateEnableCodeFix : CodeFixProvider
{
    public override ImmutableArray<string> FixableDiagnosticIds { get; } = ImmutableArray.Create(RuleCatalog.ClockGateEnable.Id);

    public override FixAllProvider GetFixAllProvider() => FixAllProvider.Create(FixAllAsync);

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        foreach (var diagnostic in context.Diagnostics)
        {
            if (await SiteAsync(context.Document, diagnostic, context.CancellationToken).ConfigureAwait(false) is not { } site)
                continue;
            var document = context.Document;
            context.RegisterCodeFix(
                CodeAction.Create($"Latch the enable on {site.Phase}, while the gate blocks the clock",
                    ct => RewriteAsync(document, new[] { site.Span }, ct), EquivalenceKeys.LatchClockGateEnable),
                diagnostic);
        }
    }

    private static async Task<Document?> FixAllAsync(FixAllContext context, Document document, ImmutableArray<Diagnostic> diagnostics)
    {
        var spans = new List<TextSpan>();
        foreach (var diagnostic in diagnostics)
            if (await SiteAsync(document, diagnostic, context.CancellationToken).ConfigureAwait(false) is { } site && !spans.Contains(site.Span))
                spans.Add(site.Span);
        return spans.Count == 0 ? document : await RewriteAsync(document, spans, context.CancellationToken).ConfigureAwait(false);
    }

    // The gate call to rewrite and the phase to latch on (for the action's title), or null when the fix does not apply.
    private static async Task<(TextSpan Span, string Phase)?> SiteAsync(Document document, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        if (!diagnostic.Properties.TryGetValue(FindingPropertyKeys.Origin, out var origin)
            || !diagnostic.Properties.TryGetValue(FindingPropertyKeys.BlockingPolarity, out var polarity)
            || polarity is not ("High" or "Low")
            || !diagnostic.Properties.TryGetValue(FindingPropertyKeys.BlockingPhase, out var phase) || phase is null)
            return null;
        var wrongPhase = origin == FindingPropertyValues.EnableFromLatch
            && diagnostic.Properties.TryGetValue(FindingPropertyKeys.OpensWhilePassing, out var opens) && opens == "true";
        if (origin != FindingPropertyValues.EnableFromInput && !wrongPhase)
            return null;

        var site = await DesignCallSite.FindAsync(document, diagnostic, "ClockGate", cancellationToken).ConfigureAwait(false);
        if (site is not { } found
            || Parts(found.Operation, found.Model, cancellationToken) is null
            || BlockingPhase(found.Operation) != polarity
            || !await DesignCallSite.IsLocalAsync(document, found.Model, found.Call, cancellationToken).ConfigureAwait(false))
            return null;
        return (found.Call.Span, phase);
    }

    // The call's receiver (the circuit), its clock argument and its enable argument; null when not of the accepted shape.
    private static (ExpressionSyntax Circuit, ExpressionSyntax Clock, ExpressionSyntax Enable)? Parts(IInvocationOperation call, SemanticModel model,
        CancellationToken cancellationToken)
    {
        if (call.Syntax is not InvocationExpressionSyntax { Expression: MemberAccessExpressionSyntax { Expression: var circuit } }
            || !IsPlainName(circuit, model, cancellationToken)
            || call.Arguments.FirstOrDefault(a => a.Parameter?.Name == "clock")?.Syntax is not ArgumentSyntax { Expression: var clock }
            || !IsPlainName(clock, model, cancellationToken)
            || call.Arguments.FirstOrDefault(a => a.Parameter?.Name == "enable")?.Syntax is not ArgumentSyntax { Expression: var enable })
            return null;
        return (circuit, clock, enable);
    }

    // A local or a parameter: reading it twice reads the same object and does nothing else.
    private static bool IsPlainName(ExpressionSyntax expression, SemanticModel model, CancellationToken cancellationToken)
        => expression is IdentifierNameSyntax name
           && model.GetSymbolInfo(name, cancellationToken).Symbol is ILocalSymbol or IParameterSymbol;

    private static async Task<Document> RewriteAsync(Document document, IReadOnlyList<TextSpan> spans, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        var g = editor.Generator;
        foreach (var span in spans)
        {
            var call = editor.OriginalRoot.FindNode(span, getInnermostNodeForTie: true).AncestorsAndSelf()
                .OfType<InvocationExpressionSyntax>().FirstOrDefault(i => i.Span == span);
            if (call is null || editor.SemanticModel.GetOperation(call, cancellationToken) is not IInvocationOperation operation
                || Parts(operation, editor.SemanticModel, cancellationToken) is not { } parts
                || BlockingPhase(operation) is not { } blocking)
                continue;

            var latched = g.InvocationExpression(g.MemberAccessExpression(parts.Circuit.WithoutTrivia(), "StaticLatch"),
                parts.Enable.WithoutTrivia(), g.MemberAccessExpression(parts.Clock.WithoutTrivia(), blocking));
            var restored = g.InvocationExpression(g.MemberAccessExpression(parts.Circuit.WithoutTrivia(), "Inverter"), latched);
            editor.ReplaceNode(parts.Enable, restored.WithTriviaFrom(parts.Enable));
        }

        return editor.GetChangedDocument();
    }

    // The source clock's phase in which the gate blocks it: Low for a gate that stops low (the default), High for one
    // that stops high; null when the stop level is not a constant.
    private static string? BlockingPhase(IInvocationOperation call)
    {
        var stops = call.Arguments.FirstOrDefault(a => a.Parameter?.Name == "stopsAt");
        if (stops is null || stops.ArgumentKind == ArgumentKind.DefaultValue)
            return "Low";
        return stops.Value.ConstantValue is { HasValue: true, Value: int level }
            ? level == (int)ClockStopLevel.Low ? "Low" : level == (int)ClockStopLevel.High ? "High" : null
            : null;
    }
}
