using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Globalization;
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
using Phaseward.Rules.PassGatePaths;

namespace Phaseward.CodeFixes;

/// <summary>
/// Shared by the two PW2001 fixes (<see cref="InsertRestoringBufferFix"/>, <see cref="InsertRestoringInverterFix"/>):
/// plans where a restoring stage goes from the finding's split sites (<see cref="FindingPropertyKeys.SplitSites"/>)
/// and the syntax there, and applies the plan. Not a fix itself.
/// </summary>
/// <remarks>
/// <para>Every split point must be expressible, else no fix is offered (a partial fix would leave the chain over the
/// limit). A split whose next gate is the only pass device its call makes: the call's first argument (the net that
/// carries the chain into that gate) is wrapped, <c>c.TransmissionGate(x, p)</c> → <c>c.TransmissionGate(c.Buffer(x), p)</c>,
/// with the circuit receiver's name at that call.</para>
/// <para>A call that makes several gates (a loop) is fixed only when the loop itself says which iterations get the
/// stage: the call sits unconditionally in the body of a <c>for</c> loop over an int from a constant start, stepping
/// by one, not nested in another loop, lambda or helper, with no jumps in the body and the loop variable left alone;
/// every gate that call makes lies in this chain, one per iteration in order; and the split points at the call are
/// exactly every m-th gate (m = the spacing). The argument then becomes <c>cond ? c.Buffer(x) : x</c>, cond picking
/// those iterations. Anything else is not offered.</para>
/// </remarks>
internal static class RestoringStageInsertion
{
    /// <summary>One replacement: the argument expression at <see cref="Span"/> in a document becomes <see cref="Text"/>.</summary>
    internal sealed class Edit
    {
        public Edit(DocumentId document, TextSpan span, ExpressionSyntax replacement)
        {
            Document = document;
            Span = span;
            Replacement = replacement;
            Text = replacement.NormalizeWhitespace().ToFullString();
        }

        public DocumentId Document { get; }

        public TextSpan Span { get; }

        public ExpressionSyntax Replacement { get; }

        public string Text { get; }
    }

    /// <summary>The edits that restore the chain of one diagnostic, or null when a split point cannot be expressed.</summary>
    public static async Task<IReadOnlyList<Edit>?> PlanAsync(Solution solution, Diagnostic diagnostic, string stage, CancellationToken cancellationToken)
    {
        var properties = diagnostic.Properties;
        if (!properties.TryGetValue(FindingPropertyKeys.SplitSites, out var sitesText) || string.IsNullOrEmpty(sitesText)
            || !properties.TryGetValue(FindingPropertyKeys.SplitSpacing, out var spacingText)
            || !int.TryParse(spacingText, NumberStyles.None, CultureInfo.InvariantCulture, out var spacing) || spacing < 1)
            return null;
        var truncated = properties.TryGetValue(FindingPropertyKeys.SplitPointsTruncated, out var t) && t == "true";

        if (!SplitSite.TryParseAll(sitesText, out var sites) || sites.Any(site => site.Start < 0))
            return null;

        var edits = new List<Edit>();
        foreach (var group in sites.GroupBy(s => (s.Path, s.Start, s.Length)))
        {
            var edit = await PlanSiteAsync(solution, group.ToList(), spacing, truncated, stage, cancellationToken).ConfigureAwait(false);
            if (edit is null)
                return null;
            edits.Add(edit);
        }

        return edits;
    }

    /// <summary>Applies edits (duplicates merged; of two different edits to the same argument the first wins).</summary>
    public static async Task<Solution> ApplyAsync(Solution solution, IEnumerable<Edit> edits, CancellationToken cancellationToken)
    {
        foreach (var byDocument in edits.GroupBy(e => e.Document))
        {
            var document = solution.GetDocument(byDocument.Key);
            if (document is null) continue;
            var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
            var root = editor.OriginalRoot;
            var done = new HashSet<TextSpan>();
            foreach (var edit in byDocument)
            {
                if (!done.Add(edit.Span)) continue;
                var node = root.FindNode(edit.Span, getInnermostNodeForTie: true);
                while (node is not null && node.Span != edit.Span) node = node.Parent;
                if (node is ExpressionSyntax expression)
                    editor.ReplaceNode(expression, edit.Replacement.WithTriviaFrom(expression));
            }

            solution = editor.GetChangedDocument().Project.Solution;
        }

        return solution;
    }

    /// <summary>Keeps the first edit for each argument; drops a diagnostic's edits if one clashes with an edit kept earlier.</summary>
    public static void Merge(List<Edit> into, IReadOnlyList<Edit> edits)
    {
        foreach (var edit in edits)
            if (into.Any(e => e.Document == edit.Document && e.Span.OverlapsWith(edit.Span) && (e.Span != edit.Span || e.Text != edit.Text)))
                return;
        foreach (var edit in edits)
            if (!into.Any(e => e.Document == edit.Document && e.Span == edit.Span))
                into.Add(edit);
    }

    private static async Task<Edit?> PlanSiteAsync(Solution solution, List<SplitSite> splits, int spacing, bool truncated, string stage, CancellationToken cancellationToken)
    {
        var site = splits[0];
        var document = solution.Projects.SelectMany(p => p.Documents).FirstOrDefault(d => d.FilePath == site.Path);
        if (document is null) return null;
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        var model = await document.GetSemanticModelAsync(cancellationToken).ConfigureAwait(false);
        if (root is null || model is null || site.Start + site.Length > root.FullSpan.End) return null;
        var span = new TextSpan(site.Start, site.Length);
        var node = root.FindNode(span, getInnermostNodeForTie: true);
        while (node is not null && !(node is InvocationExpressionSyntax && node.Span == span)) node = node.Parent;
        if (node is not InvocationExpressionSyntax call) return null;

        if (model.GetOperation(call, cancellationToken) is not IInvocationOperation operation
            || operation.TargetMethod.ContainingType?.ToDisplayString() != "Phaseward.Circuit"
            || call.Expression is not MemberAccessExpressionSyntax access
            || !IsPlainReceiver(access.Expression))
            return null;
        var argument = operation.Arguments.FirstOrDefault(a => a.Parameter?.Ordinal == 0);
        if (argument?.Syntax is not ArgumentSyntax { Expression: { } input }
            || argument.Parameter!.Type.ToDisplayString() != "Phaseward.Net")
            return null;

        var generator = SyntaxGenerator.GetGenerator(document);
        ExpressionSyntax Restored() => (ExpressionSyntax)generator.InvocationExpression(
            generator.MemberAccessExpression(access.Expression.WithoutTrivia(), stage), input.WithoutTrivia());

        if (site.SiteGates == 1 && splits.Count == 1)
            return new Edit(document.Id, input.Span, Restored());

        // A call that makes several gates: only the loop form described in the remarks.
        if (truncated || site.HasCallers || site.RunCount != site.SiteGates || splits.Any(s => s.RunFirst != site.RunFirst || s.RunCount != site.RunCount))
            return null;
        if (LoopOf(call) is not { } loop || LoopVariable(loop, model, cancellationToken) is not { } variable || !IsSimple(input))
            return null;

        var (name, first) = variable;
        var p0 = site.RunFirst;
        var expected = new HashSet<int>();
        for (var k = 0; k < site.RunCount; k++)
        {
            var before = p0 + k - 1;
            if (before >= 1 && before % spacing == 0) expected.Add(p0 + k);
        }

        if (!expected.SetEquals(splits.Select(s => s.Position)))
            return null;

        var offset = p0 - 1 - first;
        var shifted = offset == 0 ? name : offset > 0 ? $"{name} + {offset}" : $"{name} - {-offset}";
        var conditions = new List<string>();
        if (p0 == 1) conditions.Add($"{name} > {first}");
        if (spacing > 1) conditions.Add(offset == 0 ? $"{name} % {spacing} == 0" : $"({shifted}) % {spacing} == 0");
        if (conditions.Count == 0)
            return new Edit(document.Id, input.Span, Restored());
        var condition = SyntaxFactory.ParseExpression(string.Join(" && ", conditions));
        var conditional = (ExpressionSyntax)generator.ConditionalExpression(condition, Restored(), input.WithoutTrivia());
        return new Edit(document.Id, input.Span, conditional);
    }

    private static bool IsPlainReceiver(ExpressionSyntax receiver)
        => receiver is IdentifierNameSyntax
           || receiver is MemberAccessExpressionSyntax { Expression: ThisExpressionSyntax, Name: IdentifierNameSyntax };

    // An argument that can be written twice in `cond ? stage(x) : x`: names, member and element accesses, literals and
    // arithmetic on them -- nothing that calls, assigns or creates.
    private static bool IsSimple(ExpressionSyntax input)
        => input.DescendantNodesAndSelf().All(n => n is not (InvocationExpressionSyntax or AssignmentExpressionSyntax
            or PrefixUnaryExpressionSyntax { RawKind: (int)SyntaxKind.PreIncrementExpression or (int)SyntaxKind.PreDecrementExpression }
            or PostfixUnaryExpressionSyntax or BaseObjectCreationExpressionSyntax or AnonymousFunctionExpressionSyntax
            or ConditionalAccessExpressionSyntax or AwaitExpressionSyntax or ThrowExpressionSyntax));

    // The `for` loop whose body runs the call once per iteration, unconditionally; null if there is none, or if the
    // loop is nested in another loop, a lambda or a local function.
    private static ForStatementSyntax? LoopOf(InvocationExpressionSyntax call)
    {
        ForStatementSyntax? loop = null;
        SyntaxNode child = call;
        for (var node = call.Parent; node is not null; child = node, node = node.Parent)
        {
            if (loop is null)
            {
                switch (node)
                {
                    case ForStatementSyntax f when child == f.Statement:
                        loop = f;
                        continue;
                    case ExpressionStatementSyntax or LocalDeclarationStatementSyntax or VariableDeclarationSyntax
                        or VariableDeclaratorSyntax or EqualsValueClauseSyntax or BlockSyntax or ArgumentSyntax or ArgumentListSyntax:
                        continue;
                    case AssignmentExpressionSyntax { RawKind: (int)SyntaxKind.SimpleAssignmentExpression } a when child == a.Right:
                        continue;
                    case InvocationExpressionSyntax or MemberAccessExpressionSyntax or ElementAccessExpressionSyntax
                        or BracketedArgumentListSyntax or CastExpressionSyntax or ParenthesizedExpressionSyntax:
                        continue;
                    default:
                        return null;
                }
            }

            if (node is ForStatementSyntax or ForEachStatementSyntax or WhileStatementSyntax or DoStatementSyntax
                or AnonymousFunctionExpressionSyntax or LocalFunctionStatementSyntax)
                return null;
            if (node is MemberDeclarationSyntax)
                break;
        }

        return loop;
    }

    // The loop's int variable and its constant start, when the loop steps it by one and nothing else writes it.
    private static (string Name, int First)? LoopVariable(ForStatementSyntax loop, SemanticModel model, CancellationToken cancellationToken)
    {
        if (loop.Declaration is not { Variables: { Count: 1 } variables } || variables[0].Initializer is not { } initializer
            || loop.Incrementors.Count != 1)
            return null;
        var declarator = variables[0];
        if (model.GetDeclaredSymbol(declarator, cancellationToken) is not ILocalSymbol local || local.Type.SpecialType != SpecialType.System_Int32)
            return null;
        if (model.GetConstantValue(initializer.Value, cancellationToken) is not { HasValue: true, Value: int first })
            return null;

        var name = declarator.Identifier.ValueText;
        var steps = loop.Incrementors[0] switch
        {
            PostfixUnaryExpressionSyntax { RawKind: (int)SyntaxKind.PostIncrementExpression, Operand: IdentifierNameSyntax id } => id.Identifier.ValueText == name,
            PrefixUnaryExpressionSyntax { RawKind: (int)SyntaxKind.PreIncrementExpression, Operand: IdentifierNameSyntax id } => id.Identifier.ValueText == name,
            AssignmentExpressionSyntax { RawKind: (int)SyntaxKind.AddAssignmentExpression, Left: IdentifierNameSyntax id, Right: LiteralExpressionSyntax { Token.Value: 1 } } => id.Identifier.ValueText == name,
            _ => false,
        };
        if (!steps) return null;

        if (loop.Statement.DescendantNodesAndSelf().Any(n => n is BreakStatementSyntax or ContinueStatementSyntax or GotoStatementSyntax
                or ReturnStatementSyntax or YieldStatementSyntax or ThrowStatementSyntax or ThrowExpressionSyntax))
            return null;
        var flow = model.AnalyzeDataFlow(loop.Statement);
        if (flow is null || !flow.Succeeded || flow.WrittenInside.Contains(local))
            return null;
        if (loop.Condition is not null && model.AnalyzeDataFlow(loop.Condition) is { Succeeded: true } conditionFlow && conditionFlow.WrittenInside.Contains(local))
            return null;
        return (name, first);
    }
}

/// <summary>FixAll for the PW2001 fixes: plans every diagnostic in scope and applies the merged edits once.</summary>
internal sealed class RestoringStageFixAllProvider : FixAllProvider
{
    private readonly string stage;
    private readonly string title;

    public RestoringStageFixAllProvider(string stage, string title)
    {
        this.stage = stage;
        this.title = title;
    }

    public override IEnumerable<FixAllScope> GetSupportedFixAllScopes()
        => new[] { FixAllScope.Document, FixAllScope.Project, FixAllScope.Solution };

    public override async Task<CodeAction?> GetFixAsync(FixAllContext fixAllContext)
    {
        var diagnostics = new List<Diagnostic>();
        var projects = fixAllContext.Scope switch
        {
            FixAllScope.Solution => fixAllContext.Solution.Projects.ToList(),
            _ => new List<Project> { fixAllContext.Project },
        };
        foreach (var project in projects)
        {
            if (fixAllContext.Scope == FixAllScope.Document && fixAllContext.Document is { } document)
                diagnostics.AddRange(await fixAllContext.GetDocumentDiagnosticsAsync(document).ConfigureAwait(false));
            else
                diagnostics.AddRange(await fixAllContext.GetAllDiagnosticsAsync(project).ConfigureAwait(false));
        }

        var solution = fixAllContext.Solution;
        var key = fixAllContext.CodeActionEquivalenceKey;
        return CodeAction.Create(title, async cancellationToken =>
        {
            var edits = new List<RestoringStageInsertion.Edit>();
            foreach (var diagnostic in diagnostics.Where(d => d.Id == RuleCatalog.SeriesPassGates.Id).OrderBy(d => d.Location.SourceSpan.Start))
            {
                var planned = await RestoringStageInsertion.PlanAsync(solution, diagnostic, stage, cancellationToken).ConfigureAwait(false);
                if (planned is not null)
                    RestoringStageInsertion.Merge(edits, planned);
            }

            return await RestoringStageInsertion.ApplyAsync(solution, edits, cancellationToken).ConfigureAwait(false);
        }, key);
    }
}
