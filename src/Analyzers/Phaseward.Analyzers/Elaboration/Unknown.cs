namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The value of an expression the elaborator could not compute. It poisons everything computed from it: operators,
/// calls and conditions that meet it yield Unknown (or skip their work) without reporting again, because the cause
/// was reported once where it arose.
/// </summary>
internal sealed class Unknown
{
    public static readonly Unknown Value = new();

    private Unknown()
    {
    }

    public static bool Is(object? value) => ReferenceEquals(value, Value);

    public override string ToString() => "(unknown)";
}
