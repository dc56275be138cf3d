namespace Phaseward.Analyzers.Elaboration;

/// <summary>How a statement ended.</summary>
internal enum Completion
{
    Normal,
    Break,
    Continue,
    Return,
}
