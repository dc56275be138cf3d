namespace Phaseward.Analyzers.Elaboration;

/// <summary>A storage cell: a local, a parameter, a field of the design. Shared by reference for ref/out arguments.</summary>
internal sealed class Variable
{
    public Variable(object? value) => Value = value;

    public object? Value { get; set; }
}
