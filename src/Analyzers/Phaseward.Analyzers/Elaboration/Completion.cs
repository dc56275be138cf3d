namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// How a statement ended. One instance per way (compared by reference): the dispatch returns a statement's completion
/// and an expression's value through the same <c>object?</c> without boxing.
/// </summary>
internal sealed class Completion
{
    public static readonly Completion Normal = new(nameof(Normal));
    public static readonly Completion Break = new(nameof(Break));
    public static readonly Completion Continue = new(nameof(Continue));
    public static readonly Completion Return = new(nameof(Return));

    private readonly string name;

    private Completion(string name) => this.name = name;

    public override string ToString() => name;
}
