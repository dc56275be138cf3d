using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Text;
using System.Threading;
using BenchmarkDotNet.Attributes;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Benchmarks;

/// <summary>
/// Phaseward's phases on fixed designs (the loop shape of <see cref="DesignGenerator"/>), measured by BenchmarkDotNet
/// with its memory diagnoser: elaboration of a bound document and the mapping of findings to diagnostics
/// (<see cref="RuleBenchmarks"/>: each rule). BDN owns warm-up, iteration counts, outlier removal and the allocation
/// figures. BENCHMARKS.md says how to run them and why whole-compilation comparisons stay in the custom harness.
/// </summary>
[MemoryDiagnoser]
public class PhaseBenchmarks
{
    private BoundDesign bound = null!;
    private IReadOnlyList<Finding> findings = null!;

    /// <summary>Devices in the design (a chain of identical 13-device lanes).</summary>
    [Params(1_000, 100_000)]
    public int Devices { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        bound = BoundDesign.Of(Devices);
        // The designs are clean under the default policy; a limit of one pass gate in series makes PW2001 report every
        // lane's pass-gate tree, so the mapping has findings to map.
        findings = Checker.Check(bound.Netlist, new RulePolicy { MaxSeriesPassGates = 1 }).Findings;
    }

    /// <summary>Interpreting <c>Describe</c> over the bound operation trees, calling the DSL; returns the device count.</summary>
    [Benchmark]
    public int Elaboration() => bound.Elaborate().Devices.Count;

    /// <summary>Every finding of the reporting policy turned into a diagnostic (locations, related locations, properties).</summary>
    [Benchmark]
    public int Mapping()
    {
        var mapper = new DiagnosticMapper(bound.Session, bound.Design);
        var mapped = 0;
        foreach (var finding in findings)
            if (mapper.FromFinding(finding) is not null) mapped++;
        return mapped;
    }
}

/// <summary>Each rule of <see cref="Checker.Rules"/> over the whole elaborated netlist, with the default policy (the
/// designs are clean: a full sweep with no reporting cost), under BenchmarkDotNet's memory diagnoser.</summary>
[MemoryDiagnoser]
public class RuleBenchmarks
{
    private Netlist netlist = null!;
    private Rule[] rule = null!;

    [Params(1_000, 100_000)]
    public int Devices { get; set; }

    [ParamsSource(nameof(RuleNames))]
    public string Rule { get; set; } = string.Empty;

    public static IEnumerable<string> RuleNames => Checker.Rules.Select(r => r.GetType().Name);

    [GlobalSetup]
    public void Setup()
    {
        netlist = BoundDesign.Of(Devices).Elaborate();
        rule = new[] { Checker.Rules.Single(r => r.GetType().Name == Rule) };
    }

    [Benchmark]
    public int Check() => Checker.Check(netlist, rule, RulePolicy.Default).Findings.Count;
}

/// <summary>
/// A generated design compiled and bound once (every method body's operation tree), as the analyzer driver binds a
/// document for any analyzer, so that elaboration measures what Phaseward adds.
/// </summary>
internal sealed class BoundDesign
{
    private BoundDesign(ElaborationSession session, DesignInfo design)
    {
        Session = session;
        Design = design;
        Netlist = Elaborate();
    }

    public ElaborationSession Session { get; }

    public DesignInfo Design { get; }

    public Netlist Netlist { get; }

    public static BoundDesign Of(int devices)
    {
        var references = ImmutableArray.CreateRange<MetadataReference>(Basic.Reference.Assemblies.Net80.References.All)
            .Add(MetadataReference.CreateFromFile(typeof(Design).Assembly.Location));
        var tree = CSharpSyntaxTree.ParseText(DesignGenerator.Generate(DesignShape.Loop, devices), new CSharpParseOptions(LanguageVersion.Latest), "/bench/Generated.cs", Encoding.UTF8);
        var compilation = CSharpCompilation.Create("Phases", new[] { tree }, references,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));
        var session = new ElaborationSession(compilation, compilation.GetTypeByMetadataName("Phaseward.Design")!);
        var model = session.Models.Get(tree);
        foreach (var method in tree.GetRoot().DescendantNodes().OfType<Microsoft.CodeAnalysis.CSharp.Syntax.BaseMethodDeclarationSyntax>())
            model.GetOperation(method);
        return new BoundDesign(session, session.Catalog.Designs.Single());
    }

    public Netlist Elaborate()
        => DesignElaborator.Elaborate(Session, Design, ElaborationLimits.Default, CancellationToken.None).Netlist
           ?? throw new System.InvalidOperationException("the generated design did not elaborate");
}
