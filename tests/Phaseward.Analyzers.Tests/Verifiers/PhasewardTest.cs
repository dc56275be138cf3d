using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace Phaseward.Analyzers.Tests.Verifiers;

/// <summary>Shared set-up for analyzer tests: offline reference assemblies plus the Phaseward DSL.</summary>
internal static class PhasewardTest
{
    /// <summary>net8.0 reference assemblies from a package, never downloaded.</summary>
    public static ReferenceAssemblies ReferenceAssemblies { get; } = new("net8.0");

    public static ImmutableArray<MetadataReference> References { get; } =
        ImmutableArray.CreateRange<MetadataReference>(Basic.Reference.Assemblies.Net80.References.All)
            .Add(MetadataReference.CreateFromFile(typeof(Design).Assembly.Location));

    public static void Configure(SolutionState state)
    {
        state.AdditionalReferences.AddRange(References);
    }

    /// <summary>Wraps .editorconfig lines (without a section header) for the test's source files.</summary>
    public static (string Path, string Content) EditorConfig(string lines)
        => ("/.editorconfig", "root = true\n\n[*.cs]\n" + lines + "\n");
}

/// <summary>Analyzer test for one analyzer type, with the Phaseward set-up applied.</summary>
public sealed class PhasewardAnalyzerTest<TAnalyzer> : CSharpAnalyzerTest<TAnalyzer, DefaultVerifier>
    where TAnalyzer : DiagnosticAnalyzer, new()
{
    public PhasewardAnalyzerTest(string source, params DiagnosticResult[] expected)
    {
        ReferenceAssemblies = PhasewardTest.ReferenceAssemblies;
        PhasewardTest.Configure(TestState);
        TestState.Sources.Add(source);
        ExpectedDiagnostics.AddRange(expected);
    }

    public PhasewardAnalyzerTest<TAnalyzer> WithEditorConfig(string lines)
    {
        TestState.AnalyzerConfigFiles.Add(PhasewardTest.EditorConfig(lines));
        return this;
    }
}
