using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The default value of a library struct the elaborator does not make (<c>DateTime</c>, <c>Guid</c>, a generic library
/// struct such as <c>KeyValuePair&lt;int, Net&gt;</c>, whose type arguments are erased): what a field, local, auto-property
/// or array element of that type holds until something is assigned to it. It is never used as a value: reading it
/// (<see cref="Interpreter.Evaluate"/>) is PW9001 naming the type, and library code that meets it (a record's
/// <c>ToString</c>, <c>string.Join</c> over an array of them) throws back to the interpreter, which reports it.
/// </summary>
internal sealed class UnmadeDefault
{
    public UnmadeDefault(ITypeSymbol type) => Type = type;

    public ITypeSymbol Type { get; }

    public override string ToString() => throw new UnknownValueException(this);

    public override bool Equals(object? obj) => throw new UnknownValueException(this);

    public override int GetHashCode() => throw new UnknownValueException(this);
}
