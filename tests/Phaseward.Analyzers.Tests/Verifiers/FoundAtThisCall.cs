using System.Linq;
using Microsoft.CodeAnalysis.Testing;

namespace Phaseward.Analyzers.Tests.Verifiers;

/// <summary>
/// The expected diagnostic for one cause found several times at one call (a loop, a helper, a placed block): the first
/// instance's diagnostic with the count and the named instances appended to its message.
/// </summary>
public static class FoundAtThisCallExtensions
{
    public static DiagnosticResult FoundAtThisCall(this DiagnosticResult first, int times, string design, string namedInstances)
    {
        var suffix = $"; found {times} times at this call in design '{design}': {namedInstances}";
        return first.Message is { } message
            ? first.WithMessage(message + suffix)
            : first.WithArguments((first.MessageArguments ?? new object?[0]).Append(suffix).ToArray()!);
    }
}
