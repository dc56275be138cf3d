using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>Turns syntax into <see cref="SourceSpan"/>s that agree with what the DSL records at run time.</summary>
internal static class SourceSites
{
    /// <summary>
    /// The span of <paramref name="node"/> (start and length cover the whole node) with the call chain that led to it.
    /// Line and column are those of the token C# uses for [CallerLineNumber] (the '(' of a call, the 'new' of an object
    /// creation), so a netlist elaborated at compile time names the same lines as one elaborated at run time.
    /// </summary>
    public static SourceSpan For(SyntaxNode node, IReadOnlyList<SourceSpan> callers)
    {
        var token = node switch
        {
            InvocationExpressionSyntax invocation => invocation.ArgumentList.OpenParenToken,
            BaseObjectCreationExpressionSyntax creation => creation.NewKeyword,
            ElementAccessExpressionSyntax access => access.ArgumentList.OpenBracketToken,
            _ => node.GetFirstToken(),
        };
        var position = node.SyntaxTree.GetLineSpan(token.Span).StartLinePosition;
        return new SourceSpan(node.SyntaxTree.FilePath, position.Line + 1, position.Character + 1, node.Span.Start, node.Span.Length, callers);
    }
}
