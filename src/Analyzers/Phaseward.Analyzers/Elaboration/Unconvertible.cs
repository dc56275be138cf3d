namespace Phaseward.Analyzers.Elaboration;

/// <summary>Marks an argument that cannot be given the parameter's type.</summary>
internal sealed class Unconvertible
{
    public static readonly Unconvertible Value = new();
}
