using System;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// Thrown through a library method when a callback's result is unknown (reported where it arose), or when library code
/// meets a library struct's default the elaborator does not make (<see cref="Unread"/>, reported where the call is):
/// the library call then yields Unknown.
/// </summary>
internal sealed class UnknownValueException : Exception
{
    public UnknownValueException()
        : base("A value the elaborator could not compute reached a library method.")
    {
    }

    public UnknownValueException(UnmadeDefault unread)
        : base("The default value of a library struct outside the pure library reached a library method.")
        => Unread = unread;

    private UnknownValueException(string construct, string why)
        : base(construct + ": " + why)
        => Construct = (construct, why);

    /// <summary>A construct met while computing a value (a text, an equality) that is not interpreted, reported at the site.</summary>
    public static UnknownValueException Unsupported(string construct, string why) => new(construct, why);

    /// <summary>Library code compared or hashed two of the design's delegates.</summary>
    public static UnknownValueException DelegateEquality
        => new("the equality of delegates made by the design", "C# compares a delegate's target and method, which the elaborator does not model");

    /// <summary>The unmade default library code met; null when the value was unknown for a cause already reported.</summary>
    public UnmadeDefault? Unread { get; }

    /// <summary>A construct library code met that the elaborator does not interpret (reported at the call), if any.</summary>
    public (string What, string Why)? Construct { get; }
}
