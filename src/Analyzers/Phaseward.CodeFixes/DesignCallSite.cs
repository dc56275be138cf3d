using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.FindSymbols;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.CodeFixes;

/// <summary>
/// The DSL call a diagnostic is reported at, for code fixes that rewrite that call. A fix is offered only where the
/// rewrite is local: the call is written in this document (not a call to a helper that makes the node elsewhere),
/// and it sits in the design's Describe, or in a helper method or local function that has exactly one caller, so
/// changing it changes nothing else the design builds.
/// </summary>
internal static class DesignCallSite
{
    private const string CircuitTypeName = "Phaseward.Circuit";
    private const string DesignTypeName = "Phaseward.Design";

    /// <summary>The invocation of the <see cref="Circuit"/> method <paramref name="methodName"/> exactly at the diagnostic's location, or null.</summary>
    public static async Task<(InvocationExpressionSyntax Call, IInvocationOperation Operation, SemanticModel Model)?> FindAsync(
        Document document, Diagnostic diagnostic, string methodName, CancellationToken cancellationToken)
    {
        if (!diagnostic.Location.IsInSource)
            return null;
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        if (root is null || diagnostic.Location.SourceTree != root.SyntaxTree)
            return null;
        var span = diagnostic.Location.SourceSpan;
        var call = root.FindNode(span, getInnermostNodeForTie: true).AncestorsAndSelf()
            .OfType<InvocationExpressionSyntax>()
            .FirstOrDefault(i => i.Span == span);
        if (call is null)
            return null;
        var model = await document.GetSemanticModelAsync(cancellationToken).ConfigureAwait(false);
        if (model?.GetOperation(call, cancellationToken) is not IInvocationOperation operation
            || operation.TargetMethod.Name != methodName
            || !IsCircuitMethod(operation.TargetMethod))
            return null;
        return (call, operation, model);
    }

    /// <summary>True for a method of the DSL's <see cref="Circuit"/> type: the one test every code fix uses to know a call builds the design.</summary>
    public static bool IsCircuitMethod(IMethodSymbol method) => method.ContainingType?.ToDisplayString() == CircuitTypeName;

    /// <summary>True if rewriting <paramref name="call"/> changes only what this one call site builds (see the class remarks).</summary>
    public static async Task<bool> IsLocalAsync(Document document, SemanticModel model, SyntaxNode call, CancellationToken cancellationToken)
    {
        foreach (var ancestor in call.Ancestors())
        {
            switch (ancestor)
            {
                case AnonymousFunctionExpressionSyntax:
                    return false; // a lambda may run from anywhere, any number of times
                case LocalFunctionStatementSyntax local:
                    return model.GetDeclaredSymbol(local, cancellationToken) is IMethodSymbol function
                        && await HasOneCallerAsync(document, function, cancellationToken).ConfigureAwait(false);
                case MethodDeclarationSyntax method:
                    if (model.GetDeclaredSymbol(method, cancellationToken) is not IMethodSymbol symbol)
                        return false;
                    return IsDescribe(symbol) || await HasOneCallerAsync(document, symbol, cancellationToken).ConfigureAwait(false);
                case MemberDeclarationSyntax:
                    return false; // property, constructor, field initialiser: not a design's description
            }
        }

        return false;
    }

    private static bool IsDescribe(IMethodSymbol method)
    {
        for (var overridden = method; overridden is not null; overridden = overridden.OverriddenMethod)
            if (overridden.Name == "Describe" && overridden.ContainingType?.ToDisplayString() == DesignTypeName)
                return true;
        return false;
    }

    private static async Task<bool> HasOneCallerAsync(Document document, IMethodSymbol method, CancellationToken cancellationToken)
    {
        var references = await SymbolFinder.FindReferencesAsync(method, document.Project.Solution, cancellationToken).ConfigureAwait(false);
        return references.Sum(r => r.Locations.Count()) == 1;
    }
}
