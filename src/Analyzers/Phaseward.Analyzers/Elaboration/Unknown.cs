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

    // Library code run natively may meet an Unknown inside an array, a list or a record (string.Join, a record's printed
    // members, a HashSet): it must not print or compare it as a value ("(unknown)" in a net's name). Thrown back, the
    // library call yields Unknown (the cause was reported where it arose).
    public override string ToString() => throw new UnknownValueException();

    public override bool Equals(object? obj) => ReferenceEquals(this, obj) ? true : throw new UnknownValueException();

    public override int GetHashCode() => throw new UnknownValueException();
}
