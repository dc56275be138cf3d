using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Runtime.InteropServices;
using System.Text;

namespace Phaseward.Benchmarks;

/// <summary>
/// The cost a user pays in a build: the installed SDK's own compiler (<c>csc.dll</c>, run as a child process in its
/// own runtime configuration: server GC, tiered JIT, concurrent analyzers) compiling each generated design once without
/// analyzers and once with Phaseward's (the dlls the package ships), in alternating order. CPU time of the child
/// (user + system, from <c>getrusage(RUSAGE_CHILDREN)</c>) and wall time. Every compile is a cold process, as with the
/// compiler server off: each run with the analyzers also pays for loading and JIT-compiling them, a fixed cost that
/// dominates small designs (a warm compiler server pays it once).
/// </summary>
internal static class CompilerRuns
{
    public static int Run(IReadOnlyList<DesignShape> shapes, IReadOnlyList<int> sizes, int runs, int largeSize, int largeRuns, string? output)
    {
        if (!RuntimeInformation.IsOSPlatform(OSPlatform.Linux))
            throw new PlatformNotSupportedException("--compiler measures the child's CPU time with getrusage(RUSAGE_CHILDREN), which this harness reads on Linux only.");
        var sdk = DotnetInstall.NewestSdk();
        var csc = Path.Combine(sdk, "Roslyn", "bincore", "csc.dll");
        if (!File.Exists(csc))
            throw new FileNotFoundException($"The SDK's compiler '{csc}' was not found.", csc);
        var work = Directory.CreateTempSubdirectory("phaseward-compiler-runs-").FullName;
        var here = AppContext.BaseDirectory;
        var analyzers = new[] { "Phaseward.Analyzers.dll", "Phaseward.dll" }.Select(f => Path.Combine(here, f)).ToArray();
        foreach (var file in analyzers)
            if (!File.Exists(file))
                throw new FileNotFoundException($"Analyzer assembly '{file}' not found next to the benchmark; build it in Release first.", file);

        var common = Path.Combine(work, "compile.rsp");
        File.WriteAllLines(common, new[] { "/nostdlib+", "/target:library", "/nologo", "/deterministic+", "/optimize+", "/langversion:latest", "/nullable:enable" }
            .Concat(Directory.GetFiles(DotnetInstall.ReferenceAssemblies(), "*.dll").OrderBy(f => f, StringComparer.Ordinal).Select(f => "/reference:" + f))
            .Append("/reference:" + Path.Combine(here, "Phaseward.dll")));
        var withAnalyzers = Path.Combine(work, "analyzers.rsp");
        File.WriteAllLines(withAnalyzers, analyzers.Select(f => "/analyzer:" + f));

        var text = new StringBuilder();
        text.AppendLine("## The SDK's compiler as a child process (--compiler)").AppendLine();
        text.AppendLine($"- compiler: {csc} (its own runtime configuration), {System.Environment.ProcessorCount} cores, {DateTime.UtcNow:yyyy-MM-dd HH:mm} UTC");
        text.AppendLine($"- medians of {runs} runs ({largeRuns} from {largeSize:N0} devices), each run: the compiler alone and with Phaseward's analyzers, alternating which goes first");
        text.AppendLine("- CPU: user + system of the compiler process (its GC and JIT threads included); wall: elapsed").AppendLine();
        text.AppendLine("| shape | devices | compiler alone CPU s | with Phaseward CPU s | added CPU s | µs per device (added) | µs per device (marginal from the previous size) | compiler alone wall s | with Phaseward wall s |");
        text.AppendLine("|---|---:|---:|---:|---:|---:|---:|---:|---:|");
        Console.Write(text);

        foreach (var shape in shapes)
        {
            (int Devices, double Added)? previous = null;
            foreach (var size in sizes)
            {
                var lanes = DesignGenerator.LanesFor(size);
                var devices = DesignGenerator.DevicesOf(lanes);
                var source = Path.Combine(work, $"{shape}{size}.cs");
                File.WriteAllText(source, DesignGenerator.Generate(shape, size), Encoding.UTF8);
                Console.Error.WriteLine($"[{DateTime.Now:HH:mm:ss}] compiler runs: {shape} {devices:N0} devices");
                CheckAnalyzersRun(csc, common, withAnalyzers, source, work);

                var alone = new Samples();
                var with = new Samples();
                var added = new Samples();
                var aloneWall = new Samples();
                var withWall = new Samples();
                var count = size >= largeSize ? largeRuns : runs;
                for (var r = 0; r < count; r++)
                {
                    (double Cpu, double Wall) a, w;
                    if (r % 2 == 0)
                    {
                        a = Compile(csc, source, work, common);
                        w = Compile(csc, source, work, common, withAnalyzers);
                    }
                    else
                    {
                        w = Compile(csc, source, work, common, withAnalyzers);
                        a = Compile(csc, source, work, common);
                    }

                    alone.Add(a.Cpu);
                    with.Add(w.Cpu);
                    added.Add(w.Cpu - a.Cpu);
                    aloneWall.Add(a.Wall);
                    withWall.Add(w.Wall);
                }

                var marginal = previous is { } p ? $"{(added.Median - p.Added) / (devices - p.Devices) * 1e6:F2}" : "–";
                var row = $"| {shape} | {devices:N0} | {alone.Median:F2} | {with.Median:F2} | {added.Median:F2} | {added.Median / devices * 1e6:F2} | {marginal} | {aloneWall.Median:F2} | {withWall.Median:F2} |";
                Console.WriteLine(row);
                text.AppendLine(row);
                previous = (devices, added.Median);
            }
        }

        if (output is not null)
            File.WriteAllText(output, text.ToString());
        Directory.Delete(work, recursive: true);
        return 0;
    }

    // One untimed compile that asks the compiler to report its analyzers' times: proof that Phaseward's were loaded
    // and ran on the design (a wrong path or a refused analyzer would otherwise just make the "with" runs cheap).
    private static void CheckAnalyzersRun(string csc, string common, string withAnalyzers, string source, string work)
    {
        var (exit, output) = Start(csc, source, work, new[] { common, withAnalyzers }, "/reportanalyzer");
        if (exit != 0 || !output.Contains("Phaseward.Analyzers.ClockPhaseAnalyzer", StringComparison.Ordinal))
            throw new InvalidOperationException($"The compiler did not run Phaseward's analyzers on '{source}' (exit code {exit}):\n{output}");
    }

    private static (double Cpu, double Wall) Compile(string csc, string source, string work, params string[] responseFiles)
    {
        var before = ChildrenCpuSeconds();
        var stopwatch = Stopwatch.StartNew();
        var (exit, output) = Start(csc, source, work, responseFiles);
        var wall = stopwatch.Elapsed.TotalSeconds;
        if (exit != 0)
            throw new InvalidOperationException($"The compiler failed on '{source}' (exit code {exit}):\n{output}");
        return (ChildrenCpuSeconds() - before, wall);
    }

    private static (int Exit, string Output) Start(string csc, string source, string work, IEnumerable<string> responseFiles, string? extra = null)
    {
        var info = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add(csc);
        info.ArgumentList.Add("/noconfig");
        foreach (var rsp in responseFiles)
            info.ArgumentList.Add("@" + rsp);
        if (extra is not null)
            info.ArgumentList.Add(extra);
        info.ArgumentList.Add("/out:" + Path.Combine(work, "out.dll"));
        info.ArgumentList.Add(source);
        using var process = System.Diagnostics.Process.Start(info) ?? throw new InvalidOperationException("Could not start 'dotnet'.");
        var stderr = process.StandardError.ReadToEndAsync();
        var stdout = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return (process.ExitCode, stdout + stderr.Result);
    }

    private static double ChildrenCpuSeconds()
    {
        if (GetResourceUsage(ResourceUsageChildren, out var usage) != 0)
            throw new InvalidOperationException($"getrusage failed (errno {Marshal.GetLastPInvokeError()}).");
        return usage.UserSeconds + usage.UserMicroseconds / 1e6 + usage.SystemSeconds + usage.SystemMicroseconds / 1e6;
    }

    private const int ResourceUsageChildren = -1;

    [DllImport("libc", EntryPoint = "getrusage", SetLastError = true)]
    private static extern int GetResourceUsage(int who, out ResourceUsage usage);

    // struct rusage on 64-bit Linux: two timevals, then fourteen longs.
    [StructLayout(LayoutKind.Sequential)]
    private struct ResourceUsage
    {
        public long UserSeconds;
        public long UserMicroseconds;
        public long SystemSeconds;
        public long SystemMicroseconds;
        public long MaxResidentKilobytes;
        public long Rest1, Rest2, Rest3, Rest4, Rest5, Rest6, Rest7, Rest8, Rest9, Rest10, Rest11, Rest12, Rest13;
    }
}
