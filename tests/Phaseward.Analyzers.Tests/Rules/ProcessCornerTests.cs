using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// The process corners set in a design's <c>new Process { ... }</c> initializer are evaluated at compile time (the
/// elaborator calls the real init accessors) and reach the timing rules; a bad factor is the DSL's ArgumentException,
/// reported as PW9003 at the assignment. Figures: the flat 10 fF test process (t_TG = 34.5 ps, t_inv = 27.6 ps
/// nominal, see <see cref="RuleSources"/>); the setup constraint T_c ≥ t_pcq + t_pd + t_setup (Weste &amp; Harris,
/// "CMOS VLSI Design", 4th ed., ch. 10, from memory) with every delay ×1.2 at the slow corner: 289.8 ps nominal,
/// 347.76 ps slow, against 300 ps.
/// </summary>
public class ProcessCornerTests
{
    private static string Pipeline(string factors) => $$"""
        using Phaseward;

        public sealed class Cornered : Design
        {
            protected override void Describe(Circuit c)
            {
                var slow = 1.0;
                for (var i = 0; i < 2; i++)
                    slow += 0.1;
                c.UseProcess(new Process
                {
                    Name = "flat 10 fF (test figures)",
                    WireCapacitance = 10.Femtofarads(),
                    GateCapacitance = 0.Femtofarads(),
                    DiffusionCapacitance = 0.Femtofarads(),
                    PassGateResistance = 5.Kiloohms(),
                    DriverResistance = 4.Kiloohms(),
                    {{factors}}
                });
                var clk = c.Clock("clk", 300.Picoseconds(), 0.5, 30.Picoseconds());
                var net = {|#1:c.DynamicRegister(c.Input("d"), clk, "R1")|};
                for (var i = 0; i < 5; i++)
                    net = c.Inverter(net);
                c.Output("q", {|#0:c.DynamicRegister(net, clk, "R2")|});
            }
        }
        """;

    [Fact]
    public Task AComputedSlowFactorIsEvaluatedAndNamedInTheMessage()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(Pipeline("SlowDelayFactor = slow, FastDelayFactor = 0.5,"),
            new DiagnosticResult(RuleCatalog.RegisterSetup.Id, DiagnosticSeverity.Warning).WithLocation(0).WithLocation(1)
                .WithMessage("Register 'R2' misses its setup time on the path from register 'R1': clock-to-output 108 ps + path 199 ps + "
                             + "setup 41.4 ps = 348 ps exceeds the 300 ps available (slack -47.8 ps; slow corner, delays ×1.2)"))
            .RunAsync();

    [Fact]
    public Task WithNominalCornersThePathFits()
        => new PhasewardAnalyzerTest<TimingAnalyzer>(
            Pipeline("SlowDelayFactor = 1, FastDelayFactor = 1,").Replace("{|#0:", "").Replace("{|#1:", "").Replace("|}", "")).RunAsync();

    [Fact]
    public Task AFastFactorAboveOneIsAnErrorAtTheAssignment()
        => new PhasewardAnalyzerTest<ElaborationAnalyzer>(
            Pipeline("{|#2:FastDelayFactor = 1.5|},").Replace("{|#0:", "").Replace("{|#1:", "").Replace("\")|}", "\")"),
            new DiagnosticResult(RuleCatalog.DesignThrows.Id, DiagnosticSeverity.Error).WithLocation(2)
                .WithArguments("Cornered", "'FastDelayFactor' must be at most 1: the fast corner is not slower than nominal (was 1.5). (Parameter 'FastDelayFactor')"))
            .RunAsync();
}
