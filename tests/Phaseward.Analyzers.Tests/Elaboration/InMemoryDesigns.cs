using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Tests.Verifiers;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Compiles design sources in memory (offline reference assemblies + Phaseward.dll) and elaborates each design both ways:
/// at compile time with the elaborator, and at run time by loading the emitted assembly and calling Design.Elaborate().
/// </summary>
internal sealed class InMemoryDesigns
{
    private readonly Lazy<Assembly> assembly;

    public InMemoryDesigns(params (string Path, string Text)[] sources)
    {
        var options = new CSharpParseOptions(LanguageVersion.Latest);
        Compilation = CSharpCompilation.Create("Designs" + Guid.NewGuid().ToString("N"),
            sources.Select(s => CSharpSyntaxTree.ParseText(s.Text, options, s.Path, System.Text.Encoding.UTF8)),
            PhasewardTest.References,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));
        var errors = Compilation.GetDiagnostics().Where(d => d.Severity == DiagnosticSeverity.Error).ToList();
        if (errors.Count > 0)
            throw new InvalidOperationException("Test designs do not compile:\n" + string.Join("\n", errors));
        Session = CompilationElaborations.For(Compilation) ?? throw new InvalidOperationException("Phaseward is not referenced.");
        assembly = new Lazy<Assembly>(Emit);
    }

    public CSharpCompilation Compilation { get; }

    public ElaborationSession Session { get; }

    public static InMemoryDesigns FromFiles(params string[] paths)
        => new(paths.Select(p => (p, File.ReadAllText(p))).ToArray());

    public IReadOnlyList<string> DesignNames => Session.Catalog.Designs.Select(d => d.Type.ToDisplayString()).ToList();

    public ElaborationResult CompileTime(string typeName, ElaborationLimits? limits = null)
    {
        var design = Session.Catalog.Designs.Single(d => d.Type.ToDisplayString() == typeName || d.Type.Name == typeName);
        return DesignElaborator.Elaborate(Session, design, limits ?? ElaborationLimits.Default, CancellationToken.None);
    }

    public Netlist RunTime(string typeName, params object[] constructorArguments)
    {
        var type = assembly.Value.GetTypes().Single(t => t.FullName == typeName || t.Name == typeName);
        var design = (Design)Activator.CreateInstance(type, constructorArguments)!;
        return design.Elaborate();
    }

    private Assembly Emit()
    {
        using var stream = new MemoryStream();
        var emitted = Compilation.Emit(stream);
        if (!emitted.Success)
            throw new InvalidOperationException(string.Join("\n", emitted.Diagnostics));
        return Assembly.Load(stream.ToArray());
    }
}
