using System;
using System.IO;
using System.IO.Compression;
using System.Linq;
using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;
using System.Text;
using System.Text.RegularExpressions;
using System.Threading;
using System.Threading.Tasks;
using System.Xml.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Phaseward.EndToEnd.Tests.Packaging;
using Phaseward.EndToEnd.Tests.Workspace;

namespace Phaseward.EndToEnd.Tests;

/// <summary>
/// The package as a kept library ships it: the DSL's XML documentation beside Phaseward.dll (what IntelliSense reads),
/// a symbols package whose PDB belongs to that dll and maps its sources with Source Link (the Portable PDB format:
/// the PDB id matches the dll's CodeView debug-directory entry; Source Link is the custom debug information of kind
/// CC110556-A091-4D38-9FEC-25AB9A351A6A, a JSON "documents" map — both from the Portable PDB specification in
/// dotnet/runtime, docs/design/specs/PortablePdb-Metadata.md), and a readme whose start works as written.
/// </summary>
[Collection(PackagedPhasewardCollection.Name)]
public sealed class PackageDocumentationTests
{
    private static readonly Guid SourceLinkKind = new("CC110556-A091-4D38-9FEC-25AB9A351A6A");
    private readonly PackagedPhaseward package;

    public PackageDocumentationTests(PackagedPhaseward package) => this.package = package;

    private string DocumentationPath => Path.ChangeExtension(package.LibraryPath, ".xml");

    [Fact]
    public void PackageShipsTheDocumentationFileBesideTheLibrary()
    {
        using (var nupkg = ZipFile.OpenRead(Directory.GetFiles(package.Feed, "Phaseward.*.nupkg").Single()))
        {
            var lib = nupkg.Entries.Where(e => e.FullName.StartsWith("lib/", StringComparison.Ordinal)).Select(e => e.FullName).Order(StringComparer.Ordinal);
            Assert.Equal(new[] { "lib/netstandard2.0/Phaseward.dll", "lib/netstandard2.0/Phaseward.xml" }, lib);
        }

        // Restored beside the dll the design compiles against, which is where the compiler and the editor look for it.
        Assert.True(File.Exists(DocumentationPath), DocumentationPath);
        var doc = XDocument.Load(DocumentationPath).Root!;
        Assert.Equal("Phaseward", doc.Element("assembly")?.Element("name")?.Value);
        var members = doc.Element("members")!.Elements("member").Select(m => (string)m.Attribute("name")!).ToHashSet(StringComparer.Ordinal);
        // The designer's vocabulary is documented: the base class, the clock call, a unit literal.
        Assert.Contains("T:Phaseward.Design", members);
        Assert.Contains(members, m => m.StartsWith("M:Phaseward.Circuit.Clock(System.String,Phaseward.Time,", StringComparison.Ordinal));
        Assert.Contains("M:Phaseward.UnitExtensions.Nanoseconds(System.Int32)", members);
    }

    [Fact]
    public void SymbolsPackageHoldsTheLibrarysPdbWithSourceLink()
    {
        var snupkg = Directory.GetFiles(package.Feed, "Phaseward.*.snupkg").SingleOrDefault();
        Assert.True(snupkg is not null, "no .snupkg beside the package in " + package.Feed);
        using var symbols = ZipFile.OpenRead(snupkg!);
        var pdbEntry = Assert.Single(symbols.Entries, e => e.FullName.EndsWith(".pdb", StringComparison.Ordinal));
        Assert.Equal("lib/netstandard2.0/Phaseward.pdb", pdbEntry.FullName);

        using var pdbBytes = new MemoryStream();
        using (var stream = pdbEntry.Open()) stream.CopyTo(pdbBytes);
        pdbBytes.Position = 0;
        using var pdbProvider = MetadataReaderProvider.FromPortablePdbStream(pdbBytes);
        var pdb = pdbProvider.GetMetadataReader();

        // The PDB is the one of the dll the package ships (same id as its CodeView record).
        using (var pe = new PEReader(File.OpenRead(package.LibraryPath)))
        {
            var codeView = pe.ReadCodeViewDebugDirectoryData(pe.ReadDebugDirectory().Single(e => e.Type == DebugDirectoryEntryType.CodeView));
            Assert.Equal(codeView.Guid, new Guid(pdb.DebugMetadataHeader!.Id.Take(16).ToArray()));
        }

        // Source Link: the repository's files map to their raw URL at one commit.
        var sourceLink = pdb.CustomDebugInformation.Select(pdb.GetCustomDebugInformation)
            .Where(c => pdb.GetGuid(c.Kind) == SourceLinkKind)
            .Select(c => Encoding.UTF8.GetString(pdb.GetBlobBytes(c.Value)))
            .SingleOrDefault();
        Assert.True(sourceLink is not null, "the PDB carries no Source Link map");
        using var json = System.Text.Json.JsonDocument.Parse(sourceLink!);
        var map = Assert.Single(json.RootElement.GetProperty("documents").EnumerateObject());
        Assert.EndsWith("*", map.Name, StringComparison.Ordinal);
        Assert.Matches(new Regex("^https://raw\\.githubusercontent\\.com/phaseward/phaseward/[0-9a-f]{40}/\\*$"), map.Value.GetString());

        // Every source document of the DSL lies under the mapped folder, so each one resolves to a URL.
        var prefix = map.Name.TrimEnd('*');
        var documents = pdb.Documents.Select(h => pdb.GetString(pdb.GetDocument(h).Name)).Where(n => n.EndsWith(".cs", StringComparison.Ordinal)).ToList();
        Assert.Contains(documents, d => d.EndsWith("Circuits/Circuit.Clocks.cs", StringComparison.Ordinal));
        Assert.All(documents.Where(d => !d.Contains("/obj/", StringComparison.Ordinal)), d => Assert.StartsWith(prefix, d, StringComparison.Ordinal));
    }

    [Fact]
    public async Task TheReadmesStartCompilesAgainstThePackageAndShowsItsFindingWithTheDocComments()
    {
        using var cancellation = new CancellationTokenSource(TimeSpan.FromMinutes(3));
        string readme;
        using (var nupkg = ZipFile.OpenRead(Directory.GetFiles(package.Feed, "Phaseward.*.nupkg").Single()))
        using (var reader = new StreamReader(nupkg.Entries.Single(e => e.FullName == "README.md").Open()))
            readme = await reader.ReadToEndAsync(cancellation.Token);
        Assert.Contains("dotnet add package Phaseward", readme, StringComparison.Ordinal);
        var design = Regex.Match(readme, "```csharp\\n(?<code>.*?)```", RegexOptions.Singleline).Groups["code"].Value;
        Assert.Contains(": Design", design, StringComparison.Ordinal);

        // The design as the readme shows it, in a project of its own, opened the way an editor opens it.
        var project = Path.Combine(package.Root, "readme-start");
        Directory.CreateDirectory(project);
        await File.WriteAllTextAsync(Path.Combine(project, "FrostCounter.cs"), design, cancellation.Token);
        using var workspace = DesignWorkspace.Open(project, package.Root, package.LibraryPath, package.AnalyzerDirectory);
        var document = workspace.Document("FrostCounter.cs");
        Assert.Empty(await workspace.CompilerErrorsAsync(document, cancellation.Token));
        var finding = Assert.Single(await workspace.DocumentDiagnosticsAsync(document, cancellation.Token), d => d.Id.StartsWith("PW", StringComparison.Ordinal));
        Assert.Equal("PW1001", finding.Id);
        var line = finding.Location.GetLineSpan().StartLinePosition.Line;
        Assert.Contains("// PW1001", design.Split('\n')[line], StringComparison.Ordinal); // where the readme says

        // The doc comments reach the design: the packaged dll with the XML beside it, through the compiler's documentation
        // provider (what the editor's IntelliSense shows).
        var compilation = CSharpCompilation.Create("ReadmeStart",
            new[] { CSharpSyntaxTree.ParseText(design, cancellationToken: cancellation.Token) },
            ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
                .Where(p => Path.GetFileName(p) is var name && (name.StartsWith("System.", StringComparison.Ordinal) || name is "netstandard.dll"))
                .Select(p => (MetadataReference)MetadataReference.CreateFromFile(p))
                .Append(MetadataReference.CreateFromFile(package.LibraryPath, documentation: XmlDocumentationProvider.CreateFromFile(DocumentationPath))),
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        var tree = compilation.SyntaxTrees.Single();
        var model = compilation.GetSemanticModel(tree);
        string DocOf(string call)
        {
            var invocation = tree.GetRoot(cancellation.Token).DescendantNodes().OfType<InvocationExpressionSyntax>()
                .First(i => i.Expression.ToString().EndsWith(call, StringComparison.Ordinal));
            var symbol = model.GetSymbolInfo(invocation, cancellation.Token).Symbol ?? throw new InvalidOperationException("unbound call " + call);
            return (symbol is IMethodSymbol { ReducedFrom: { } extension } ? extension : symbol).GetDocumentationCommentXml(cancellationToken: cancellation.Token) ?? string.Empty;
        }

        Assert.Contains("A free-running root clock.", DocOf("c.Clock"), StringComparison.Ordinal);
        Assert.Contains("<param name=\"period\">Clock period (positive).</param>", DocOf("c.Clock"), StringComparison.Ordinal);
        Assert.Contains("nanoseconds", DocOf(".Nanoseconds"), StringComparison.Ordinal);
        Assert.False(string.IsNullOrWhiteSpace(model.Compilation.GetTypeByMetadataName("Phaseward.Design")!.GetDocumentationCommentXml()));
    }
}
