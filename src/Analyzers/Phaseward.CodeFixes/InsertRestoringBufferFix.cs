using System.Composition;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeFixes;

namespace Phaseward.CodeFixes;

/// <summary>PW2001: inserts a restoring buffer (keeps the polarity) at each split point of an over-long pass-gate chain.</summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(InsertRestoringBufferFix)), Shared]
public sealed class InsertRestoringBufferFix : InsertRestoringStageFix
{
    public const string Title = "Insert a restoring buffer";

    protected override string StageMethod => "Buffer";

    protected override string ActionTitle => Title;

    protected override string EquivalenceKey => EquivalenceKeys.InsertRestoringBuffer;
}
