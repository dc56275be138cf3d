using System.Composition;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeFixes;

namespace Phaseward.CodeFixes;

/// <summary>
/// PW2001: inserts a restoring inverter at each split point of an over-long pass-gate chain. Each inserted stage
/// flips the polarity downstream; the title says so.
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(InsertRestoringInverterFix)), Shared]
public sealed class InsertRestoringInverterFix : InsertRestoringStageFix
{
    public const string Title = "Insert a restoring inverter (inverts the data)";

    protected override string StageMethod => "Inverter";

    protected override string ActionTitle => Title;

    protected override string EquivalenceKey => EquivalenceKeys.InsertRestoringInverter;
}
