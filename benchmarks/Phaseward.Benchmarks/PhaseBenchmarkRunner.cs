using System.Linq;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Running;
using BenchmarkDotNet.Toolchains.InProcess.Emit;

namespace Phaseward.Benchmarks;

/// <summary>
/// Runs <see cref="PhaseBenchmarks"/> and <see cref="RuleBenchmarks"/> through BenchmarkDotNet's switcher (its own
/// options: <c>--filter</c>, <c>--exporters</c>...; <c>--short</c> for BDN's short-run job). The job runs in process (BDN's in-process emit
/// toolchain): no child project is generated and built, so it works offline and keeps this host's settings (Release,
/// tiered JIT off, workstation non-concurrent GC).
/// </summary>
internal static class PhaseBenchmarkRunner
{
    public static int Run(string[] args)
    {
        // --short: BDN's short-run job (3 warm-up and 3 measured iterations, one launch), for a quick record on a shared
        // machine; otherwise BDN's default job, which picks the counts itself.
        var job = args.Contains("--short") ? Job.ShortRun : Job.Default;
        var config = DefaultConfig.Instance.AddJob(job.WithToolchain(InProcessEmitToolchain.Instance));
        var summaries = BenchmarkSwitcher.FromTypes(new[] { typeof(PhaseBenchmarks), typeof(RuleBenchmarks) })
            .Run(args.Where(a => a != "--short").ToArray(), config);
        return summaries.Any(s => s.HasCriticalValidationErrors || s.Reports.Any(r => !r.Success)) ? 1 : 0;
    }
}
