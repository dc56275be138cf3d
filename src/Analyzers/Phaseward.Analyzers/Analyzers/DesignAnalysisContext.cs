using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;
using Phaseward.Analyzers.Elaboration;
using Phaseward.Analyzers.Options;

namespace Phaseward.Analyzers;

/// <summary>One design being analysed in the document that holds its Describe: its elaboration, options and reporting.</summary>
internal sealed class DesignAnalysisContext
{
    private readonly SemanticModelAnalysisContext context;

    public DesignAnalysisContext(SemanticModelAnalysisContext context, DesignInfo design, ElaborationResult elaboration, PhasewardOptions options,
        DiagnosticMapper mapper)
    {
        this.context = context;
        Design = design;
        Elaboration = elaboration;
        Options = options;
        Mapper = mapper;
    }

    public DesignInfo Design { get; }

    /// <summary>The shared elaboration (one per design per compilation and limits).</summary>
    public ElaborationResult Elaboration { get; }

    public PhasewardOptions Options { get; }

    public DiagnosticMapper Mapper { get; }

    public CancellationToken CancellationToken => context.CancellationToken;

    /// <summary>The document being analysed: only diagnostics in it are reported.</summary>
    public SyntaxTree Tree => context.SemanticModel.SyntaxTree;

    /// <summary>The compilation's options (with the per-document severity settings).</summary>
    public CompilationOptions CompilationOptions => context.SemanticModel.Compilation.Options;

    /// <summary>Reports a diagnostic if it lies in the document being analysed (per-document analysis drops the others).</summary>
    public void Report(Diagnostic? diagnostic)
    {
        if (diagnostic is not null && diagnostic.Location.SourceTree == context.SemanticModel.SyntaxTree)
            context.ReportDiagnostic(diagnostic);
    }
}
