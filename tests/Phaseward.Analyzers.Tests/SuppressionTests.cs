using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests;

/// <summary>
/// The standard ways of silencing one finding work on Phaseward's diagnostics: <c>#pragma warning disable PWxxxx</c>
/// around the offending call, and <c>[SuppressMessage]</c> with a justification on the design class or on its
/// <c>Describe</c> (the diagnostic sits inside Describe). The compiler's own suppression machinery decides; the
/// analysis keeps suppressed diagnostics (as a SARIF log does) so that each test sees the same diagnostic, suppressed
/// or not. The unsuppressed design is the control.
/// </summary>
public class SuppressionTests
{
    // Demo design, invented figures: three pass gates in series on one enable; the limit is set to 2 below.
    private const string Chain = """
                var enable = c.Input("enable");
                var a = c.TransmissionGate(c.Input("d"), enable, "a");
                var b = c.TransmissionGate(a, enable, "b");
                var last = c.TransmissionGate(b, enable, "c");
                c.Output("q", c.Inverter(last));
        """;

    [Fact]
    public async Task UnsuppressedDesignReportsPW2001()
    {
        var diagnostic = await SinglePassGateDiagnosticAsync(Design(classAttribute: "", methodAttribute: "", body: Chain));
        Assert.False(diagnostic.IsSuppressed);
    }

    [Fact]
    public async Task PragmaAroundTheCallSuppressesIt()
    {
        var body = Chain.Replace(
            "        var last = c.TransmissionGate(b, enable, \"c\");\n",
            "#pragma warning disable PW2001 // the route is buffered one level up\n        var last = c.TransmissionGate(b, enable, \"c\");\n#pragma warning restore PW2001\n",
            System.StringComparison.Ordinal);
        Assert.NotEqual(Chain, body);

        var diagnostic = await SinglePassGateDiagnosticAsync(Design("", "", body));

        Assert.True(diagnostic.IsSuppressed);
    }

    [Fact]
    public async Task PragmaForAnotherRuleDoesNotSuppressIt()
    {
        var body = "#pragma warning disable PW2002\n" + Chain;
        var diagnostic = await SinglePassGateDiagnosticAsync(Design("", "", body));
        Assert.False(diagnostic.IsSuppressed);
    }

    [Fact]
    public async Task SuppressMessageOnTheDesignClassSuppressesIt()
    {
        var diagnostic = await SinglePassGateDiagnosticAsync(Design(
            classAttribute: """[SuppressMessage("Phaseward.PassGatePaths", "PW2001:Pass gates in series without a restoring stage", Justification = "Buffered by the parent design")]""",
            methodAttribute: "",
            body: Chain));

        Assert.True(diagnostic.IsSuppressed);
    }

    [Fact]
    public async Task SuppressMessageOnDescribeSuppressesIt()
    {
        var diagnostic = await SinglePassGateDiagnosticAsync(Design(
            classAttribute: "",
            methodAttribute: """[SuppressMessage("Phaseward.PassGatePaths", "PW2001", Justification = "Buffered by the parent design")]""",
            body: Chain));

        Assert.True(diagnostic.IsSuppressed);
    }

    [Fact]
    public async Task SuppressMessageForAnotherRuleDoesNotSuppressIt()
    {
        var diagnostic = await SinglePassGateDiagnosticAsync(Design(
            classAttribute: """[SuppressMessage("Phaseward.ClockPhases", "PW1001", Justification = "Not this rule")]""",
            methodAttribute: "",
            body: Chain));

        Assert.False(diagnostic.IsSuppressed);
    }

    private static string Design(string classAttribute, string methodAttribute, string body) => $$"""
        using System.Diagnostics.CodeAnalysis;
        using Phaseward;

        {{classAttribute}}
        public sealed class Router : Design
        {
            {{methodAttribute}}
            protected override void Describe(Circuit c)
            {
        {{body}}
            }
        }
        """;

    private static async Task<Diagnostic> SinglePassGateDiagnosticAsync(string source)
    {
        var designs = new InMemoryDesigns(("/src/Router.cs", source));
        var options = new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty,
            new TestAnalyzerConfigOptionsProvider(("phaseward.max_series_pass_gates", "2")));
        var analysis = designs.Compilation.WithAnalyzers(
            ImmutableArray.Create<DiagnosticAnalyzer>(new PassGatePathAnalyzer()),
            new CompilationWithAnalyzersOptions(options, onAnalyzerException: null, concurrentAnalysis: false,
                logAnalyzerExecutionTime: false, reportSuppressedDiagnostics: true));
        var diagnostics = await analysis.GetAnalyzerDiagnosticsAsync(CancellationToken.None);

        var diagnostic = Assert.Single(diagnostics);
        Assert.Equal(RuleCatalog.SeriesPassGates.Id, diagnostic.Id);
        // It sits inside Describe, at the last gate of the chain.
        Assert.Equal("c.TransmissionGate(b, enable, \"c\")", diagnostic.Location.SourceTree!.GetText().ToString(diagnostic.Location.SourceSpan));
        return diagnostic;
    }

    /// <summary>The same options for every file, as an [*.cs] section of an .editorconfig gives them.</summary>
    private sealed class TestAnalyzerConfigOptionsProvider : AnalyzerConfigOptionsProvider
    {
        private readonly AnalyzerConfigOptions options;

        public TestAnalyzerConfigOptionsProvider(params (string Key, string Value)[] values)
            => options = new Options(values.ToImmutableDictionary(v => v.Key, v => v.Value));

        public override AnalyzerConfigOptions GlobalOptions => options;

        public override AnalyzerConfigOptions GetOptions(SyntaxTree tree) => options;

        public override AnalyzerConfigOptions GetOptions(AdditionalText textFile) => options;

        private sealed class Options : AnalyzerConfigOptions
        {
            private readonly ImmutableDictionary<string, string> values;

            public Options(ImmutableDictionary<string, string> values) => this.values = values;

            public override bool TryGetValue(string key, out string value)
            {
                var found = values.TryGetValue(key, out var v);
                value = v ?? string.Empty;
                return found;
            }
        }
    }
}
