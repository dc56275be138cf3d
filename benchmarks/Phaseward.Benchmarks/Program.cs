using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Diagnostics;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Text;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Checking;


namespace Phaseward.Benchmarks;

/// <summary>
/// Runs the benchmark: for each size and shape, a warm-up, then several runs of each measurement (interleaved, so noise
/// falls on all of them alike), and prints the medians as Markdown tables. See BENCHMARKS.md.
/// </summary>
public static class Program
{
    private const string DesignPath = "/bench/Generated.cs";

    public static int Main(string[] args)
    {
        // The per-phase measurements under BenchmarkDotNet: everything after --bdn goes to BDN's own command line.
        if (args.Length > 0 && args[0] == "--bdn")
            return PhaseBenchmarkRunner.Run(args.Skip(1).ToArray());

        Settings settings;
        try
        {
            settings = Settings.Parse(args);
        }
        catch (ArgumentException e)
        {
            Console.Error.WriteLine(e.Message);
            Console.Error.WriteLine(Settings.Usage);
            return 2;
        }

        if (settings.Scaling is { } scalingSize)
            return ScalingRuns.Run(scalingSize, settings.Runs, settings.Output);

        if (settings.Compiler)
            return CompilerRuns.Run(settings.Shapes, settings.Sizes, settings.Runs, settings.LargeSize, settings.LargeRuns, settings.Output);

        var references = ImmutableArray.CreateRange<MetadataReference>(Basic.Reference.Assemblies.Net80.References.All)
            .Add(MetadataReference.CreateFromFile(typeof(Design).Assembly.Location));
        if (settings.Profile is { } profileSize)
            return Profile(settings.ProfileShape, profileSize, settings.Runs, settings.RulesOff, references);

        var sdk = settings.SkipSdk ? ImmutableArray<DiagnosticAnalyzer>.Empty : SdkAnalyzers.Load(settings.SdkAnalyzers ?? SdkAnalyzers.DefaultDirectory());
        var phaseward = PhasewardAnalyzers();

        var report = new StringBuilder();
        report.AppendLine(Environment("Phaseward benchmark", settings, sdk.Length, phaseward.Length));
        Console.Write(report);

        var cases = new List<Case>();
        foreach (var size in settings.Sizes)
        {
            foreach (var shape in settings.Shapes)
                cases.Add(new Case(shape, size));
        }

        cases.RemoveAll(c => c.Shape == DesignShape.StraightLine && c.Size > settings.StraightLineMax);

        // Warm-up: every measurement once on the smallest design, so JIT and first-use costs stay out of the table.
        var warm = settings.Shapes.Select(shape => new Bench(new Case(shape, 1_000), references, phaseward, sdk, settings.RulesOff)).ToList();
        for (var i = 0; i < 3; i++)
        {
            foreach (var bench in warm)
                bench.RunOnce(record: false);
        }

        var results = new List<Bench>();
        foreach (var c in cases)
        {
            var bench = new Bench(c, references, phaseward, sdk, settings.RulesOff);
            var runs = c.Size >= settings.LargeSize ? settings.LargeRuns : settings.Runs;
            Console.Error.WriteLine($"[{DateTime.Now:HH:mm:ss}] {c.Shape} {c.Size:N0}: {runs} run(s)");
            bench.RunOnce(record: false, skipReferences: c.Size >= settings.LargeSize);   // per-case warm-up (Phaseward only when large)
            for (var r = 0; r < runs; r++)
                bench.RunOnce(record: true);
            results.Add(bench);
            Console.Error.WriteLine("    " + bench.Summary());
            bench.Release();
        }

        var tables = Tables(results);
        Console.Write(tables);
        if (settings.Output is { } path)
            File.WriteAllText(path, report + tables);
        return 0;
    }

    /// <summary>
    /// A Stopwatch breakdown by phase of one design: binding every method body (as the analyzer driver does anyway),
    /// then what Phaseward adds: interpretation with the netlist, each rule, mapping.
    /// </summary>
    private static int Profile(DesignShape shape, int size, int runs, RulesOff rulesOff, ImmutableArray<MetadataReference> references)
    {
        var source = DesignGenerator.Generate(shape, size);
        var elaborations = new Samples();
        var elaborationsOutsideGc = new Samples();
        var rules = new Samples();
        var rulesOutsideGc = new Samples();
        using var largeObjects = new LargeObjectAllocations();
        for (var run = 0; run < runs; run++)
        {
            // Each run starts from a collected heap, so one run's garbage is not collected in the next one's time.
            GcCounts.Settle();
            var tree = CSharpSyntaxTree.ParseText(source, new CSharpParseOptions(LanguageVersion.Latest), DesignPath, Encoding.UTF8);
            var compilation = CSharpCompilation.Create("Profile", new[] { tree }, references,
                new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));
            var session = new ElaborationSession(compilation, compilation.GetTypeByMetadataName("Phaseward.Design")!);
            var design = session.Catalog.Designs.Single();
            var line = new StringBuilder($"run {run}: ");
            // Every method body bound first, as the analyzer driver does for its operation actions: what follows is
            // what Phaseward adds once the document is bound.
            var bind = Samples.Time(() =>
            {
                var model = session.Models.Get(tree);
                foreach (var method in tree.GetRoot().DescendantNodes().OfType<Microsoft.CodeAnalysis.CSharp.Syntax.BaseMethodDeclarationSyntax>())
                    model.GetOperation(method);
            });
            ElaborationResult? result = null;
            // Bytes allocated on this thread: a figure the shared machine's load does not disturb.
            var allocatedBefore = GC.GetAllocatedBytesForCurrentThread();
            var gcBefore = GcCounts.Now();
            var elaborateStart = DateTime.UtcNow;
            var elaborate = Samples.Time(() => result = DesignElaborator.Elaborate(session, design, ElaborationLimits.Default, CancellationToken.None));
            var elaborateMb = (GC.GetAllocatedBytesForCurrentThread() - allocatedBefore) / 1e6;
            var elaborateGc = GcCounts.Now() - gcBefore;
            var elaborateEnd = DateTime.UtcNow;
            var netlist = result!.Netlist!;
            line.Append($"bind {bind:N0} ms, elaborate {elaborate:N0} ms, {elaborateMb:N0} MB allocated, {elaborateGc} ({result.Steps:N0} steps, {netlist.Devices.Count:N0} devices); rules:");
            var rulesGcBefore = GcCounts.Now();
            var total = 0.0;
            var findings = new List<Finding>();
            var ruleSpans = new List<(string Rule, DateTime Start, DateTime End)>();
            foreach (var rule in rulesOff.Running)
            {
                var ruleAllocated = GC.GetAllocatedBytesForCurrentThread();
                var ruleStart = DateTime.UtcNow;
                var ruleGcBefore = GcCounts.Now();
                var ms = Samples.Time(() => findings.AddRange(Checker.Check(netlist, new[] { rule }, RulePolicy.Default).Findings));
                ruleSpans.Add((rule.GetType().Name, ruleStart, DateTime.UtcNow));
                var ruleGc = GcCounts.Now() - ruleGcBefore;
                total += ms;
                line.Append($" {rule.GetType().Name} {ms:N0} ({(GC.GetAllocatedBytesForCurrentThread() - ruleAllocated) / 1e6:N0} MB")
                    .Append(ruleGc.Gen2 > 0 ? $", full GC {ruleGc.Paused.TotalMilliseconds:N0} ms)" : ")");
            }

            var mapper = new DiagnosticMapper(session, design);
            var map = Samples.Time(() => { foreach (var f in findings) mapper.FromFinding(f); });
            var rulesGc = GcCounts.Now() - rulesGcBefore;
            line.Append($"; rules total {total:N0} ms, {rulesGc}; {findings.Count:N0} findings (")
                .Append(string.Join(", ", findings.GroupBy(f => f.RuleId).OrderBy(g => g.Key, StringComparer.Ordinal).Select(g => g.Key + " " + g.Count())))
                .Append($") mapped in {map:N0} ms; process CPU {Cpu():N0} ms so far");
            var latchModel = Phaseward.Sequencing.LatchModel.Of(netlist);
            line.Append($"; latch paths {latchModel.Paths.Count:N0} in {latchModel.PathSearchSteps:N0} search steps (budget {latchModel.PathSearchBudget:N0})");
            // What stays alive while the design is checked (the netlist and the models the rules cache on it), after the
            // timed phases so the forced collection does not change their figures: a number the machine's load does not move.
            line.Append($"; retained {RetainedMegabytes(netlist):N0} MB");
            // Large-object bytes by phase: what starts the full collections (sampled, about 0.1 MB per event).
            LargeObjectAllocations.AwaitLateEvents();
            line.Append($"; large-object MB: elaboration {largeObjects.MegabytesBetween(elaborateStart, elaborateEnd):N1} ({largeObjects.TopTypesBetween(elaborateStart, elaborateEnd, 6)}), rules");
            foreach (var (name, start, end) in ruleSpans)
                line.Append($" {name} {largeObjects.MegabytesBetween(start, end):N1}");
            Console.WriteLine(line);
            if (run == 0)
                continue;   // the first run also pays for JIT compilation and first use
            elaborations.Add(elaborate);
            elaborationsOutsideGc.Add(elaborate - elaborateGc.Paused.TotalMilliseconds);
            rules.Add(total);
            rulesOutsideGc.Add(total - rulesGc.Paused.TotalMilliseconds);
        }

        // The minimum is the figure least disturbed by other work on a shared machine; the median is the typical one.
        if (elaborations.Count > 0)
            Console.WriteLine($"runs 1-{runs - 1}, ms (min / median): elaborate {elaborations.Min:N0} / {elaborations.Median:N0}, outside GC pauses {elaborationsOutsideGc.Min:N0} / {elaborationsOutsideGc.Median:N0}; " +
                              $"rules {rules.Min:N0} / {rules.Median:N0}, outside GC pauses {rulesOutsideGc.Min:N0} / {rulesOutsideGc.Median:N0}");
        return 0;
    }

    private static double RetainedMegabytes(Phaseward.Netlists.Netlist netlist)
    {
        var bytes = GC.GetTotalMemory(forceFullCollection: true);
        GC.KeepAlive(netlist);
        return bytes / 1e6;
    }

    private static double Cpu() => System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime.TotalMilliseconds;

    private static ImmutableArray<DiagnosticAnalyzer> PhasewardAnalyzers()
        => typeof(PhasewardAnalyzer).Assembly.GetTypes()
            .Where(t => !t.IsAbstract && typeof(DiagnosticAnalyzer).IsAssignableFrom(t) && t.GetCustomAttribute<DiagnosticAnalyzerAttribute>() is not null)
            .OrderBy(t => t.Name, StringComparer.Ordinal)
            .Select(t => (DiagnosticAnalyzer)Activator.CreateInstance(t)!)
            .ToImmutableArray();

    private static string Environment(string title, Settings settings, int sdkAnalyzers, int phasewardAnalyzers)
    {
        var text = new StringBuilder();
        text.AppendLine("## " + title);
        text.AppendLine();
        text.AppendLine($"- runtime {System.Runtime.InteropServices.RuntimeInformation.FrameworkDescription}, {System.Runtime.InteropServices.RuntimeInformation.OSDescription}, " +
                        $"{System.Environment.ProcessorCount} logical processors, GC {(System.Runtime.GCSettings.IsServerGC ? "server" : "workstation")}");
        text.AppendLine($"- Roslyn {typeof(CSharpCompilation).Assembly.GetName().Version} (host), Phaseward analyzers: {phasewardAnalyzers}, SDK code analyzers: {sdkAnalyzers}");
        text.AppendLine($"- times are {(Samples.CpuTime ? "process CPU time (user+system)" : "wall-clock time")}");
        text.AppendLine($"- rules switched off (NoWarn): {settings.RulesOff}");
        text.AppendLine($"- runs per case: {settings.Runs} (from {settings.LargeSize:N0} devices: {settings.LargeRuns}), medians; analysis not concurrent (one thread)");
        text.AppendLine();
        return text.ToString();
    }

    private static string Tables(IReadOnlyList<Bench> results)
    {
        static string Ms(double v) => v >= 100 ? v.ToString("N0", CultureInfo.InvariantCulture) : v.ToString("N1", CultureInfo.InvariantCulture);
        static string X(double v) => double.IsNaN(v) ? "-" : v.ToString("N2", CultureInfo.InvariantCulture) + "×";
        var text = new StringBuilder();
        text.AppendLine("### Times (medians, ms of " + (Samples.CpuTime ? "CPU" : "wall") + ")");
        text.AppendLine();
        text.AppendLine("| shape | devices | source lines | elaboration | rules | mapping | Phaseward in analyzer callbacks (Roslyn telemetry, wall clock) | Phaseward run | walk run | walk + Phaseward run | SDK analyzers run | compiler bind+diagnose | findings | runs | spread (Phaseward run) |");
        text.AppendLine("|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|");
        foreach (var b in results)
            text.AppendLine($"| {b.Case.Shape} | {b.Devices:N0} | {b.SourceLines:N0} | {Ms(b.Elaboration.Median)} | {Ms(b.Rules.Median)} | {Ms(b.Mapping.Median)} | " +
                            $"{Ms(b.PhasewardCallbacks.Median)} | {Ms(b.PhasewardWall.Median)} | {Ms(b.WalkWall.Median)} | {Ms(b.WalkAndPhasewardWall.Median)} | {Ms(b.SdkWall.Median)} | {Ms(b.Compiler.Median)} | " +
                            $"{b.Findings:N0} | {b.PhasewardWall.Count} | {b.PhasewardWall.Spread:P0} |");
        text.AppendLine();
        text.AppendLine("### Cost added over the compiler, ratios, throughput, memory");
        text.AppendLine();
        text.AppendLine("Added = analyzer run − compiler bind+diagnose (the analyzer driver compiles the documents too). " +
                        "PW marginal = (walk + Phaseward) − walk, taken pair by pair in each run (the two in alternating order) and then the median: " +
                        "Phaseward's cost when the driver already binds operations for another analyzer, as in a build. Every timed measurement starts from a collected heap.");
        text.AppendLine();
        text.AppendLine("| shape | devices | Phaseward added ms | walk added ms | SDK added ms | PW marginal ms | PW / walk | PW / SDK | PW / compiler | PW marginal / compiler | µs per device (PW added) | µs per device (elab+rules) | devices/s (elab+rules) | peak managed MB (elaboration) | peak managed MB (PW run) |");
        text.AppendLine("|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|");
        foreach (var b in results)
        {
            var marginal = b.PhasewardMarginal.Median;
            var pw = b.PhasewardWall.Median - b.Compiler.Median;
            var walk = b.WalkWall.Median - b.Compiler.Median;
            var sdk = b.SdkWall.Median - b.Compiler.Median;
            var core = b.Elaboration.Median + b.Rules.Median + b.Mapping.Median;
            text.AppendLine($"| {b.Case.Shape} | {b.Devices:N0} | {Ms(pw)} | {(b.WalkWall.Count == 0 ? "-" : Ms(walk))} | {(b.SdkWall.Count == 0 ? "-" : Ms(sdk))} | {(b.WalkWall.Count == 0 ? "-" : Ms(marginal))} | " +
                            $"{(b.WalkWall.Count == 0 ? "-" : X(pw / walk))} | {(b.SdkWall.Count == 0 ? "-" : X(pw / sdk))} | {X(pw / b.Compiler.Median)} | " +
                            $"{(b.WalkWall.Count == 0 ? "-" : X(marginal / b.Compiler.Median))} | " +
                            $"{(pw * 1000 / b.Devices).ToString("N2", CultureInfo.InvariantCulture)} | {(core * 1000 / b.Devices).ToString("N2", CultureInfo.InvariantCulture)} | " +
                            $"{(b.Devices / (core / 1000)).ToString("N0", CultureInfo.InvariantCulture)} | {b.ElaborationMemory.Median / 1e6:N0} | {b.PhasewardMemory.Median / 1e6:N0} |");
        }

        text.AppendLine();
        return text.ToString();
    }

    private sealed record Case(DesignShape Shape, int Size);

    /// <summary>One design, its parsed source, and the samples of every measurement.</summary>
    private sealed class Bench
    {
        private readonly ImmutableArray<MetadataReference> references;
        private readonly ImmutableArray<DiagnosticAnalyzer> phaseward;
        private readonly ImmutableArray<DiagnosticAnalyzer> sdk;
        private readonly ImmutableDictionary<string, ReportDiagnostic> sdkOptions;
        private readonly RulesOff rulesOff;
        private SyntaxTree? tree;

        public Bench(Case c, ImmutableArray<MetadataReference> references, ImmutableArray<DiagnosticAnalyzer> phaseward, ImmutableArray<DiagnosticAnalyzer> sdk,
            RulesOff rulesOff)
        {
            Case = c;
            this.rulesOff = rulesOff;
            this.references = references;
            this.phaseward = phaseward;
            this.sdk = sdk;
            sdkOptions = SdkAnalyzers.AllAsWarnings(sdk);
            var source = DesignGenerator.Generate(c.Shape, c.Size);
            SourceLines = source.Count(ch => ch == '\n');
            tree = CSharpSyntaxTree.ParseText(source, new CSharpParseOptions(LanguageVersion.Latest), DesignPath, Encoding.UTF8);
            Devices = DesignGenerator.DevicesOf(DesignGenerator.LanesFor(c.Size));
        }

        public Case Case { get; }

        public int Devices { get; }

        public int SourceLines { get; }

        public int Findings { get; private set; } = -1;

        public Samples Compiler { get; } = new();

        public Samples Elaboration { get; } = new();

        public Samples Rules { get; } = new();

        public Samples Mapping { get; } = new();

        public Samples ElaborationMemory { get; } = new();

        public Samples PhasewardWall { get; } = new();

        public Samples PhasewardCallbacks { get; } = new();

        public Samples PhasewardMemory { get; } = new();

        public Samples WalkWall { get; } = new();

        /// <summary>The walker and Phaseward's analyzers in one run: binding for operations is paid once, by the driver.</summary>
        public Samples WalkAndPhasewardWall { get; } = new();

        public Samples SdkWall { get; } = new();

        /// <summary>(walk + Phaseward) − walk within each run: a paired difference, steadier than a difference of medians.</summary>
        public Samples PhasewardMarginal { get; } = new();

        private int runs;

        public void Release() => tree = null;

        public string Summary()
            => $"elab {Elaboration.Median:N0} ms, rules {Rules.Median:N0} ms, PW wall {PhasewardWall.Median:N0} ms, walk {WalkWall.Median:N0} ms, " +
               $"SDK {SdkWall.Median:N0} ms, compiler {Compiler.Median:N0} ms, findings {Findings}";

        public void RunOnce(bool record, bool skipReferences = false)
        {
            // Compiler: declare, bind and diagnose every document of a fresh compilation.
            GcCounts.Settle();
            var compilerMs = Samples.Time(() =>
            {
                var errors = Fresh(null).GetDiagnostics().Where(d => d.Severity == DiagnosticSeverity.Error).ToList();
                if (errors.Count > 0)
                    throw new InvalidOperationException($"Generated design ({Case.Shape}, {Case.Size}) does not compile: {errors[0]}");
            });

            // Phaseward's phases, called directly: elaboration (binding Describe and its helpers, interpreting), rules, mapping.
            var compilation = Fresh(null);
            var session = new ElaborationSession(compilation, compilation.GetTypeByMetadataName("Phaseward.Design")!);
            var design = session.Catalog.Designs.Single();
            ElaborationResult? result = null;
            double elaborationMs;
            long elaborationBytes;
            using (var memory = PeakMemory.Start())
            {
                elaborationMs = Samples.Time(() => result = DesignElaborator.Elaborate(session, design, ElaborationLimits.Default, CancellationToken.None));
                memory.Dispose();
                elaborationBytes = memory.PeakBytes;
            }

            var netlist = result!.Netlist ?? throw new InvalidOperationException("The generated design did not elaborate.");
            if (result.Issues.Count > 0 || netlist.Devices.Count != Devices)
                throw new InvalidOperationException($"Generated design elaborated to {netlist.Devices.Count} devices (expected {Devices}) with {result.Issues.Count} issue(s): " +
                                                    string.Join("; ", result.Issues.Take(3).Select(i => i.RuleId + " " + string.Join(", ", i.Arguments))));
            CheckReport? check = null;
            var rulesMs = Samples.Time(() => check = Checker.Check(netlist, rulesOff.Running, RulePolicy.Default, CancellationToken.None));
            var mapper = new DiagnosticMapper(session, design);
            var mappingMs = Samples.Time(() =>
            {
                foreach (var finding in check!.Findings)
                    mapper.FromFinding(finding);
            });
            result = null;
            netlist = null;
            check = null;

            // Phaseward's analyzers as the compiler runs them (with execution-time telemetry).
            long phasewardBytes;
            double phasewardMs;
            double callbacksMs;
            using (var memory = PeakMemory.Start())
            {
                var run = Analyze(phaseward, logTime: true, rulesOff.CompilationOptions);
                memory.Dispose();
                phasewardBytes = memory.PeakBytes;
                phasewardMs = run.Ms;
                callbacksMs = run.CallbacksMs;
                Findings = run.Diagnostics.Count(d => d.Id.StartsWith("PW", StringComparison.Ordinal));
                var failures = run.Diagnostics.Where(d => d.Id == "AD0001" || d.Id.StartsWith("PW9", StringComparison.Ordinal)).ToList();
                if (failures.Count > 0)
                    throw new InvalidOperationException("Phaseward reported " + failures[0]);
            }

            double walkMs = double.NaN, sdkMs = double.NaN, bothMs = double.NaN;
            if (!skipReferences)
            {
                // Alternating which of the pair goes first cancels a drift of the machine's speed within a run.
                var walkFirst = runs++ % 2 == 0;
                if (walkFirst) walkMs = Analyze(ImmutableArray.Create<DiagnosticAnalyzer>(new WalkAnalyzer()), logTime: false).Ms;
                bothMs = Analyze(phaseward.Add(new WalkAnalyzer()), logTime: false, rulesOff.CompilationOptions).Ms;
                if (!walkFirst) walkMs = Analyze(ImmutableArray.Create<DiagnosticAnalyzer>(new WalkAnalyzer()), logTime: false).Ms;
                if (!sdk.IsEmpty)
                    sdkMs = Analyze(sdk, logTime: false, sdkOptions).Ms;
            }

            if (!record)
                return;
            Compiler.Add(compilerMs);
            Elaboration.Add(elaborationMs);
            ElaborationMemory.Add(elaborationBytes);
            Rules.Add(rulesMs);
            Mapping.Add(mappingMs);
            PhasewardWall.Add(phasewardMs);
            PhasewardCallbacks.Add(callbacksMs);
            PhasewardMemory.Add(phasewardBytes);
            if (!double.IsNaN(walkMs)) WalkWall.Add(walkMs);
            if (!double.IsNaN(bothMs)) WalkAndPhasewardWall.Add(bothMs);
            if (!double.IsNaN(bothMs) && !double.IsNaN(walkMs)) PhasewardMarginal.Add(bothMs - walkMs);
            if (!double.IsNaN(sdkMs)) SdkWall.Add(sdkMs);
        }

        private (double Ms, double CallbacksMs, ImmutableArray<Diagnostic> Diagnostics) Analyze(ImmutableArray<DiagnosticAnalyzer> analyzers, bool logTime,
            ImmutableDictionary<string, ReportDiagnostic>? specific = null)
        {
            GcCounts.Settle();
            var compilation = Fresh(specific);
            var options = new CompilationWithAnalyzersOptions(new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty),
                (e, a, _) => throw new InvalidOperationException($"Analyzer {a} threw: {e}"), concurrentAnalysis: false, logAnalyzerExecutionTime: logTime);
            var start = Samples.Now();
            var withAnalyzers = compilation.WithAnalyzers(analyzers, options);
            var diagnostics = withAnalyzers.GetAnalyzerDiagnosticsAsync(CancellationToken.None).GetAwaiter().GetResult();
            var ms = Samples.Now() - start;
            var callbacks = 0.0;
            if (logTime)
                foreach (var analyzer in analyzers)
                    callbacks += withAnalyzers.GetAnalyzerTelemetryInfoAsync(analyzer, CancellationToken.None).GetAwaiter().GetResult().ExecutionTime.TotalMilliseconds;
            return (ms, callbacks, diagnostics);
        }

        private CSharpCompilation Fresh(ImmutableDictionary<string, ReportDiagnostic>? specific)
        {
            var options = new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable);
            if (specific is not null)
                options = options.WithSpecificDiagnosticOptions(specific);
            return CSharpCompilation.Create("Bench", new[] { tree! }, references, options);
        }
    }

    private sealed class Settings
    {
        public const string Usage = "usage: Phaseward.Benchmarks [--sizes 1000,10000,100000,1000000] [--straight-line-max 100000] [--runs 5] " +
                                    "[--large-size 100000] [--large-runs 3] [--sdk-analyzers DIR | --no-sdk] [--shapes straight-line,loop,blocks] [--out FILE] [--rules-off PW1004,PW3005] [--compiler: the SDK's compiler as a child process instead] | --profile DEVICES [--profile-shape loop|straight-line|blocks] | --scaling PARTS [--runs 3]  [--wall: wall-clock instead of CPU time]";

        public int[] Sizes { get; private set; } = { 1_000, 10_000, 100_000, 1_000_000 };

        public int StraightLineMax { get; private set; } = 100_000;

        /// <summary>Designs whose size sits in one net or one chain, at this many parts and ten times more (<see cref="ScalingRuns"/>).</summary>
        public int? Scaling { get; private set; }

        /// <summary>Measure with the SDK's compiler as a child process (<see cref="CompilerRuns"/>).</summary>
        public bool Compiler { get; private set; }

        public int Runs { get; private set; } = 5;

        public int LargeSize { get; private set; } = 100_000;

        public int LargeRuns { get; private set; } = 3;

        public string? SdkAnalyzers { get; private set; }

        public bool SkipSdk { get; private set; }

        public string? Output { get; private set; }

        /// <summary>Rules switched off as a build does (<see cref="RulesOff"/>).</summary>
        public RulesOff RulesOff { get; private set; } = RulesOff.None;

        public int? Profile { get; private set; }

        public DesignShape ProfileShape { get; private set; } = DesignShape.Loop;

        public DesignShape[] Shapes { get; private set; } = { DesignShape.StraightLine, DesignShape.Loop, DesignShape.Blocks };

        private static DesignShape ShapeNamed(string option, string shape) => shape switch
        {
            "loop" => DesignShape.Loop,
            "straight-line" => DesignShape.StraightLine,
            "blocks" => DesignShape.Blocks,
            _ => throw new ArgumentException($"Option '{option}' takes 'loop', 'straight-line' or 'blocks' (was '{shape}')."),
        };

        public static Settings Parse(string[] args)
        {
            var s = new Settings();
            for (var i = 0; i < args.Length; i++)
            {
                string Value() => i + 1 < args.Length ? args[++i] : throw new ArgumentException($"Option '{args[i]}' needs a value.");
                int Positive(string option, string text) => int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var v) && v > 0
                    ? v : throw new ArgumentException($"Option '{option}' needs a positive whole number (was '{text}').");
                var option = args[i];
                switch (option)
                {
                    case "--sizes": s.Sizes = Value().Split(',').Select(t => Positive(option, t)).ToArray(); break;
                    case "--straight-line-max": s.StraightLineMax = Positive(option, Value()); break;
                    case "--runs": s.Runs = Positive(option, Value()); break;
                    case "--large-size": s.LargeSize = Positive(option, Value()); break;
                    case "--large-runs": s.LargeRuns = Positive(option, Value()); break;
                    case "--sdk-analyzers": s.SdkAnalyzers = Value(); break;
                    case "--no-sdk": s.SkipSdk = true; break;
                    case "--out": s.Output = Value(); break;
                    case "--rules-off": s.RulesOff = RulesOff.Parse(option, Value()); break;
                    case "--profile": s.Profile = Positive(option, Value()); break;
                    case "--profile-shape":
                        s.ProfileShape = ShapeNamed(option, Value());
                        break;
                    case "--shapes": s.Shapes = Value().Split(',').Select(t => ShapeNamed(option, t)).ToArray(); break;
                    case "--wall": Samples.CpuTime = false; break;
                    case "--compiler": s.Compiler = true; break;
                    case "--scaling": s.Scaling = Positive(option, Value()); break;
                    default: throw new ArgumentException($"Unknown option '{option}'.");
                }
            }

            foreach (var size in s.Sizes)
                DesignGenerator.LanesFor(size);
            return s;
        }
    }
}
