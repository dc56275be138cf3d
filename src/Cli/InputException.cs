using System;

namespace Phaseward.Cli;

/// <summary>Bad input (a path, a project that does not build, a design that throws...): reported as one clear message, exit code 2.</summary>
internal sealed class InputException : Exception
{
    public InputException(string message)
        : base(message)
    {
    }
}
