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
using Phaseward.Checking;
using Phaseward.Rules.ClockPhases;

namespace Phaseward.CodeFixes;

/// <summary>
/// PW1001 (latches transparent in the same phase in series). Two fixes, both local to latch B's call:
/// <list type="bullet">
/// <item>"Switch 'B' to clk.Low": B's phase argument becomes the complementary phase (<c>x.High</c> ↔ <c>x.Low</c>,
/// <c>p.Complement</c> → <c>p</c>, any other phase expression <c>p</c> → <c>p.Complement</c>).</item>
/// <item>When B is a register's master: "Insert a latch on clk.High before 'R'": the register's data <c>d</c> becomes
/// <c>c.Inverter(c.DynamicLatch(d, clk.High))</c> (<c>StaticLatch</c> for a static register). A latch inverts its
/// data; the inverter restores the polarity the register had.</item>
/// </list>
/// A fix is offered only when its result is unambiguous: the diagnostic sits on B's own DSL call, that call runs
/// once (directly in Describe: not in a helper method, a loop, a local function or a lambda, where one call makes
/// several latches and one change would move them all), all of B's clocked gates come from that call, and B is not
/// its own source (a latch fed back to itself stays in its own window whatever its phase).
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(SameWindowLatchesCodeFix)), Shared]
public sealed class SameWindowLatchesCodeFix : CodeFixProvider
{
    public override ImmutableArray<string> FixableDiagnosticIds { get; } = ImmutableArray.Create(RuleCatalog.SameWindowLatches.Id);

    public override FixAllProvider GetFixAllProvider() => FixAll.Instance;

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        var root = await context.Document.GetSyntaxRootAsync(context.CancellationToken).ConfigureAwait(false);
        var model = await context.Document.GetSemanticModelAsync(context.CancellationToken).ConfigureAwait(false);
        if (root is null || model is null)
            return;
        foreach (var diagnostic in context.Diagnostics)
        {
            if (Plan.For(diagnostic, root, model, context.CancellationToken) is not { } plan)
                continue;
            context.RegisterCodeFix(
                CodeAction.Create(plan.Title, ct => Apply(context.Document, new[] { plan }, ct), plan.EquivalenceKey),
                diagnostic);
        }
    }

    private static async Task<Document> Apply(Document document, IEnumerable<Plan> plans, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        foreach (var plan in plans)
            editor.ReplaceNode(plan.Target, plan.Replacement(editor.Generator).WithTriviaFrom(plan.Target));
        return editor.GetChangedDocument();
    }

    /// <summary>One fix: which node is replaced by what, and how the action is named.</summary>
    private sealed class Plan
    {
        private Plan(Diagnostic diagnostic, InvocationExpressionSyntax call, SyntaxNode target, System.Func<SyntaxGenerator, SyntaxNode> replacement,
            string title, string equivalenceKey)
        {
            Diagnostic = diagnostic;
            Call = call;
            Target = target;
            Replacement = replacement;
            Title = title;
            EquivalenceKey = equivalenceKey;
        }

        public Diagnostic Diagnostic { get; }

        /// <summary>B's call (several diagnostics may share it).</summary>
        public InvocationExpressionSyntax Call { get; }

        /// <summary>The expression the fix replaces (B's phase argument, or the register's data argument).</summary>
        public SyntaxNode Target { get; }

        public System.Func<SyntaxGenerator, SyntaxNode> Replacement { get; }

        public string Title { get; }

        public string EquivalenceKey { get; }

        public string TargetLatch => Property(Diagnostic, FindingPropertyKeys.TargetLatch) ?? string.Empty;

        public string SourceLatch => Property(Diagnostic, FindingPropertyKeys.SourceLatch) ?? string.Empty;

        public static Plan? For(Diagnostic diagnostic, SyntaxNode root, SemanticModel model, CancellationToken cancellationToken)
        {
            if (diagnostic.Id != RuleCatalog.SameWindowLatches.Id || !diagnostic.Location.IsInSource
                || diagnostic.Location.SourceTree != root.SyntaxTree)
                return null;
            var target = Property(diagnostic, FindingPropertyKeys.TargetLatch);
            var source = Property(diagnostic, FindingPropertyKeys.SourceLatch);
            if (string.IsNullOrEmpty(target) || target == source || Property(diagnostic, FindingPropertyKeys.PhaseSetByOneCall) != "true")
                return null;

            var span = diagnostic.Location.SourceSpan;
            var call = root.FindNode(span, getInnermostNodeForTie: true).FirstAncestorOrSelf<InvocationExpressionSyntax>();
            if (call is null || call.Span != span || !RunsOnce(call))
                return null;
            if (model.GetOperation(call, cancellationToken) is not IInvocationOperation invocation
                || invocation.TargetMethod.ContainingType is not { Name: "Circuit" } circuit
                || circuit.ContainingNamespace?.ToDisplayString() != "Phaseward"
                || invocation.Instance is null
                || call.Expression is not MemberAccessExpressionSyntax { Expression: var receiver })
                return null;

            return Property(diagnostic, FindingPropertyKeys.IsRegisterStage) == "true"
                ? InsertLatch(diagnostic, call, invocation, receiver, target!)
                : SwitchPhase(diagnostic, call, invocation, model, target!, cancellationToken);
        }

        private static Plan? SwitchPhase(Diagnostic diagnostic, InvocationExpressionSyntax call, IInvocationOperation invocation, SemanticModel model,
            string latch, CancellationToken cancellationToken)
        {
            if (invocation.TargetMethod.Name is not ("DynamicLatch" or "StaticLatch" or "TransmissionGate"))
                return null;
            var argument = invocation.Arguments.FirstOrDefault(a => IsDslType(a.Parameter?.Type, "Phase"));
            if (argument is null || argument.ArgumentKind != ArgumentKind.Explicit || argument.Syntax is not ArgumentSyntax { Expression: var phase })
                return null;
            var polarity = Property(diagnostic, FindingPropertyKeys.Polarity);
            var complement = Property(diagnostic, FindingPropertyKeys.ComplementPolarity);
            if (polarity is not ("High" or "Low") || complement is not ("High" or "Low") || polarity == complement)
                return null;

            // x.High / x.Low (x a Clock): the other member of the same clock expression.
            if (phase is MemberAccessExpressionSyntax { Name: IdentifierNameSyntax name } access
                && model.GetSymbolInfo(access, cancellationToken).Symbol is IPropertySymbol property)
            {
                if (IsDslType(property.ContainingType, "Clock") && (property.Name == "High" || property.Name == "Low"))
                {
                    if (property.Name != polarity)
                        return null; // the argument does not say what the finding says: leave it to the designer
                    var switched = access.WithName(SyntaxFactory.IdentifierName(complement).WithTriviaFrom(name));
                    return new Plan(diagnostic, call, phase, _ => switched,
                        $"Switch '{latch}' to {switched.WithoutTrivia()}", EquivalenceKeys.SwitchLatchPhase);
                }

                // p.Complement → p.
                if (IsDslType(property.ContainingType, "Phase") && property.Name == "Complement")
                {
                    var inner = access.Expression;
                    return new Plan(diagnostic, call, phase, _ => inner.WithoutTrivia(),
                        $"Switch '{latch}' to {inner.WithoutTrivia()}", EquivalenceKeys.SwitchLatchPhase);
                }
            }

            // Any other phase expression p → p.Complement.
            return new Plan(diagnostic, call, phase,
                g => g.MemberAccessExpression(phase.WithoutTrivia(), "Complement"),
                $"Switch '{latch}' to {phase.WithoutTrivia()}.Complement", EquivalenceKeys.SwitchLatchPhase);
        }

        private static Plan? InsertLatch(Diagnostic diagnostic, InvocationExpressionSyntax call, IInvocationOperation invocation, ExpressionSyntax receiver,
            string latch)
        {
            var latchMethod = invocation.TargetMethod.Name switch
            {
                "DynamicRegister" => "DynamicLatch",
                "StaticRegister" => "StaticLatch",
                _ => null,
            };
            var register = Property(diagnostic, FindingPropertyKeys.Register);
            // Only the master is fed from outside the register; the new latch takes the complement of its phase.
            var complementPolarity = Property(diagnostic, FindingPropertyKeys.ComplementPolarity);
            if (latchMethod is null || register is null || latch != register + ".master" || complementPolarity is not ("High" or "Low"))
                return null;
            var data = Explicit(invocation, "d");
            var clock = Explicit(invocation, "clock");
            // The clock and circuit expressions are repeated in the new code: only plain names, which read the same
            // value twice (a call such as c.ClockGate(...) would make a second clock).
            if (data is null || clock is null || !IsPlainName(clock) || !IsPlainName(receiver))
                return null;

            var phaseText = $"{clock.WithoutTrivia()}.{complementPolarity}";
            var latchKind = latchMethod == "DynamicLatch" ? "dynamic latch" : "static latch";
            return new Plan(diagnostic, call, data,
                g =>
                {
                    var newLatch = g.InvocationExpression(g.MemberAccessExpression(receiver.WithoutTrivia(), latchMethod),
                        data.WithoutTrivia(), g.MemberAccessExpression(clock.WithoutTrivia(), complementPolarity));
                    return g.InvocationExpression(g.MemberAccessExpression(receiver.WithoutTrivia(), "Inverter"), newLatch);
                },
                $"Insert a {latchKind} on {phaseText} before '{register}' (with an inverter, so the data keeps its polarity)",
                EquivalenceKeys.InsertLatchBeforeRegister);
        }

        private static ExpressionSyntax? Explicit(IInvocationOperation invocation, string parameter)
            => invocation.Arguments.FirstOrDefault(a => a.Parameter?.Name == parameter) is { ArgumentKind: ArgumentKind.Explicit, Syntax: ArgumentSyntax argument }
                ? argument.Expression
                : null;

        private static bool IsPlainName(ExpressionSyntax expression) => expression switch
        {
            IdentifierNameSyntax => true,
            ThisExpressionSyntax => true,
            MemberAccessExpressionSyntax { Name: IdentifierNameSyntax } access => IsPlainName(access.Expression),
            _ => false,
        };

        private static bool IsDslType(ITypeSymbol? type, string name)
            => type is not null && type.Name == name && type.ContainingNamespace?.ToDisplayString() == "Phaseward";

        /// <summary>True when the call sits directly in a Describe override, outside loops, local functions and lambdas.</summary>
        private static bool RunsOnce(SyntaxNode call)
        {
            foreach (var node in call.Ancestors())
            {
                switch (node)
                {
                    case ForStatementSyntax or ForEachStatementSyntax or WhileStatementSyntax or DoStatementSyntax
                        or LocalFunctionStatementSyntax or AnonymousFunctionExpressionSyntax:
                        return false;
                    case MethodDeclarationSyntax method:
                        return method.Identifier.ValueText == "Describe" && method.Modifiers.Any(SyntaxKind.OverrideKeyword)
                               && !method.DescendantNodes().OfType<GotoStatementSyntax>().Any();
                    case MemberDeclarationSyntax:
                        return false;
                }
            }

            return false;
        }
    }

    private static string? Property(Diagnostic diagnostic, string key)
        => diagnostic.Properties.TryGetValue(key, out var value) ? value : null;

    /// <summary>
    /// FixAll in a document. Fixes interact: switching B changes B's window for the latches B feeds. In a chain
    /// A→B→C all on one phase (PW1001 at B and at C), switching both B and C leaves B and C in one window again; so
    /// the latches are visited upstream first and a latch whose source has just been switched is left as it is
    /// (its finding is resolved by the source's switch). Diagnostics that share a call are fixed once.
    /// </summary>
    private sealed class FixAll : DocumentBasedFixAllProvider
    {
        public static readonly FixAll Instance = new();

        protected override string GetFixAllTitle(FixAllContext fixAllContext)
            => fixAllContext.CodeActionEquivalenceKey == EquivalenceKeys.InsertLatchBeforeRegister
                ? "Insert a latch of the complementary phase before every register that PW1001 reports in the document"
                : "Switch every latch that PW1001 reports in the document to its complementary phase";

        protected override async Task<Document?> FixAllAsync(FixAllContext fixAllContext, Document document, ImmutableArray<Diagnostic> diagnostics)
        {
            var root = await document.GetSyntaxRootAsync(fixAllContext.CancellationToken).ConfigureAwait(false);
            var model = await document.GetSemanticModelAsync(fixAllContext.CancellationToken).ConfigureAwait(false);
            if (root is null || model is null)
                return document;
            var plans = diagnostics
                .Select(d => Plan.For(d, root, model, fixAllContext.CancellationToken))
                .Where(p => p is not null && p.EquivalenceKey == fixAllContext.CodeActionEquivalenceKey)
                .Select(p => p!)
                .OrderBy(p => p.Call.SpanStart)
                .ToList();
            var chosen = fixAllContext.CodeActionEquivalenceKey == EquivalenceKeys.SwitchLatchPhase ? ChooseSwitches(plans) : OnePerCall(plans);
            return chosen.Count == 0 ? document : await Apply(document, chosen, fixAllContext.CancellationToken).ConfigureAwait(false);
        }

        private static List<Plan> OnePerCall(List<Plan> plans)
            => plans.GroupBy(p => p.Call).Select(g => g.First()).ToList();

        private static List<Plan> ChooseSwitches(List<Plan> plans)
        {
            // Group by latch: a latch is switched once, whatever number of sources it has.
            var byLatch = plans.GroupBy(p => p.TargetLatch).ToDictionary(g => g.Key, g => g.ToList());
            var undecided = new List<string>(plans.Select(p => p.TargetLatch).Distinct());
            var switched = new HashSet<string>();
            var chosen = new List<Plan>();
            while (undecided.Count > 0)
            {
                // Upstream first: a latch none of whose sources still waits for a decision; on a loop, the first in the document.
                var next = undecided.FirstOrDefault(l => byLatch[l].All(p => !undecided.Contains(p.SourceLatch))) ?? undecided[0];
                undecided.Remove(next);
                var group = byLatch[next];
                if (group.Any(p => switched.Contains(p.SourceLatch)))
                    continue;
                switched.Add(next);
                chosen.Add(group[0]);
            }

            return chosen.GroupBy(p => p.Target).Select(g => g.First()).ToList();
        }
    }
}
