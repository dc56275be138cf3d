using System;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>Unwinds the interpreter when elaboration of a design must end (budget used up, the design threw).
/// The reason has already been recorded as an issue.</summary>
internal sealed class ElaborationStopped : Exception
{
    public ElaborationStopped()
        : base("Elaboration stopped.")
    {
    }
}
