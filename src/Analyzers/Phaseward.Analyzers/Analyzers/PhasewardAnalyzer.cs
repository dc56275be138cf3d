using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Options;

namespace Phaseward.Analyzers;

/// <summary>
/// Base of every Phaseward analyzer. Per compilation: nothing at all unless Phaseward.Design is referenced. Per document
/// (a semantic-model action, so it runs in the editor's live analysis; no compilation-end action): for each design whose
/// Describe is in the document, get the shared elaboration and hand it to <see cref="AnalyzeDesign"/>.
/// </summary>
public abstract class PhasewardAnalyzer : DiagnosticAnalyzer
{
    public sealed override void Initialize(AnalysisContext context)
    {
        context.EnableConcurrentExecution();
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.RegisterCompilationStartAction(start =>
        {
            var session = CompilationElaborations.For(start.Compilation);
            if (session is null)
                return;
            start.RegisterSemanticModelAction(model => AnalyzeDocument(model, session));
        });
    }

    internal abstract void AnalyzeDesign(DesignAnalysisContext context);

    /// <summary>Called once per document that holds designs, with its options and its first design (where a problem
    /// with the options is reported: once per file, however many designs it holds).</summary>
    internal virtual void AnalyzeDocumentOptions(SemanticModelAnalysisContext context, PhasewardOptions options, DesignInfo firstDesign)
    {
    }

    private void AnalyzeDocument(SemanticModelAnalysisContext context, ElaborationSession session)
    {
        var tree = context.SemanticModel.SyntaxTree;
        PhasewardOptions? options = null;
        foreach (var design in session.Catalog.AnchoredIn(tree))
        {
            context.CancellationToken.ThrowIfCancellationRequested();
            // The options belong to the document, not the design: read them once, and only for documents with designs.
            if (options is null)
            {
                options = PhasewardOptions.Read(context.Options.AnalyzerConfigOptionsProvider.GetOptions(tree));
                AnalyzeDocumentOptions(context, options, design);
            }

            var result = CompilationElaborations.Elaborate(session, design, options.Limits, context.CancellationToken);
            AnalyzeDesign(new DesignAnalysisContext(context, design, result, options, new DiagnosticMapper(session, design)));
        }
    }
}
