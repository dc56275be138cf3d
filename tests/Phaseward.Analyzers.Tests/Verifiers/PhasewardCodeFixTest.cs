using System.Collections.Generic;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace Phaseward.Analyzers.Tests.Verifiers;

/// <summary>
/// Code-fix test with the Phaseward set-up. Besides the framework's own checks (the fixed source matches, compiles
/// without errors and leaves exactly the expected diagnostics), every comment of the original source must survive
/// the fix: a fix may change code it was asked to change, never drop a designer's notes. The comment check reads the
/// expected fixed source, which the framework requires the fix's output to equal, so together they hold for the output
/// (CodeFixVerifierTests provokes each failure).
/// </summary>
public sealed class PhasewardCodeFixTest<TAnalyzer, TCodeFix> : CSharpCodeFixTest<TAnalyzer, TCodeFix, DefaultVerifier>
    where TAnalyzer : DiagnosticAnalyzer, new()
    where TCodeFix : CodeFixProvider, new()
{
    private readonly string source;
    private readonly string fixedSource;

    public PhasewardCodeFixTest(string source, string fixedSource, params DiagnosticResult[] expected)
    {
        this.source = source;
        this.fixedSource = fixedSource;
        ReferenceAssemblies = PhasewardTest.ReferenceAssemblies;
        // The framework's default, stated here because it is a promise of every code-fix test: a compiler error in the
        // original or the fixed source is an unexpected diagnostic and fails the test. CodeFixVerifierTests shows that it
        // does and that no code-fix test switches it off.
        CompilerDiagnostics = CompilerDiagnostics.Errors;
        PhasewardTest.Configure(TestState);
        PhasewardTest.Configure(FixedState);
        PhasewardTest.Configure(BatchFixedState);
        TestCode = source;
        FixedCode = fixedSource;
        ExpectedDiagnostics.AddRange(expected);
    }

    public PhasewardCodeFixTest<TAnalyzer, TCodeFix> WithEditorConfig(string lines)
    {
        TestState.AnalyzerConfigFiles.Add(PhasewardTest.EditorConfig(lines));
        return this;
    }

    /// <summary>Chooses which of the offered code actions to apply (by equivalence key).</summary>
    public PhasewardCodeFixTest<TAnalyzer, TCodeFix> Choosing(string equivalenceKey)
    {
        CodeActionEquivalenceKey = equivalenceKey;
        return this;
    }

    // The framework's run calls this however the test is started (RunAsync is not virtual), so the check cannot be
    // bypassed by calling RunAsync through a base type.
    protected override async Task RunImplAsync(CancellationToken cancellationToken)
    {
        AssertCommentsKept(source, fixedSource, "the test source");
        // Further documents of a multi-file test: each original against the fixed document of the same name.
        foreach (var (name, text) in TestState.Sources.Skip(1))
        {
            var fixedDocument = FixedState.Sources.Where(s => s.filename == name).Select(s => s.content.ToString()).FirstOrDefault();
            Assert.True(fixedDocument is not null, $"The fixed state has no document '{name}': a fix must not delete a designer's file.");
            AssertCommentsKept(text.ToString(), fixedDocument!, name);
        }

        await base.RunImplAsync(cancellationToken);
    }

    private static void AssertCommentsKept(string original, string fixedText, string document)
    {
        var fixedComments = Comments(fixedText).ToList();
        foreach (var comment in Comments(original))
        {
            Assert.True(fixedComments.Remove(comment), $"The fix dropped or altered the comment in {document}: {comment}");
        }
    }

    private static IEnumerable<string> Comments(string text)
        => CSharpSyntaxTree.ParseText(MarkupFree(text)).GetRoot().DescendantTrivia()
            .Where(t => t.IsKind(SyntaxKind.SingleLineCommentTrivia) || t.IsKind(SyntaxKind.MultiLineCommentTrivia))
            .Select(t => t.ToString().Trim());

    // Markup such as {|#0:...|} or [|...|] only marks spans; comments never contain it in our tests.
    private static string MarkupFree(string text)
        => System.Text.RegularExpressions.Regex.Replace(text, @"\{\|(#\d+|[A-Z]+\d+):|\|\}|\[\||\|\]", string.Empty);
}
