using System.Collections.Generic;
using System.Collections.Immutable;
using System.Composition;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Editing;
using Microsoft.CodeAnalysis.Operations;
using Microsoft.CodeAnalysis.Text;
using Phaseward.Checking;
using Phaseward.Netlists;
using Phaseward.Rules.DynamicStorage;

namespace Phaseward.CodeFixes;

/// <summary>
/// PW3001: clocks the dynamic cell from the ungated clock upstream of its clock gate instead of the gated one
/// (<c>burst.High</c> → <c>capture.High</c>; for a register, <c>burst</c> → <c>capture</c>). A free-running clock
/// keeps refreshing the node, so it no longer floats while the gate is off.
/// </summary>
/// <remarks>
/// The rewrite must be provably the right one, so the fix is offered only when all of this holds, and otherwise
/// not at all:
/// <list type="bullet">
/// <item>the diagnostic sits on the <c>DynamicLatch</c>/<c>DynamicRegister</c> call that made the node (property
/// <c>Cell</c>), written where the rewrite is local (see <see cref="DesignCallSite"/>);</item>
/// <item>its phase argument is <c>X.High</c>/<c>X.Low</c> (its clock argument <c>X</c>, for a register), X a local
/// variable assigned once, from a <c>ClockGate</c> call;</item>
/// <item>following each gate's clock argument through locals assigned once from <c>ClockGate</c> calls, passing
/// the gate the finding names (an additional location of the diagnostic), leads to a local assigned once from the
/// call that declares the ungated clock the finding names (property <c>UngatedClock</c>, matched against the
/// call's constant <c>name</c> argument). Only gates are skipped, and gates add no delay, so the new clock has the
/// old one's period, duty and timing;</item>
/// <item>that local is in scope at the call under its own name (not shadowed).</item>
/// </list>
/// </remarks>
[ExportCodeFixProvider(Microsoft.CodeAnalysis.LanguageNames.CSharp, Name = nameof(ClockFromUngatedClockCodeFix)), Shared]
public sealed class ClockFromUngatedClockCodeFix : CodeFixProvider
{
    private const int MaxChain = 32;

    public override ImmutableArray<string> FixableDiagnosticIds { get; } = ImmutableArray.Create(RuleCatalog.DynamicNodeOnGatedClock.Id);

    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        foreach (var diagnostic in context.Diagnostics)
        {
            if (!diagnostic.Properties.TryGetValue(FindingPropertyKeys.Cell, out var cell) || cell is null
                || !diagnostic.Properties.TryGetValue(FindingPropertyKeys.UngatedClock, out var ungated) || ungated is null
                || (cell != nameof(MacroKind.DynamicLatch) && cell != nameof(MacroKind.DynamicRegister)))
                continue;
            diagnostic.Properties.TryGetValue(FindingPropertyKeys.GatedClock, out var gated);

            var site = await DesignCallSite.FindAsync(context.Document, diagnostic, cell, context.CancellationToken).ConfigureAwait(false);
            if (site is not { } found
                || !await DesignCallSite.IsLocalAsync(context.Document, found.Model, found.Call, context.CancellationToken).ConfigureAwait(false)
                || Rewrite(found.Operation, found.Model, diagnostic, ungated, gated, context.CancellationToken) is not { } rewrite)
                continue;

            var document = context.Document;
            context.RegisterCodeFix(
                CodeAction.Create($"Clock it from the ungated clock '{ungated}'",
                    ct => ReplaceAsync(document, rewrite.Span, rewrite.NewName, ct),
                    EquivalenceKeys.ClockFromUngatedClock),
                diagnostic);
        }
    }

    /// <summary>The identifier to replace (the clock variable in the call's phase or clock argument) and the new name.</summary>
    private static (TextSpan Span, string NewName)? Rewrite(IInvocationOperation call, SemanticModel model, Diagnostic diagnostic,
        string ungated, string? gated, CancellationToken cancellationToken)
    {
        var argument = call.Arguments.FirstOrDefault(a => a.Parameter?.Name is "transparent" or "clock");
        if (argument?.Syntax is not ArgumentSyntax { Expression: var expression })
            return null;

        IdentifierNameSyntax? clockName = argument.Parameter!.Name == "transparent"
            ? expression is MemberAccessExpressionSyntax { Expression: IdentifierNameSyntax x, Name.Identifier.ValueText: "High" or "Low" } ? x : null
            : expression as IdentifierNameSyntax;
        if (clockName is null || model.GetSymbolInfo(clockName, cancellationToken).Symbol is not ILocalSymbol local)
            return null;

        var passedGate = false;
        for (var step = 0; step < MaxChain; step++)
        {
            if (AssignedOnceFrom(local, model, cancellationToken) is not { } made)
                return null;
            var method = made.TargetMethod.Name;
            var name = ConstantName(made);
            if (passedGate && name == ungated && method is "Clock" or "BufferedClock")
                return InScope(local, model, call.Syntax.SpanStart) ? (clockName.Span, local.Name) : null;
            if (method != "ClockGate")
                return null; // a buffer or another root before the ungated clock: not a drop-in swap
            if ((gated is not null && name == gated)
                || diagnostic.AdditionalLocations.Any(l => l.SourceTree == made.Syntax.SyntaxTree && l.SourceSpan == made.Syntax.Span))
                passedGate = true;
            if (made.Arguments.FirstOrDefault(a => a.Parameter?.Name == "clock")?.Syntax is not ArgumentSyntax { Expression: IdentifierNameSyntax upstream }
                || model.GetSymbolInfo(upstream, cancellationToken).Symbol is not ILocalSymbol next)
                return null;
            local = next;
        }

        return null;
    }

    // The DSL call a local is initialised from, provided nothing else ever writes the local.
    private static IInvocationOperation? AssignedOnceFrom(ILocalSymbol local, SemanticModel model, CancellationToken cancellationToken)
    {
        if (local.DeclaringSyntaxReferences.Length != 1
            || local.DeclaringSyntaxReferences[0].GetSyntax(cancellationToken) is not VariableDeclaratorSyntax { Initializer.Value: var value } declarator
            || declarator.SyntaxTree != model.SyntaxTree)
            return null;
        if (model.GetOperation(value, cancellationToken) is not IInvocationOperation made
            || made.TargetMethod.ContainingType?.ToDisplayString() != DesignCallSite.CircuitTypeName)
            return null;

        var scope = declarator.Ancestors().FirstOrDefault(a => a is BlockSyntax or SwitchSectionSyntax) ?? declarator.Parent!;
        foreach (var use in scope.DescendantNodes().OfType<IdentifierNameSyntax>())
        {
            if (use.Identifier.ValueText != local.Name
                || !SymbolEqualityComparer.Default.Equals(model.GetSymbolInfo(use, cancellationToken).Symbol, local))
                continue;
            if (IsWritten(use))
                return null;
        }

        return made;
    }

    private static bool IsWritten(IdentifierNameSyntax use)
    {
        for (SyntaxNode node = use; node.Parent is { } parent; node = parent)
        {
            switch (parent)
            {
                case AssignmentExpressionSyntax assignment when assignment.Left.Span.Contains(use.Span):
                    return true;
                case ArgumentSyntax argument when !argument.RefKindKeyword.IsKind(SyntaxKind.None) && argument.Expression == node:
                    return true;
                case RefExpressionSyntax:
                    return true;
                case StatementSyntax:
                    return false;
            }
        }

        return false;
    }

    private static string? ConstantName(IInvocationOperation made)
        => made.Arguments.FirstOrDefault(a => a.Parameter?.Name == "name")?.Value.ConstantValue is { HasValue: true, Value: string text } ? text : null;

    private static bool InScope(ILocalSymbol local, SemanticModel model, int position)
        => model.LookupSymbols(position, name: local.Name) is { Length: 1 } found
           && SymbolEqualityComparer.Default.Equals(found[0], local);

    private static async Task<Document> ReplaceAsync(Document document, TextSpan span, string newName, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        if (editor.OriginalRoot.FindNode(span, getInnermostNodeForTie: true) is not IdentifierNameSyntax old)
            return document;
        editor.ReplaceNode(old, editor.Generator.IdentifierName(newName).WithTriviaFrom(old));
        return editor.GetChangedDocument();
    }
}
