using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Text;

namespace Phaseward.EndToEnd.Tests.Workspace;

/// <summary>
/// A design project opened the way an editor opens it, through the Roslyn workspace API: an <see cref="AdhocWorkspace"/>
/// built from the project's files on disk (its .cs files, the .editorconfig files above them), compiled against the
/// runtime and Phaseward's library, with the analyzers and code fixes loaded from a folder (the package's
/// analyzers/dotnet/cs).
/// </summary>
internal sealed class DesignWorkspace : IDisposable
{
    private readonly AdhocWorkspace workspace = new();
    private readonly ProjectId projectId;
    private readonly ImmutableArray<DiagnosticAnalyzer> analyzers;
    private readonly ImmutableArray<CodeFixProvider> codeFixes;

    private DesignWorkspace(string projectDirectory, string stopConfigSearchAt, string libraryPath, string analyzerDirectory, OutputKind outputKind)
    {
        var loader = new AnalyzerLoadContext(analyzerDirectory);
        var analyzerReferences = Directory.GetFiles(analyzerDirectory, "*.dll").OrderBy(p => p, StringComparer.Ordinal)
            .Select(path => (AnalyzerReference)new AnalyzerFileReference(path, loader))
            .ToImmutableArray();
        analyzers = analyzerReferences.SelectMany(r => r.GetAnalyzers(LanguageNames.CSharp)).ToImmutableArray();
        codeFixes = loader.LoadFromPath(Path.Combine(analyzerDirectory, "Phaseward.CodeFixes.dll")).GetTypes()
            .Where(t => !t.IsAbstract && typeof(CodeFixProvider).IsAssignableFrom(t) && t.GetCustomAttribute<ExportCodeFixProviderAttribute>() is not null)
            .Select(t => (CodeFixProvider)Activator.CreateInstance(t)!)
            .ToImmutableArray();

        projectId = ProjectId.CreateNewId();
        var documents = Directory.GetFiles(projectDirectory, "*.cs", SearchOption.AllDirectories)
            .Where(p => !IsUnder(p, Path.Combine(projectDirectory, "obj")) && !IsUnder(p, Path.Combine(projectDirectory, "bin")))
            .OrderBy(p => p, StringComparer.Ordinal)
            .Select(path => DocumentInfo.Create(DocumentId.CreateNewId(projectId), Path.GetFileName(path),
                loader: TextLoader.From(TextAndVersion.Create(SourceText.From(File.ReadAllText(path)), VersionStamp.Create(), path)),
                filePath: path));
        // As the SDK does: every .editorconfig from the project's folder up (the compiler honours root = true).
        var configs = new List<DocumentInfo>();
        for (var dir = new DirectoryInfo(projectDirectory); dir is not null; dir = dir.Parent)
        {
            var config = Path.Combine(dir.FullName, ".editorconfig");
            if (File.Exists(config))
                configs.Add(DocumentInfo.Create(DocumentId.CreateNewId(projectId), ".editorconfig",
                    loader: TextLoader.From(TextAndVersion.Create(SourceText.From(File.ReadAllText(config)), VersionStamp.Create(), config)),
                    filePath: config));
            if (string.Equals(dir.FullName.TrimEnd(Path.DirectorySeparatorChar), stopConfigSearchAt.TrimEnd(Path.DirectorySeparatorChar), StringComparison.Ordinal))
                break;
        }

        var references = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Where(p => Path.GetFileName(p) is var name && (name.StartsWith("System.", StringComparison.Ordinal) || name is "mscorlib.dll" or "netstandard.dll"))
            .Select(p => (MetadataReference)MetadataReference.CreateFromFile(p))
            .Append(MetadataReference.CreateFromFile(libraryPath));

        var name = Path.GetFileName(projectDirectory.TrimEnd(Path.DirectorySeparatorChar));
        var project = ProjectInfo.Create(projectId, VersionStamp.Create(), name, name, LanguageNames.CSharp,
                filePath: Directory.GetFiles(projectDirectory, "*.csproj").FirstOrDefault(),
                compilationOptions: new CSharpCompilationOptions(outputKind, nullableContextOptions: NullableContextOptions.Enable),
                parseOptions: new CSharpParseOptions(LanguageVersion.Latest),
                documents: documents,
                metadataReferences: references,
                analyzerReferences: analyzerReferences)
            .WithAnalyzerConfigDocuments(configs);
        workspace.AddProject(project);
    }

    /// <summary>Opens a project folder; <paramref name="stopConfigSearchAt"/> is the highest folder searched for .editorconfig.</summary>
    public static DesignWorkspace Open(string projectDirectory, string stopConfigSearchAt, string libraryPath, string analyzerDirectory, OutputKind outputKind = OutputKind.DynamicallyLinkedLibrary)
    {
        if (!File.Exists(libraryPath)) throw new FileNotFoundException("Phaseward library not found", libraryPath);
        if (!Directory.Exists(analyzerDirectory)) throw new DirectoryNotFoundException("analyzer folder not found: " + analyzerDirectory);
        return new DesignWorkspace(projectDirectory, stopConfigSearchAt, libraryPath, analyzerDirectory, outputKind);
    }

    public Project Project => workspace.CurrentSolution.GetProject(projectId)!;

    public ImmutableArray<DiagnosticAnalyzer> Analyzers => analyzers;

    public ImmutableArray<CodeFixProvider> CodeFixes => codeFixes;

    public Document Document(string fileName)
        => Project.Documents.SingleOrDefault(d => d.Name == fileName) ?? throw new ArgumentException($"no document '{fileName}' in the project", nameof(fileName));

    /// <summary>The compiler's errors in one document (a design that does not compile proves nothing).</summary>
    public async Task<ImmutableArray<Diagnostic>> CompilerErrorsAsync(Document document, CancellationToken cancellationToken)
    {
        var model = await document.GetSemanticModelAsync(cancellationToken) ?? throw new InvalidOperationException("no semantic model");
        return model.GetDiagnostics(cancellationToken: cancellationToken).Where(d => d.Severity == DiagnosticSeverity.Error).ToImmutableArray();
    }

    /// <summary>
    /// The analyzer diagnostics of one document, as an editor asks for them: the semantic diagnostics of that document's
    /// semantic model only (not a whole-compilation run), with the project's .editorconfig options.
    /// </summary>
    public async Task<ImmutableArray<Diagnostic>> DocumentDiagnosticsAsync(Document document, CancellationToken cancellationToken)
    {
        var compilation = await document.Project.GetCompilationAsync(cancellationToken) ?? throw new InvalidOperationException("no compilation");
        var withAnalyzers = compilation.WithAnalyzers(analyzers, document.Project.AnalyzerOptions);
        var tree = await document.GetSyntaxTreeAsync(cancellationToken) ?? throw new InvalidOperationException("no syntax tree");
        var model = compilation.GetSemanticModel(tree);
        var semantic = await withAnalyzers.GetAnalyzerSemanticDiagnosticsAsync(model, filterSpan: null, cancellationToken);
        var syntactic = await withAnalyzers.GetAnalyzerSyntaxDiagnosticsAsync(tree, cancellationToken);
        return semantic.AddRange(syntactic).Where(d => d.Location.SourceTree == tree).ToImmutableArray();
    }

    /// <summary>Every code action Phaseward's code fixes offer for one diagnostic (nested actions flattened).</summary>
    public async Task<ImmutableArray<CodeAction>> CodeActionsAsync(Document document, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        var actions = ImmutableArray.CreateBuilder<CodeAction>();
        var context = new CodeFixContext(document, diagnostic, (action, _) => actions.Add(action), cancellationToken);
        foreach (var provider in codeFixes.Where(p => p.FixableDiagnosticIds.Contains(diagnostic.Id)))
            await provider.RegisterCodeFixesAsync(context);
        return Flatten(actions).ToImmutableArray();
    }

    /// <summary>Applies a code action to the workspace, as an editor does when the user picks it.</summary>
    public async Task ApplyAsync(CodeAction action, CancellationToken cancellationToken)
    {
        var operations = await action.GetOperationsAsync(cancellationToken);
        var apply = operations.OfType<ApplyChangesOperation>().SingleOrDefault()
            ?? throw new InvalidOperationException($"code action '{action.Title}' changes nothing");
        if (!workspace.TryApplyChanges(apply.ChangedSolution))
            throw new InvalidOperationException($"the workspace refused the changes of '{action.Title}'");
    }

    /// <summary>Writes every document whose text changed back to its file (as an editor saves).</summary>
    public async Task SaveAsync(CancellationToken cancellationToken)
    {
        foreach (var document in Project.Documents)
        {
            var text = await document.GetTextAsync(cancellationToken);
            var path = document.FilePath!;
            if (File.ReadAllText(path) != text.ToString())
                await File.WriteAllTextAsync(path, text.ToString(), cancellationToken);
        }
    }

    public void Dispose() => workspace.Dispose();

    private static IEnumerable<CodeAction> Flatten(IEnumerable<CodeAction> actions)
        => actions.SelectMany(a => a.NestedActions.IsDefaultOrEmpty ? new[] { a } : Flatten(a.NestedActions));

    private static bool IsUnder(string path, string directory)
        => path.StartsWith(directory + Path.DirectorySeparatorChar, StringComparison.Ordinal);
}
