using System;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Thrown through a library method when a callback's result is unknown (reported where it arose): the library call then
/// yields Unknown.
/// </summary>
internal sealed class UnknownValueException : Exception
{
    public UnknownValueException()
        : base("A value the elaborator could not compute reached a library method.")
    {
    }
}
