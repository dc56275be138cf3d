namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// How a statement ended. One instance per way (compared by reference): the dispatch returns a statement's completion
/// and an expression's value through the same <c>object?</c> without boxing.
/// </summary>
/// <remarks>
/// The <c>Maybe</c> ways are those of code the elaborator skipped (its condition unknown) that can jump out of itself:
/// whether it did is not known, so what follows up to the jump's target is skipped too, and from the target on the
/// code runs again (see <c>Interpreter.Skipped.cs</c>).
/// </remarks>
internal sealed class Completion
{
    public static readonly Completion Normal = new(nameof(Normal), 0);
    public static readonly Completion Break = new(nameof(Break), 0);
    public static readonly Completion Continue = new(nameof(Continue), 0);
    public static readonly Completion Return = new(nameof(Return), 0);

    /// <summary>Skipped code may have continued the enclosing loop: the rest of the iteration is skipped.</summary>
    public static readonly Completion MaybeContinue = new(nameof(MaybeContinue), 1);

    /// <summary>Skipped code may have left the enclosing loop or switch: the rest of it is skipped.</summary>
    public static readonly Completion MaybeBreak = new(nameof(MaybeBreak), 2);

    /// <summary>Skipped code may have thrown: the rest up to an enclosing catch is skipped, and the catch may have run.</summary>
    public static readonly Completion MaybeThrow = new(nameof(MaybeThrow), 3);

    /// <summary>Skipped code may have returned: the rest of the method is skipped, and what it returns is not known.</summary>
    public static readonly Completion MaybeReturn = new(nameof(MaybeReturn), 4);

    /// <summary>Skipped code may have returned or thrown: the rest of the method is skipped, and the exception may go on to
    /// a catch around it (in the method or a caller).</summary>
    public static readonly Completion MaybeReturnOrThrow = new(nameof(MaybeReturnOrThrow), 5);

    private readonly string name;

    // How far a Maybe way may have jumped (0 for the others): the farther one wins when skipped code has several.
    private readonly int reach;

    private Completion(string name, int reach)
    {
        this.name = name;
        this.reach = reach;
    }

    /// <summary>Whether skipped code may have jumped (one of the Maybe ways).</summary>
    public bool IsMaybe => reach > 0;

    /// <summary>The farther-reaching of two Maybe ways (or Normal when neither is one); a return and a throw make both.</summary>
    public static Completion Farther(Completion a, Completion b)
        => (a == MaybeThrow && b == MaybeReturn) || (a == MaybeReturn && b == MaybeThrow) ? MaybeReturnOrThrow : a.reach >= b.reach ? a : b;

    /// <summary>Whether skipped code may have thrown (the exception then goes on to an enclosing catch).</summary>
    public bool MayThrow => this == MaybeThrow || this == MaybeReturnOrThrow;

    public override string ToString() => name;
}
