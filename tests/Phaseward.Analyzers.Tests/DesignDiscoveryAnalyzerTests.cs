using System.Threading.Tasks;
using Microsoft.CodeAnalysis.Testing;
using Phaseward.Analyzers.Tests.Verifiers;

namespace Phaseward.Analyzers.Tests;

public class DesignDiscoveryAnalyzerTests
{
    [Fact]
    public Task ReportsEachConcreteDesign()
    {
        const string source = """
            using Phaseward;

            public abstract class Base : Design { }

            public sealed class {|#0:Sampler|} : Base
            {
                protected override void Describe(Circuit c) => c.Inverter(c.Input("a"));
            }
            """;

        return new PhasewareAnalyzerTest<DesignDiscoveryAnalyzer>(source,
            new DiagnosticResult(RuleIds.DesignFound, Microsoft.CodeAnalysis.DiagnosticSeverity.Info).WithLocation(0).WithArguments("Sampler"))
            .RunAsync();
    }

    [Fact]
    public Task SilentWithoutTheDsl()
    {
        const string source = """
            public sealed class Design { }
            public sealed class Sampler { }
            """;
        var test = new PhasewareAnalyzerTest<DesignDiscoveryAnalyzer>(source);
        test.TestState.AdditionalReferences.Clear();
        test.TestState.AdditionalReferences.AddRange(Basic.Reference.Assemblies.Net80.References.All);
        return test.RunAsync();
    }
}
