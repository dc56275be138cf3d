using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Tests.Elaboration;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests;

/// <summary>
/// The plumbing rule analyzers build on: a FindingAnalyzer runs its rules on the shared netlist and every finding becomes
/// a diagnostic in the Describe document, with related locations and properties.
/// </summary>
public class FindingMappingTests
{
    private const string DesignFile = """
        using Phaseward;

        public sealed class Split : Design
        {
            protected override void Describe(Circuit c)
            {
                var a = c.Input("a");
                var first = c.Inverter(a, "first");
                Library.Stage(c, first);
            }
        }
        """;

    private const string LibraryFile = """
        using Phaseward;

        public static class Library
        {
            public static Net Stage(Circuit c, Net input)
                => c.Inverter(input, "second");
        }
        """;

    [Fact]
    public async Task FindingsBecomeDiagnosticsInTheDescribeDocument()
    {
        var designs = new InMemoryDesigns(("/src/Split.cs", DesignFile), ("/src/Library.cs", LibraryFile));
        var diagnostics = await designs.Compilation
            .WithAnalyzers(ImmutableArray.Create<DiagnosticAnalyzer>(new EveryDeviceAnalyzer()))
            .GetAnalyzerDiagnosticsAsync(CancellationToken.None);

        Assert.Equal(2, diagnostics.Length);
        var first = diagnostics.Single(d => d.Properties["device"] == "first");
        var second = diagnostics.Single(d => d.Properties["device"] == "second");

        // "first" is made in Describe: reported at its call, related location = the first device (itself).
        Assert.Equal("/src/Split.cs", first.Location.SourceTree!.FilePath);
        Assert.Equal("c.Inverter(a, \"first\")", first.Location.SourceTree.GetText().ToString(first.Location.SourceSpan));
        // The message is the descriptor's format (PW9001's here) filled with the finding's arguments.
        Assert.Equal(string.Format(RuleCatalog.NotElaborated.MessageFormat, "Inverter", "first", "Split"), first.GetMessage());

        // "second" is made in a helper in another file: reported at the call in Describe that led there, with the
        // helper's call as an additional location, then the finding's related location.
        Assert.Equal("/src/Split.cs", second.Location.SourceTree!.FilePath);
        Assert.Equal("Library.Stage(c, first)", second.Location.SourceTree.GetText().ToString(second.Location.SourceSpan));
        Assert.Equal(2, second.AdditionalLocations.Count);
        Assert.Equal("/src/Library.cs", second.AdditionalLocations[0].SourceTree!.FilePath);
        Assert.Equal(6, second.AdditionalLocations[0].GetLineSpan().StartLinePosition.Line + 1);
        Assert.Equal("c.Inverter(a, \"first\")", second.AdditionalLocations[1].SourceTree!.GetText().ToString(second.AdditionalLocations[1].SourceSpan));

        // Every diagnostic names the process its figures came from (it lands in the SARIF result's properties):
        // here the design states none, so the invented defaults, and the name says so.
        Assert.All(diagnostics, d => Assert.Equal(Process.Illustrative.Name, d.Properties[FindingPropertyKeys.Process]));
        Assert.Contains("invented", Process.Illustrative.Name, System.StringComparison.Ordinal);
    }

    [Fact]
    public void AnalyzersShareOneElaborationPerDesign()
    {
        var designs = new InMemoryDesigns(("/src/Split.cs", DesignFile), ("/src/Library.cs", LibraryFile));
        var design = designs.Session.Catalog.Designs.Single();
        var once = CompilationElaborations.Elaborate(designs.Session, design, ElaborationLimits.Default, CancellationToken.None);
        var twice = CompilationElaborations.Elaborate(designs.Session, design, ElaborationLimits.Default, CancellationToken.None);
        Assert.Same(once, twice);
        Assert.Same(designs.Session, CompilationElaborations.For(designs.Compilation));
    }

    [Fact]
    public void DevicesMadeInHelpersRecordTheCallChain()
    {
        var designs = new InMemoryDesigns(("/src/Split.cs", DesignFile), ("/src/Library.cs", LibraryFile));
        var netlist = designs.CompileTime("Split").Netlist!;
        var second = netlist.Devices.Single(d => d.Name == "second");
        Assert.Equal(("/src/Library.cs", 6), (second.Span.Path, second.Span.Line));
        var call = Assert.Single(second.Span.Callers);
        // Line and column are those of the call's '(' (where C# puts [CallerLineNumber]); the span covers the whole call.
        Assert.Equal(("/src/Split.cs", 9, 22), (call.Path, call.Line, call.Column));
        Assert.Equal("Library.Stage(c, first)", DesignFile.Replace("\r\n", "\n").Substring(call.Start, call.Length));
        Assert.Empty(netlist.Devices.Single(d => d.Name == "first").Span.Callers);
    }

    /// <summary>A test-only rule: one finding per device, related to the first device, with the device's name as a property.
    /// It borrows PW9001's descriptor, since the mapping only needs an ID that has a diagnostic descriptor.</summary>
    private sealed class EveryDeviceRule : Rule
    {
        private static readonly RuleDescriptor Descriptor = new(RuleCatalog.NotElaborated.Id, RuleFamily.Elaboration, Severity.Info, "test", "{0} {1} from {2}", "test");

        public override IReadOnlyList<RuleDescriptor> Descriptors { get; } = new[] { Descriptor };

        public override IEnumerable<Finding> Check(RuleContext context)
            => context.Netlist.Devices.Select(d => new Finding(Descriptor, d.Span, new object[] { d.Kind, d.Name, context.Netlist.DesignName },
                new[] { context.Netlist.Devices[0].Span }, new Dictionary<string, string> { ["device"] = d.Name }));
    }

    // No [DiagnosticAnalyzer] attribute: it is handed to the compilation directly and never shipped.
#pragma warning disable RS1001 // Missing DiagnosticAnalyzerAttribute (test-only analyzer, see above)
    private sealed class EveryDeviceAnalyzer : FindingAnalyzer
    {
        protected override RuleFamily Family => RuleFamily.Elaboration;

        internal override IReadOnlyList<Rule> Rules { get; } = new Rule[] { new EveryDeviceRule() };
    }
#pragma warning restore RS1001
}
