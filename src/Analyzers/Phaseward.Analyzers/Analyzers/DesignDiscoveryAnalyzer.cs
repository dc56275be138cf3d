using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Phaseward.Analyzers.Diagnostics;

namespace Phaseward.Analyzers
{
    /// <summary>Reports each concrete Design class, proving that the analyzers load into a real build.</summary>
    [DiagnosticAnalyzer(LanguageNames.CSharp)]
    public sealed class DesignDiscoveryAnalyzer : DiagnosticAnalyzer
    {
        public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Descriptors.DesignFound);

        public override void Initialize(AnalysisContext context)
        {
            context.EnableConcurrentExecution();
            context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
            context.RegisterCompilationStartAction(start =>
            {
                var designType = start.Compilation.GetTypeByMetadataName("Phaseward.Design");
                if (designType is null)
                    return;
                start.RegisterSymbolAction(symbolContext =>
                {
                    var type = (INamedTypeSymbol)symbolContext.Symbol;
                    if (type.IsAbstract || !DerivesFrom(type, designType))
                        return;
                    symbolContext.ReportDiagnostic(Diagnostic.Create(Descriptors.DesignFound, type.Locations[0], type.Name));
                }, SymbolKind.NamedType);
            });
        }

        private static bool DerivesFrom(INamedTypeSymbol type, INamedTypeSymbol baseType)
        {
            for (var current = type.BaseType; current is not null; current = current.BaseType)
                if (SymbolEqualityComparer.Default.Equals(current, baseType))
                    return true;
            return false;
        }
    }
}
