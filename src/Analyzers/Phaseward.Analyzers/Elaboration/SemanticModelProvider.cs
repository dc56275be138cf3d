using System.Collections.Concurrent;
using System.Diagnostics.CodeAnalysis;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>One semantic model per syntax tree of a compilation, made on first use and shared by every analyzer.</summary>
internal sealed class SemanticModelProvider
{
    private readonly Compilation compilation;
    private readonly ConcurrentDictionary<SyntaxTree, SemanticModel> models = new();

    public SemanticModelProvider(Compilation compilation) => this.compilation = compilation;

    [SuppressMessage("MicrosoftCodeAnalysisCorrectness", "RS1030:Do not invoke Compilation.GetSemanticModel() method within a diagnostic analyzer",
        Justification = "Elaborating a design follows its calls into helpers declared in other files, whose operations need those files' " +
                        "semantic models; the analysis context only offers the model of the document being analysed. Models are cached " +
                        "per compilation so each tree is bound once.")]
    public SemanticModel Get(SyntaxTree tree) => models.GetOrAdd(tree, t => compilation.GetSemanticModel(t));
}
