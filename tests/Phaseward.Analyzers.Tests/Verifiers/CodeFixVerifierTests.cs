using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Testing;
using Microsoft.CodeAnalysis.Text;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Checking;
using Phaseward.CodeFixes;
using static Phaseward.Analyzers.Tests.Rules.RuleSources;

namespace Phaseward.Analyzers.Tests.Verifiers;

/// <summary>
/// Tests of the code-fix verifier itself (<see cref="PhasewardCodeFixTest{TAnalyzer, TCodeFix}"/>): every code-fix test
/// relies on it to reject a fix whose source does not compile, drops a comment or changes code it was not asked to
/// change. Each failure is provoked by a test-only provider that applies the real PW1001 fix and then spoils the result
/// in one way; the control runs the same harness with the real fix. A sweep checks that no code-fix test switches the
/// compile check off.
/// </summary>
public class CodeFixVerifierTests
{
    // An invented design: the second latch shares the first one's phase (PW1001); the fix switches it to sample.Low.
    // `trimmed` has nothing to do with the finding: a fix has no business touching it.
    private static readonly string Source = Design("WaveFront", """
        var sample = c.Clock("sample", 4.Nanoseconds());
        // hold the wave-height comparator while sample is high
        var held = {|#1:c.DynamicLatch(c.Input("comparator"), sample.High, "hold")|};
        var trimmed = c.Inverter(c.Input("trim"));
        var shaped = {|#0:c.StaticLatch(c.Inverter(held), sample.High, "shape")|}; // second stage
        c.Output("height", shaped);
        c.Output("trim_n", trimmed);
        """);

    // What the real fix makes of Source: one phase argument changes, nothing else.
    private static readonly string CorrectlyFixed = Design("WaveFront", """
        var sample = c.Clock("sample", 4.Nanoseconds());
        // hold the wave-height comparator while sample is high
        var held = c.DynamicLatch(c.Input("comparator"), sample.High, "hold");
        var trimmed = c.Inverter(c.Input("trim"));
        var shaped = c.StaticLatch(c.Inverter(held), sample.Low, "shape"); // second stage
        c.Output("height", shaped);
        c.Output("trim_n", trimmed);
        """);

    private static readonly DiagnosticResult Pw1001 = new DiagnosticResult(RuleCatalog.SameWindowLatches.Id, DiagnosticSeverity.Warning)
        .WithLocation(0).WithLocation(1).WithArguments("shape", "hold", "sample.High");

    private static PhasewardCodeFixTest<ClockPhaseAnalyzer, TFix> Test<TFix>(string fixedSource)
        where TFix : CodeFixProvider, new()
        => new(Source, fixedSource, Pw1001);

    [Fact]
    public Task TheRealFixPassesTheHarness()
        // The control: the failures below come from the spoiled fixes, not from the design, the expected diagnostic
        // or the expected fixed source.
        => Test<SameWindowLatchesCodeFix>(CorrectlyFixed).RunAsync();

    [Fact]
    public async Task AFixWhoseSourceDoesNotCompileFails()
    {
        // The expected source is the broken fix's own output, so the text comparison agrees and the comments are all
        // there: only the compile check can fail the test.
        var brokenOutput = new LeavesACompileError().Spoil(CorrectlyFixed);
        Assert.NotEqual(CorrectlyFixed, brokenOutput);

        var failure = await Assert.ThrowsAnyAsync<Exception>(() => Test<LeavesACompileError>(brokenOutput).RunAsync());

        // CS0103: the name 'undeclared' does not exist in the current context.
        Assert.Contains("CS0103", failure.Message, StringComparison.Ordinal);
        Assert.Contains("undeclared", failure.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("did not match", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task AFixThatDropsACommentFailsAgainstTheCorrectFix()
    {
        var failure = await Assert.ThrowsAnyAsync<Exception>(() => Test<DropsAComment>(CorrectlyFixed).RunAsync());

        // The framework's text comparison: the diff shows the comment line the fix lost.
        Assert.Contains("did not match", failure.Message, StringComparison.Ordinal);
        Assert.Matches(@"(?m)^-\s*// hold the wave-height comparator while sample is high\r?$", failure.Message);
    }

    [Fact]
    public async Task AFixThatDropsACommentFailsEvenWhenTheExpectedSourceAcceptsTheLoss()
    {
        // An author who copies the fix's output into the test as the expected source: the text comparison and the
        // compile check both pass, and only our comment check stands between the fix and a designer's lost note.
        var brokenOutput = new DropsAComment().Spoil(CorrectlyFixed);
        Assert.NotEqual(CorrectlyFixed, brokenOutput);

        var failure = await Assert.ThrowsAnyAsync<Exception>(() => Test<DropsAComment>(brokenOutput).RunAsync());

        Assert.Contains("The fix dropped or altered the comment in the test source: // hold the wave-height comparator while sample is high",
            failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task TheCommentCheckHoldsWhenTheTestIsRunThroughTheFrameworkType()
    {
        // RunAsync is not virtual: the check lives in the run itself, so a test started through the framework's own type
        // is checked as well.
        var brokenOutput = new DropsAComment().Spoil(CorrectlyFixed);
        CSharpCodeFixTest<ClockPhaseAnalyzer, DropsAComment, DefaultVerifier> asFrameworkType = Test<DropsAComment>(brokenOutput);

        var failure = await Assert.ThrowsAnyAsync<Exception>(() => asFrameworkType.RunAsync());

        Assert.Contains("dropped or altered the comment in the test source", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task ACommentDroppedFromAnotherDocumentOfTheTestFails()
    {
        // A multi-file test: the comment check covers every document, not only the one with the diagnostic.
        const string Library = """
            // shared by the wave-front stages
            public static class Shared
            {
            }
            """;
        var test = Test<SameWindowLatchesCodeFix>(CorrectlyFixed);
        test.TestState.Sources.Add(("/0/Shared.cs", Library));
        test.FixedState.Sources.Add(("/0/Shared.cs", Library.Replace("// shared by the wave-front stages\n", string.Empty, StringComparison.Ordinal)));

        var failure = await Assert.ThrowsAnyAsync<Exception>(() => test.RunAsync());

        Assert.Contains("dropped or altered the comment in /0/Shared.cs: // shared by the wave-front stages", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task AFixThatRenamesAnUnrelatedLocalFailsAgainstTheCorrectFix()
    {
        // The renamed source compiles and keeps every comment: the text comparison with the minimal change catches it.
        Assert.Contains("trimInverted", new RenamesAnUnrelatedLocal().Spoil(CorrectlyFixed), StringComparison.Ordinal);

        var failure = await Assert.ThrowsAnyAsync<Exception>(() => Test<RenamesAnUnrelatedLocal>(CorrectlyFixed).RunAsync());

        Assert.Contains("did not match", failure.Message, StringComparison.Ordinal);
        Assert.Matches(@"(?m)^\+\s*var trimInverted = ", failure.Message);
    }

    [Fact]
    public void NoCodeFixTestSwitchesOffTheCompileCheck()
    {
        var testsRoot = Repository.PathOf("tests", "Phaseward.Analyzers.Tests");
        var codeFixTestFiles = Directory.GetFiles(testsRoot, "*.cs", SearchOption.AllDirectories)
            .Where(path => !IsBuildOutput(testsRoot, path))
            // This file expects CS0103 on purpose and names the patterns below as data.
            .Where(path => Path.GetFileName(path) != nameof(CodeFixVerifierTests) + ".cs")
            .Where(path => File.ReadAllText(path).Contains("CodeFixTest", StringComparison.Ordinal))
            .ToList();

        // The sweep must see what it is meant to check: every code-fix test class and the verifier.
        var expectedFiles = Directory.GetFiles(Path.Combine(testsRoot, "CodeFixes"), "*.cs")
            .Append(Path.Combine(testsRoot, "Verifiers", "PhasewardCodeFixTest.cs"));
        var missed = expectedFiles.Except(codeFixTestFiles).Select(path => Path.GetRelativePath(testsRoot, path)).ToList();
        Assert.True(missed.Count == 0, "The sweep did not recognise these code-fix test files: " + string.Join(", ", missed));

        var offences = (
            from path in codeFixTestFiles
            let lines = File.ReadAllLines(path)
            from index in Enumerable.Range(0, lines.Length)
            from pattern in CompileCheckSwitchedOff
            where pattern.Regex.IsMatch(lines[index])
            select $"{Path.GetRelativePath(testsRoot, path)}:{index + 1}: {pattern.Why}: {lines[index].Trim()}").ToList();

        Assert.True(offences.Count == 0,
            $"Code-fix tests must keep the compile check (scanned {codeFixTestFiles.Count} files):\n" + string.Join("\n", offences));
    }

    private static readonly (Regex Regex, string Why)[] CompileCheckSwitchedOff =
    {
        // Errors, Warnings, Suggestions and All all include errors; None, a cast or a variable may not.
        (new Regex(@"\bCompilerDiagnostics\s*=(?!=)(?!\s*CompilerDiagnostics\.(Errors|Warnings|Suggestions|All)\b)"),
            "sets CompilerDiagnostics to a level that may leave errors out"),
        (new Regex(@"\bCompilerDiagnostics\.None\b"), "uses CompilerDiagnostics.None"),
        (new Regex(@"\bDiagnosticResult\.CompilerError\s*\("), "expects a compiler error"),
        (new Regex("\"CS[0-9]{4}"), "names a compiler diagnostic (expected or disabled)"),
        (new Regex(@"\{\|CS[0-9]{4}:"), "marks up an expected compiler diagnostic"),
    };

    private static bool IsBuildOutput(string root, string path)
    {
        var first = Path.GetRelativePath(root, path).Split(Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar)[0];
        return first is "bin" or "obj";
    }

    /// <summary>
    /// Applies the real PW1001 fix (same titles and equivalence keys), then spoils the fixed text with
    /// <see cref="Spoil"/>. A spoil that no longer finds its target changes nothing, and the failure tests then fail.
    /// </summary>
    private abstract class SpoiledSameWindowLatchesFix : CodeFixProvider
    {
        private readonly SameWindowLatchesCodeFix real = new();

        public sealed override ImmutableArray<string> FixableDiagnosticIds => real.FixableDiagnosticIds;

        public sealed override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

        public abstract string Spoil(string correctlyFixed);

        public sealed override async Task RegisterCodeFixesAsync(CodeFixContext context)
        {
            var offered = new List<(CodeAction Action, ImmutableArray<Diagnostic> Diagnostics)>();
            await real.RegisterCodeFixesAsync(new CodeFixContext(context.Document, context.Span, context.Diagnostics,
                (action, diagnostics) => offered.Add((action, diagnostics)), context.CancellationToken));
            foreach (var (action, diagnostics) in offered)
            {
                context.RegisterCodeFix(
                    CodeAction.Create(action.Title, ct => SpoiledAsync(context.Document, action, ct), action.EquivalenceKey),
                    diagnostics);
            }
        }

        private async Task<Document> SpoiledAsync(Document document, CodeAction realAction, CancellationToken cancellationToken)
        {
            var operations = await realAction.GetOperationsAsync(cancellationToken);
            var fixedDocument = operations.OfType<ApplyChangesOperation>().Single().ChangedSolution.GetDocument(document.Id)!;
            var fixedText = await fixedDocument.GetTextAsync(cancellationToken);
            return fixedDocument.WithText(SourceText.From(Spoil(fixedText.ToString()), fixedText.Encoding));
        }
    }

    /// <summary>Calls a method that does not exist (CS0103) just before the output.</summary>
    private sealed class LeavesACompileError : SpoiledSameWindowLatchesFix
    {
        public override string Spoil(string correctlyFixed)
            => correctlyFixed.Replace("c.Output(\"height\"", "undeclared(); c.Output(\"height\"", StringComparison.Ordinal);
    }

    /// <summary>Removes the comment line above the first latch.</summary>
    private sealed class DropsAComment : SpoiledSameWindowLatchesFix
    {
        public override string Spoil(string correctlyFixed)
            => Regex.Replace(correctlyFixed, @"^[ \t]*// hold the wave-height comparator while sample is high\r?\n", string.Empty,
                RegexOptions.Multiline);
    }

    /// <summary>Renames the local <c>trimmed</c>, which the finding does not concern; the result still compiles.</summary>
    private sealed class RenamesAnUnrelatedLocal : SpoiledSameWindowLatchesFix
    {
        public override string Spoil(string correctlyFixed)
            => Regex.Replace(correctlyFixed, @"\btrimmed\b", "trimInverted");
    }
}
